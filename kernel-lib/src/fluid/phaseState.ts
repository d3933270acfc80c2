/**
 * The one state API of a fluid: `fluid.state({ T, P })`, `fluid.state({ P, h, x })`, ... takes
 * any one pair of specifications as named fields and returns one {@link PhaseState}: the overall
 * properties of the feed and its phases, each a full single-phase state with its amount.
 *
 *   pair              route (all verified before they are returned)
 *   (T, P)            isothermal flash with stability analysis (phase/flash/flashTP.ts)
 *   (T, rho)          T-v flash: search on P around the isothermal flash (phase/flash/flashTV.ts)
 *   (P, h), (P, s)    state-function flashes (phase/flash/stateFunctionFlash.ts)
 *   (T, s), (u, rho)  likewise (u, rho: a closed vessel)
 *   (T, vaporFraction), (P, vaporFraction)
 *                     pure fluid: saturation (phase/saturation.ts) and the lever rule;
 *                     mixture: bubble, dew and quality points (phase/envelope/saturationPoint.ts)
 *
 * Overall properties are amount-weighted sums over the phases (h, s, u, v), with a = u - T s and
 * g = h - T s (derived: the definitions). In two or three phases cp, cv, the speed of sound and
 * the Joule-Thomson coefficient are undefined: the derivative of h along an isobar then contains
 * the heat of the phase change and the mixture carries no single sound speed, so no number is
 * given; each phase's own values are in `phases[k].state`.
 */
import { InputError, type ResultWarning } from "../errors.js";
import { R as R_CODATA } from "../constants.js";
import type { ModelInfo } from "../eos/types.js";
import type { ReferenceState } from "../idealgas/types.js";
import { checkComposition, checkPressure, checkTemperature } from "../state/checkInputs.js";
import { stateAtTP, stateAtTRho } from "../state/stateAt.js";
import type {
  DepartureMethod,
  FluidBinding,
  FluidState,
  PropertySet,
  PhaseLabel,
} from "../state/types.js";
import { requireInRange } from "../validate.js";
import {
  saturationAtPressure,
  saturationAtTemperature,
  type SaturationOptions,
} from "../phase/saturation.js";
import {
  saturationPointAtPressure,
  saturationPointAtTemperature,
  type MixtureSaturationPoint,
  type SaturationPointOptions,
} from "../phase/envelope/saturationPoint.js";
import { stabilityAtTP, type StabilityResult, type WilsonConstants } from "../phase/stability.js";
import { flashTP, prepareFeed } from "../phase/flash/flashTP.js";
import { flashTV } from "../phase/flash/flashTV.js";
import { restrictToComponent } from "../phase/flash/pureComponent.js";
import {
  flashPH,
  flashPS,
  flashTS,
  flashUV,
  type StateFlashOptions,
} from "../phase/flash/stateFunctionFlash.js";
import type {
  Equilibrium,
  EquilibriumCheck,
  PhaseKind,
  SpecificationResidual,
} from "../phase/flash/types.js";
import { assembleEquilibrium } from "../phase/flash/verifyEquilibrium.js";

/** The names a state can be specified by (SI: K, Pa, mol/m3, J/mol, J/(mol K), mol/mol). */
export type StateVariable = "T" | "P" | "rho" | "h" | "s" | "u" | "vaporFraction";

/** The pairs a state can be specified by, in the order of {@link StateVariable}. */
export const STATE_PAIRS: readonly (readonly [StateVariable, StateVariable])[] = [
  ["T", "P"],
  ["T", "rho"],
  ["P", "h"],
  ["P", "s"],
  ["T", "s"],
  ["rho", "u"],
  ["T", "vaporFraction"],
  ["P", "vaporFraction"],
];

const VARIABLES: readonly StateVariable[] = ["T", "P", "rho", "h", "s", "u", "vaporFraction"];
const OPTION_FIELDS = ["x", "phase", "flash", "saturation"];
const UNITS: Readonly<Record<StateVariable, string>> = {
  T: "K",
  P: "Pa",
  rho: "mol/m3",
  h: "J/mol",
  s: "J/(mol K)",
  u: "J/mol",
  vaporFraction: "mol/mol",
};

