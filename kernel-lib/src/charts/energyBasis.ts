/**
 * Molar or mass basis for enthalpy and entropy axes (internal). Values arrive per mole (SI); with
 * a molar mass M (kg/mol) they are shown per kilogram: h/M in J/kg, s/M in J/(kg K).
 */
import { requirePositive } from "../validate.js";
import type { QuantityKind } from "./displayUnits.js";

export interface EnergyBasis {
  readonly mass: boolean;
  readonly molarMassKgPerMol?: number;
  /** Converts a per-mole SI value to the basis (per mole or per kg), SI. */
  readonly perBasis: (valuePerMol: number) => number;
  readonly energyKind: QuantityKind;
  readonly entropyKind: QuantityKind;
  /** "Molar" or "Specific", for axis names. */
  readonly adjective: string;
}

/** The basis chosen by an optional molar mass, kg/mol (absent: per mole). */
export function energyBasis(molarMassKgPerMol: number | undefined): EnergyBasis {
  if (molarMassKgPerMol === undefined) {
    return {
      mass: false,
      perBasis: (v) => v,
      energyKind: "molarEnergy",
      entropyKind: "molarEntropy",
      adjective: "Molar",
    };
  }
  const m = requirePositive("molarMassKgPerMol", molarMassKgPerMol, "kg/mol");
  return {
    mass: true,
    molarMassKgPerMol: m,
    perBasis: (v) => v / m,
    energyKind: "massEnergy",
    entropyKind: "massEntropy",
    adjective: "Specific",
  };
}
