/**
 * The checks every split passes before a flash returns it, and the assembly of the result. The
 * phases' full states are built first (state/stateAt.ts stateAtTRho) and the checks are made on
 * those states, independently of the iteration that produced them:
 *   - equal fugacity: max_i |ln f_i(a) - ln f_i(b)| <= tolerance over present components and every
 *     pair of phases, with ln f_i = ln x_i + ln phi_i + ln P of each state;
 *   - Gibbs energy below the feed's single phase: (G_split - G_feed)/(nRT) <= 1e-12 (the allowance
 *     is the rounding of sums of x (ln x + ln phi) at the 1e-15 level; a real split lies below);
 *   - material balance: max_i |sum_k amount_k x_ik - z_i| <= 1e-12;
 *   - no trivial solution: every pair of phases differs somewhere by more than 1e-6 in a mole
 *     fraction (saturated phases of one present component: in density, relatively), and amounts
 *     lie in (0, 1];
 *   - labels from densities: phases sorted by density; the lightest is "vapor" unless it is
 *     liquid-like by the phase identification parameter (state/phaseLabel.ts), in which case the
 *     two liquids are "liquid" (lighter) and "liquid-2"; of three phases the lightest is the vapour.
 * A failed check is a SolverError naming the state and the check.
 */
import { SolverError, type ResultWarning } from "../../errors.js";
import { phaseIdentificationParameter } from "../../state/phaseLabel.js";
import { stateAtTRho } from "../../state/stateAt.js";
import type { FluidBinding, FluidState } from "../../state/types.js";
import type { StabilityResult } from "../stability.js";
import type { Equilibrium, EquilibriumPhase, PhaseKind } from "./types.js";
import { phaseLnPhi, type WorkingPhase } from "./twoPhaseSplit.js";

/** Tolerances of the checks. */
export interface VerifyTolerances {
  /** max |ln f_i(a) - ln f_i(b)|. Default 1e-10. */
  fugacity: number;
  /** max_i |sum_k amount_k x_ik - z_i|. Default 1e-12. */
  materialBalance: number;
  /** Largest accepted (G_split - G_feed)/(nRT). Default 1e-12. */
  gibbs: number;
}

export const DEFAULT_VERIFY: VerifyTolerances = Object.freeze({
  fugacity: 1e-10,
  materialBalance: 1e-12,
  gibbs: 1e-12,
});

/** Distinct compositions: some mole fraction differs by more than this. */
const TRIVIAL_DISTANCE = 1e-6;

/** Describes the state for error messages. */
export function describeState(
  binding: FluidBinding,
  T: number,
  P: number,
  z: readonly number[],
): string {
  const ids = binding.model.info.componentIds;
  return `T = ${T} K, P = ${P} Pa, z = {${z.map((v, i) => `${ids[i]}: ${v.toPrecision(6)}`).join(", ")}} (${binding.model.info.name})`;
}

/** The kind of a single phase: PIP > 1 liquid, else vapour. */
export function singlePhaseKind(binding: FluidBinding, state: FluidState): PhaseKind {
  return phaseIdentificationParameter(
    binding.model,
    state.temperatureK,
    state.densityMolPerM3,
    state.x,
  ) > 1
    ? "liquid"
    : "vapor";
}

/** What the flash says about how it got here. */
export interface AssemblyInfo {
  readonly iterations: number;
  readonly method: string;
  readonly stability?: StabilityResult;
  readonly warnings: readonly ResultWarning[];
  /**
   * One present component (saturated phases of a pure fluid): the phases have the same
   * composition and must differ in density instead.
   */
  readonly pureComponent?: boolean;
}

/**
 * Builds the phases' states, verifies the split (see the header) and returns the equilibrium.
 * @throws SolverError when a check fails.
 */
