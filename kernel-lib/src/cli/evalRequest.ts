/**
 * The `isochor eval` request: parsing and checking, with the JSON path of every problem.
 *
 * Request (names fixed by issue 4; other tools depend on them; issue 5 adds "reference" and the
 * saturation and quality state forms):
 *   { "model": "ideal-gas" | "virial" | "van-der-waals" | "redlich-kwong" | "soave-redlich-kwong" |
 *              "peng-robinson" | "peng-robinson-1978" | "lee-kesler" | "reference",
 *     "components": [ids], "x": [mole fractions] (optional for one component),
 *     "kij": [[...]] (optional), "constants": [{"Tc": K, "Pc": Pa, "omega": -, "M": kg/mol}] (optional,
 *     per-component overrides; null or {} keeps the table), "departure": "closed-form" | "numeric",
 *     "reference": "formation" | {"kind": "zero-at", "T": K, "P": Pa}, "idealGas": "correlation" |
 *     "molecular", "phase": "stable" | "liquid" | "vapor",
 *     "checkStability": true | false (optional, default false; added after issue 4: mixtures at
 *       given T and P are run through the tangent-plane test and a split is reported in the
 *       state's "warnings"),
 *     "states": [{"T": K, "P": Pa} | {"T": K, "rho": mol/m3}
 *                | {"T": K, "saturated": "liquid" | "vapor"} | {"P": Pa, "saturated": ...}
 *                | {"T": K, "quality": 0..1} | {"P": Pa, "quality": 0..1}] }
 * "reference" takes exactly one component with a reference equation (referenceFluidIds(): water,
 * carbon-dioxide, methane, nitrogen) in its publication's reference state, so "kij", "constants",
 * "idealGas", "reference" and "departure": "numeric" are refused with it. Saturated and quality
 * states need one component (pure-fluid saturation); "phase" does not apply to them.
 * Structural problems (wrong types, missing fields, unknown names) refuse the whole request with a
 * RequestError naming the JSON path; physically bad values inside a state (T <= 0, ...) become an
 * error entry for that state only.
 */
import { RequestError } from "../errors.js";
import { isModelId, MODEL_IDS, type ModelId } from "../eos/createModel.js";
import { referenceFluidIds } from "../eos/multiparameter/referenceFluids.js";
import type { ReferenceState } from "../idealgas/types.js";
import type { ConstantOverrides } from "../fluid/defineFluid.js";
import type { DepartureMethod, PhaseRequest } from "../state/types.js";

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
    };

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
  readonly phase: PhaseRequest;
  /** Run the mixture stability test at (T, P) states. Default false. */
  readonly checkStability: boolean;
  readonly states: readonly EvalState[];
}

type Json = unknown;

function isObject(v: Json): v is Record<string, Json> {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}

function describe(v: Json): string {
  if (v === null) return "null";
  if (Array.isArray(v)) return "an array";
  return typeof v === "string"
    ? JSON.stringify(v)
    : typeof v === "object"
      ? "an object"
      : String(v);
}

function number(v: Json, path: string): number {
  if (typeof v !== "number" || !Number.isFinite(v)) {
    throw new RequestError(path, `expected a number, got ${describe(v)}`);
  }
  return v;
}

function oneOf<T extends string>(v: Json, path: string, choices: readonly T[], fallback: T): T {
  if (v === undefined) return fallback;
  if (typeof v !== "string" || !(choices as readonly string[]).includes(v)) {
    throw new RequestError(
      path,
      `expected one of ${choices.map((c) => JSON.stringify(c)).join(", ")}, got ${describe(v)}`,
    );
  }
  return v as T;
}

const KNOWN_KEYS = new Set([
  "model",
  "components",
  "x",
  "kij",
  "constants",
  "departure",
  "reference",
  "idealGas",
  "phase",
  "checkStability",
  "states",
]);

/**
 * Checks a parsed JSON request and returns it typed.
 *
 * @throws RequestError with the JSON path of the first problem.
 */
