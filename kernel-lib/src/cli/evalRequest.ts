/**
 * The `isochor eval` request: checked against its JSON Schema, then the checks a schema cannot
 * state, with the JSON path of every problem ("$.states[2].T").
 *
 * The format is schema/eval-request.schema.json (JSON Schema 2020-12, shipped in the package as
 * dist/cli/schema/eval-request.schema.json): fields, types, units, defaults and state forms are
 * documented there, and the same file checks every request. The names set by issue 4 are fixed
 * (other tools depend on them); later fields are optional with a default that keeps an old
 * request's meaning (issue 5: "reference", saturated and quality states; "checkStability").
 *
 *   raw JSON --schema (ajv)--> structure, types, enums, state forms, model "reference" exclusions
 *            --checkCounts----> x / kij / constants sized to the components, x sums to 1,
 *                               reference-equation fluids
 *            --toRequest------> EvalRequest (defaults filled in)
 *
 * Structural problems refuse the whole request with a RequestError naming the JSON path;
 * physically bad values inside a state (T <= 0, ...) become an error entry for that state only.
 */
import Ajv2020, { type ErrorObject, type ValidateFunction } from "ajv/dist/2020.js";
import { RequestError } from "../errors.js";
import type { ModelId } from "../eos/createModel.js";
import { referenceFluidIds } from "../eos/multiparameter/referenceFluids.js";
import type { ReferenceState } from "../idealgas/types.js";
import type { ConstantOverrides } from "../fluid/defineFluid.js";
import type { DepartureMethod, PhaseRequest } from "../state/types.js";
import { getComponent } from "../components/getComponent.js";
import { parseQuantity } from "../units/quantity.js";
import type { Dimension } from "../units/dimension.js";
import schema from "./schema/eval-request.schema.json";
import { parseOutput, roundConverted, type EvalOutput, type OutputJson } from "./evalOutput.js";

/**
 * One requested state. "TQ" and "PQ" are pure-fluid states on or inside the saturation dome at
 * given T (K) or P (Pa) and quality (vapour fraction; {"saturated": "liquid"} is quality 0,
 * "vapor" quality 1, `saturated` records which form was asked).
 */
export type EvalState =
  | { readonly kind: "TP"; readonly T: number; readonly P: number }
  | { readonly kind: "TRho"; readonly T: number; readonly rho: number }
  | {
      readonly kind: "TQ";
      readonly T: number;
      readonly quality: number;
      readonly saturated?: "liquid" | "vapor";
    }
  | {
      readonly kind: "PQ";
      readonly P: number;
      readonly quality: number;
      readonly saturated?: "liquid" | "vapor";
    }
  /** Phase-equilibrium states from a state-function pair (always flashed; J/mol, J/(mol K)). */
  | { readonly kind: "PH"; readonly P: number; readonly h: number }
  | { readonly kind: "PS"; readonly P: number; readonly s: number }
  | { readonly kind: "TS"; readonly T: number; readonly s: number }
  | { readonly kind: "URho"; readonly u: number; readonly rho: number };

/** "equilibrium": every state is a flash with its phases (added after issue 4). */
export type EvalPhase = PhaseRequest | "equilibrium";

/** The model ids eval accepts: the engine's built-in models plus "reference". */
export type EvalModelId = ModelId | "reference";

/** A checked request. */
export interface EvalRequest {
  readonly model: EvalModelId;
  readonly components: readonly string[];
  readonly x: readonly number[];
  readonly kij?: readonly (readonly number[])[];
  readonly constants?: readonly (ConstantOverrides | undefined)[];
  readonly departure: DepartureMethod;
  readonly reference: ReferenceState;
  readonly idealGas: "correlation" | "molecular";
  readonly phase: EvalPhase;
  /** Run the mixture stability test at (T, P) states. Default true (false: untested single-phase states). */
  readonly checkStability: boolean;
  /** Also return viscosity and thermal conductivity of single-phase states. Default false. */
  readonly transport: boolean;
  /** Also return the phase envelope of x. Default false. */
  readonly envelope: boolean;
  /** May be empty when `envelope` is true. */
  readonly states: readonly EvalState[];
  /** The "output" field checked: units and basis of the response (absent: SI molar as before). */
  readonly output?: EvalOutput;
  /**
   * Each state's input echo (one per state), present when a state carries a unit or "output" is
   * given: the fields exactly as in the request, and their SI values.
   */
  readonly inputs?: readonly EvalInputEcho[];
}

