/**
 * The whole P-V-T route, from an imported data set to residual properties with uncertainties, one
 * stage per file:
 *
 *   points --(1) routeSurfaceStage.ts: global surface fit (virial-type, fitVirialSurface.ts),
 *            effective variances, density corrections, a second opinion on every slope
 *          --(2) routeIsochoreStage.ts: isochore groups, leave-one-out outlier screen, isochore
 *            fits (isochoreFit.ts): P and (dP/dT)_rho on each isochore
 *          --(3) routeIsothermStage.ts: isotherms and their nodes; gap and two-phase checks
 *          --(4) routeIntegrateStage.ts: integrateIsotherm.ts (low-density bridge + irregular
 *            quadrature) -> a, s, u, h, g, ln phi, with the bridges frozen
 *          --(5) routePropagateStage.ts: Monte Carlo (seeded) and linearised, + method error
 *          --(6) routeDiagnostics.ts: fit quality, sparseness, two-phase refusals, slope checks
 *
 * Route "isochores" needs at least 3 isochores with 3 or more temperatures each; otherwise (data on
 * isotherms, or scattered) route "surface" takes the departures from the fitted surface itself,
 * whose residual Helmholtz energy is closed-form (virialSurface.ts). Every stage costs time
 * proportional to the number of points (the linearised estimate and the Monte Carlo replicates
 * reuse the fits' linear maps instead of refitting), and reports its progress through
 * `options.onProgress`.
 */
import { R as CODATA_R } from "../constants.js";
import { InputError } from "../errors.js";
import { checkRouteOptions } from "./checkRouteOptions.js";
import { DEPARTURE_KEYS } from "./departureSet.js";
import type { DepartureSet } from "./departureSet.js";
import { fitVirialSurface } from "./fitVirialSurface.js";
import { clusterTemperatures } from "./groupIsochores.js";
import type { IsochoreGroup } from "./groupIsochores.js";
import type { IsochoreFit } from "./isochoreFit.js";
import type { IsothermDepartures } from "./integrateIsotherm.js";
import { report } from "./routeContext.js";
import type { RouteContext } from "./routeContext.js";
import { setAsideDiagnostic, slopeConsistency } from "./routeDiagnostics.js";
import {
  evaluateFrozen,
  flattenValues,
  integrateIsochoreRoute,
  surfaceRouteValues,
} from "./routeIntegrateStage.js";
import type { RouteValues } from "./routeIntegrateStage.js";
import {
  densityShifts,
  fitRouteIsochores,
  routeIsochoreGroups,
  screenIsochoreOutliers,
} from "./routeIsochoreStage.js";
import { planIsochoreIsotherms, planSurfaceIsotherms } from "./routeIsothermStage.js";
import type { IsothermPlan } from "./routeIsothermStage.js";
import { propagateIsochoreRoute, propagateSurfaceRoute } from "./routePropagateStage.js";
import type { Propagated } from "./routePropagateStage.js";
import { fitRouteSurface, surfacePoints } from "./routeSurfaceStage.js";
import type { PvtIsotherm, PvtRouteOptions, PvtRouteResult, PvtState } from "./routeTypes.js";
import type { PvtDataset, SetAsidePoint } from "./types.js";

export type {
  PvtIsotherm,
  PvtRouteOptions,
  PvtRouteProgress,
  PvtRouteResult,
  PvtRouteStage,
  PvtState,
} from "./routeTypes.js";
export { virialFromSurface } from "./virialSurface.js";

/**
 * Residual (departure) properties with standard uncertainties from measured P-V-T data.
 * @param dataset points from parsePvtCsv, readPvtCsvFile or pvtFromArrays (at least 6, at 2 or
 *   more temperatures)
 * @param options route, isotherms, fit and uncertainty settings (PvtRouteOptions; all defaulted)
 * @example
 * const result = departuresFromPvt(pvtFromArrays({ temperatureK, densityMolPerM3, pressurePa }));
 * result.isotherms[0].states[0].residual.h; // J/mol, with .uncertainty.h beside it
 */
