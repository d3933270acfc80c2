/**
 * The whole P-V-T route, from an imported data set to residual properties with uncertainties:
 *
 *   points --(1) global surface fit (virial-type, fitVirialSurface.ts): effective variances,
 *            density corrections, a second opinion on every slope
 *          --(2) isochore fits (isochoreFit.ts): P and (dP/dT)_rho on each isochore
 *          --(3) isotherms: nodes = isochores covering T; two-phase check (P must rise with rho)
 *          --(4) integrateIsotherm.ts: low-density bridge + irregular quadrature -> a, s, u, h, g, ln phi
 *          --(5) propagateUncertainty.ts: Monte Carlo (seeded) and linearised, + quadrature error
 *          --(6) diagnostics: fit quality, sparseness, two-phase refusals, slope disagreements
 *
 * Route "isochores" needs at least 3 isochores with 3 or more temperatures each; otherwise (data on
 * isotherms, or scattered) route "surface" takes the departures from the fitted surface itself,
 * whose residual Helmholtz energy is closed-form (virialSurface.ts).
 */
import { R as CODATA_R } from "../constants.js";
import { InputError } from "../errors.js";
import { DEPARTURE_KEYS, departuresFromReduced } from "./departureSet.js";
import type { DepartureSet } from "./departureSet.js";
import { fitIsochore } from "./isochoreFit.js";
import type { IsochoreFit, IsochoreFitOptions } from "./isochoreFit.js";
import { clusterTemperatures, groupIsochores } from "./groupIsochores.js";
import { integrateIsotherm } from "./integrateIsotherm.js";
import type { IsothermDepartures, IsothermNodes } from "./integrateIsotherm.js";
import type { BridgeOptions } from "./lowDensityBridge.js";
import { fitVirialSurface } from "./fitVirialSurface.js";
import type { FitVirialSurfaceOptions, VirialSurfaceFit } from "./fitVirialSurface.js";
import { familyThreshold } from "./familyThreshold.js";
import { linearisedPropagation, monteCarloPropagation } from "./propagateUncertainty.js";
import type { PvtDiagnostic } from "./pvtDiagnostic.js";
import type { PvtDataset, SetAsidePoint } from "./types.js";
import { surfaceBasis, surfaceDerivatives, surfaceVariance } from "./virialSurface.js";
import type { VirialSurface } from "./virialSurface.js";

export interface PvtRouteOptions {
  /** "isochores", "surface", or "auto" (isochores when the data allow). Default "auto". */
  route?: "auto" | "isochores" | "surface";
  /** Isotherms to report, K. Default: the measured temperatures (clustered) that enough isochores cover. */
  isothermsK?: readonly number[];
  /** Temperatures closer than this are one isotherm, K. Default 0.05. */
  isothermToleranceK?: number;
  /** Relative density spread accepted within one isochore. Default 2e-3. */
  isochoreTolerance?: number;
  /** Fewest distinct temperatures for an isochore to be fitted. Default 3. */
  minIsochoreTemperatures?: number;
  /** Fewest nodes (isochores) on an isotherm. Default 3. */
  minIsothermNodes?: number;
  /**
   * Isochore route, stated u(P) only: a point whose residual on its isochore fit exceeds this many
   * effective standard uncertainties is set aside (worst first, one at a time, refitting; at most
   * 5 % of the points) and listed with the reason. Default 4.5 (a normal deviate beyond 4.5 has a
   * probability of 7e-6, so a genuine point is almost never set aside; common practice, no source).
   * Infinity turns the screening off.
   */
  outlierThreshold?: number;
  /**
   * Integrate across a density gap where a measured isochore does not cover the isotherm's
   * temperature. Default false: such a gap is where an isochoric campaign usually meets the
   * two-phase region (the fluid could not be measured there as one phase), so the isotherm stops
   * before it, with a refusal that says so.
   */
  integrateAcrossGaps?: boolean;
  /**
   * Critical temperature of the fluid, K, when known (the CLI takes it from --component): below it,
   * a warning reminds that a dome between two nodes with no isochore in between cannot be seen.
   */
  criticalTemperatureK?: number;
  isochore?: IsochoreFitOptions;
  surface?: FitVirialSurfaceOptions;
  bridge?: BridgeOptions;
  /** Monte Carlo samples (0 to skip). Default 200. */
  monteCarloSamples?: number;
  /** Seed of the Monte Carlo generator (reported in the result). Default 20261201. */
  seed?: number;
  /** Also compute the linearised estimate. Default true. */
  linearised?: boolean;
  /** Gas constant, J/(mol K). Default CODATA 2018 (constants.ts). */
  gasConstant?: number;
}

/** One state on an isotherm: smoothed pressure, departures and their standard uncertainties. */
export interface PvtState {
  densityMolPerM3: number;
  /** Smoothed pressure at (T, rho), Pa. */
  pressurePa: number;
  residual: DepartureSet;
  /** Combined standard uncertainty: propagated (Monte Carlo, or linearised if MC is off) and the method estimate. */
  uncertainty: DepartureSet;
  monteCarlo?: DepartureSet;
  linearised?: DepartureSet;
  /**
   * Method error estimate: quadrature + low-density-bridge truncation (isochore route) and the
   * change of the result when every fit order is raised by one, on the surface route always (a
   * truncated global expansion is its main systematic risk; without it the coverage test of the
   * surface route gave 86 % for nominal 95 %) and on the isochore route when no u(P) was stated
   * (the scatter then measures the fit's own misfit, whose effect on slopes is systematic).
   */
  method: DepartureSet;
}