export function parseEvalRequest(raw: Json): EvalRequest {
  if (!isObject(raw))
    throw new RequestError("$", `expected a request object, got ${describe(raw)}`);
  for (const key of Object.keys(raw)) {
    if (!KNOWN_KEYS.has(key)) {
      throw new RequestError(
        `$.${key}`,
        `unknown field; the request fields are ${[...KNOWN_KEYS].join(", ")}`,
      );
    }
  }
  const model = raw.model;
  if (typeof model !== "string")
    throw new RequestError("$.model", `expected a model name, got ${describe(model)}`);
  if (!isModelId(model) && model !== "reference") {
    throw new RequestError(
      "$.model",
      `unknown model ${JSON.stringify(model)}; models: ${[...MODEL_IDS, "reference"].join(", ")}`,
    );
  }
  const comps = raw.components;
  if (!Array.isArray(comps) || comps.length === 0) {
    throw new RequestError(
      "$.components",
      `expected a non-empty array of component ids, got ${describe(comps)}`,
    );
  }
  comps.forEach((c, i) => {
    if (typeof c !== "string" || c.trim() === "") {
      throw new RequestError(`$.components[${i}]`, `expected a component id, got ${describe(c)}`);
    }
  });
  const n = comps.length;
  if (model === "reference") checkReferenceRequest(raw, comps as string[]);
  let x: number[];
  if (raw.x === undefined) {
    if (n !== 1) throw new RequestError("$.x", `mole fractions are required for ${n} components`);
    x = [1];
  } else {
    if (!Array.isArray(raw.x) || raw.x.length !== n) {
      throw new RequestError(
        "$.x",
        `expected an array of ${n} mole fractions, got ${describe(raw.x)}`,
      );
    }
    x = raw.x.map((v, i) => number(v, `$.x[${i}]`));
    x.forEach((v, i) => {
      if (!(v >= 0 && v <= 1))
        throw new RequestError(`$.x[${i}]`, `a mole fraction must be between 0 and 1, got ${v}`);
    });
    const sum = x.reduce((p, q) => p + q, 0);
    if (!(Math.abs(sum - 1) <= 1e-9)) {
      throw new RequestError("$.x", `mole fractions must sum to 1 within 1e-9, they sum to ${sum}`);
    }
  }
  let kij: number[][] | undefined;
  if (raw.kij !== undefined) {
    if (!Array.isArray(raw.kij) || raw.kij.length !== n) {
      throw new RequestError("$.kij", `expected an ${n} x ${n} matrix, got ${describe(raw.kij)}`);
    }
    kij = raw.kij.map((row, i) => {
      if (!Array.isArray(row) || row.length !== n) {
        throw new RequestError(
          `$.kij[${i}]`,
          `expected a row of ${n} numbers, got ${describe(row)}`,
        );
      }
      return row.map((v, j) => number(v, `$.kij[${i}][${j}]`));
    });
  }
  let constants: (ConstantOverrides | undefined)[] | undefined;
  if (raw.constants !== undefined) {
    if (!Array.isArray(raw.constants) || raw.constants.length !== n) {
      throw new RequestError(
        "$.constants",
        `expected an array of ${n} entries (null or {} keeps the table), got ${describe(raw.constants)}`,
      );
    }
    constants = raw.constants.map((c, i) => {
      const path = `$.constants[${i}]`;
      if (c === null) return undefined;
      if (!isObject(c))
        throw new RequestError(path, `expected an object or null, got ${describe(c)}`);
      const names: Record<string, keyof ConstantOverrides> = {
        Tc: "criticalTemperatureK",
        Pc: "criticalPressurePa",
        omega: "acentricFactor",
        M: "molarMassKgPerMol",
        Vc: "criticalVolumeM3PerMol",
      };
      const out: ConstantOverrides = {};
      for (const [key, value] of Object.entries(c)) {
        const field = names[key];
        if (!field)
          throw new RequestError(
            `${path}.${key}`,
            `unknown constant; use Tc (K), Pc (Pa), omega, M (kg/mol), Vc (m3/mol)`,
          );
        const v = number(value, `${path}.${key}`);
        if (key !== "omega" && !(v > 0))
          throw new RequestError(`${path}.${key}`, `must be > 0, got ${v}`);
        out[field] = v;
      }
      return out;
    });
  }
  const departure = oneOf(
    raw.departure,
    "$.departure",
    ["closed-form", "numeric"] as const,
    "closed-form",
  );
  const idealGas = oneOf(
    raw.idealGas,
    "$.idealGas",
    ["correlation", "molecular"] as const,
    "correlation",
  );
  const phase = oneOf(raw.phase, "$.phase", ["stable", "liquid", "vapor"] as const, "stable");
  const checkStability = raw.checkStability ?? false;
  if (typeof checkStability !== "boolean") {
    throw new RequestError(
      "$.checkStability",
      `expected true or false, got ${describe(raw.checkStability)}`,
    );
  }
  let reference: ReferenceState = { kind: "formation" };
  if (raw.reference !== undefined && raw.reference !== "formation") {
    const r = raw.reference;
    if (!isObject(r) || r.kind !== "zero-at") {
      throw new RequestError(
        "$.reference",
        `expected "formation" or {"kind": "zero-at", "T": K, "P": Pa}, got ${describe(r)}`,
      );
    }
    const T = number(r.T, "$.reference.T");
    const P = number(r.P, "$.reference.P");
    if (!(T > 0)) throw new RequestError("$.reference.T", `must be > 0 K, got ${T}`);
    if (!(P > 0)) throw new RequestError("$.reference.P", `must be > 0 Pa, got ${P}`);
    reference = { kind: "zero-at", temperatureK: T, pressurePa: P };
  }
  if (!Array.isArray(raw.states) || raw.states.length === 0) {
    throw new RequestError(
      "$.states",
      `expected a non-empty array of states, got ${describe(raw.states)}`,
    );
  }
  const states: EvalState[] = raw.states.map((s, i) => parseState(s, `$.states[${i}]`, n));
  return {
    model,
    components: comps as string[],
    x,
    kij,
    constants,
    departure,
    reference,
    idealGas,
    phase,
    checkStability,
    states,
  };
}

