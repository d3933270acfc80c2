/**
 * A fluid: components, model, interaction parameters, ideal-gas route and reference state bound
 * together, with the state functions as methods. The entry point notebooks and `isochor eval` use.
 *
 *   const gas = defineFluid({ components: ["hydrogen", "methane"], model: "peng-robinson" });
 *   gas.stateAtTP(310, 25e5, [0.7, 0.3]).molar.h;
 */
import { InputError } from "../errors.js";
import type { Component } from "../components/types.js";
import { getComponent } from "../components/getComponent.js";
import type { IdealGasMixture, IdealGasPure, ReferenceState } from "../idealgas/types.js";
import { idealGasFromCorrelation } from "../idealgas/correlationPure.js";
import { idealGasMixture } from "../idealgas/mixture.js";
import { zeroAtReferenceState } from "../idealgas/referenceState.js";
import { shiftedIdealGas, zeroAtIdealGas } from "../idealgas/shiftedMixture.js";
import { shiftToSaturatedLiquid } from "./saturatedLiquidReference.js";
import { idealGasFromMolecule } from "../idealgas/molecular/index.js";
import type { PseudoCriticalPoint, ResidualModel } from "../eos/types.js";
import { R } from "../constants.js";
import { createModel, type ModelId } from "../eos/createModel.js";
import { hasPressureFunction } from "../eos/pressureFunction.js";
import type { InteractionNote } from "../eos/interaction/interactionTable.js";
import { modelFromPressure } from "../departure/pressureModel.js";
import type { IntegrationOptions } from "../departure/integrateIsotherm.js";
import {
  stateAtTP,
  stateAtTRho,
  densityRootsAtTP,
  type DensityRoot,
  type StateAtTPOptions,
} from "../state/stateAt.js";
import {
  PHASE_SPLIT_NOT_TESTED,
  temperatureAtPH,
  temperatureAtPS,
  type InversionOptions,
  type InversionResult,
} from "../state/inversions.js";
import type { DepartureMethod, FluidBinding, FluidState } from "../state/types.js";
import { checkComposition, checkPressure, checkTemperature } from "../state/checkInputs.js";
import { stabilityAtTP, type StabilityOptions, type StabilityResult } from "../phase/stability.js";
import {
  saturationPointAtPressure,
  saturationPointAtTemperature,
  type MixtureSaturationPoint,
  type SaturationPointOptions,
} from "../phase/envelope/saturationPoint.js";
import {
  bubblePointAtPressure,
  bubblePointAtTemperature,
  dewPointAtPressure,
  dewPointAtTemperature,
  type BubbleDewOptions,
} from "../phase/envelope/bubbleDew.js";
import {
  phaseEnvelope,
  type PhaseEnvelope,
  type PhaseEnvelopeOptions,
} from "../phase/envelope/phaseEnvelope.js";
import {
  mixtureCriticalPoint,
  type MixtureCriticalOptions,
  type MixtureCriticalPoint,
} from "../phase/envelope/mixtureCriticalPoint.js";
import { flashTP, type FlashOptions } from "../phase/flash/flashTP.js";
import {
  flashPH,
  flashPS,
  flashTS,
  flashUV,
  type StateFlashOptions,
} from "../phase/flash/stateFunctionFlash.js";
import type { Equilibrium, StateFunctionEquilibrium } from "../phase/flash/types.js";
import { runSweep } from "../sweep/runSweep.js";
import type { SweepRequest, SweepResult } from "../sweep/types.js";
import { transportOfState } from "../transport/transportAt.js";
import type { TransportOfState, TransportOptions } from "../transport/types.js";
import { referenceIdealGasMixture } from "../eos/multiparameter/referenceIdealGas.js";
import type { ReferenceFluid } from "../eos/multiparameter/referenceFluid.js";
import { phaseStateOf, splitWarning, type PhaseState, type StateRequest } from "./phaseState.js";

// the composition of a pure fluid when none is given, shared and never written to (states copy
// x). Not frozen: a frozen array has other elements kinds and slowed every state call by half.
const PURE: readonly number[] = [1];

/** Per-component overrides of the table's constants (SI). */
export interface ConstantOverrides {
  /** K */
  criticalTemperatureK?: number;
  /** Pa */
  criticalPressurePa?: number;
  acentricFactor?: number;
  /** kg/mol */
  molarMassKgPerMol?: number;
  /** m3/mol */
  criticalVolumeM3PerMol?: number;
}

