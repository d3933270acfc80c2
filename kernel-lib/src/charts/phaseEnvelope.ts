/**
 * The phase envelope of a mixture on a P-T diagram: bubble and dew lines (joined at the critical
 * point), lines of constant vapour fraction, the critical point, cricondenbar and cricondentherm,
 * and an optional process path (numbered states with labels) drawn over it. Input: the result of
 * `phaseEnvelope` / `fluid.envelope` (SI: K, Pa), or the same shape from a batch response.
 * An incomplete envelope is drawn as far as it goes, and its stop reason becomes a chart warning.
 */
import type {
  EnvelopeLandmark,
  EnvelopePoint,
  QualityLine,
} from "../phase/envelope/phaseEnvelope.js";
import { requirePositive } from "../validate.js";
import type { ChartSpec } from "./chartSpec.js";
import { toDisplay } from "./displayUnits.js";
import { planAxis, plotValue, positionEncoding, type AxisPlan } from "./axisPlan.js";
import { checkArray, type BaseChartOptions } from "./chartOptions.js";
import type { LineRow } from "./curveRows.js";
import { seriesLineLayer } from "./seriesLayers.js";
import { shortNumber } from "./shortNumber.js";
import { topLevel } from "./topLevel.js";
import { WarningList } from "./warningList.js";
import { INK } from "./theme.js";
import { pathTag } from "./pathTag.js";

/** What the chart draws: the fields of a phase envelope result (SI). */
export interface PhaseEnvelopeChartData {
  readonly points: readonly Pick<EnvelopePoint, "T" | "P" | "kind" | "segment">[];
  readonly critical?: readonly EnvelopeLandmark[];
  readonly cricondenbar?: EnvelopeLandmark;
  readonly cricondentherm?: EnvelopeLandmark;
  readonly qualityLines?: readonly QualityLine[];
  readonly complete?: boolean;
  readonly stoppedBecause?: string;
}

/** One state of a process path on the P-T diagram (SI). */
export interface EnvelopePathState {
  /** K */
  readonly T: number;
  /** Pa */
  readonly P: number;
  /** Name of the state (plain text). Default: its number. */
  readonly label?: string;
}

/** Options of {@link phaseEnvelopeChart}. */
export interface PhaseEnvelopeChartOptions extends BaseChartOptions {
  /** Logarithmic pressure axis. Default false. */
  logP?: boolean;
  /** A process path drawn over the envelope, in order (e.g. separator, valve outlet, cooler). */
  path?: readonly EnvelopePathState[];
}

function lineRows(
  data: PhaseEnvelopeChartData,
  xAxis: AxisPlan,
  yAxis: AxisPlan,
): { rows: LineRow[]; labels: string[] } {
  const rows: LineRow[] = [];
  const labels: string[] = [];
  const use = (label: string): void => {
    if (!labels.includes(label)) labels.push(label);
  };
  const push = (T: number, P: number, series: string, path: string): void => {
    rows.push({
      x: plotValue(T, xAxis.unit),
      y: plotValue(P, yAxis.unit),
      series,
      path,
      order: rows.length,
    });
  };
  const label = (kind: "bubble" | "dew"): string =>
    kind === "bubble" ? "bubble line" : "dew line";
  // runs of one kind within one segment; the critical point closes one run and opens the next
  let run = 0;
  const pts = data.points;
  const critical = data.critical ?? [];
  pts.forEach((p, k) => {
    requirePositive(`points[${k}].T`, p.T, "K");
    requirePositive(`points[${k}].P`, p.P, "Pa");
    const prev = k > 0 ? pts[k - 1] : undefined;
    if (prev !== undefined && (prev.segment !== p.segment || prev.kind !== p.kind)) {
      const joined = prev.segment === p.segment ? nearest(critical, prev, p) : undefined;
      if (joined) push(joined.T, joined.P, label(prev.kind), `${run}`);
      run++;
      if (joined) push(joined.T, joined.P, label(p.kind), `${run}`);
    }
    use(label(p.kind));
    push(p.T, p.P, label(p.kind), `${run}`);
  });
  (data.qualityLines ?? []).forEach((q, i) => {
    requirePositive(`qualityLines[${i}].vaporFraction`, q.vaporFraction, "mol/mol");
    const name = `vapour fraction ${shortNumber(q.vaporFraction)}`;
    use(name);
    run++;
    q.points.forEach((p) => push(p.T, p.P, name, `q${run}`));
  });
  return { rows, labels };
}

/** The critical point between two points of different kind, if one lies between them. */
function nearest(
  critical: readonly EnvelopeLandmark[],
  a: { T: number; P: number },
  b: { T: number; P: number },
): EnvelopeLandmark | undefined {
  const lo = Math.min(a.P, b.P) * 0.98;
  const hi = Math.max(a.P, b.P) * 1.02;
  return critical.find((c) => c.P >= lo && c.P <= hi);
}

