/**
 * A model entry of a calculation record, pulled from what the caller already has: a Fluid (model,
 * ideal-gas route, k_ij provenance, reference state), a bare ResidualModel, or only its ModelInfo.
 */
import { InputError } from "../errors.js";
import type { ModelInfo, ResidualModel } from "../eos/types.js";
import type { Fluid } from "../fluid/defineFluid.js";
import type { ReferenceState } from "../idealgas/types.js";
import { describeSaturatedLiquidReference } from "../idealgas/referenceState.js";
import { modelScope } from "./modelScope.js";

/** What a record can describe as a model. */
export type RecordableModel = Fluid | ResidualModel | ModelInfo;

/** One binary interaction parameter and where it came from. */
export interface ModelEntryPair {
  pair: string;
  kij: number;
  source: string;
}

/** One component's ideal-gas route. */
export interface ModelEntryIdealGas {
  componentId: string;
  method: string;
  source: string;
  /** K */
  validTemperatureK: { min: number; max: number };
}

/** A model as a record shows it. All strings are plain text. */
export interface ModelEntry {
  /** Record-local id, "M1", "M2", ... */
  id: string;
  /** The caller's label, e.g. "Feed gas, Peng-Robinson". Default: the model's name. */
  label: string;
  modelId: string;
  name: string;
  citation: string;
  componentIds: string[];
  /** Reference state of h and s, in words (undefined when only a ModelInfo was given). */
  referenceState?: string;
  /** Validity range or scope statements. */
  validity: string[];
  idealGas: ModelEntryIdealGas[];
  interaction: ModelEntryPair[];
  /** Pairs whose k_ij was set to zero because no value is known. */
  defaultedPairs: string[];
  /** The caller's notes. */
  notes: string[];
}

/** Options of a model entry. */
export interface ModelEntryOptions {
  /** Label shown in the record (plain text). Default: the model's name. */
  label?: string;
  /** Validity statement to add (plain text), e.g. a range the user checked. Default: none. */
  validity?: string;
  /** A note (plain text), e.g. why this model was chosen. Default: none. */
  note?: string;
}

function isModelInfo(value: unknown): value is ModelInfo {
  const v = value as Partial<ModelInfo> | null;
  return (
    v !== null &&
    typeof v === "object" &&
    typeof v.id === "string" &&
    typeof v.name === "string" &&
    typeof v.citation === "string"
  );
}

function isResidualModel(value: unknown): value is ResidualModel {
  const v = value as Partial<ResidualModel> | null;
  return (
    v !== null && typeof v === "object" && typeof v.residual === "function" && isModelInfo(v.info)
  );
}

function isFluid(value: unknown): value is Fluid {
  const v = value as Partial<Fluid> | null;
  return (
    v !== null &&
    typeof v === "object" &&
    isResidualModel(v.model) &&
    typeof v.idealGas === "object" &&
    v.idealGas !== null
  );
}

/** The route of an ideal-gas method without its parenthesised detail (the source column has it). */
export function shortMethod(method: string): string {
  const cut = method.indexOf(" (");
  return cut > 0 ? method.slice(0, cut) : method;
}

/** The reference state in words. */
export function describeReferenceState(state: ReferenceState): string {
  switch (state.kind) {
    case "formation":
      return "formation basis: h is the enthalpy of formation and s the third-law entropy of the ideal gas at 298.15 K and 1 bar";
    case "zero-at":
      return `h = 0 and s = 0 for the ideal gas at ${state.temperatureK} K and ${state.pressurePa} Pa`;
    case "fluid-convention":
      return state.description;
    case "saturated-liquid":
      return describeSaturatedLiquidReference(state);
  }
}

function optionalText(value: unknown, input: string): string | undefined {
  if (value === undefined) return undefined;
  if (typeof value !== "string") {
    throw new InputError({ input, unit: "-", validRange: "a string", received: value });
  }
  return value;
}

/**
 * Builds the entry of a model.
 * @throws InputError when `subject` is none of Fluid, ResidualModel, ModelInfo.
 */
export function modelEntry(
  id: string,
  subject: RecordableModel,
  options: ModelEntryOptions = {},
): ModelEntry {
  const label = optionalText(options.label, "options.label");
  const validity = optionalText(options.validity, "options.validity");
  const note = optionalText(options.note, "options.note");
  let info: ModelInfo;
  let model: ResidualModel | undefined;
  let fluid: Fluid | undefined;
  if (isFluid(subject)) {
    fluid = subject;
    model = subject.model;
    info = model.info;
  } else if (isResidualModel(subject)) {
    model = subject;
    info = subject.info;
  } else if (isModelInfo(subject)) {
    info = subject;
  } else {
    throw new InputError({
      input: "model",
      unit: "-",
      validRange: "a Fluid (defineFluid), a ResidualModel or a ModelInfo",
      received: subject,
    });
  }
  const scope = model ? modelScope(model) : undefined;
  // A reference equation carries its own convention (duck-typed: not part of ResidualModel).
  const ownState = (model as { referenceState?: ReferenceState } | undefined)?.referenceState;
  const referenceState = fluid
    ? describeReferenceState(fluid.idealGas.referenceState)
    : ownState !== undefined
      ? describeReferenceState(ownState)
      : undefined;
  return {
    id,
    label: label ?? info.name,
    modelId: info.id,
    name: info.name,
    citation: info.citation,
    componentIds: [...info.componentIds],
    referenceState,
    validity: [scope, validity].filter((s): s is string => s !== undefined),
    idealGas: fluid
      ? fluid.idealGas.components.map((c) => ({
          componentId: c.componentId,
          method: c.method,
          source: c.source,
          validTemperatureK: { min: c.validTemperatureK.min, max: c.validTemperatureK.max },
        }))
      : [],
    interaction: fluid
      ? fluid.interactionNotes.map((n) => ({
          pair: `${n.pair[0]}/${n.pair[1]}`,
          kij: n.kij,
          source: n.source,
        }))
      : [],
    defaultedPairs: fluid ? [...fluid.defaultedPairs] : [],
    notes: note !== undefined ? [note] : [],
  };
}
