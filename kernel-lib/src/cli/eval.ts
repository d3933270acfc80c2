/**
 * `isochor eval [request.json | -]`: batch property evaluation, JSON in (file or stdin), JSON out.
 * The request format is the JSON Schema schema/eval-request.schema.json (checked by
 * evalRequest.ts). Response:
 *   {"states": [ {"T", "P", "rho", "Z", "phase", "h", "s", "u", "cp", "cv", "w", "jt", "lnPhi": [...],
 *                 "residual": {"h", "s", "u", "a", "g"}, "residualTV": {"s", "a", "g"}}
 *              | {"error": {"code", "message"}} ]}
 * all SI molar (J/mol, J/(mol K), m/s, K/Pa; residual = same T and P, residualTV = same T and density)
 * unless the request's "output" asks for other units or the mass basis (evalOutput.ts): then the
 * response adds "units" (the unit of each field) and each entry its "input" as given.
 * Every state entry also carries "referenceState": the zero of h, s and u, in words.
 * States given by saturation or quality (pure fluids) add "quality" (vapour fraction, 0..1): at
 * quality 0 or 1 the entry is the saturated liquid or vapour with every field; strictly inside the
 * dome ("phase": "two-phase") rho, h, s, u and residual {h, s, u, a, g} are lever-rule averages of
 * the saturated phases, lnPhi is the common value of both phases (equal fugacity), Z = P / (rho R T)
 * with the overall density, and cp, cv, w, jt and residualTV (undefined for a two-phase mixture at
 * one density) are null. Model "reference" evaluates the reference equation of the one component
 * (eos/multiparameter) in its publication's reference state, refusing states beyond the
 * equation's extrapolation range as error entries.
 * With "transport": true, single-phase entries add "viscosity" (Pa s), "thermalConductivity"
 * (W/(m K)) and "transportMethod" (transport/); two- and three-phase entries give null for both.
 * One bad state yields an error entry; a malformed request is refused (exit 2) with
 * {"error": {"code": "bad-request", "message", "path"}}; a problem in the fluid definition (an
 * unknown component, a bad k_ij) is refused the same way with the path of the field. Exit 0 otherwise.
 */
import { IsochorError, RequestError, UnknownNameError, InputError } from "../errors.js";
import { defineFluid, type Fluid } from "../fluid/defineFluid.js";
import { referenceFluid } from "../fluid/referenceFluids.js";
import {
  referenceFluidBinding,
  referenceStateTP,
  referenceStateTRho,
} from "../state/referenceStates.js";
import type { ReferenceFluid } from "../eos/multiparameter/referenceFluid.js";
import {
  stateAtPressureQuality,
  stateAtTemperatureQuality,
  type TwoPhaseState,
} from "../phase/twoPhaseState.js";
import { gasConstantOf } from "../phase/pureFluid.js";
import { describeReferenceState } from "../idealgas/referenceState.js";
import type { FluidBinding, FluidState } from "../state/types.js";
import {
  parseEvalRequest,
  type EvalInputEcho,
  type EvalRequest,
  type EvalState,
} from "./evalRequest.js";
import { flashPH, flashPS, flashTP, flashTS, flashUV } from "../phase/flash/index.js";
import type { Equilibrium } from "../phase/flash/types.js";
import {
  saturationPointAtPressure,
  saturationPointAtTemperature,
} from "../phase/envelope/index.js";
import {
  envelopeResponse,
  equilibriumFields,
  saturationPointFields,
  type EvalEnvelope,
  type EvalEquilibriumFields,
} from "./evalEquilibrium.js";
import { transportAtTRho } from "../transport/transportAt.js";
import { parseCliArgs } from "./cliArgs.js";
import { convertEntry, convertTP, unitsMap } from "./evalOutput.js";
import type { CliIo } from "./io.js";
import { readJsonRequest } from "./requestFile.js";

