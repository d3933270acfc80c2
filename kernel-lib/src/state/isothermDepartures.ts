/**
 * Cumulative departures along one isotherm on a density grid, in one pass (for charts). For a
 * pressure-function model the integrals of integrateIsotherm.ts are accumulated panel by panel, [0, rho_1], [rho_1, rho_2],
 * ..., each by adaptive Gauss-Kronrod, so the cost is that of one integration to the last density;
 * any other model is evaluated point by point from its closed form.
 */
import { R as R_CODATA } from "../constants.js";
import { InputError, OutOfRangeError } from "../errors.js";
import { checkComposition, checkTemperature } from "./checkInputs.js";
import { pressureFromResidual, residualProperties } from "./properties.js";
import type { EnergySet } from "./types.js";
import {
  endpointWithSeries,
  integrateFromZero,
  isothermIntegrands,
} from "../departure/integrateIsotherm.js";
import type { ResidualModel } from "../eos/types.js";
import { isPressureModel } from "../departure/pressureModel.js";

/** One grid point of an isotherm. */
export interface IsothermDeparturePoint {
  readonly densityMolPerM3: number;
  readonly pressurePa: number;
  readonly Z: number;
  /** Residuals relative to the ideal gas at the same T and density, J/mol, J/(mol K). */
  readonly sameTemperatureAndDensity: EnergySet;
  /** Residuals relative to the ideal gas at the same T and P (NaN where Z <= 0). */
  readonly sameTemperatureAndPressure: EnergySet;
  /** Accumulated absolute error estimate of alpha_r (dimensionless). */
  readonly alphaErrorEstimate: number;
}

/** Result of {@link isothermDepartures}. */
export interface IsothermDepartureResult {
  readonly temperatureK: number;
  readonly points: readonly IsothermDeparturePoint[];
  readonly evaluations: number;
  readonly derivativeMethod: string;
}

/**
 * Departures at every density of an ascending grid (mol/m3) on the isotherm T (K).
 *
 * @example
 * ```ts
 * const line = isothermDepartures(model, 300, [100, 200, 500, 1000, 2000], [1]);
 * line.points.map((p) => [p.pressurePa, p.sameTemperatureAndPressure.h]);
 * ```
 */
export function isothermDepartures(
  model: ResidualModel,
  temperatureK: number,
  densitiesMolPerM3: readonly number[],
  x: readonly number[],
): IsothermDepartureResult {
  checkTemperature(temperatureK);
  checkComposition(x, model.info.componentIds.length);
  if (!(Array.isArray(densitiesMolPerM3) && densitiesMolPerM3.length > 0)) {
    throw new InputError({
      input: "densitiesMolPerM3",
      unit: "mol/m3",
      validRange: "a non-empty ascending list of densities > 0",
      received: densitiesMolPerM3,
    });
  }
  densitiesMolPerM3.forEach((rho, k) => {
    const prev = k === 0 ? 0 : densitiesMolPerM3[k - 1];
    if (!(rho > prev && rho < Infinity)) {
      throw new InputError({
        input: `densitiesMolPerM3[${k}]`,
        unit: "mol/m3",
        validRange: `a finite density above the previous one (${prev})`,
        received: rho,
      });
    }
  });
  const T = temperatureK;
  const Rg = model.gasConstant ?? R_CODATA;
  const last = densitiesMolPerM3[densitiesMolPerM3.length - 1];
  const rhoMax = model.maxDensity(T, x);
  if (!(last < rhoMax)) {
    throw new OutOfRangeError({
      input: "densitiesMolPerM3",
      unit: "mol/m3",
      validRange: `below the model's maximum density ${rhoMax} mol/m3`,
      received: last,
    });
  }
  if (!isPressureModel(model)) {
    // closed-form model: each point from its own residual (no integration, no error)
    return {
      temperatureK: T,
      points: densitiesMolPerM3.map((rho) => {
        const d = model.residual(T, rho, x);
        const sets = residualProperties(T, d, Rg);
        return {
          densityMolPerM3: rho,
          pressurePa: pressureFromResidual(T, rho, d.aD, Rg),
          Z: 1 + d.aD,
          sameTemperatureAndDensity: sets.TV,
          sameTemperatureAndPressure: sets.TP,
          alphaErrorEstimate: 0,
        };
      }),
      evaluations: 0,
      derivativeMethod: "closed form (the model's own residual Helmholtz energy)",
    };
  }
  const opts = model.integrationOptions;
  const quad = {
    relTolerance: opts.relTolerance ?? 1e-11,
    absTolerance: opts.absTolerance ?? 1e-14,
    maxSubdivisions: opts.maxSubdivisions ?? 200,
  };
  const ev = model.evaluator;
  const line = isothermIntegrands(ev, T, x, Rg, rhoMax, densitiesMolPerM3[0]);
  let a = 0;
  let aT = 0;
  let aTT = 0;
  let err = 0;
  let prev = 0;
  let endpointEvaluations = 0;
  const points: IsothermDeparturePoint[] = [];
  for (const rho of densitiesMolPerM3) {
    const ia = integrateFromZero(line, 0, prev, rho, quad);
    const iT = integrateFromZero(line, 1, prev, rho, quad);
    const iTT = integrateFromZero(line, 2, prev, rho, quad);
    a += ia.value;
    aT += iT.value;
    aTT += iTT.value;
    err += ia.errorEstimate;
    prev = rho;
    const end = endpointWithSeries(ev, line, T, rho, x, Rg);
    endpointEvaluations += 2;
    const sets = residualProperties(T, { a, aD: end.aD, aDD: end.aDD, aT, aTT, aDT: end.aDT }, Rg);
    points.push({
      densityMolPerM3: rho,
      pressurePa: end.pressurePa,
      Z: 1 + end.aD,
      sameTemperatureAndDensity: sets.TV,
      sameTemperatureAndPressure: sets.TP,
      alphaErrorEstimate: err,
    });
  }
  return {
    temperatureK: T,
    points,
    evaluations: line.evaluations() + endpointEvaluations,
    derivativeMethod: ev.derivativeMethod,
  };
}
