/**
 * Stage 1 of the P-V-T route: the global virial-type surface (fitVirialSurface.ts), fitted to the
 * kept points first with u(P) alone, then, when u(P) is stated, with effective variances
 * u_eff^2 = u(P)^2 + ((dP/dT)_rho u(T))^2 + ((dP/drho)_T u(rho))^2 (Orear, Am. J. Phys. 50 (1982)
 * 912) whose slopes come from the first fit, at the same order. It gives the density corrections,
 * the effective variances the other stages use, and a second opinion on every isochoric slope.
 */
import { dPdTAtDensity } from "../eos/residualRelations.js";
import { dPdRho } from "../state/properties.js";
import { fitVirialSurface } from "./fitVirialSurface.js";
import type { SurfacePoint, VirialSurfaceFit } from "./fitVirialSurface.js";
import type { RouteContext } from "./routeContext.js";
import { surfaceDerivatives } from "./virialSurface.js";

/** The fitted surface and, when u(P) was stated, each point's effective standard uncertainty. */
export interface SurfaceStage {
  fit: VirialSurfaceFit;
  /** Effective standard uncertainty of every point's pressure, Pa (stated u(P) only). */
  sigmaEff?: number[];
}

/** The kept points with the given pressures, as the surface fit takes them. */
export function surfacePoints(
  context: RouteContext,
  kept: readonly number[],
  pressuresPa: ArrayLike<number>,
): SurfacePoint[] {
  return kept.map((i) => ({
    temperatureK: context.temperatureK[i],
    densityMolPerM3: context.densityMolPerM3[i],
    pressurePa: pressuresPa[i],
  }));
}

/** Fits the surface to the kept points (indices into the points). */
export function fitRouteSurface(context: RouteContext, kept: readonly number[]): SurfaceStage {
  const { points, gasConstant: R, options } = context;
  const stated = context.stated;
  const uP = (i: number): number => points[i].uPressurePa ?? Number.NaN;
  const first = fitVirialSurface(
    surfacePoints(context, kept, context.pressurePa),
    stated ? kept.map(uP) : undefined,
    { gasConstant: R, ...options.surface },
  );
  if (!stated) return { fit: first };
  const sigmaEff = points.map((p, i) => {
    const d = surfaceDerivatives(first.surface, p.temperatureK, p.densityMolPerM3);
    const dT = dPdTAtDensity(p.densityMolPerM3, d, R) * (p.uTemperatureK ?? 0);
    const dR = dPdRho(p.temperatureK, d, R) * (p.uDensityMolPerM3 ?? 0);
    return Math.sqrt(uP(i) ** 2 + dT * dT + dR * dR);
  });
  const fit = fitVirialSurface(
    surfacePoints(context, kept, context.pressurePa),
    kept.map((i) => sigmaEff[i]),
    {
      gasConstant: R,
      ...options.surface,
      densityTerms: first.surface.densityTerms,
      temperatureTerms: first.surface.temperatureTerms,
    },
  );
  return { fit, sigmaEff };
}