/**
 * A state request: exactly one pair of specifications, the composition and options, all named.
 *
 * @example
 * ```ts
 * gas.state({ T: 250, P: 50e5, x: [0.85, 0.1, 0.05] });  // flash: phases and amounts
 * gas.state({ P: 10e5, h: -80_000, x: feed });            // valve outlet
 * water.state({ T: 450, vaporFraction: 0.3 });            // wet steam
 * ```
 */
export interface StateRequest {
  /** Temperature, K. */
  T?: number;
  /** Pressure, Pa. */
  P?: number;
  /** Overall molar density, mol/m3. */
  rho?: number;
  /** Overall molar enthalpy, J/mol, in the fluid's reference state. */
  h?: number;
  /** Overall molar entropy, J/(mol K), in the fluid's reference state. */
  s?: number;
  /** Overall molar internal energy, J/mol, in the fluid's reference state. */
  u?: number;
  /** Vapour fraction, mol of vapour per mol of feed, 0 (bubble point) to 1 (dew point). */
  vaporFraction?: number;
  /** Feed mole fractions; may be omitted for a pure fluid. */
  x?: readonly number[];
  /**
   * (T, P) only: "liquid" or "vapor" returns that density root as one phase without a flash
   * (a metastable state allowed, e.g. a subcooled liquid line on a chart); a mixture then gets the
   * stability test's "phase-split" warning when it is not stable as one phase. Default: the flash.
   */
  phase?: "liquid" | "vapor";
  /** Options of the flashes (tolerances, search ranges, stability options). */
  flash?: StateFlashOptions;
  /** Options of the saturation routes of the vapour-fraction pairs. */
  saturation?: Omit<SaturationPointOptions, "vaporFraction"> & SaturationOptions;
}

/** The overall label of a state: one phase by its own label, or the number of phases. */
export type OverallPhase = PhaseLabel | "two-phase" | "three-phase";

/** Overall energies; cp and cv only for a single phase (undefined in two or three phases). */
export interface OverallProperties {
  /** Enthalpy: J/mol (molar) or J/kg (mass). */
  readonly h: number;
  /** Entropy: J/(mol K) or J/(kg K). */
  readonly s: number;
  /** Internal energy: J/mol or J/kg. */
  readonly u: number;
  /** Helmholtz energy u - T s: J/mol or J/kg. */
  readonly a: number;
  /** Gibbs energy h - T s: J/mol or J/kg. */
  readonly g: number;
  /** Isobaric heat capacity of the single phase, J/(mol K) or J/(kg K); undefined in two or three phases. */
  readonly cp: number | undefined;
  /** Isochoric heat capacity of the single phase; undefined in two or three phases. */
  readonly cv: number | undefined;
}

/** One phase of a {@link PhaseState}. */
export interface StatePhase {
  /** "vapor" (the lightest), "liquid", "liquid-2" (the denser liquid). */
  readonly kind: PhaseKind;
  /**
   * mol of this phase per mol of feed. 0 for the incipient phase of a bubble or dew point (its
   * composition and properties are those of the first bubble or drop).
   */
  readonly amount: number;
  /** Mole fractions of the phase. */
  readonly x: readonly number[];
  readonly densityMolPerM3: number;
  readonly densityKgPerM3: number;
  readonly Z: number;
  /** Molar enthalpy of the phase, J/mol (absolute, in the fluid's reference state). */
  readonly h: number;
  /** Molar entropy of the phase, J/(mol K). */
  readonly s: number;
  /** ln of the fugacity coefficients of the phase. */
  readonly lnPhi: readonly number[];
  /** Residual (departure) properties at the phase's T and P, J/mol and J/(mol K). */
  readonly residual: PropertySet;
  /** The full single-phase state. */
  readonly state: FluidState;
}

