/**
 * Phase stability of a mixture at given T, P and feed composition z: the tangent-plane test of
 * M. L. Michelsen, "The isothermal flash problem. Part I. Stability", Fluid Phase Equilibria 9
 * (1982) 1-19 (also Michelsen & Mollerup, Thermodynamic Models, 2nd ed. (2007), ch. 9).
 *
 * With d_i = ln z_i + ln phi_i(z) (the feed in its root of lowest Gibbs energy), the modified
 * tangent-plane distance of a trial phase with mole numbers W_i (composition w = W / sum W) is
 *   tm(W) = 1 + sum_i W_i (ln W_i + ln phi_i(w) - d_i - 1).
 * The feed is stable as one phase if and only if tm >= 0 for every W; one W with tm < 0 proves
 * that the fluid splits. tm is minimised by successive substitution,
 *   ln W_i <- d_i - ln phi_i(w),
 * from Wilson's K-factors (phase/wilson.ts; Michelsen & Mollerup ch. 9): a vapour-like trial W = z K and a liquid-like trial
 * W = z / K. Without critical constants (a user's own model) each present component, nearly pure,
 * is a trial instead. ln phi_i(w) is taken in the trial's own root of lowest Gibbs energy. At a
 * stationary point tm = 1 - sum W_i. Components absent from the feed are absent from every trial
 * (their d_i is minus infinity).
 *
 * The verdict uses the lowest tm met along every trial's path, so it does not wait for
 * convergence: a single negative value is a proof of instability. A trial that stops at its
 * iteration cap without a negative tm is reported, with a warning, because near a critical point
 * successive substitution is slow and a split can be missed.
 */
import { InputError, PhaseUnavailableError, type ResultWarning } from "../errors.js";
import type { ModelInfo, ResidualModel } from "../eos/types.js";
import type { ModelComponent } from "../eos/modelComponent.js";
import { checkComposition, checkPressure, checkTemperature } from "../state/checkInputs.js";
import { phaseFugacityAtTP, type PhaseFugacity } from "../state/fugacity.js";
import { wilsonK } from "./wilson.js";
import { requireCount, requirePositive } from "../validate.js";

/** The critical constants a Wilson start needs, one record per component in model order. */
export type WilsonConstants = Pick<
  ModelComponent,
  "criticalTemperatureK" | "criticalPressurePa" | "acentricFactor"
>;

/** Options of {@link stabilityAtTP}. */
export interface StabilityOptions {
  /** Successive substitution stops when no ln W_i changes by more than this. Default 1e-10. */
  tolerance?: number;
  /** Iterations per trial phase. Default 2000. */
  maxIterations?: number;
  /**
   * A trial proves a split when its tm falls below minus this (it guards against rounding at the
   * trivial solution W = z, where tm = 0). Default 1e-8.
   */
  splitThreshold?: number;
  /**
   * Critical constants for Wilson's starting K-factors, one per component. Default: the model's
   * own `components` when it has them (the built-in models do); otherwise nearly pure trials.
   */
  constants?: readonly WilsonConstants[];
}

/** Where a trial phase started. */
export type TrialStart = "vapor-like" | "liquid-like" | `nearly pure ${string}`;

/** How a trial phase ended. */
export type TrialOutcome =
  /** tm fell below minus the threshold: the feed splits. */
  | "split"
  /** Converged to the feed itself (W = z, tm = 0): no split found from this start. */
  | "trivial"
  /** Converged to another stationary point with tm >= minus the threshold. */
  | "stationary"
  /** Hit the iteration cap with tm never below minus the threshold. */
  | "not-converged";

/** One trial phase of the test. */
export interface StabilityTrial {
  readonly start: TrialStart;
  readonly outcome: TrialOutcome;
  /** Lowest tm met along the path (dimensionless). */
  readonly tangentPlaneDistance: number;
  /** Trial composition (mole fractions, model order) where that lowest tm was met. */
  readonly composition: readonly number[];
  readonly iterations: number;
}

/** The answer of {@link stabilityAtTP}. */
export interface StabilityResult {
  /** True when no trial found tm < 0 (within the threshold): one phase is stable here. */
  readonly stable: boolean;
  readonly temperatureK: number;
  readonly pressurePa: number;
  /** Feed mole fractions (a copy). */
  readonly x: readonly number[];
  /** Density of the feed's root of lowest Gibbs energy, mol/m3. */
  readonly feedDensityMolPerM3: number;
  /** Lowest tm over all trials (0 when there was nothing to test). */
  readonly minimumTangentPlaneDistance: number;
  /**
   * When the feed splits: the composition of the trial with the lowest tm, an estimate of the
   * incipient phase (a flash can start from it).
   */
  readonly incipientComposition?: readonly number[];
  readonly trials: readonly StabilityTrial[];
  /** Method and source, for records. */
  readonly method: string;
  readonly model: ModelInfo;
  readonly warnings: readonly ResultWarning[];
}

