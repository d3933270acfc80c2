/**
 * Time histories of a vessel depressurisation or filling (process/vessel/simulateVessel.ts):
 * pressure against time above, contents and wall temperatures against time below, with the
 * minimum design metal temperature as a horizontal rule and the coldest points marked (an
 * adiabatic run has no wall line: the panel says "wall: not modelled (adiabatic)"); and the
 * path of the contents on the P-T phase envelope. The caution of the result travels in the
 * subtitle: a chart is copied into reports without its notebook.
 */
import type { PhaseEnvelopeChartData } from "./phaseEnvelope.js";
import { phaseEnvelopeChart, type PhaseEnvelopeChartOptions } from "./phaseEnvelope.js";
import type { VesselResult } from "../process/vessel/types.js";
import type { ChartSpec } from "./chartSpec.js";
import { planAxis, plotValue, positionEncoding } from "./axisPlan.js";
import { checkSize, type BaseChartOptions } from "./chartOptions.js";
import { DEFAULT_HEIGHT, DEFAULT_WIDTH, INK, SERIES_COLORS } from "./theme.js";
import { topLevel } from "./topLevel.js";
import { WarningList } from "./warningList.js";
import { InputError } from "../errors.js";

/** Options of {@link vesselHistoryChart}. */
export interface VesselHistoryOptions extends BaseChartOptions {
  /**
   * Minimum design metal temperature, K, drawn as a rule on the temperature panel. Default: the
   * one given to the run, if any.
   */
  minimumDesignMetalTemperatureK?: number;
}

const SHORT_CAUTION =
  "A model result: MDMT, relief and flare design are decided under site codes and standards by licensed engineers.";

/** The note on the temperature panel of an adiabatic run. */
export const WALL_NOT_MODELLED = "wall: not modelled (adiabatic)";

function checkResult(result: VesselResult): void {
  if (!(result && result.series && Array.isArray(result.series.timeS))) {
    throw new InputError({
      input: "result",
      unit: "-",
      validRange: "the result of simulateVessel",
      received: typeof result,
    });
  }
}

/**
 * Pressure and temperatures against time of a vessel run, with the MDMT rule.
 *
 * @example
 * ```ts
 * const run = simulateVessel({ ... });
 * showChart(vesselHistoryChart(run, { units: { system: "SI", pressure: "bar", temperature: "degC" } }));
 * ```
 */
