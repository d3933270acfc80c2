/**
 * Streams: a fluid, a composition, an equilibrium state and a molar flow. The flow is given in
 * the units plants use (units/flow.ts) and held in mol/s inside; the state is a verified flash
 * (phase/flash/), so a stream knows its phases and their amounts.
 *
 *   const feed = defineStream({ fluid: gas, z, T: 313.15, P: 25e5,
 *     flow: { value: 12, unit: "MMSCFD", reference: "60 degF, 14.696 psia" } });
 *   massFlowKgPerS(feed); // kg/s
 */
import { InputError } from "../errors.js";
import type { Fluid } from "../fluid/defineFluid.js";
import type { FlashOptions } from "../phase/flash/flashTP.js";
import { overallProperty } from "../phase/flash/stateFunctionFlash.js";
import type { Equilibrium } from "../phase/flash/types.js";
import {
  idealGasMolarVolumeM3PerMol,
  lookupFlowUnit,
  molarFlowFromSI,
  molarFlowToSI,
  resolveReferenceConditions,
  type FlowConversionContext,
  type ReferenceConditions,
  type ReferenceConditionsSpec,
} from "../units/flow.js";
import { requireNonNegative, requirePositive } from "../validate.js";

/** How the molar volume at standard reference conditions is taken. */
export type StandardVolumeBasis = "ideal-gas" | "real-gas";

/** A flow as given: value, unit and what the unit needs. */
export interface FlowSpec {
  readonly value: number;
  /** A flow unit of units/flow.ts: "mol/s", "kmol/h", "kg/h", "t/h", "Sm3/h", "MMSCFD", "m3/h", ... */
  readonly unit: string;
  /**
   * Reference conditions of a standard or normal volume flow (required for those units, refused
   * as ambiguous without): "ISO 13443 (15 degC, 101.325 kPa)", "normal (0 degC, 101.325 kPa)",
   * "60 degF, 14.696 psia", "60 degF, 14.73 psia", or { temperatureK, pressurePa }.
   */
  readonly reference?: ReferenceConditionsSpec;
  /**
   * Molar volume at the reference conditions: "ideal-gas" (R T / P, default; 23.645 m3/kmol at
   * 15 degC and 101.325 kPa) or "real-gas" (the model's vapour root of the stream's composition
   * there, Z stated in the stream's flow description).
   */
  readonly basis?: StandardVolumeBasis;
  /**
   * Conditions of a volume flow at stated conditions (m3/h, bbl/d, USgpm, ...): K and Pa.
   * Default: the stream's own temperature and pressure.
   */
  readonly conditions?: { readonly temperatureK: number; readonly pressurePa: number };
}

/** The flow as the user gave it, kept for tables and records. */
export interface GivenFlow {
  readonly value: number;
  readonly unit: string;
  /** E.g. "12 MMSCFD at 60 degF, 14.696 psia, ideal-gas molar volume 0.0236446 m3/mol". */
  readonly description: string;
}

/** A process stream. */
export interface Stream {
  readonly fluid: Fluid;
  /** Overall mole fractions (a copy). */
  readonly z: readonly number[];
  /** The equilibrium state (phases and amounts) at the stream's T and P. */
  readonly state: Equilibrium;
  /** mol/s (0 allowed for an outlet that carries nothing, e.g. a dry knock-out drum). */
  readonly molarFlowMolPerS: number;
  readonly name?: string;
  /** kg/mol of the overall composition. */
  readonly molarMassKgPerMol: number;
  /** The flow as given, when the stream was defined from one. */
  readonly givenFlow?: GivenFlow;
}

/** Options of {@link defineStream}. */
export interface StreamSpec {
  readonly fluid: Fluid;
  /** Mole fractions; may be omitted for a pure fluid. */
  readonly z?: readonly number[];
  /** K */
  readonly T: number;
  /** Pa (absolute) */
  readonly P: number;
  readonly flow: FlowSpec;
  readonly name?: string;
  /** Options of the flash at (T, P). */
  readonly flash?: FlashOptions;
}

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}

function compositionOf(fluid: Fluid, z: readonly number[] | undefined, input: string): number[] {
  const n = fluid.componentIds.length;
  if (z === undefined) {
    if (n === 1) return [1];
    throw new InputError({
      input,
      unit: "mol/mol",
      validRange: `${n} mole fractions (required for a mixture of ${fluid.componentIds.join(", ")})`,
      received: z,
    });
  }
  return z.slice();
}

/** kg/mol of composition z in a fluid. */
export function molarMassOf(fluid: Fluid, z: readonly number[]): number {
  let m = 0;
  for (let i = 0; i < z.length; i++) m += z[i] * fluid.molarMassesKgPerMol[i];
  return m;
}