/** The one state type: overall properties of the feed and its phases. */
export interface PhaseState {
  /** The pair the state was specified by, e.g. ["P", "h"]. */
  readonly specifiedBy: readonly [StateVariable, StateVariable];
  readonly temperatureK: number;
  readonly pressurePa: number;
  /** Feed (overall) mole fractions (a copy, normalised). */
  readonly x: readonly number[];
  /** Overall molar density 1 / sum_k amount_k v_k, mol/m3. */
  readonly densityMolPerM3: number;
  readonly densityKgPerM3: number;
  /** Overall compressibility factor P / (rho R T). */
  readonly Z: number;
  /** Molar mass of the feed, kg/mol. */
  readonly molarMassKgPerMol: number;
  /** Overall molar properties: J/mol, J/(mol K). */
  readonly molar: OverallProperties;
  /** Overall specific properties: J/kg, J/(kg K). */
  readonly mass: OverallProperties;
  /**
   * Residual (departure) properties of the single phase at the same T and P, J/mol and
   * J/(mol K); undefined in two or three phases (each phase's own in `phases[k].residual`).
   */
  readonly residual: PropertySet | undefined;
  /** Speed of sound of the single phase, m/s; undefined in two or three phases. */
  readonly speedOfSoundMPerS: number | undefined;
  /** Joule-Thomson coefficient (dT/dP)_h of the single phase, K/Pa; undefined in two or three phases. */
  readonly jouleThomsonKPerPa: number | undefined;
  /**
   * "vapor", "liquid", "supercritical" (one phase, by its own label: state/phaseLabel.ts),
   * "two-phase" or "three-phase" (phases of positive amount).
   */
  readonly phase: OverallPhase;
  /** mol of vapour per mol of feed (the amount of the phase of kind "vapor"; 0 if none). */
  readonly vaporFraction: number;
  /** Vapour first, then liquids by increasing density. */
  readonly phases: readonly StatePhase[];
  /**
   * What was verified before the state was returned: max ln-fugacity difference between phases,
   * Gibbs change of the split against the feed, material balance, iterations, method. Undefined
   * only for a (T, P) state with `phase` requested (no flash ran).
   */
  readonly check: EquilibriumCheck | undefined;
  /** The tangent-plane test that decided the number of phases, when one ran. */
  readonly stability: StabilityResult | undefined;
  /** Residuals of state-function specifications (h, s, u, v); empty for (T, P) and vapour fractions. */
  readonly specification: readonly SpecificationResidual[];
  readonly model: ModelInfo;
  readonly referenceState: ReferenceState;
  readonly departureMethod: DepartureMethod;
  readonly warnings: readonly ResultWarning[];
}

function pairText(p: readonly [StateVariable, StateVariable]): string {
  return `(${p[0]}, ${p[1]})`;
}

/** The pair of a request, or an InputError naming the fields given and the valid pairs. */
export function specifiedPair(request: StateRequest): [StateVariable, StateVariable] {
  const valid = STATE_PAIRS.map(pairText).join(", ");
  if (!(typeof request === "object" && request !== null && !Array.isArray(request))) {
    throw new InputError({
      input: "state request",
      unit: "-",
      validRange: `an object with one pair of specifications: ${valid}`,
      received: request,
    });
  }
  const keys = Object.keys(request).filter(
    (k) => (request as Record<string, unknown>)[k] !== undefined,
  );
  const unknown = keys.filter(
    (k) => !(VARIABLES as readonly string[]).includes(k) && !OPTION_FIELDS.includes(k),
  );
  if (unknown.length > 0) {
    throw new InputError({
      input: `state request field${unknown.length > 1 ? "s" : ""} ${unknown.join(", ")}`,
      unit: "-",
      validRange: `one of ${[...VARIABLES, ...OPTION_FIELDS].join(", ")} (one pair of ${valid})`,
      received: keys,
    });
  }
  const given = VARIABLES.filter((v) => keys.includes(v));
  const r = request as Record<string, unknown>;
  for (const v of given) {
    const value = r[v];
    if (!(typeof value === "number" && Number.isFinite(value))) {
      throw new InputError({
        input: v,
        unit: UNITS[v],
        validRange: "a finite number (SI)",
        received: value,
      });
    }
  }
  for (const o of ["flash", "saturation"]) {
    const value = r[o];
    if (!(
      value === undefined ||
      (typeof value === "object" && value !== null && !Array.isArray(value))
    )) {
      throw new InputError({
        input: o,
        unit: "-",
        validRange: "an options object (or leave it out)",
        received: value,
      });
    }
  }
  const pair = STATE_PAIRS.find(
    (p) => given.length === 2 && p[0] === given[0] && p[1] === given[1],
  );
  if (pair === undefined) {
    throw new InputError({
      input: "state specification",
      unit: "-",
      validRange: `exactly one of the pairs ${valid}; given: ${given.length > 0 ? `(${given.join(", ")})` : "none"}`,
      received: given,
    });
  }
  return [pair[0], pair[1]];
}

/**
 * The "phase-split" warning of a mixture that is not stable as one phase at (T, P), or an
 * accuracy note of the test, or undefined.
 */
