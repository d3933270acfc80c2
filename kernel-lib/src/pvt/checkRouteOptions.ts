/** Validation of the route's options (departuresFromPvt.ts). */
import { InputError } from "../errors.js";
import type { PvtRouteOptions } from "./routeTypes.js";

/** Refuses options that would give NaN or silent nonsense, naming the option and its range. */
export function checkRouteOptions(o: PvtRouteOptions): void {
  const bad = (input: string, unit: string, validRange: string, received: unknown) => {
    throw new InputError({ input: `options.${input}`, unit, validRange, received });
  };
  if (o.route !== undefined && !["auto", "isochores", "surface"].includes(o.route)) {
    bad("route", "-", '"auto", "isochores" or "surface"', o.route);
  }
  o.isothermsK?.forEach((t, i) => {
    if (!(t > 0 && t < Infinity)) bad(`isothermsK[${i}]`, "K", "a finite number > 0", t);
  });
  if (
    o.isothermToleranceK !== undefined &&
    !(o.isothermToleranceK >= 0 && o.isothermToleranceK < Infinity)
  ) {
    bad("isothermToleranceK", "K", "a finite number >= 0", o.isothermToleranceK);
  }
  if (
    o.isochoreTolerance !== undefined &&
    !(o.isochoreTolerance >= 0 && o.isochoreTolerance < 0.1)
  ) {
    bad("isochoreTolerance", "-", "a relative tolerance from 0 to 0.1", o.isochoreTolerance);
  }
  for (const key of ["minIsochoreTemperatures", "minIsothermNodes"] as const) {
    const v = o[key];
    if (v !== undefined && !(Number.isInteger(v) && v >= 2)) bad(key, "-", "an integer >= 2", v);
  }
  if (
    o.monteCarloSamples !== undefined &&
    !(Number.isInteger(o.monteCarloSamples) && o.monteCarloSamples >= 0)
  ) {
    bad("monteCarloSamples", "-", "an integer >= 0 (0 = linearised only)", o.monteCarloSamples);
  }
  if (o.seed !== undefined && !(Number.isInteger(o.seed) && o.seed >= 0 && o.seed < 2 ** 32)) {
    bad("seed", "-", "an integer in [0, 2^32)", o.seed);
  }
  if (o.outlierThreshold !== undefined && !(o.outlierThreshold > 0)) {
    bad(
      "outlierThreshold",
      "u(P)",
      "a number > 0 (Infinity turns the screening off)",
      o.outlierThreshold,
    );
  }
  if (o.gasConstant !== undefined && !(o.gasConstant > 0 && o.gasConstant < Infinity)) {
    bad("gasConstant", "J/(mol K)", "a finite number > 0", o.gasConstant);
  }
  if (
    o.criticalTemperatureK !== undefined &&
    !(o.criticalTemperatureK > 0 && o.criticalTemperatureK < Infinity)
  ) {
    bad("criticalTemperatureK", "K", "a finite number > 0", o.criticalTemperatureK);
  }
}
