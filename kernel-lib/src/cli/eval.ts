/**
 * `isochor eval [request.json | -]`: batch property evaluation, JSON in (file or stdin), JSON out.
 * The request is described in evalRequest.ts. Response:
 *   {"states": [ {"T", "P", "rho", "Z", "phase", "h", "s", "u", "cp", "cv", "w", "jt", "lnPhi": [...],
 *                 "residual": {"h", "s", "u", "a", "g"}, "residualTV": {"s", "a", "g"}}
 *              | {"error": {"code", "message"}} ]}
 * all SI molar (J/mol, J/(mol K), m/s, K/Pa; residual = same T and P, residualTV = same T and density).
 * One bad state yields an error entry; a malformed request is refused (exit 2) with
 * {"error": {"code": "bad-request", "message", "path"}}; a problem in the fluid definition (an
 * unknown component, a bad k_ij) is refused the same way with the path of the field. Exit 0 otherwise.
 */
import * as fs from "node:fs";
import * as path from "node:path";
import { IsochorError, RequestError, UnknownNameError, InputError } from "../errors.js";
import { defineFluid, type Fluid } from "../fluid/defineFluid.js";
import type { FluidState } from "../state/types.js";
import { parseEvalRequest, type EvalRequest, type EvalState } from "./evalRequest.js";
import type { CliIo } from "./io.js";

const USAGE = `usage: isochor eval [request.json | -]

Reads a JSON request from the file (or standard input when absent or "-") and writes the states as
JSON on standard output. Fields: model, components, x, kij, constants, departure, reference,
idealGas, phase, states (see the engine documentation).
`;

/** The response entry of one state. */
export type EvalStateResponse =
  | {
      T: number;
      P: number;
      rho: number;
      Z: number;
      phase: string;
      h: number;
      s: number;
      u: number;
      cp: number;
      cv: number;
      w: number | null;
      jt: number;
      lnPhi: number[];
      residual: { h: number; s: number; u: number; a: number; g: number };
      residualTV: { s: number; a: number; g: number };
      warnings?: string[];
    }
  | { error: { code: string; message: string } };

function toResponse(s: FluidState): EvalStateResponse {
  const out: EvalStateResponse = {
    T: s.temperatureK,
    P: s.pressurePa,
    rho: s.densityMolPerM3,
    Z: s.Z,
    phase: s.phase,
    h: s.molar.h,
    s: s.molar.s,
    u: s.molar.u,
    cp: s.molar.cp,
    cv: s.molar.cv,
    w: Number.isFinite(s.speedOfSoundMPerS) ? s.speedOfSoundMPerS : null,
    jt: s.jouleThomsonKPerPa,
    lnPhi: s.lnPhi.slice(),
    residual: {
      h: s.residual.h,
      s: s.residual.s,
      u: s.residual.u,
      a: s.residual.a,
      g: s.residual.g,
    },
    residualTV: { s: s.residualTV.s, a: s.residualTV.a, g: s.residualTV.g },
  };
  if (s.warnings.length > 0) out.warnings = s.warnings.map((w) => `${w.code}: ${w.message}`);
  return out;
}

/** Builds the fluid of a request; problems are reported with the path of the field. */
function fluidOf(request: EvalRequest): Fluid {
  try {
    return defineFluid({
      components: request.components,
      model: request.model,
      kij: request.kij,
      constants: request.constants,
      idealGas: request.idealGas,
      referenceState: request.reference,
      departure: request.departure,
    });
  } catch (e) {
    if (
      e instanceof UnknownNameError &&
      e.kind !== "component" &&
      request.idealGas === "molecular"
    ) {
      throw new RequestError(
        "$.idealGas",
        `${e.message} (the molecular route needs molecular constants for every component)`,
      );
    }
    if (e instanceof UnknownNameError && e.kind === "component") {
      const i = request.components.indexOf(e.received);
      throw new RequestError(i >= 0 ? `$.components[${i}]` : "$.components", e.message);
    }
    if (e instanceof InputError) {
      const field = e.input.startsWith("kij")
        ? `$.${e.input}`
        : e.input.startsWith("components[")
          ? `$.constants`
          : "$";
      throw new RequestError(field, e.message);
    }
    if (e instanceof IsochorError) throw new RequestError("$", e.message);
    throw e;
  }
}

/** Evaluates one state; any library error becomes an error entry. */
function evaluate(fluid: Fluid, request: EvalRequest, st: EvalState): EvalStateResponse {
  try {
    const s =
      st.kind === "TP"
        ? fluid.stateAtTP(st.T, st.P, request.x, { phase: request.phase })
        : fluid.stateAtTRho(st.T, st.rho, request.x);
    return toResponse(s);
  } catch (e) {
    if (e instanceof IsochorError) return { error: { code: e.code, message: e.message } };
    return { error: { code: "internal", message: e instanceof Error ? e.message : String(e) } };
  }
}

/** Runs a parsed JSON request and returns the response object (exported for tests and notebooks). */
export function runEvalRequest(raw: unknown): { states: EvalStateResponse[] } {
  const request = parseEvalRequest(raw);
  const fluid = fluidOf(request);
  return { states: request.states.map((st) => evaluate(fluid, request, st)) };
}

/** JSON has no NaN: non-finite numbers are written as null. */
function replacer(_key: string, value: unknown): unknown {
  return typeof value === "number" && !Number.isFinite(value) ? null : value;
}

/** The `eval` sub-command. */
export async function evalCommand(argv: string[], io: CliIo): Promise<number> {
  if (argv.includes("-h") || argv.includes("--help")) {
    io.stdout(USAGE);
    return 0;
  }
  if (argv.length > 1) {
    io.stderr(`isochor eval: expected at most one request file\n${USAGE}`);
    return 2;
  }
  let text: string;
  try {
    text =
      argv.length === 0 || argv[0] === "-"
        ? await io.readStdin()
        : fs.readFileSync(path.resolve(io.cwd, argv[0]), "utf8");
  } catch (e) {
    io.stderr(
      `isochor eval: cannot read ${argv[0] ?? "standard input"}: ${e instanceof Error ? e.message : String(e)}\n`,
    );
    return 2;
  }
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch (e) {
    const err = new RequestError(
      "$",
      `not valid JSON: ${e instanceof Error ? e.message : String(e)}`,
    );
    io.stdout(
      JSON.stringify({ error: { code: err.code, message: err.message, path: err.path } }) + "\n",
    );
    io.stderr(`isochor eval: ${err.message}\n`);
    return 2;
  }
  try {
    const response = runEvalRequest(raw);
    io.stdout(JSON.stringify(response, replacer) + "\n");
    return 0;
  } catch (e) {
    if (e instanceof RequestError) {
      io.stdout(
        JSON.stringify({ error: { code: e.code, message: e.message, path: e.path } }) + "\n",
      );
      io.stderr(`isochor eval: ${e.message}\n`);
      return 2;
    }
    throw e;
  }
}