export function splitWarning(
  binding: FluidBinding,
  T: number,
  P: number,
  x: readonly number[],
  constants?: readonly WilsonConstants[],
): ResultWarning | undefined {
  const model = binding.model;
  const test = stabilityAtTP(model, T, P, x, constants ? { constants } : {});
  const notes = test.warnings.map((w) => w.message);
  if (test.stable) {
    return notes.length > 0 ? { code: "accuracy", message: notes.join("; ") } : undefined;
  }
  const trial = (test.incipientComposition ?? [])
    .map((v, i) => `${model.info.componentIds[i]} ${v.toPrecision(3)}`)
    .join(", ");
  return {
    code: "phase-split",
    message: `the mixture is not stable as one phase at T = ${T} K, P = ${P} Pa: the tangent-plane test found a trial phase with tm = ${test.minimumTangentPlaneDistance.toPrecision(3)} < 0 (${trial}); the fluid splits into phases there, this single-phase state is metastable or unstable, and its properties are not those of the real two-phase fluid (flashTP gives the phases and their amounts)`,
  };
}

function statePhase(kind: PhaseKind, amount: number, st: FluidState): StatePhase {
  return {
    kind,
    amount,
    x: st.x,
    densityMolPerM3: st.densityMolPerM3,
    densityKgPerM3: st.densityKgPerM3,
    Z: st.Z,
    h: st.molar.h,
    s: st.molar.s,
    lnPhi: st.lnPhi,
    residual: st.residual,
    state: st,
  };
}

interface Assembly {
  readonly pair: [StateVariable, StateVariable];
  readonly T: number;
  readonly P: number;
  readonly z: readonly number[];
  readonly phases: readonly StatePhase[];
  readonly check: EquilibriumCheck | undefined;
  readonly stability: StabilityResult | undefined;
  readonly specification: readonly SpecificationResidual[];
  readonly warnings: readonly ResultWarning[];
}

function assemble(binding: FluidBinding, a: Assembly): PhaseState {
  const T = a.T;
  let h = 0;
  let s = 0;
  let u = 0;
  let v = 0;
  for (const p of a.phases) {
    h += p.amount * p.state.molar.h;
    s += p.amount * p.state.molar.s;
    u += p.amount * p.state.molar.u;
    v += p.amount / p.state.densityMolPerM3;
  }
  let M = 0;
  a.z.forEach((zi, i) => (M += zi * binding.molarMassesKgPerMol[i]));
  const present = a.phases.filter((p) => p.amount > 0);
  const one = present.length === 1 ? present[0].state : undefined;
  const molar: OverallProperties = {
    h,
    s,
    u,
    a: u - T * s,
    g: h - T * s,
    cp: one?.molar.cp,
    cv: one?.molar.cv,
  };
  const mass: OverallProperties = {
    h: h / M,
    s: s / M,
    u: u / M,
    a: molar.a / M,
    g: molar.g / M,
    cp: one === undefined ? undefined : one.molar.cp / M,
    cv: one === undefined ? undefined : one.molar.cv / M,
  };
  const Rg = binding.model.gasConstant ?? R_CODATA;
  const rho = 1 / v;
  let phase: OverallPhase;
  if (one !== undefined) phase = one.phase;
  else phase = present.length === 2 ? "two-phase" : "three-phase";
  let vaporFraction = 0;
  for (const p of a.phases) if (p.kind === "vapor") vaporFraction += p.amount;
  const warnings: ResultWarning[] = [...a.warnings];
  for (const p of a.phases) {
    for (const w of p.state.warnings) {
      if (!warnings.some((x) => x.message === w.message)) warnings.push(w);
    }
  }
  const st0 = a.phases[0].state;
  return {
    specifiedBy: a.pair,
    temperatureK: T,
    pressurePa: a.P,
    x: a.z.slice(),
    densityMolPerM3: rho,
    densityKgPerM3: rho * M,
    Z: (a.P * v) / (Rg * T),
    molarMassKgPerMol: M,
    molar,
    mass,
    residual: one?.residual,
    speedOfSoundMPerS: one?.speedOfSoundMPerS,
    jouleThomsonKPerPa: one?.jouleThomsonKPerPa,
    phase,
    vaporFraction,
    phases: a.phases,
    check: a.check,
    stability: a.stability,
    specification: a.specification,
    model: binding.model.info,
    referenceState: st0.referenceState,
    departureMethod: st0.departureMethod,
    warnings,
  };
}

