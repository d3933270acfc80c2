/**
 * Ideal-gas cp, h and s of a pure species from its molecular constants (statistical mechanics).
 *
 * Pipeline: molecular constants (data/molecules.json or the caller's) -> validation ->
 * precomputation (hindered-rotor levels, h at 298.15 K) -> per-temperature sum of contributions:
 *   translation (translation.ts, Sackur-Tetrode at 1 bar)
 * + rotation (linearRotor.ts / linearRotorLevels.ts / nonlinearRotor.ts)
 * + harmonic vibrations (harmonicVibration.ts)
 * + electronic levels (electronic.ts)
 * + internal rotors (hinderedRotor.ts), replacing the torsional vibrations they stand for.
 * McQuarrie, Statistical Mechanics (2000), ch. 5-8: the molecular partition function factorises,
 * so cp, h - h(0 K) and s are sums over these parts.
 *
 * Valid temperature range (judgement, stated in `validTemperatureK`):
 *   min = 20 K for atoms and level-summed linear rotors; otherwise max(50 K, 5 theta_rot,max),
 *         where theta_rot,max is the largest rotational temperature of a classical rotor
 *         (water: 201 K, ammonia: 72 K, hydrogen sulfide: 75 K, the rest: 50 K);
 *   max = 1500 K by default, the judgement being where the rigid-rotor harmonic-oscillator model
 *         stays adequate: it lacks anharmonicity and vibration-rotation coupling, so cp falls
 *         below the tables as T rises. Against NIST-JANAF and the correlation route, cp is low by
 *         < 0.5 % at 300 K, up to about 1.5 % at 1000 K (NH3) and up to about 2 % at 1500 K;
 *         at 2500 K by up to about 4 %. H2 (rotational levels with centrifugal distortion) is
 *         within 0.05 % up to 300 K and 0.2 % low at 1000 K; H2O (first-order distortion of the
 *         rotor, rotorDistortion.ts) within 0.1 % at 298 K and 0.4 % high at 1000 K. Accuracy per
 *         molecule class: DEVELOPERS.md, "the molecular ideal-gas route". The option `maxTemperatureK` raises
 *         the limit up to 3000 K for users who accept that; dissociation and ionisation are never
 *         modelled.
 * Range policy shared with the correlation route (idealgas/temperatureRange.ts): inside the range
 * values are computed; up to `extrapolationMargin` (default 10 %) beyond a limit they are computed
 * by the same formulas (the mixture layer attaches an "extrapolated" warning); further out every
 * function throws OutOfRangeError. A temperature that is not a finite positive number throws
 * InputError.
 */
import { OutOfRangeError } from "../../errors.js";
import {
  checkTemperatureRange,
  DEFAULT_EXTRAPOLATION_MARGIN,
  type TemperatureRangeOptions,
} from "../temperatureRange.js";
import { STANDARD_TEMPERATURE_K, type IdealGasPure } from "../types.js";
import { electronicContribution } from "./electronic.js";
import { harmonicVibrationContribution, type HarmonicMode } from "./harmonicVibration.js";
import { buildHinderedRotor, type HinderedRotorModel } from "./hinderedRotor.js";
import { linearRotorContribution } from "./linearRotor.js";
import { linearRotorLevelsContribution } from "./linearRotorLevels.js";
import { getMolecule, validateMolecularConstants } from "./moleculeTable.js";
import { nonlinearRotorContribution } from "./nonlinearRotor.js";
import { distortionCoefficient, rotorDistortionContribution } from "./rotorDistortion.js";
import { wavenumberToKelvin } from "./spectroscopicUnits.js";
import { translationalContribution } from "./translation.js";
import {
  NO_CONTRIBUTION,
  sumContributions,
  type MolecularConstants,
  type ThermoContribution,
} from "./types.js";

/** How the torsional modes listed as internal rotors are treated. */
export type TorsionTreatment = "hindered-rotor" | "harmonic" | "free-rotor";

