/**
 * What every stage of the P-V-T route (departuresFromPvt.ts) reads: the points as columns, the gas
 * constant, whether u(P) was stated, the options, and the diagnostics list the stages append to.
 */
import type { PvtDiagnostic } from "./pvtDiagnostic.js";
import type { PvtRouteOptions, PvtRouteStage } from "./routeTypes.js";
import type { PvtPoint } from "./types.js";

/** The route's shared, read-only input (plus the diagnostics list, appended to by the stages). */
export interface RouteContext {
  readonly points: readonly PvtPoint[];
  /** Temperatures, K, in the order of the points. */
  readonly temperatureK: readonly number[];
  /** Densities, mol/m3. */
  readonly densityMolPerM3: readonly number[];
  /** Measured pressures, Pa. */
  readonly pressurePa: readonly number[];
  /** Gas constant, J/(mol K). */
  readonly gasConstant: number;
  /** True when every point has u(P). */
  readonly stated: boolean;
  readonly options: PvtRouteOptions;
  readonly diagnostics: PvtDiagnostic[];
}

/** Reports progress through the caller's callback, if any. */
export function report(
  context: RouteContext,
  stage: PvtRouteStage,
  done: number,
  total: number,
  unit: string,
): void {
  context.options.onProgress?.({ stage, done, total, unit });
}

/** Number of distinct temperatures (to 10 significant digits) among the given point indices. */
export function distinctTemperatures(
  temperatureK: readonly number[],
  members: readonly number[],
): number {
  const keys = new Set<string>();
  for (const i of members) keys.add(temperatureK[i].toPrecision(10));
  return keys.size;
}
