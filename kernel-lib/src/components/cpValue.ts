/**
 * The value of a component's ideal-gas heat-capacity correlation, cp°(T) in J/(mol K): the data's
 * own formula, so defineComponent can check a correlation where it is defined (components/ never
 * imports idealgas/). The forms (polynomial segments, cp°/R = sum a_k T^k; Aly-Lee 1981, Fluid
 * Phase Equilibria 6, 169-179, the DIPPR 107 form) and their exact integrals are described in
 * idealgas/cpCorrelation.ts, which re-exports this function.
 */
import { R } from "../constants.js";
import type { AlyLeeCp, CpCorrelation, PolynomialCp } from "./types.js";

/** Ideal-gas isobaric heat capacity cp°(T), J/(mol K). No range check (callers check ranges). */
export function correlationCp(correlation: CpCorrelation, temperatureK: number): number {
  if (correlation.form === "polynomial") {
    const a = segmentFor(correlation, temperatureK).coefficients;
    let sum = 0;
    for (let k = a.length - 1; k >= 0; k--) sum = sum * temperatureK + a[k];
    return R * sum;
  }
  return alyLeeCp(correlation, temperatureK);
}

/** The polynomial segment that holds T (the first below the T, else the last). */
function segmentFor(correlation: PolynomialCp, temperatureK: number) {
  const segments = correlation.segments;
  for (let i = 0; i < segments.length - 1; i++) {
    if (temperatureK < segments[i].maxTemperatureK) return segments[i];
  }
  return segments[segments.length - 1];
}

/** x / sinh x, with its limit 1 at x = 0 (and 0 when sinh overflows). */
function xOverSinh(x: number): number {
  return x === 0 ? 1 : x / Math.sinh(x);
}

/** Aly-Lee cp°: A + B [x / sinh x]^2 + D [y / cosh y]^2, x = C/T, y = E/T. */
function alyLeeCp(c: AlyLeeCp, t: number): number {
  const x = c.cK / t;
  const y = c.eK / t;
  const bTerm = xOverSinh(x) ** 2;
  const dTerm = (y / Math.cosh(y)) ** 2;
  return c.aJPerMolK + c.bJPerMolK * bTerm + c.dJPerMolK * dTerm;
}