function fromEquilibrium(
  binding: FluidBinding,
  pair: [StateVariable, StateVariable],
  eq: Equilibrium,
  specification: readonly SpecificationResidual[],
): PhaseState {
  return assemble(binding, {
    pair,
    T: eq.temperatureK,
    P: eq.pressurePa,
    z: eq.z,
    phases: eq.phases.map((p) => statePhase(p.kind, p.amount, p.state)),
    check: eq.check,
    stability: eq.stability,
    specification,
    warnings: eq.warnings,
  });
}

/**
 * Two saturated phases (vapour V, liquid L) at T with vapour fraction beta: inside (0 < beta < 1)
 * verified as every flash result (verifyEquilibrium.ts); at a bubble or dew point the feed is one
 * phase and the other is incipient (amount 0): the fugacity difference is recomputed from the
 * states, the Gibbs change is 0 (derived: the split equals the feed) and the balance is checked.
 */
function saturatedState(
  binding: FluidBinding,
  pair: [StateVariable, StateVariable],
  z: readonly number[],
  present: readonly number[],
  V: FluidState,
  L: FluidState,
  beta: number,
  info: { iterations: number; method: string; warnings: readonly ResultWarning[]; pure: boolean },
): PhaseState {
  const T = V.temperatureK;
  const P = V.pressurePa;
  if (beta > 0 && beta < 1) {
    const eq = assembleEquilibrium(
      binding,
      T,
      P,
      z,
      present,
      [
        { x: V.x.slice(), lnPhi: [], densityMolPerM3: V.densityMolPerM3, amount: beta },
        { x: L.x.slice(), lnPhi: [], densityMolPerM3: L.densityMolPerM3, amount: 1 - beta },
      ],
      {
        iterations: info.iterations,
        method: info.method,
        warnings: info.warnings,
        pureComponent: info.pure,
      },
    );
    return fromEquilibrium(binding, pair, eq, []);
  }
  let maxDiff = 0;
  for (const i of present) {
    const fV = Math.log(V.x[i]) + V.lnPhi[i] + Math.log(V.pressurePa);
    const fL = Math.log(L.x[i]) + L.lnPhi[i] + Math.log(L.pressurePa);
    const d = Math.abs(fV - fL);
    if (!(d <= maxDiff)) maxDiff = Number.isNaN(d) ? Infinity : d;
  }
  const feed = beta === 1 ? V : L;
  let balance = 0;
  z.forEach((zi, i) => (balance = Math.max(balance, Math.abs(feed.x[i] - zi))));
  return assemble(binding, {
    pair,
    T,
    P,
    z,
    phases: [statePhase("vapor", beta, V), statePhase("liquid", 1 - beta, L)],
    check: {
      maxLnFugacityDifference: maxDiff,
      gibbsChangeOverRT: 0,
      materialBalanceError: balance,
      iterations: info.iterations,
      method: info.method,
    },
    stability: undefined,
    specification: [],
    warnings: info.warnings,
  });
}

function vaporFractionState(
  binding: FluidBinding,
  pair: [StateVariable, StateVariable],
  given: { temperatureK: number } | { pressurePa: number },
  beta: number,
  zIn: readonly number[],
  request: StateRequest,
  constants: readonly WilsonConstants[] | undefined,
): PhaseState {
  const { z, present } = prepareFeed(zIn);
  const o = request.saturation ?? {};
  if (present.length === 1) {
    const pure = restrictToComponent(binding.model, present[0]);
    const sat =
      "temperatureK" in given
        ? saturationAtTemperature(pure, given.temperatureK, o)
        : saturationAtPressure(pure, given.pressurePa, o);
    const T = sat.temperatureK;
    const V = stateAtTRho(binding, T, sat.vaporDensityMolPerM3, z);
    const L = stateAtTRho(binding, T, sat.liquidDensityMolPerM3, z);
    return saturatedState(binding, pair, z, present, V, L, beta, {
      iterations: sat.iterations,
      method: "saturation of the one present component (phase/saturation.ts), lever rule",
      warnings: sat.warnings,
      pure: true,
    });
  }
  const options: SaturationPointOptions = {
    ...(constants ? { constants } : {}),
    ...o,
    vaporFraction: beta,
  };
  const point: MixtureSaturationPoint =
    "temperatureK" in given
      ? saturationPointAtTemperature(binding, given.temperatureK, z, options)
      : saturationPointAtPressure(binding, given.pressurePa, z, options);
  return saturatedState(binding, pair, z, present, point.vapor, point.liquid, beta, {
    iterations: point.iterations,
    method: point.method,
    warnings: point.warnings,
    pure: false,
  });
}