/** A state's input as given ("30 degC" stays "30 degC") and in SI (303.15 K). */
export interface EvalInputEcho {
  readonly given: Readonly<Record<string, unknown>>;
  readonly SI: Readonly<Record<string, unknown>>;
}

type Json = unknown;

/** The request's JSON Schema (also the published documentation of the format). */
export const EVAL_REQUEST_SCHEMA: object = schema;

function isObject(v: Json): v is Record<string, Json> {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}

function describe(v: Json): string {
  if (v === null) return "null";
  if (v === undefined) return "nothing";
  if (Array.isArray(v)) return "an array";
  return typeof v === "string"
    ? JSON.stringify(v)
    : typeof v === "object"
      ? "an object"
      : String(v);
}

const TYPE_WORDS: Record<string, string> = {
  number: "a number",
  string: "a string",
  boolean: "true or false",
  object: "an object",
  array: "an array",
  null: "null",
};

let compiled: ValidateFunction | undefined;

/** The compiled schema (compiled once, on first use). */
function validator(): ValidateFunction {
  if (compiled === undefined) {
    // "x-message" and "x-checks" are annotations of this schema: the message of a rule, and the
    // checks made in code; strict mode would otherwise refuse them as unknown keywords.
    const ajv = new Ajv2020({ allErrors: true, verbose: true, strictTypes: true });
    ajv.addKeyword({ keyword: "x-message", schemaType: "string" });
    ajv.addKeyword({ keyword: "x-checks", schemaType: "array" });
    compiled = ajv.compile(schema);
  }
  return compiled;
}

/** "/states/2/T" -> "$.states[2].T". */
function jsonPath(pointer: string): string {
  return (
    "$" +
    pointer
      .split("/")
      .slice(1)
      .map((p) => p.replace(/~1/g, "/").replace(/~0/g, "~"))
      .map((p) => (/^\d+$/.test(p) ? `[${p}]` : `.${p}`))
      .join("")
  );
}

/**
 * The problem to report among all of ajv's errors: an unknown field first (it is often a
 * misspelt one, and explains the other errors), then a value of the wrong type, else the first error in the schema's order that
 * is neither the failure of one branch of anyOf/oneOf (the combinator's own error says what was
 * wanted) nor an "if" summary.
 */
export function firstProblem(errors: readonly ErrorObject[]): ErrorObject {
  const reported = errors.filter(
    (e) => e.keyword !== "if" && !/\/(anyOf|oneOf)\/\d+\//.test(e.schemaPath),
  );
  // a value of the wrong type next (a state given as a number also fails the state-form rules,
  // whose messages would then name fields the value does not have)
  return (
    reported.find((e) => e.keyword === "additionalProperties") ??
    reported.find((e) => e.keyword === "type") ??
    reported[0] ??
    errors[0]
  );
}

/** A RequestError from an ajv error: the JSON path and a message in the request's words. */
export function requestError(e: ErrorObject): RequestError {
  const path = jsonPath(e.instancePath);
  const rule = (e.parentSchema as { "x-message"?: string } | undefined)?.["x-message"];
  const got = `got ${describe(e.data)}`;
  switch (e.keyword) {
    case "additionalProperties": {
      const known = Object.keys(
        (e.parentSchema as { properties?: object } | undefined)?.properties ?? {},
      );
      const field = (e.params as { additionalProperty: string }).additionalProperty;
      return new RequestError(
        `${path}.${field}`,
        `unknown field; the fields are ${known.join(", ")}`,
      );
    }
    case "required": {
      const field = (e.params as { missingProperty: string }).missingProperty;
      return new RequestError(`${path}.${field}`, "is required");
    }
    case "type": {
      const types = ([] as string[]).concat((e.params as { type: string | string[] }).type);
      return new RequestError(
        path,
        `expected ${types.map((t) => TYPE_WORDS[t] ?? t).join(" or ")}, ${got}`,
      );
    }
    case "enum":
    case "const": {
      const allowed = e.keyword === "enum" ? (e.schema as unknown[]) : [e.schema];
      const expected = `expected ${allowed.length > 1 ? "one of " : ""}${allowed.map((c) => JSON.stringify(c)).join(", ")}`;
      return new RequestError(path, rule !== undefined ? `${rule}, ${got}` : `${expected}, ${got}`);
    }
    case "anyOf":
      return new RequestError(path, `${rule ?? "matches none of the allowed forms"}, ${got}`);
    case "exclusiveMinimum":
      return new RequestError(path, `must be > ${String(e.schema)}, ${got}`);
    case "minimum":
    case "maximum":
      return new RequestError(path, `must be between 0 and 1, ${got}`);
    case "minItems":
      return new RequestError(path, "expected a non-empty array, got an empty one");
    case "pattern":
      return new RequestError(path, `expected a non-blank string, ${got}`);
    default:
      return new RequestError(path, rule ?? `${e.message ?? "is not valid"}, ${got}`);
  }
}

