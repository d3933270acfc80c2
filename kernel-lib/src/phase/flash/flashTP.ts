/**
 * Isothermal flash of a mixture at given T and P (Michelsen's two-stage approach: M. L. Michelsen,
 * "The isothermal flash problem. Part I. Stability" and "Part II. Phase-split calculation", Fluid
 * Phase Equilib. 9 (1982) 1-19 and 21-40; M. L. Michelsen and J. M. Mollerup, Thermodynamic
 * Models: Fundamentals and Computational Aspects, 2nd ed. 2007, ch. 9-11):
 *  0. with a warm start (FlashOptions.initialLnK), the two-phase split from those K-values first:
 *     converged and below the feed's Gibbs energy, it goes straight to step 3 (steps 1-2 skipped);
 *  1. the tangent-plane test of the feed (phase/stability.ts), from Wilson's K-factors plus nearly
 *     pure trials (FlashOptions.extraTrials); stable: tested again with a nearly pure trial of
 *     every present component, and if still stable, one phase, returned with the verdict;
 *  2. otherwise each trial that found tm < 0, lowest tm first, seeds a two-phase split with
 *     K_i = phi_i(z) / phi_i(w) (at the trial's stationary point W_i / z_i): successive
 *     substitution with dominant-eigenvalue acceleration, then Newton on the Gibbs energy
 *     (twoPhaseSplit.ts);
 *  3. every phase of the converged split is tested for stability (Wilson trials; the phase of
 *     largest amount also with nearly pure trials of every present component: at equal fugacity
 *     all phases share one tangent plane, so those fixed starts need one phase); a split found
 *     in any of them adds a third phase (threePhaseSplit.ts), seeded with the trial composition of lowest tm; a phase
 *     that vanishes sends the flash back to two phases from the survivors; a two-phase result
 *     that stays unstable is a SolverError, never returned; a three-phase result is tested the
 *     same way, and one that is unstable seeds a four-phase split: converged, it is a SolverError
 *     reporting four phases (never returned); if a phase vanishes instead, the three survivors
 *     are converged and tested again;
 *  4. every result is verified (verifyEquilibrium.ts): equal fugacity, Gibbs energy below the
 *     feed, material balance, no trivial solution, labels by density. Anything else is a
 *     SolverError naming the state and what was tried.
 */
import { InputError, SolverError, type ResultWarning } from "../../errors.js";
import { checkComposition, checkPressure, checkTemperature } from "../../state/checkInputs.js";
import { phaseFugacityAtTP } from "../../state/fugacity.js";
import type { FluidBinding } from "../../state/types.js";
import { requireCount, requirePositive } from "../../validate.js";
import { stabilityAtTP, type StabilityOptions, type StabilityResult } from "../stability.js";
import { convergeMultiphase } from "./threePhaseSplit.js";
import { convergeTwoPhase, phaseGibbs, phaseLnPhi, type WorkingPhase } from "./twoPhaseSplit.js";
import type { Equilibrium } from "./types.js";
import { assembleEquilibrium, DEFAULT_VERIFY, describeState } from "./verifyEquilibrium.js";

