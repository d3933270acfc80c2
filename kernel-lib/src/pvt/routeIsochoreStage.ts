/**
 * Stage 2 of the P-V-T route: isochores. The points are grouped by density (groupIsochores.ts);
 * with stated u(P), points that contradict their isochore are set aside by the leave-one-out
 * screen (isochoreLeaveOneOut.ts: worst first, one at a time, at most 5 % of the points); each
 * pressure is moved to its isochore's mean density with the surface's (dP/drho)_T (first order);
 * then every isochore gets its smoothing fit P(T) (isochoreFit.ts).
 */
import { dPdRho } from "../state/properties.js";
import { fitIsochore } from "./isochoreFit.js";
import type { IsochoreFit } from "./isochoreFit.js";
import { isochoreLeaveOneOut } from "./isochoreLeaveOneOut.js";
import { groupIsochores } from "./groupIsochores.js";
import type { IsochoreGroup } from "./groupIsochores.js";
import { distinctTemperatures, report } from "./routeContext.js";
import type { RouteContext } from "./routeContext.js";
import type { SetAsidePoint } from "./types.js";
import { surfaceDerivatives } from "./virialSurface.js";
import type { VirialSurface } from "./virialSurface.js";

/** Groups of points on one density with at least `minIsochoreTemperatures` distinct temperatures. */
export function routeIsochoreGroups(context: RouteContext): IsochoreGroup[] {
  const minT = context.options.minIsochoreTemperatures ?? 3;
  return groupIsochores(context.densityMolPerM3, context.options.isochoreTolerance ?? 2e-3).filter(
    (g) => distinctTemperatures(context.temperatureK, g.members) >= minT,
  );
}

/**
 * The leave-one-out screen (stated u(P) only): removes the worst point whose statistic exceeds
 * `threshold` from its group, one at a time (only that group is judged again), at most 5 % of
 * the points. Returns the points set aside, in the order they were found.
 */
export function screenIsochoreOutliers(
  context: RouteContext,
  groups: IsochoreGroup[],
  sigmaEff: readonly number[],
  threshold: number,
): SetAsidePoint[] {
  const { temperatureK: T, pressurePa: P0, points } = context;
  const judge = (g: IsochoreGroup): { j: number; z: number } | undefined => {
    if (distinctTemperatures(T, g.members) < 4) return undefined; // too few points to judge one
    const z = isochoreLeaveOneOut(
      g.members.map((i) => T[i]),
      g.members.map((i) => P0[i]),
      g.members.map((i) => sigmaEff[i]),
      context.options.isochore,
    );
    let worst: { j: number; z: number } | undefined;
    z.forEach((zj, j) => {
      if (zj > threshold && (!worst || zj > worst.z)) worst = { j, z: zj };
    });
    return worst;
  };
  const worstOf: ({ j: number; z: number } | undefined)[] = [];
  groups.forEach((g, k) => {
    worstOf.push(judge(g));
    report(context, "outlier screen", k + 1, groups.length, "isochores");
  });
  const setAside: SetAsidePoint[] = [];
  const maxOut = Math.floor(0.05 * points.length);
  for (let round = 0; round < maxOut; round++) {
    let pick = -1;
    worstOf.forEach((w, k) => {
      const best = pick >= 0 ? worstOf[pick] : undefined;
      if (w && (!best || w.z > best.z)) pick = k;
    });
    const w = pick >= 0 ? worstOf[pick] : undefined;
    if (!w) break;
    const group = groups[pick];
    const [i] = group.members.splice(w.j, 1);
    const p = points[i];
    setAside.push({
      line: p.line,
      temperatureK: p.temperatureK,
      densityMolPerM3: p.densityMolPerM3,
      pressurePa: p.pressurePa,
      reason: `outlier: leave-one-out residual ${w.z.toFixed(1)} u(P) on the isochore at ${group.densityMolPerM3.toPrecision(6)} mol/m3 (threshold ${threshold}); left out of the isochore and the global surface fits`,
    });
    worstOf[pick] = judge(group);
  }
  return setAside;
}

/** Pressure shift of every point to its group's mean density, Pa (0 outside the groups). */
export function densityShifts(
  context: RouteContext,
  groups: readonly IsochoreGroup[],
  surface: VirialSurface,
): Float64Array {
  const { temperatureK: T, densityMolPerM3: rho, gasConstant: R } = context;
  const shift = new Float64Array(T.length);
  for (const g of groups) {
    for (const i of g.members) {
      const d = surfaceDerivatives(surface, T[i], rho[i]);
      shift[i] = dPdRho(T[i], d, R) * (g.densityMolPerM3 - rho[i]);
    }
  }
  return shift;
}

/** The isochore fits of the groups, through the density-corrected pressures. */
export function fitRouteIsochores(
  context: RouteContext,
  groups: readonly IsochoreGroup[],
  shift: ArrayLike<number>,
  sigmaEff: readonly number[] | undefined,
): IsochoreFit[] {
  const { temperatureK: T, pressurePa: P0 } = context;
  return groups.map((g, k) => {
    const fit = fitIsochore(
      g.densityMolPerM3,
      g.members.map((i) => T[i]),
      g.members.map((i) => P0[i] + shift[i]),
      sigmaEff ? g.members.map((i) => sigmaEff[i]) : undefined,
      context.options.isochore,
    );
    report(context, "isochore fits", k + 1, groups.length, "isochores");
    return fit;
  });
}
