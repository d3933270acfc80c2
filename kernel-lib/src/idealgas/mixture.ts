/**
 * Ideal-gas mixture: molar properties at (T, P, x) from one IdealGasPure per component (any route:
 * heat-capacity correlations or statistical mechanics), in an explicit reference state:
 *   h  = sum x_i h_i(T)
 *   s  = sum x_i s_i(T, P_ref) - R ln(P / P_ref) - R sum x_i ln x_i   (ideal entropy of mixing)
 *   u  = h - R T,  g = h - T s,  a = u - T s,  cp = sum x_i cp_i,  cv = cp - R
 * (e.g. Smith, Van Ness & Abbott, Introduction to Chemical Engineering Thermodynamics, 7th ed.,
 * ch. 10, ideal-gas mixture model). Components with x_i = 0 contribute nothing (0 ln 0 = 0) and are
 * not evaluated, so a zero entry never triggers a range error. Warnings a component carries (e.g. a
 * group-contribution cp, or a pseudo-component estimated outside its correlation's range) are passed
 * on to every result in which that component is present.
 */
import { R } from "../constants.js";
import { InputError, type ResultWarning } from "../errors.js";
import { checkMoleFractions } from "../components/composition.js";
import type { Component } from "../components/types.js";
import { requirePositive } from "../validate.js";
import { pushUnique } from "./messages.js";
import { formationReferenceState, pureReferenceValues } from "./referenceState.js";
import { checkTemperatureRange, type TemperatureRangeOptions } from "./temperatureRange.js";
import {
  STANDARD_PRESSURE_PA,
  type IdealGasMixture,
  type IdealGasProperties,
  type IdealGasPure,
  type ReferenceState,
} from "./types.js";
import { uncheckedPureOf, type UncheckedPure } from "./uncheckedPure.js";
import type { CpAndIntegrals } from "./cpCorrelation.js";
import { registerLeanIdealGas, type IdealGasValues } from "./leanMixture.js";

const NO_WARNINGS: readonly ResultWarning[] = Object.freeze([]);

/** Options for `idealGasMixture`. */
export interface IdealGasMixtureOptions extends TemperatureRangeOptions {
  /** Zero of h and s. Default: the formation basis ({ kind: "formation" }). */
  referenceState?: ReferenceState;
  /**
   * Components in the same order as the pures, supplying enthalpies of formation for the formation
   * basis. Default: the component a correlation pure carries, else a table lookup by componentId.
   */
  components?: readonly Component[];
}

/**
 * Builds an ideal-gas mixture model.
 * @example
 * const gas = idealGasMixture(["methane", "ethane"].map((n) => idealGasFromCorrelation(getComponent(n))));
 * gas.at(400, 2e6, [0.9, 0.1]).h // J/mol, formation basis
 */