/**
 * Checks a parsed JSON request and returns it typed.
 *
 * @throws RequestError with the JSON path of the first problem.
 */
export function parseEvalRequest(raw: Json): EvalRequest {
  if (!isObject(raw))
    throw new RequestError("$", `expected a request object, got ${describe(raw)}`);
  const validate = validator();
  if (!validate(raw)) throw requestError(firstProblem(validate.errors ?? []));
  const r = raw as unknown as RequestJson;
  checkCounts(r);
  const converted = withQuantities(r);
  const request = toRequest(converted);
  const echo = r.output !== undefined || r.states !== converted.states;
  return {
    ...request,
    ...(r.output !== undefined
      ? { output: parseOutput(r.output, componentMolarMasses(r), request.x) }
      : {}),
    ...(echo
      ? {
          inputs: (r.states ?? []).map((given, i) => ({
            given: { ...given },
            SI: { ...converted.states![i] },
          })),
        }
      : {}),
  };
}

/** Dimension of each state field given as a quantity with its unit. */
const STATE_DIMENSIONS: Readonly<Record<string, Dimension>> = {
  T: "temperature",
  P: "pressure",
  rho: "molar-density",
  h: "molar-energy",
  s: "molar-entropy",
  u: "molar-energy",
};

/** Molar mass of each component, kg/mol, or undefined when a component is unknown to the table. */
function componentMolarMasses(r: RequestJson): number[] | undefined {
  const out: number[] = [];
  for (let i = 0; i < r.components.length; i++) {
    const given = r.constants?.[i]?.M;
    if (given !== undefined) out.push(given);
    else {
      try {
        out.push(getComponent(r.components[i]).molarMassKgPerMol);
      } catch {
        return undefined;
      }
    }
  }
  return out;
}

/** Molar mass of the feed, kg/mol, or undefined when a component is unknown to the table. */
function feedMolarMass(r: RequestJson): number | undefined {
  const x = r.x ?? [1];
  return componentMolarMasses(r)?.reduce((sum, M, i) => sum + x[i] * M, 0);
}

/**
 * State fields given as text ("30 degC", "60 barg", "-350 kJ/kg") turned into SI numbers by the
 * units module (the same rules and refusals as the library: gauge pressure against 101325 Pa,
 * "psi" ambiguous, mass-based units through the feed's molar mass). A converted value is
 * rounded to 15 significant digits (evalOutput.roundConverted): "40 bar" is 4e6 Pa, not
 * 3999999.9999999995, both in the computation and in the response.
 */
function withQuantities(r: RequestJson): RequestJson {
  if (r.states === undefined || !r.states.some((s) => Object.values(s).some(isText))) return r;
  const M = feedMolarMass(r);
  const states = r.states.map((state, i) => {
    const out: Record<string, unknown> = { ...state };
    for (const [field, value] of Object.entries(state)) {
      const dimension = STATE_DIMENSIONS[field];
      if (dimension === undefined || typeof value !== "string") continue;
      const path = `$.states[${i}].${field}`;
      try {
        out[field] = roundConverted(
          parseQuantity(value, {
            dimension,
            molarMassKgPerMol: M,
            input: path,
          }).value,
        );
      } catch (e) {
        throw new RequestError(
          path,
          `${JSON.stringify(value)}: ${e instanceof Error ? e.message : String(e)}`,
        );
      }
    }
    return out as StateJson;
  });
  return { ...r, states };
}

function isText(v: unknown): v is string {
  return typeof v === "string";
}

/** The fluid fields of a request that passed a schema (shared with `isochor step`). */
export type FluidFieldsJson = Pick<
  RequestJson,
  "model" | "components" | "x" | "kij" | "constants" | "departure" | "reference" | "idealGas"
>;

/** A request that passed the schema (types as the schema says). */
interface RequestJson {
  model: EvalModelId;
  components: string[];
  x?: number[];
  kij?: number[][];
  constants?: (Record<string, number> | null)[];
  departure?: DepartureMethod;
  reference?: "formation" | { kind: "zero-at"; T: number; P: number };
  idealGas?: "correlation" | "molecular";
  phase?: EvalPhase;
  checkStability?: boolean;
  transport?: boolean;
  envelope?: boolean;
  states?: StateJson[];
  output?: OutputJson;
}

