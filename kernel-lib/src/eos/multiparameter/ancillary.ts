/**
 * Ancillary equations of a reference fluid: simple functions of theta = 1 - T/T_c that give the
 * saturation pressure and the saturated densities to about 0.01-0.1 %, published beside each
 * reference equation for starting values (e.g. W. Wagner and A. Pruss, J. Phys. Chem. Ref. Data
 * 22, 783 (1993), eqs. (1)-(3) for water). They are NOT the saturation state of the equation of
 * state: phase/saturation.ts solves that exactly, starting from these.
 */
import type { AncillaryData } from "./fluidData.js";

/** A compiled ancillary y(T); valid for T below the reducing temperature. */
export type Ancillary = (temperatureK: number) => number;

/**
 * Compiles one ancillary equation; `scale` converts the reducing value to SI (e.g. 1/M for a
 * density in kg/m3 to mol/m3).
 */
export function compileAncillary(
  data: AncillaryData,
  reducingTemperatureK: number,
  scale: number,
): Ancillary {
  const n = data.terms.map((x) => x.n);
  const t = data.terms.map((x) => x.t);
  const yRed = data.reducingValue * scale;
  return (temperatureK: number): number => {
    const theta = Math.max(0, 1 - temperatureK / reducingTemperatureK);
    let sum = 0;
    for (let i = 0; i < n.length; i++) sum += n[i] * Math.pow(theta, t[i]);
    switch (data.form) {
      case "ln-ratio-times-Tc-over-T":
        return yRed * Math.exp((reducingTemperatureK / temperatureK) * sum);
      case "ln-ratio":
        return yRed * Math.exp(sum);
      case "ratio-minus-one":
        return yRed * (1 + sum);
    }
  };
}
