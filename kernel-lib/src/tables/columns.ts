/**
 * Column specifications of a result table and the conversion of one SI cell to its text.
 * Values in rows are SI on the molar basis (K, Pa, mol/m3, J/mol, J/(mol K), m/s, ...); the
 * column says which unit to show, converted through units/ (mass units need a molar mass).
 */
import { phaseWord } from "./phaseWords.js";
import { InputError } from "../errors.js";
import { fromSI } from "../units/convert.js";
import { lookupFlowUnit, type FlowUnitDefinition } from "../units/flow.js";
import {
  DISPLAY_UNITS,
  resolveUnit,
  type QuantityKind,
  type UnitChoice,
} from "../charts/displayUnits.js";
import { formatSignificant } from "./formatNumber.js";

/** A column of numbers, SI in the rows. */
export interface NumberColumn {
  /** Field of the row objects, e.g. "temperatureK". */
  key: string;
  /** Column head (plain text, escaped), e.g. "Temperature". */
  label: string;
  /**
   * Unit to show, any unit of units/ ("degC", "psia", "kJ/kg", ...) or a molar or mass flow unit
   * ("kmol/h", "t/h", ...; the rows then hold mol/s or kg/s). Default: from `quantity`.
   */
  unit?: string;
  /** Kind of quantity, to pick the unit of the table's unit system when `unit` is absent. */
  quantity?: QuantityKind;
  /** Significant figures. Default 5. */
  digits?: number;
  /** Fixed decimals instead of significant figures. Default: not used. */
  decimals?: number;
  /** The values are differences (no temperature offset, no gauge). Default false. */
  difference?: boolean;
  /**
   * Field of the row holding that row's molar mass, kg/mol, for mass units (kJ/kg, kg/m3) when
   * rows differ in composition. Default: the table's `molarMassKgPerMol`.
   */
  molarMassKey?: string;
}

/** A column of text (component names, phase labels, notes), shown as plain text. */
export interface TextColumn {
  key: string;
  label: string;
  /** Marks a text column. */
  text: true;
}

export type TableColumn = NumberColumn | TextColumn;

/** Is this a text column? */
export function isTextColumn(column: TableColumn): column is TextColumn {
  return (column as TextColumn).text === true;
}

/** Options shared by every table format. */
export interface TableOptions {
  /** Caption above the table (plain text). Default: none. */
  caption?: string;
  /** Note under the table (plain text), e.g. the model and reference state. Default: none. */
  note?: string;
  /** Unit system for columns that give a `quantity` and no `unit`. Default "SI". */
  units?: UnitChoice;
  /** Molar mass, kg/mol, for mass-based units (kJ/kg, kg/m3, ...). Default: none. */
  molarMassKgPerMol?: number;
  /** Text shown for a missing value (undefined or null). Default "–". */
  missing?: string;
}

/** Rows, columns and options of a table: pass it to tableHtml, tableText, showTable or rec.results. */
export interface ResultTable {
  readonly rows: readonly Record<string, unknown>[];
  readonly columns: readonly TableColumn[];
  readonly options: TableOptions;
}

/** Is this a {@link ResultTable}? */
export function isResultTable(value: unknown): value is ResultTable {
  return (
    typeof value === "object" &&
    value !== null &&
    !Array.isArray(value) &&
    Array.isArray((value as ResultTable).rows) &&
    Array.isArray((value as ResultTable).columns)
  );
}

/**
 * The arguments of a table function: (rows, columns, options) or (table, options overriding the
 * table's own).
 */
export function tableArguments(
  first: readonly Record<string, unknown>[] | ResultTable,
  second: readonly TableColumn[] | TableOptions | undefined,
  third: TableOptions | undefined,
): {
  rows: readonly Record<string, unknown>[];
  columns: readonly TableColumn[];
  options: TableOptions;
} {
  if (isResultTable(first)) {
    return {
      rows: first.rows,
      columns: first.columns,
      options: { ...first.options, ...(second as TableOptions | undefined) },
    };
  }
  return { rows: first, columns: second as readonly TableColumn[], options: third ?? {} };
}