export function departuresFromPvt(
  dataset: PvtDataset,
  options: PvtRouteOptions = {},
): PvtRouteResult {
  const R = options.gasConstant ?? CODATA_R;
  const pts = dataset.points;
  const n = pts.length;
  if (!(n >= 6)) {
    throw new InputError({
      input: `${dataset.source} points`,
      unit: "-",
      validRange: "at least 6 accepted points",
      received: n,
    });
  }
  checkRouteOptions(options);
  const context: RouteContext = {
    points: pts,
    temperatureK: pts.map((p) => p.temperatureK),
    densityMolPerM3: pts.map((p) => p.densityMolPerM3),
    pressurePa: pts.map((p) => p.pressurePa),
    gasConstant: R,
    stated: pts.every((p) => p.uPressurePa !== undefined),
    options,
    diagnostics: [],
  };
  const { diagnostics, stated, temperatureK: T, pressurePa: P0 } = context;
  if (!stated && pts.some((p) => p.uPressurePa !== undefined)) {
    diagnostics.push({
      code: "partial-uncertainties",
      severity: "warning",
      message:
        "u(P) is given for some points only: all points were weighted equally and the uncertainty taken from the scatter",
    });
  }
  const tolT = options.isothermToleranceK ?? 0.05;
  const temperatureClusters = clusterTemperatures(T, tolT).length;
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

  // (1) Surface, on every point first; refitted on the points kept by the screening in (2), so a
  // point set aside there does not inflate the surface, its reduced chi-square, or the
  // uncertainties scaled by it.
  report(context, "surface fit", 0, 1, "fits");
  let kept: number[] = pts.map((_, i) => i);
  let surfaceStage = fitRouteSurface(context, kept);
  report(context, "surface fit", 1, 1, "fits");

  // (2) Isochores, with the leave-one-out screen (stated u(P) only).
  const minT = options.minIsochoreTemperatures ?? 3;
  const groups = routeIsochoreGroups(context);
  const wantRoute = options.route ?? "auto";
  const isochoreRoute = wantRoute === "isochores" || (wantRoute === "auto" && groups.length >= 3);
  const threshold = options.outlierThreshold ?? 4.5;
  let routeSetAside: SetAsidePoint[] = [];
  if (surfaceStage.sigmaEff && Number.isFinite(threshold) && isochoreRoute) {
    routeSetAside = screenIsochoreOutliers(context, groups, surfaceStage.sigmaEff, threshold);
    if (routeSetAside.length > 0) {
      const out = new Set(routeSetAside.map((s) => s.line));
      kept = kept.filter((i) => !out.has(pts[i].line));
      surfaceStage = fitRouteSurface(context, kept);
    }
  }
  const surfaceFit = surfaceStage.fit;
  const sigmaEff = surfaceStage.sigmaEff;
  for (const r of surfaceFit.diagnostics.recommendations)
    diagnostics.push({ code: "surface-fit", severity: "warning", message: r });
  if (isochoreRoute)
    routeSetAside = routeSetAside.concat(offIsochorePoints(context, groups, routeSetAside, minT));
  if (wantRoute === "isochores" && groups.length < 3) {
    throw new InputError({
      input: "route",
      unit: "-",
      validRange: `"isochores" needs at least 3 isochores with ${minT} or more temperatures each`,
      received: `${groups.length} such isochores`,
      hint: 'use route "surface" (or "auto") for data on isotherms or scattered data',
    });
  }
  const settings = {
    monteCarloSamples: options.monteCarloSamples ?? 200,
    seed: options.seed ?? 20261201,
    linearised: options.linearised ?? true,
  };
  const surfaceRed =
    surfaceFit.diagnostics.degreesOfFreedom > 0 ? surfaceFit.diagnostics.reducedChiSquare : 1;
  // Perturbation sigma per point: the effective u(P), Birge-enlarged by the surface, or the scatter.
  const sigmaPerturb = P0.map((p, i) =>
    sigmaEff ? sigmaEff[i] * Math.sqrt(Math.max(1, surfaceRed)) : p * Math.sqrt(surfaceRed),
  );

  let isochoreFits: IsochoreFit[] = [];
  let plan: IsothermPlan;
  let nominal: RouteValues;
  let method: DepartureSet[][];
  let bridges: IsothermDepartures[] = [];
  let orderBumped: () => RouteValues;
  let propagate: () => Propagated;
  if (isochoreRoute) {
    const shift = densityShifts(context, groups, surfaceFit.surface);
    isochoreFits = fitRouteIsochores(context, groups, shift, sigmaEff);
    for (const f of isochoreFits)
      for (const r of f.diagnostics.recommendations)
        diagnostics.push({ code: "isochore-fit", severity: "warning", message: r });
    let maxShift = 0;
    if (sigmaEff)
      shift.forEach((s, i) => (maxShift = Math.max(maxShift, Math.abs(s) / sigmaEff[i])));
    if (maxShift > 1) {
      diagnostics.push({
        code: "density-correction",
        severity: "info",
        message: `pressures were moved to their isochore's mean density by up to ${maxShift.toFixed(1)} u(P) (first-order, with the surface's (dP/drho)_T)`,
      });
    }
    // (3) Isotherms, (4) integration.
    const isothermPlan = planIsochoreIsotherms(context, isochoreFits);
    plan = isothermPlan;
    const integrated = integrateIsochoreRoute(context, isochoreFits, isothermPlan);
    report(
      context,
      "isotherms",
      isothermPlan.temperaturesK.length,
      isothermPlan.temperaturesK.length,
      "isotherms",
    );
    nominal = integrated.values;
    method = integrated.method;
    bridges = integrated.integrations;
    const fits = isochoreFits;
    orderBumped = () => {
      const raised = fits.map((f) =>
        f.refit({ order: Math.min(f.order + 1, f.distinctTemperatures - 1) }),
      );
      return evaluateFrozen(context, integrated.frozen, (k, t) => raised[k].evaluate(t));
    };
    // Perturbation sigma of the points on the isochores: their fit's (stated, Birge-enlarged, or scatter).
    groups.forEach((g, k) => g.members.forEach((i, j) => (sigmaPerturb[i] = fits[k].sigmaPa[j])));
    propagate = () =>
      propagateIsochoreRoute(context, groups, fits, integrated, {
        ...settings,
        sigmaPa: sigmaPerturb,
      });
  } else {
    const isothermPlan = planSurfaceIsotherms(context, surfaceFit.surface);
    plan = isothermPlan;
    const order = {
      densityTerms: surfaceFit.surface.densityTerms,
      temperatureTerms: surfaceFit.surface.temperatureTerms,
    };
    diagnostics.push({
      code: "route",
      severity: "info",
      message: `route "surface": fewer than 3 isochores with ${minT}+ temperatures; departures from the fitted virial-type surface (${order.densityTerms} density x ${order.temperatureTerms} temperature terms), valid only inside the fitted range`,
    });
    nominal = surfaceRouteValues(context, surfaceFit.surface, isothermPlan);
    report(
      context,
      "isotherms",
      isothermPlan.temperaturesK.length,
      isothermPlan.temperaturesK.length,
      "isotherms",
    );
    method = nominal.departures.map((iso) => iso.map(() => zeroSet()));
    const fitSigma = sigmaEff ? kept.map((i) => sigmaEff[i]) : undefined;
    const distinctT = new Set(T.map((t) => t.toPrecision(8))).size;
    const keptNow = kept;
    orderBumped = () =>
      surfaceRouteValues(
        context,
        fitVirialSurface(surfacePoints(context, keptNow, P0), fitSigma, {
          ...options.surface,
          gasConstant: R,
          densityTerms: order.densityTerms + 1,
          temperatureTerms: Math.min(order.temperatureTerms + 1, distinctT),
        }).surface,
        isothermPlan,
      );
    propagate = () =>
      propagateSurfaceRoute(context, keptNow, surfaceFit, fitSigma, isothermPlan, {
        ...settings,
        sigmaPa: sigmaPerturb,
      });
  }

  // (5) Method error from the fit orders (see PvtState.method), then the propagated part.
  const nominalFlat = flattenValues(nominal);
  if (!stated || !isochoreRoute) {
    let bumped: Float64Array | undefined;
    try {
      bumped = flattenValues(orderBumped());
    } catch {
      bumped = undefined; // a higher order is not admissible everywhere: no estimate, said below
    }
    if (bumped) addOrderChange(method, nominal, nominalFlat, bumped);
    else {
      diagnostics.push({
        code: "fit-order-estimate",
        severity: "info",
        message:
          "no u(P) stated and the fit orders cannot be raised by one: the uncertainty rests on the scatter alone",
      });
    }
  }
  const propagated = propagate();

  // Assemble.
  const { isotherms, worstRatio } = assemble(
    context,
    plan,
    nominal,
    method,
    bridges,
    propagated,
    isochoreFits,
    isochoreRoute,
  );
  if (propagated.monteCarlo && propagated.linearised && worstRatio > 0.3) {
    diagnostics.push({
      code: "uncertainty-methods",
      severity: "info",
      message: `Monte Carlo and linearised uncertainties of s_res differ by up to ${(100 * worstRatio).toFixed(0)} % (Monte Carlo reported; the difference shrinks with more samples, or reveals a nonlinear route)`,
    });
  }
  // (6) Whole-result diagnostics.
  if (isochoreRoute) {
    if (surfaceFit.diagnostics.runs.z < -2) {
      diagnostics.push({
        code: "maxwell-consistency",
        severity: "info",
        message:
          "the global surface itself shows a residual pattern, so the slope cross-check against it is inconclusive (raise the surface order with options.surface, or add data)",
      });
    } else diagnostics.push(slopeConsistency(isochoreFits, surfaceFit.surface, plan, R));
  }
  for (const d of [
    setAsideDiagnostic(routeSetAside, "by the route"),
    setAsideDiagnostic(dataset.setAside, "at import"),
  ])
    if (d) diagnostics.push(d);
  return {
    route: isochoreRoute ? "isochores" : "surface",
    isotherms,
    surfaceFit,
    isochoreFits,
    diagnostics,
    setAside: [...dataset.setAside, ...routeSetAside],
    uncertaintyMethod: {
      ...(propagated.monteCarlo
        ? { monteCarlo: { seed: settings.seed, samples: propagated.samples } }
        : {}),
      linearised: propagated.linearised !== undefined,
      sigmaSource: stated ? "stated" : "from-scatter",
    },
    gasConstant: R,
  };
}

