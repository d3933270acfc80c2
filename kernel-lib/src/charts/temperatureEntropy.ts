/**
 * Temperature-entropy diagram: two-phase dome, isobars (legend, colour and dash per isobar) and
 * lines of constant vapour quality from the saturation rows (lever rule).
 */
import { InputError } from "../errors.js";
import type { ChartSpec } from "./chartSpec.js";
import { placeGuideLabels } from "./labelPlacement.js";
import { energyDomeLayers, mixtureEnergyDomeLayers } from "./domeLayers.js";
import { checkMixtureDome, type ChartMixtureDome } from "./mixtureDomeInput.js";
import { energyBasis } from "./energyBasis.js";
import { checkQualities } from "./pressureEnthalpy.js";
import {
  addDomeWarnings,
  checkCritical,
  checkSaturation,
  type ChartCriticalPoint,
  type ChartSaturationRow,
} from "./saturationInput.js";
import { planAxis, rangeOption } from "./axisPlan.js";
import { checkArray, type BaseChartOptions } from "./chartOptions.js";
import { constantValueSeriesLayers } from "./seriesLayers.js";
import { topLevel } from "./topLevel.js";
import { WarningList } from "./warningList.js";

/** A point on a T-s diagram, SI per mole. */
export interface TemperatureEntropyPoint {
  /** Temperature, K. */
  temperatureK: number;
  /** Molar entropy, J/(mol K) (same reference state as the saturation rows). */
  entropyJPerMolK: number;
}

/** Data of {@link temperatureEntropyChart}. */
export interface TemperatureEntropyData {
  /** Saturation rows with liquid and vapour entropy: the dome and the quality lines. */
  saturation?: readonly ChartSaturationRow[];
  /** Critical point (with entropyJPerMolK). */
  critical?: ChartCriticalPoint;
  /** Notes of a sampled dome (saturationFromModel), copied into the chart's warnings. */
  domeWarnings?: readonly string[];
  /**
   * The two-phase region of a mixture (mixtureDomeFromFluid): bubble and dew lines of the feed,
   * its critical point and lines of constant vapour fraction. Drawn instead of, or beside, the
   * pure-fluid `saturation` rows.
   */
  mixtureDome?: ChartMixtureDome;
  /** Isobars, one series each. */
  isobars?: readonly {
    pressurePa: number;
    label?: string;
    points: readonly TemperatureEntropyPoint[];
  }[];
}

/** Options of {@link temperatureEntropyChart}. */
export interface TemperatureEntropyChartOptions extends BaseChartOptions {
  /** Vapour qualities of the quality lines (0 < q < 1). Default [0.2, 0.4, 0.6, 0.8]. */
  qualities?: readonly number[];
  /** Molar mass, kg/mol: show entropy per kg. Default: per mole. */
  molarMassKgPerMol?: number;
  /** Temperature axis range, K. Default: fitted to the data. */
  temperatureRangeK?: readonly [number, number];
  /** Entropy axis range, J/(mol K). Default: fitted to the data. */
  entropyRangeJPerMolK?: readonly [number, number];
}

/**
 * Builds a T-s diagram.
 * @example temperatureEntropyChart({ saturation, critical, isobars }, { units: "field" })
 */
export function temperatureEntropyChart(
  data: TemperatureEntropyData,
  options: TemperatureEntropyChartOptions = {},
): ChartSpec {
  const saturation = checkSaturation(data.saturation);
  const critical = checkCritical(data.critical);
  const mixtureDome = checkMixtureDome(data.mixtureDome);
  const isobars = checkArray("isobars", data.isobars);
  if (saturation.length === 0 && mixtureDome === undefined && isobars.length === 0) {
    throw new InputError({
      input: "data",
      unit: "-",
      validRange: "saturation rows, a mixture dome or isobars",
      received: "nothing to draw",
    });
  }
  const qualities = checkQualities(options.qualities ?? [0.2, 0.4, 0.6, 0.8]);
  const basis = energyBasis(options.molarMassKgPerMol);
  const warnings = new WarningList();
  addDomeWarnings(warnings, data.domeWarnings);
  const xAxis = planAxis(basis.entropyKind, `${basis.adjective} entropy s`, options.units);
  const yAxis = planAxis("temperature", "Temperature T", options.units);
  const pressureUnit = planAxis("pressure", "P", options.units).unit;
  rangeOption("temperatureRangeK", options.temperatureRangeK, yAxis, "K");
  rangeOption(
    "entropyRangeJPerMolK",
    options.entropyRangeJPerMolK,
    xAxis,
    "J/(mol K)",
    basis.perBasis,
  );

  const fixed = energyDomeLayers(
    saturation,
    critical,
    qualities,
    "entropyJPerMolK",
    "temperatureK",
    basis,
    xAxis,
    yAxis,
    warnings,
  );
  const mixture = mixtureDome
    ? mixtureEnergyDomeLayers(
        mixtureDome,
        "entropyJPerMolK",
        "temperatureK",
        basis,
        xAxis,
        yAxis,
        warnings,
      )
    : { dome: [], critical: [] };
  const layers: Record<string, unknown>[] = [...fixed.dome, ...mixture.dome];
  layers.push(
    ...constantValueSeriesLayers(
      {
        input: "isobars",
        curves: isobars,
        key: "pressurePa",
        unitSI: "Pa",
        displayUnit: pressureUnit,
        toXY: (p: TemperatureEntropyPoint) => ({
          x: basis.perBasis(p.entropyJPerMolK),
          y: p.temperatureK,
        }),
        legendTitle: "Isobar",
      },
      xAxis,
      yAxis,
      warnings,
    ),
  );
  layers.push(...fixed.critical, ...mixture.critical);
  const spec = topLevel(
    "temperature-entropy",
    "Temperature-entropy diagram",
    options,
    [xAxis, yAxis, { ...yAxis, kind: "pressure", unit: pressureUnit }],
    warnings,
    { layer: layers },
    basis.mass ? { molarMassKgPerMol: basis.molarMassKgPerMol } : {},
  );
  // The critical-point label: clear of the lines and inside the plot.
  placeGuideLabels(spec);
  return spec;
}