/** Options of {@link flashTP}. */
export interface FlashOptions {
  /** Convergence of the iteration: max |ln f_i(a) - ln f_i(b)|. Default 1e-11. */
  tolerance?: number;
  /** The returned split must have max |ln f_i(a) - ln f_i(b)| below this. Default 1e-10. */
  verifyTolerance?: number;
  /**
   * Successive-substitution steps before Newton's method may take over; it does when the error
   * falls by less than half in a step (slow substitution, near a critical point), or after three
   * times this many steps. Default 6.
   */
  newtonAfter?: number;
  /** Cap on the iterations of one split (substitution plus Newton). Default 300. */
  maxIterations?: number;
  /** At most this many phases: 2 or 3. Default 3. */
  maxPhases?: 2 | 3;
  /** Options of the stability tests (Wilson constants, thresholds). */
  stability?: StabilityOptions;
  /**
   * Nearly pure trial phases added to the Wilson starts of every stability test (aqueous phases
   * and liquid-liquid splits that Wilson's K-factors miss). "auto" (default): the first test of
   * the feed tries every present component when at most four are present, otherwise water and
   * the heaviest component; every answer is then verified with every present component (a feed
   * found stable is tested again, and the phase of largest amount of a split is tested with all).
   * Component indices: those in the first test, every present component in the verification.
   * "none": Wilson starts only (faster; a missed liquid phase is then possible).
   */
  extraTrials?: "auto" | "none" | readonly number[];
  /**
   * A warm start: ln K_i = ln(y_i / x_i) of a nearby two-phase equilibrium (e.g. the previous
   * step of a time integration; one entry per component, absent ones ignored). The two-phase
   * split is first converged from these K-values without the stability test of the feed; a
   * converged split with a Gibbs energy below the feed's single phase then goes through the
   * stability tests of its phases (step 3 of the header) like any split, so the result is
   * verified the same way. Otherwise the flash starts from the feed's stability test as without
   * it. Affects the work, not the answer.
   */
  initialLnK?: readonly number[];
}

const METHOD_1 = "tangent-plane stability test (one phase stable)";
const METHOD_2 =
  "tangent-plane test, successive substitution with dominant-eigenvalue acceleration and Newton on the Gibbs energy, stability test of the split";
const METHOD_WARM =
  "two-phase split from the given K-values (options.initialLnK), successive substitution and Newton on the Gibbs energy, stability test of the split";
const METHOD_3 =
  "tangent-plane tests, two- then three-phase successive substitution (Michelsen Q function)";

/** Normalised copy of z and the indices of present components. */
export function prepareFeed(z: readonly number[]): { z: number[]; present: number[] } {
  let s = 0;
  for (const v of z) s += v;
  const out = z.map((v) => v / s);
  const present: number[] = [];
  out.forEach((v, i) => {
    if (v > 0) present.push(i);
  });
  return { z: out, present };
}

/**
 * The nearly pure trials of the first test of the feed (see FlashOptions.extraTrials): with
 * "auto", every present component when at most four are present, otherwise water and the
 * heaviest component (a feed found stable by these is tested again with every component).
 */
function feedTrialsOf(
  binding: FluidBinding,
  present: readonly number[],
  options: FlashOptions,
): readonly number[] {
  const rule = options.extraTrials ?? "auto";
  if (rule === "none") return [];
  if (rule !== "auto") return rule;
  if (present.length <= 4) return present;
  const ids = binding.model.info.componentIds;
  const constants =
    options.stability?.constants ??
    (binding.model as { components?: readonly { criticalTemperatureK: number }[] }).components;
  const out: number[] = [];
  const water = present.find((i) => ids[i] === "water");
  if (water !== undefined) out.push(water);
  if (constants !== undefined) {
    let heaviest = present[0];
    for (const i of present) {
      if (constants[i].criticalTemperatureK > constants[heaviest].criticalTemperatureK)
        heaviest = i;
    }
    if (heaviest !== water) out.push(heaviest);
  }
  return out;
}

/** The nearly pure trials that verify a result: every present component (none for "none"). */
function checkTrialsOf(present: readonly number[], options: FlashOptions): readonly number[] {
  const rule = options.extraTrials ?? "auto";
  if (rule === "none") return [];
  if (rule === "auto") return present;
  return [...new Set([...present, ...rule])];
}

/**
 * The phase equilibrium of feed z (mole fractions) at T (K) and P (Pa): one, two or three phases,
 * verified (see the header).
 *
 * @example
 * ```ts
 * const gas = defineFluid({ components: ["methane", "n-butane"], model: "peng-robinson" });
 * const eq = flashTP(gas, 280, 40e5, [0.7, 0.3]);
 * eq.phases.map((p) => [p.kind, p.amount, p.state.x]);
 * ```
 * @throws InputError for bad T, P, z or options; SolverError when no verified split is found.
 */