export interface PvtIsotherm {
  temperatureK: number;
  states: PvtState[];
  /** Second virial coefficient, m3/mol, and its standard uncertainty. */
  B: number;
  uB: number;
  /** Third virial coefficient, m6/mol2, where the data allow. */
  C?: number;
  uC?: number;
  /** Isochore route: the bridge from zero density to the first node. */
  bridge?: {
    toDensityMolPerM3: number;
    aJPerMol: number;
    uAJPerMol: number;
    sJPerMolK: number;
    uSJPerMolK: number;
    degree: number;
  };
}

export interface PvtRouteResult {
  route: "isochores" | "surface";
  isotherms: PvtIsotherm[];
  surfaceFit: VirialSurfaceFit;
  isochoreFits: IsochoreFit[];
  diagnostics: PvtDiagnostic[];
  setAside: SetAsidePoint[];
  uncertaintyMethod: {
    monteCarlo?: { seed: number; samples: number };
    linearised: boolean;
    sigmaSource: "stated" | "from-scatter";
  };
  gasConstant: number;
}

/** Values of one frozen evaluation: per isotherm, per node, the departures; plus B and C. */
interface RouteValues {
  pressures: number[][];
  departures: DepartureSet[][];
  B: number[];
  C: (number | undefined)[];
  raw?: IsothermDepartures[];
}

function flatten(v: RouteValues): number[] {
  const out: number[] = [];
  v.departures.forEach((iso, k) => {
    for (const d of iso) for (const key of DEPARTURE_KEYS) out.push(d[key]);
    out.push(v.B[k] as number, v.C[k] ?? 0);
  });
  return out;
}

