/**
 * Binary interaction parameters for the van der Waals one-fluid mixing rule,
 * a_ij = sqrt(a_i a_j) (1 - k_ij) (van der Waals 1873; the k_ij correction as in Soave 1972 and
 * Peng & Robinson 1976). Values come from eos/data/kij.json (each with its source) or from the
 * caller; a pair found in neither is set to zero and listed in `defaultedPairs`, so a result can
 * say that it assumed k_ij = 0.
 */
import table from "../data/kij.json";
import { InputError } from "../../errors.js";

/** One pair's value and where it came from. */
export interface InteractionNote {
  /** The two component ids. */
  readonly pair: readonly [string, string];
  readonly kij: number;
  /** "user" for a caller's matrix, the table's citation otherwise, "default: no value known" for 0. */
  readonly source: string;
}

/** The resolved, symmetric k_ij matrix and its provenance. */
export interface InteractionMatrix {
  /** k[i][j], symmetric, zero diagonal. */
  readonly kij: readonly (readonly number[])[];
  /** Provenance of every off-diagonal pair (i < j). */
  readonly notes: readonly InteractionNote[];
  /** Pairs set to zero because no value was known (a short text per pair, e.g. "hydrogen/methane"). */
  readonly defaultedPairs: readonly string[];
}

interface TablePair {
  components: string[];
  family: string;
  kij: number;
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
  const pairs = (table.pairs as TablePair[]).filter((p) => p.family === family);
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const a = componentIds[i];
      const b = componentIds[j];
      let value = 0;
      let source = "default: no value known, k_ij = 0 assumed";
      if (userKij !== undefined) {
        value = userKij[i][j];
        source = "user";
      } else {
        const hit = pairs.find(
          (p) =>
            (p.components[0] === a && p.components[1] === b) ||
            (p.components[0] === b && p.components[1] === a),
        );
        if (hit) {
          value = hit.kij;
          source = hit.source;
        } else if (a !== b) {
          defaulted.push(`${a}/${b}`);
        }
      }
      k[i][j] = value;
      k[j][i] = value;
      notes.push({ pair: [a, b], kij: value, source });
    }
  }
  return { kij: k, notes, defaultedPairs: defaulted };
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
