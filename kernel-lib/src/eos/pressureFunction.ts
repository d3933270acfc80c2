/**
 * Pressure functions written with hyper-dual numbers (numerics/hyperDual.ts): the form in which a
 * user types an equation of state, and the form in which every built-in model also offers its
 * pressure, so the numeric departure route (departure/) can be run against the closed forms.
 */
import type { HyperDual } from "../numerics/hyperDual.js";
import type { ResidualModel } from "./types.js";

/** P(T, rho, x) in Pa with T in K and rho in mol/m3, written with HyperDual arithmetic. */
export type HyperDualPressure = (
  temperatureK: HyperDual,
  densityMolPerM3: HyperDual,
  x: readonly number[],
) => HyperDual;

/** A model that also offers its pressure as a hyper-dual function. */
export interface ModelWithPressure extends ResidualModel {
  /** The model's pressure P(T, rho, x), Pa, written independently of its closed-form alpha_r. */
  readonly pressureFunction: HyperDualPressure;
}

/** Type guard: does this model offer a hyper-dual pressure function? */
export function hasPressureFunction(model: ResidualModel): model is ModelWithPressure {
  return typeof (model as Partial<ModelWithPressure>).pressureFunction === "function";
}
