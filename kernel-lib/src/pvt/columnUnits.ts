/**
 * Units of the CSV column headers, converted to SI once at import (the edge of the library), by
 * the library's unit table (units/lookupUnit.ts; factors and their sources live there). Any unit
 * the units module knows for the column's dimension is accepted, including mass-based densities
 * and volumes (with a molar mass) and gauge pressures (with the notebook-wide atmospheric
 * pressure of units/atmosphericPressure.ts, which the import reports in the column description).
 *
 * The map is affine, SI = scale * value + offset; uncertainties (differences) use `scale` only.
 */
import { getDefaultAtmosphericPressure, lookupUnit } from "../units/index.js";
import type { Dimension } from "../units/index.js";

/** The physical quantity a column holds. */
export type ColumnQuantity = "temperature" | "pressure" | "density" | "volume";

/** An affine conversion to SI: value_SI = scale * value + offset. */
export interface AffineToSI {
  /** Multiply by this ... */
  scale: number;
  /** ... then add this (non-zero for degC, degF and gauge pressures). */
  offset: number;
  /** The SI unit reached, e.g. "mol/m3". */
  siUnit: string;
  /** Note for the column description, e.g. the atmospheric pressure added to a gauge pressure. */
  note?: string;
}

/** Why a unit could not be used, in words for the error message. */
export interface UnitRefusal {
  expected: string;
  hint?: string;
}

const DIMENSION: Record<ColumnQuantity, Dimension> = {
  temperature: "temperature",
  pressure: "pressure",
  density: "molar-density",
  volume: "molar-volume",
};
const SI: Record<ColumnQuantity, string> = {
  temperature: "K",
  pressure: "Pa",
  density: "mol/m3",
  volume: "m3/mol",
};

/**
 * Converts a column unit to SI for the given quantity: density to mol/m3, volume to m3/mol,
 * pressure to Pa (absolute), temperature to K. Mass-based units need `molarMassKgPerMol`.
 * Returns the affine map, or a refusal saying what was expected.
 */
export function columnUnitToSI(
  quantity: ColumnQuantity,
  unitText: string,
  molarMassKgPerMol?: number,
): AffineToSI | UnitRefusal {
  const dimension = DIMENSION[quantity];
  let def;
  try {
    def = lookupUnit(unitText.trim().replace(/³/g, "3"), dimension);
  } catch (e) {
    return { expected: `a ${dimension} unit`, hint: e instanceof Error ? e.message : String(e) };
  }
  let mf = 1;
  if (def.molarMassPower !== 0) {
    if (!(molarMassKgPerMol !== undefined && molarMassKgPerMol > 0 && molarMassKgPerMol <= 5)) {
      return {
        expected: `a molar ${quantity} unit, or a molar mass for the mass-based unit ${def.symbol}`,
        hint: "give the molar mass in kg/mol (--M <kg/mol> or --component <id>)",
      };
    }
    mf = def.molarMassPower === 1 ? molarMassKgPerMol : 1 / molarMassKgPerMol;
  }
  const atm = def.gauge ? getDefaultAtmosphericPressure() : 0;
  return {
    scale: def.factor * mf,
    offset: (def.offset + atm) * mf,
    siUnit: SI[quantity],
    ...(def.gauge ? { note: `gauge pressure: ${atm} Pa atmospheric pressure added` } : {}),
  };
}

/** Type guard: did `columnUnitToSI` succeed? */
export function isAffineToSI(r: AffineToSI | UnitRefusal): r is AffineToSI {
  return (r as AffineToSI).scale !== undefined;
}