const METHOD =
  "tangent-plane test (Michelsen, Fluid Phase Equilib. 9 (1982) 1-19), successive substitution from Wilson K-factors";
// a converged trial whose mole fractions all lie this close to the feed's is the trivial solution
const TRIVIAL_DISTANCE = 1e-6;

/**
 * ln phi_i at (T, P, w) in the root of lowest Gibbs energy (state/fugacity.ts, the one home of
 * that choice), written into out; returns rho.
 */
function lnPhiAtTP(
  model: ResidualModel,
  T: number,
  P: number,
  w: readonly number[],
  out: number[],
): number {
  let phase: PhaseFugacity | undefined;
  try {
    phase = phaseFugacityAtTP(model, T, P, w, "stable");
  } catch (e) {
    if (!(e instanceof PhaseUnavailableError)) throw e;
  }
  const lnPhi = phase?.lnPhi ?? [];
  if (lnPhi.length !== out.length || !lnPhi.every(Number.isFinite)) {
    throw new PhaseUnavailableError(
      `${model.info.name} has no mechanically stable density root at T = ${T} K, P = ${P} Pa for the composition [${w.map((v) => v.toPrecision(4)).join(", ")}] (stability test)`,
    );
  }
  for (let i = 0; i < out.length; i++) out[i] = lnPhi[i];
  return phase!.densityMolPerM3;
}

/**
 * Tests whether a mixture of composition x is stable as one phase at T (K) and P (Pa).
 *
 * @example
 * ```ts
 * const gas = defineFluid({ components: ["methane", "n-butane"], model: "peng-robinson" });
 * const t = stabilityAtTP(gas.model, 280, 20e5, [0.7, 0.3]);
 * t.stable; // false: the mixture splits into gas and liquid
 * t.incipientComposition; // the first bubbles or drops
 * ```
 * @throws InputError for bad T, P, x or options; PhaseUnavailableError when the feed or a trial
 *   composition has no mechanically stable density root.
 */