export function idealGasMixture(
  pures: readonly IdealGasPure[],
  options: IdealGasMixtureOptions = {},
): IdealGasMixture {
  if (!(Array.isArray(pures) && pures.length > 0)) {
    throw new InputError({
      input: "pures",
      unit: "-",
      validRange: "a non-empty array of IdealGasPure",
      received: pures,
    });
  }
  pures.forEach((p, i) => {
    if (!(
      p &&
      typeof p.cp === "function" &&
      typeof p.enthalpyFrom298 === "function" &&
      typeof p.entropyStandard === "function"
    )) {
      throw new InputError({
        input: `pures[${i}]`,
        unit: "-",
        validRange: "an IdealGasPure",
        received: p,
      });
    }
  });
  const components = options.components;
  if (components !== undefined && components.length !== pures.length) {
    throw new InputError({
      input: "components.length",
      unit: "-",
      validRange: `${pures.length} (one per pure)`,
      received: components.length,
    });
  }
  const referenceState = options.referenceState ?? formationReferenceState();
  if (referenceState.kind === "saturated-liquid") {
    // needs the fluid's residual model for the saturated liquids: defineFluid applies it
    throw new InputError({
      input: "referenceState.kind",
      unit: "-",
      validRange: '"formation" or "zero-at" for an ideal-gas mixture on its own',
      received: referenceState.kind,
      hint: "Give the saturated-liquid convention to defineFluid, which has the model for the saturated liquids",
    });
  }
  if (referenceState.kind === "zero-at") {
    requirePositive("referenceState.temperatureK", referenceState.temperatureK, "K");
    requirePositive("referenceState.pressurePa", referenceState.pressurePa, "Pa");
  }
  const list = Object.freeze([...pures]);
  const fast = prepareFastPath(list, referenceState, components);
  // one scratch record per mixture for the pure values of the fast path (no allocation per call)
  const scratch: CpAndIntegrals = { cp: 0, hFrom298: 0, sFrom298: 0 };
  // R ln(P / P_ref) of the last fast-path call, and its pressure
  let lastPressurePa = NaN;
  let lastPressureTerm = NaN;
  // R ln x_i of the last fast-path composition (0 for x_i = 1 or 0): a state loop at one
  // composition takes the n logarithms once; the same numbers, so the same sums
  const lastX = new Float64Array(list.length).fill(NaN);
  const lastMixing = new Float64Array(list.length);

  function at(temperatureK: number, pressurePa: number, x: readonly number[]): IdealGasProperties {
    requirePositive("temperatureK", temperatureK, "K");
    requirePositive("pressurePa", pressurePa, "Pa");
    checkMoleFractions(x, list.length);
    const v: IdealGasValues = { h: 0, s: 0, u: 0, a: 0, g: 0, cp: 0, cv: 0 };
    if (!fastInto(temperatureK, pressurePa, x, v)) return generalAt(temperatureK, pressurePa, x);
    return Object.freeze({
      temperatureK,
      pressurePa,
      h: v.h,
      s: v.s,
      u: v.u,
      a: v.a,
      g: v.g,
      cp: v.cp,
      cv: v.cv,
      referenceState,
      warnings: NO_WARNINGS,
    });
  }

  /**
   * The common case without a branch that could warn or throw: every present component has an
   * unchecked evaluator, carries no warnings, has its reference data, and T (and a zero-at T0) lies
   * inside its range. Same formulas as generalAt; writes into `out`, false when any condition fails.
   */
  function fastInto(
    temperatureK: number,
    pressurePa: number,
    x: readonly number[],
    out: IdealGasValues,
  ): boolean {
    if (fast === undefined || x.length !== list.length) return false;
    const margin = options.extrapolationMargin;
    if (!(margin === undefined || (margin >= 0 && margin < 1))) return false;
    let h = 0;
    let s = 0;
    let cp = 0;
    // every pure refers its entropy to the same pressure, so R ln(P / P_ref) is taken once (and
    // kept for the next call: the state layer always asks at the same pressure)
    if (pressurePa !== lastPressurePa) {
      lastPressureTerm = R * Math.log(pressurePa / fast[0].pressurePa);
      lastPressurePa = pressurePa;
    }
    const pressureTerm = lastPressureTerm;
    // ln T once for every component's correlation
    const lnT = Math.log(temperatureK);
    for (let i = 0; i < list.length; i++) {
      const xi = x[i];
      if (xi === 0) continue;
      const f = fast[i];
      if (!(f.usable && temperatureK >= f.min && temperatureK <= f.max)) return false;
      const v = scratch;
      f.unchecked.evaluateWithLog(temperatureK, lnT, v);
      h += xi * (f.h0 + v.hFrom298 - f.hShift);
      // ideal mixing, R ln x_i (0 for a pure component, without the logarithm), kept per x_i
      let mixing: number;
      if (xi === lastX[i]) {
        mixing = lastMixing[i];
      } else {
        mixing = xi === 1 ? 0 : R * Math.log(xi);
        lastX[i] = xi;
        lastMixing[i] = mixing;
      }
      s += xi * (f.s0 + v.sFrom298 - f.sShift - pressureTerm - mixing);
      cp += xi * v.cp;
    }
    const u = h - R * temperatureK;
    out.h = h;
    out.s = s;
    out.u = u;
    out.a = u - temperatureK * s;
    out.g = h - temperatureK * s;
    out.cp = cp;
    out.cv = cp - R;
    return true;
  }

  function generalAt(
    temperatureK: number,
    pressurePa: number,
    x: readonly number[],
  ): IdealGasProperties {
    const warnings: ResultWarning[] = [];
    let h = 0;
    let s = 0;
    let cp = 0;
    for (let i = 0; i < list.length; i++) {
      if (x[i] === 0) continue;
      const pure = list[i];
      for (const w of checkTemperatureRange(
        pure.componentId,
        pure.method,
        pure.validTemperatureK,
        temperatureK,
        options,
      )) {
        pushUnique(warnings, w);
      }
      if (referenceState.kind === "zero-at") {
        for (const w of checkTemperatureRange(
          pure.componentId,
          pure.method,
          pure.validTemperatureK,
          referenceState.temperatureK,
          options,
        )) {
          pushUnique(warnings, w);
        }
      }
      const carried =
        components?.[i] ?? (pure as IdealGasPure & { component?: Component }).component;
      for (const w of carried?.warnings ?? []) pushUnique(warnings, w);
      const ref = pureReferenceValues(pure, temperatureK, referenceState, components?.[i]);
      h += x[i] * ref.h;
      s += x[i] * (ref.s - R * Math.log(pressurePa / ref.pressurePa) - R * Math.log(x[i]));
      cp += x[i] * pure.cp(temperatureK);
    }
    const u = h - R * temperatureK;
    return Object.freeze({
      temperatureK,
      pressurePa,
      h,
      s,
      u,
      a: u - temperatureK * s,
      g: h - temperatureK * s,
      cp,
      cv: cp - R,
      referenceState,
      warnings: Object.freeze(warnings),
    });
  }

  const mixture: IdealGasMixture = Object.freeze({ components: list, referenceState, at });
  registerLeanIdealGas(mixture, fastInto);
  return mixture;
}

