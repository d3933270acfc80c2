/**
 * Pressure functions written with hyper-dual numbers (numerics/hyperDual.ts): the form in which a
 * user types an equation of state, and the form in which every built-in model also offers its
 * pressure, so the numeric departure route (departure/) can be run against the closed forms.
 */
import type { HyperDualPressure, ResidualModel } from "./types.js";

export type { HyperDualPressure };

/** A model that also offers its pressure as a hyper-dual function. */
export interface ModelWithPressure extends ResidualModel {
  /** The model's pressure P(T, rho, x), Pa, written independently of its closed-form alpha_r. */
  readonly pressureFunction: HyperDualPressure;
}

/** Type guard: does this model offer a hyper-dual pressure function? */
export function hasPressureFunction(model: ResidualModel): model is ModelWithPressure {
  return typeof model.pressureFunction === "function";
}