/** Molar volume of the stream's composition at standard reference conditions, m3/mol. */
function standardMolarVolume(
  fluid: Fluid,
  z: readonly number[],
  ref: ReferenceConditions,
  basis: StandardVolumeBasis,
): { v: number; text: string } {
  if (basis === "ideal-gas") {
    const v = idealGasMolarVolumeM3PerMol(ref);
    return { v, text: `ideal-gas molar volume R T / P = ${v.toPrecision(6)} m3/mol` };
  }
  const s = fluid.stateAtTP(ref.temperatureK, ref.pressurePa, z, { phase: "vapor" });
  const v = 1 / s.densityMolPerM3;
  return {
    v,
    text: `real-gas molar volume ${v.toPrecision(6)} m3/mol (Z = ${s.Z.toPrecision(5)}, ${s.model.name}, vapour root of the whole stream)`,
  };
}

/**
 * Converts a flow spec to mol/s for a stream of composition z at (T, P).
 *
 * @throws InputError for a missing unit or value, a standard volume without reference
 *   conditions, a volume flow at conditions where the fluid is not one phase.
 */
export function molarFlowOf(
  fluid: Fluid,
  z: readonly number[],
  flow: FlowSpec,
  streamT: number,
  streamP: number,
  flash?: FlashOptions,
): { molarFlowMolPerS: number; given: GivenFlow } {
  if (!isRecord(flow)) {
    throw new InputError({
      input: "flow",
      unit: "-",
      validRange: 'an object { value, unit } such as { value: 1200, unit: "kmol/h" }',
      received: flow,
      hint: "a flow has no default unit",
    });
  }
  const def = lookupFlowUnit(flow.unit);
  const ctx: { -readonly [K in keyof FlowConversionContext]: FlowConversionContext[K] } = {
    input: "flow",
  };
  let description = `${flow.value} ${def.symbol}`;
  if (def.kind === "mass") {
    ctx.molarMassKgPerMol = molarMassOf(fluid, z);
  } else if (def.kind === "standard-volume") {
    const ref = resolveReferenceConditions(flow.reference, "flow.reference");
    const basis = flow.basis ?? "ideal-gas";
    if (!(basis === "ideal-gas" || basis === "real-gas")) {
      throw new InputError({
        input: "flow.basis",
        unit: "-",
        validRange: '"ideal-gas" or "real-gas"',
        received: basis,
      });
    }
    const sv = standardMolarVolume(fluid, z, ref, basis);
    ctx.standardMolarVolumeM3PerMol = sv.v;
    description += ` at ${ref.name}, ${sv.text}`;
  } else if (def.kind === "volume") {
    const T = flow.conditions?.temperatureK ?? streamT;
    const P = flow.conditions?.pressurePa ?? streamP;
    requirePositive("flow.conditions.temperatureK", T, "K");
    requirePositive("flow.conditions.pressurePa", P, "Pa");
    const eq = fluid.flashTP(T, P, z, flash);
    if (eq.phases.length !== 1) {
      throw new InputError({
        input: "flow.conditions",
        unit: "K, Pa",
        validRange:
          "conditions where the stream is one phase (a volume flow of a two-phase fluid is ambiguous)",
        received: { temperatureK: T, pressurePa: P, phases: eq.phases.map((p) => p.kind) },
        hint: "give the flow in mass or molar units, or the conditions at which the volume was measured",
      });
    }
    const v = overallProperty(eq, "v");
    ctx.actualMolarVolumeM3PerMol = v;
    description += ` at ${T.toPrecision(6)} K, ${P.toPrecision(6)} Pa (${eq.phases[0].kind}, ${v.toPrecision(6)} m3/mol)`;
  }
  const molarFlowMolPerS = molarFlowToSI(flow.value, def.symbol, ctx);
  return { molarFlowMolPerS, given: { value: flow.value, unit: def.symbol, description } };
}

/**
 * A stream at T (K), P (Pa) with a flow in plant units: the verified flash at (T, P) gives its
 * phases.
 *
 * @example
 * ```ts
 * const gas = defineFluid({ components: ["methane", "ethane", "propane"] });
 * const s = defineStream({ fluid: gas, z: [0.85, 0.1, 0.05], T: 303.15, P: 30e5,
 *   flow: { value: 1200, unit: "kmol/h" }, name: "recycle gas" });
 * s.molarFlowMolPerS; // 333.33
 * ```
 * @throws InputError for bad T, P, z, a flow without units, a standard volume without reference
 *   conditions; SolverError when the flash fails.
 */
export function defineStream(spec: StreamSpec): Stream {
  if (!isRecord(spec)) {
    throw new InputError({
      input: "spec",
      unit: "-",
      validRange: "an object { fluid, z, T, P, flow: { value, unit } }",
      received: spec,
    });
  }
  const { fluid } = spec;
  if (!(isRecord(fluid) && typeof (fluid as { flashTP?: unknown }).flashTP === "function")) {
    throw new InputError({
      input: "fluid",
      unit: "-",
      validRange: "a fluid from defineFluid",
      received: fluid,
    });
  }
  const z = compositionOf(fluid, spec.z, "z");
  requirePositive("T", spec.T, "K");
  requirePositive("P", spec.P, "Pa");
  if (spec.flow === undefined) {
    throw new InputError({
      input: "flow",
      unit: "-",
      validRange: 'a flow with its unit, e.g. { value: 1200, unit: "kmol/h" }',
      received: undefined,
    });
  }
  const state = fluid.flashTP(spec.T, spec.P, z, spec.flash);
  const { molarFlowMolPerS, given } = molarFlowOf(fluid, z, spec.flow, spec.T, spec.P, spec.flash);
  requirePositive("flow.value", molarFlowMolPerS, "mol/s");
  return {
    fluid,
    z: state.z.slice(),
    state,
    molarFlowMolPerS,
    name: spec.name,
    molarMassKgPerMol: molarMassOf(fluid, state.z),
    givenFlow: given,
  };
}

