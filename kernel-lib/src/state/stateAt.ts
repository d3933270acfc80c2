/**
 * States at (T, rho) and at (T, P). At (T, P): every density root of the model (closed form when
 * the model offers `densityRoots`, else a scan plus Brent, findDensityRoots.ts), mechanically
 * unstable roots ((dP/drho)_T <= 0) discarded, then either the stable one (lowest Gibbs energy; at
 * equal T and P the ideal parts are equal, so the lowest g_r/RT = a + aD - ln Z) or the requested
 * phase (the choice: state/rootChoice.ts). Properties come from state/properties.ts. The
 * tangent-plane stability test of a mixture is a phase-layer question: fluid/defineFluid.ts runs
 * it for `{ checkStability: true }`.
 */
import { R as R_CODATA } from "../constants.js";
import {
  InputError,
  OutOfRangeError,
  PhaseUnavailableError,
  type ResultWarning,
} from "../errors.js";
import type { ResidualDerivatives, ResidualModel } from "../eos/types.js";
import { zeroResidualDraft } from "../eos/residualDraft.js";
import type { IdealGasProperties, ReferenceState } from "../idealgas/types.js";
import { leanIdealGasOf, type IdealGasValues, type LeanIdealGas } from "../idealgas/leanMixture.js";
import { assembleStateOf, dPdRho, pressureFromResidual, residualGibbsTP } from "./properties.js";
import { checkComposition, checkDensity, checkPressure, checkTemperature } from "./checkInputs.js";
import { densityRootsOf, type DensityRootOptions } from "./findDensityRoots.js";
import {
  chooseDensityRoot,
  chooseDensityRootWithComposition,
  emptyRootChoice,
  type ModelWithResidualInto,
} from "./rootChoice.js";
import { phaseLabel } from "./phaseLabel.js";
import { MAX_PRESSURE_PA } from "./physicalLimits.js";
import type { FluidBinding, FluidState, PhaseLabel, PhaseRequest } from "./types.js";

/** Options of {@link stateAtTP}. */
export interface StateAtTPOptions {
  /** Which phase: "stable" (default), "liquid" (densest root) or "vapor" (lightest root). */
  phase?: PhaseRequest;
  /** Options of the numerical root search (models without closed-form roots). */
  rootSearch?: DensityRootOptions;
}

// two stable roots closer than this in g_r/RT count as a tie: (T, P) on the phase boundary. Newton
// on the saturation conditions leaves about 1e-12 (phase/saturation.ts), rounding of g/RT a few 1e-15
const TIE_GIBBS_OVER_RT = 1e-9;

// the options when none are given, shared (read only; saves an object per state)
const DEFAULT_OPTIONS: StateAtTPOptions = Object.freeze({});

/** One density root at (T, P) with what decides between roots. */
export interface DensityRoot {
  /** mol/m3 */
  readonly densityMolPerM3: number;
  /** Residual Gibbs energy over RT at the same T and P. */
  readonly gibbsResidualOverRT: number;
  /** (dP/drho)_T > 0. */
  readonly mechanicallyStable: boolean;
}

/** Molar mass of the mixture x, kg/mol. */
export function mixtureMolarMass(binding: FluidBinding, x: readonly number[]): number {
  let m = 0;
  for (let i = 0; i < x.length; i++) m += x[i] * binding.molarMassesKgPerMol[i];
  return m;
}

/** Pressure at which the ideal-gas part is evaluated (moved to rho R T in properties.ts), Pa. */
const IDEAL_GAS_PRESSURE_PA = 1e5;

