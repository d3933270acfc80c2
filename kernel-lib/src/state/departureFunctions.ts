/**
 * Departure functions of a pressure-function model at one state, with error estimates, in both
 * conventions (labelled): relative to the ideal gas at the same T and density ("TV") and at the
 * same T and pressure ("TP", the engineering departure function). The formulas that turn
 * residual derivatives into h, s, u, a, g live in state/properties.ts (`residualProperties`).
 */
import { R as R_CODATA } from "../constants.js";
import { checkComposition, checkDensity, checkTemperature } from "./checkInputs.js";
import { pressureFromResidual, residualProperties } from "./properties.js";
import type { EnergySet } from "./types.js";
import { isPressureModel } from "../departure/pressureModel.js";
import type { IntegratedResidual, ResidualModel } from "../eos/types.js";

/** Departures at one (T, rho, x). J/mol and J/(mol K). */
export interface DepartureResult {
  readonly temperatureK: number;
  readonly densityMolPerM3: number;
  readonly pressurePa: number;
  readonly Z: number;
  /** Relative to the ideal gas at the same temperature and density. */
  readonly sameTemperatureAndDensity: EnergySet;
  /** Relative to the ideal gas at the same temperature and pressure (NaN where Z <= 0). */
  readonly sameTemperatureAndPressure: EnergySet;
  /** ln phi per component (empty unless `composition`). */
  readonly lnPhi: readonly number[];
  /**
   * Estimated absolute errors, J/mol or J/(mol K), of the TV values (the TP ones differ by ln Z
   * terms, which carry no quadrature error).
   */
  readonly errorEstimate: EnergySet;
  /** Pressure evaluations used. */
  readonly evaluations: number;
  readonly derivativeMethod: string;
}

/** Options of {@link departureFunctions}. */
export interface DepartureFunctionOptions {
  /** Also compute ln phi (costs one more quadrature per component). Default true. */
  composition?: boolean;
}

/**
 * Residual A, S, U, H, G and ln phi at (T, rho, x): integrated (with error estimates) for a
 * pressure-function model, from the closed form (error estimate 0) for any other model.
 *
 * @example
 * ```ts
 * const d = departureFunctions(myModel, 320, 3000, [0.9, 0.1]);
 * d.sameTemperatureAndPressure.h; // J/mol, the engineering enthalpy departure
 * d.errorEstimate.h;              // its estimated error
 * ```
 */
export function departureFunctions(
  model: ResidualModel,
  temperatureK: number,
  densityMolPerM3: number,
  x: readonly number[],
  options: DepartureFunctionOptions = {},
): DepartureResult {
  checkTemperature(temperatureK);
  checkDensity(densityMolPerM3);
  checkComposition(x, model.info.componentIds.length);
  const request = { composition: options.composition ?? true };
  const r: IntegratedResidual = isPressureModel(model)
    ? model.integrate(temperatureK, densityMolPerM3, x, request)
    : {
        derivatives: model.residual(temperatureK, densityMolPerM3, x, request),
        errorEstimate: { a: 0, aT: 0, aTT: 0 },
        evaluations: 0,
        derivativeMethod: "closed form (the model's own residual Helmholtz energy)",
      };
  const Rg = model.gasConstant ?? R_CODATA;
  const RT = Rg * temperatureK;
  const sets = residualProperties(temperatureK, r.derivatives, Rg);
  const e = r.errorEstimate;
  const Z = 1 + r.derivatives.aD;
  return {
    temperatureK,
    densityMolPerM3,
    pressurePa: pressureFromResidual(temperatureK, densityMolPerM3, r.derivatives.aD, Rg),
    Z,
    sameTemperatureAndDensity: sets.TV,
    sameTemperatureAndPressure: sets.TP,
    lnPhi: sets.lnPhi,
    errorEstimate: {
      a: RT * e.a,
      u: RT * e.aT,
      h: RT * e.aT,
      s: Rg * (e.a + e.aT),
      g: RT * e.a,
    },
    evaluations: r.evaluations,
    derivativeMethod: r.derivativeMethod,
  };
}