/** Options of {@link defineFluid}. */
export interface FluidSpec {
  /** Component ids (or names the component table knows), or Component records. */
  components: readonly (string | Component)[];
  /** A built-in model id, or any ResidualModel (e.g. from modelFromPressure). Default "peng-robinson". */
  model?: ModelId | ResidualModel;
  /** Binary interaction matrix k_ij. Default: eos/data/kij.json, zero where unknown. */
  kij?: readonly (readonly number[])[];
  /** Overrides of the table constants, one entry (or undefined) per component. */
  constants?: readonly (ConstantOverrides | undefined)[];
  /**
   * Ideal-gas route: "correlation" (default), "molecular", or your own IdealGasMixture. With a
   * reference equation as the model (`referenceFluid("water")`) the default is the equation's own
   * ideal part in the publication's reference state.
   */
  idealGas?: "correlation" | "molecular" | IdealGasMixture;
  /**
   * Zero of h and s. Default: the formation basis; with a reference equation, the publication's
   * own convention unless one is asked for here (each is honoured, none dropped).
   */
  referenceState?: ReferenceState;
  /**
   * "closed-form" (default) uses the model's own alpha_r; "numeric" integrates the model's pressure
   * function along the isotherm (departure/), to check one against the other.
   */
  departure?: DepartureMethod;
  /** Volume translation for built-in cubic models (see eos/volumeTranslation.ts). */
  volumeTranslation?: "peneloux" | "rackett" | readonly number[];
  /** Quadrature options of the numeric route. */
  integration?: Omit<IntegrationOptions, "composition" | "maxDensityMolPerM3">;
}

/** Options of a fluid's `stateAtTP`: those of the state layer plus the stability test. */
export interface FluidStateAtTPOptions extends StateAtTPOptions {
  /**
   * Mixtures (two or more components present): run the tangent-plane stability test
   * (phase/stability.ts) and add a "phase-split" warning when the mixture is not stable as one
   * phase here. Default true, so that no mixture state is reported single-phase inside the
   * two-phase region without a warning; the test costs about 20 single-phase states, so a loop
   * that knows its states are single-phase may pass false (its states are then not tested).
   */
  checkStability?: boolean;
}

/** Options of a fluid's `transportAtTP`: the state's (phase choice, stability) and the method's. */
export interface FluidTransportOptions extends FluidStateAtTPOptions, TransportOptions {}