export function departuresFromPvt(
  dataset: PvtDataset,
  options: PvtRouteOptions = {},
): PvtRouteResult {
  const R = options.gasConstant ?? CODATA_R;
  const pts = dataset.points;
  const n = pts.length;
  const diagnostics: PvtDiagnostic[] = [];
  if (!(n >= 6)) {
    throw new InputError({
      input: `${dataset.source} points`,
      unit: "-",
      validRange: "at least 6 accepted points",
      received: n,
    });
  }
  checkRouteOptions(options);
  const stated = pts.every((p) => p.uPressurePa !== undefined);
  if (!stated && pts.some((p) => p.uPressurePa !== undefined)) {
    diagnostics.push({
      code: "partial-uncertainties",
      severity: "warning",
      message:
        "u(P) is given for some points only: all points were weighted equally and the uncertainty taken from the scatter",
    });
  }
  const T = pts.map((p) => p.temperatureK);
  const rho = pts.map((p) => p.densityMolPerM3);
  const P0 = pts.map((p) => p.pressurePa);
  const temperatureClusters = clusterTemperatures(T, options.isothermToleranceK ?? 0.05).length;
  if (temperatureClusters < 2) {
    throw new InputError({
      input: `${dataset.source} temperatures`,
      unit: "K",
      validRange:
        "at least 2 distinct temperatures (the entropy, energy and enthalpy departures need the isochoric slope (dP/dT)_rho)",
      received: `${temperatureClusters} temperature`,
      hint: "data on a single isotherm give Z and the residual Helmholtz energy only; measure at least one more temperature",
    });
  }

  // (1) Surface: first with u(P) only, then with effective variances; fitted on the points kept
  // by the screening in (2) (refitted after it, so a point set aside there does not inflate the
  // surface, its reduced chi-square, or the uncertainties scaled by it).
  let kept: number[] = pts.map((_, i) => i);
  const surfacePoints = (P: readonly number[]) =>
    kept.map((i) => {
      const p = pts[i] as PvtDataset["points"][number];
      return {
        temperatureK: p.temperatureK,
        densityMolPerM3: p.densityMolPerM3,
        pressurePa: P[i] as number,
      };
    });
  const slopeT = (s: VirialSurface, t: number, r: number) => {
    const d = surfaceDerivatives(s, t, r);
    return r * R * (1 + d.aD + d.aDT);
  };
  const slopeRho = (s: VirialSurface, t: number, r: number) => {
    const d = surfaceDerivatives(s, t, r);
    return R * t * (1 + 2 * d.aD + d.aDD);
  };
  let sigmaEff: number[] | undefined;
  const fitSurface = (): VirialSurfaceFit => {
    let fit = fitVirialSurface(
      surfacePoints(P0),
      stated
        ? kept.map((i) => (pts[i] as PvtDataset["points"][number]).uPressurePa as number)
        : undefined,
      { gasConstant: R, ...options.surface },
    );
    if (stated) {
      const first = fit;
      sigmaEff = pts.map((p) => {
        const dT =
          slopeT(first.surface, p.temperatureK, p.densityMolPerM3) * (p.uTemperatureK ?? 0);
        const dR =
          slopeRho(first.surface, p.temperatureK, p.densityMolPerM3) * (p.uDensityMolPerM3 ?? 0);
        return Math.sqrt((p.uPressurePa as number) ** 2 + dT * dT + dR * dR);
      });
      fit = fitVirialSurface(
        surfacePoints(P0),
        kept.map((i) => sigmaEff?.[i] as number),
        {
          gasConstant: R,
          ...options.surface,
          densityTerms: first.surface.densityTerms,
          temperatureTerms: first.surface.temperatureTerms,
        },
      );
    }
    return fit;
  };
  let surfaceFit = fitSurface();

  // (2) Isochores.
  const minT = options.minIsochoreTemperatures ?? 3;
  const groups = groupIsochores(rho, options.isochoreTolerance ?? 2e-3).filter(
    (g) => new Set(g.members.map((i) => (T[i] as number).toPrecision(10))).size >= minT,
  );
  const routeSetAside: SetAsidePoint[] = [];
  // Outlier screening on the isochores (needs stated uncertainties to judge a residual). The
  // statistic is the leave-one-out (deleted, externally studentized) prediction residual
  // (Belsley, Kuh & Welsch, Regression Diagnostics, 1980, §2.1; Cook & Weisberg, Residuals and
  // Influence in Regression, 1982, §2.2): each point against the isochore fitted to the OTHER
  // points, order chosen again by AICc without it, z = (P_i - P_(i)) / sqrt(sigma_i^2 + u(P_(i))^2 +
  // u_order^2), u_order the change of P_(i) when that order is raised by one.
  // The ordinary residual of the fit through all points let a slip at the end of an isochore hide:
  // AICc raised the order to follow it (the hat-matrix form e_i / (sigma_i sqrt(1 - h_ii)) at that
  // inflated order did not help either: it spread the slip over the neighbours and named the wrong
  // point on the demo campaign).
  const threshold = options.outlierThreshold ?? 4.5;
  const willUseIsochores =
    options.route === "isochores" || ((options.route ?? "auto") === "auto" && groups.length >= 3);
  if (sigmaEff && Number.isFinite(threshold) && willUseIsochores) {
    const maxOut = Math.floor(0.05 * n);
    const sig = sigmaEff;
    for (let round = 0; round < maxOut; round++) {
      let worst: { g: number; j: number; z: number } | undefined;
      groups.forEach((g, gi) => {
        const distinct = new Set(g.members.map((i) => (T[i] as number).toPrecision(10))).size;
        if (distinct < 4) return; // too few points to judge one of them
        g.members.forEach((i, j) => {
          const others = g.members.filter((_, q) => q !== j);
          if (new Set(others.map((q) => (T[q] as number).toPrecision(10))).size < 3) return;
          const f = fitIsochore(
            g.densityMolPerM3,
            others.map((q) => T[q] as number),
            others.map((q) => P0[q] as number),
            others.map((q) => sig[q] as number),
            options.isochore,
          );
          const e = f.evaluate(T[i] as number);
          // Fit-order part of the prediction error (an end point is an extrapolation of the
          // others, where a too-low order shows): the change when the order is raised by one.
          const nOthers = new Set(others.map((q) => (T[q] as number).toPrecision(10))).size;
          const uOrder =
            f.order + 1 <= nOthers - 1 && options.isochore?.order === undefined
              ? Math.abs(
                  fitIsochore(
                    g.densityMolPerM3,
                    others.map((q) => T[q] as number),
                    others.map((q) => P0[q] as number),
                    others.map((q) => sig[q] as number),
                    { ...options.isochore, order: f.order + 1 },
                  ).evaluate(T[i] as number).pressurePa - e.pressurePa,
                )
              : 0;
          const z =
            Math.abs((P0[i] as number) - e.pressurePa) /
            Math.sqrt((sig[i] as number) ** 2 + e.uPressurePa ** 2 + uOrder ** 2);
          if (z > threshold && (!worst || z > worst.z)) worst = { g: gi, j, z };
        });
      });
      if (!worst) break;
      const w: { g: number; j: number; z: number } = worst;
      const grp = groups[w.g] as { members: number[]; densityMolPerM3: number };
      const i = grp.members[w.j] as number;
      grp.members.splice(w.j, 1);
      const p = pts[i] as PvtDataset["points"][number];
      routeSetAside.push({
        line: p.line,
        temperatureK: p.temperatureK,
        densityMolPerM3: p.densityMolPerM3,
        pressurePa: p.pressurePa,
        reason: `outlier: leave-one-out residual ${w.z.toFixed(1)} u(P) on the isochore at ${grp.densityMolPerM3.toPrecision(6)} mol/m3 (threshold ${threshold}); left out of the isochore and the global surface fits`,
      });
    }
    if (routeSetAside.length > 0) {
      const out = new Set(routeSetAside.map((s) => s.line));
      kept = pts
        .map((_, i) => i)
        .filter((i) => !out.has((pts[i] as PvtDataset["points"][number]).line));
      surfaceFit = fitSurface();
    }
  }
  const surfaceOrder = {
    densityTerms: surfaceFit.surface.densityTerms,
    temperatureTerms: surfaceFit.surface.temperatureTerms,
  };
  for (const r of surfaceFit.diagnostics.recommendations)
    diagnostics.push({ code: "surface-fit", severity: "warning", message: r });
  // Density correction to the group mean, frozen from the nominal surface.
  const shift = new Array<number>(n).fill(0);
  for (const g of groups) {
    for (const i of g.members)
      shift[i] =
        slopeRho(surfaceFit.surface, T[i] as number, rho[i] as number) *
        (g.densityMolPerM3 - (rho[i] as number));
  }
  const wantRoute = options.route ?? "auto";
  const isochoreRoute = wantRoute === "isochores" || (wantRoute === "auto" && groups.length >= 3);
  if (isochoreRoute) {
    const used = new Set(groups.flatMap((g) => g.members));
    const out = new Set(routeSetAside.map((s) => s.line));
    pts.forEach((p, i) => {
      if (!used.has(i) && !out.has(p.line)) {
        routeSetAside.push({
          line: p.line,
          temperatureK: p.temperatureK,
          densityMolPerM3: p.densityMolPerM3,
          pressurePa: p.pressurePa,
          reason: `not on an isochore with ${minT} or more temperatures: used in the global surface fit only`,
        });
      }
    });
  }
  if (wantRoute === "isochores" && groups.length < 3) {
    throw new InputError({
      input: "route",
      unit: "-",
      validRange: `"isochores" needs at least 3 isochores with ${minT} or more temperatures each`,
      received: `${groups.length} such isochores`,
      hint: 'use route "surface" (or "auto") for data on isotherms or scattered data',
    });
  }
  const tolT = options.isothermToleranceK ?? 0.05;
  const minNodes = options.minIsothermNodes ?? 3;
  const mcSamples = options.monteCarloSamples ?? 200;
  const seed = options.seed ?? 20261201;
  const wantLinear = options.linearised ?? true;

  let isochoreFits: IsochoreFit[] = [];
  let evaluate: (P: readonly number[]) => RouteValues;
  let isothermTs: number[];
  let nodeSets: number[][]; // per isotherm: isochore indices (isochore route) or densities' point indices
  let sigmaPerturb: number[];
  let quadrature: DepartureSet[][] = [];
  /** Isochore route: the nominal bridge results (with truncation estimates), per isotherm. */
  let nominalBridges: IsothermDepartures[] = [];

  /** Raised to 1 once, to estimate the fit-order part of the method error (see PvtState.method). */
  let orderBump = 0;
  const distinctTs = groups.map(
    (g) => new Set(g.members.map((i) => (T[i] as number).toPrecision(10))).size,
  );
  const fitAllIsochores = (P: readonly number[]) =>
    groups.map((g, k) =>
      fitIsochore(
        g.densityMolPerM3,
        g.members.map((i) => T[i] as number),
        g.members.map((i) => (P[i] as number) + (shift[i] as number)),
        sigmaEff ? g.members.map((i) => sigmaEff?.[i] as number) : undefined,
        isochoreFits.length > 0
          ? {
              order: Math.min(
                (isochoreFits[k] as IsochoreFit).order + orderBump,
                (distinctTs[k] as number) - 1,
              ),
            }
          : options.isochore,
      ),
    );

  if (isochoreRoute) {
    isochoreFits = fitAllIsochores(P0);
    for (const f of isochoreFits)
      for (const r of f.diagnostics.recommendations)
        diagnostics.push({ code: "isochore-fit", severity: "warning", message: r });
    const maxShift = Math.max(...shift.map((s, i) => Math.abs(s) / (sigmaEff?.[i] ?? Infinity)));
    if (maxShift > 1) {
      diagnostics.push({
        code: "density-correction",
        severity: "info",
        message: `pressures were moved to their isochore's mean density by up to ${maxShift.toFixed(1)} u(P) (first-order, with the surface's (dP/drho)_T)`,
      });
    }
    const candidates = options.isothermsK
      ? options.isothermsK.map((t) => ({ temperatureK: t }))
      : clusterTemperatures(T, tolT);
    isothermTs = [];
    nodeSets = [];
    for (const c of candidates) {
      const t = c.temperatureK;
      let idx = isochoreFits
        .map((f, k) => ({ f, k }))
        .filter(({ f }) => t >= f.minTemperatureK - tolT && t <= f.maxTemperatureK + tolT)
        .map(({ k }) => k);
      // Gap check: an isochore between two nodes that was not measured at this T (its data lie
      // elsewhere in T) marks a region the campaign could not reach in one phase at T.
      if (!options.integrateAcrossGaps) {
        for (let j = 1; j < idx.length; j++) {
          const lo = (isochoreFits[idx[j - 1] as number] as IsochoreFit).densityMolPerM3;
          const hi = (isochoreFits[idx[j] as number] as IsochoreFit).densityMolPerM3;
          const missing = isochoreFits.filter(
            (f) => f.densityMolPerM3 > lo && f.densityMolPerM3 < hi,
          );
          if (missing.length > 0) {
            const m = missing[0] as IsochoreFit;
            diagnostics.push({
              code: "two-phase",
              severity: "refusal",
              message:
                `isotherm ${t.toFixed(2)} K: the isochore at ${m.densityMolPerM3.toPrecision(5)} mol/m3 lies between the nodes ${lo.toPrecision(5)} and ${hi.toPrecision(5)} mol/m3 but was measured only from ${m.minTemperatureK.toFixed(2)} to ${m.maxTemperatureK.toFixed(2)} K, ` +
                `so at ${t.toFixed(2)} K the fluid there was probably two-phase; departures above ${lo.toPrecision(5)} mol/m3 are not reported at this temperature (the data cannot be integrated through the dome). ` +
                "Reach liquid states with departuresAroundCriticalPoint (measured or modelled cv) or departuresAcrossDome (measured saturation data), or pass integrateAcrossGaps if the gap is only a gap in the campaign",
            });
            idx = idx.slice(0, j);
            break;
          }
        }
      }
      if (
        options.criticalTemperatureK !== undefined &&
        t < options.criticalTemperatureK &&
        idx.length > 1
      ) {
        let gap = 0;
        let at = 0;
        for (let j = 1; j < idx.length; j++) {
          const r =
            (isochoreFits[idx[j] as number] as IsochoreFit).densityMolPerM3 /
            (isochoreFits[idx[j - 1] as number] as IsochoreFit).densityMolPerM3;
          if (r > gap) {
            gap = r;
            at = j;
          }
        }
        diagnostics.push({
          code: "below-critical",
          severity: "warning",
          message:
            `isotherm ${t.toFixed(2)} K is below the critical temperature ${options.criticalTemperatureK} K: the route checks that P rises with density and that no measured isochore is missing at this T, but cannot see a dome between two nodes with nothing measured in between; ` +
            `make sure the widest density step (${(isochoreFits[idx[at - 1] as number] as IsochoreFit).densityMolPerM3.toPrecision(5)} to ${(isochoreFits[idx[at] as number] as IsochoreFit).densityMolPerM3.toPrecision(5)} mol/m3) does not straddle the saturated densities`,
        });
      }
      // Two-phase check: the smoothed pressure must rise with density along the isotherm.
      const Ps = idx.map((k) => (isochoreFits[k] as IsochoreFit).evaluate(t).pressurePa);
      let cut = idx.length;
      for (let j = 1; j < Ps.length; j++) {
        if (!((Ps[j] as number) > (Ps[j - 1] as number))) {
          cut = j;
          break;
        }
      }
      if (cut < idx.length) {
        const r0 = (isochoreFits[idx[cut - 1] as number] as IsochoreFit).densityMolPerM3;
        const r1 = (isochoreFits[idx[cut] as number] as IsochoreFit).densityMolPerM3;
        diagnostics.push({
          code: "two-phase",
          severity: "refusal",
          message:
            `isotherm ${t.toFixed(2)} K: the pressure does not rise between ${r0.toPrecision(5)} and ${r1.toPrecision(5)} mol/m3, so the isotherm appears to cross the two-phase region (or the data there contradict mechanical stability); ` +
            `departures above ${r0.toPrecision(5)} mol/m3 are not reported at this temperature: the data cannot be integrated through the dome. ` +
            "For states beyond it, integrate at a supercritical temperature and come down the isochore with a measured or modelled cv (departuresAroundCriticalPoint), or cross the dome with measured saturation data (departuresAcrossDome)",
        });
        idx = idx.slice(0, cut);
      }
      if (idx.length < minNodes) {
        diagnostics.push({
          code: "isotherm-skipped",
          severity: options.isothermsK ? "refusal" : "info",
          message: `isotherm ${t.toFixed(2)} K: only ${idx.length} isochore(s) cover it (at least ${minNodes} needed); not integrated`,
        });
        continue;
      }
      isothermTs.push(t);
      nodeSets.push(idx);
    }
    // Bridge weights and degrees frozen from the nominal fits.
    const nominalNodes = isothermTs.map((t, k) =>
      nodesAt(isochoreFits, nodeSets[k] as number[], t, true),
    );
    const nominalRaw = nominalNodes.map((nodes) =>
      integrateIsotherm(nodes, { gasConstant: R, bridge: options.bridge }),
    );
    nominalBridges = nominalRaw;
    const degrees = nominalRaw.map((r) => ({ a: r.bridgeA.degree, s: r.bridgeS.degree }));
    const frozenU = nominalNodes.map((nd) => ({ uP: nd.uPressurePa, uS: nd.uSlopePaPerK }));
    // Method error: quadrature estimate + bridge truncation estimate (systematic, added in quadrature to the propagated part).
    quadrature = nominalRaw.map((r, k) =>
      r.quadratureError.map((q) => {
        const t = isothermTs[k] as number;
        const RT = R * t;
        const ea = q.a + r.bridgeA.truncation;
        const es = q.s + r.bridgeS.truncation;
        return { a: ea, s: es, u: ea + t * es, h: ea + t * es, g: ea, lnPhi: ea / RT };
      }),
    );
    evaluate = (P) => {
      const fits = fitAllIsochores(P);
      const raw = isothermTs.map((t, k) => {
        const nodes = nodesAt(fits, nodeSets[k] as number[], t, false);
        return integrateIsotherm(
          {
            ...nodes,
            uPressurePa: (frozenU[k] as { uP?: readonly number[] }).uP,
            uSlopePaPerK: (frozenU[k] as { uS?: readonly number[] }).uS,
          },
          {
            gasConstant: R,
            bridge: { ...options.bridge, estimateTruncation: false },
            bridgeDegrees: degrees[k],
          },
        );
      });
      return {
        pressures: raw.map((r, k) =>
          (nodeSets[k] as number[]).map(
            (j) => (fits[j] as IsochoreFit).evaluate(r.temperatureK).pressurePa,
          ),
        ),
        departures: raw.map((r) => r.departures),
        B: raw.map((r) => r.B),
        C: raw.map((r) => r.C),
        raw,
      };
    };
    // Perturbation sigma per point: stated (Birge-enlarged by its isochore) or the isochore's scatter.
    sigmaPerturb = new Array<number>(n).fill(0);
    const surfRed =
      surfaceFit.diagnostics.degreesOfFreedom > 0 ? surfaceFit.diagnostics.reducedChiSquare : 1;
    for (let i = 0; i < n; i++) {
      sigmaPerturb[i] = sigmaEff
        ? (sigmaEff[i] as number) * Math.sqrt(Math.max(1, surfRed))
        : (P0[i] as number) * Math.sqrt(surfRed);
    }
    groups.forEach((g, k) =>
      g.members.forEach(
        (i, j) => (sigmaPerturb[i] = (isochoreFits[k] as IsochoreFit).sigmaPa[j] as number),
      ),
    );
  } else {
    // Surface route: nodes are the measured densities at each isotherm.
    const clusters = options.isothermsK
      ? options.isothermsK.map((t) => ({ temperatureK: t, members: pts.map((_, i) => i) }))
      : clusterTemperatures(T, tolT);
    isothermTs = [];
    nodeSets = [];
    for (const c of clusters) {
      const dens = [...new Set(c.members.map((i) => rho[i] as number))].sort((a, b) => a - b);
      if (dens.length < 1) continue;
      const idx = dens.map((d) => c.members.find((i) => rho[i] === d) as number);
      isothermTs.push(c.temperatureK);
      nodeSets.push(idx);
    }
    const surfSigma = sigmaEff;
    const { minTemperatureK: tLo, maxTemperatureK: tHi } = surfaceFit.surface.range;
    for (const t of isothermTs) {
      if (!(t >= tLo - tolT && t <= tHi + tolT)) {
        diagnostics.push({
          code: "extrapolated",
          severity: "warning",
          message: `isotherm ${t.toFixed(2)} K lies outside the measured temperatures (${tLo.toFixed(2)} to ${tHi.toFixed(2)} K): its departures are an extrapolation of the surface fit`,
        });
      }
    }
    const distinctTemperatures = new Set(T.map((t) => t.toPrecision(8))).size;
    evaluate = (P) => {
      const frozen = {
        ...options.surface,
        gasConstant: R,
        densityTerms: surfaceOrder.densityTerms + orderBump,
        temperatureTerms: Math.min(surfaceOrder.temperatureTerms + orderBump, distinctTemperatures),
      };
      const s =
        P === P0 && orderBump === 0
          ? surfaceFit
          : fitVirialSurface(
              surfacePoints(P),
              surfSigma ? kept.map((i) => surfSigma[i] as number) : undefined,
              frozen,
            );
      const sf = s.surface;
      return {
        pressures: isothermTs.map((t, k) =>
          (nodeSets[k] as number[]).map((i) => {
            const d = surfaceDerivatives(sf, t, rho[i] as number);
            return (rho[i] as number) * R * t * (1 + d.aD);
          }),
        ),
        departures: isothermTs.map((t, k) =>
          (nodeSets[k] as number[]).map((i) =>
            departuresFromReduced(t, surfaceDerivatives(sf, t, rho[i] as number), R),
          ),
        ),
        B: isothermTs.map((t) => virialFromSurface(sf, t, 1)),
        C: isothermTs.map((t) => (sf.densityTerms >= 2 ? virialFromSurface(sf, t, 2) : undefined)),
      };
    };
    const red =
      surfaceFit.diagnostics.degreesOfFreedom > 0 ? surfaceFit.diagnostics.reducedChiSquare : 1;
    sigmaPerturb = pts.map((p, i) =>
      sigmaEff
        ? (sigmaEff[i] as number) * Math.sqrt(Math.max(1, red))
        : p.pressurePa * Math.sqrt(red),
    );
    quadrature = nodeSets.map((set) => set.map(() => ({ a: 0, s: 0, u: 0, h: 0, g: 0, lnPhi: 0 })));
    // Two-phase check along each isotherm on the surface.
    isothermTs.forEach((t, k) => {
      const set = nodeSets[k] as number[];
      const bad = set.filter((i) => !(slopeRho(surfaceFit.surface, t, rho[i] as number) > 0));
      if (bad.length > 0) {
        diagnostics.push({
          code: "two-phase",
          severity: "warning",
          message: `isotherm ${t.toFixed(2)} K: the fitted surface has (dP/drho)_T <= 0 at ${bad.length} node(s): mechanically unstable; the isotherm may cross the two-phase region and those departures are not meaningful`,
        });
      }
    });
    diagnostics.push({
      code: "route",
      severity: "info",
      message: `route "surface": fewer than 3 isochores with ${minT}+ temperatures; departures from the fitted virial-type surface (${surfaceOrder.densityTerms} density x ${surfaceOrder.temperatureTerms} temperature terms), valid only inside the fitted range`,
    });
  }

  const nominal = evaluate(P0);
  const nominalFlat = flatten(nominal);
  if (!stated || !isochoreRoute) {
    orderBump = 1;
    let bumped: number[] | undefined;
    try {
      bumped = flatten(evaluate(P0));
    } catch {
      bumped = undefined; // a higher order is not admissible everywhere: no estimate, said below
    }
    orderBump = 0;
    if (bumped) {
      let at = 0;
      nominal.departures.forEach((iso, k) => {
        iso.forEach((_, j) => {
          const q = (quadrature[k] as DepartureSet[])[j] as DepartureSet;
          for (const [m, key] of DEPARTURE_KEYS.entries()) {
            q[key] = Math.hypot(
              q[key],
              (bumped[at + m] as number) - (nominalFlat[at + m] as number),
            );
          }
          at += DEPARTURE_KEYS.length;
        });
        at += 2;
      });
    } else {
      diagnostics.push({
        code: "fit-order-estimate",
        severity: "info",
        message:
          "no u(P) stated and the fit orders cannot be raised by one: the uncertainty rests on the scatter alone",
      });
    }
  }
  const mc =
    mcSamples > 0
      ? monteCarloPropagation((P) => flatten(evaluate(P)), P0, sigmaPerturb, mcSamples, seed)
      : undefined;
  const lin =
    wantLinear || !mc
      ? linearisedPropagation((P) => flatten(evaluate(P)), P0, sigmaPerturb, nominalFlat)
      : undefined;
  const primary = (mc ?? lin)?.standardUncertainty ?? [];

  // Assemble.
  const isotherms: PvtIsotherm[] = [];
  let cursor = 0;
  const take = (arr: number[] | undefined, start: number): DepartureSet | undefined =>
    arr
      ? (Object.fromEntries(
          DEPARTURE_KEYS.map((key, j) => [key, arr[start + j] as number]),
        ) as unknown as DepartureSet)
      : undefined;
  let worstRatio = 0;
  nominal.departures.forEach((iso, k) => {
    const t = isothermTs[k] as number;
    const states: PvtState[] = iso.map((d, j) => {
      const at = cursor;
      cursor += DEPARTURE_KEYS.length;
      const prop = take(primary, at) as DepartureSet;
      const quad = (quadrature[k] as DepartureSet[])[j] as DepartureSet;
      const uncertainty = Object.fromEntries(
        DEPARTURE_KEYS.map((key) => [key, Math.hypot(prop[key], quad[key])]),
      ) as unknown as DepartureSet;
      const m = take(mc?.standardUncertainty, at);
      const l = take(lin?.standardUncertainty, at);
      if (m && l && l.s > 0) worstRatio = Math.max(worstRatio, Math.abs(m.s / l.s - 1));
      return {
        densityMolPerM3: isochoreRoute
          ? (isochoreFits[(nodeSets[k] as number[])[j] as number] as IsochoreFit).densityMolPerM3
          : (rho[(nodeSets[k] as number[])[j] as number] as number),
        pressurePa: (nominal.pressures[k] as number[])[j] as number,
        residual: d,
        uncertainty,
        ...(m ? { monteCarlo: m } : {}),
        ...(l ? { linearised: l } : {}),
        method: quad,
      };
    });
    // B: propagated part, and in the isochore route the bridge's own (fit + truncation) estimate.
    const uB = Math.hypot(primary[cursor] as number, nominalBridges[k]?.uB ?? 0);
    const uC = primary[cursor + 1] as number;
    cursor += 2;
    const raw = nominalBridges[k];
    const Cv = nominal.C[k];
    isotherms.push({
      temperatureK: t,
      states,
      B: nominal.B[k] as number,
      uB,
      ...(Cv !== undefined ? { C: Cv, uC } : {}),
      ...(raw
        ? {
            bridge: {
              toDensityMolPerM3: raw.bridgeA.toDensity,
              aJPerMol: raw.bridgeA.integral,
              uAJPerMol: raw.bridgeA.uIntegral,
              sJPerMolK: raw.bridgeS.integral,
              uSJPerMolK: raw.bridgeS.uIntegral,
              degree: raw.bridgeA.degree,
            },
          }
        : {}),
    });
  });
  if (mc && lin && worstRatio > 0.3) {
    diagnostics.push({
      code: "uncertainty-methods",
      severity: "info",
      message: `Monte Carlo and linearised uncertainties of s_res differ by up to ${(100 * worstRatio).toFixed(0)} % (Monte Carlo reported; the difference shrinks with more samples, or reveals a nonlinear route)`,
    });
  }
  if (isochoreRoute) {
    if (surfaceFit.diagnostics.runs.z < -2) {
      diagnostics.push({
        code: "maxwell-consistency",
        severity: "info",
        message:
          "the global surface itself shows a residual pattern, so the slope cross-check against it is inconclusive (raise the surface order with options.surface, or add data)",
      });
    } else
      diagnostics.push(
        ...slopeConsistency(isochoreFits, surfaceFit.surface, isothermTs, nodeSets, slopeT, R),
      );
  }
  if (routeSetAside.length > 0) {
    diagnostics.push({
      code: "set-aside",
      severity: routeSetAside.some((s) => s.reason.startsWith("outlier")) ? "warning" : "info",
      message:
        `${routeSetAside.length} point(s) set aside by the route: ` +
        routeSetAside.map((s) => `line ${s.line} (${s.reason})`).join("; "),
    });
  }
  if (dataset.setAside.length > 0) {
    diagnostics.push({
      code: "set-aside",
      severity: "info",
      message:
        `${dataset.setAside.length} point(s) set aside at import: ` +
        dataset.setAside.map((s) => `line ${s.line} (${s.reason})`).join("; "),
    });
  }
  return {
    route: isochoreRoute ? "isochores" : "surface",
    isotherms,
    surfaceFit,
    isochoreFits,
    diagnostics,
    setAside: [...dataset.setAside, ...routeSetAside],
    uncertaintyMethod: {
      ...(mc ? { monteCarlo: { seed, samples: mc.samples } } : {}),
      linearised: lin !== undefined,
      sigmaSource: stated ? "stated" : "from-scatter",
    },
    gasConstant: R,
  };
}