/**
 * The state of a fluid from one pair of specifications (see the module header and
 * {@link StateRequest}). `fluid.state(request)` calls this with the fluid's critical constants
 * for the Wilson starts.
 *
 * @throws InputError for a field that is not a specification or option, for any combination that
 *   is not one of the pairs (naming the fields given and the valid pairs), and for bad values;
 *   SolverError when no verified result is found (the message says what was tried);
 *   PhaseUnavailableError for a vapour fraction where there is no saturation (above the critical
 *   point of a pure fluid, beyond the cricondenbar or cricondentherm of a mixture).
 */
export function phaseStateOf(
  binding: FluidBinding,
  request: StateRequest,
  constants?: readonly WilsonConstants[],
): PhaseState {
  const pair = specifiedPair(request);
  const n = binding.model.info.componentIds.length;
  let x = request.x;
  if (x === undefined) {
    if (n !== 1) {
      throw new InputError({
        input: "x",
        unit: "mol/mol",
        validRange: `${n} mole fractions (required for a mixture)`,
        received: x,
      });
    }
    x = [1];
  }
  checkComposition(x, n);
  const flashOptions: StateFlashOptions = {
    ...request.flash,
    stability: { ...(constants ? { constants } : {}), ...request.flash?.stability },
  };
  const key = `${pair[0]},${pair[1]}`;
  const r = request as Required<StateRequest>;
  if (request.phase !== undefined && key !== "T,P") {
    throw new InputError({
      input: "phase",
      unit: "-",
      validRange: "used only with the pair (T, P); leave it out for other pairs",
      received: request.phase,
    });
  }
  switch (key) {
    case "T,P": {
      if (request.phase !== undefined) {
        if (!(request.phase === "liquid" || request.phase === "vapor")) {
          throw new InputError({
            input: "phase",
            unit: "-",
            validRange: '"liquid" or "vapor" (or leave it out for the flash)',
            received: request.phase,
          });
        }
        const st = stateAtTP(binding, r.T, r.P, x, { phase: request.phase });
        const split = n > 1 ? splitWarning(binding, r.T, r.P, st.x, constants) : undefined;
        return assemble(binding, {
          pair,
          T: r.T,
          P: r.P,
          z: st.x,
          phases: [statePhase(request.phase, 1, st)],
          check: undefined,
          stability: undefined,
          specification: [],
          warnings: split ? [split] : [],
        });
      }
      return fromEquilibrium(binding, pair, flashTP(binding, r.T, r.P, x, flashOptions), []);
    }
    case "T,rho": {
      const eq = flashTV(binding, r.T, r.rho, x, flashOptions);
      return fromEquilibrium(binding, pair, eq, eq.specification);
    }
    case "P,h": {
      const eq = flashPH(binding, r.P, r.h, x, flashOptions);
      return fromEquilibrium(binding, pair, eq, eq.specification);
    }
    case "P,s": {
      const eq = flashPS(binding, r.P, r.s, x, flashOptions);
      return fromEquilibrium(binding, pair, eq, eq.specification);
    }
    case "T,s": {
      const eq = flashTS(binding, r.T, r.s, x, flashOptions);
      return fromEquilibrium(binding, pair, eq, eq.specification);
    }
    case "rho,u": {
      const eq = flashUV(binding, r.u, r.rho, x, flashOptions);
      return fromEquilibrium(binding, pair, eq, eq.specification);
    }
    case "T,vaporFraction": {
      checkTemperature(r.T);
      const beta = requireInRange("vaporFraction", r.vaporFraction, "mol/mol", 0, 1);
      return vaporFractionState(binding, pair, { temperatureK: r.T }, beta, x, request, constants);
    }
    default: {
      checkPressure(r.P);
      const beta = requireInRange("vaporFraction", r.vaporFraction, "mol/mol", 0, 1);
      return vaporFractionState(binding, pair, { pressurePa: r.P }, beta, x, request, constants);
    }
  }
}
