/**
 * The equal-area (Maxwell) construction along a subcritical isotherm, as data for charts: the
 * van der Waals-type loop of the model's P(v) between the saturated liquid and vapour volumes, and
 * the tie line at the saturation pressure that cuts equal areas above and below it,
 *   integral from v_L to v_V of (P(v) - P_sat) dv = 0,
 * which is the equal-Gibbs-energy condition written for the isotherm (J. C. Maxwell, Nature 11,
 * 357 (1875)). The two areas are computed by adaptive Gauss-Kronrod quadrature of the model's
 * pressure (numerics/gaussKronrod.ts), independently of the saturation solve, so they also check it.
 */
import { InputError } from "../errors.js";
import type { ResidualModel } from "../eos/types.js";
import { integrateAdaptive } from "../numerics/gaussKronrod.js";
import { requirePositive } from "../validate.js";
import { gasConstantOf, PURE, pressureAt, stiffnessAt } from "./pureFluid.js";
import {
  saturationAtTemperature,
  type SaturationOptions,
  type SaturationResult,
} from "./saturation.js";

/** Region of an isotherm point. */
export type IsothermRegion =
  "liquid" | "metastable-liquid" | "unstable" | "metastable-vapor" | "vapor";

/** One point of the isotherm. */
export interface IsothermLoopPoint {
  /** m3/mol */
  readonly molarVolumeM3PerMol: number;
  /** Pa */
  readonly pressurePa: number;
  readonly region: IsothermRegion;
}

/** Options of {@link equalAreaIsotherm}. */
export interface EqualAreaOptions extends SaturationOptions {
  /** Number of points on the loop between v_L and v_V (log-spaced in v). Default 200. */
  loopPoints?: number;
  /** Points on each single-phase branch outside the tie line. Default 40. */
  branchPoints?: number;
  /**
   * How far the branches extend: liquid down to v_L / liquidSpan, vapour up to v_V * vaporSpan.
   * Defaults 1.05 and 3.
   */
  liquidSpan?: number;
  vaporSpan?: number;
  /** Relative tolerance of the area quadrature. Default 1e-10. */
  areaTolerance?: number;
}

/** The loop, the tie line and the areas. */
export interface EqualAreaIsotherm {
  readonly temperatureK: number;
  /** Points ordered by increasing molar volume. */
  readonly points: readonly IsothermLoopPoint[];
  readonly tieLine: {
    readonly pressurePa: number;
    /** m3/mol */
    readonly liquidMolarVolumeM3PerMol: number;
    /** m3/mol */
    readonly vaporMolarVolumeM3PerMol: number;
  };
  /**
   * Integrals over (v_L, v_V) of the positive and negative parts of P - P_sat, J/mol (Pa m3/mol),
   * their sum (0 by the equal-area rule) and the quadrature error estimate of the sum.
   */
  readonly areas: {
    readonly aboveTieLineJPerMol: number;
    readonly belowTieLineJPerMol: number;
    readonly netJPerMol: number;
    readonly errorEstimateJPerMol: number;
  };
  readonly saturation: SaturationResult;
}

/**
 * The model's isotherm at T below its critical temperature, with the equal-area tie line.
 *
 * @example
 * ```ts
 * const iso = equalAreaIsotherm(model, 0.9 * Tc);
 * iso.areas.netJPerMol; // ~0 (equal areas)
 * ```
 */
export function equalAreaIsotherm(
  model: ResidualModel,
  temperatureK: number,
  options: EqualAreaOptions = {},
): EqualAreaIsotherm {
  requirePositive("temperatureK", temperatureK, "K");
  const loopPoints = options.loopPoints ?? 200;
  const branchPoints = options.branchPoints ?? 40;
  for (const [name, v] of [
    ["options.loopPoints", loopPoints],
    ["options.branchPoints", branchPoints],
  ] as const) {
    if (!(Number.isInteger(v) && v >= 2 && v <= 100000)) {
      throw new InputError({
        input: name,
        unit: "-",
        validRange: "an integer from 2 to 100000",
        received: v,
      });
    }
  }
  const liquidSpan = options.liquidSpan ?? 1.05;
  const vaporSpan = options.vaporSpan ?? 3;
  if (!(liquidSpan >= 1 && liquidSpan < 100)) {
    throw new InputError({
      input: "options.liquidSpan",
      unit: "-",
      validRange: "between 1 and 100",
      received: liquidSpan,
    });
  }
  if (!(vaporSpan >= 1 && vaporSpan < 1e6)) {
    throw new InputError({
      input: "options.vaporSpan",
      unit: "-",
      validRange: "between 1 and 1e6",
      received: vaporSpan,
    });
  }
  const sat = saturationAtTemperature(model, temperatureK, options);
  const T = temperatureK;
  const Rg = gasConstantOf(model);
  const vL = 1 / sat.liquidDensityMolPerM3;
  const vV = 1 / sat.vaporDensityMolPerM3;
  const pSat = sat.pressurePa;
  const vMin = Math.max(vL / liquidSpan, 1.000001 / model.maxDensity(T, PURE));
  const pressure = (v: number): number => pressureAt(model, T, 1 / v, Rg);
  const stiffness = (v: number): number => stiffnessAt(model, T, 1 / v);
  const points: IsothermLoopPoint[] = [];
  const push = (v: number, region: IsothermRegion): void => {
    points.push({ molarVolumeM3PerMol: v, pressurePa: pressure(v), region });
  };
  for (let i = 0; i < branchPoints; i++) push(vMin + ((vL - vMin) * i) / branchPoints, "liquid");
  const ratio = Math.pow(vV / vL, 1 / loopPoints);
  let crossedUnstable = false;
  for (let i = 0, v = vL; i <= loopPoints; i++, v = i === loopPoints ? vV : v * ratio) {
    let region: IsothermRegion;
    if (i === 0) region = "liquid";
    else if (i === loopPoints) region = "vapor";
    else if (stiffness(v) <= 0) {
      region = "unstable";
      crossedUnstable = true;
    } else region = crossedUnstable ? "metastable-vapor" : "metastable-liquid";
    push(v, region);
  }
  const vRatio = Math.pow(vaporSpan, 1 / branchPoints);
  for (let i = 1, v = vV * vRatio; i <= branchPoints; i++, v *= vRatio) push(v, "vapor");

  const relTolerance = options.areaTolerance ?? 1e-10;
  // Integrate in ln v (smooth over the wide volume range): dv = v d(ln v).
  const a = Math.log(vL);
  const b = Math.log(vV);
  const above = integrateAdaptive(
    (x) => {
      const v = Math.exp(x);
      return Math.max(pressure(v) - pSat, 0) * v;
    },
    a,
    b,
    { relTolerance, maxSubdivisions: 2000 },
  );
  const below = integrateAdaptive(
    (x) => {
      const v = Math.exp(x);
      return Math.min(pressure(v) - pSat, 0) * v;
    },
    a,
    b,
    { relTolerance, maxSubdivisions: 2000 },
  );
  return {
    temperatureK: T,
    points,
    tieLine: { pressurePa: pSat, liquidMolarVolumeM3PerMol: vL, vaporMolarVolumeM3PerMol: vV },
    areas: {
      aboveTieLineJPerMol: above.value,
      belowTieLineJPerMol: below.value,
      netJPerMol: above.value + below.value,
      errorEstimateJPerMol: above.errorEstimate + below.errorEstimate,
    },
    saturation: sat,
  };
}