/** A bound fluid with its state functions. */
export interface Fluid extends FluidBinding {
  readonly components: readonly Component[];
  readonly componentIds: readonly string[];
  /** k_ij provenance (built-in models with mixing rules; empty otherwise). */
  readonly interactionNotes: readonly InteractionNote[];
  /** Pairs whose k_ij was defaulted to zero, e.g. "hydrogen/methane". */
  readonly defaultedPairs: readonly string[];
  /**
   * THE state of the fluid from any one pair of specifications, as named fields (SI): (T, P),
   * (T, rho), (P, h), (P, s), (T, s), (u, rho), (T, vaporFraction), (P, vaporFraction), plus the
   * composition `x` (may be omitted for a pure fluid) and options (fluid/phaseState.ts). Mixtures
   * go through the verified flashes, so a state inside the two-phase region comes back with its
   * phases; a pure fluid through its saturation. Any other combination is an InputError.
   *
   * @example
   * ```ts
   * const st = gas.state({ P: 10e5, h: -80_000, x: [0.85, 0.1, 0.05] });
   * st.phase;                        // "two-phase"
   * st.phases.map((p) => p.amount);  // mol per mol feed, vapour first
   * st.check?.maxLnFugacityDifference; // <= 1e-10
   * ```
   */
  state(request: StateRequest): PhaseState;
  /** State at T (K), P (Pa); x may be omitted for a pure fluid. */
  stateAtTP(
    temperatureK: number,
    pressurePa: number,
    x?: readonly number[],
    options?: FluidStateAtTPOptions,
  ): FluidState;
  /** State at T (K), rho (mol/m3). */
  stateAtTRho(temperatureK: number, densityMolPerM3: number, x?: readonly number[]): FluidState;
  /** Every density root at (T, P). */
  densityRoots(temperatureK: number, pressurePa: number, x?: readonly number[]): DensityRoot[];
  /**
   * Is the mixture stable as one phase at T (K), P (Pa)? The tangent-plane test
   * (phase/stability.ts), started from Wilson K-factors with this fluid's critical constants.
   */
  stabilityAtTP(
    temperatureK: number,
    pressurePa: number,
    x?: readonly number[],
    options?: StabilityOptions,
  ): StabilityResult;
  /**
   * The phase envelope of the mixture z (phase/envelope/phaseEnvelope.ts): bubble and dew lines,
   * critical point, cricondenbar, cricondentherm, optional lines of constant vapour fraction;
   * `complete` false with `stoppedBecause` when it does not close.
   */
  envelope(z: readonly number[], options?: PhaseEnvelopeOptions): PhaseEnvelope;
  /** Bubble point of z at T (K): pressure and both phases. */
  bubblePointAtTemperature(
    temperatureK: number,
    z: readonly number[],
    options?: BubbleDewOptions,
  ): MixtureSaturationPoint;
  /** Bubble point of z at P (Pa): temperature and both phases. */
  bubblePointAtPressure(
    pressurePa: number,
    z: readonly number[],
    options?: BubbleDewOptions,
  ): MixtureSaturationPoint;
  /** Dew point of z at T (K). */
  dewPointAtTemperature(
    temperatureK: number,
    z: readonly number[],
    options?: BubbleDewOptions,
  ): MixtureSaturationPoint;
  /** Dew point of z at P (Pa). */
  dewPointAtPressure(
    pressurePa: number,
    z: readonly number[],
    options?: BubbleDewOptions,
  ): MixtureSaturationPoint;
  /**
   * Saturation point of any vapour fraction (`options.vaporFraction`) at T (K).
   * @deprecated Use `fluid.state({ T, vaporFraction, x })`: both phases in `phases[]`.
   */
  saturationPointAtTemperature(
    temperatureK: number,
    z: readonly number[],
    options?: SaturationPointOptions,
  ): MixtureSaturationPoint;
  /**
   * Saturation point of any vapour fraction (`options.vaporFraction`) at P (Pa).
   * @deprecated Use `fluid.state({ P, vaporFraction, x })`.
   */
  saturationPointAtPressure(
    pressurePa: number,
    z: readonly number[],
    options?: SaturationPointOptions,
  ): MixtureSaturationPoint;
  /** Critical point of the mixture z (Heidemann-Khalil criteria). */
  mixtureCriticalPoint(
    z: readonly number[],
    options?: MixtureCriticalOptions,
  ): MixtureCriticalPoint;
  /**
   * Phase equilibrium at T (K), P (Pa): one to three verified phases (phase/flash/flashTP.ts),
   * the stability test of this fluid's Wilson constants first.
   * @deprecated Use `fluid.state({ T, P, x })`: the same verified flash as one PhaseState.
   */
  flashTP(
    temperatureK: number,
    pressurePa: number,
    x?: readonly number[],
    options?: FlashOptions,
  ): Equilibrium;
  /**
   * Phase equilibrium at P (Pa) and molar enthalpy h (J/mol): a valve outlet.
   * @deprecated Use `fluid.state({ P, h, x })`: the same flash as one PhaseState.
   */
  flashPH(
    pressurePa: number,
    enthalpyJPerMol: number,
    x?: readonly number[],
    options?: StateFlashOptions,
  ): StateFunctionEquilibrium;
  /**
   * Phase equilibrium at P (Pa) and molar entropy s (J/(mol K)).
   * @deprecated Use `fluid.state({ P, s, x })`: the same flash as one PhaseState.
   */
  flashPS(
    pressurePa: number,
    entropyJPerMolK: number,
    x?: readonly number[],
    options?: StateFlashOptions,
  ): StateFunctionEquilibrium;
  /**
   * Phase equilibrium at T (K) and molar entropy s (J/(mol K)).
   * @deprecated Use `fluid.state({ T, s, x })`: the same flash as one PhaseState.
   */
  flashTS(
    temperatureK: number,
    entropyJPerMolK: number,
    x?: readonly number[],
    options?: StateFlashOptions,
  ): StateFunctionEquilibrium;
  /**
   * Phase equilibrium at molar internal energy u (J/mol) and molar density rho (mol/m3): a vessel.
   * @deprecated Use `fluid.state({ u, rho, x })`: the same flash as one PhaseState.
   */
  flashUV(
    internalEnergyJPerMol: number,
    densityMolPerM3: number,
    x?: readonly number[],
    options?: StateFlashOptions,
  ): StateFunctionEquilibrium;
  /**
   * T at (P, h) in one phase (valves). A mixture's result is tested for stability and carries a
   * "phase-split" warning when it lies inside the two-phase region.
   * @deprecated Use `fluid.state({ P, h, x })`: it finds the phases (a mixture inside the
   * two-phase region is never returned single-phase) and returns the one PhaseState.
   */
  temperatureAtPH(
    pressurePa: number,
    enthalpyJPerMol: number,
    x?: readonly number[],
    options?: InversionOptions,
  ): InversionResult;
  /**
   * Many states at once (sweep/): arrays or ranges of (T, P), (T, rho), (P, h) or (P, s), the
   * wanted properties written into Float64Arrays, a phase count and kind and an error code per
   * point (a failing point never stops the sweep). Mixture points that split are flashed.
   * @example
   * ```ts
   * const r = fluid.sweep({ specification: "TP", first: { from: 200, to: 500, count: 200 },
   *   second: { from: 1e5, to: 20e6, count: 200 }, properties: ["h", "s"] });
   * r.values.h; // Float64Array of 40,000 J/mol, T-major
   * ```
   */
  sweep(request: SweepRequest): SweepResult;
  /**
   * The definition this fluid was built from (components, model, k_ij, ideal gas, reference
   * state), kept so that worker threads can build the same fluid (parallel/).
   */
  readonly spec: FluidSpec;
  /**
   * T at (P, s) in one phase (compressors, expanders); a mixture's result is tested like
   * temperatureAtPH's.
   * @deprecated Use `fluid.state({ P, s, x })`, which finds the phases.
   */
  temperatureAtPS(
    pressurePa: number,
    entropyJPerMolK: number,
    x?: readonly number[],
    options?: InversionOptions,
  ): InversionResult;
  /**
   * Viscosity (Pa s) and thermal conductivity (W/(m K)) of the single-phase state at T (K),
   * P (Pa) (transport/: IAPWS 2008/2011 for IAPWS-95 water, Chung et al. 1988 otherwise).
   */
  transportAtTP(
    temperatureK: number,
    pressurePa: number,
    x?: readonly number[],
    options?: FluidTransportOptions,
  ): TransportOfState;
  /** Viscosity and thermal conductivity of a state of this fluid (e.g. one phase of a flash). */
  transportOfState(state: FluidState, options?: TransportOptions): TransportOfState;
}