function zeroSet(): DepartureSet {
  return { a: 0, s: 0, u: 0, h: 0, g: 0, lnPhi: 0 };
}

/** The departures of one node from a flattened list, starting at `start`. */
function setAt(values: ArrayLike<number>, start: number): DepartureSet {
  return {
    a: values[start],
    s: values[start + 1],
    u: values[start + 2],
    h: values[start + 3],
    g: values[start + 4],
    lnPhi: values[start + 5],
  };
}

/** Points in no fitted isochore (and not set aside already): used by the surface fit only. */
function offIsochorePoints(
  context: RouteContext,
  groups: readonly IsochoreGroup[],
  setAside: readonly SetAsidePoint[],
  minT: number,
): SetAsidePoint[] {
  const used = new Set<number>();
  for (const g of groups) for (const i of g.members) used.add(i);
  const out = new Set(setAside.map((s) => s.line));
  const list: SetAsidePoint[] = [];
  context.points.forEach((p, i) => {
    if (!used.has(i) && !out.has(p.line)) {
      list.push({
        line: p.line,
        temperatureK: p.temperatureK,
        densityMolPerM3: p.densityMolPerM3,
        pressurePa: p.pressurePa,
        reason: `not on an isochore with ${minT} or more temperatures: used in the global surface fit only`,
      });
    }
  });
  return list;
}

