/**
 * Binary interaction parameters for the van der Waals one-fluid mixing rule,
 * a_ij = sqrt(a_i a_j) (1 - k_ij) (van der Waals 1873; the k_ij correction as in Soave 1972 and
 * Peng & Robinson 1976). Values come from eos/data/kij.json (each with its source) or from the
 * caller. A pair in neither that a prediction rule of the table covers (alkane/alkane pairs for
 * Peng-Robinson and Soave-Redlich-Kwong) is predicted from the table's critical volumes and listed
 * in `predictedPairs`; any other pair is set to zero and listed in `defaultedPairs`, so a result
 * can say which k_ij were predicted and which assumed zero.
 *
 * Prediction: the critical-volume correlation of Chueh & Prausnitz, AIChE J. 13 (1967) 1099-1107,
 *   k_ij = 1 - (2 (Vc_i Vc_j)^(1/6) / (Vc_i^(1/3) + Vc_j^(1/3)))^n,
 * with the exponent n given in kij.json (n = 1 there; the paper's n = 3 belongs to its
 * Redlich-Kwong T_cij rule). Critical volumes and formulas come from the component table by id
 * (components/data/components.json), so a user component under a table id is predicted with the
 * table's constants; a component not in the table is never predicted.
 */
import table from "../data/kij.json";
import { InputError } from "../../errors.js";
import { parseFormula } from "../../components/formula.js";
import { rawComponentTable } from "../../components/table.js";

/** One pair's value and where it came from. */
export interface InteractionNote {
  /** The two component ids. */
  readonly pair: readonly [string, string];
  readonly kij: number;
  /**
   * "user" for a caller's matrix, the table's citation for a listed pair, the method and its
   * citation for a predicted pair, "default: no value known, k_ij = 0 assumed" for 0.
   */
  readonly source: string;
  /** Where the value came from: the caller, the table, a prediction, or the zero default. */
  readonly basis?: InteractionBasis;
}

/** Kind of origin of one k_ij value. */
export type InteractionBasis = "user" | "table" | "predicted" | "default";

/** The resolved, symmetric k_ij matrix and its provenance. */
export interface InteractionMatrix {
  /** k[i][j], symmetric, zero diagonal. */
  readonly kij: readonly (readonly number[])[];
  /** Provenance of every off-diagonal pair (i < j). */
  readonly notes: readonly InteractionNote[];
  /** Pairs set to zero because no value was known (a short text per pair, e.g. "hydrogen/methane"). */
  readonly defaultedPairs: readonly string[];
  /** Pairs whose k_ij was predicted (not tabulated), e.g. "methane/ethane"; see the notes' sources. */
  readonly predictedPairs?: readonly string[];
}

interface TablePair {
  components: string[];
  family: string;
  kij: number;
  source: string;
}

/** One prediction rule of kij.json. */
interface TablePrediction {
  method: string;
  families: string[];
  appliesTo: string;
  exponent: number;
  source: string;
}

/** Equation families that share k_ij values (PR 1976 and 1978 share; RK, vdW have none tabulated). */
export type InteractionFamily =
  | "peng-robinson"
  | "soave-redlich-kwong"
  | "redlich-kwong"
  | "van-der-waals"
  | "virial"
  | "lee-kesler";

/**
 * Builds the k_ij matrix for these components.
 *
 * @param componentIds - component ids in composition order.
 * @param family - which table column to read.
 * @param userKij - optional N x N matrix from the caller; it wins over the table for every pair.
 *   Must be symmetric (to 1e-12), finite, with a zero diagonal.
 * @param inputName - how to name the matrix in error messages (default "kij").
 */
export function resolveInteractions(
  componentIds: readonly string[],
  family: InteractionFamily,
  userKij?: readonly (readonly number[])[],
  inputName = "kij",
): InteractionMatrix {
  const n = componentIds.length;
  if (userKij !== undefined) checkUserMatrix(userKij, n, inputName);
  const k: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  const notes: InteractionNote[] = [];
  const defaulted: string[] = [];
  const predicted: string[] = [];
  const pairs = (table.pairs as TablePair[]).filter((p) => p.family === family);
  const rule = (table.predictions as TablePrediction[]).find((r) => r.families.includes(family));
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const a = componentIds[i];
      const b = componentIds[j];
      let value = 0;
      let source = "default: no value known, k_ij = 0 assumed";
      let basis: InteractionBasis = "default";
      if (userKij !== undefined) {
        value = userKij[i][j];
        source = "user";
        basis = "user";
      } else {
        const hit = pairs.find(
          (p) =>
            (p.components[0] === a && p.components[1] === b) ||
            (p.components[0] === b && p.components[1] === a),
        );
        const guess = hit === undefined && a !== b ? predictPair(rule, a, b) : undefined;
        if (hit) {
          value = hit.kij;
          source = hit.source;
          basis = "table";
        } else if (guess !== undefined) {
          value = guess;
          source = rule?.source ?? "predicted";
          basis = "predicted";
          predicted.push(`${a}/${b}`);
        } else if (a !== b) {
          defaulted.push(`${a}/${b}`);
        }
      }
      k[i][j] = value;
      k[j][i] = value;
      notes.push({ pair: [a, b], kij: value, source, basis });
    }
  }
  return { kij: k, notes, defaultedPairs: defaulted, predictedPairs: predicted };
}

