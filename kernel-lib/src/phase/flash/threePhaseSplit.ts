/**
 * A split into up to three phases at given T and P by successive substitution: the amounts and
 * compositions at fixed K-values from Michelsen's Q function (multiphaseRachfordRice.ts), then
 * K_ki = phi_ri / phi_ki relative to a reference phase r from each phase's ln phi in its own root
 * of lowest Gibbs energy (twoPhaseSplit.ts phaseLnPhi), as in M. L. Michelsen and J. M. Mollerup,
 * Thermodynamic Models: Fundamentals and Computational Aspects, 2nd ed. (2007), ch. 11. The
 * reference is the phase of largest amount. A phase whose amount stays at zero for three steps has
 * vanished: the caller goes on with the others. Every fifth step the ln K vector of all phases is
 * extrapolated by the dominant eigenvalue of the substitution (M. L. Michelsen, Fluid Phase
 * Equilib. 9 (1982) 21-40, as in twoPhaseSplit.ts), kept only when it lowers the largest ln f
 * difference (near a critical point of two of the phases plain substitution crawls).
 */
import type { ResidualModel } from "../../eos/types.js";
import { solveMultiphaseSplit } from "./multiphaseRachfordRice.js";
import { normalizeComposition, phaseLnPhi, type WorkingPhase } from "./twoPhaseSplit.js";

/** Outcome of {@link convergeMultiphase}. */
export interface MultiphaseOutcome {
  readonly converged: boolean;
  /** The phases still present (amount > 0) when it stopped. */
  readonly phases: WorkingPhase[];
  /** True when a phase vanished (amount zero for three steps): `phases` holds the others. */
  readonly vanished: boolean;
  readonly error: number;
  readonly iterations: number;
  readonly reason?: string;
}

/**
 * Converges a multiphase split of z at T (K), P (Pa) from starting phases (compositions and
 * amounts; ln phi is recomputed).
 */
export function convergeMultiphase(
  model: ResidualModel,
  T: number,
  P: number,
  z: readonly number[],
  present: readonly number[],
  start: readonly WorkingPhase[],
  tolerance: number,
  maxIterations: number,
): MultiphaseOutcome {
  const np = start.length;
  const n = z.length;
  const phases: WorkingPhase[] = start.map((p) => {
    const f = phaseLnPhi(model, T, P, p.x);
    return { x: p.x.slice(), lnPhi: f.lnPhi, densityMolPerM3: f.rho, amount: p.amount };
  });
  const zeroCount = new Array<number>(np).fill(0);
  let error = Infinity;
  let iterations = 0;
  let r = 0;
  for (let k = 1; k < np; k++) if (phases[k].amount > phases[r].amount) r = k;
  // dominant-eigenvalue acceleration (as in twoPhaseSplit.ts) of the ln K vector of all phases
  let lastLnK: number[] | undefined;
  let lastStep: number[] | undefined;
  for (; iterations < maxIterations; iterations++) {
    const lnK: number[] = [];
    for (let k = 0; k < np; k++)
      for (const i of present) lnK.push(phases[r].lnPhi[i] - phases[k].lnPhi[i]);
    let saved: { phases: WorkingPhase[]; zeroCount: number[]; error: number } | undefined;
    const step = lastLnK === undefined ? undefined : lnK.map((v, j) => v - lastLnK![j]);
    if (step !== undefined && lastStep !== undefined && iterations % 5 === 4) {
      let dd = 0;
      let dp = 0;
      for (let j = 0; j < step.length; j++) {
        dd += step[j] * step[j];
        dp += lastStep[j] * step[j];
      }
      const lambda = dd / dp;
      if (lambda > 0 && lambda < 1 && Number.isFinite(lambda)) {
        saved = {
          phases: phases.map((p) => ({ ...p, x: p.x.slice(), lnPhi: p.lnPhi.slice() })),
          zeroCount: zeroCount.slice(),
          error,
        };
        const factor = lambda / (1 - lambda);
        for (let j = 0; j < lnK.length; j++) lnK[j] += factor * step[j];
      }
    }
    lastStep = saved === undefined ? step : undefined;
    lastLnK = saved === undefined ? lnK : undefined;
    const K: number[][] = [];
    for (let k = 0, j = 0; k < np; k++) {
      const row = new Array<number>(n).fill(1);
      for (const i of present) row[i] = Math.exp(lnK[j++]);
      K.push(row);
    }
    let split: ReturnType<typeof solveMultiphaseSplit>;
    try {
      split = solveMultiphaseSplit(z, K, { start: phases.map((p) => Math.max(p.amount, 0)) });
    } catch (e) {
      if (saved === undefined) throw e;
      continue; // the extrapolated K-values: no split; go on by plain substitution
    }
    for (let k = 0; k < np; k++) {
      phases[k].amount = split.beta[k];
      phases[k].x = normalizeComposition(split.x[k]);
      const f = phaseLnPhi(model, T, P, split.x[k]);
      phases[k].lnPhi = f.lnPhi;
      phases[k].densityMolPerM3 = f.rho;
      zeroCount[k] = split.beta[k] > 0 ? 0 : zeroCount[k] + 1;
    }
    error = 0;
    for (let k = 0; k < np; k++) {
      if (!(phases[k].amount > 0) || k === r) continue;
      for (const i of present) {
        const d =
          Math.log(phases[k].x[i]) +
          phases[k].lnPhi[i] -
          Math.log(phases[r].x[i]) -
          phases[r].lnPhi[i];
        error = Math.max(error, Math.abs(d));
      }
    }
    if (saved !== undefined && !(error < saved.error)) {
      // the extrapolation did not lower the fugacity error: back to the phases before it
      for (let k = 0; k < np; k++) phases[k] = saved.phases[k];
      for (let k = 0; k < np; k++) zeroCount[k] = saved.zeroCount[k];
      error = saved.error;
      continue;
    }
    if (zeroCount.some((c) => c >= 3)) {
      return {
        converged: false,
        vanished: true,
        phases: phases.filter((p) => p.amount > 0),
        error,
        iterations: iterations + 1,
        reason: "a phase vanished",
      };
    }
    if (error <= tolerance && phases.every((p) => p.amount > 0)) {
      return { converged: true, vanished: false, phases, error, iterations: iterations + 1 };
    }
  }
  return {
    converged: false,
    vanished: false,
    phases,
    error,
    iterations,
    reason: `not converged in ${maxIterations} substitution steps (last max |ln f difference| = ${error.toExponential(2)})`,
  };
}