/**
 * A stream from an equilibrium already computed (a step's outlet).
 *
 * @param molarFlowMolPerS - mol/s, >= 0.
 */
export function streamFromEquilibrium(
  fluid: Fluid,
  z: readonly number[],
  eq: Equilibrium,
  molarFlowMolPerS: number,
  name?: string,
): Stream {
  requireNonNegative("molarFlowMolPerS", molarFlowMolPerS, "mol/s");
  if (z.length !== fluid.componentIds.length) {
    throw new InputError({
      input: "z",
      unit: "mol/mol",
      validRange: `${fluid.componentIds.length} mole fractions`,
      received: z,
    });
  }
  return {
    fluid,
    z: z.slice(),
    state: eq,
    molarFlowMolPerS,
    name,
    molarMassKgPerMol: molarMassOf(fluid, z),
  };
}

/** Mass flow of a stream, kg/s. */
export function massFlowKgPerS(stream: Stream): number {
  return stream.molarFlowMolPerS * stream.molarMassKgPerMol;
}

/** Overall molar enthalpy of a stream (all phases), J/mol. */
export function streamEnthalpyJPerMol(stream: Stream): number {
  return overallProperty(stream.state, "h");
}

/** Overall molar entropy of a stream (all phases), J/(mol K). */
export function streamEntropyJPerMolK(stream: Stream): number {
  return overallProperty(stream.state, "s");
}

/** Vapour mole fraction of a stream (0 for all liquid, 1 for all vapour). */
export function streamVaporFraction(stream: Stream): number {
  let v = 0;
  for (const p of stream.state.phases) if (p.kind === "vapor") v += p.amount;
  return v;
}

/**
 * A stream's flow in any flow unit (standard volumes need the same reference spec as input).
 *
 * @example
 * ```ts
 * streamFlowIn(s, "kg/h");
 * streamFlowIn(s, "Sm3/h", { reference: "ISO 13443 (15 degC, 101.325 kPa)" });
 * ```
 */
export function streamFlowIn(
  stream: Stream,
  unit: string,
  options: Omit<FlowSpec, "value" | "unit"> = {},
): number {
  const def = lookupFlowUnit(unit);
  if (def.kind === "molar") return molarFlowFromSI(stream.molarFlowMolPerS, unit);
  // the molar flow per unit flow, from a conversion of one unit
  const perUnit = molarFlowOf(
    stream.fluid,
    stream.z,
    { ...options, value: 1, unit },
    stream.state.temperatureK,
    stream.state.pressurePa,
  ).molarFlowMolPerS;
  return stream.molarFlowMolPerS / perUnit;
}

/**
 * One phase of an equilibrium as an equilibrium of its own: the phase at the same T and P with
 * its composition as the feed, amount 1. A phase of a verified equilibrium is itself in
 * equilibrium (it sits on its saturation boundary), so no new flash is run; the check of the
 * parent is kept.
 */
export function phaseAsEquilibrium(eq: Equilibrium, phaseIndex: number): Equilibrium {
  const p = eq.phases[phaseIndex];
  if (p === undefined) {
    throw new InputError({
      input: "phaseIndex",
      unit: "-",
      validRange: `0 to ${eq.phases.length - 1}`,
      received: phaseIndex,
    });
  }
  return {
    temperatureK: eq.temperatureK,
    pressurePa: eq.pressurePa,
    z: p.state.x.slice(),
    phases: [{ kind: p.kind, amount: 1, state: p.state }],
    check: {
      ...eq.check,
      method: `${p.kind} phase of: ${eq.check.method}`,
    },
    model: eq.model,
    warnings: eq.warnings,
  };
}

/**
 * A stream split into its phases (a separator or knock-out drum at the stream's T and P): the
 * vapour (if any) and each liquid phase as its own stream, flows by the phase amounts. The
 * material balance is exact to the flash's (1e-12).
 */
export function splitPhases(
  stream: Stream,
  names: { vapor?: string; liquid?: string } = {},
): { vapor?: Stream; liquids: Stream[] } {
  let vapor: Stream | undefined;
  const liquids: Stream[] = [];
  stream.state.phases.forEach((p, i) => {
    const eq = phaseAsEquilibrium(stream.state, i);
    const s = streamFromEquilibrium(
      stream.fluid,
      eq.z,
      eq,
      stream.molarFlowMolPerS * p.amount,
      p.kind === "vapor"
        ? names.vapor
        : `${names.liquid ?? "liquid"}${p.kind === "liquid-2" ? " 2" : ""}`,
    );
    if (p.kind === "vapor") vapor = s;
    else liquids.push(s);
  });
  return { vapor, liquids };
}