/** What the fast path needs of one component, computed once per mixture. */
interface FastPure {
  /** False when a call must take the general path (a warning or an error is possible). */
  readonly usable: boolean;
  readonly unchecked: UncheckedPure;
  /** Range of the method, K. */
  readonly min: number;
  readonly max: number;
  /** Formation basis: Hf(298.15 K), J/mol; zero-at: 0. */
  readonly h0: number;
  /** Formation basis: s°(298.15 K), J/(mol K); zero-at: 0. */
  readonly s0: number;
  /** Zero-at: h°(T0) - h°(298.15 K), J/mol; formation: 0. */
  readonly hShift: number;
  /** Zero-at: s°(T0) - s°(298.15 K), J/(mol K); formation: 0. */
  readonly sShift: number;
  /** Pressure at which the pure's entropy is referred, Pa. */
  readonly pressurePa: number;
}

/**
 * Per-component constants of the fast path, or undefined when a pure has no unchecked evaluator
 * (a user's own IdealGasPure, the molecular route) so every call takes the general path.
 */
function prepareFastPath(
  list: readonly IdealGasPure[],
  referenceState: ReferenceState,
  components: readonly Component[] | undefined,
): FastPure[] | undefined {
  if (referenceState.kind === "fluid-convention" || referenceState.kind === "saturated-liquid") {
    return undefined;
  }
  const out: FastPure[] = [];
  for (let i = 0; i < list.length; i++) {
    const pure = list[i];
    const unchecked = uncheckedPureOf(pure);
    if (unchecked === undefined) return undefined;
    const own = (pure as IdealGasPure & { component?: Component }).component;
    const carried = components?.[i] ?? own;
    const min = pure.validTemperatureK.min;
    const max = pure.validTemperatureK.max;
    let usable = (carried?.warnings ?? []).length === 0;
    let h0 = 0;
    let s0 = 0;
    let hShift = 0;
    let sShift = 0;
    let pressurePa: number = STANDARD_PRESSURE_PA;
    if (referenceState.kind === "formation") {
      h0 = (components?.[i] ?? own)?.enthalpyOfFormationJPerMol ?? NaN;
      s0 = unchecked.absoluteEntropy298;
      usable &&= Number.isFinite(h0) && Number.isFinite(s0);
    } else {
      const t0 = referenceState.temperatureK;
      usable &&= t0 >= min && t0 <= max;
      if (usable) {
        const v: CpAndIntegrals = { cp: 0, hFrom298: 0, sFrom298: 0 };
        unchecked.evaluate(t0, v);
        hShift = v.hFrom298;
        sShift = v.sFrom298;
      }
      pressurePa = referenceState.pressurePa;
    }
    out.push({ usable, unchecked, min, max, h0, s0, hShift, sShift, pressurePa });
  }
  return out;
}
