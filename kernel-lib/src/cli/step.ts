/**
 * `isochor step request.json`: one process step on a real fluid in batch, for datasheets. The
 * request (schema/step-request.schema.json, checked by stepRequest.ts) gives the fluid fields of
 * `isochor eval`, the inlet stream with its flow, and the step; the response gives the outlet in
 * the shape of an eval state (with "phases"), every outlet, power and duty (W, positive into the
 * fluid), the specific work (J/mol), the path of states, the warnings with their basis, the
 * caution and the method.
 *
 * Exit codes: 0 done; 1 the step could not be computed (an error object on standard output says
 * why: a solver failure, no phase where one is needed); 2 a bad request (an error with the JSON
 * path of the problem, as in `isochor eval`).
 */
import { vesselSeriesCsv, vesselStepFromRequest } from "./stepVessel.js";
import {
  InputError,
  IsochorError,
  RequestError,
  UnknownNameError,
  type ResultWarning,
} from "../errors.js";
import { defineFluid, type Fluid } from "../fluid/defineFluid.js";
import { referenceFluid } from "../fluid/referenceFluids.js";
import { referenceFluidBinding } from "../state/referenceStates.js";
import { defineStream, massFlowKgPerS, type Stream } from "../process/stream.js";
import type { StepResult } from "../process/types.js";
import { cooler, heater, type HeaterResult } from "../process/heater.js";
import { exchanger, type ExchangerResult } from "../process/exchanger.js";
import { mixer } from "../process/mixer.js";
import { separator } from "../process/separator.js";
import { valve } from "../process/valve.js";
import { compressorStage } from "../process/compressor.js";
import { compressorTrain } from "../process/compressorTrain.js";
import { turbine } from "../process/turbine.js";
import { pump } from "../process/pump.js";
import type { Equilibrium } from "../phase/flash/types.js";
import { equilibriumResponse, fluidOf, replacer, type EvalStateResponse } from "./eval.js";
import {
  parseStepRequest,
  type StepRequest,
  type StepSpecRequest,
  type StepStreamRequest,
} from "./stepRequest.js";
import { parseCliArgs } from "./cliArgs.js";
import type { CliIo } from "./io.js";
import { readJsonRequest } from "./requestFile.js";

const USAGE = `usage: isochor step [request.json | -]

Computes one process step (valve, compressor or train, turbine, pump, heater, cooler, exchanger,
mixer, separator) on a real fluid and writes the result as JSON on standard output. The request
(file, or standard input when absent or "-"): the fluid fields of isochor eval ("model",
"components", "x", "kij", "constants", "departure", "reference", "idealGas"), "inlet": {"T", "P",
"flow": {"value", "unit", "reference"?}, "x"?, "name"?}, "inlets" (mixer: the further streams),
and "step": {"kind", ...}. Step fields: heater, cooler: "T" or "duty", "P"?; separator: "T"?
(absent: adiabatic), "P"?; mixer: "P"? (default the lowest inlet's); exchanger (inlet = hot
stream): "cold", "duty" or "minimumApproach", "P"?, "coldP"?, "onTemperatureCross"?; valve: "P";
compressor: "P", "isentropicEfficiency" or "polytropicEfficiency", "stages"? (a train);
turbine and pump: "P", "isentropicEfficiency"; any: "minimumDesignMetalTemperature". The format,
with units and defaults, is the JSON Schema dist/cli/schema/step-request.schema.json.

Response: "outlet" (a state as in isochor eval, with "phases", plus "name", "molarFlow",
"massFlow"), "outlets" (every outlet: separators' phases, trains' knock-out liquids), "power",
"duty", "specificWork", "path" (states), "warnings" ({code, condition, message, basis}),
"caution", "method", "check" (balances); heaters and coolers add "heatCurve", exchangers
"curves" and "minimumApproach".

Vessel depressurisation or filling: "step": {"kind": "vessel", "volume" (m3), "wall"?,
"outlet": {"diameter" (m), "dischargeCoefficient", "backPressure" (Pa)}, "heat": "adiabatic" |
{...}, "until": {"P": Pa} | {"time": s}} with "inlet" the initial contents (T, P; no flow).
Response: "series": {"time" [s], "P" [Pa], "T" [K], "Twall" [K], "mass" [kg], "massFlow" [kg/s],
"liquidFraction" [-]}, "minimum": {"T", "time", "Twall"}, "wallModelled", "warnings", "cautions"
(adiabatic: the wall is not modelled, "Twall" is null and the CSV's Twall_K column empty); with
--csv the series as CSV on standard output and the cautions on standard error. The result is a model:
minimum design metal temperature, relief and flare design and depressuring specifications are
decided under the site's codes, the applicable standards and by licensed engineers.

units: SI, molar. In: T in K, P in Pa (absolute), duty in W, minimumApproach in K, efficiencies
  as fractions (0..1]; flow in the unit given ("mol/s", "kmol/h", "kg/s", "kg/h", "t/h", "Sm3/h"
  with "reference", "MMSCFD" with "reference", ...).
  Out: power, duty in W (positive into the fluid); specificWork in J/mol; molarFlow in mol/s;
  massFlow in kg/s; h in J/mol, s in J/(mol K).

exit: 0 done; 1 the step could not be computed; 2 a bad request (error with its JSON path).

example (cool 36 kmol/h of methane/propane from 350 K to 280 K at 20 bar = 2e6 Pa):
  echo '{"model": "peng-robinson", "components": ["methane", "propane"], "x": [0.8, 0.2],
    "inlet": {"T": 350, "P": 2e6, "flow": {"value": 36, "unit": "kmol/h"}},
    "step": {"kind": "cooler", "T": 280}}' | npx isochor step
`;