/** A column resolved for rendering: head, unit symbol and a cell formatter. */
export interface ResolvedColumn {
  readonly label: string;
  /** Printed unit ("" for text and dimensionless). */
  readonly unit: string;
  readonly numeric: boolean;
  readonly cell: (row: Record<string, unknown>) => string;
}

/** Resolves the columns: checks them and builds each cell formatter. */
export function resolveColumns(
  columns: readonly TableColumn[],
  options: TableOptions,
): ResolvedColumn[] {
  if (!Array.isArray(columns) || columns.length === 0) {
    throw new InputError({
      input: "columns",
      unit: "-",
      validRange: "a non-empty array of column specs",
      received: columns,
    });
  }
  const missing = options.missing ?? "–";
  return columns.map((c, i) => {
    if (typeof c?.key !== "string" || typeof c.label !== "string") {
      throw new InputError({
        input: `columns[${i}]`,
        unit: "-",
        validRange: "{ key: string, label: string, ... }",
        received: c,
      });
    }
    if (isTextColumn(c)) {
      return {
        label: c.label,
        unit: "",
        numeric: false,
        cell: (row) => {
          const v = row[c.key];
          // a phase kind ("vapor") is printed as the reader's word ("vapour")
          return v === undefined || v === null ? missing : phaseWord(String(v));
        },
      };
    }
    const unitId = c.unit ?? (c.quantity ? resolveUnit(c.quantity, options.units).id : undefined);
    const flow = unitId === undefined ? undefined : flowUnit(unitId);
    const dimensionless = unitId === undefined || unitId === "-" || unitId === "%" || !!flow;
    // a flow unit: SI (mol/s or kg/s) per unit
    const scale = flow ? 1 / flow.factor : unitId === "%" ? 100 : 1;
    const symbol =
      unitId === undefined || unitId === "-" ? "" : flow ? flow.symbol : prettySymbol(unitId);
    const format = { digits: c.digits, decimals: c.decimals };
    // Check the unit (and the molar mass for mass units) once, before any row; a per-row molar
    // mass is checked in each cell.
    if (!dimensionless)
      fromSI(1, unitId, {
        molarMassKgPerMol: c.molarMassKey !== undefined ? 0.1 : options.molarMassKgPerMol,
        difference: true,
        input: `columns[${i}] (${c.key})`,
      });
    formatSignificant(1, format);
    return {
      label: c.label,
      unit: symbol,
      numeric: true,
      cell: (row) => {
        const v = row[c.key];
        if (v === undefined || v === null) return missing;
        if (typeof v !== "number") {
          throw new InputError({
            input: `row.${c.key}`,
            unit: unitId ?? "-",
            validRange: "a number",
            received: v,
          });
        }
        if (!Number.isFinite(v)) return formatSignificant(v, format);
        const shown = dimensionless
          ? v * scale
          : fromSI(v, unitId, {
              molarMassKgPerMol:
                c.molarMassKey !== undefined
                  ? (row[c.molarMassKey] as number)
                  : options.molarMassKgPerMol,
              difference: c.difference,
              input: `row.${c.key}`,
            });
        return formatSignificant(shown, format);
      },
    };
  });
}

/** A molar or mass flow unit (kmol/h, t/h, ...), or undefined for any other unit. */
function flowUnit(id: string): FlowUnitDefinition | undefined {
  try {
    const def = lookupFlowUnit(id);
    return def.kind === "molar" || def.kind === "mass" ? def : undefined;
  } catch {
    return undefined;
  }
}

/** The printed symbol of a unit: the charts' pretty form when known (°C, m³/kmol), else as given. */
function prettySymbol(id: string): string {
  for (const list of Object.values(DISPLAY_UNITS)) {
    const found = list.find((u) => u.id === id);
    if (found) return found.symbol;
  }
  return id;
}