/** How the rotation of a linear molecule is treated. */
export type LinearRotorTreatment = "auto" | "classical" | "level-sum";

/** Options of idealGasFromMolecule (plus `extrapolationMargin`, see TemperatureRangeOptions). */
export interface MolecularIdealGasOptions extends TemperatureRangeOptions {
  /**
   * Treatment of torsions that have an internal-rotor entry. Default "hindered-rotor" (exact levels
   * of V0/2 (1 - cos n phi)). "harmonic" uses the observed torsional fundamental from the vibration
   * list; "free-rotor" uses the same level computation with V0 = 0. Example: ethane at 400 K gives
   * s = 246.44 J/(mol K) with the default, 245.30 harmonic and 250.27 free rotor.
   */
  readonly torsion?: TorsionTreatment;
  /**
   * Rotation of linear molecules. Default "auto": explicit level sum with nuclear-spin statistics
   * when the data carry `nuclearSpinWeights` (H2), classical otherwise. "level-sum" without spin
   * weights uses weights 1 and 1 (heteronuclear) and requires sigma = 1 or the weights.
   * "classical" for H2 raises the valid minimum to 5 theta_r = 427 K (h(298.15 K), the zero of
   * enthalpyFrom298, is then evaluated with the classical rotor slightly outside that range).
   */
  readonly linearRotor?: LinearRotorTreatment;
  /**
   * Ortho/para (even/odd J) treatment of a molecule with `nuclearSpinWeights` (H2): "equilibrium"
   * (default; the NIST-JANAF table's case, reached with a conversion catalyst) or "normal" (frozen
   * at the room-temperature ratio, 3:1 for H2: what a plant without a catalyst carries). They
   * differ below about 250 K: H2 cp at 100 K is 28.15 J/(mol K) in equilibrium, 22.56 normal.
   */
  readonly orthoPara?: "equilibrium" | "normal";
  /**
   * Upper limit of the valid range, K. Default 1500 (MOLECULAR_DEFAULT_MAX_TEMPERATURE_K); at most
   * 3000. Above 1500 K the harmonic model's cp is low by 1-4 % for several molecules (see header).
   * Example: `idealGasFromMolecule("nitrogen", { maxTemperatureK: 3000 }).cp(2500)`.
   */
  readonly maxTemperatureK?: number;
}

/** The IdealGasPure contract plus the statistical-mechanics details, for inspection in a notebook. */
export interface MolecularIdealGas extends IdealGasPure {
  /** The molecular constants used. */
  readonly constants: MolecularConstants;
  /** Treatment of torsions used. */
  readonly torsion: TorsionTreatment;
  /** Contributions at temperature T (K), each with cp, h - h(0 K) and s at 1 bar. */
  contributions(temperatureK: number): {
    readonly translation: ThermoContribution;
    readonly rotation: ThermoContribution;
    readonly vibration: ThermoContribution;
    readonly electronic: ThermoContribution;
    readonly internalRotation: ThermoContribution;
    readonly total: ThermoContribution;
  };
  /** Sensible enthalpy h(T) - h(0 K), J/mol. */
  enthalpyFrom0K(temperatureK: number): number;
}

/** Default upper limit of the valid range, K (see the header for why). */
export const MOLECULAR_DEFAULT_MAX_TEMPERATURE_K = 1500;
/** Highest upper limit a caller may choose with `maxTemperatureK`, K. */
export const MOLECULAR_MAX_TEMPERATURE_K = 3000;

/**
 * Ideal-gas properties from molecular constants.
 * @param molecule a shipped id ("ethane"), formula ("C2H6") or a MolecularConstants object
 * @param options see MolecularIdealGasOptions
 * @example idealGasFromMolecule("ethane").entropyStandard(400) // about 246.4 J/(mol K)
 */
