/**
 * A reference-quality fluid: a multiparameter Helmholtz equation of state built from a data file
 * (./data/*.json), exposed as a {@link ResidualModel} so the engine computes every property from it,
 * plus what only a reference equation has: its own ideal part phi_0 with the publication's reference
 * state, its published gas constant, critical and triple points, validity range and ancillary
 * equations (saturation starting values).
 *
 * Conversion to the engine's reduced derivatives (tau = T_red/T, delta = rho/rho_red):
 *   a = phi_r, aD = delta phi_d, aDD = delta^2 phi_dd, aDDD = delta^3 phi_ddd,
 *   aT = -tau phi_t, aTT = tau^2 phi_tt + 2 tau phi_t, aDT = -delta tau phi_dt.
 */
import type { ResultWarning } from "../../errors.js";
import type {
  ModelInfo,
  ResidualDerivatives,
  ResidualModel,
  ResidualRequest,
  SaturationEstimate,
  ValidityStatus,
} from "../types.js";
import type { ReferenceState } from "../../idealgas/types.js";
import { compileAncillary, type Ancillary } from "./ancillary.js";
import { checkReferenceFluidData, type RangeData, type ReferenceFluidData } from "./fluidData.js";
import { compileIdealPart, type IdealPart } from "./idealPart.js";
import {
  compileResidualPart,
  emptyReducedHelmholtz,
  type ReducedHelmholtz,
  type ResidualPart,
} from "./residualPart.js";

/** A fixed point of the fluid in SI molar units. */
export interface FluidPoint {
  readonly temperatureK: number;
  /** mol/m3 */
  readonly densityMolPerM3: number;
  /** Pa */
  readonly pressurePa: number;
}

// saturation starting values and validity status are declared with the model interface
export type { SaturationEstimate, ValidityStatus };

/** A reference fluid: a ResidualModel with the extras of a published reference equation. */
export interface ReferenceFluid extends ResidualModel {
  readonly gasConstant: number;
  readonly data: ReferenceFluidData;
  readonly molarMassKgPerMol: number;
  /** Published critical point (the equation reproduces it by construction). */
  readonly critical: FluidPoint;
  /** Published triple-point temperature and pressure, K and Pa. */
  readonly triple: { readonly temperatureK: number; readonly pressurePa: number };
  /** Reducing temperature (K) and molar density (mol/m3) of tau and delta. */
  readonly reducing: { readonly temperatureK: number; readonly densityMolPerM3: number };
  /** The zero of h, s, u of results computed with {@link ReferenceFluid.idealReduced}. */
  readonly referenceState: ReferenceState;
  /**
   * phi_r and reduced derivatives at (tau, delta), written into `out` (no allocation); `third`
   * also computes delta^3 phi_ddd of non-analytic terms (else NaN when the equation has them).
   */
  residualReduced(
    tau: number,
    delta: number,
    out: ReducedHelmholtz,
    third?: boolean,
  ): ReducedHelmholtz;
  /** phi_0 (publication's reference state) and reduced derivatives at (tau, delta). */
  idealReduced(tau: number, delta: number, out: ReducedHelmholtz): ReducedHelmholtz;
  /** Saturation estimate from the ancillary equations; T below the critical temperature. */
  saturationEstimate(temperatureK: number): SaturationEstimate;
  /** Where (T, P) lies relative to the published range and its extrapolation range. */
  validityStatus(temperatureK: number, pressurePa: number): ValidityStatus;
  /** The published range in words, for messages. */
  readonly validityDescription: string;
}

function describeRange(r: RangeData): string {
  return `${r.temperatureK.min} K to ${r.temperatureK.max} K at pressures up to ${r.pressurePa.max / 1e6} MPa`;
}

function inside(r: RangeData, temperatureK: number, pressurePa: number): boolean {
  return (
    temperatureK >= r.temperatureK.min &&
    temperatureK <= r.temperatureK.max &&
    pressurePa <= r.pressurePa.max
  );
}

/**
 * The stable density root(s) of a reference fluid at T (K) and P (Pa), mol/m3. The solver needs the
 * exact saturation state, a phase-layer calculation, so it is passed in where the fluid is bound
 * (fluid/referenceFluids.ts gives phase/referenceDensity.ts).
 */
export type ReferenceDensitySolver = (
  fluid: ReferenceFluid,
  temperatureK: number,
  pressurePa: number,
) => number[];

/**
 * Builds the reference equation of a data record (the shipped files, or a user's own in the same
 * format) as a {@link ReferenceFluid}; with `densityRoots` it offers the model's `densityRoots`.
 * The public entry is `buildReferenceFluid` (fluid/referenceFluids.ts), which supplies it.
 *
 * @throws InputError naming the first malformed field of the record.
 */
