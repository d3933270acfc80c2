/**
 * Stage 5 of the P-V-T route: propagation of the pressure uncertainties through the frozen route
 * (propagateUncertainty.ts for the methods and their sources).
 *
 * Every fit of the frozen route is linear in the pressures, so a Monte Carlo replicate does not
 * refit: it moves each fit by the fit of the pressure deltas (IsochoreFit.shifted, or C X^T W dy
 * for the surface), which is the refit up to rounding, at a cost proportional to the number of
 * points. The linearised estimate sums, instead of one one-sigma step per point, the exactly
 * equivalent quadratic form of the fits' covariances (which are M diag(sigma^2) M^T for the fits'
 * linear maps M and the same sigmas): per isotherm in linear time on the isochore route
 * (linearisedIsotherm.ts), along the columns of the coefficient covariance's Cholesky factor on
 * the surface route.
 */
import { choleskySemidefinite } from "../numerics/cholesky.js";
import { monteCarloPropagation } from "./propagateUncertainty.js";
import type { IsochoreGroup } from "./groupIsochores.js";
import type { IsochoreFit } from "./isochoreFit.js";
import { linearisedIsotherm } from "./linearisedIsotherm.js";
import { report } from "./routeContext.js";
import type { RouteContext } from "./routeContext.js";
import { freezeIsotherm } from "./integrateIsotherm.js";
import { flattenValues, surfaceRouteValues } from "./routeIntegrateStage.js";
import type { IsochoreRouteNominal } from "./routeIntegrateStage.js";
import type { IsothermPlan } from "./routeIsothermStage.js";
import type { VirialSurfaceFit } from "./fitVirialSurface.js";
import { surfaceBasis } from "./virialSurface.js";

/** Standard uncertainties of the flattened route values (routeIntegrateStage.ts order). */
export interface Propagated {
  monteCarlo?: number[];
  linearised?: number[];
  samples: number;
}

/** What to propagate and how. */
export interface PropagationSettings {
  /** Standard deviation of every point's pressure, Pa. */
  sigmaPa: readonly number[];
  monteCarloSamples: number;
  seed: number;
  linearised: boolean;
}

/** Isochore route: Monte Carlo through the shifted isochore fits, linearised per isotherm. */
export function propagateIsochoreRoute(
  context: RouteContext,
  groups: readonly IsochoreGroup[],
  fits: readonly IsochoreFit[],
  nominal: IsochoreRouteNominal,
  settings: PropagationSettings,
): Propagated {
  const P0 = context.pressurePa;
  const samples = settings.monteCarloSamples;
  let done = 0;
  const maps = nominal.frozen.map((f) =>
    freezeIsotherm(f.temperatureK, f.densityMolPerM3, f.bridges, context.gasConstant),
  );
  const length = maps.reduce((sum, m) => sum + m.length, 0);
  // Buffers reused by every replicate (the replicate's values are consumed before the next one).
  const deltas = groups.map((g) => new Float64Array(g.members.length));
  const nodePressures = nominal.frozen.map((f) => new Float64Array(f.nodes.length));
  const nodeSlopes = nominal.frozen.map((f) => new Float64Array(f.nodes.length));
  const out = new Float64Array(length);
  const mc =
    samples > 0
      ? monteCarloPropagation(
          (P) => {
            const moved = groups.map((g, k) => {
              const members = g.members;
              const delta = deltas[k];
              for (let r = 0; r < members.length; r++) delta[r] = P[members[r]] - P0[members[r]];
              return fits[k].shifted(delta);
            });
            let offset = 0;
            for (let k = 0; k < nominal.frozen.length; k++) {
              const f = nominal.frozen[k];
              const pressures = nodePressures[k];
              const slopes = nodeSlopes[k];
              for (let q = 0; q < f.nodes.length; q++) {
                const e = moved[f.nodes[q]](f.temperatureK);
                pressures[q] = e.pressurePa;
                slopes[q] = e.slopePaPerK;
              }
              maps[k].evaluate(pressures, slopes, out, offset);
              offset += maps[k].length;
            }
            report(context, "Monte Carlo", ++done, samples, "samples");
            return out;
          },
          P0,
          settings.sigmaPa,
          samples,
          settings.seed,
        )
      : undefined;
  let linearised: number[] | undefined;
  if (settings.linearised || !mc) {
    linearised = [];
    nominal.frozen.forEach((f, k) => {
      const u = linearisedIsotherm({
        temperatureK: f.temperatureK,
        densityMolPerM3: f.densityMolPerM3,
        pressurePa: nominal.values.pressures[k],
        covariance: f.nodes.map((j) => fits[j].covarianceAt(f.temperatureK)),
        nominal: nominal.integrations[k],
        bridges: f.bridges,
        gasConstant: context.gasConstant,
      });
      for (const v of u) linearised?.push(v);
      report(context, "linearised", k + 1, nominal.frozen.length, "isotherms");
    });
  }
  return { ...(mc ? { monteCarlo: mc.standardUncertainty } : {}), linearised, samples };
}

