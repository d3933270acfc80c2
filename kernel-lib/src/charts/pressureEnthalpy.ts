/**
 * Pressure-enthalpy diagram, pressure on a logarithmic axis (so the dilute vapour and the
 * near-critical region both get room): two-phase dome, isotherms, isentropes and lines of constant
 * vapour quality (drawn from the saturation rows by the lever rule).
 */
import { InputError } from "../errors.js";
import { requireFinite } from "../validate.js";
import type { ChartSpec } from "./chartSpec.js";
import { toDisplay } from "./displayUnits.js";
import { energyDomeLayers, mixtureEnergyDomeLayers } from "./domeLayers.js";
import { checkMixtureDome, type ChartMixtureDome } from "./mixtureDomeInput.js";
import { energyBasis } from "./energyBasis.js";
import { placeGuideLabels } from "./labelPlacement.js";
import { INK } from "./theme.js";
import {
  addDomeWarnings,
  checkCritical,
  checkSaturation,
  type ChartCriticalPoint,
  type ChartSaturationRow,
} from "./saturationInput.js";
import { planAxis, rangeOption } from "./axisPlan.js";
import { checkArray, type BaseChartOptions } from "./chartOptions.js";
import { curveRows } from "./curveRows.js";
import { guideLineLayers } from "./guideLines.js";
import { constantValueSeriesLayers } from "./seriesLayers.js";
import { shortNumber } from "./shortNumber.js";
import { topLevel } from "./topLevel.js";
import { WarningList } from "./warningList.js";

/** A point on a P-h diagram, SI per mole. */
export interface PressureEnthalpyPoint {
  /** Pressure, Pa. */
  pressurePa: number;
  /** Molar enthalpy, J/mol (same reference state as the saturation rows). */
  enthalpyJPerMol: number;
}

/** Data of {@link pressureEnthalpyChart}. */
export interface PressureEnthalpyData {
  /** Saturation rows with liquid and vapour enthalpy: the dome and the quality lines. */
  saturation?: readonly ChartSaturationRow[];
  /** Critical point (with enthalpyJPerMol) to mark and to close the dome. */
  critical?: ChartCriticalPoint;
  /** Notes of a sampled dome (saturationFromModel), copied into the chart's warnings. */
  domeWarnings?: readonly string[];
  /**
   * The two-phase region of a mixture (mixtureDomeFromFluid): bubble and dew lines of the feed,
   * its critical point and lines of constant vapour fraction. Drawn instead of, or beside, the
   * pure-fluid `saturation` rows.
   */
  mixtureDome?: ChartMixtureDome;
  /** Isotherms (legend, colour and dash per isotherm). */
  isotherms?: readonly {
    temperatureK: number;
    label?: string;
    points: readonly PressureEnthalpyPoint[];
  }[];
  /** Isentropes (thin guide lines, labelled with their entropy). */
  isentropes?: readonly {
    entropyJPerMolK: number;
    label?: string;
    points: readonly PressureEnthalpyPoint[];
  }[];
}

/** Options of {@link pressureEnthalpyChart}. */
export interface PressureEnthalpyChartOptions extends BaseChartOptions {
  /** Vapour qualities of the quality lines (0 < q < 1). Default [0.2, 0.4, 0.6, 0.8]. */
  qualities?: readonly number[];
  /** Molar mass, kg/mol: show enthalpy per kg instead of per mole. Default: per mole. */
  molarMassKgPerMol?: number;
  /** Logarithmic pressure axis. Default true. */
  logP?: boolean;
  /** Pressure axis range, Pa. Default: fitted to the data. */
  pressureRangePa?: readonly [number, number];
  /** Enthalpy axis range, J/mol. Default: fitted to the data. */
  enthalpyRangeJPerMol?: readonly [number, number];
}

/**
 * Builds a P-h diagram.
 * @example pressureEnthalpyChart({ saturation, critical, isotherms }, { molarMassKgPerMol: 0.04410 })
 */