export function vesselHistoryChart(
  result: VesselResult,
  options: VesselHistoryOptions = {},
): ChartSpec {
  checkResult(result);
  const s = result.series;
  const pAxis = planAxis(
    "pressure",
    "Pressure",
    options.units ?? { system: "SI", pressure: "bar" },
  );
  const tAxis = planAxis("temperature", "Temperature", options.units);
  const width = checkSize("width", options.width, DEFAULT_WIDTH);
  const height = checkSize("height", options.height, DEFAULT_HEIGHT);
  const timeEnc = { field: "t", type: "quantitative", title: "Time / s" };
  const pRows = s.timeS.map((t, k) => ({ t, y: plotValue(s.pressurePa[k], pAxis.unit) }));
  const tRows: { t: number; y: number; series: string }[] = [];
  s.timeS.forEach((t, k) => {
    tRows.push({ t, y: plotValue(s.temperatureK[k], tAxis.unit), series: "contents" });
  });
  // an adiabatic run has no wall temperature (not modelled): no wall line, a note instead
  const wallT = s.wallTemperatureK;
  if (wallT !== undefined) {
    s.timeS.forEach((t, k) => {
      tRows.push({ t, y: plotValue(wallT[k], tAxis.unit), series: "wall" });
    });
  }
  const mdmt = options.minimumDesignMetalTemperatureK ?? result.minimumDesignMetalTemperatureK;
  const marks: { t: number; y: number; label: string }[] = [
    {
      t: result.minimum.timeS,
      y: plotValue(result.minimum.temperatureK, tAxis.unit),
      label: "coldest contents",
    },
  ];
  const { wallTemperatureK: coldWall, wallTimeS: coldWallTime } = result.minimum;
  if (coldWall !== undefined && coldWallTime !== undefined) {
    marks.push({
      t: coldWallTime,
      y: plotValue(coldWall, tAxis.unit),
      label: "coldest wall",
    });
  }
  const tLayers: Record<string, unknown>[] = [
    {
      data: { values: tRows },
      mark: { type: "line", strokeWidth: 2 },
      encoding: {
        x: timeEnc,
        y: positionEncoding("y", tAxis),
        color: {
          field: "series",
          type: "nominal",
          title: null,
          scale: { range: [SERIES_COLORS[0], SERIES_COLORS[1]] },
        },
      },
    },
    {
      data: { values: marks },
      mark: { type: "point", filled: true, size: 60, color: INK.critical },
      encoding: { x: timeEnc, y: positionEncoding("y", tAxis), tooltip: [{ field: "label" }] },
    },
  ];
  if (wallT === undefined) {
    tLayers.push({
      data: { values: [{ note: WALL_NOT_MODELLED }] },
      mark: { type: "text", align: "right", baseline: "top", dx: -4, dy: 4, color: INK.guide },
      encoding: { x: { value: width }, y: { value: 0 }, text: { field: "note" } },
    });
  }
  if (mdmt !== undefined) {
    tLayers.push({
      data: { values: [{ y: plotValue(mdmt, tAxis.unit), label: "MDMT" }] },
      layer: [
        {
          mark: { type: "rule", color: INK.critical, strokeDash: [6, 3] },
          encoding: { y: positionEncoding("y", tAxis) },
        },
        {
          mark: { type: "text", align: "left", dx: 4, dy: -6, color: INK.critical },
          encoding: {
            y: positionEncoding("y", tAxis),
            x: { value: 0 },
            text: { field: "label" },
          },
        },
      ],
    });
  }
  const body = {
    vconcat: [
      {
        width,
        height: Math.round(height / 2),
        data: { values: pRows },
        mark: { type: "line", strokeWidth: 2, color: SERIES_COLORS[0] },
        encoding: { x: timeEnc, y: positionEncoding("y", pAxis) },
      },
      { width, height: Math.round(height / 2), layer: tLayers },
    ],
  };
  const warnings = new WarningList();
  return topLevel(
    "vessel-history",
    result.kind === "filling" ? "Vessel filling" : "Vessel depressurisation",
    { ...options, subtitle: options.subtitle ?? SHORT_CAUTION },
    [pAxis, tAxis],
    warnings,
    body,
    {},
    false,
  );
}

/**
 * The path of the contents on the P-T diagram over the phase envelope of the initial
 * composition (a mixture's envelope, e.g. `fluid.envelope(z)`); about `points` states of the run
 * are drawn and labelled with their time.
 */
export function vesselPathOnEnvelopeChart(
  result: VesselResult,
  envelope: PhaseEnvelopeChartData,
  options: PhaseEnvelopeChartOptions & { points?: number } = {},
): ChartSpec {
  checkResult(result);
  const s = result.series;
  const n = s.timeS.length;
  const want = Math.max(2, Math.min(n, options.points ?? 8));
  const path: { T: number; P: number; label: string }[] = [];
  for (let j = 0; j < want; j++) {
    const k = Math.round((j * (n - 1)) / (want - 1));
    if (path.length > 0 && path[path.length - 1].label === `t = ${s.timeS[k].toPrecision(3)} s`)
      continue;
    path.push({
      T: s.temperatureK[k],
      P: s.pressurePa[k],
      label: `t = ${s.timeS[k].toPrecision(3)} s`,
    });
  }
  return phaseEnvelopeChart(envelope, {
    ...options,
    title: options.title ?? "Vessel contents on the phase envelope",
    subtitle: options.subtitle ?? SHORT_CAUTION,
    path,
  });
}