/** Adds (in quadrature) the change of every departure when the fit orders are raised by one. */
function addOrderChange(
  method: DepartureSet[][],
  nominal: RouteValues,
  nominalFlat: ArrayLike<number>,
  bumped: ArrayLike<number>,
): void {
  let at = 0;
  nominal.departures.forEach((iso, k) => {
    iso.forEach((_, j) => {
      const q = method[k][j];
      DEPARTURE_KEYS.forEach((key, m) => {
        q[key] = Math.hypot(q[key], bumped[at + m] - nominalFlat[at + m]);
      });
      at += DEPARTURE_KEYS.length;
    });
    at += 2;
  });
}

/** The reported isotherms from the nominal values, the method error and the propagated part. */
function assemble(
  context: RouteContext,
  plan: IsothermPlan,
  nominal: RouteValues,
  method: DepartureSet[][],
  bridges: readonly IsothermDepartures[],
  propagated: Propagated,
  isochoreFits: readonly IsochoreFit[],
  isochoreRoute: boolean,
): { isotherms: PvtIsotherm[]; worstRatio: number } {
  const mc = propagated.monteCarlo;
  const lin = propagated.linearised;
  const primary = mc ?? lin ?? [];
  const isotherms: PvtIsotherm[] = [];
  let cursor = 0;
  let worstRatio = 0;
  nominal.departures.forEach((iso, k) => {
    const nodes = plan.nodeSets[k];
    const states: PvtState[] = iso.map((d, j) => {
      const at = cursor;
      cursor += DEPARTURE_KEYS.length;
      const prop = setAt(primary, at);
      const quad = method[k][j];
      const uncertainty = zeroSet();
      for (const key of DEPARTURE_KEYS) uncertainty[key] = Math.hypot(prop[key], quad[key]);
      const m = mc ? setAt(mc, at) : undefined;
      const l = lin ? setAt(lin, at) : undefined;
      if (m && l && l.s > 0) worstRatio = Math.max(worstRatio, Math.abs(m.s / l.s - 1));
      return {
        densityMolPerM3: isochoreRoute
          ? isochoreFits[nodes[j]].densityMolPerM3
          : context.densityMolPerM3[nodes[j]],
        pressurePa: nominal.pressures[k][j],
        residual: d,
        uncertainty,
        ...(m ? { monteCarlo: m } : {}),
        ...(l ? { linearised: l } : {}),
        method: quad,
      };
    });
    // B: propagated part, and in the isochore route the bridge's own (fit + truncation) estimate.
    const raw = bridges[k];
    const uB = Math.hypot(primary[cursor], raw?.uB ?? 0);
    const uC = primary[cursor + 1];
    cursor += 2;
    const Cv = nominal.C[k];
    isotherms.push({
      temperatureK: plan.temperaturesK[k],
      states,
      B: nominal.B[k],
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
  return { isotherms, worstRatio };
}