/** An outlet or inlet of the response: an eval state plus the stream's name and flows. */
export type StepStreamResponse = EvalStateResponse & {
  name?: string;
  /** mol/s */
  molarFlow: number;
  /** kg/s */
  massFlow: number;
};

/** A warning of the response. */
export interface StepWarningResponse {
  code: string;
  condition?: string;
  message: string;
  basis?: string;
}

/** The response of `isochor step`. */
export interface StepResponse {
  kind: string;
  outlet: StepStreamResponse;
  outlets: StepStreamResponse[];
  /** W, positive into the fluid (0 for steps without shaft work). */
  power: number;
  /** W, positive into the fluid; an exchanger's duty is the heat from the hot to the cold stream. */
  duty: number;
  /** J/mol of the inlet, positive into the fluid. */
  specificWork: number;
  path: EvalStateResponse[];
  warnings: StepWarningResponse[];
  caution: string;
  method: string;
  check: {
    energyBalanceRelativeError: number;
    massBalanceRelativeError: number;
    tolerance: number;
  };
  /** Heater, cooler: T against duty with the exact bubble and dew points. */
  heatCurve?: { duty: number; T: number; P: number; vaporFraction: number; marker?: string }[];
  /** Exchanger: both curves by heat from the cold end (W), and the minimum approach. */
  curves?: {
    hot: { heat: number; T: number; marker?: string }[];
    cold: { heat: number; T: number; marker?: string }[];
  };
  minimumApproach?: {
    dT: number;
    heatFromColdEnd: number;
    hotT: number;
    coldT: number;
    location: string;
  };
  hotEndDifference?: number;
  coldEndDifference?: number;
}

/** The fluid of a request: an engine model, or a reference equation with its own ideal part. */
function stepFluid(request: StepRequest): Fluid {
  if (request.model === "reference") {
    const rf = referenceFluid(request.components[0]);
    return defineFluid({
      components: request.components,
      model: rf,
      idealGas: referenceFluidBinding(rf).idealGas,
    });
  }
  return fluidOf(request, request.model);
}

/** A stream of the request; problems of its flow are reported at their JSON path. */
function streamOf(fluid: Fluid, s: StepStreamRequest): Stream {
  try {
    return defineStream({ fluid, z: s.x, T: s.T, P: s.P, flow: s.flow, name: s.name });
  } catch (e) {
    if (e instanceof UnknownNameError) throw new RequestError(`${s.path}.flow.unit`, e.message);
    if (e instanceof InputError) {
      const field = /reference/.test(e.input)
        ? `${s.path}.flow.reference`
        : /flow|unit/.test(e.input)
          ? `${s.path}.flow`
          : s.path;
      throw new RequestError(field, e.message);
    }
    throw e;
  }
}

/** Library input names of the step specs -> request paths. */
const SPEC_PATHS: Readonly<Record<string, string>> = {
  "spec.outletTemperatureK": "$.step.T",
  "spec.temperatureK": "$.step.T",
  "spec.dutyW": "$.step.duty",
  "spec.outletPressurePa": "$.step.P",
  "spec.pressurePa": "$.step.P",
  "spec.hotOutletPressurePa": "$.step.P",
  "spec.coldOutletPressurePa": "$.step.coldP",
  "spec.minimumApproachK": "$.step.minimumApproach",
  "spec.minimumDesignMetalTemperatureK": "$.step.minimumDesignMetalTemperature",
  "spec.isentropicEfficiency": "$.step.isentropicEfficiency",
  "spec.polytropicEfficiency": "$.step.polytropicEfficiency",
  hot: "$.inlet",
  cold: "$.step.cold",
  inlet: "$.inlet",
  // the valve and compressor name their spec fields without a prefix
  outletPressurePa: "$.step.P",
  isentropicEfficiency: "$.step.isentropicEfficiency",
  polytropicEfficiency: "$.step.polytropicEfficiency",
  dischargeTemperatureLimitK: "$.step.dischargeTemperatureLimit",
  minimumDesignMetalTemperatureK: "$.step.minimumDesignMetalTemperature",
  efficiency: "$.step.isentropicEfficiency",
  stages: "$.step.stages",
  interstagePressuresPa: "$.step.stages",
  intercoolerTemperatureK: "$.step.intercoolerT",
};