function resolveComponents(spec: FluidSpec): Component[] {
  if (!(Array.isArray(spec.components) && spec.components.length > 0)) {
    throw new InputError({
      input: "components",
      unit: "-",
      validRange: "a non-empty list of component ids or records",
      received: spec.components,
    });
  }
  const resolved = spec.components.map((c, i): Component => {
    const entry: unknown = c;
    if (!(typeof entry === "string" || (isRecord(entry) && typeof entry.id === "string"))) {
      throw new InputError({
        input: `components[${i}]`,
        unit: "-",
        validRange: "a component id or name (string) or a Component record",
        received: c,
      });
    }
    return typeof c === "string" ? getComponent(c) : c;
  });
  refuseDuplicates(spec.components, resolved);
  return resolved.map((base, i) => {
    const o = spec.constants?.[i];
    if (!o) return base;
    return {
      ...base,
      criticalTemperatureK: o.criticalTemperatureK ?? base.criticalTemperatureK,
      criticalPressurePa: o.criticalPressurePa ?? base.criticalPressurePa,
      acentricFactor: o.acentricFactor ?? base.acentricFactor,
      molarMassKgPerMol: o.molarMassKgPerMol ?? base.molarMassKgPerMol,
      criticalVolumeM3PerMol: o.criticalVolumeM3PerMol ?? base.criticalVolumeM3PerMol,
    };
  });
}

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}

/**
 * A copy of the definition down to its arrays and per-component overrides (the k_ij matrix is
 * the usual thing a notebook edits in place after defining a fluid), so `fluid.spec`, which the
 * worker threads rebuild the fluid from, stays what the fluid was built with.
 */
