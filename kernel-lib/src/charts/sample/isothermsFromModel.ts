/**
 * Isotherms of a model for the P-v chart: pressure from the residual Helmholtz energy,
 * P = rho R T (1 + aD) (state/pressureFromResidual), on a density grid (sampling.ts) that resolves
 * dilute gas, loop and steep liquid; for a pure fluid below its critical temperature, the
 * equal-area construction from phase/equalAreaIsotherm.
 */
import type { ResidualModel } from "../../eos/types.js";
import { equalAreaIsotherm } from "../../phase/equalAreaIsotherm.js";
import { locateCriticalPoint } from "../../phase/criticalPoint.js";
import { pressureFromResidual } from "../../state/properties.js";
import { requirePositive } from "../../validate.js";
import type { IsothermChartCurve } from "../isotherms.js";
import { isothermDensityGrid } from "../sampling.js";
import { tryPoint } from "./sampleGuard.js";

/** Options of {@link isothermsFromModel}. */
export interface IsothermSampleOptions {
  /** Mole fractions. Default [1] (pure fluid). */
  x?: readonly number[];
  /** Points per isotherm. Default 240. */
  points?: number;
  /** Highest density as a fraction of the model's maximum density. Default 0.96. */
  maxFraction?: number;
  /** Add the equal-area construction below Tc (pure fluids). Default true. */
  equalArea?: boolean;
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
  const Tc =
    pure && (options.equalArea ?? true)
      ? tryPoint(() => locateCriticalPoint(model))?.temperatureK
      : undefined;
  return temperaturesK.map((T, i) => {
    requirePositive(`temperaturesK[${i}]`, T, "K");
    const grid = isothermDensityGrid(model.maxDensity(T, x), {
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
        curve.equalArea = {
          pressurePa: ea.tieLine.pressurePa,
          liquidDensityMolPerM3: 1 / ea.tieLine.liquidMolarVolumeM3PerMol,
          vaporDensityMolPerM3: 1 / ea.tieLine.vaporMolarVolumeM3PerMol,
        };
      }
    }
    return curve;
  });
}