/** Surface route: Monte Carlo through the surface fit's linear map, linearised along its covariance. */
export function propagateSurfaceRoute(
  context: RouteContext,
  kept: readonly number[],
  surfaceFit: VirialSurfaceFit,
  fitSigmaPa: readonly number[] | undefined,
  plan: IsothermPlan,
  settings: PropagationSettings,
): Propagated {
  const { temperatureK: T, densityMolPerM3: rho, pressurePa: P0, gasConstant: R } = context;
  const surface = surfaceFit.surface;
  const c0 = surface.coefficients;
  const p = c0.length;
  const valuesAt = (coefficients: readonly number[]) =>
    flattenValues(surfaceRouteValues(context, { ...surface, coefficients }, plan));
  // The fit's linear map: dc = C X^T W dy, dy = dP/(rho R T), sigma_y as in fitVirialSurface.ts.
  const n = kept.length;
  const design = new Float64Array(n * p);
  const scale = new Float64Array(n); // W dy = dP * scale
  kept.forEach((i, r) => {
    const row = surfaceBasis(surface, "aD", T[i], rho[i]);
    for (let a = 0; a < p; a++) design[r * p + a] = row[a];
    const toY = 1 / (rho[i] * R * T[i]);
    const sigmaY = (fitSigmaPa ? fitSigmaPa[r] : P0[i]) * toY;
    scale[r] = toY / (sigmaY * sigmaY);
  });
  const C = surfaceFit.fit.covariance;
  const samples = settings.monteCarloSamples;
  let done = 0;
  const mc =
    samples > 0
      ? monteCarloPropagation(
          (P) => {
            const rhs = new Float64Array(p);
            for (let r = 0; r < n; r++) {
              const w = (P[kept[r]] - P0[kept[r]]) * scale[r];
              for (let a = 0; a < p; a++) rhs[a] += design[r * p + a] * w;
            }
            const moved = c0.map((c, a) => {
              let d = 0;
              for (let b = 0; b < p; b++) d += C[a][b] * rhs[b];
              return c + d;
            });
            report(context, "Monte Carlo", ++done, samples, "samples");
            return valuesAt(moved);
          },
          P0,
          settings.sigmaPa,
          samples,
          settings.seed,
        )
      : undefined;
  let linearised: number[] | undefined;
  if (settings.linearised || !mc) {
    const L = choleskySemidefinite(surface.covariance);
    const nominal = valuesAt(c0);
    const acc = new Float64Array(nominal.length);
    for (let q = 0; q < p; q++) {
      const out = valuesAt(c0.map((c, a) => c + L[a][q]));
      for (let k = 0; k < acc.length; k++) acc[k] += (out[k] - nominal[k]) ** 2;
      report(context, "linearised", q + 1, p, "coefficients");
    }
    linearised = Array.from(acc, Math.sqrt);
  }
  return { ...(mc ? { monteCarlo: mc.standardUncertainty } : {}), linearised, samples };
}
