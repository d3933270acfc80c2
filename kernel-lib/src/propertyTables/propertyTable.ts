/**
 * Property tables for other programs (lookup tables for simulators, data tools): a sweep of a
 * fluid over a uniform or given grid in (T, P) or (P, h) (any sweep specification works), as
 * columns with units, the phase flags of every point, and a metadata block (model, components,
 * composition, reference state, units, basis, isochor version). Writers: tableCsv.ts (headers
 * `name [unit]`, the convention of the P-V-T import, metadata as `#` lines), tableJson.ts,
 * tableParquet.ts (Apache Parquet through hyparquet-writer).
 */
import * as fs from "node:fs";
import * as path from "node:path";
import type { Fluid } from "../fluid/defineFluid.js";
import type { ReferenceState } from "../idealgas/types.js";
import {
  SWEEP_ERROR_CODES,
  SWEEP_PHASE_KINDS,
  type SweepProperty,
  type SweepRequest,
  type SweepResult,
} from "../sweep/types.js";

/** The metadata block of a table. */
export interface TableMetadata {
  readonly producer: "isochor";
  /** isochor's version (kernel-lib/package.json). */
  readonly version: string;
  readonly model: { readonly id: string; readonly name: string; readonly citation: string };
  readonly components: readonly string[];
  /** Mole fractions of the components. */
  readonly x: readonly number[];
  readonly referenceState: ReferenceState;
  readonly basis: "molar" | "mass";
  /** The specification pair of the grid, e.g. "TP". */
  readonly specification: string;
  readonly layout: "grid" | "pairs";
  /** Grid shape [first, second] (pairs: [count, 1]). */
  readonly shape: readonly [number, number];
  /** Unit of every column. */
  readonly units: Readonly<Record<string, string>>;
  /** Codes of the "phases", "phase" and "error" columns. */
  readonly phaseKinds: Readonly<Record<string, number>>;
  readonly errorCodes: Readonly<Record<string, number>>;
  /** Sweep-wide warnings. */
  readonly warnings: readonly string[];
  /** Failed points (their cells are empty / null / NaN, the error column says why). */
  readonly failed: number;
}

/** A table: numeric columns in order, the phase flags, and the metadata. */
export interface PropertyTable {
  /** Column names in order (numeric columns). */
  readonly columns: readonly SweepProperty[];
  readonly values: Readonly<Partial<Record<SweepProperty, Float64Array>>>;
  /** Phases present per point (0 at failed points). */
  readonly phaseCount: Uint8Array;
  /** Phase-kind code per point (metadata.phaseKinds). */
  readonly phaseKind: Uint8Array;
  /** Error code per point (metadata.errorCodes). */
  readonly errorCode: Uint8Array;
  readonly metadata: TableMetadata;
}

/** The two variables that specify the points of each specification. */
const INPUTS: Record<string, readonly [SweepProperty, SweepProperty]> = {
  TP: ["T", "P"],
  TRho: ["T", "rho"],
  PH: ["P", "h"],
  PS: ["P", "s"],
};

let versionCache: string | undefined;

/** isochor's version from kernel-lib/package.json ("unknown" when it cannot be read). */
export function isochorVersion(): string {
  if (versionCache !== undefined) return versionCache;
  for (const dir of [path.join(__dirname, "..", ".."), path.join(__dirname, "..", "..", "..")]) {
    try {
      const pkg = JSON.parse(fs.readFileSync(path.join(dir, "package.json"), "utf8")) as {
        name?: unknown;
        version?: unknown;
      };
      if (pkg.name === "isochor" && typeof pkg.version === "string") {
        versionCache = pkg.version;
        return versionCache;
      }
    } catch {
      // try the next place
    }
  }
  versionCache = "unknown";
  return versionCache;
}

/** The table of a sweep result: its input variables first, then the other properties. */
export function tableOfSweep(result: SweepResult): PropertyTable {
  const inputs = INPUTS[result.specification] ?? [];
  const columns = [
    ...inputs.filter((p) => result.values[p] !== undefined),
    ...(Object.keys(result.values) as SweepProperty[]).filter((p) => !inputs.includes(p)),
  ];
  const units: Record<string, string> = {};
  for (const c of columns) units[c] = result.units[c]!;
  return {
    columns,
    values: result.values,
    phaseCount: result.phaseCount,
    phaseKind: result.phaseKind,
    errorCode: result.errorCode,
    metadata: {
      producer: "isochor",
      version: isochorVersion(),
      model: {
        id: result.model.id,
        name: result.model.name,
        citation: result.model.citation,
      },
      components: result.componentIds.slice(),
      x: result.x.slice(),
      referenceState: result.referenceState,
      basis: result.basis,
      specification: result.specification,
      layout: result.layout,
      shape: result.shape,
      units,
      phaseKinds: { ...SWEEP_PHASE_KINDS },
      errorCodes: { ...SWEEP_ERROR_CODES },
      warnings: result.warnings.map((w) => w.message),
      failed: result.failed,
    },
  };
}

/** Options of {@link propertyTable}: a sweep request whose input variables are always columns. */
export type PropertyTableRequest = SweepRequest;

/**
 * Sweeps `fluid` over the request's grid and returns the table, the input variables as the
 * first columns (added when not asked for).
 *
 * @example
 * ```ts
 * const t = propertyTable(gas, { specification: "TP", first: { from: 250, to: 400, count: 31 },
 *   second: { from: 1e5, to: 60e5, count: 60 }, x, properties: ["h", "s", "rho"] });
 * fs.writeFileSync("gas.csv", tableCsv(t));
 * ```
 */
export function propertyTable(fluid: Fluid, request: PropertyTableRequest): PropertyTable {
  const inputs = INPUTS[request.specification] ?? [];
  const properties = [
    ...inputs,
    ...(Array.isArray(request.properties) ? request.properties : []).filter(
      (p) => !inputs.includes(p),
    ),
  ];
  return tableOfSweep(fluid.sweep({ ...request, properties }));
}

/** Name of a code in a legend, or "" for an unknown code. */
export function codeName(legend: Readonly<Record<string, number>>, code: number): string {
  for (const [name, value] of Object.entries(legend)) if (value === code) return name;
  return "";
}