export function flashTP(
  binding: FluidBinding,
  temperatureK: number,
  pressurePa: number,
  z: readonly number[],
  options: FlashOptions = {},
): Equilibrium {
  const model = binding.model;
  checkTemperature(temperatureK);
  checkPressure(pressurePa);
  checkComposition(z, model.info.componentIds.length, "z");
  const tolerance = requirePositive("options.tolerance", options.tolerance ?? 1e-11, "-");
  const verifyTolerance = requirePositive(
    "options.verifyTolerance",
    options.verifyTolerance ?? 1e-10,
    "-",
  );
  const newtonAfter = requireCount("options.newtonAfter", options.newtonAfter ?? 6);
  const maxIterations = requireCount("options.maxIterations", options.maxIterations ?? 300);
  const maxPhases = options.maxPhases ?? 3;
  const T = temperatureK;
  const P = pressurePa;
  const feed = prepareFeed(z);
  const zz = feed.z;
  const present = feed.present;
  const tol = { ...DEFAULT_VERIFY, fugacity: verifyTolerance };
  const single = (
    stability: StabilityResult | undefined,
    warnings: readonly ResultWarning[],
  ): Equilibrium => {
    const f = phaseFugacityAtTP(model, T, P, zz, "stable");
    return assembleEquilibrium(
      binding,
      T,
      P,
      zz,
      present,
      [{ x: zz, lnPhi: f.lnPhi, densityMolPerM3: f.densityMolPerM3, amount: 1 }],
      {
        iterations: 0,
        method: present.length < 2 ? "one component present (no split possible)" : METHOD_1,
        stability,
        warnings,
      },
      tol,
    );
  };
  if (present.length < 2) return single(undefined, []);
  const feedTrials = feedTrialsOf(binding, present, options);
  const checkTrials = checkTrialsOf(present, options);
  const stabilityOptions: StabilityOptions = { ...options.stability, extraTrials: checkTrials };
  const splitOptions = { tolerance, newtonAfter, maxIterations };
  let iterations = 0;
  // the warm start (options.initialLnK): a converged split below the feed's Gibbs energy skips
  // the feed's stability test; its phases are tested below like any split
  const warm = ((): WorkingPhase[] | undefined => {
    const lnK0 = options.initialLnK;
    if (lnK0 === undefined) return undefined;
    if (!(lnK0.length === zz.length && present.every((i) => Number.isFinite(lnK0[i])))) {
      throw new InputError({
        input: "options.initialLnK",
        unit: "-",
        validRange: `${zz.length} finite ln K values`,
        received: lnK0,
      });
    }
    const lnK = new Array<number>(zz.length).fill(0);
    for (const i of present) lnK[i] = lnK0[i];
    const out = convergeTwoPhase(model, T, P, zz, present, lnK, splitOptions);
    iterations += out.iterations;
    if (!out.converged) return undefined;
    const gFeed = phaseGibbs(zz, phaseLnPhi(model, T, P, zz).lnPhi, present);
    let gSplit = 0;
    for (const p of out.phases) gSplit += p.amount * phaseGibbs(p.x, p.lnPhi, present);
    return gSplit < gFeed ? out.phases : undefined;
  })();
  let stability: StabilityResult | undefined;
  let phases: WorkingPhase[] | undefined = warm;
  const tried: string[] = [];
  if (phases === undefined) {
    let feedTest = stabilityAtTP(model, T, P, zz, {
      ...options.stability,
      extraTrials: feedTrials,
    });
    if (feedTest.stable && checkTrials.some((i) => !feedTrials.includes(i))) {
      // a one-phase answer is verified with a nearly pure trial of every present component
      feedTest = stabilityAtTP(model, T, P, zz, stabilityOptions);
    }
    if (feedTest.stable) return single(feedTest, feedTest.warnings);
    phases = splitFromTrials(feedTest);
    stability = feedTest;
  }

  /** Two phases from the trials of the feed's stability test that found tm < 0. */
  function splitFromTrials(feedTest: StabilityResult): WorkingPhase[] {
    const lnPhiZ = phaseLnPhi(model, T, P, zz).lnPhi;
    /** Two phases from a trial composition w (the y phase). */
    const fromTrial = (w: readonly number[]): WorkingPhase[] | undefined => {
      const lnPhiW = phaseLnPhi(model, T, P, w).lnPhi;
      const lnK = new Array<number>(zz.length).fill(0);
      for (const i of present) lnK[i] = lnPhiZ[i] - lnPhiW[i];
      const out = convergeTwoPhase(model, T, P, zz, present, lnK, splitOptions);
      iterations += out.iterations;
      if (out.converged) return out.phases;
      tried.push(
        `two-phase split from a trial (${out.reason ?? "not converged"} after ${out.iterations} iterations, ${out.newtonIterations} Newton)`,
      );
      return undefined;
    };
    const trials = feedTest.trials
      .filter((t) => t.tangentPlaneDistance < 0 && t.composition.length === zz.length)
      .sort((a, b) => a.tangentPlaneDistance - b.tangentPlaneDistance);
    for (const t of trials) {
      const found = fromTrial(t.composition);
      if (found !== undefined) return found;
    }
    throw new SolverError(
      "isothermal flash",
      `the feed is unstable at ${where()} (tm = ${feedTest.minimumTangentPlaneDistance.toExponential(3)}) but no split converged: ${tried.join("; ")}`,
    );
  }
  function where(): string {
    return describeState(binding, T, P, zz);
  }
  let method = warm === undefined ? METHOD_2 : METHOD_WARM;
  let finalStability: StabilityResult | undefined;
  // Post-check of the returned phases: every phase (not only the largest), with Wilson trials plus
  // nearly pure trials of every present component (Wilson trials alone miss liquid-liquid splits,
  // e.g. an H2S-rich beside a decane-rich liquid at 185 K); the most unstable phase seeds the next.
  // At a converged split the phases share one tangent plane (equal fugacities), so tm(w) is the
  // same function from every phase: the nearly pure trials (fixed starts) need one phase only.
  const wilsonOnly: StabilityOptions = { ...options.stability, extraTrials: [] };
  const testPhases = (ps: readonly WorkingPhase[]): StabilityResult => {
    let worst: StabilityResult | undefined;
    let largest = ps[0];
    for (const p of ps) if (p.amount > largest.amount) largest = p;
    for (const p of ps) {
      const t = stabilityAtTP(model, T, P, p.x, p === largest ? stabilityOptions : wilsonOnly);
      if (worst === undefined || t.minimumTangentPlaneDistance < worst.minimumTangentPlaneDistance)
        worst = t;
    }
    return worst!;
  };
  for (let round = 0; round < 3; round++) {
    if (phases.length >= 3) break;
    const test = testPhases(phases);
    finalStability = test;
    if (test.stable) break;
    if (maxPhases < 3) {
      throw new SolverError(
        "isothermal flash",
        `at ${where()}: the converged two-phase split is not stable (tm = ${test.minimumTangentPlaneDistance.toExponential(3)}) and options.maxPhases = 2 forbids a third phase`,
      );
    }
    const w = test.incipientComposition!;
    const start: WorkingPhase[] = phases.map((p) => ({ ...p, amount: p.amount * 0.95 }));
    start.push({ x: w.slice(), lnPhi: [], densityMolPerM3: NaN, amount: 0.05 });
    const out = convergeMultiphase(model, T, P, zz, present, start, tolerance, maxIterations * 3);
    iterations += out.iterations;
    method = METHOD_3;
    if (out.converged) {
      phases = out.phases;
      break;
    }
    if (out.vanished && out.phases.length === 2) {
      // back to two phases from the survivors
      const [a, b] = out.phases;
      const lnK = new Array<number>(zz.length).fill(0);
      for (const i of present) lnK[i] = a.lnPhi[i] - b.lnPhi[i];
      const two = convergeTwoPhase(model, T, P, zz, present, lnK, splitOptions);
      iterations += two.iterations;
      if (!two.converged) {
        throw new SolverError(
          "isothermal flash",
          `at ${where()}: the three-phase attempt lost a phase and the two-phase split from the survivors did not converge (${two.reason})`,
        );
      }
      phases = two.phases;
      finalStability = undefined;
      continue;
    }
    throw new SolverError(
      "isothermal flash",
      `at ${where()}: a phase of the two-phase split is unstable (tm = ${test.minimumTangentPlaneDistance.toExponential(3)}), and the three-phase split ${out.reason ?? "failed"}`,
    );
  }
  if (phases.length === 3) {
    // a three-phase split is tested like a two-phase one. A phase that is still unstable: the
    // four-phase split from the trial phase is converged. If it converges, the equilibrium has
    // four phases (e.g. hydrogen, water, hydrocarbon and CO2/H2S-rich liquids below 190 K),
    // which this flash does not return: refused, with the four phases' verdict. If a phase
    // vanishes on the way, the three survivors are another three-phase split, converged and
    // tested again (the first one had a wrong set of phases).
    for (let round = 0; ; round++) {
      const test = testPhases(phases);
      finalStability = test;
      if (test.stable) break;
      const unstable = `the converged three-phase split is not stable (tm = ${test.minimumTangentPlaneDistance.toExponential(3)} for a trial phase)`;
      const start: WorkingPhase[] = phases.map((p) => ({ ...p, amount: p.amount * 0.95 }));
      start.push({
        x: test.incipientComposition!.slice(),
        lnPhi: [],
        densityMolPerM3: NaN,
        amount: 0.05,
      });
      const four = convergeMultiphase(
        model,
        T,
        P,
        zz,
        present,
        start,
        tolerance,
        3 * maxIterations,
      );
      iterations += four.iterations;
      if (four.converged) {
        const t4 = testPhases(four.phases);
        // each phase by its amount and its main component, e.g. "0.2877 (n-hexane 0.563)"
        const ids = model.info.componentIds;
        const amounts = four.phases
          .map((p) => {
            let main = present[0];
            for (const i of present) if (p.x[i] > p.x[main]) main = i;
            return `${p.amount.toPrecision(4)} (${ids[main]} ${p.x[main].toPrecision(3)})`;
          })
          .join(", ");
        throw new SolverError(
          "isothermal flash",
          `at ${where()}: ${unstable}: a fourth phase forms. A four-phase split from that trial converged (amounts ${amounts}; max |ln f difference| ${four.error.toExponential(2)}) and ${t4.stable ? "each of its phases is stable in the tangent-plane test" : `is itself not stable (tm = ${t4.minimumTangentPlaneDistance.toExponential(3)}): five phases or another set of them`}; this flash returns at most three`,
        );
      }
      if (four.vanished && four.phases.length === 3 && round < 2) {
        const three = convergeMultiphase(
          model,
          T,
          P,
          zz,
          present,
          four.phases,
          tolerance,
          3 * maxIterations,
        );
        iterations += three.iterations;
        if (three.converged) {
          phases = three.phases;
          continue;
        }
      }
      throw new SolverError(
        "isothermal flash",
        `at ${where()}: ${unstable}: a fourth phase would form, and the four-phase split from that trial ${four.reason ?? "failed"}${four.vanished ? ` (${four.phases.length} phases left)` : ""}; this flash finds at most three`,
      );
    }
  }
  if (phases.length < 3 && (finalStability === undefined || !finalStability.stable)) {
    throw new SolverError(
      "isothermal flash",
      `at ${where()}: the converged two-phase split is not stable (tm = ${finalStability?.minimumTangentPlaneDistance.toExponential(3) ?? "not tested after the last split"}) and no three-phase split was found`,
    );
  }
  const warnings: ResultWarning[] = [];
  return assembleEquilibrium(
    binding,
    T,
    P,
    zz,
    present,
    phases,
    { iterations, method, stability: finalStability ?? stability, warnings },
    tol,
  );
}