function specCopy(spec: FluidSpec): FluidSpec {
  const copy: FluidSpec = { ...spec, components: [...spec.components] };
  if (spec.kij !== undefined) copy.kij = spec.kij.map((row) => [...row]);
  if (Array.isArray(spec.volumeTranslation)) copy.volumeTranslation = [...spec.volumeTranslation];
  if (spec.constants !== undefined) {
    copy.constants = spec.constants.map((c) => (c === undefined ? undefined : { ...c }));
  }
  return copy;
}

/** Refuses spec fields of the wrong kind (a notebook may pass anything) before they are used. */
function checkSpecFields(spec: FluidSpec): void {
  const fail = (input: string, validRange: string, received: unknown): never => {
    throw new InputError({ input, unit: "-", validRange, received });
  };
  const m: unknown = spec.model;
  if (!(
    m === undefined ||
    typeof m === "string" ||
    (isRecord(m) && typeof m.residual === "function" && isRecord(m.info))
  )) {
    fail("model", "a model id (string) or a ResidualModel object", m);
  }
  const ig: unknown = spec.idealGas;
  if (!(
    ig === undefined ||
    ig === "correlation" ||
    ig === "molecular" ||
    (isRecord(ig) && typeof ig.at === "function")
  )) {
    fail("idealGas", '"correlation" or "molecular" or an IdealGasMixture', ig);
  }
  const dep: unknown = spec.departure;
  if (!(dep === undefined || dep === "closed-form" || dep === "numeric")) {
    fail("departure", '"closed-form" or "numeric"', dep);
  }
  const constants: unknown = spec.constants;
  if (constants !== undefined) {
    if (!Array.isArray(constants))
      fail("constants", "an array with one entry per component", constants);
    (constants as unknown[]).forEach((c, i) => {
      if (!(c === undefined || c === null || isRecord(c))) {
        fail(`constants[${i}]`, "an object of constant overrides, or undefined", c);
      }
    });
  }
  const ref: unknown = spec.referenceState;
  if (!(
    ref === undefined ||
    (isRecord(ref) &&
      (ref.kind === "formation" ||
        ref.kind === "zero-at" ||
        ref.kind === "fluid-convention" ||
        ref.kind === "saturated-liquid"))
  )) {
    fail(
      "referenceState",
      '{ kind: "formation" }, { kind: "zero-at", temperatureK, pressurePa }, { kind: "saturated-liquid", at: "0 degC" | "-40 degC" | "normal-boiling-point" | K } or { kind: "fluid-convention", description }',
      ref,
    );
  }
}

/**
 * A reference equation's ideal part on the zero the caller asked for. "zero-at" moves it so the
 * ideal gas has h = s = 0 at (T0, P0); "formation" so the ideal gas at 298.15 K and 1 bar has the
 * component table's enthalpy of formation and third-law entropy (the values the correlation route
 * uses on that basis). No request or "fluid-convention" keeps the publication's own zero; a
 * saturated-liquid convention is applied afterwards on the fluid's own saturated liquid.
 */
function referenceOnRequestedZero(
  inner: IdealGasMixture,
  requested: ReferenceState | undefined,
  components: readonly Component[],
): IdealGasMixture {
  if (requested === undefined) return inner;
  if (requested.kind === "zero-at") {
    return zeroAtIdealGas(inner, requested.temperatureK, requested.pressurePa);
  }
  if (requested.kind !== "formation") return inner;
  const T0 = 298.15;
  const P0 = 1e5;
  const target = idealGasMixture(
    components.map((c) => idealGasFromCorrelation(c)),
    { referenceState: requested, components },
  );
  const n = components.length;
  const dh = new Float64Array(n);
  const ds = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const pure = Array.from({ length: n }, (_, i) => (i === k ? 1 : 0));
    const want = target.at(T0, P0, pure);
    const own = inner.at(T0, P0, pure);
    dh[k] = want.h - own.h;
    ds[k] = want.s - own.s;
  }
  return shiftedIdealGas(inner, dh, ds, requested);
}

/**
 * Refuses one component listed twice: two entries that resolve to the same id (whether written as
 * id, name, formula, CAS number or synonym), or two records with the same CAS number. A formula
 * alone is not a duplicate: isomers share one (n-butane and isobutane, C4H10).
 */