/**
 * The Chueh-Prausnitz (1967) critical-volume estimate of k_ij for two critical molar volumes (any
 * one unit, both the same), with exponent n:
 *   k_ij = 1 - (2 (Vc_i Vc_j)^(1/6) / (Vc_i^(1/3) + Vc_j^(1/3)))^n.
 * Zero for equal volumes, growing with the size ratio. Throws InputError for a volume that is not
 * a finite positive number or an exponent outside (0, 10].
 *
 * @example chuehPrausnitzKij(98.6, 624, 1) // methane/n-decane, cm3/mol: 0.0455
 */
export function chuehPrausnitzKij(vcI: number, vcJ: number, exponent: number): number {
  for (const [name, v] of [
    ["vcI", vcI],
    ["vcJ", vcJ],
  ] as const) {
    if (!(v > 0 && v < Infinity)) {
      throw new InputError({
        input: name,
        unit: "critical volume (any unit)",
        validRange: "a finite number > 0",
        received: v,
      });
    }
  }
  if (!(exponent > 0 && exponent <= 10)) {
    throw new InputError({
      input: "exponent",
      unit: "-",
      validRange: "a number in (0, 10]",
      received: exponent,
    });
  }
  const ci = Math.cbrt(vcI);
  const cj = Math.cbrt(vcJ);
  return 1 - Math.pow((2 * Math.sqrt(ci * cj)) / (ci + cj), exponent);
}

/** The predicted k_ij of a pair, or undefined when no rule covers it. */
function predictPair(rule: TablePrediction | undefined, a: string, b: string): number | undefined {
  if (rule === undefined || rule.method !== "chueh-prausnitz" || rule.appliesTo !== "alkane/alkane")
    return undefined;
  const ra = alkaneCriticalVolume(a);
  const rb = alkaneCriticalVolume(b);
  if (ra === undefined || rb === undefined) return undefined;
  return chuehPrausnitzKij(ra, rb, rule.exponent);
}

/** Critical volume (cm3/mol) of a table component that is an alkane C_nH_(2n+2), else undefined. */
function alkaneCriticalVolume(id: string): number | undefined {
  const rec = rawComponentTable.components.find((c) => c.id === id);
  if (rec === undefined) return undefined;
  const f = parseFormula(rec.formula);
  const nC = f.C ?? 0;
  const isAlkane = nC >= 1 && f.H === 2 * nC + 2 && Object.keys(f).length === 2;
  return isAlkane ? rec.criticalVolumeCm3PerMol : undefined;
}

function checkUserMatrix(m: readonly (readonly number[])[], n: number, name: string): void {
  if (!Array.isArray(m) || m.length !== n) {
    throw new InputError({
      input: name,
      unit: "-",
      validRange: `an ${n} x ${n} matrix (one row per component)`,
      received: Array.isArray(m) ? `${m.length} rows` : m,
    });
  }
  for (let i = 0; i < n; i++) {
    if (!Array.isArray(m[i]) || m[i].length !== n) {
      throw new InputError({
        input: `${name}[${i}]`,
        unit: "-",
        validRange: `a row of ${n} numbers`,
        received: m[i],
      });
    }
    for (let j = 0; j < n; j++) {
      const v = m[i][j];
      if (!(typeof v === "number" && Number.isFinite(v) && v < 1)) {
        throw new InputError({
          input: `${name}[${i}][${j}]`,
          unit: "-",
          validRange: "a finite number < 1",
          received: v,
        });
      }
      if (i === j && v !== 0) {
        throw new InputError({
          input: `${name}[${i}][${i}]`,
          unit: "-",
          validRange: "0 (a component does not interact with itself)",
          received: v,
        });
      }
      if (!(Math.abs(v - m[j][i]) <= 1e-12)) {
        throw new InputError({
          input: `${name}[${i}][${j}]`,
          unit: "-",
          validRange: `equal to ${name}[${j}][${i}] = ${m[j][i]} (k_ij is symmetric)`,
          received: v,
        });
      }
    }
  }
}