export function pressureEnthalpyChart(
  data: PressureEnthalpyData,
  options: PressureEnthalpyChartOptions = {},
): ChartSpec {
  const saturation = checkSaturation(data.saturation);
  const critical = checkCritical(data.critical);
  const mixtureDome = checkMixtureDome(data.mixtureDome);
  const isotherms = checkArray("isotherms", data.isotherms);
  const isentropes = checkArray("isentropes", data.isentropes);
  if (
    saturation.length === 0 &&
    mixtureDome === undefined &&
    isotherms.length === 0 &&
    isentropes.length === 0
  ) {
    throw new InputError({
      input: "data",
      unit: "-",
      validRange: "saturation rows, a mixture dome, isotherms or isentropes",
      received: "nothing to draw",
    });
  }
  const qualities = checkQualities(options.qualities ?? [0.2, 0.4, 0.6, 0.8]);
  const basis = energyBasis(options.molarMassKgPerMol);
  const warnings = new WarningList();
  addDomeWarnings(warnings, data.domeWarnings);
  const xAxis = planAxis(basis.energyKind, `${basis.adjective} enthalpy h`, options.units);
  const yAxis = planAxis("pressure", "Pressure P", options.units, options.logP ?? true);
  const temperatureUnit = planAxis("temperature", "T", options.units).unit;
  const entropyUnit = planAxis(basis.entropyKind, "s", options.units).unit;
  rangeOption("pressureRangePa", options.pressureRangePa, yAxis, "Pa");
  rangeOption("enthalpyRangeJPerMol", options.enthalpyRangeJPerMol, xAxis, "J/mol", basis.perBasis);

  const toXY = (p: PressureEnthalpyPoint) => ({
    x: basis.perBasis(p.enthalpyJPerMol),
    y: p.pressurePa,
  });

  const fixed = energyDomeLayers(
    saturation,
    critical,
    qualities,
    "enthalpyJPerMol",
    "pressurePa",
    basis,
    xAxis,
    yAxis,
    warnings,
  );
  const mixture = mixtureDome
    ? mixtureEnergyDomeLayers(
        mixtureDome,
        "enthalpyJPerMol",
        "pressurePa",
        basis,
        xAxis,
        yAxis,
        warnings,
      )
    : { dome: [], critical: [] };
  const layers: Record<string, unknown>[] = [...fixed.dome, ...mixture.dome];

  const isentropeRows = curveRows(
    isentropes.map((c, i) => {
      requireFinite(`isentropes[${i}].entropyJPerMolK`, c.entropyJPerMolK, "J/(mol K)");
      return {
        label:
          c.label ??
          `s = ${shortNumber(toDisplay(basis.perBasis(c.entropyJPerMolK), entropyUnit))} ${entropyUnit.symbol}`,
        points: checkArray(`isentropes[${i}].points`, c.points).map(toXY),
      };
    }),
    xAxis,
    yAxis,
    warnings,
    "s",
  );
  // Isentrope lines now, their labels after the isotherms (so no isotherm is drawn over them).
  const [isentropeLines, ...isentropeLabels] = guideLineLayers(isentropeRows, xAxis, yAxis, {
    color: INK.isentrope,
    strokeDash: [6, 2, 1, 2],
    tooltipTitle: `Isentrope (${entropyUnit.symbol})`,
  });
  if (isentropeLines) layers.push(isentropeLines);

  layers.push(
    ...constantValueSeriesLayers(
      {
        input: "isotherms",
        curves: isotherms,
        key: "temperatureK",
        unitSI: "K",
        displayUnit: temperatureUnit,
        toXY,
        legendTitle: "Isotherm",
      },
      xAxis,
      yAxis,
      warnings,
    ),
  );
  layers.push(...isentropeLabels);
  layers.push(...fixed.critical, ...mixture.critical);

  const spec = topLevel(
    "pressure-enthalpy",
    "Pressure-enthalpy diagram",
    options,
    [
      xAxis,
      yAxis,
      { ...yAxis, kind: "temperature", unit: temperatureUnit },
      { ...yAxis, kind: basis.entropyKind, unit: entropyUnit },
    ],
    warnings,
    { layer: layers },
    basis.mass ? { molarMassKgPerMol: basis.molarMassKgPerMol } : {},
  );
  // Isentrope labels: clear of the critical-point label and of each other.
  placeGuideLabels(spec);
  return spec;
}

/** Checks quality values: each strictly between 0 and 1. */
export function checkQualities(qualities: readonly number[]): readonly number[] {
  const list = checkArray("qualities", qualities);
  list.forEach((q, i) => {
    if (!(q > 0 && q < 1)) {
      throw new InputError({
        input: `qualities[${i}]`,
        unit: "-",
        validRange: "0 < q < 1",
        received: q,
      });
    }
  });
  return list;
}