export function stabilityAtTP(
  model: ResidualModel,
  temperatureK: number,
  pressurePa: number,
  x: readonly number[],
  options: StabilityOptions = {},
): StabilityResult {
  const n = model.info.componentIds.length;
  checkTemperature(temperatureK);
  checkPressure(pressurePa);
  checkComposition(x, n);
  const tolerance = requirePositive("options.tolerance", options.tolerance ?? 1e-10, "-");
  const maxIterations = requireCount("options.maxIterations", options.maxIterations ?? 2000);
  const threshold = requirePositive("options.splitThreshold", options.splitThreshold ?? 1e-8, "-");
  const constants = options.constants ?? modelConstants(model);
  if (constants !== undefined) checkConstants(constants, n);
  const T = temperatureK;
  const P = pressurePa;

  // the feed: d_i = ln z_i + ln phi_i(z), absent components excluded
  const lnPhi = new Array<number>(n).fill(0);
  const feedDensity = lnPhiAtTP(model, T, P, x, lnPhi);
  const present: number[] = [];
  for (let i = 0; i < n; i++) if (x[i] > 0) present.push(i);
  const d = x.map((xi, i) => (xi > 0 ? Math.log(xi) + lnPhi[i] : -Infinity));
  const base = {
    temperatureK: T,
    pressurePa: P,
    x: x.slice(),
    feedDensityMolPerM3: feedDensity,
    method: METHOD,
    model: model.info,
  };
  if (present.length < 2) {
    return {
      ...base,
      stable: true,
      minimumTangentPlaneDistance: 0,
      trials: [],
      warnings: [],
    };
  }

  const starts = trialStarts(model, T, P, x, present, constants);
  const trials: StabilityTrial[] = [];
  const lnW = new Array<number>(n).fill(-Infinity);
  const W = new Array<number>(n).fill(0);
  const w = new Array<number>(n).fill(0);
  for (const start of starts) {
    for (let i = 0; i < n; i++) lnW[i] = start.W[i] > 0 ? Math.log(start.W[i]) : -Infinity;
    let bestTm = Infinity;
    let bestComposition: number[] = [];
    let outcome: TrialOutcome = "not-converged";
    let iterations = 0;
    while (iterations < maxIterations) {
      iterations++;
      let sumW = 0;
      for (const i of present) {
        W[i] = Math.exp(lnW[i]);
        sumW += W[i];
      }
      for (const i of present) w[i] = W[i] / sumW;
      lnPhiAtTP(model, T, P, w, lnPhi);
      let tm = 1;
      let change = 0;
      let distanceToFeed = 0;
      for (const i of present) {
        tm += W[i] * (lnW[i] + lnPhi[i] - d[i] - 1);
        const next = d[i] - lnPhi[i];
        change = Math.max(change, Math.abs(next - lnW[i]));
        lnW[i] = next;
        distanceToFeed = Math.max(distanceToFeed, Math.abs(w[i] - x[i]));
      }
      if (tm < bestTm) {
        bestTm = tm;
        bestComposition = w.slice();
      }
      if (change <= tolerance) {
        outcome = distanceToFeed < TRIVIAL_DISTANCE ? "trivial" : "stationary";
        break;
      }
    }
    if (bestTm < -threshold) outcome = "split";
    trials.push({
      start: start.start,
      outcome,
      tangentPlaneDistance: bestTm,
      composition: bestComposition,
      iterations,
    });
  }

  let lowest = trials[0];
  for (const t of trials) if (t.tangentPlaneDistance < lowest.tangentPlaneDistance) lowest = t;
  const stable = !(lowest.tangentPlaneDistance < -threshold);
  const warnings: ResultWarning[] = [];
  const unfinished = trials.filter((t) => t.outcome === "not-converged");
  if (stable && unfinished.length > 0) {
    warnings.push({
      code: "accuracy",
      message: `stability test at T = ${T} K, P = ${P} Pa: the ${unfinished.map((t) => t.start).join(" and ")} trial${unfinished.length > 1 ? "s" : ""} did not converge in ${maxIterations} iteration${maxIterations === 1 ? "" : "s"} without finding a split (slow near a critical point); ${unfinished.length === trials.length ? 'no trial finished, so the verdict "stable" is not proven: raise options.maxIterations' : 'the verdict "stable" rests on the other trials'}`,
    });
  }
  return {
    ...base,
    stable,
    minimumTangentPlaneDistance: lowest.tangentPlaneDistance,
    incipientComposition: stable ? undefined : lowest.composition,
    trials,
    warnings,
  };
}

/** The model's own component constants, when it carries them (the built-in models do). */
function modelConstants(model: ResidualModel): readonly WilsonConstants[] | undefined {
  return Array.isArray(model.components) ? model.components : undefined;
}

function checkConstants(constants: readonly WilsonConstants[], n: number): void {
  if (constants.length !== n) {
    throw new InputError({
      input: "options.constants.length",
      unit: "-",
      validRange: `${n} (one record per component)`,
      received: constants.length,
    });
  }
  constants.forEach((c, i) => {
    requirePositive(`options.constants[${i}].criticalTemperatureK`, c.criticalTemperatureK, "K");
    requirePositive(`options.constants[${i}].criticalPressurePa`, c.criticalPressurePa, "Pa");
    if (!Number.isFinite(c.acentricFactor)) {
      throw new InputError({
        input: `options.constants[${i}].acentricFactor`,
        unit: "-",
        validRange: "a finite number",
        received: c.acentricFactor,
      });
    }
  });
}

/** Starting mole numbers of the trial phases (zero for absent components). */
function trialStarts(
  model: ResidualModel,
  T: number,
  P: number,
  x: readonly number[],
  present: readonly number[],
  constants: readonly WilsonConstants[] | undefined,
): { start: TrialStart; W: number[] }[] {
  const n = x.length;
  if (constants !== undefined) {
    const vapor = new Array<number>(n).fill(0);
    const liquid = new Array<number>(n).fill(0);
    for (const i of present) {
      const c = constants[i];
      const K = wilsonK(T, P, c.criticalTemperatureK, c.criticalPressurePa, c.acentricFactor);
      vapor[i] = x[i] * K;
      liquid[i] = x[i] / K;
    }
    return [
      { start: "vapor-like", W: vapor },
      { start: "liquid-like", W: liquid },
    ];
  }
  // nearly pure trials: the component at 1 - 1e-3 (spread over the others), one per component
  return present.map((k) => {
    const W = new Array<number>(n).fill(0);
    for (const i of present) W[i] = i === k ? 1 - 1e-3 : 1e-3 / (present.length - 1);
    return { start: `nearly pure ${model.info.componentIds[k]}` as TrialStart, W };
  });
}
