/**
 * `isochor table <states.csv>`: a CSV of states in (headers `name [unit]`, the P-V-T import's
 * convention), a table of properties out (CSV with units in the headers; JSON or Parquet with
 * --output). The input columns are one specification pair: T and P, T and rho, P and h, or P and
 * s, in any unit the units module knows for that dimension ("T [degC]", "P [barg]",
 * "h [kJ/kg]"); mass-based units use the fluid's molar mass. Each row is one point of a sweep
 * (sweep/), so a failing row gets its error in the `error [-]` column and the others are
 * computed. Output columns: the properties asked (--properties), in SI molar units unless
 * --units names others ("h=kJ/kg,T=degC,P=barg"). Exit codes: 0 done (also with failed rows,
 * counted on stderr); 1 the input was refused; 2 usage error.
 */
import * as fs from "node:fs";
import * as path from "node:path";
import { IsochorError } from "../errors.js";
import { defineFluid, type Fluid } from "../fluid/defineFluid.js";
import { isModelId } from "../eos/createModel.js";
import { fromSI, toSI } from "../units/convert.js";
import type { Dimension } from "../units/dimension.js";
import { tokenizeCsv } from "../pvt/tokenizeCsv.js";
import { SWEEP_PROPERTIES, type SweepProperty, type SweepSpecification } from "../sweep/types.js";
import { tableOfSweep, type PropertyTable } from "../propertyTables/propertyTable.js";
import { tableCsv } from "../propertyTables/tableCsv.js";
import { writePropertyTable } from "../propertyTables/tableParquet.js";
import { parseCliArgs } from "./cliArgs.js";
import type { CliIo } from "./io.js";

const USAGE = `usage: isochor table <states.csv> --components <ids> [options]

Properties of many states: a CSV of states in, a table of properties out.
Input columns (headers "name [unit]", '#' lines are comments), one pair of:
  T and P,  T and rho,  P and h,  P and s
e.g. "T [degC],P [barg]" or "P [MPa],h [kJ/kg]".

options:
  --components <ids>   component ids, comma-separated (e.g. methane,ethane)
  --x <fractions>      mole fractions, comma-separated (mixtures)
  --model <id>         model id (default peng-robinson)
  --properties <list>  properties to write (default T,P,rho,h,s,cp,w); any of
                       ${SWEEP_PROPERTIES.join(", ")}
  --units <list>       output units per property, e.g. "T=degC,P=barg,h=kJ/kg,rho=kg/m3"
  --output <file>      write to a file (.csv, .json or .parquet) instead of stdout (CSV)
  -h, --help           show this help

units: inputs in the units of their headers, converted as the library's units (gauge pressure
  against 101325 Pa, "psi" refused as ambiguous); outputs SI molar (K, Pa, mol/m3, J/mol,
  J/(mol K), m/s, K/Pa) unless --units says otherwise. Mixture points that split are flashed.

example:
  npx isochor table states.csv --components methane,ethane --x 0.9,0.1 --units T=degC,h=kJ/kg
`;

const OPTIONS = {
  components: { needs: "component ids, comma-separated" },
  x: { needs: "mole fractions, comma-separated" },
  model: { needs: "a model id" },
  properties: { needs: "property names, comma-separated" },
  units: { needs: 'name=unit pairs, e.g. "T=degC,h=kJ/kg"' },
  output: { needs: "a file name" },
} as const;

/** Dimension of each input or output variable (for unit conversion). */
const DIMENSION: Partial<Record<SweepProperty, Dimension>> = {
  T: "temperature",
  P: "pressure",
  rho: "molar-density",
  rhoMass: undefined,
  h: "molar-energy",
  u: "molar-energy",
  a: "molar-energy",
  g: "molar-energy",
  hRes: "molar-energy",
  uRes: "molar-energy",
  aRes: "molar-energy",
  gRes: "molar-energy",
  s: "molar-entropy",
  sRes: "molar-entropy",
  cp: "molar-entropy",
  cv: "molar-entropy",
  cpRes: "molar-entropy",
  cvRes: "molar-entropy",
  w: "speed",
  jt: "joule-thomson",
};

const PAIRS: readonly [SweepSpecification, SweepProperty, SweepProperty][] = [
  ["TP", "T", "P"],
  ["TRho", "T", "rho"],
  ["PH", "P", "h"],
  ["PS", "P", "s"],
];

class TableInputError extends Error {}

function list(text: string | undefined): string[] {
  return text === undefined ? [] : text.split(",").map((s) => s.trim());
}

/** Reads the states file: the specification pair and both columns in SI. */
function readStates(
  text: string,
  source: string,
  M: number,
): { specification: SweepSpecification; first: number[]; second: number[] } {
  const csv = tokenizeCsv(text, source);
  const [header, ...rows] = csv.rows;
  if (header === undefined) throw new TableInputError(`${source}: no header line`);
  const columns = header.cells.map((cell, index) => {
    const m = /^(.+?)\s*\[([^\]]*)\]\s*$/.exec(cell);
    if (!m) {
      throw new TableInputError(
        `${source}, line ${header.line}, column ${index + 1}: expected a header "name [unit]", e.g. "T [degC]", found ${JSON.stringify(cell)}`,
      );
    }
    return { name: m[1].trim(), unit: m[2].trim(), index };
  });
  const names = columns.map((c) => c.name);
  const pair = PAIRS.find(([, a, b]) => names.includes(a) && names.includes(b));
  if (pair === undefined || columns.length !== 2) {
    throw new TableInputError(
      `${source}: the header must name one pair of T and P, T and rho, P and h, or P and s (found ${names.join(", ") || "nothing"})`,
    );
  }
  const [specification, a, b] = pair;
  const read = (name: SweepProperty): number[] => {
    const col = columns.find((c) => c.name === name)!;
    return rows.map((row) => {
      const cell = row.cells[col.index];
      if (row.cells.length !== columns.length) {
        throw new TableInputError(
          `${source}, line ${row.line}: ${row.cells.length} cells, the header has ${columns.length}`,
        );
      }
      const value = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(cell) ? Number(cell) : NaN;
      if (!Number.isFinite(value)) {
        throw new TableInputError(
          `${source}, line ${row.line}, column ${col.index + 1} (${name}): expected a number, found ${JSON.stringify(cell)}`,
        );
      }
      try {
        return toSI(value, col.unit, {
          dimension: DIMENSION[name],
          molarMassKgPerMol: M,
          input: `${source}, line ${row.line}, ${name}`,
        });
      } catch (e) {
        throw new TableInputError(e instanceof Error ? e.message : String(e));
      }
    });
  };
  return { specification, first: read(a), second: read(b) };
}

