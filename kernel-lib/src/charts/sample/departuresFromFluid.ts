/**
 * Departure curves of a fluid for the departure chart: the stable state at each (T, P), its
 * residual h, s, u, a, g relative to the ideal gas at the same T and P (convention "TP": through
 * the sweep engine, a row of typed arrays per isotherm, sampleSweep.ts, the same numbers as
 * stateAtTP's `residual`) or at the same T and density (convention "TV": stateAtTP's
 * `residualTV` per point; the sweep has no same-density departures).
 */
import { maxOf, minOf } from "../../numerics/extent.js";
import { requirePositive } from "../../validate.js";
import { saturationAtTemperature } from "../../phase/saturation.js";
import { stateAtTP, stateAtTRho } from "../../state/stateAt.js";
import type { FluidBinding, FluidState } from "../../state/types.js";
import type { DepartureCurve, DeparturePoint } from "../departures.js";
import { mixtureSplitsAt, tryPoint, type SampleProgress } from "./sampleGuard.js";
import { sweepTPRows } from "./sampleSweep.js";

const SWEPT = ["P", "rho", "hRes", "sRes", "uRes", "aRes", "gRes"] as const;

/** Options of {@link departuresFromFluid}. */
export interface DepartureSampleOptions {
  /** Mole fractions. Default [1]. */
  x?: readonly number[];
  /** Convention: "TP" (same T and P; default) or "TV" (same T and density). */
  convention?: "TP" | "TV";
  /** Progress callback (items done, total), e.g. a progress display's `set`. */
  onProgress?: SampleProgress;
}

/**
 * Departures along isotherms at the given pressures (Pa).
 * @example departureChart(departuresFromFluid(fluid, [250, 300, 350], logGrid(1e5, 2e7, 60)), { property: ["h", "s"] })
 */
export function departuresFromFluid(
  fluid: FluidBinding,
  temperaturesK: readonly number[],
  pressuresPa: readonly number[],
  options: DepartureSampleOptions = {},
): DepartureCurve[] {
  const x = options.x ?? [1];
  const total = temperaturesK.length * pressuresPa.length;
  let done = 0;
  pressuresPa.forEach((p, j) => requirePositive(`pressuresPa[${j}]`, p, "Pa"));
  temperaturesK.forEach((T, i) => requirePositive(`temperaturesK[${i}]`, T, "K"));
  const onProgress = options.onProgress;
  const swept =
    options.convention === "TV"
      ? undefined
      : sweepTPRows(fluid, temperaturesK, pressuresPa, x, SWEPT, {
          onPoint: onProgress && (() => onProgress(++done, total)),
        }).rows;
  return temperaturesK.map((T, i) => {
    const pick = (s: FluidState): DeparturePoint => {
      const r = options.convention === "TV" ? s.residualTV : s.residual;
      return {
        pressurePa: s.pressurePa,
        densityMolPerM3: s.densityMolPerM3,
        h: r.h,
        s: r.s,
        u: r.u,
        a: r.a,
        g: r.g,
      };
    };
    const row = swept?.[i];
    const points: DeparturePoint[] = pressuresPa.map((P, j) => {
      if (row !== undefined) {
        // a gap (no state, or a mixture that splits here) is NaN in every column
        const h = row.hRes[j];
        if (Number.isNaN(h)) return { pressurePa: P, h: NaN, s: NaN, u: NaN, a: NaN, g: NaN };
        return {
          pressurePa: row.P[j],
          densityMolPerM3: row.rho[j],
          h,
          s: row.sRes[j],
          u: row.uRes[j],
          a: row.aRes[j],
          g: row.gRes[j],
        };
      }
      const s = tryPoint(() => stateAtTP(fluid, T, P, x));
      options.onProgress?.(++done, total);
      // a mixture that splits here has no single-phase departure: a gap the chart reports
      if (!s || mixtureSplitsAt(fluid.model, T, P, x))
        return { pressurePa: P, h: NaN, s: NaN, u: NaN, a: NaN, g: NaN };
      return pick(s);
    });
    // A pure fluid below Tc jumps from vapour to liquid at the vapour pressure: add both
    // saturated states there so the jump is drawn vertical, at the right pressure.
    if (x.length === 1) {
      const sat = tryPoint(() => saturationAtTemperature(fluid.model, T));
      const lo = minOf(pressuresPa);
      const hi = maxOf(pressuresPa);
      if (sat && sat.pressurePa > lo && sat.pressurePa < hi) {
        const vapor = pick(stateAtTRho(fluid, T, sat.vaporDensityMolPerM3, x));
        const liquid = pick(stateAtTRho(fluid, T, sat.liquidDensityMolPerM3, x));
        // Both at the saturation pressure (a stable sort keeps vapour before liquid).
        points.push(
          { ...vapor, pressurePa: sat.pressurePa },
          { ...liquid, pressurePa: sat.pressurePa },
        );
        points.sort((a, b) => (a.pressurePa as number) - (b.pressurePa as number));
      }
    }
    return { temperatureK: T, points };
  });
}
