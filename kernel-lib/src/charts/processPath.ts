/**
 * A process path (a list of states: a compressor, a valve, a cooler, ...) drawn as numbered points
 * joined in order, on a P-h or T-s diagram: over a diagram built by this library (units, basis and
 * scales are read from its metadata) or on its own axes.
 */
import { InputError } from "../errors.js";
import { requireChoice, requireFinite, requirePositive } from "../validate.js";
import { chartMeta, type ChartSpec } from "./chartSpec.js";
import { resolveUnit, toDisplay, type UnitChoice } from "./displayUnits.js";
import { energyBasis } from "./energyBasis.js";
import { planAxis, positionEncoding, type AxisPlan } from "./axisPlan.js";
import { checkNonEmptyArray, type BaseChartOptions } from "./chartOptions.js";
import { topLevel } from "./topLevel.js";
import { WarningList } from "./warningList.js";
import { placeGuideLabels } from "./labelPlacement.js";
import { applyLogTicks } from "./logTicks.js";
import { applyLinearTicks } from "./linearTicks.js";
import { INK } from "./theme.js";
import { pathTag } from "./pathTag.js";
import { pointLabelLayers } from "./pointLabels.js";

/** One state of a process path, SI per mole. */
export interface ProcessPathState {
  /** Name of the state (plain text), e.g. "compressor discharge". Default: its number. */
  label?: string;
  /** Temperature, K (needed on T-s). */
  temperatureK?: number;
  /** Pressure, Pa (needed on P-h). */
  pressurePa?: number;
  /** Molar enthalpy, J/mol (needed on P-h). */
  enthalpyJPerMol?: number;
  /** Molar entropy, J/(mol K) (needed on T-s). */
  entropyJPerMolK?: number;
}

/** Which diagram a path is drawn on. */
export type PathDiagram = "pressure-enthalpy" | "temperature-entropy";

/** Options of {@link processPathChart}. */
export interface ProcessPathOptions extends BaseChartOptions {
  /** Diagram. Default "pressure-enthalpy". */
  diagram?: PathDiagram;
  /** Molar mass, kg/mol, for a per-kg basis. Default: per mole. */
  molarMassKgPerMol?: number;
  /** Logarithmic pressure axis on P-h. Default true. */
  logP?: boolean;
}

/** A process path on its own axes (no dome). */
export function processPathChart(
  states: readonly ProcessPathState[],
  options: ProcessPathOptions = {},
): ChartSpec {
  const diagram = checkDiagram(options.diagram ?? "pressure-enthalpy");
  const basis = energyBasis(options.molarMassKgPerMol);
  const { xAxis, yAxis } = pathAxes(
    diagram,
    options.units,
    basis.adjective,
    basis.energyKind,
    basis.entropyKind,
    options.logP ?? true,
  );
  const warnings = new WarningList();
  const layers = pathLayers(states, diagram, xAxis, yAxis, basis.perBasis);
  const spec = topLevel(
    diagram === "pressure-enthalpy" ? "pressure-enthalpy" : "temperature-entropy",
    "Process path",
    options,
    [xAxis, yAxis],
    warnings,
    { layer: layers },
    basis.mass ? { molarMassKgPerMol: basis.molarMassKgPerMol } : {},
  );
  placeGuideLabels(spec);
  return spec;
}

/**
 * Returns a copy of a P-h or T-s diagram built by this library with a process path drawn over it,
 * in the diagram's own units and basis. The input spec is not changed.
 * @example withProcessPath(pressureEnthalpyChart(data), [inlet, discharge, afterCooler])
 */
