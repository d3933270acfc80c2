/**
 * An input of a calculation record: the value as given, converted to SI through units/ (gauge
 * pressures with the atmospheric pressure used, differences without offset), with its source.
 */
import { InputError } from "../errors.js";
import { SI_UNITS } from "../units/dimension.js";
import { getDefaultAtmosphericPressure } from "../units/atmosphericPressure.js";
import { lookupUnit } from "../units/lookupUnit.js";
import { toSI } from "../units/convert.js";
import type { RecordedInput } from "./recordContent.js";
import { optionalText, requireText, withSummary } from "./recordText.js";

/** Options of {@link CalculationRecord.input}. */
export interface RecordInputOptions {
  /** Where the value came from (plain text), e.g. "DCS tag PT-2101, invented". Default: not given. */
  source?: string;
  /** A note (plain text). Default: none. */
  note?: string;
  /** Molar mass for mass-based units, kg/mol. Default: none (mass units are then refused). */
  molarMassKgPerMol?: number;
  /** Atmospheric pressure for gauge units, Pa. Default: the notebook-wide default. */
  atmosphericPressurePa?: number;
  /** The value is a difference (1 degC = 1 K). Default false. */
  difference?: boolean;
}

const DIMENSIONLESS = new Set(["-", "", "1"]);

/**
 * Checks and converts one input; the result is frozen and prints as one line.
 * @param id The record-local id ("I1", ...).
 */
export function recordedInput(
  id: string,
  label: string,
  value: number | readonly number[],
  unit: string,
  options: RecordInputOptions,
): RecordedInput {
  requireText(label, "label");
  if (typeof unit !== "string") {
    throw new InputError({
      input: "unit",
      unit: "-",
      validRange: 'a unit string or "-"',
      received: unit,
    });
  }
  const values = Array.isArray(value) ? (value as readonly number[]) : [value as number];
  if (values.length === 0) {
    throw new InputError({
      input: label,
      unit,
      validRange: "a number or a non-empty list",
      received: value,
    });
  }
  const source = optionalText(options.source, "options.source");
  const note = optionalText(options.note, "options.note");
  let unitSI: string;
  let converted: number[];
  let atmosphericPressurePa: number | undefined;
  if (DIMENSIONLESS.has(unit.trim())) {
    converted = values.map((v, i) => {
      if (typeof v !== "number" || !Number.isFinite(v)) {
        throw new InputError({
          input: Array.isArray(value) ? `${label}[${i}]` : label,
          unit: "-",
          validRange: "a finite number",
          received: v,
        });
      }
      return v;
    });
    unitSI = "-";
  } else {
    const def = lookupUnit(unit);
    unitSI = SI_UNITS[def.dimension];
    converted = values.map((v, i) =>
      toSI(v, unit, {
        molarMassKgPerMol: options.molarMassKgPerMol,
        atmosphericPressurePa: options.atmosphericPressurePa,
        difference: options.difference,
        input: Array.isArray(value) ? `${label}[${i}]` : label,
      }),
    );
    if (def.gauge && !options.difference) {
      atmosphericPressurePa = options.atmosphericPressurePa ?? getDefaultAtmosphericPressure();
    }
  }
  return withSummary(
    {
      id,
      label,
      value: Array.isArray(value) ? Object.freeze([...values]) : values[0],
      unit,
      valueSI: Array.isArray(value) ? Object.freeze(converted) : converted[0],
      unitSI,
      source,
      note,
      atmosphericPressurePa,
      difference: options.difference ?? false,
    },
    `${id} ${label} = ${Array.isArray(value) ? `[${values.join(", ")}]` : values[0]} ${unit} (recorded)`,
  );
}