function refuseDuplicates(
  given: readonly (string | Component)[],
  resolved: readonly Component[],
): void {
  const label = (i: number): string =>
    `components[${i}] ${JSON.stringify(typeof given[i] === "string" ? given[i] : resolved[i].id)}`;
  for (let j = 1; j < resolved.length; j++) {
    for (let i = 0; i < j; i++) {
      const a = resolved[i];
      const b = resolved[j];
      const sameCas =
        a.casNumber !== "" && a.casNumber !== undefined && a.casNumber === b.casNumber;
      if (a.id === b.id || sameCas) {
        throw new InputError({
          input: `components[${j}]`,
          unit: "-",
          validRange: `a component not already listed (${label(i)} and ${label(j)} are the same component: ${a.id}${sameCas ? `, CAS ${a.casNumber}` : ""})`,
          received: given[j],
          hint: "list each component once and add up its mole fractions",
        });
      }
    }
  }
}

/**
 * Kay's rule (W. B. Kay, Ind. Eng. Chem. 28 (1936) 1014): mole-fraction averages of Tc, Pc and Vc;
 * Vc from Zc = 0.29 when the table has none (common practice, no source).
 */
function kayPseudoCritical(
  components: readonly Component[],
  x: readonly number[],
): PseudoCriticalPoint {
  let T = 0;
  let P = 0;
  let V = 0;
  components.forEach((c, i) => {
    T += x[i] * c.criticalTemperatureK;
    P += x[i] * c.criticalPressurePa;
    V +=
      x[i] *
      (c.criticalVolumeM3PerMol > 0
        ? c.criticalVolumeM3PerMol
        : (0.29 * R * c.criticalTemperatureK) / c.criticalPressurePa);
  });
  return {
    temperatureK: T,
    pressurePa: P,
    densityMolPerM3: 1 / V,
    rule: "Kay's rule on the component table",
  };
}

/** Number of components with a positive mole fraction. */
function presentCount(x: readonly number[]): number {
  let n = 0;
  for (const v of x) if (v > 0) n++;
  return n;
}

/**
 * A single-phase inversion of a mixture with the stability test made at its result: the state
 * layer's note that it could not test (state/inversions.ts) is replaced by the test's verdict,
 * a "phase-split" warning when the mixture splits there (the (P, h) or (P, s) point lies inside
 * the two-phase region; flashPH / flashPS give the phases).
 */
function inversionWithStabilityCheck(binding: FluidBinding, r: InversionResult): InversionResult {
  const x = r.state.x;
  if (presentCount(x) < 2) return r;
  const kept = r.state.warnings.filter((w) => w.message !== PHASE_SPLIT_NOT_TESTED);
  const split = splitWarning(binding, r.temperatureK, r.state.pressurePa, x);
  const warnings = split === undefined ? kept : kept.concat(split);
  return { ...r, state: { ...r.state, warnings } };
}

/**
 * The state at (T, P) of the state layer, with the stability test's warning added last when
 * asked for (a mixture; the test of a pure fluid is its saturation, phase/pureFluidPhase.ts).
 */
function stateWithStabilityCheck(
  binding: FluidBinding,
  T: number,
  P: number,
  x: readonly number[],
  options: FluidStateAtTPOptions | undefined,
): FluidState {
  const state = stateAtTP(binding, T, P, x, options);
  if (options?.checkStability === false || presentCount(x) < 2) return state;
  const split = splitWarning(binding, T, P, x);
  return split === undefined ? state : { ...state, warnings: state.warnings.concat(split) };
}

/** A reference equation (fluid/referenceFluids.ts) passed as the model. */
function isReferenceFluid(model: ResidualModel): model is ReferenceFluid {
  const m = model as Partial<ReferenceFluid>;
  return typeof m.idealReduced === "function" && typeof m.molarMassKgPerMol === "number";
}

function bindMethods(model: ResidualModel): ResidualModel {
  // class-based models use `this`; copy their methods bound so spreading keeps them working
  const m = model as unknown as Record<string, unknown>;
  const out: Record<string, unknown> = {};
  for (const key of [
    "residual",
    "maxDensity",
    "densityRoots",
    "pseudoCritical",
    "checkValidity",
    "pressure",
  ]) {
    const f = m[key];
    if (typeof f === "function") out[key] = (f as (...a: unknown[]) => unknown).bind(model);
  }
  return out as unknown as ResidualModel;
}