// last ideal-gas evaluation per binding: states along an isotherm (surfaces, flash iterations,
// root comparisons) reuse it; a binding is immutable, so the cache is keyed by (T, x) only. The
// entry is overwritten in place on a miss (no allocation), which is safe because assembleState
// copies the numbers out before the next evaluation.
interface IdealCacheEntry {
  T: number;
  x: number[];
  value: IdealGasProperties;
  /** The mixture's lean path (idealgas/leanMixture.ts), looked up once per binding. */
  readonly leanPath: LeanIdealGas | undefined;
  /** The record the lean path writes into. */
  readonly lean: IdealGasValues & {
    temperatureK: number;
    pressurePa: number;
    referenceState: ReferenceState;
    warnings: readonly ResultWarning[];
  };
}
const idealCache = new WeakMap<FluidBinding, IdealCacheEntry>();
// the binding of the last idealGasAt call and its entry: a loop over one fluid skips the WeakMap
// lookup (a hash probe per state); strong references to one binding only, replaced by the next
let lastBinding: FluidBinding | undefined;
let lastEntry: IdealCacheEntry | undefined;
const NO_WARNINGS: readonly ResultWarning[] = Object.freeze([]);
const NO_EXTRA: readonly ExtraWarning[] = Object.freeze([]);
// the root choice of the current stateAtTP call, read out at once (plain numbers, reused)
const choice = emptyRootChoice();
// the density roots of the current stateAtTP call (models with densityRootsInto), read at once
const ROOTS = new Float64Array(3);
// derivative records of the current stateAtTP call (models with residualWithCompositionInto):
// two for comparing roots, one for the chosen root; read out before the call returns
const SCRATCH_A = zeroResidualDraft();
const SCRATCH_B = zeroResidualDraft();
const CHOSEN = zeroResidualDraft();

function hasResidualInto(model: ResidualModel): model is ModelWithResidualInto {
  return model.residualInto !== undefined && model.residualWithCompositionInto !== undefined;
}

/**
 * The ideal-gas mixture at T (K) and x (at the fixed pressure of the state layer; properties.ts
 * moves it to rho R T), from the last evaluation per binding when T and x are the same. Inputs
 * must have been checked. For the state layer's own lean paths (sweeps).
 */
export function idealGasAt(
  binding: FluidBinding,
  T: number,
  x: readonly number[],
): IdealGasProperties {
  let entry = binding === lastBinding ? lastEntry : idealCache.get(binding);
  if (entry && entry.T === T && entry.x.length === x.length) {
    let same = true;
    for (let i = 0; i < x.length; i++) {
      if (entry.x[i] !== x[i]) {
        same = false;
        break;
      }
    }
    if (same) return entry.value;
  }
  if (entry === undefined) {
    const mixture = binding.idealGas;
    entry = {
      T: NaN,
      x: [],
      value: undefined as unknown as IdealGasProperties,
      leanPath: leanIdealGasOf(mixture),
      lean: {
        temperatureK: NaN,
        pressurePa: IDEAL_GAS_PRESSURE_PA,
        h: NaN,
        s: NaN,
        u: NaN,
        a: NaN,
        g: NaN,
        cp: NaN,
        cv: NaN,
        referenceState: mixture.referenceState,
        warnings: NO_WARNINGS,
      },
    };
    idealCache.set(binding, entry);
  }
  lastBinding = binding;
  lastEntry = entry;
  // the inputs were checked by the public entry point, as the lean path requires
  const lean = entry.leanPath;
  if (lean !== undefined && lean(T, IDEAL_GAS_PRESSURE_PA, x, entry.lean)) {
    entry.lean.temperatureK = T;
    entry.value = entry.lean;
  } else {
    entry.value = binding.idealGas.at(T, IDEAL_GAS_PRESSURE_PA, x);
  }
  entry.T = T;
  if (entry.x.length !== x.length) entry.x.length = x.length;
  for (let i = 0; i < x.length; i++) entry.x[i] = x[i];
  return entry.value;
}

/** A warning added by the state layer to the model's own. */
type ExtraWarning = ResultWarning;

function finish(
  binding: FluidBinding,
  T: number,
  rho: number,
  x: readonly number[],
  residual: ResidualDerivatives,
  phase: PhaseLabel,
  extraWarnings: readonly ExtraWarning[],
  givenPressurePa?: number,
  ownDnA = false,
): FluidState {
  const model = binding.model;
  const ideal = idealGasAt(binding, T, x);
  const own = model.checkValidity ? model.checkValidity(T, rho, x) : [];
  const warnings = extraWarnings.length === 0 ? own : own.concat(extraWarnings);
  return assembleStateOf(
    T,
    rho,
    x,
    residual,
    ideal,
    mixtureMolarMass(binding, x),
    phase,
    model.info,
    binding.departureMethod ?? "closed-form",
    model.gasConstant ?? R_CODATA,
    warnings,
    givenPressurePa,
    ownDnA,
  );
}