function pathOfInput(input: string): string {
  if (SPEC_PATHS[input] !== undefined) return SPEC_PATHS[input];
  const head = input.split(/[.[]/)[0];
  if (head === "inlets") return "$.inlets";
  if (head === "spec") return "$.step";
  return SPEC_PATHS[head] ?? "$";
}

const mdmt = (s: StepSpecRequest) => s.minimumDesignMetalTemperature;
const curveOptions = (s: StepSpecRequest) =>
  s.points === undefined ? undefined : { intervals: s.points };

/** Runs the step of a checked request. */
function runStep(fluid: Fluid, request: StepRequest, inlet: Stream): StepResult {
  const s = request.step;
  switch (s.kind) {
    case "heater":
    case "cooler":
      return (s.kind === "heater" ? heater : cooler)(inlet, {
        outletTemperatureK: s.T,
        dutyW: s.duty,
        outletPressurePa: s.P,
        minimumDesignMetalTemperatureK: mdmt(s),
        heatCurve: curveOptions(s),
      });
    case "separator":
      return separator(inlet, {
        temperatureK: s.T,
        pressurePa: s.P,
        minimumDesignMetalTemperatureK: mdmt(s),
      });
    case "mixer":
      return mixer([inlet, ...request.inlets.map((r) => streamOf(fluid, r))], {
        outletPressurePa: s.P,
        minimumDesignMetalTemperatureK: mdmt(s),
      });
    case "exchanger":
      return exchanger(inlet, streamOf(fluid, s.cold as StepStreamRequest), {
        dutyW: s.duty,
        minimumApproachK: s.minimumApproach,
        hotOutletPressurePa: s.P,
        coldOutletPressurePa: s.coldP,
        onTemperatureCross: s.onTemperatureCross,
        minimumDesignMetalTemperatureK: mdmt(s),
        heatCurve: curveOptions(s),
      });
    case "valve":
      return valve(inlet, {
        outletPressurePa: s.P as number,
        minimumDesignMetalTemperatureK: mdmt(s),
      });
    case "compressor":
      if (s.P === undefined) throw new RequestError("$.step.P", "is required for a compressor");
      if (s.stages !== undefined || s.intercoolerT !== undefined) {
        if (s.intercoolerT === undefined)
          throw new RequestError("$.step.intercoolerT", 'is required for a train ("stages")');
        return compressorTrain(inlet, {
          outletPressurePa: s.P,
          ...(typeof s.stages === "number"
            ? { stages: s.stages }
            : s.stages !== undefined
              ? { interstagePressuresPa: s.stages }
              : {}),
          isentropicEfficiency: s.isentropicEfficiency,
          polytropicEfficiency: s.polytropicEfficiency,
          intercoolerTemperatureK: s.intercoolerT,
          dischargeTemperatureLimitK: s.dischargeTemperatureLimit,
          minimumDesignMetalTemperatureK: mdmt(s),
        });
      }
      return compressorStage(inlet, {
        outletPressurePa: s.P,
        isentropicEfficiency: s.isentropicEfficiency,
        polytropicEfficiency: s.polytropicEfficiency,
        dischargeTemperatureLimitK: s.dischargeTemperatureLimit,
        minimumDesignMetalTemperatureK: mdmt(s),
      });
    case "turbine":
      return turbine(inlet, {
        outletPressurePa: s.P as number,
        isentropicEfficiency: s.isentropicEfficiency,
        polytropicEfficiency: s.polytropicEfficiency,
        minimumDesignMetalTemperatureK: mdmt(s),
      });
    case "pump":
      return pump(inlet, {
        outletPressurePa: s.P as number,
        efficiency: s.isentropicEfficiency as number,
        minimumDesignMetalTemperatureK: mdmt(s),
      });
    default:
      break;
  }
  throw new RequestError(
    "$.step.kind",
    `the step kind "${s.kind}" is not available; available: valve, compressor, turbine, pump, heater, cooler, exchanger, mixer, separator, vessel`,
  );
}

function stateOf(eq: Equilibrium, fluid: Fluid): EvalStateResponse {
  return equilibriumResponse(eq, fluid);
}

function streamResponse(s: Stream): StepStreamResponse {
  const state = stateOf(s.state, s.fluid);
  const out = { ...state, molarFlow: s.molarFlowMolPerS, massFlow: massFlowKgPerS(s) };
  return (s.name === undefined ? out : { name: s.name, ...out }) as StepStreamResponse;
}

function warningResponse(w: ResultWarning): StepWarningResponse {
  const extra = w as ResultWarning & { condition?: string; basis?: string };
  const out: StepWarningResponse = { code: w.code, message: w.message };
  if (extra.condition !== undefined) out.condition = extra.condition;
  if (extra.basis !== undefined) out.basis = extra.basis;
  return out;
}

/** The response of a step result. */
export function stepResponse(result: StepResult): StepResponse {
  const fluid = result.inlets[0].fluid;
  const response: StepResponse = {
    kind: result.kind,
    outlet: streamResponse(result.outlet),
    outlets: result.outlets.map(streamResponse),
    power: result.powerW ?? 0,
    duty: result.dutyW ?? 0,
    specificWork: result.specificWorkJPerMol ?? 0,
    path: result.path.map((eq) => stateOf(eq, fluid)),
    warnings: result.warnings.map(warningResponse),
    caution: result.caution,
    method: result.method,
    check: { ...result.check },
  };
  if (result.kind === "heater" || result.kind === "cooler") {
    const h = result as HeaterResult;
    response.heatCurve = h.heatCurve.points.map((p) => ({
      duty: p.dutyW,
      T: p.temperatureK,
      P: p.pressurePa,
      vaporFraction: p.vaporFraction,
      ...(p.marker ? { marker: p.marker } : {}),
    }));
  }
  if (result.kind === "exchanger") {
    const x = result as ExchangerResult;
    const pts = (c: ExchangerResult["curves"]["hot"]) =>
      c.map((p) => ({
        heat: p.heatFromColdEndW,
        T: p.temperatureK,
        ...(p.marker ? { marker: p.marker } : {}),
      }));
    response.curves = { hot: pts(x.curves.hot), cold: pts(x.curves.cold) };
    const m = x.minimumApproach;
    response.minimumApproach = {
      dT: m.temperatureDifferenceK,
      heatFromColdEnd: m.heatFromColdEndW,
      hotT: m.hotTemperatureK,
      coldT: m.coldTemperatureK,
      location: m.location,
    };
    response.hotEndDifference = x.hotEndDifferenceK;
    response.coldEndDifference = x.coldEndDifferenceK;
  }
  return response;
}

/**
 * Runs a parsed JSON request and returns the response (exported for tests and notebooks).
 * @throws RequestError for a bad request (with its JSON path); other IsochorErrors when the step
 *   cannot be computed.
 */
export function runStepRequest(raw: unknown): StepResponse {
  const request = parseStepRequest(raw);
  const fluid = stepFluid(request);
  const inlet = streamOf(fluid, request.inlet);
  let result: StepResult;
  try {
    result = runStep(fluid, request, inlet);
  } catch (e) {
    if (e instanceof InputError && !(e instanceof RequestError)) {
      throw new RequestError(pathOfInput(e.input), e.message);
    }
    throw e;
  }
  return stepResponse(result);
}

/** The `step` sub-command. */
export async function stepCommand(argv: string[], io: CliIo): Promise<number> {
  // --csv (vessel runs: the time series as CSV) is a flag; the shared parser reads value options
  const csv = argv.includes("--csv");
  const args = parseCliArgs(
    argv.filter((a) => a !== "--csv"),
    {},
  );
  if (args === "help") {
    io.stdout(USAGE);
    return 0;
  }
  if ("error" in args || args.positionals.length > 1) {
    const problem = "error" in args ? args.error : "expected at most one request file";
    io.stderr(`isochor step: ${problem}\n${USAGE}`);
    return 2;
  }
  const request = await readJsonRequest("step", args.positionals[0], io);
  if ("exit" in request) return request.exit;
  const raw = request.raw;
  const fail = (err: IsochorError, exit: number, where?: string): number => {
    const error: Record<string, string> = { code: err.code, message: err.message };
    if (where !== undefined) error.path = where;
    io.stdout(JSON.stringify({ error }) + "\n");
    io.stderr(`isochor step: ${err.message}\n`);
    return exit;
  };
  try {
    const step = (raw as { step?: { kind?: unknown } } | null)?.step;
    if (step !== null && typeof step === "object" && step.kind === "vessel") {
      // vessel depressurisation or filling (process/vessel/, cli/stepVessel.ts)
      const response = vesselStepFromRequest(raw);
      if (csv) {
        io.stdout(vesselSeriesCsv(response));
        for (const c of response.cautions) io.stderr(`isochor step: caution: ${c}\n`);
      } else {
        io.stdout(JSON.stringify(response, replacer) + "\n");
      }
      return 0;
    }
    const response = runStepRequest(raw);
    io.stdout(JSON.stringify(response, replacer) + "\n");
    return 0;
  } catch (e) {
    if (e instanceof RequestError) return fail(e, 2, e.path);
    if (e instanceof IsochorError) return fail(e, 1);
    throw e;
  }
}