function nodesAt(
  fits: readonly IsochoreFit[],
  idx: readonly number[],
  t: number,
  withU: boolean,
): IsothermNodes {
  const ev = idx.map((k) => (fits[k] as IsochoreFit).evaluate(t));
  return {
    temperatureK: t,
    densityMolPerM3: idx.map((k) => (fits[k] as IsochoreFit).densityMolPerM3),
    pressurePa: ev.map((e) => e.pressurePa),
    slopePaPerK: ev.map((e) => e.slopePaPerK),
    ...(withU && ev.every((e) => e.uPressurePa > 0 && e.uSlopePaPerK > 0)
      ? { uPressurePa: ev.map((e) => e.uPressurePa), uSlopePaPerK: ev.map((e) => e.uSlopePaPerK) }
      : {}),
  };
}

/** k-th virial coefficient of the surface at T: sum_j b_kj tau^j / rhoScale^k (m3/mol for k = 1). */
export function virialFromSurface(s: VirialSurface, temperatureK: number, k: number): number {
  const tau = s.temperatureScale / temperatureK;
  let v = 0;
  for (let j = 0; j < s.temperatureTerms; j++)
    v += (s.coefficients[(k - 1) * s.temperatureTerms + j] as number) * tau ** j;
  return v / s.densityScale ** k;
}