export function buildReferenceEquation(
  data: ReferenceFluidData,
  densityRoots?: ReferenceDensitySolver,
): ReferenceFluid {
  checkReferenceFluidData(data);
  const M = data.molarMassKgPerMol;
  const R =
    data.gasConstantJPerMolK ??
    (data.specificGasConstantJPerKgK !== undefined ? data.specificGasConstantJPerKgK * M : NaN);
  const Tred = data.reducing.temperatureK;
  const rhoRed = data.reducing.densityKgPerM3 / M;
  const residualPart: ResidualPart = compileResidualPart(data.residual);
  const idealPart: IdealPart = compileIdealPart(data.ideal);
  const anc = data.ancillaries;
  const psatAnc: Ancillary = compileAncillary(anc.pressure, anc.reducingTemperatureK, 1);
  const densityScale = (unit: string | undefined): number => (unit === "mol/m3" ? 1 : 1 / M);
  const rhoLAnc = compileAncillary(
    anc.liquidDensity,
    anc.reducingTemperatureK,
    densityScale(anc.liquidDensity.unit),
  );
  const rhoVAnc = compileAncillary(
    anc.vaporDensity,
    anc.reducingTemperatureK,
    densityScale(anc.vaporDensity.unit),
  );
  // Memo of the last evaluation: the engine asks for the same (T, rho) several times per state
  // (residual, validity check), and each evaluation is the dominant cost.
  const scratch = emptyReducedHelmholtz();
  let memoT = NaN;
  let memoRho = NaN;
  const evaluateMemo = (temperatureK: number, densityMolPerM3: number): ReducedHelmholtz => {
    if (temperatureK === memoT && densityMolPerM3 === memoRho) return scratch;
    residualPart.evaluate(Tred / temperatureK, densityMolPerM3 / rhoRed, scratch);
    memoT = temperatureK;
    memoRho = densityMolPerM3;
    return scratch;
  };
  const publishedCritical = Object.freeze({
    temperatureK: data.critical.temperatureK,
    pressurePa: data.critical.pressurePa,
    densityMolPerM3: data.critical.densityKgPerM3 / M,
    rule: "published critical point of the equation",
  });
  const info: ModelInfo = {
    id: "reference",
    name: data.name,
    citation: Object.values(data.citations).join(" "),
    componentIds: [data.id],
  };
  const validityDescription =
    `${data.name} is valid from ${describeRange(data.validity)}; ` +
    `extrapolation is allowed to ${describeRange(data.validity.extrapolation)}. ${data.validity.note}`;

  function validityStatus(temperatureK: number, pressurePa: number): ValidityStatus {
    if (inside(data.validity, temperatureK, pressurePa)) return "inside";
    if (inside(data.validity.extrapolation, temperatureK, pressurePa)) return "extrapolated";
    return "outside";
  }

  const fluid: ReferenceFluid = {
    info,
    gasConstant: R,
    data,
    molarMassKgPerMol: M,
    critical: {
      temperatureK: data.critical.temperatureK,
      densityMolPerM3: data.critical.densityKgPerM3 / M,
      pressurePa: data.critical.pressurePa,
    },
    triple: { temperatureK: data.triple.temperatureK, pressurePa: data.triple.pressurePa },
    reducing: { temperatureK: Tred, densityMolPerM3: rhoRed },
    referenceState: { kind: "fluid-convention", description: data.referenceState },
    validityDescription,
    residual(
      temperatureK: number,
      densityMolPerM3: number,
      _x: readonly number[],
      request?: ResidualRequest,
    ): ResidualDerivatives {
      const r = evaluateMemo(temperatureK, densityMolPerM3);
      // One object literal, one shape whatever was asked (no spreads: this runs in the engine's
      // tight loops); aDDD and dnA are undefined when not available or not requested.
      return {
        a: r.f,
        aD: r.fD,
        aDD: r.fDD,
        aDDD: Number.isNaN(r.fDDD) ? undefined : r.fDDD,
        aT: -r.fT,
        aTT: r.fTT + 2 * r.fT,
        aDT: -r.fDT,
        // a pure fluid: d(n alpha_r)/dn = alpha_r + rho d(alpha_r)/d(rho)
        dnA: request?.composition ? [r.f + r.fD] : undefined,
      };
    },
    maxDensity(): number {
      return Infinity;
    },
    checkValidity(temperatureK: number, densityMolPerM3: number): ResultWarning[] {
      const r = evaluateMemo(temperatureK, densityMolPerM3);
      const pressurePa = densityMolPerM3 * R * temperatureK * (1 + r.fD);
      const status = validityStatus(temperatureK, pressurePa);
      if (status === "inside") return [];
      return [
        {
          code: "outside-validity",
          message:
            `state T = ${temperatureK} K, P = ${pressurePa} Pa is outside the published range of ` +
            `${data.name} (${describeRange(data.validity)})` +
            (status === "extrapolated"
              ? `; it is within the published extrapolation range (${describeRange(data.validity.extrapolation)}).`
              : ` and outside its extrapolation range (${describeRange(data.validity.extrapolation)}): results are not trustworthy.`),
        },
      ];
    },
    residualReduced: (tau, delta, out, third) => residualPart.evaluate(tau, delta, out, third),
    idealReduced: (tau, delta, out) => idealPart.evaluate(tau, delta, out),
    saturationEstimate(temperatureK: number): SaturationEstimate {
      return {
        pressurePa: psatAnc(temperatureK),
        liquidDensityMolPerM3: rhoLAnc(temperatureK),
        vaporDensityMolPerM3: rhoVAnc(temperatureK),
      };
    },
    validityStatus,
    pseudoCritical() {
      return publishedCritical;
    },
    densityRoots:
      densityRoots &&
      ((temperatureK: number, pressurePa: number): number[] =>
        densityRoots(fluid, temperatureK, pressurePa)),
  };
  return fluid;
}