/**
 * Binds components, model, k_ij, ideal-gas route and reference state into a fluid.
 *
 * @example
 * ```ts
 * const fuelGas = defineFluid({ components: ["hydrogen", "methane", "ethane"], model: "peng-robinson" });
 * const s = fuelGas.stateAtTP(313.15, 25e5, [0.6, 0.3, 0.1]);
 * s.residual.h; // J/mol, enthalpy departure at the same T and P
 * ```
 */
export function defineFluid(spec: FluidSpec): Fluid {
  if (!isRecord(spec)) {
    throw new InputError({
      input: "spec",
      unit: "-",
      validRange:
        'an object, the argument of defineFluid, e.g. { components: ["methane"], model: "peng-robinson" }',
      received: spec,
    });
  }
  checkSpecFields(spec);
  const components = resolveComponents(spec);
  const ids = components.map((c) => c.id);
  const modelSpec = spec.model ?? "peng-robinson";
  let model: ResidualModel =
    typeof modelSpec === "string"
      ? createModel(modelSpec, components, {
          kij: spec.kij,
          volumeTranslation: spec.volumeTranslation,
        })
      : modelSpec;
  // a model built from a pressure function is numeric by nature
  const isPressureModel = typeof model.integrate === "function";
  const departureMethod: DepartureMethod = isPressureModel
    ? "numeric"
    : (spec.departure ?? "closed-form");
  if (departureMethod === "numeric" && !isPressureModel) {
    if (!hasPressureFunction(model)) {
      throw new InputError({
        input: "departure",
        unit: "-",
        validRange: `"closed-form" for a model without a hyper-dual pressure function (${model.info.name})`,
        received: "numeric",
      });
    }
    const base = model;
    const bound = bindMethods(base);
    const numeric = modelFromPressure({
      name: `${base.info.name}, departures by numerical integration`,
      components: ids,
      pressure: base.pressureFunction,
      maxDensity: (T, x) => bound.maxDensity(T, x),
      citation: base.info.citation,
      gasConstant: base.gasConstant,
      integration: spec.integration,
    });
    model = {
      ...numeric,
      info: { ...base.info, name: numeric.info.name, citation: numeric.info.citation },
      densityRoots: bound.densityRoots,
      pseudoCritical: bound.pseudoCritical,
      checkValidity: (T, rho, x) => [
        ...(bound.checkValidity ? bound.checkValidity(T, rho, x) : []),
        ...numeric.checkValidity!(T, rho, x),
      ],
    };
  }
  if (!model.pseudoCritical) {
    // phase labels need a (pseudo-)critical point: Kay's rule on the table constants
    const labelled = bindMethods(model);
    model = {
      ...model,
      ...labelled,
      info: model.info,
      gasConstant: model.gasConstant,
      pseudoCritical: (x) => kayPseudoCritical(components, x),
    };
  }
  if (model.info.componentIds.length !== components.length) {
    throw new InputError({
      input: "model",
      unit: "-",
      validRange: `a model for ${components.length} components (${ids.join(", ")})`,
      received: model.info.componentIds,
    });
  }
  let idealGas: IdealGasMixture;
  const reference = isReferenceFluid(model) ? model : undefined;
  if (reference !== undefined && reference.info.componentIds.join() !== ids.join()) {
    throw new InputError({
      input: "components",
      unit: "-",
      validRange: `the component of the reference equation (${reference.info.componentIds.join(", ")})`,
      received: ids,
    });
  }
  const route = spec.idealGas ?? (reference ? reference : "correlation");
  // a saturated-liquid convention is applied on top of an auxiliary zero-at basis (the fluid's
  // own model gives the saturated liquids): fluid/saturatedLiquidReference.ts
  const tradeReference =
    spec.referenceState?.kind === "saturated-liquid" ? spec.referenceState : undefined;
  if (reference !== undefined && route === reference) {
    // a reference equation carries its own ideal part and the publication's reference state,
    // moved to the zero the caller asked for
    idealGas = referenceOnRequestedZero(
      referenceIdealGasMixture(reference),
      spec.referenceState,
      components,
    );
  } else if (route === "correlation" || route === "molecular") {
    const pures: IdealGasPure[] = components.map((c) =>
      route === "correlation" ? idealGasFromCorrelation(c) : idealGasFromMolecule(c.id),
    );
    const referenceState = tradeReference ? zeroAtReferenceState(298.15, 1e5) : spec.referenceState;
    idealGas = idealGasMixture(pures, { referenceState, components });
  } else {
    idealGas = route as IdealGasMixture;
  }
  const interactions = model.interactions;
  const auxiliary: FluidBinding = {
    model,
    idealGas,
    molarMassesKgPerMol: reference
      ? [reference.molarMassKgPerMol]
      : components.map((c) => c.molarMassKgPerMol),
    departureMethod,
  };
  const binding: FluidBinding = tradeReference
    ? { ...auxiliary, idealGas: shiftToSaturatedLiquid(auxiliary, components, tradeReference) }
    : auxiliary;
  const xOf = (x: readonly number[] | undefined): readonly number[] => {
    if (x !== undefined) return x;
    if (components.length === 1) return PURE;
    throw new InputError({
      input: "x",
      unit: "mol/mol",
      validRange: `${components.length} mole fractions (required for a mixture)`,
      received: x,
    });
  };
  const transportFluid = { ...binding, components };
  // the flashes' stability tests start from this fluid's critical constants (Wilson K-factors)
  const withConstants = <O extends FlashOptions>(options: O | undefined): O =>
    ({
      ...options,
      stability: { constants: components, ...options?.stability },
    }) as O;
  return {
    ...binding,
    components,
    componentIds: ids,
    interactionNotes: interactions?.notes ?? [],
    defaultedPairs: interactions?.defaultedPairs ?? [],
    state: (request) => phaseStateOf(binding, request, components),
    stateAtTP: (T, P, x, options) => stateWithStabilityCheck(binding, T, P, xOf(x), options),
    stateAtTRho: (T, rho, x) => stateAtTRho(binding, T, rho, xOf(x)),
    densityRoots: (T, P, x) => {
      // densityRootsAtTP leaves the checks to its callers: this is a public entry
      checkTemperature(T);
      checkPressure(P);
      checkComposition(xOf(x), components.length);
      return densityRootsAtTP(binding, T, P, xOf(x));
    },
    stabilityAtTP: (T, P, x, options) =>
      stabilityAtTP(model, T, P, xOf(x), { constants: components, ...options }),
    envelope: (z, options) => phaseEnvelope(binding, z, { constants: components, ...options }),
    bubblePointAtTemperature: (T, z, options) =>
      bubblePointAtTemperature(binding, T, z, { constants: components, ...options }),
    bubblePointAtPressure: (P, z, options) =>
      bubblePointAtPressure(binding, P, z, { constants: components, ...options }),
    dewPointAtTemperature: (T, z, options) =>
      dewPointAtTemperature(binding, T, z, { constants: components, ...options }),
    dewPointAtPressure: (P, z, options) =>
      dewPointAtPressure(binding, P, z, { constants: components, ...options }),
    saturationPointAtTemperature: (T, z, options) =>
      saturationPointAtTemperature(binding, T, z, { constants: components, ...options }),
    saturationPointAtPressure: (P, z, options) =>
      saturationPointAtPressure(binding, P, z, { constants: components, ...options }),
    mixtureCriticalPoint: (z, options) => mixtureCriticalPoint(model, z, options),
    flashTP: (T, P, x, options) => flashTP(binding, T, P, xOf(x), withConstants(options)),
    flashPH: (P, h, x, options) => flashPH(binding, P, h, xOf(x), withConstants(options)),
    flashPS: (P, s, x, options) => flashPS(binding, P, s, xOf(x), withConstants(options)),
    flashTS: (T, s, x, options) => flashTS(binding, T, s, xOf(x), withConstants(options)),
    flashUV: (u, rho, x, options) => flashUV(binding, u, rho, xOf(x), withConstants(options)),
    temperatureAtPH: (P, h, x, options) =>
      inversionWithStabilityCheck(binding, temperatureAtPH(binding, P, h, xOf(x), options)),
    temperatureAtPS: (P, s, x, options) =>
      inversionWithStabilityCheck(binding, temperatureAtPS(binding, P, s, xOf(x), options)),
    sweep: (request) => runSweep({ binding, constants: components }, request),
    // a copy: a caller who edits the spec object later does not change what workers rebuild
    spec: specCopy(spec),
    transportAtTP: (T, P, x, options) =>
      transportOfState(
        transportFluid,
        stateWithStabilityCheck(binding, T, P, xOf(x), options),
        options,
      ),
    transportOfState: (state, options) => transportOfState(transportFluid, state, options),
  };
}
