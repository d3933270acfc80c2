/**
 * The path of a step as chart states: label, T, P, overall molar h and s of each equilibrium on
 * the path, in the shape the process-path chart reads (charts/processPath.ts, ProcessPathState;
 * the shape is written out here because process/ sits below charts/).
 */
import { overallProperty } from "../phase/flash/stateFunctionFlash.js";
import type { Equilibrium } from "../phase/flash/types.js";
import type { StepResult } from "./types.js";

/** One state of a path for the P-h, T-s and process-path charts (SI per mole). */
export interface PathState {
  readonly label: string;
  readonly temperatureK: number;
  readonly pressurePa: number;
  readonly enthalpyJPerMol: number;
  readonly entropyJPerMolK: number;
}

/**
 * The states of a step's path (or of a list of equilibria), labelled "inlet", "1", "2", ...,
 * "outlet" unless labels are given.
 *
 * @example
 * ```ts
 * processPathChart(pathStates(stage), { diagram: "temperature-entropy" });
 * ```
 */
export function pathStates(
  source: StepResult | readonly Equilibrium[],
  labels?: readonly string[],
): PathState[] {
  const path: readonly Equilibrium[] = Array.isArray(source)
    ? (source as readonly Equilibrium[])
    : (source as StepResult).path;
  const n = path.length;
  return path.map((eq, i) => ({
    label: labels?.[i] ?? (i === 0 ? "inlet" : i === n - 1 ? "outlet" : String(i)),
    temperatureK: eq.temperatureK,
    pressurePa: eq.pressurePa,
    enthalpyJPerMol: overallProperty(eq, "h"),
    entropyJPerMolK: overallProperty(eq, "s"),
  }));
}