interface StateJson {
  // numbers in SI, or quantities with their units as text until withQuantities converts them
  T?: number;
  P?: number;
  rho?: number;
  h?: number;
  s?: number;
  u?: number;
  saturated?: "liquid" | "vapor";
  quality?: number;
}

/** The checks a JSON Schema cannot state: sizes tied to the number of components, sums, names. */
export function checkCounts(r: FluidFieldsJson): void {
  const n = r.components.length;
  if (r.model === "reference") {
    const ids = referenceFluidIds();
    if (!ids.includes(r.components[0])) {
      throw new RequestError(
        "$.components[0]",
        `no reference equation for ${JSON.stringify(r.components[0])}; available: ${ids.join(", ")}`,
      );
    }
  }
  if (r.x === undefined) {
    if (n !== 1) throw new RequestError("$.x", `mole fractions are required for ${n} components`);
  } else {
    if (r.x.length !== n) {
      throw new RequestError("$.x", `expected an array of ${n} mole fractions, got ${r.x.length}`);
    }
    const sum = r.x.reduce((p, q) => p + q, 0);
    if (!(Math.abs(sum - 1) <= 1e-9)) {
      throw new RequestError("$.x", `mole fractions must sum to 1 within 1e-9, they sum to ${sum}`);
    }
  }
  if (r.kij !== undefined) {
    if (r.kij.length !== n) {
      throw new RequestError("$.kij", `expected an ${n} x ${n} matrix, got ${r.kij.length} rows`);
    }
    r.kij.forEach((row, i) => {
      if (row.length !== n) {
        throw new RequestError(`$.kij[${i}]`, `expected a row of ${n} numbers, got ${row.length}`);
      }
    });
  }
  if (r.constants !== undefined && r.constants.length !== n) {
    throw new RequestError(
      "$.constants",
      `expected an array of ${n} entries (null or {} keeps the table), got ${r.constants.length}`,
    );
  }
}

const CONSTANT_NAMES: Record<string, keyof ConstantOverrides> = {
  Tc: "criticalTemperatureK",
  Pc: "criticalPressurePa",
  omega: "acentricFactor",
  M: "molarMassKgPerMol",
  Vc: "criticalVolumeM3PerMol",
};

/** The typed fluid fields of a request, defaults filled in (shared with `isochor step`). */
export function fluidFieldsOf(
  r: FluidFieldsJson,
): Pick<
  EvalRequest,
  "model" | "components" | "x" | "kij" | "constants" | "departure" | "reference" | "idealGas"
> {
  const reference: ReferenceState =
    r.reference === undefined || r.reference === "formation"
      ? { kind: "formation" }
      : { kind: "zero-at", temperatureK: r.reference.T, pressurePa: r.reference.P };
  return {
    model: r.model,
    components: r.components,
    x: r.x ?? [1],
    kij: r.kij,
    constants: r.constants?.map((c) => {
      if (c === null) return undefined;
      const out: ConstantOverrides = {};
      for (const [key, value] of Object.entries(c)) out[CONSTANT_NAMES[key]] = value;
      return out;
    }),
    departure: r.departure ?? "closed-form",
    reference,
    idealGas: r.idealGas ?? "correlation",
  };
}

/** The typed request, defaults filled in (the schema has checked every field). */
function toRequest(r: RequestJson): EvalRequest {
  return {
    ...fluidFieldsOf(r),
    phase: r.phase ?? "stable",
    checkStability: r.checkStability ?? true,
    transport: r.transport ?? false,
    envelope: r.envelope ?? false,
    states: (r.states ?? []).map(toState),
  };
}

/** One state; its form (checked by the schema) is decided by which fields are present. */
function toState(s: StateJson): EvalState {
  if (s.saturated !== undefined || s.quality !== undefined) {
    const saturated = s.saturated;
    const quality = saturated !== undefined ? (saturated === "liquid" ? 0 : 1) : s.quality!;
    return s.T !== undefined
      ? { kind: "TQ", T: s.T, quality, saturated }
      : { kind: "PQ", P: s.P!, quality, saturated };
  }
  if (s.h !== undefined) return { kind: "PH", P: s.P!, h: s.h };
  if (s.u !== undefined) return { kind: "URho", u: s.u, rho: s.rho! };
  if (s.s !== undefined) {
    return s.P !== undefined ? { kind: "PS", P: s.P, s: s.s } : { kind: "TS", T: s.T!, s: s.s };
  }
  return s.P !== undefined
    ? { kind: "TP", T: s.T!, P: s.P }
    : { kind: "TRho", T: s.T!, rho: s.rho! };
}