function landmarkLayers(
  data: PhaseEnvelopeChartData,
  xAxis: AxisPlan,
  yAxis: AxisPlan,
): Record<string, unknown>[] {
  const rows: Record<string, unknown>[] = [];
  const add = (p: EnvelopeLandmark | undefined, name: string, input: string): void => {
    if (p === undefined) return;
    requirePositive(`${input}.T`, p.T, "K");
    requirePositive(`${input}.P`, p.P, "Pa");
    rows.push({ x: toDisplay(p.T, xAxis.unit), y: toDisplay(p.P, yAxis.unit), label: name });
  };
  (data.critical ?? []).forEach((c, i) => add(c, "critical point", `critical[${i}]`));
  add(data.cricondenbar, "cricondenbar", "cricondenbar");
  add(data.cricondentherm, "cricondentherm", "cricondentherm");
  if (rows.length === 0) return [];
  const encoding = { x: positionEncoding("x", xAxis), y: positionEncoding("y", yAxis) };
  const names = ["critical point", "cricondenbar", "cricondentherm"];
  return [
    {
      data: { values: rows },
      mark: {
        type: "point",
        filled: false,
        size: 90,
        strokeWidth: 1.8,
        color: INK.critical,
        clip: true,
      },
      encoding: {
        ...encoding,
        shape: {
          field: "label",
          type: "nominal",
          title: "Point",
          scale: { domain: names, range: ["diamond", "triangle-up", "triangle-right"] },
        },
        tooltip: [
          { field: "label", type: "nominal", title: "Point" },
          { field: "x", type: "quantitative", title: xAxis.title, format: ".5~g" },
          { field: "y", type: "quantitative", title: yAxis.title, format: ".5~g" },
        ],
      },
    },
    // labels placed apart: the critical point and the cricondenbar are often close together
    ...LABEL_PLACES.filter((place) => rows.some((r) => r.label === place.label)).map((place) => ({
      data: { values: rows.filter((r) => r.label === place.label) },
      mark: {
        type: "text",
        align: place.align,
        dx: place.dx,
        dy: place.dy,
        color: INK.critical,
        fontSize: 10,
      },
      encoding: { ...encoding, text: { field: "label", type: "nominal" } },
    })),
  ];
}

const LABEL_PLACES = [
  { label: "critical point", align: "right", dx: -8, dy: -8 },
  { label: "cricondenbar", align: "left", dx: 8, dy: -10 },
  { label: "cricondentherm", align: "right", dx: -8, dy: 14 },
] as const;

function pathLayers(
  path: readonly EnvelopePathState[],
  xAxis: AxisPlan,
  yAxis: AxisPlan,
): Record<string, unknown>[] {
  if (path.length === 0) return [];
  const rows = path.map((s, i) => {
    requirePositive(`path[${i}].T`, s.T, "K");
    requirePositive(`path[${i}].P`, s.P, "Pa");
    return {
      x: toDisplay(s.T, xAxis.unit),
      y: toDisplay(s.P, yAxis.unit),
      order: i,
      step: String(i + 1),
      label: s.label === undefined ? `state ${i + 1}` : String(s.label),
      tag: pathTag(s.label === undefined ? undefined : String(s.label), i, path.length),
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
    {
      data: { values: rows },
      mark: { type: "text", align: "left", dx: 7, dy: 10, color: INK.path, fontSize: 10 },
      encoding: { ...enc, text: { field: "tag", type: "nominal" } },
    },
  ];
}

/**
 * A P-T diagram of a phase envelope.
 *
 * @example
 * ```ts
 * const env = gas.envelope(z, { vaporFractions: [0.1, 0.5, 0.9] });
 * phaseEnvelopeChart(env, { units: { system: "SI", pressure: "bar" },
 *   path: [{ T: 320, P: 80e5, label: "separator" }, { T: 290, P: 30e5, label: "after valve" }] });
 * ```
 * @throws InputError for a point with a non-positive or NaN T or P, or bad options.
 */
export function phaseEnvelopeChart(
  data: PhaseEnvelopeChartData,
  options: PhaseEnvelopeChartOptions = {},
): ChartSpec {
  const xAxis = planAxis("temperature", "Temperature T", options.units);
  const yAxis = planAxis("pressure", "Pressure P", options.units, options.logP ?? false);
  const warnings = new WarningList();
  checkArray("points", data.points);
  if (data.points.length === 0) warnings.add("the envelope has no points to draw");
  if (data.complete === false) {
    warnings.add(`the envelope is incomplete: ${data.stoppedBecause ?? "no reason given"}`);
  }
  const { rows, labels } = lineRows(data, xAxis, yAxis);
  const layers: Record<string, unknown>[] = [];
  if (rows.length > 0) layers.push(seriesLineLayer(rows, labels, "Line", xAxis, yAxis));
  layers.push(...landmarkLayers(data, xAxis, yAxis));
  layers.push(...pathLayers(checkArray("options.path", options.path), xAxis, yAxis));
  if (layers.length === 0) {
    // an empty but valid chart: the axes alone
    layers.push({ data: { values: [] }, mark: { type: "point" }, encoding: {} });
  }
  return topLevel("phase-envelope", "Phase envelope", options, [xAxis, yAxis], warnings, {
    layer: layers,
  });
}