export function assembleEquilibrium(
  binding: FluidBinding,
  T: number,
  P: number,
  z: readonly number[],
  present: readonly number[],
  working: readonly WorkingPhase[],
  info: AssemblyInfo,
  tol: VerifyTolerances = DEFAULT_VERIFY,
): Equilibrium {
  const model = binding.model;
  const where = (): string => describeState(binding, T, P, z);
  const fail = (what: string): never => {
    throw new SolverError(`phase split verification (${info.method})`, `at ${where()}: ${what}`);
  };
  for (const p of working) {
    if (!(p.amount > 0 && p.amount <= 1 + 1e-12))
      fail(`a phase amount is ${p.amount}, outside (0, 1]`);
  }
  const states = working.map((p) => stateAtTRho(binding, T, p.densityMolPerM3, p.x));
  // equal fugacity, from the states' own ln phi and pressure
  let maxDiff = 0;
  for (let a = 0; a < states.length; a++) {
    for (let b = a + 1; b < states.length; b++) {
      let distance = 0;
      for (const i of present) {
        const fa = Math.log(states[a].x[i]) + states[a].lnPhi[i] + Math.log(states[a].pressurePa);
        const fb = Math.log(states[b].x[i]) + states[b].lnPhi[i] + Math.log(states[b].pressurePa);
        const d = Math.abs(fa - fb);
        if (!(d <= maxDiff)) maxDiff = Number.isNaN(d) ? Infinity : d;
        distance = Math.max(distance, Math.abs(states[a].x[i] - states[b].x[i]));
      }
      if (info.pureComponent === true) {
        const ra = states[a].densityMolPerM3;
        const rb = states[b].densityMolPerM3;
        if (!(Math.abs(ra - rb) > TRIVIAL_DISTANCE * Math.max(ra, rb))) {
          fail("the two saturated phases have the same density (trivial solution)");
        }
      } else if (!(distance > TRIVIAL_DISTANCE)) {
        fail(`two phases have the same composition within ${TRIVIAL_DISTANCE} (trivial solution)`);
      }
    }
  }
  if (!(maxDiff <= tol.fugacity)) {
    fail(
      `phase fugacities differ: max |ln f_i(a) - ln f_i(b)| = ${maxDiff.toExponential(3)} > ${tol.fugacity}`,
    );
  }
  // material balance
  let balance = 0;
  for (let i = 0; i < z.length; i++) {
    let s = 0;
    for (let k = 0; k < working.length; k++) s += working[k].amount * states[k].x[i];
    balance = Math.max(balance, Math.abs(s - z[i]));
  }
  if (!(balance <= tol.materialBalance)) {
    fail(
      `material balance not closed: max |sum_k amount_k x_ik - z_i| = ${balance.toExponential(3)} > ${tol.materialBalance}`,
    );
  }
  // Gibbs energy against the feed as one phase (its root of lowest Gibbs energy), both from
  // ln f - ln P at each phase's own density (see twoPhaseSplit.ts phaseLnPhi: the same convention
  // as the states', so the rounding of a stiff liquid's density root does not enter)
  const feed = phaseLnPhi(model, T, P, z);
  let gFeed = 0;
  for (const i of present) gFeed += z[i] * (Math.log(z[i]) + feed.lnPhi[i]);
  let gSplit = 0;
  for (let k = 0; k < states.length; k++) {
    const st = states[k];
    const lnPRatio = Math.log(st.pressurePa / P);
    let g = 0;
    for (const i of present) g += st.x[i] * (Math.log(st.x[i]) + st.lnPhi[i] + lnPRatio);
    gSplit += working[k].amount * g;
  }
  const dG = gSplit - gFeed;
  if (!(dG <= tol.gibbs)) {
    fail(
      `the split's Gibbs energy is not below the feed's single phase: (G_split - G_feed)/(nRT) = ${dG.toExponential(3)}`,
    );
  }
  // order by density and label
  const order = states
    .map((_, k) => k)
    .sort((a, b) => states[a].densityMolPerM3 - states[b].densityMolPerM3);
  for (let k = 1; k < order.length; k++) {
    if (!(states[order[k]].densityMolPerM3 > states[order[k - 1]].densityMolPerM3)) {
      fail("two phases have the same density");
    }
  }
  const warnings: ResultWarning[] = [...info.warnings];
  let kinds: PhaseKind[];
  if (order.length === 1) {
    kinds = [singlePhaseKind(binding, states[order[0]])];
  } else {
    const lightestLiquidLike = singlePhaseKind(binding, states[order[0]]) === "liquid";
    if (order.length === 2) {
      kinds = lightestLiquidLike ? ["liquid", "liquid-2"] : ["vapor", "liquid"];
    } else {
      kinds = ["vapor", "liquid", "liquid-2"];
      if (lightestLiquidLike) {
        warnings.push({
          code: "accuracy",
          message: `at ${where()} the lightest of three phases (${states[order[0]].densityMolPerM3.toPrecision(5)} mol/m3) is liquid-like by the phase identification parameter; it is labelled "vapor" as the lightest phase`,
        });
      }
    }
  }
  for (const s of states)
    for (const w of s.warnings)
      if (!warnings.some((v) => v.message === w.message)) warnings.push(w);
  const phases: EquilibriumPhase[] = order.map((k, j) => ({
    kind: kinds[j],
    amount: working[k].amount,
    state: states[k],
  }));
  return {
    temperatureK: T,
    pressurePa: P,
    z: z.slice(),
    phases,
    check: {
      maxLnFugacityDifference: maxDiff,
      gibbsChangeOverRT: states.length > 1 ? dG : 0,
      materialBalanceError: states.length > 1 ? balance : 0,
      iterations: info.iterations,
      method: info.method,
    },
    stability: info.stability,
    model: model.info,
    warnings,
  };
}
