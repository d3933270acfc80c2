/**
 * The `isochor step` request: checked against its JSON Schema (schema/step-request.schema.json,
 * whose fluid fields are those of eval-request.schema.json), then the checks a schema cannot
 * state, with the JSON path of every problem ("$.step.duty").
 *
 *   raw JSON --schema (ajv)--> structure, types, enums, model "reference" exclusions
 *            --checkCounts----> the fluid fields as in `isochor eval`
 *            --checkStep------> the fields each step kind takes, each stream's own x
 *            --typed----------> StepRequest
 */
import Ajv2020, { type ValidateFunction } from "ajv/dist/2020.js";
import { RequestError } from "../errors.js";
import type { FlowSpec } from "../process/stream.js";
import evalSchema from "./schema/eval-request.schema.json";
import schema from "./schema/step-request.schema.json";
import {
  checkCounts,
  firstProblem,
  fluidFieldsOf,
  requestError,
  type EvalRequest,
  type FluidFieldsJson,
} from "./evalRequest.js";

/** The step kinds of the request. */
export type StepKind =
  | "valve"
  | "compressor"
  | "turbine"
  | "pump"
  | "heater"
  | "cooler"
  | "exchanger"
  | "mixer"
  | "separator";

/** A stream of the request, SI (flow as given). */
export interface StepStreamRequest {
  readonly T: number;
  readonly P: number;
  readonly flow: FlowSpec;
  /** This stream's own mole fractions, or the request's x. */
  readonly x: readonly number[];
  readonly name?: string;
  /** JSON path of the stream ("$.inlet", "$.inlets[0]", "$.step.cold"). */
  readonly path: string;
}

/** The step of the request, as given (SI). */
export interface StepSpecRequest {
  readonly kind: StepKind;
  readonly P?: number;
  readonly T?: number;
  readonly duty?: number;
  readonly isentropicEfficiency?: number;
  readonly polytropicEfficiency?: number;
  readonly stages?: number | readonly number[];
  readonly intercoolerT?: number;
  readonly dischargeTemperatureLimit?: number;
  readonly minimumDesignMetalTemperature?: number;
  readonly minimumApproach?: number;
  readonly cold?: StepStreamRequest;
  readonly coldP?: number;
  readonly onTemperatureCross?: "refuse" | "warn";
  readonly points?: number;
}

/** A checked request. */
export type StepRequest = Pick<
  EvalRequest,
  "model" | "components" | "x" | "kij" | "constants" | "departure" | "reference" | "idealGas"
> & {
  readonly inlet: StepStreamRequest;
  /** Mixer: the further inlets. */
  readonly inlets: readonly StepStreamRequest[];
  readonly step: StepSpecRequest;
};

/** The request's JSON Schema (also the published documentation of the format). */
export const STEP_REQUEST_SCHEMA: object = schema;

/** Which step fields each kind takes ("kind" always), and which it requires. */
const KIND_FIELDS: Readonly<Record<StepKind, { takes: string[]; oneOf?: string[][] }>> = {
  heater: {
    takes: ["T", "duty", "P", "minimumDesignMetalTemperature", "points"],
    oneOf: [["T", "duty"]],
  },
  cooler: {
    takes: ["T", "duty", "P", "minimumDesignMetalTemperature", "points"],
    oneOf: [["T", "duty"]],
  },
  separator: { takes: ["T", "P", "minimumDesignMetalTemperature"] },
  mixer: { takes: ["P", "minimumDesignMetalTemperature"] },
  exchanger: {
    takes: [
      "cold",
      "duty",
      "minimumApproach",
      "P",
      "coldP",
      "onTemperatureCross",
      "minimumDesignMetalTemperature",
      "points",
    ],
    oneOf: [["duty", "minimumApproach"]],
  },
  valve: { takes: ["P", "minimumDesignMetalTemperature"] },
  compressor: {
    takes: [
      "P",
      "isentropicEfficiency",
      "polytropicEfficiency",
      "stages",
      "intercoolerT",
      "dischargeTemperatureLimit",
      "minimumDesignMetalTemperature",
    ],
    oneOf: [["isentropicEfficiency", "polytropicEfficiency"]],
  },
  turbine: {
    takes: ["P", "isentropicEfficiency", "polytropicEfficiency", "minimumDesignMetalTemperature"],
    oneOf: [["isentropicEfficiency", "polytropicEfficiency"]],
  },
  pump: { takes: ["P", "isentropicEfficiency", "minimumDesignMetalTemperature"] },
};