export function withProcessPath(spec: ChartSpec, states: readonly ProcessPathState[]): ChartSpec {
  const meta = chartMeta(spec);
  if (
    !meta ||
    (meta.chart !== "pressure-enthalpy" && meta.chart !== "temperature-entropy") ||
    !Array.isArray(spec.layer)
  ) {
    throw new InputError({
      input: "spec",
      unit: "-",
      validRange: "a P-h or T-s diagram built by pressureEnthalpyChart or temperatureEntropyChart",
      received: meta?.chart ?? "another spec",
    });
  }
  const diagram = meta.chart as PathDiagram;
  const basis = energyBasis(meta.molarMassKgPerMol);
  const units: UnitChoice = { system: "SI", ...meta.units };
  const logP = spec.layer.some((l) => {
    const enc = l.encoding as { y?: { scale?: { type?: string } } } | undefined;
    return enc?.y?.scale?.type === "log";
  });
  const { xAxis, yAxis } = pathAxes(
    diagram,
    units,
    basis.adjective,
    basis.energyKind,
    basis.entropyKind,
    logP,
  );
  // Keep any fixed domain of the diagram so the shared scale is unchanged.
  const copy = JSON.parse(JSON.stringify(spec)) as ChartSpec;
  // A group id of its own, so the labels of a second path are placed as a family of their own.
  const group = `path-${(copy.layer as ChartSpec[]).length}`;
  const layers = pathLayers(states, diagram, xAxis, yAxis, basis.perBasis, group);
  copy.layer = [...(copy.layer as ChartSpec[]), ...(layers as ChartSpec[])];
  // The path may reach beyond the diagram's data: recompute the log-axis ticks over all layers.
  applyLogTicks(copy as Record<string, unknown>, { refresh: true });
  applyLinearTicks(copy as Record<string, unknown>, copy, { refresh: true });
  // Guide labels (isentropes) move away from the path's states and their labels.
  placeGuideLabels(copy);
  return copy;
}

function checkDiagram(d: string): PathDiagram {
  return requireChoice("diagram", d, ["pressure-enthalpy", "temperature-entropy"]);
}

function pathAxes(
  diagram: PathDiagram,
  units: UnitChoice | undefined,
  adjective: string,
  energyKind: ReturnType<typeof energyBasis>["energyKind"],
  entropyKind: ReturnType<typeof energyBasis>["entropyKind"],
  logP: boolean,
): { xAxis: AxisPlan; yAxis: AxisPlan } {
  // Validate the unit choice early (resolveUnit throws on unknown names).
  resolveUnit("pressure", units);
  return diagram === "pressure-enthalpy"
    ? {
        xAxis: planAxis(energyKind, `${adjective} enthalpy h`, units),
        yAxis: planAxis("pressure", "Pressure P", units, logP),
      }
    : {
        xAxis: planAxis(entropyKind, `${adjective} entropy s`, units),
        yAxis: planAxis("temperature", "Temperature T", units),
      };
}

function pathLayers(
  states: readonly ProcessPathState[],
  diagram: PathDiagram,
  xAxis: AxisPlan,
  yAxis: AxisPlan,
  perBasis: (v: number) => number,
  group = "path",
): Record<string, unknown>[] {
  const list = checkNonEmptyArray("states", states, "at least one state");
  const rows = list.map((s, i) => {
    let x: number;
    let y: number;
    if (diagram === "pressure-enthalpy") {
      x = perBasis(
        requireFinite(`states[${i}].enthalpyJPerMol`, s.enthalpyJPerMol as number, "J/mol"),
      );
      y = requirePositive(`states[${i}].pressurePa`, s.pressurePa as number, "Pa");
    } else {
      x = perBasis(
        requireFinite(`states[${i}].entropyJPerMolK`, s.entropyJPerMolK as number, "J/(mol K)"),
      );
      y = requirePositive(`states[${i}].temperatureK`, s.temperatureK as number, "K");
    }
    return {
      x: toDisplay(x, xAxis.unit),
      y: toDisplay(y, yAxis.unit),
      order: i,
      step: String(i + 1),
      label: s.label === undefined ? `state ${i + 1}` : String(s.label),
      tag: pathTag(s.label === undefined ? undefined : String(s.label), i, list.length),
      labelRole: "fixed",
    };
  });
  const enc = { x: positionEncoding("x", xAxis), y: positionEncoding("y", yAxis) };
  return [
    {
      data: { values: rows },
      mark: { type: "line", color: INK.path, strokeWidth: 2.2, clip: true },
      encoding: { ...enc, order: { field: "order", type: "quantitative" } },
    },
    {
      data: { values: rows },
      mark: { type: "point", filled: true, color: INK.path, size: 70, clip: true },
      encoding: {
        ...enc,
        tooltip: [
          { field: "step", type: "nominal", title: "Step" },
          { field: "label", type: "nominal", title: "State" },
          { field: "x", type: "quantitative", title: xAxis.title, format: ".5~g" },
          { field: "y", type: "quantitative", title: yAxis.title, format: ".5~g" },
        ],
      },
    },
    // The state's tag moves around its point to stay inside the plot and off the lines.
    ...pointLabelLayers(
      rows,
      enc,
      "tag",
      { color: INK.path, fontSize: 10.5, fontWeight: 600, clip: true },
      group,
    ),
  ];
}