const USAGE = `usage: isochor eval [request.json | -]

Reads a JSON request from the file (or standard input when absent or "-") and writes the states as
JSON on standard output. Fields: model, components, x, kij, constants, departure, reference,
idealGas, phase, checkStability (mixtures: tangent-plane test at each T, P state, a split reported
in its warnings; default true), envelope (true: also the mixture's phase envelope), states. A state is
{"T", "P"}, {"T", "rho"}, {"P", "h"}, {"P", "s"}, {"T", "s"}, {"u", "rho"},
{"T" or "P", "saturated": "liquid"|"vapor"} or {"T" or "P", "quality"}. "phase": "equilibrium"
flashes every state; (P, h), (P, s), (T, s) and (u, rho) states are always flashes, and list their
"phases" (kind, amount, x, rho, Z, h, s, u, lnPhi). Model "reference" takes one component with a
reference equation (water, carbon-dioxide, methane, nitrogen). The request's
format, with units and defaults, is the JSON Schema dist/cli/schema/eval-request.schema.json of the
isochor package.

units: SI, molar. In: T in K, P in Pa, rho in mol/m3, h and u in J/mol, s in J/(mol K), x and
  quality (vapour mole fraction) as fractions (0..1).
  Out: h, u, residual h/u/a/g in J/mol; s, cp, cv in J/(mol K); w in m/s; jt in K/Pa; Z, lnPhi -.
  "transport": true adds viscosity in Pa s and thermalConductivity in W/(m K) to single-phase states.
  A state field may be a quantity with its unit as text: "30 degC", "60 barg" (gauge against
  101325 Pa), "1.5 MPa", "-350 kJ/kg" (mass units through the feed's molar mass); "psi" is
  ambiguous (psia or psig). Such a state echoes "input": {"given": as written, "SI": the values}.
  "output": {"units": "SI" | "field" | {"T": "degC", "P": "barg", "h": "kJ/kg", ...},
  "basis": "molar" | "mass"} gives T, P, rho, h, s, u, cp, cv, w, jt (and the residuals) in those
  units, names them in the response's "units" map and echoes every input. "field": degF, psia,
  lbmol/ft3 (lb/ft3), Btu/lbmol (Btu/lb), Btu/(lbmol degR) (Btu/(lb degR)), ft/s, degF/psi.

example (methane at 300 K and 50 bar = 5e6 Pa, Peng-Robinson):
  echo '{"model": "peng-robinson", "components": ["methane"], "states": [{"T": 300, "P": 5e6}]}' \\
    | npx isochor eval

example (about the same state in plant units, answered per kg in kJ, degC and barg):
  echo '{"model": "peng-robinson", "components": ["methane"], "states": [{"T": "26.85 degC",
    "P": "49 barg"}], "output": {"units": {"T": "degC", "P": "barg", "h": "kJ/kg",
    "s": "kJ/(kg K)"}, "basis": "mass"}}' | npx isochor eval
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
      quality?: number;
      /** The zero of h, s, u in words (every result says which reference state it uses). */
      referenceState: string;
      warnings?: string[];
      /** With "transport": true (EvalTransportFields). */
      viscosity?: number | null;
      thermalConductivity?: number | null;
      transportMethod?: string;
    }
  | {
      T: number;
      P: number;
      rho: number;
      Z: number;
      phase: "two-phase";
      quality: number;
      h: number;
      s: number;
      u: number;
      cp: null;
      cv: null;
      w: null;
      jt: null;
      lnPhi: number[];
      residual: { h: number; s: number; u: number; a: number; g: number };
      residualTV: null;
      referenceState: string;
      warnings?: string[];
      /** With "transport": true (EvalTransportFields). */
      viscosity?: number | null;
      thermalConductivity?: number | null;
      transportMethod?: string;
    }
  | EvalEquilibriumResponse
  | { error: { code: string; message: string } };

/** The fields `"transport": true` adds (null: more than one phase, or outside the method's range). */
export interface EvalTransportFields {
  /** Dynamic viscosity, Pa s. */
  viscosity?: number | null;
  /** Thermal conductivity, W/(m K). */
  thermalConductivity?: number | null;
  /** "chung-1988" or "iapws-2008-2011" (transport/types.ts). */
  transportMethod?: string;
}

/** An equilibrium of two or three phases (evalEquilibrium.ts says what each field means). */
export interface EvalEquilibriumResponse extends EvalEquilibriumFields, EvalTransportFields {
  cp: null;
  cv: null;
  w: null;
  jt: null;
  lnPhi: null;
  residual: null;
  residualTV: null;
  referenceState: string;
  warnings?: string[];
}

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
    referenceState: describeReferenceState(s.referenceState),
  };
  if (s.warnings.length > 0) out.warnings = warningTexts(s.warnings);
  return out;
}

const warningTexts = (warnings: readonly { code: string; message: string }[]): string[] =>
  warnings.map((w) => `${w.code}: ${w.message}`);

/**
 * A state on or inside the dome. At quality 0 or 1 the saturated phase itself (every field, with
 * its quality); strictly inside, the lever-rule mixture (see the file header for the fields).
 */
function toQualityResponse(t: TwoPhaseState, binding: FluidBinding): EvalStateResponse {
  const sat = t.quality === 0 ? t.liquid : t.quality === 1 ? t.vapor : undefined;
  if (sat) {
    const out = toResponse(sat);
    if (!("error" in out)) {
      out.quality = t.quality;
      const all = [...new Set([...warningTexts(t.warnings), ...(out.warnings ?? [])])];
      if (all.length > 0) out.warnings = all;
    }
    return out;
  }
  const q = t.quality;
  const lever = (l: number, v: number): number => (1 - q) * l + q * v;
  const L = t.liquid.residual;
  const V = t.vapor.residual;
  // P v / (R T) with the overall molar volume and the model's own gas constant
  const gasConstant = gasConstantOf(binding.model);
  const out: EvalStateResponse = {
    T: t.temperatureK,
    P: t.pressurePa,
    rho: t.densityMolPerM3,
    Z: t.pressurePa / (t.densityMolPerM3 * gasConstant * t.temperatureK),
    phase: "two-phase",
    quality: q,
    h: t.molar.h,
    s: t.molar.s,
    u: t.molar.u,
    cp: null,
    cv: null,
    w: null,
    jt: null,
    lnPhi: t.liquid.lnPhi.slice(),
    residual: {
      h: lever(L.h, V.h),
      s: lever(L.s, V.s),
      u: lever(L.u, V.u),
      a: lever(L.a, V.a),
      g: lever(L.g, V.g),
    },
    residualTV: null,
    referenceState: describeReferenceState(binding.idealGas.referenceState),
  };
  if (t.warnings.length > 0) out.warnings = warningTexts(t.warnings);
  return out;
}

/** What evaluates the states of a request: a fluid of the engine, or a reference equation. */
type Evaluator =
  | { readonly kind: "engine"; readonly fluid: Fluid }
  | { readonly kind: "reference"; readonly fluid: ReferenceFluid; readonly binding: FluidBinding };

function evaluatorOf(request: EvalRequest): Evaluator {
  if (request.model === "reference") {
    // the component id was checked against referenceFluidIds() by the parser
    const fluid = referenceFluid(request.components[0]);
    return { kind: "reference", fluid, binding: referenceFluidBinding(fluid) };
  }
  return { kind: "engine", fluid: fluidOf(request, request.model) };
}

/** Builds the fluid of a request; problems are reported with the path of the field. */
export function fluidOf(
  request: Pick<
    EvalRequest,
    "components" | "kij" | "constants" | "idealGas" | "reference" | "departure"
  >,
  model: Exclude<EvalRequest["model"], "reference">,
): Fluid {
  try {
    return defineFluid({
      components: request.components,
      model,
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
        : /^components\[\d+\]$/.test(e.input)
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
function evaluate(ev: Evaluator, request: EvalRequest, st: EvalState): EvalStateResponse {
  try {
    const binding: FluidBinding = ev.kind === "engine" ? ev.fluid : ev.binding;
    switch (st.kind) {
      case "TP":
        if (request.phase === "equilibrium")
          return equilibriumResponse(flashOf(ev, request, st), binding);
        return toResponse(
          ev.kind === "engine"
            ? ev.fluid.stateAtTP(st.T, st.P, request.x, {
                phase: request.phase,
                checkStability: request.checkStability,
              })
            : referenceStateTP(ev.fluid, st.T, st.P, { phase: request.phase }),
        );
      case "TRho":
        return toResponse(
          ev.kind === "engine"
            ? ev.fluid.stateAtTRho(st.T, st.rho, request.x)
            : referenceStateTRho(ev.fluid, st.T, st.rho),
        );
      case "TQ":
        if (request.components.length > 1) return mixtureQualityResponse(ev, request, st, binding);
        return toQualityResponse(stateAtTemperatureQuality(binding, st.T, st.quality), binding);
      case "PQ":
        if (request.components.length > 1) return mixtureQualityResponse(ev, request, st, binding);
        return toQualityResponse(stateAtPressureQuality(binding, st.P, st.quality), binding);
      case "PH":
      case "PS":
      case "TS":
      case "URho":
        return equilibriumResponse(flashOf(ev, request, st), binding);
    }
  } catch (e) {
    if (e instanceof IsochorError) return { error: { code: e.code, message: e.message } };
    return { error: { code: "internal", message: e instanceof Error ? e.message : String(e) } };
  }
}

/**
 * Adds viscosity and thermal conductivity to a single-phase entry when the request asks for them
 * (at the entry's T, rho and the request's x: a single phase of a flash or saturation point has
 * the feed's composition); null for two or three phases; a transport failure becomes null with a
 * warning, so that the thermodynamic state is still returned.
 */
function withTransport(
  ev: Evaluator,
  request: EvalRequest,
  out: EvalStateResponse,
): EvalStateResponse {
  if (!request.transport || "error" in out) return out;
  if (out.phase === "two-phase" || out.phase === "three-phase") {
    return { ...out, viscosity: null, thermalConductivity: null };
  }
  const fluid = ev.kind === "engine" ? ev.fluid : ev.binding;
  try {
    const t = transportAtTRho(fluid, out.T, out.rho, request.x);
    const warnings = [...(out.warnings ?? []), ...warningTexts(t.warnings)];
    return {
      ...out,
      viscosity: t.viscosityPaS,
      thermalConductivity: t.thermalConductivityWPerMK,
      transportMethod: t.method,
      ...(warnings.length > 0 ? { warnings: [...new Set(warnings)] } : {}),
    };
  } catch (e) {
    if (!(e instanceof IsochorError)) throw e;
    return {
      ...out,
      viscosity: null,
      thermalConductivity: null,
      warnings: [...(out.warnings ?? []), `transport properties: ${e.message}`],
    };
  }
}

/** The flash of an equilibrium state (a fluid's own methods pass its Wilson constants). */
function flashOf(
  ev: Evaluator,
  request: EvalRequest,
  st: Extract<EvalState, { kind: "TP" | "PH" | "PS" | "TS" | "URho" }>,
): Equilibrium {
  const x = request.x;
  if (ev.kind === "engine") {
    const f = ev.fluid;
    switch (st.kind) {
      case "TP":
        return f.flashTP(st.T, st.P, x);
      case "PH":
        return f.flashPH(st.P, st.h, x);
      case "PS":
        return f.flashPS(st.P, st.s, x);
      case "TS":
        return f.flashTS(st.T, st.s, x);
      case "URho":
        return f.flashUV(st.u, st.rho, x);
    }
  }
  const b = ev.binding;
  switch (st.kind) {
    case "TP":
      return flashTP(b, st.T, st.P, x);
    case "PH":
      return flashPH(b, st.P, st.h, x);
    case "PS":
      return flashPS(b, st.P, st.s, x);
    case "TS":
      return flashTS(b, st.T, st.s, x);
    case "URho":
      return flashUV(b, st.u, st.rho, x);
  }
}

/** The entry of an equilibrium: one phase keeps every single-phase field (see evalEquilibrium.ts). */
export function equilibriumResponse(eq: Equilibrium, binding: FluidBinding): EvalStateResponse {
  const fields = equilibriumFields(eq, gasConstantOf(binding.model));
  const warnings = warningTexts(eq.warnings);
  if (eq.phases.length === 1) {
    const single = toResponse(eq.phases[0].state);
    if ("error" in single) return single;
    const all = [...new Set([...(single.warnings ?? []), ...warnings])];
    const out: EvalEquilibriumFields & { warnings?: string[] } = { ...single, ...fields };
    if (all.length > 0) out.warnings = all;
    return out as EvalStateResponse;
  }
  return multiphaseResponse(fields, warnings, binding);
}

function multiphaseResponse(
  fields: EvalEquilibriumFields,
  warnings: string[],
  binding: FluidBinding,
): EvalStateResponse {
  const out: EvalEquilibriumResponse = {
    ...fields,
    cp: null,
    cv: null,
    w: null,
    jt: null,
    lnPhi: null,
    residual: null,
    residualTV: null,
    referenceState: describeReferenceState(binding.idealGas.referenceState),
  };
  if (warnings.length > 0) out.warnings = warnings;
  return out;
}

/** A mixture at given T or P and quality (bubble point at 0, dew point at 1). */
function mixtureQualityResponse(
  ev: Evaluator,
  request: EvalRequest,
  st: Extract<EvalState, { kind: "TQ" | "PQ" }>,
  binding: FluidBinding,
): EvalStateResponse {
  const options = { vaporFraction: st.quality };
  const point =
    ev.kind === "engine"
      ? st.kind === "TQ"
        ? ev.fluid.saturationPointAtTemperature(st.T, request.x, options)
        : ev.fluid.saturationPointAtPressure(st.P, request.x, options)
      : st.kind === "TQ"
        ? saturationPointAtTemperature(binding, st.T, request.x, options)
        : saturationPointAtPressure(binding, st.P, request.x, options);
  const fields = saturationPointFields(point, gasConstantOf(binding.model));
  const warnings = warningTexts(point.warnings);
  const present = fields.phases.filter((p) => p.amount > 0);
  if (present.length === 1) {
    const state = present[0].kind === "vapor" ? point.vapor : point.liquid;
    const single = toResponse(state);
    if ("error" in single) return single;
    const all = [...new Set([...(single.warnings ?? []), ...warnings])];
    const out: EvalEquilibriumFields & { warnings?: string[] } = { ...single, ...fields };
    if (all.length > 0) out.warnings = all;
    return out as EvalStateResponse;
  }
  return multiphaseResponse(fields, warnings, binding);
}

/** The response: one entry per state, and the envelope when asked for. */
export interface EvalResponse {
  /** With "output": the unit of each field of the entries (evalOutput.ts). */
  units?: Record<string, string>;
  /** `input`: the state as given, when a state carries a unit or "output" is given. */
  states: (EvalStateResponse & { input?: EvalInputEcho })[];
  envelope?: EvalEnvelope | { error: { code: string; message: string } };
}

/** Runs a parsed JSON request and returns the response object (exported for tests and notebooks). */
export function runEvalRequest(raw: unknown): EvalResponse {
  const request = parseEvalRequest(raw);
  const ev = evaluatorOf(request);
  const output = request.output;
  const response: EvalResponse = {
    ...(output !== undefined ? { units: unitsMap(output, request.transport) } : {}),
    states: request.states.map((st, i) => {
      const entry = withTransport(ev, request, evaluate(ev, request, st));
      const converted = output !== undefined ? convertEntry(entry, output) : entry;
      const input = request.inputs?.[i];
      return input !== undefined ? { ...converted, input } : converted;
    }),
  };
  if (request.envelope) {
    try {
      if (ev.kind !== "engine" || request.components.length < 2) {
        throw new IsochorError(
          "bad-input",
          "a phase envelope is a mixture's (two or more components); for a pure fluid ask for saturated states along T or P",
        );
      }
      const envelope = envelopeResponse(ev.fluid.envelope(request.x));
      response.envelope =
        output === undefined
          ? envelope
          : {
              ...envelope,
              points: envelope.points.map((p) => convertTP(p, output)),
              critical: envelope.critical.map((p) => convertTP(p, output)),
              cricondenbar: envelope.cricondenbar && convertTP(envelope.cricondenbar, output),
              cricondentherm: envelope.cricondentherm && convertTP(envelope.cricondentherm, output),
            };
    } catch (e) {
      response.envelope = {
        error: {
          code: e instanceof IsochorError ? e.code : "internal",
          message: e instanceof Error ? e.message : String(e),
        },
      };
    }
  }
  return response;
}

/** JSON has no NaN: non-finite numbers are written as null. */
export function replacer(_key: string, value: unknown): unknown {
  return typeof value === "number" && !Number.isFinite(value) ? null : value;
}

/** The `eval` sub-command. */
export async function evalCommand(argv: string[], io: CliIo): Promise<number> {
  const args = parseCliArgs(argv, {});
  if (args === "help") {
    io.stdout(USAGE);
    return 0;
  }
  if ("error" in args || args.positionals.length > 1) {
    const problem = "error" in args ? args.error : "expected at most one request file";
    io.stderr(`isochor eval: ${problem}\n${USAGE}`);
    return 2;
  }
  const request = await readJsonRequest("eval", args.positionals[0], io);
  if ("exit" in request) return request.exit;
  const raw = request.raw;
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