/**
 * Maxwell-consistency check between two independent smoothings of the same data: the isochoric
 * slope of each isochore fit against the global surface's (dP/dT)_rho at the same (T, rho). Where
 * they differ by more than the family threshold (familyThreshold.ts: at least 3 combined standard
 * uncertainties, more when many nodes are checked) the data contradict the smooth Helmholtz
 * surface (a local step, a bad isochore, or a surface order too low there).
 */
function slopeConsistency(
  fits: readonly IsochoreFit[],
  surface: VirialSurface,
  Ts: readonly number[],
  nodeSets: readonly number[][],
  slopeT: (s: VirialSurface, t: number, r: number) => number,
  gasConstant: number,
): PvtDiagnostic[] {
  const flagged: string[] = [];
  let checked = 0;
  const zMax = familyThreshold(nodeSets.reduce((acc, set) => acc + set.length, 0));
  Ts.forEach((t, k) => {
    for (const j of nodeSets[k] as number[]) {
      const f = fits[j] as IsochoreFit;
      const e = f.evaluate(t);
      const r = f.densityMolPerM3;
      const sS = slopeT(surface, t, r);
      const g = surfaceBasis(surface, "aD", t, r).map(
        (v, q) => r * gasConstant * (v + (surfaceBasis(surface, "aDT", t, r)[q] as number)),
      );
      const uS = Math.sqrt(surfaceVariance(surface, g));
      const u = Math.hypot(e.uSlopePaPerK, uS);
      checked++;
      if (u > 0 && Math.abs(e.slopePaPerK - sS) > zMax * u)
        flagged.push(
          `${t.toFixed(2)} K, ${r.toPrecision(5)} mol/m3 (${((e.slopePaPerK - sS) / u).toFixed(1)} u)`,
        );
    }
  });
  if (flagged.length === 0) {
    return [
      {
        code: "maxwell-consistency",
        severity: "info",
        message: `isochoric slopes of the isochore fits agree with the global surface within ${zMax.toFixed(2)} u (family threshold for ${checked} checks) at all ${checked} nodes`,
      },
    ];
  }
  return [
    {
      code: "maxwell-consistency",
      severity: "warning",
      message: `isochoric slopes disagree with the global surface by more than ${zMax.toFixed(2)} u (family threshold for ${checked} checks) at ${flagged.length} of ${checked} nodes: ${flagged.slice(0, 8).join("; ")}${flagged.length > 8 ? "; ..." : ""}. The data contradict a smooth Helmholtz surface there, or the surface order is too low`,
    },
  ];
}

