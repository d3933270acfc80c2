/**
 * Measured P-V-T data after import: SI, molar (K, mol/m3, Pa), one entry per accepted point, plus
 * the points that were set aside with the reason (never silently dropped).
 */

/** One accepted measurement. Standard uncertainties are absent when the file gave none. */
export interface PvtPoint {
  /** Temperature, K. */
  readonly temperatureK: number;
  /** Molar density, mol/m3 (converted from a volume column when the file gave v). */
  readonly densityMolPerM3: number;
  /** Absolute pressure, Pa. */
  readonly pressurePa: number;
  /** Standard uncertainty of T, K. */
  readonly uTemperatureK?: number;
  /** Standard uncertainty of the density, mol/m3. */
  readonly uDensityMolPerM3?: number;
  /** Standard uncertainty of P, Pa. */
  readonly uPressurePa?: number;
  /** Where the point came from: 1-based line in the file (or index in the arrays). */
  readonly line: number;
}

/** A point that was read but not used, and why. */
export interface SetAsidePoint {
  readonly line: number;
  readonly temperatureK: number;
  readonly densityMolPerM3: number;
  readonly pressurePa: number;
  /** e.g. "repeat of line 12 with the same values", "outlier: leave-one-out residual 6.1 u(P) on the isochore ...". */
  readonly reason: string;
}

/** An imported data set. */
export interface PvtDataset {
  /** File name, or "<arrays>" for data given in a cell. */
  readonly source: string;
  readonly points: readonly PvtPoint[];
  readonly setAside: readonly SetAsidePoint[];
  /** The header of each column as written, with the SI quantity it became. */
  readonly columns: readonly { header: string; quantity: string; unit: string }[];
  /** Comment lines of the file (provenance: who measured, how, or "synthetic"). */
  readonly comments: readonly string[];
}