/**
 * The state at temperature T (K), molar density rho (mol/m3) and mole fractions x.
 *
 * @throws InputError for non-positive or NaN T, rho, or bad mole fractions.
 * @throws OutOfRangeError when rho is at or above the model's close-packing limit.
 */
export function stateAtTRho(
  binding: FluidBinding,
  temperatureK: number,
  densityMolPerM3: number,
  x: readonly number[],
): FluidState {
  const model = binding.model;
  checkTemperature(temperatureK);
  checkDensity(densityMolPerM3);
  checkComposition(x, model.info.componentIds.length);
  const max = model.maxDensity(temperatureK, x);
  if (!(densityMolPerM3 < max)) {
    throw new OutOfRangeError({
      input: "densityMolPerM3",
      unit: "mol/m3",
      validRange: `below the model's maximum density ${max.toPrecision(6)} mol/m3 (close packing, or the search limit of a model without one: ${model.info.name} at ${temperatureK} K)`,
      received: densityMolPerM3,
    });
  }
  const residual = model.residual(temperatureK, densityMolPerM3, x, { composition: true });
  const Rg = model.gasConstant ?? R_CODATA;
  const Z = 1 + residual.aD;
  const P = pressureFromResidual(temperatureK, densityMolPerM3, residual.aD, Rg);
  if (!(P <= MAX_PRESSURE_PA)) {
    throw new OutOfRangeError({
      input: "densityMolPerM3",
      unit: "mol/m3",
      validRange: `a density whose pressure is at most ${MAX_PRESSURE_PA} Pa (the limit of physical sense, state/physicalLimits.ts; ${model.info.name} gives P = ${P} Pa at ${temperatureK} K)`,
      received: densityMolPerM3,
    });
  }
  const phase = phaseLabel(model, temperatureK, P, densityMolPerM3, x, "only", Z, residual);
  return finish(binding, temperatureK, densityMolPerM3, x, residual, phase, NO_EXTRA);
}

/**
 * Every density root at (T, P), ascending, with its residual Gibbs energy and stability flag.
 * Inputs are not re-checked here (the public entry points check them).
 */
export function densityRootsAtTP(
  binding: FluidBinding,
  temperatureK: number,
  pressurePa: number,
  x: readonly number[],
  options: { rootSearch?: DensityRootOptions } = {},
): DensityRoot[] {
  const model = binding.model;
  const rhos = densityRootsOf(model, temperatureK, pressurePa, x, options.rootSearch);
  const out: DensityRoot[] = [];
  for (const rho of rhos) {
    const r = model.residual(temperatureK, rho, x);
    out.push({
      densityMolPerM3: rho,
      gibbsResidualOverRT: residualGibbsTP(r),
      mechanicallyStable: dPdRho(temperatureK, r, model.gasConstant) > 0,
    });
  }
  return out;
}

/**
 * The state at temperature T (K), pressure P (Pa) and mole fractions x, in the stable or the
 * requested phase.
 *
 * @throws PhaseUnavailableError when the requested phase has no density root here (says why), or
 *   when the model has no density root at all at (T, P).
 * @example
 * ```ts
 * const s = stateAtTP(fluid, 300, 50e5, [1], { phase: "stable" });
 * s.Z; s.molar.h; s.lnPhi[0];
 * ```
 */