const STATE_FORMS =
  '{"T": K, "P": Pa}, {"T": K, "rho": mol/m3}, {"T": K or "P": Pa, "saturated": "liquid"|"vapor"} ' +
  'or {"T": K or "P": Pa, "quality": 0..1}';
const STATE_KEYS = new Set(["T", "P", "rho", "saturated", "quality"]);

/** One state of the request; the form is decided by which fields are present. */
function parseState(s: Json, path: string, componentCount: number): EvalState {
  if (!isObject(s)) throw new RequestError(path, `expected ${STATE_FORMS}, got ${describe(s)}`);
  for (const key of Object.keys(s)) {
    if (!STATE_KEYS.has(key)) {
      throw new RequestError(`${path}.${key}`, `unknown state field; the forms are ${STATE_FORMS}`);
    }
  }
  const has = (key: string): boolean => s[key] !== undefined;
  if (has("saturated") || has("quality")) {
    if (has("saturated") && has("quality"))
      throw new RequestError(path, "give saturated or quality, not both");
    if (has("rho"))
      throw new RequestError(
        `${path}.rho`,
        "a saturated or quality state is fixed by T or P alone",
      );
    if (has("T") === has("P"))
      throw new RequestError(
        path,
        "a saturated or quality state needs exactly one of T (K) or P (Pa)",
      );
    if (componentCount !== 1) {
      throw new RequestError(
        path,
        `saturated and quality states are pure-fluid states; the request has ${componentCount} components`,
      );
    }
    let quality: number;
    let saturated: "liquid" | "vapor" | undefined;
    if (has("saturated")) {
      saturated = oneOf(s.saturated, `${path}.saturated`, ["liquid", "vapor"] as const, "liquid");
      quality = saturated === "liquid" ? 0 : 1;
    } else {
      // the range 0..1 is checked by the library (a bad value gives this state an error entry)
      quality = number(s.quality, `${path}.quality`);
    }
    return has("T")
      ? { kind: "TQ", T: number(s.T, `${path}.T`), quality, saturated }
      : { kind: "PQ", P: number(s.P, `${path}.P`), quality, saturated };
  }
  const T = number(s.T, `${path}.T`);
  if (has("P") && has("rho")) throw new RequestError(path, "give P or rho, not both");
  if (has("P")) return { kind: "TP", T, P: number(s.P, `${path}.P`) };
  if (has("rho")) return { kind: "TRho", T, rho: number(s.rho, `${path}.rho`) };
  throw new RequestError(path, "missing P (Pa), rho (mol/m3), saturated or quality");
}

/**
 * Model "reference": one component with a reference equation, in the publication's reference
 * state and ideal part, so the fields that would change either are refused.
 */
function checkReferenceRequest(raw: Record<string, Json>, components: string[]): void {
  const ids = referenceFluidIds();
  if (components.length !== 1) {
    throw new RequestError(
      "$.components",
      `model "reference" takes one component (one of ${ids.join(", ")}), got ${components.length}`,
    );
  }
  if (!ids.includes(components[0])) {
    throw new RequestError(
      "$.components[0]",
      `no reference equation for ${JSON.stringify(components[0])}; available: ${ids.join(", ")}`,
    );
  }
  const fixed: [string, string][] = [
    ["kij", "a pure fluid has no binary interaction parameters"],
    ["constants", "the reference equation carries its own constants"],
    ["idealGas", "the reference equation carries its own ideal-gas part"],
    ["reference", "results are in the reference state of the equation's publication"],
  ];
  for (const [key, why] of fixed) {
    if (raw[key] !== undefined) {
      throw new RequestError(`$.${key}`, `not accepted with model "reference": ${why}`);
    }
  }
  if (raw.departure !== undefined && raw.departure !== "closed-form") {
    throw new RequestError(
      "$.departure",
      `model "reference" is evaluated from its own residual Helmholtz energy ("closed-form"), got ${describe(raw.departure)}`,
    );
  }
}