/** Refuses options that would give NaN or silent nonsense, naming the option and its range. */
function checkRouteOptions(o: PvtRouteOptions): void {
  const bad = (input: string, unit: string, validRange: string, received: unknown) => {
    throw new InputError({ input: `options.${input}`, unit, validRange, received });
  };
  if (o.route !== undefined && !["auto", "isochores", "surface"].includes(o.route)) {
    bad("route", "-", '"auto", "isochores" or "surface"', o.route);
  }
  o.isothermsK?.forEach((t, i) => {
    if (!(t > 0 && t < Infinity)) bad(`isothermsK[${i}]`, "K", "a finite number > 0", t);
  });
  if (
    o.isothermToleranceK !== undefined &&
    !(o.isothermToleranceK >= 0 && o.isothermToleranceK < Infinity)
  ) {
    bad("isothermToleranceK", "K", "a finite number >= 0", o.isothermToleranceK);
  }
  if (
    o.isochoreTolerance !== undefined &&
    !(o.isochoreTolerance >= 0 && o.isochoreTolerance < 0.1)
  ) {
    bad("isochoreTolerance", "-", "a relative tolerance from 0 to 0.1", o.isochoreTolerance);
  }
  for (const key of ["minIsochoreTemperatures", "minIsothermNodes"] as const) {
    const v = o[key];
    if (v !== undefined && !(Number.isInteger(v) && v >= 2)) bad(key, "-", "an integer >= 2", v);
  }
  if (
    o.monteCarloSamples !== undefined &&
    !(Number.isInteger(o.monteCarloSamples) && o.monteCarloSamples >= 0)
  ) {
    bad("monteCarloSamples", "-", "an integer >= 0 (0 = linearised only)", o.monteCarloSamples);
  }
  if (o.seed !== undefined && !(Number.isInteger(o.seed) && o.seed >= 0 && o.seed < 2 ** 32)) {
    bad("seed", "-", "an integer in [0, 2^32)", o.seed);
  }
  if (o.outlierThreshold !== undefined && !(o.outlierThreshold > 0)) {
    bad(
      "outlierThreshold",
      "u(P)",
      "a number > 0 (Infinity turns the screening off)",
      o.outlierThreshold,
    );
  }
  if (o.gasConstant !== undefined && !(o.gasConstant > 0 && o.gasConstant < Infinity)) {
    bad("gasConstant", "J/(mol K)", "a finite number > 0", o.gasConstant);
  }
  if (
    o.criticalTemperatureK !== undefined &&
    !(o.criticalTemperatureK > 0 && o.criticalTemperatureK < Infinity)
  ) {
    bad("criticalTemperatureK", "K", "a finite number > 0", o.criticalTemperatureK);
  }
}
