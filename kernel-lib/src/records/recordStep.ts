/**
 * A process step adds itself to a calculation record: the inlets as inputs (as given, with their
 * source), the fluid's model, the step's method and assumptions, its caution, the path chart
 * (the heat curve of a heater, cooler or exchanger, with the bubble and dew points and the
 * pinch; the P-h path otherwise), the stream table (T, P, vapour fraction, flows), the power and
 * duty, and the step's warnings.
 */
import { stepHeatCurveChart } from "../charts/heatCurve.js";
import { processPathChart } from "../charts/processPath.js";
import { overallProperty } from "../phase/flash/stateFunctionFlash.js";
import type { ExchangerResult } from "../process/exchanger.js";
import type { HeaterResult } from "../process/heater.js";
import { massFlowKgPerS, streamVaporFraction, type Stream } from "../process/stream.js";
import type { StepResult } from "../process/types.js";
import type { CalculationRecord } from "./calculationRecord.js";
import type { ModelEntry } from "./modelEntry.js";
import type {
  RecordedChart,
  RecordedInput,
  RecordedMethod,
  RecordedTable,
} from "./recordContent.js";
import { optionalText } from "./recordText.js";

/** Options of {@link CalculationRecord.step}. */
export interface RecordStepOptions {
  /** Name of the step in the record, e.g. "E-101 overhead cooler". Default: the step's kind. */
  label?: string;
  /** Source of the inlet conditions (plain text), e.g. "heat and material balance, case 2". */
  source?: string;
  /** A model entry already recorded for the fluid. Default: the fluid is recorded now. */
  model?: ModelEntry;
  /** Inputs already recorded that the step also used (outlet pressure, duty, ...). */
  inputs?: readonly RecordedInput[];
  /** Draw the path chart. Default true. */
  chart?: boolean;
}

/** What a step added to the record. */
export interface RecordedStep {
  readonly inputs: readonly RecordedInput[];
  readonly model: ModelEntry;
  readonly method: RecordedMethod;
  readonly tables: readonly RecordedTable[];
  readonly chart?: RecordedChart;
}

function streamRow(role: string, s: Stream): Record<string, unknown> {
  return {
    role,
    name: s.name ?? "",
    temperatureK: s.state.temperatureK,
    pressurePa: s.state.pressurePa,
    phases: s.state.phases.map((p) => p.kind).join("+"),
    vaporFraction: streamVaporFraction(s),
    enthalpyJPerMol: overallProperty(s.state, "h"),
    molarFlowKmolPerH: s.molarFlowMolPerS * 3.6,
    massFlowKgPerH: massFlowKgPerS(s) * 3600,
    warnings: s.state.warnings,
  };
}

/** The chart of a step: its heat curve(s), or its path on P-h axes. */
function stepChart(result: StepResult, label: string): Record<string, unknown> {
  if (result.kind === "exchanger")
    return stepHeatCurveChart(result as ExchangerResult, { title: `Heat curves: ${label}` });
  if (result.kind === "heater" || result.kind === "cooler")
    return stepHeatCurveChart(result as HeaterResult, { title: `Heat curve: ${label}` });
  return processPathChart(
    result.path.map((eq, i) => ({
      label: i === 0 ? "inlet" : i === result.path.length - 1 ? "outlet" : undefined,
      temperatureK: eq.temperatureK,
      pressurePa: eq.pressurePa,
      enthalpyJPerMol: overallProperty(eq, "h"),
      entropyJPerMolK: overallProperty(eq, "s"),
    })),
    { title: `Process path: ${label}` },
  );
}

/** Adds a step to a record (the body of {@link CalculationRecord.step}). */
export async function recordStep(
  rec: CalculationRecord,
  result: StepResult,
  options: RecordStepOptions = {},
): Promise<RecordedStep> {
  const label = optionalText(options.label, "options.label") ?? result.kind;
  const source = optionalText(options.source, "options.source");
  const inputs: RecordedInput[] = [];
  result.inlets.forEach((s, i) => {
    const who = result.inlets.length > 1 ? `${label}, inlet ${s.name ?? i + 1}` : `${label} inlet`;
    const opts = source !== undefined ? { source } : {};
    inputs.push(rec.input(`${who} temperature`, s.state.temperatureK, "K", opts));
    inputs.push(rec.input(`${who} pressure`, s.state.pressurePa, "Pa", opts));
    const flowNote =
      s.givenFlow !== undefined ? { note: `as given: ${s.givenFlow.description}` } : {};
    // flow units are not in units/ (they need a molar mass or reference conditions): the
    // value in mol/s, and the flow as given in the note
    inputs.push(
      rec.input(`${who} molar flow, mol/s`, s.molarFlowMolPerS, "-", { ...opts, ...flowNote }),
    );
    if (s.z.length > 1) inputs.push(rec.input(`${who} composition`, s.z, "-", opts));
  });
  const model = options.model ?? rec.model(result.inlets[0].fluid);
  const basis = { model, inputs: [...inputs, ...(options.inputs ?? [])] };
  const method = rec.method(label, result.method);
  rec.caution(result.caution);
  let chart: RecordedChart | undefined;
  if (options.chart ?? true) {
    chart = await rec.chart(stepChart(result, label), {
      caption: `${label}: ${result.kind === "heater" || result.kind === "cooler" || result.kind === "exchanger" ? "temperature against heat transferred, bubble and dew points marked" : "path on P-h axes"}`,
      ...basis,
    });
  }
  const rows = [
    ...result.inlets.map((s) => streamRow("inlet", s)),
    ...result.outlets.map((s) => streamRow("outlet", s)),
  ];
  const streams = rec.results(
    rows,
    [
      { key: "role", label: "Stream", text: true },
      { key: "name", label: "Name", text: true },
      { key: "temperatureK", label: "T", unit: "degC", digits: 5 },
      { key: "pressurePa", label: "P", unit: "bar", digits: 5 },
      { key: "phases", label: "Phases", text: true },
      { key: "vaporFraction", label: "Vapour fraction", unit: "-", digits: 4 },
      { key: "enthalpyJPerMol", label: "h", unit: "kJ/mol", digits: 6 },
      { key: "molarFlowKmolPerH", label: "Molar flow, kmol/h", digits: 5 },
      { key: "massFlowKgPerH", label: "Mass flow, kg/h", digits: 5 },
    ],
    { caption: `${label}: streams`, ...basis },
  );
  const summary = rec.results(
    [
      {
        quantity: "power (into the fluid), kW",
        value: (result.powerW ?? 0) / 1e3,
      },
      {
        quantity: `duty (${result.kind === "exchanger" ? "hot to cold" : "into the fluid"}), kW`,
        value: (result.dutyW ?? 0) / 1e3,
      },
      {
        quantity: "energy balance, relative error",
        value: result.check.energyBalanceRelativeError,
      },
      {
        quantity: "material balance, relative error",
        value: result.check.massBalanceRelativeError,
      },
    ],
    [
      { key: "quantity", label: "Quantity", text: true },
      { key: "value", label: "Value", digits: 6 },
    ],
    { caption: `${label}: power, duty and balances`, ...basis },
  );
  rec.collectWarnings(result.warnings, { from: label });
  return { inputs, model, method, tables: [streams, summary], chart };
}
