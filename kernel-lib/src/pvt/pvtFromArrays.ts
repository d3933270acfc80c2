/**
 * Measured P-V-T data typed in a notebook cell, as SI arrays. Same checks as the CSV import:
 * equal lengths, finite positive numbers, conflicting repeats refused; errors name the array and
 * the 1-based point index (reported as the "line").
 *
 * @example
 * const data = pvtFromArrays({
 *   temperatureK: [300, 320, 340],
 *   densityMolPerM3: [1000, 1000, 1000],
 *   pressurePa: [2.30e6, 2.47e6, 2.63e6],
 *   uPressurePa: 500, // one value for every point
 * });
 */
import { PvtFormatError } from "./pvtFormatError.js";
import { settleRepeats } from "./settleRepeats.js";
import type { PvtDataset, PvtPoint } from "./types.js";

/** P-V-T data given as arrays in SI (K, mol/m3, Pa), with optional standard uncertainties. */
export interface PvtArrays {
  /** Temperatures, K. */
  temperatureK: readonly number[];
  /** Molar densities, mol/m3 (give this or `molarVolumeM3PerMol`). */
  densityMolPerM3?: readonly number[];
  /** Molar volumes, m3/mol (give this or `densityMolPerM3`). */
  molarVolumeM3PerMol?: readonly number[];
  /** Absolute pressures, Pa. */
  pressurePa: readonly number[];
  /** Standard uncertainty of T, K: one per point, or one number for all. */
  uTemperatureK?: number | readonly number[];
  /** Standard uncertainty of the density, mol/m3: one per point, or one number for all. */
  uDensityMolPerM3?: number | readonly number[];
  /** Standard uncertainty of P, Pa: one per point, or one number for all. */
  uPressurePa?: number | readonly number[];
}

/** Options of {@link pvtFromArrays}. */
export interface PvtFromArraysOptions {
  /** Name shown in messages. Default "<arrays>". */
  source?: string;
}

/** Builds a checked data set from arrays (same checks and repeat handling as the CSV import). */
export function pvtFromArrays(arrays: PvtArrays, options: PvtFromArraysOptions = {}): PvtDataset {
  const source = options.source ?? "<arrays>";
  const n = arrays.temperatureK?.length ?? 0;
  const fail = (line: number, header: string, expected: string, found: string) =>
    new PvtFormatError({ source, line, column: 0, header, expected, found });
  if (arrays.densityMolPerM3 !== undefined && arrays.molarVolumeM3PerMol !== undefined) {
    throw fail(
      0,
      "densityMolPerM3",
      "either densityMolPerM3 or molarVolumeM3PerMol, not both",
      "both",
    );
  }
  const dens = arrays.densityMolPerM3 ?? arrays.molarVolumeM3PerMol;
  const densName = arrays.densityMolPerM3 !== undefined ? "densityMolPerM3" : "molarVolumeM3PerMol";
  if (dens === undefined) {
    throw fail(0, "densityMolPerM3", "a densityMolPerM3 or molarVolumeM3PerMol array", "neither");
  }
  if (n === 0) throw fail(0, "temperatureK", "a non-empty array", "an empty or missing array");
  const required: [string, readonly number[] | undefined][] = [
    ["temperatureK", arrays.temperatureK],
    [densName, dens],
    ["pressurePa", arrays.pressurePa],
  ];
  for (const [name, arr] of required) {
    if (!Array.isArray(arr) || arr.length !== n) {
      throw fail(
        0,
        name,
        `an array of ${n} numbers (as temperatureK)`,
        `${Array.isArray(arr) ? arr.length : typeof arr}`,
      );
    }
  }
  const perPoint = (
    name: string,
    u: number | readonly number[] | undefined,
  ): ((i: number) => number | undefined) => {
    if (u === undefined) return () => undefined;
    if (typeof u === "number") return () => u;
    if (!Array.isArray(u) || u.length !== n) {
      throw fail(
        0,
        name,
        `one number or an array of ${n}`,
        `${Array.isArray(u) ? u.length : typeof u}`,
      );
    }
    return (i) => u[i];
  };
  const uT = perPoint("uTemperatureK", arrays.uTemperatureK);
  const uD = perPoint("uDensityMolPerM3", arrays.uDensityMolPerM3);
  const uP = perPoint("uPressurePa", arrays.uPressurePa);
  const positive = (name: string, i: number, x: number | undefined, unit: string) => {
    if (x === undefined) return undefined;
    if (!(typeof x === "number" && x > 0 && x < Infinity)) {
      throw fail(i + 1, name, `a finite number > 0 ${unit}`, String(x));
    }
    return x;
  };
  const points: PvtPoint[] = [];
  for (let i = 0; i < n; i++) {
    const T = positive("temperatureK", i, arrays.temperatureK[i], "K") as number;
    const d = positive(
      densName,
      i,
      dens[i],
      densName === "densityMolPerM3" ? "mol/m3" : "m3/mol",
    ) as number;
    const P = positive("pressurePa", i, arrays.pressurePa[i], "Pa") as number;
    const rho = densName === "densityMolPerM3" ? d : 1 / d;
    points.push({
      temperatureK: T,
      densityMolPerM3: rho,
      pressurePa: P,
      uTemperatureK: positive("uTemperatureK", i, uT(i), "K"),
      uDensityMolPerM3: positive("uDensityMolPerM3", i, uD(i), "mol/m3"),
      uPressurePa: positive("uPressurePa", i, uP(i), "Pa"),
      line: i + 1,
    });
  }
  const { kept, setAside } = settleRepeats(points, source, "pressurePa", 0);
  return {
    source,
    points: kept,
    setAside,
    columns: [
      { header: "temperatureK", quantity: "T", unit: "K" },
      { header: densName, quantity: "rho", unit: "mol/m3" },
      { header: "pressurePa", quantity: "P", unit: "Pa" },
    ],
    comments: [],
  };
}
