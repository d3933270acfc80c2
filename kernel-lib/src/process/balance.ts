/**
 * The energy and material balances of a process step, closed before its result is returned.
 * The outlets are the flashed states and the power and duty those of the specification, so a
 * balance that does not close means a flash missed its specification or the bookkeeping is wrong:
 * a SolverError, never a silent number.
 */
import { R as R_CODATA } from "../constants.js";
import { SolverError } from "../errors.js";
import { streamEnthalpyJPerMol, type Stream } from "./stream.js";
import type { StepCheck } from "./types.js";

/** Default tolerance of the balances (relative). */
export const BALANCE_TOLERANCE = 1e-9;

/**
 * Closes the balances of a step: inlets plus power plus duty equal the outlets.
 *
 * @param powerW - W into the fluid (0 when none).
 * @param dutyW - W into the fluid (0 when none).
 * @throws SolverError when either balance is off by more than `tolerance`.
 */
export function closeBalances(
  what: string,
  inlets: readonly Stream[],
  outlets: readonly Stream[],
  powerW: number,
  dutyW: number,
  tolerance: number = BALANCE_TOLERANCE,
): StepCheck {
  let energy = powerW + dutyW;
  let scale = Math.abs(powerW) + Math.abs(dutyW);
  let flowIn = 0;
  const n = inlets.length > 0 ? inlets[0].z.length : 0;
  const comp = new Array<number>(n).fill(0);
  const term = (s: Stream, sign: number): void => {
    const R = s.fluid.model.gasConstant ?? R_CODATA;
    const h = streamEnthalpyJPerMol(s);
    energy += sign * s.molarFlowMolPerS * h;
    scale += s.molarFlowMolPerS * Math.max(Math.abs(h), R * s.state.temperatureK);
    for (let i = 0; i < n; i++) comp[i] += sign * s.molarFlowMolPerS * s.z[i];
  };
  for (const s of inlets) {
    term(s, 1);
    flowIn += s.molarFlowMolPerS;
  }
  for (const s of outlets) term(s, -1);
  const energyBalanceRelativeError = scale > 0 ? Math.abs(energy) / scale : 0;
  let worst = 0;
  for (const c of comp) worst = Math.max(worst, Math.abs(c));
  const massBalanceRelativeError = flowIn > 0 ? worst / flowIn : 0;
  if (!(energyBalanceRelativeError <= tolerance && massBalanceRelativeError <= tolerance)) {
    throw new SolverError(
      `${what}: energy and material balance`,
      `the balances do not close: energy ${energyBalanceRelativeError.toExponential(3)} relative, material ${massBalanceRelativeError.toExponential(3)} relative (tolerance ${tolerance}); a flash missed its specification or a stream was lost`,
    );
  }
  return { energyBalanceRelativeError, massBalanceRelativeError, tolerance };
}
