/**
 * Isotherms of a model for the P-v chart: pressure from the residual Helmholtz energy,
 * P = rho R T (1 + aD) (state/pressureFromResidual), on a density grid (sampling.ts) that resolves
 * dilute gas, loop and steep liquid; for a pure fluid below its critical temperature, the
 * equal-area construction from phase/equalAreaIsotherm. The density limit is the model's maximum
 * density (1/b of a cubic) or, for a reference equation without one, a liquid density from its
 * lowest temperature (samplingDensityLimit.ts).
 */
import type { ResidualModel } from "../../eos/types.js";
import { equalAreaIsotherm } from "../../phase/equalAreaIsotherm.js";
import { locateCriticalPoint } from "../../phase/criticalPoint.js";
import { pressureFromResidual } from "../../state/properties.js";
import { requireChoice, requirePositive } from "../../validate.js";
import type { IsothermChartCurve } from "../isotherms.js";
import { isothermDensityGrid } from "../sampling.js";
import { tryPoint } from "./sampleGuard.js";
import { samplingDensityLimit } from "./samplingDensityLimit.js";

/** Options of {@link isothermsFromModel}. */
export interface IsothermSampleOptions {
  /** Mole fractions. Default [1] (pure fluid). */
  x?: readonly number[];
  /** Points per isotherm. Default 240. */
  points?: number;
  /** Highest density as a fraction of the density limit. Default 0.96. */
  maxFraction?: number;
  /**
   * Density limit to sample to, mol/m3. Default: the model's maximum density when finite (1/b of
   * a cubic); else (reference equations) 1.05 times the saturated-liquid density at the model's
   * triple point or lowest valid temperature, which covers the compressed liquid up to the
   * pressures a chart shows.
   */
  maxDensityMolPerM3?: number;
  /** Add the equal-area construction below Tc (pure fluids). Default true. */
  equalArea?: boolean;
  /**
   * What a subcritical isotherm of a pure fluid shows between the saturated vapour and liquid:
   * "loop", the model's own van der Waals loop (smooth for a cubic, and what the equal-area lobes
   * are drawn from), or "tie-line", the stable isotherm running flat at the vapour pressure.
   * Default: "loop" for a model with a finite maximum density (cubics), "tie-line" otherwise:
   * multiparameter reference equations are fitted to stable and metastable states, and inside
   * the spinodals their pressure swings by tens of MPa, which would swamp the chart.
   */
  insideDome?: "loop" | "tie-line";
}

/**
 * Samples isotherms of a model.
 * @example isothermChart({ isotherms: isothermsFromModel(model, [150, 180, 190.6, 220]), ...saturationFromModel(model) })
 */
export function isothermsFromModel(
  model: ResidualModel,
  temperaturesK: readonly number[],
  options: IsothermSampleOptions = {},
): IsothermChartCurve[] {
  const x = options.x ?? [1];
  const pure = x.length === 1;
  const insideDome = options.insideDome;
  if (insideDome !== undefined) requireChoice("insideDome", insideDome, ["loop", "tie-line"]);
  const showEqualArea = options.equalArea ?? true;
  const Tc =
    pure && (showEqualArea || insideDome !== "loop")
      ? tryPoint(() => locateCriticalPoint(model))?.temperatureK
      : undefined;
  if (options.maxDensityMolPerM3 !== undefined) {
    requirePositive("maxDensityMolPerM3", options.maxDensityMolPerM3, "mol/m3");
  }
  // A limit taken from the liquid at the lowest temperature is the same for every isotherm.
  let fromLiquid: number | undefined;
  const densityLimit = (T: number): number => {
    if (options.maxDensityMolPerM3 !== undefined) return options.maxDensityMolPerM3;
    const own = model.maxDensity(T, x);
    if (own > 0 && Number.isFinite(own)) return own;
    fromLiquid ??= samplingDensityLimit(model, T, x).densityMolPerM3;
    return fromLiquid;
  };
  return temperaturesK.map((T, i) => {
    requirePositive(`temperaturesK[${i}]`, T, "K");
    const grid = isothermDensityGrid(densityLimit(T), {
      points: options.points,
      maxFraction: options.maxFraction,
    });
    const points = grid.map((rho) => ({
      densityMolPerM3: rho,
      pressurePa: pressureFromResidual(T, rho, model.residual(T, rho, x).aD, model.gasConstant),
    }));
    const curve: IsothermChartCurve = { temperatureK: T, points };
    if (Tc !== undefined && T < Tc) {
      const ea = tryPoint(() => equalAreaIsotherm(model, T, { loopPoints: 2, branchPoints: 2 }));
      if (ea) {
        const tie = {
          pressurePa: ea.tieLine.pressurePa,
          liquidDensityMolPerM3: 1 / ea.tieLine.liquidMolarVolumeM3PerMol,
          vaporDensityMolPerM3: 1 / ea.tieLine.vaporMolarVolumeM3PerMol,
        };
        if (showEqualArea) curve.equalArea = tie;
        const flat =
          (insideDome ?? (Number.isFinite(model.maxDensity(T, x)) ? "loop" : "tie-line")) ===
          "tie-line";
        if (flat) {
          const outside = points.filter(
            (p) =>
              p.densityMolPerM3 <= tie.vaporDensityMolPerM3 ||
              p.densityMolPerM3 >= tie.liquidDensityMolPerM3,
          );
          outside.push(
            { densityMolPerM3: tie.vaporDensityMolPerM3, pressurePa: tie.pressurePa },
            { densityMolPerM3: tie.liquidDensityMolPerM3, pressurePa: tie.pressurePa },
          );
          curve.points = outside.sort((a, b) => a.densityMolPerM3 - b.densityMolPerM3);
        }
      }
    }
    return curve;
  });
}
