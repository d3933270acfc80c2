/**
 * Units of the CSV column headers, converted to SI once at import (the edge of the library).
 *
 * Until the library-wide units/ module lands, this file holds the small table the P-V-T import
 * needs; `columnUnitToSI` is the ONE call to rewire to units/ then. Every conversion is affine,
 * SI = scale * value + offset; uncertainties (differences) use `scale` only.
 *
 * Factors: exact by definition (SI Brochure, 9th ed., 2019; bar = 1e5 Pa, atm = 101325 Pa,
 * degC offset 273.15 K, degF = 5/9 K, psi = 6894.757293168 Pa from lbf and inch definitions,
 * NIST SP 811 (2008) appendix B).
 */

/** The physical quantity a column holds. */
export type ColumnQuantity = "temperature" | "pressure" | "density" | "volume";

export interface AffineToSI {
  /** Multiply by this ... */
  scale: number;
  /** ... then add this (non-zero for degC, degF). */
  offset: number;
  /** The SI unit reached, e.g. "mol/m3". */
  siUnit: string;
}

/** Why a unit could not be used, in words for the error message. */
export interface UnitRefusal {
  expected: string;
  hint?: string;
}

const PSI_PA = 6894.757293168;

const TEMPERATURE: Record<string, [number, number]> = {
  K: [1, 0],
  degC: [1, 273.15],
  "°C": [1, 273.15],
  C: [1, 273.15],
  degF: [5 / 9, 273.15 - (32 * 5) / 9],
  "°F": [5 / 9, 273.15 - (32 * 5) / 9],
  degR: [5 / 9, 0],
};

const PRESSURE: Record<string, number> = {
  Pa: 1,
  kPa: 1e3,
  MPa: 1e6,
  GPa: 1e9,
  bar: 1e5,
  bara: 1e5,
  mbar: 1e2,
  atm: 101325,
  psia: PSI_PA,
};

/** Molar density units to mol/m3. */
const MOLAR_DENSITY: Record<string, number> = {
  "mol/m3": 1,
  "mol/m^3": 1,
  "kmol/m3": 1e3,
  "kmol/m^3": 1e3,
  "mol/L": 1e3,
  "mol/l": 1e3,
  "mol/dm3": 1e3,
  "mol/dm^3": 1e3,
  "mol/cm3": 1e6,
  "mol/cm^3": 1e6,
};
/** Mass density units to kg/m3 (need a molar mass). */
const MASS_DENSITY: Record<string, number> = {
  "kg/m3": 1,
  "kg/m^3": 1,
  "g/L": 1,
  "g/l": 1,
  "g/cm3": 1e3,
  "g/cm^3": 1e3,
  "g/mL": 1e3,
  "kg/L": 1e3,
};
/** Molar volume units to m3/mol. */
const MOLAR_VOLUME: Record<string, number> = {
  "m3/mol": 1,
  "m^3/mol": 1,
  "m3/kmol": 1e-3,
  "m^3/kmol": 1e-3,
  "L/mol": 1e-3,
  "l/mol": 1e-3,
  "dm3/mol": 1e-3,
  "dm^3/mol": 1e-3,
  "cm3/mol": 1e-6,
  "cm^3/mol": 1e-6,
};
/** Specific (mass) volume units to m3/kg (need a molar mass). */
const SPECIFIC_VOLUME: Record<string, number> = {
  "m3/kg": 1,
  "m^3/kg": 1,
  "L/kg": 1e-3,
  "cm3/g": 1e-3,
  "cm^3/g": 1e-3,
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
  const u = unitText.trim().replace(/\s+/g, "").replace(/³/g, "3");
  switch (quantity) {
    case "temperature": {
      const t = TEMPERATURE[u];
      if (t) return { scale: t[0], offset: t[1], siUnit: "K" };
      return { expected: `a temperature unit (${Object.keys(TEMPERATURE).join(", ")})` };
    }
    case "pressure": {
      const p = PRESSURE[u];
      if (p !== undefined) return { scale: p, offset: 0, siUnit: "Pa" };
      if (/g$/.test(u) && PRESSURE[u.slice(0, -1)] !== undefined) {
        return {
          expected: "an absolute pressure unit",
          hint: "gauge pressures (barg, psig, ...) depend on the local atmosphere: convert them to absolute pressure before import",
        };
      }
      if (u === "psi") {
        return { expected: "psia (absolute) rather than the ambiguous psi", hint: "write psia" };
      }
      return { expected: `an absolute pressure unit (${Object.keys(PRESSURE).join(", ")})` };
    }
    case "density": {
      const m = MOLAR_DENSITY[u];
      if (m !== undefined) return { scale: m, offset: 0, siUnit: "mol/m3" };
      const md = MASS_DENSITY[u];
      if (md !== undefined) {
        if (!(molarMassKgPerMol !== undefined && molarMassKgPerMol > 0)) {
          return {
            expected: "a molar density unit (or a molar mass, for a mass density)",
            hint: "give the molar mass (--M <kg/mol> or --component <id>) to read mass densities",
          };
        }
        return { scale: md / molarMassKgPerMol, offset: 0, siUnit: "mol/m3" };
      }
      return {
        expected: `a density unit (${Object.keys(MOLAR_DENSITY).concat(Object.keys(MASS_DENSITY)).join(", ")})`,
      };
    }
    case "volume": {
      const v = MOLAR_VOLUME[u];
      if (v !== undefined) return { scale: v, offset: 0, siUnit: "m3/mol" };
      const sv = SPECIFIC_VOLUME[u];
      if (sv !== undefined) {
        if (!(molarMassKgPerMol !== undefined && molarMassKgPerMol > 0)) {
          return {
            expected: "a molar volume unit (or a molar mass, for a specific volume)",
            hint: "give the molar mass (--M <kg/mol> or --component <id>) to read specific volumes",
          };
        }
        return { scale: sv * molarMassKgPerMol, offset: 0, siUnit: "m3/mol" };
      }
      return {
        expected: `a volume unit (${Object.keys(MOLAR_VOLUME).concat(Object.keys(SPECIFIC_VOLUME)).join(", ")})`,
      };
    }
  }
}

/** Type guard: did `columnUnitToSI` succeed? */
export function isAffineToSI(r: AffineToSI | UnitRefusal): r is AffineToSI {
  return (r as AffineToSI).scale !== undefined;
}
