/**
 * The built-in component table: data/components.json (customary units in the field names, each
 * value with a source key) converted to SI Components through `defineComponent`, so the table passes
 * the same validation as user components. Loaded once, lazily; the result is frozen.
 */
import raw from "./data/components.json";
import { defineComponent } from "./defineComponent.js";
import type { ResultWarning } from "../errors.js";
import type { Component, CpCorrelation } from "./types.js";

/** One record of data/components.json as stored (customary units, source keys). */
export interface RawComponentRecord {
  id: string;
  name: string;
  formula: string;
  casNumber: string;
  synonyms: string[];
  molarMassGPerMol: number;
  normalBoilingPointK: number;
  criticalTemperatureK: number;
  criticalPressureBar: number;
  criticalVolumeCm3PerMol: number;
  /** As listed by the source; the Component's Zc is recomputed from Pc, Vc, Tc. */
  criticalCompressibility: number;
  acentricFactor: number;
  /** null when not included (see the formation source). */
  enthalpyOfFormationKJPerMol: number | null;
  gibbsEnergyOfFormationKJPerMol: number | null;
  absoluteEntropyJPerMolK: number | null;
  idealGasCp: CpCorrelation;
  sources: {
    critical: string;
    boilingPoint: string;
    formation: string;
    entropy: string;
    heatCapacity: string;
  };
  note?: string;
  /** Warnings carried by the component (e.g. a group-contribution cp). */
  warnings?: ResultWarning[];
}

/** The whole JSON file. */
export interface RawComponentTable {
  description: string;
  /** Element entropies per atom at 298.15 K and 1 bar, J/(mol K) (half the diatomic gas value for H, N, O, Cl). */
  elementEntropiesJPerMolK: Record<string, number | string>;
  sources: Record<string, string>;
  components: RawComponentRecord[];
}

/** The raw table (customary units), for tests and provenance displays. */
export const rawComponentTable = raw as unknown as RawComponentTable;

let cache: readonly Component[] | undefined;

/** All table components, SI, in table order. */
export function tableComponents(): readonly Component[] {
  if (cache === undefined) cache = Object.freeze(rawComponentTable.components.map(fromRaw));
  return cache;
}

function fromRaw(r: RawComponentRecord): Component {
  // A key "a+b" cites two sources in order (e.g. a low-temperature segment, then the correlation above).
  const cite = (keys: string) =>
    keys
      .split("+")
      .map((key) => {
        const text = rawComponentTable.sources[key];
        if (text === undefined)
          throw new Error(`components.json: ${r.id} cites unknown source key "${key}"`);
        return text;
      })
      .join("; ");
  const note = r.note ? ` Note: ${r.note}.` : "";
  return defineComponent(
    {
      id: r.id,
      name: r.name,
      formula: r.formula,
      casNumber: r.casNumber,
      synonyms: r.synonyms,
      molarMassKgPerMol: r.molarMassGPerMol / 1000,
      criticalTemperatureK: r.criticalTemperatureK,
      criticalPressurePa: r.criticalPressureBar * 1e5,
      criticalVolumeM3PerMol: r.criticalVolumeCm3PerMol * 1e-6,
      acentricFactor: r.acentricFactor,
      normalBoilingPointK: r.normalBoilingPointK,
      enthalpyOfFormationJPerMol: (r.enthalpyOfFormationKJPerMol ?? NaN) * 1000,
      gibbsEnergyOfFormationJPerMol: (r.gibbsEnergyOfFormationKJPerMol ?? NaN) * 1000,
      absoluteEntropyJPerMolK: r.absoluteEntropyJPerMolK ?? NaN,
      idealGasCp: r.idealGasCp,
      sources: {
        critical: cite(r.sources.critical) + note,
        boilingPoint: cite(r.sources.boilingPoint) + note,
        formation: cite(r.sources.formation),
        entropy: cite(r.sources.entropy),
        heatCapacity: cite(r.sources.heatCapacity),
      },
      warnings: r.warnings ?? [],
    },
    { origin: "table" },
  );
}