export function stateAtTP(
  binding: FluidBinding,
  temperatureK: number,
  pressurePa: number,
  x: readonly number[],
  options: StateAtTPOptions = DEFAULT_OPTIONS,
): FluidState {
  const model = binding.model;
  checkTemperature(temperatureK);
  checkPressure(pressurePa);
  checkComposition(x, model.info.componentIds.length);
  if (options === null) options = DEFAULT_OPTIONS;
  const request = options.phase ?? "stable";
  if (!(request === "stable" || request === "liquid" || request === "vapor")) {
    throw new InputError({
      input: "options.phase",
      unit: "-",
      validRange: '"stable" or "liquid" or "vapor"',
      received: request,
    });
  }
  // the roots: into the reused scratch when the model can (no array per state), and their
  // derivatives into scratch records (the chosen root's dnA array becomes the state's ln phi)
  let rhos: ArrayLike<number>;
  let rootCount: number;
  let residual: ResidualDerivatives | undefined;
  let ownDnA = false;
  if (model.densityRootsInto !== undefined) {
    rootCount = model.densityRootsInto(temperatureK, pressurePa, x, ROOTS);
    rhos = ROOTS;
    if (hasResidualInto(model)) {
      residual = chooseDensityRootWithComposition(
        model,
        temperatureK,
        ROOTS,
        rootCount,
        x,
        request,
        choice,
        SCRATCH_A,
        SCRATCH_B,
        CHOSEN,
        new Array<number>(x.length),
      );
      ownDnA = true;
    } else {
      residual = chooseDensityRoot(model, temperatureK, rhos, x, request, choice, rootCount);
    }
  } else {
    rhos = densityRootsOf(model, temperatureK, pressurePa, x, options.rootSearch);
    rootCount = rhos.length;
    residual = chooseDensityRoot(model, temperatureK, rhos, x, request, choice, rootCount);
  }
  const count = choice.stableCount;
  const index = choice.index;
  const rho = choice.densityMolPerM3;
  const best = choice.lowestGibbsOverRT;
  const second = choice.secondGibbsOverRT;
  const compareGibbs = request === "stable" && rootCount > 1;
  if (residual === undefined) {
    const found = Array.from(rhos).slice(0, rootCount);
    throw new PhaseUnavailableError(
      `${model.info.name} has no mechanically stable density root at T = ${temperatureK} K, P = ${pressurePa} Pa` +
        (found.length > 0
          ? ` (roots found: ${found.map((r) => r.toPrecision(6)).join(", ")} mol/m3, all with dP/drho <= 0)`
          : " (no root at all: the pressure is beyond what the equation can reach at this temperature)"),
    );
  }
  const position: "lowest" | "highest" | "only" =
    count === 1 ? "only" : index === 0 ? "lowest" : index === count - 1 ? "highest" : "only";
  const Z = 1 + residual.aD;
  const label = phaseLabel(model, temperatureK, pressurePa, rho, x, position, Z, residual);
  if (count === 1 && request !== "stable" && label !== "supercritical" && label !== request) {
    throw new PhaseUnavailableError(
      `no ${request} root at T = ${temperatureK} K, P = ${pressurePa} Pa: ${model.info.name} has a single stable density root there (${rho.toPrecision(6)} mol/m3, Z = ${Z.toPrecision(5)}), and it is ${label}-like (rule: state/phaseLabel.ts)`,
    );
  }
  let warnings: readonly ExtraWarning[] =
    count === 1 && request !== "stable" && label === "supercritical"
      ? [
          {
            code: "model-limitation" as const,
            message: `requested phase "${request}" at a supercritical state (T and P above the (pseudo-)critical point): the single root is returned, and vapor and liquid are not distinct there`,
          },
        ]
      : NO_EXTRA;
  // two stable roots of equal Gibbs energy: (T, P) is on the phase boundary (for a pure fluid the
  // saturation line) within rounding, where either root, or any mix of the two, is the state
  if (compareGibbs && count > 1 && Math.abs(second - best) <= TIE_GIBBS_OVER_RT) {
    warnings = warnings.concat({
      code: "accuracy",
      message: `T = ${temperatureK} K, P = ${pressurePa} Pa is on the phase boundary of ${model.info.name} within rounding (two stable density roots whose Gibbs energies differ by ${Math.abs(second - best).toExponential(1)} RT): the phases coexist there in any proportion, and the returned ${label} root (${rho.toPrecision(6)} mol/m3) is only one of them; ask for phase "liquid" or "vapor", or give a quality`,
    });
  }
  // P as given: the root's rho R T Z equals it only to round-off (3999999.9999999995)
  return finish(binding, temperatureK, rho, x, residual, label, warnings, pressurePa, ownDnA);
}