/** Fields a kind requires besides its one-of groups. */
const KIND_REQUIRES: Readonly<Partial<Record<StepKind, string[]>>> = {
  exchanger: ["cold"],
  valve: ["P"],
  compressor: ["P"],
  turbine: ["P"],
  pump: ["P", "isentropicEfficiency"],
};

let compiled: ValidateFunction | undefined;

function validator(): ValidateFunction {
  if (compiled === undefined) {
    const ajv = new Ajv2020({ allErrors: true, verbose: true, strictTypes: true });
    ajv.addKeyword({ keyword: "x-message", schemaType: "string" });
    ajv.addKeyword({ keyword: "x-checks", schemaType: "array" });
    ajv.addSchema(evalSchema, "eval-request.schema.json");
    compiled = ajv.compile(schema);
  }
  return compiled;
}

interface StreamJson {
  T: number;
  P: number;
  flow: {
    value: number;
    unit: string;
    reference?: string | { T: number; P: number };
    basis?: "ideal-gas" | "real-gas";
  };
  x?: number[];
  name?: string;
}

type StepJson = Omit<StepSpecRequest, "cold"> & { cold?: StreamJson };

type RequestJson = FluidFieldsJson & {
  inlet: StreamJson;
  inlets?: StreamJson[];
  step: StepJson;
};

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}

/**
 * Checks a parsed JSON request and returns it typed.
 *
 * @throws RequestError with the JSON path of the first problem.
 */
export function parseStepRequest(raw: unknown): StepRequest {
  if (!isObject(raw)) throw new RequestError("$", "expected a request object");
  const validate = validator();
  if (!validate(raw)) throw requestError(firstProblem(validate.errors ?? []));
  const r = raw as unknown as RequestJson;
  checkCounts(r);
  const fluid = fluidFieldsOf(r);
  const n = r.components.length;
  const step = r.step;
  const spec = KIND_FIELDS[step.kind];
  for (const key of Object.keys(step)) {
    if (key !== "kind" && !spec.takes.includes(key)) {
      throw new RequestError(
        `$.step.${key}`,
        `not taken by a ${step.kind}; a ${step.kind} takes ${spec.takes.join(", ")}`,
      );
    }
  }
  for (const group of spec.oneOf ?? []) {
    const given = group.filter((k) => (step as Record<string, unknown>)[k] !== undefined);
    if (given.length !== 1) {
      throw new RequestError(
        given.length === 0 ? `$.step.${group[0]}` : `$.step.${given[1]}`,
        `a ${step.kind} takes exactly one of ${group.map((g) => `"${g}"`).join(" and ")}, got ${given.length === 0 ? "none" : given.join(" and ")}`,
      );
    }
  }
  for (const key of KIND_REQUIRES[step.kind] ?? []) {
    if ((step as Record<string, unknown>)[key] === undefined) {
      throw new RequestError(`$.step.${key}`, `is required for a ${step.kind}`);
    }
  }
  if (r.inlets !== undefined && step.kind !== "mixer") {
    throw new RequestError("$.inlets", `only a mixer takes further inlets, not a ${step.kind}`);
  }
  if (step.kind === "mixer" && r.inlets === undefined) {
    throw new RequestError(
      "$.inlets",
      "is required for a mixer (the streams mixed with the inlet)",
    );
  }
  const stream = (s: StreamJson, path: string): StepStreamRequest => {
    let x = fluid.x;
    if (s.x !== undefined) {
      if (s.x.length !== n) {
        throw new RequestError(
          `${path}.x`,
          `expected an array of ${n} mole fractions, got ${s.x.length}`,
        );
      }
      const sum = s.x.reduce((p, q) => p + q, 0);
      if (!(Math.abs(sum - 1) <= 1e-9)) {
        throw new RequestError(
          `${path}.x`,
          `mole fractions must sum to 1 within 1e-9, they sum to ${sum}`,
        );
      }
      x = s.x;
    }
    const ref = s.flow.reference;
    const flow: FlowSpec = {
      value: s.flow.value,
      unit: s.flow.unit,
      ...(ref === undefined
        ? {}
        : {
            reference: typeof ref === "string" ? ref : { temperatureK: ref.T, pressurePa: ref.P },
          }),
      ...(s.flow.basis === undefined ? {} : { basis: s.flow.basis }),
    } as FlowSpec;
    return { T: s.T, P: s.P, flow, x, name: s.name, path };
  };
  return {
    ...fluid,
    inlet: stream(r.inlet, "$.inlet"),
    inlets: (r.inlets ?? []).map((s, i) => stream(s, `$.inlets[${i}]`)),
    step: {
      ...step,
      cold: step.cold === undefined ? undefined : stream(step.cold, "$.step.cold"),
    },
  };
}
