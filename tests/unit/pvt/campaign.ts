/** Synthetic isochoric campaigns for the route's checks (noise-free or with seeded noise). */
import { pvtFromArrays } from "../../../kernel-lib/src/pvt/index.js";
import { seededRandom } from "../../../kernel-lib/src/numerics/seededRandom.js";
import type { PvtDataset } from "../../../kernel-lib/src/pvt/index.js";

export interface CampaignSpec {
  densities: readonly number[];
  temperatures: readonly number[];
  pressure: (T: number, rho: number) => number;
  /** Relative standard uncertainty of P (noise added and stated when given). */
  relativeUP?: number;
  /** Standard uncertainty of T, K (noise added and stated when given). */
  uT?: number;
  seed?: number;
}

export function campaign(spec: CampaignSpec): PvtDataset {
  const rng = spec.seed !== undefined ? seededRandom(spec.seed) : undefined;
  const T: number[] = [];
  const D: number[] = [];
  const P: number[] = [];
  const uP: number[] = [];
  for (const d of spec.densities) {
    for (const t of spec.temperatures) {
      const tMeas = rng && spec.uT ? t + spec.uT * rng.normal() : t;
      const p = spec.pressure(t, d);
      const u = spec.relativeUP ? spec.relativeUP * p : 0;
      T.push(tMeas);
      D.push(d);
      P.push(rng && u > 0 ? p + u * rng.normal() : p);
      uP.push(u);
    }
  }
  return pvtFromArrays({
    temperatureK: T,
    densityMolPerM3: D,
    pressurePa: P,
    ...(spec.relativeUP ? { uPressurePa: uP } : {}),
    ...(spec.uT ? { uTemperatureK: spec.uT } : {}),
  });
}

export function range(from: number, to: number, n: number): number[] {
  return Array.from({ length: n }, (_, i) => from + ((to - from) * i) / (n - 1));
}

/** Densities spaced geometrically from lo to hi (denser where the bridge needs them). */
export function geometric(lo: number, hi: number, n: number): number[] {
  return Array.from({ length: n }, (_, i) => lo * (hi / lo) ** (i / (n - 1)));
}