/** The table with its columns converted to the units asked for. */
function convertTable(table: PropertyTable, units: Map<string, string>, M: number): PropertyTable {
  if (units.size === 0) return table;
  const values: Partial<Record<SweepProperty, Float64Array>> = { ...table.values };
  const unitOf: Record<string, string> = { ...table.metadata.units };
  for (const [name, unit] of units) {
    const p = name as SweepProperty;
    const col = table.values[p];
    if (col === undefined) {
      throw new TableInputError(`--units names ${name}, which is not an output column`);
    }
    const dimension = DIMENSION[p];
    if (dimension === undefined) {
      throw new TableInputError(`--units: ${name} is written in ${unitOf[name]} only`);
    }
    const out = new Float64Array(col.length);
    for (let i = 0; i < col.length; i++) {
      out[i] = Number.isFinite(col[i])
        ? fromSI(col[i], unit, { dimension, molarMassKgPerMol: M, input: name })
        : NaN;
    }
    values[p] = out;
    unitOf[name] = unit;
  }
  return { ...table, values, metadata: { ...table.metadata, units: unitOf } };
}

/** `isochor table`: see the file header. */
export async function tableCommand(argv: string[], io: CliIo): Promise<number> {
  const args = parseCliArgs(argv, OPTIONS);
  if (args === "help") {
    io.stdout(USAGE);
    return 0;
  }
  if ("error" in args) {
    io.stderr(`isochor table: ${args.error}\n${USAGE}`);
    return 2;
  }
  const v = args.values;
  if (args.positionals.length !== 1) {
    io.stderr(`isochor table: give one CSV file of states\n${USAGE}`);
    return 2;
  }
  const components = list(v.components);
  if (components.length === 0 || components.some((c) => c === "")) {
    io.stderr(`isochor table: --components needs component ids\n${USAGE}`);
    return 2;
  }
  const model = v.model ?? "peng-robinson";
  if (!isModelId(model)) {
    io.stderr(`isochor table: unknown model ${JSON.stringify(model)}\n`);
    return 2;
  }
  const properties = list(v.properties ?? "T,P,rho,h,s,cp,w") as SweepProperty[];
  const bad = properties.find((p) => !SWEEP_PROPERTIES.includes(p));
  if (bad !== undefined) {
    io.stderr(`isochor table: unknown property ${JSON.stringify(bad)} in --properties\n`);
    return 2;
  }
  const units = new Map<string, string>();
  for (const item of list(v.units)) {
    const m = /^([A-Za-z]+)\s*=\s*(.+)$/.exec(item);
    if (!m) {
      io.stderr(`isochor table: --units needs name=unit pairs, found ${JSON.stringify(item)}\n`);
      return 2;
    }
    units.set(m[1], m[2].trim());
  }
  const file = path.resolve(io.cwd, args.positionals[0]);
  try {
    let fluid: Fluid;
    try {
      fluid = defineFluid({ components, model });
    } catch (e) {
      throw new TableInputError(e instanceof Error ? e.message : String(e));
    }
    let x: number[] | undefined;
    if (v.x !== undefined) {
      x = list(v.x).map((s) =>
        /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(s) ? Number(s) : NaN,
      );
    }
    const z = x ?? (components.length === 1 ? [1] : undefined);
    if (z === undefined) throw new TableInputError("--x is needed for a mixture");
    let M = 0;
    for (let i = 0; i < z.length && i < fluid.components.length; i++) {
      M += z[i] * fluid.components[i].molarMassKgPerMol;
    }
    const text = fs.readFileSync(file, "utf8");
    const states = readStates(text, args.positionals[0], M);
    const result = fluid.sweep({
      specification: states.specification,
      layout: "pairs",
      first: states.first,
      second: states.second,
      x: z,
      properties,
    });
    const table = convertTable(tableOfSweep(result), units, M);
    if (result.failed > 0) {
      io.stderr(
        `isochor table: ${result.failed} of ${result.count} rows failed (see the error column)\n`,
      );
    }
    if (v.output !== undefined) {
      await writePropertyTable(path.resolve(io.cwd, v.output), table);
    } else {
      io.stdout(tableCsv(table));
    }
    return 0;
  } catch (e) {
    if (e instanceof TableInputError || e instanceof IsochorError) {
      io.stderr(`isochor table: ${e.message}\n`);
      return 1;
    }
    if ((e as NodeJS.ErrnoException).code === "ENOENT") {
      io.stderr(`isochor table: no such file ${file}\n`);
      return 1;
    }
    throw e;
  }
}