export function idealGasFromMolecule(
  molecule: string | MolecularConstants,
  options: MolecularIdealGasOptions = {},
): MolecularIdealGas {
  // A private deep copy: later edits of the caller's object (in another cell) cannot change
  // this model behind its memoised values.
  const c: MolecularConstants = JSON.parse(
    JSON.stringify(
      validateMolecularConstants(typeof molecule === "string" ? getMolecule(molecule) : molecule),
    ),
  );
  const margin = options.extrapolationMargin ?? DEFAULT_EXTRAPOLATION_MARGIN;
  if (!(margin >= 0 && margin < 1)) {
    throw new OutOfRangeError({
      input: "options.extrapolationMargin",
      unit: "-",
      validRange: "between 0 and 1 (fraction of the violated limit)",
      received: margin,
    });
  }
  const maxT = options.maxTemperatureK ?? MOLECULAR_DEFAULT_MAX_TEMPERATURE_K;
  if (!(maxT >= 300 && maxT <= MOLECULAR_MAX_TEMPERATURE_K)) {
    throw new OutOfRangeError({
      input: "options.maxTemperatureK",
      unit: "K",
      validRange: `between 300 K and ${MOLECULAR_MAX_TEMPERATURE_K} K`,
      received: maxT,
    });
  }
  const torsion = options.torsion ?? "hindered-rotor";
  if (!["hindered-rotor", "harmonic", "free-rotor"].includes(torsion)) {
    throw new OutOfRangeError({
      input: "options.torsion",
      unit: "-",
      validRange: '"hindered-rotor", "harmonic" or "free-rotor"',
      received: torsion,
    });
  }
  const orthoPara = options.orthoPara ?? "equilibrium";
  if (orthoPara !== "equilibrium" && orthoPara !== "normal") {
    throw new OutOfRangeError({
      input: "options.orthoPara",
      unit: "-",
      validRange: '"equilibrium" or "normal"',
      received: orthoPara,
    });
  }
  const linearChoice = options.linearRotor ?? "auto";
  if (!["auto", "classical", "level-sum"].includes(linearChoice)) {
    throw new OutOfRangeError({
      input: "options.linearRotor",
      unit: "-",
      validRange: '"auto", "classical" or "level-sum"',
      received: linearChoice,
    });
  }
  const spinWeights = c.nuclearSpinWeights ?? { even: 1, odd: 1 };
  const levelSumLinear =
    c.geometry === "linear" &&
    (linearChoice === "level-sum" ||
      (linearChoice === "auto" && c.nuclearSpinWeights !== undefined));
  if (levelSumLinear && c.nuclearSpinWeights === undefined && c.symmetryNumber !== 1) {
    throw new OutOfRangeError({
      input: `${c.id}.nuclearSpinWeights`,
      unit: "-",
      validRange: "given when a homonuclear (sigma = 2) rotor's levels are summed explicitly",
      received: undefined,
    });
  }

  // Vibrations kept as harmonic oscillators; torsions go to the rotor models unless "harmonic".
  const harmonicModes: HarmonicMode[] = c.vibrations.filter(
    (v) => v.internalRotorIndex === undefined || torsion === "harmonic",
  );
  const rotors: HinderedRotorModel[] =
    torsion === "harmonic"
      ? []
      : c.internalRotors.map((r) =>
          buildHinderedRotor(torsion === "free-rotor" ? { ...r, barrierInvCm: 0 } : r, {
            maxTemperatureK: maxT * (1 + margin),
          }),
        );

  const classicalThetaMax =
    c.geometry === "atom" || levelSumLinear
      ? 0
      : Math.max(...c.rotationalConstantsInvCm.map(wavenumberToKelvin));
  const minT =
    c.geometry === "atom" || levelSumLinear ? 20 : Math.max(50, Math.ceil(5 * classicalThetaMax));
  const validTemperatureK = Object.freeze({ min: minT, max: maxT });

  const methodParts = [
    "translation",
    c.geometry === "atom"
      ? ""
      : levelSumLinear
        ? `rotational level sum${c.centrifugalDistortionInvCm ? " with centrifugal distortion" : ""}${
            c.nuclearSpinWeights
              ? orthoPara === "normal"
                ? " (normal: ortho/para frozen at the high-temperature ratio)"
                : " (ortho/para equilibrium)"
              : ""
          }`
        : c.quarticDistortion
          ? "classical rotor with first-order centrifugal distortion"
          : "classical rigid rotor",
    c.vibrations.length > 0
      ? torsion === "harmonic" && c.internalRotors.length > 0
        ? "harmonic oscillators (torsion included)"
        : "harmonic oscillators"
      : "",
    "electronic levels",
    rotors.length > 0
      ? torsion === "free-rotor"
        ? "free internal rotor"
        : "hindered internal rotor (exact levels)"
      : "",
  ].filter((s) => s !== "");
  const method = `statistical mechanics (${methodParts.join(", ")})`;

  const check = (temperatureK: number): number => {
    checkTemperatureRange(c.id, method, validTemperatureK, temperatureK, {
      extrapolationMargin: margin,
    });
    return temperatureK;
  };

  const levelOptions = {
    centrifugalDistortionInvCm: c.centrifugalDistortionInvCm,
    spinModifications: orthoPara,
  };
  const distortion =
    c.geometry === "nonlinear" && c.quarticDistortion
      ? distortionCoefficient(c.rotationalConstantsInvCm, c.quarticDistortion)
      : 0;
  const rotation = (t: number): ThermoContribution => {
    if (c.geometry === "atom") return NO_CONTRIBUTION;
    if (c.geometry === "linear") {
      return levelSumLinear
        ? linearRotorLevelsContribution(
            c.rotationalConstantsInvCm[0],
            c.symmetryNumber,
            spinWeights,
            t,
            levelOptions,
          )
        : linearRotorContribution(c.rotationalConstantsInvCm[0], c.symmetryNumber, t);
    }
    const rigid = nonlinearRotorContribution(c.rotationalConstantsInvCm, c.symmetryNumber, t);
    return distortion === 0
      ? rigid
      : sumContributions([rigid, rotorDistortionContribution(distortion, t)]);
  };

  type Parts = {
    translation: ThermoContribution;
    rotation: ThermoContribution;
    vibration: ThermoContribution;
    electronic: ThermoContribution;
    internalRotation: ThermoContribution;
    total: ThermoContribution;
  };
  // One-entry memo: callers usually ask cp, h and s at the same temperature in a row.
  let lastT = NaN;
  let lastParts: Parts | undefined;
  const parts = (t: number): Parts => {
    if (t === lastT && lastParts) return lastParts;
    const translation = translationalContribution(c.molarMassKgPerMol, t);
    const rot = rotation(t);
    const vibration = harmonicVibrationContribution(harmonicModes, t);
    const electronic = electronicContribution(c.electronicLevels, t);
    const internalRotation = sumContributions(rotors.map((r) => r.contribution(t)));
    const total = sumContributions([translation, rot, vibration, electronic, internalRotation]);
    lastT = t;
    lastParts = Object.freeze({
      translation: Object.freeze(translation),
      rotation: Object.freeze(rot),
      vibration: Object.freeze(vibration),
      electronic: Object.freeze(electronic),
      internalRotation: Object.freeze(internalRotation),
      total: Object.freeze(total),
    });
    return lastParts;
  };

  const h298 = parts(STANDARD_TEMPERATURE_K).total.enthalpyFrom0K;

  return Object.freeze({
    componentId: c.id,
    method,
    source: c.sources.join("; "),
    validTemperatureK,
    constants: c,
    torsion,
    contributions: (temperatureK: number) => parts(check(temperatureK)),
    cp: (temperatureK: number) => parts(check(temperatureK)).total.cp,
    enthalpyFrom0K: (temperatureK: number) => parts(check(temperatureK)).total.enthalpyFrom0K,
    enthalpyFrom298: (temperatureK: number) =>
      parts(check(temperatureK)).total.enthalpyFrom0K - h298,
    entropyStandard: (temperatureK: number) => parts(check(temperatureK)).total.entropy,
  });
}
