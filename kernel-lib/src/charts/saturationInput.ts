/**
 * Saturation and critical-point data as the chart builders take them (SI, per mole): one row per
 * saturation temperature with the coexisting liquid and vapour. The same rows draw the dome on
 * every diagram (density on P-v, enthalpy on P-h, entropy on T-s, pressure on T-P).
 */
import { InputError } from "../errors.js";
import { requireFinite, requirePositive } from "../validate.js";

/** One coexisting phase at saturation; fill the fields the diagram needs. */
export interface ChartSaturatedPhase {
  /** Molar density, mol/m3. */
  densityMolPerM3?: number;
  /** Molar enthalpy, J/mol (any consistent reference state). */
  enthalpyJPerMol?: number;
  /** Molar entropy, J/(mol K) (same reference state as the enthalpy). */
  entropyJPerMolK?: number;
}

/** One saturation state: T, vapour pressure, and both phases. */
export interface ChartSaturationRow {
  /** Saturation temperature, K. */
  temperatureK: number;
  /** Vapour pressure, Pa. */
  pressurePa: number;
  liquid: ChartSaturatedPhase;
  vapor: ChartSaturatedPhase;
}

/** The critical point, SI, with the fields the diagram needs. */
export interface ChartCriticalPoint {
  /** Critical temperature, K. */
  temperatureK: number;
  /** Critical pressure, Pa. */
  pressurePa: number;
  /** Critical molar density, mol/m3. */
  densityMolPerM3?: number;
  /** Molar enthalpy at the critical point, J/mol. */
  enthalpyJPerMol?: number;
  /** Molar entropy at the critical point, J/(mol K). */
  entropyJPerMolK?: number;
}

/** Sorts saturation rows by temperature and checks T and P (positive, finite). */
export function checkSaturation(
  rows: readonly ChartSaturationRow[] | undefined,
): ChartSaturationRow[] {
  if (rows === undefined) return [];
  if (!Array.isArray(rows)) {
    throw new InputError({
      input: "saturation",
      unit: "-",
      validRange: "an array",
      received: rows,
    });
  }
  rows.forEach((r, i) => {
    requirePositive(`saturation[${i}].temperatureK`, r.temperatureK, "K");
    requirePositive(`saturation[${i}].pressurePa`, r.pressurePa, "Pa");
    if (!r.liquid || !r.vapor) {
      throw new InputError({
        input: `saturation[${i}]`,
        unit: "-",
        validRange: "an object with liquid and vapor",
        received: r,
      });
    }
  });
  return [...rows].sort((a, b) => a.temperatureK - b.temperatureK);
}

/** Checks a critical point (T and P positive and finite). */
export function checkCritical(
  point: ChartCriticalPoint | undefined,
): ChartCriticalPoint | undefined {
  if (point === undefined) return undefined;
  requirePositive("critical.temperatureK", point.temperatureK, "K");
  requirePositive("critical.pressurePa", point.pressurePa, "Pa");
  for (const key of ["densityMolPerM3", "enthalpyJPerMol", "entropyJPerMolK"] as const) {
    if (point[key] !== undefined) requireFinite(`critical.${key}`, point[key], "SI");
  }
  return point;
}

/** Copies the notes of a sampled dome (`domeWarnings`) into a chart's warning list. */
export function addDomeWarnings(
  target: { add(message: string): void },
  domeWarnings: readonly string[] | undefined,
): void {
  if (domeWarnings === undefined) return;
  if (!Array.isArray(domeWarnings)) {
    throw new InputError({
      input: "domeWarnings",
      unit: "-",
      validRange: "an array of strings",
      received: domeWarnings,
    });
  }
  for (const w of domeWarnings) target.add(String(w));
}
