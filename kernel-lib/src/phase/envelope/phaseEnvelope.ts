/**
 * The phase envelope of a mixture in the P-T plane, by continuation of the dew and bubble lines
 * (M. L. Michelsen, "Calculation of phase envelopes and critical points for multicomponent
 * mixtures", Fluid Phase Equilibria 4 (1980) 1-10; the trace itself is traceLine.ts).
 *
 * The trace starts from the dew point at the minimum pressure (from the bubble point when no dew
 * point is found there), rises along the dew line through the cricondentherm, crosses the
 * critical point, passes the cricondenbar and comes down the bubble line to the minimum pressure:
 * the envelope closes. When it stops before, the other end is traced from its own low-pressure
 * point as a second segment, and the result says where and why each stopped (`complete` false,
 * `stoppedBecause`, a warning). The critical point of each crossing is checked against the
 * Heidemann-Khalil criteria (mixtureCriticalPoint.ts). Lines of constant vapour fraction beta are
 * traced the same way; past the critical point a line of beta continues as the line of 1 - beta.
 */
import type { ResultWarning } from "../../errors.js";
import { IsochorError, PhaseUnavailableError, SolverError } from "../../errors.js";
import type { ModelInfo } from "../../eos/types.js";
import type { FluidBinding } from "../../state/types.js";
import { phaseFugacityAtTP } from "../../state/fugacity.js";
import { requireCount, requireNonNegative, requirePositive } from "../../validate.js";
import { InputError } from "../../errors.js";
import { stabilityAtTP, type WilsonConstants } from "../stability.js";
import { mixtureCriticalPoint, type MixtureCriticalPoint } from "./mixtureCriticalPoint.js";
import { attemptAtPressure, modelConstants, saturationSystemOf } from "./saturationStarts.js";
import type { SaturationSystem } from "./saturationSystem.js";
import { traceLine, type LineTrace, type TraceSettings } from "./traceLine.js";

/** Options of {@link phaseEnvelope}. */
export interface PhaseEnvelopeOptions {
  /** Both branches start and end at this pressure, Pa. Default 1e5 (1 bar). */
  minimumPressurePa?: number;
  /** A line still rising above this pressure stops there (incomplete), Pa. Default 1e8. */
  maximumPressurePa?: number;
  /** A line falling below this temperature stops there, K. Default 20. */
  minimumTemperatureK?: number;
  /** Lines of constant vapour fraction to add, mol/mol, e.g. [0.1, 0.5, 0.9]. Default none. */
  vaporFractions?: readonly number[];
  /** Points per line at most. Default 400. */
  maxPoints?: number;
  /** Equal-fugacity tolerance of every point (ln f). Default 1e-10. */
  tolerance?: number;
  /**
   * Tangent-plane test of the phases at every n-th point, to detect a third phase (liquid-liquid
   * split, e.g. with water); 0 switches it off. Default 1 (every point).
   */
  stabilityStride?: number;
  /** Check each critical crossing against the Heidemann-Khalil criteria. Default true. */
  checkCritical?: boolean;
  /** Largest change of ln T between points. Default 0.03. */
  maxLnTStep?: number;
  /** Largest change of ln P between points. Default 0.15. */
  maxLnPStep?: number;
  /** Largest change of any ln K between points. Default 1. */
  maxLnKStep?: number;
  /** Critical constants for Wilson's K-factors; default the model's own components. */
  constants?: readonly WilsonConstants[];
}

/** One verified point of the envelope (SI). */
export interface EnvelopePoint {
  /** K */
  readonly T: number;
  /** Pa */
  readonly P: number;
  /** "dew": the feed is the vapour (an incipient liquid); "bubble": the feed is the liquid. */
  readonly kind: "bubble" | "dew";
  /** Mole fractions of the incipient phase, model order. */
  readonly incipient: readonly number[];
  /** 1 on the dew line, 0 on the bubble line. */
  readonly vaporFraction: number;
  /** 0 for the trace from the first start; 1 for the trace from the other end (if needed). */
  readonly segment: number;
}

/** A point in the P-T plane (K, Pa). */
export interface EnvelopeLandmark {
  readonly T: number;
  readonly P: number;
}

/** A line of constant vapour fraction. */
export interface QualityLine {
  readonly vaporFraction: number;
  /** Verified points in trace order (K, Pa). */
  readonly points: readonly EnvelopeLandmark[];
}

/** The phase envelope of a mixture. */
export interface PhaseEnvelope {
  readonly points: readonly EnvelopePoint[];
  /**
   * Critical point(s) where the line crossed K = 1: the Heidemann-Khalil point when the crossing
   * agrees with it (0.2 % in T, 0.5 % in P), else the interpolated crossing with a warning.
   */
  readonly critical: readonly EnvelopeLandmark[];
  /** The crossings as interpolated along the line (cubic Hermite in the specified ln K). */
  readonly criticalCrossings: readonly EnvelopeLandmark[];
  /** Highest pressure of the envelope (dP/dT = 0), located exactly; absent if not reached. */
  readonly cricondenbar?: EnvelopeLandmark;
  /** Highest temperature of the envelope (dT/dP = 0), located exactly; absent if not reached. */
  readonly cricondentherm?: EnvelopeLandmark;
  readonly qualityLines?: readonly QualityLine[];
  /** True when the envelope runs from the minimum pressure on one branch to it on the other. */
  readonly complete: boolean;
  /** Where and why the trace stopped, when not complete. */
  readonly stoppedBecause?: string;
  /** Feed mole fractions (normalised). */
  readonly z: readonly number[];
  /** The Heidemann-Khalil critical point of z, when it was computed. */
  readonly criticalCheck?: MixtureCriticalPoint;
  readonly method: string;
  readonly model: ModelInfo;
  readonly warnings: readonly ResultWarning[];
}

const METHOD =
  "continuation of the saturation lines in ln K, ln T, ln P (Michelsen, Fluid Phase Equilib. 4 (1980) 1-10); critical points checked by Heidemann-Khalil (AIChE J. 26 (1980) 769-779)";

// agreement of a crossing with the Heidemann-Khalil point (relative), common practice, no source
const CRITICAL_T_AGREEMENT = 2e-3;
const CRITICAL_P_AGREEMENT = 5e-3;

function settingsOf(
  options: PhaseEnvelopeOptions,
  constants?: readonly WilsonConstants[],
): TraceSettings {
  const minP = requirePositive("options.minimumPressurePa", options.minimumPressurePa ?? 1e5, "Pa");
  const maxP = requirePositive("options.maximumPressurePa", options.maximumPressurePa ?? 1e8, "Pa");
  if (!(maxP > minP)) {
    throw new InputError({
      input: "options.maximumPressurePa",
      unit: "Pa",
      validRange: `above options.minimumPressurePa (${minP} Pa)`,
      received: maxP,
    });
  }
  const stride = requireNonNegative("options.stabilityStride", options.stabilityStride ?? 1, "-");
  if (!Number.isInteger(stride)) {
    throw new InputError({
      input: "options.stabilityStride",
      unit: "-",
      validRange: "an integer >= 0",
      received: stride,
    });
  }
  return {
    minimumPressurePa: minP,
    maximumPressurePa: maxP,
    minimumTemperatureK: requirePositive(
      "options.minimumTemperatureK",
      options.minimumTemperatureK ?? 20,
      "K",
    ),
    maxPoints: requireCount("options.maxPoints", options.maxPoints ?? 400),
    initialStep: 0.05,
    maxLnTStep: requirePositive("options.maxLnTStep", options.maxLnTStep ?? 0.03, "-"),
    maxLnPStep: requirePositive("options.maxLnPStep", options.maxLnPStep ?? 0.15, "-"),
    maxLnKStep: requirePositive("options.maxLnKStep", options.maxLnKStep ?? 1, "-"),
    minStep: 1e-6,
    criticalJump: 0.04,
    tolerance: requirePositive("options.tolerance", options.tolerance ?? 1e-10, "-"),
    stabilityStride: stride,
    constants,
  };
}

/** Traces a line of vapour fraction beta from its point at the minimum pressure. */
function traceFrom(
  binding: FluidBinding,
  sys: SaturationSystem,
  settings: TraceSettings,
): LineTrace | string {
  const a = attemptAtPressure(binding, sys, settings.minimumPressurePa, settings.constants, {
    tolerance: settings.tolerance,
    maxIterations: 40,
    trivialLnK: 1e-4,
  });
  if (a.solution === undefined) {
    return `no saturation point of vapour fraction ${sys.beta} at the minimum pressure ${settings.minimumPressurePa} Pa (${a.tried.join("; ") || "no start"})`;
  }
  const trace = traceLine(sys, a.solution, settings);
  if (trace.points.length > 0 || sys.beta !== 1 || a.point === undefined) return trace;
  // A dew point that is not stable at its start: another liquid (water in a wet gas) condenses
  // at a higher temperature, so the first dew point found (the hydrocarbon one, from Wilson's
  // K-factors) lies inside the region where that liquid is present. The dew line of the
  // envelope is then the other liquid's: start again from the incipient phase of the
  // tangent-plane test there (K_i = z_i / w_i), at increasing temperatures.
  const again = otherLiquidDewStart(binding, sys, settings, a.point.temperatureK);
  return again === undefined ? trace : traceLine(sys, again, settings);
}

/** The dew point at the minimum pressure of the liquid the tangent-plane test finds first. */
function otherLiquidDewStart(
  binding: FluidBinding,
  sys: SaturationSystem,
  settings: TraceSettings,
  temperatureK: number,
): Parameters<typeof traceLine>[1] | undefined {
  const P = settings.minimumPressurePa;
  let test;
  try {
    test = stabilityAtTP(binding.model, temperatureK, P, sys.z, { constants: settings.constants });
  } catch (e) {
    if (e instanceof IsochorError) return undefined;
    throw e;
  }
  const w = test.incipientComposition;
  if (test.stable || w === undefined) return undefined;
  const kFactors = sys.z.map((zi, i) => (zi > 0 ? zi / Math.max(w[i], 1e-15) : 1));
  for (const f of [1.25, 1.5, 2, 1.1, 2.5]) {
    const b = attemptAtPressure(
      binding,
      sys,
      P,
      settings.constants,
      { tolerance: settings.tolerance, maxIterations: 40, trivialLnK: 1e-4 },
      { kFactors, temperatureK: temperatureK * f },
    );
    if (b.solution !== undefined && b.point !== undefined && b.point.temperatureK > temperatureK)
      return b.solution;
  }
  return undefined;
}

function checkFractions(v: readonly number[] | undefined): number[] {
  if (v === undefined) return [];
  if (!Array.isArray(v)) {
    throw new InputError({
      input: "options.vaporFractions",
      unit: "mol/mol",
      validRange: "a list of numbers strictly between 0 and 1",
      received: v,
    });
  }
  const out: number[] = [];
  v.forEach((b, i) => {
    if (!(b > 0 && b < 1)) {
      throw new InputError({
        input: `options.vaporFractions[${i}]`,
        unit: "mol/mol",
        validRange: "strictly between 0 and 1",
        received: b,
      });
    }
    const low = Math.min(b, 1 - b);
    if (!out.some((o) => Math.abs(o - low) < 1e-12)) out.push(low);
  });
  return out;
}

/**
 * The phase envelope of the mixture z (mole fractions).
 *
 * @example
 * ```ts
 * const env = phaseEnvelope(gas, z, { vaporFractions: [0.1, 0.5, 0.9] });
 * env.complete; env.cricondentherm; env.critical[0];
 * ```
 * @throws InputError for bad z or options (never for a trace that stops: see `complete`).
 */
export function phaseEnvelope(
  binding: FluidBinding,
  z: readonly number[],
  options: PhaseEnvelopeOptions = {},
): PhaseEnvelope {
  const constants = modelConstants(binding, options.constants);
  const settings = settingsOf(options, constants);
  const fractions = checkFractions(options.vaporFractions);
  const dewSys = saturationSystemOf(binding, z, 1);
  const warnings: ResultWarning[] = [];
  const base = { z: dewSys.z.slice(), method: METHOD, model: binding.model.info };
  if (dewSys.present.length < 2) {
    return {
      ...base,
      points: [],
      critical: [],
      criticalCrossings: [],
      complete: false,
      stoppedBecause:
        "fewer than two components present: a pure fluid has a vapour-pressure curve, not an envelope (use saturationAtTemperature)",
      warnings: [
        { code: "model-limitation", message: "phase envelope: fewer than two components present" },
      ],
    };
  }
  const bubbleSys: SaturationSystem = { ...dewSys, beta: 0 };
  const traces: LineTrace[] = [];
  const reasons: string[] = [];
  let first = traceFrom(binding, dewSys, settings);
  let firstIsDew = true;
  if (typeof first === "string") {
    reasons.push(`from the dew side: ${first}`);
    first = traceFrom(binding, bubbleSys, settings);
    firstIsDew = false;
    if (typeof first === "string") reasons.push(`from the bubble side: ${first}`);
  }
  if (typeof first !== "string") {
    traces.push(first);
    if (!first.complete) {
      reasons.push(
        `from the ${firstIsDew ? "dew" : "bubble"} side: ${first.stoppedBecause ?? "stopped"}`,
      );
      if (firstIsDew) {
        const second = traceFrom(binding, bubbleSys, settings);
        if (typeof second === "string") reasons.push(`from the bubble side: ${second}`);
        else {
          traces.push(second);
          if (!second.complete)
            reasons.push(`from the bubble side: ${second.stoppedBecause ?? "stopped"}`);
        }
      }
    }
  }
  const complete = traces.length > 0 && traces[0].complete;
  const points: EnvelopePoint[] = [];
  traces.forEach((tr, segment) => {
    const feedIsY = segment === 0 ? firstIsDew : false;
    for (const tp of tr.points) {
      const p = tp.point;
      const feedDensity = feedIsY ? p.densityY : p.densityX;
      const incDensity = feedIsY ? p.densityX : p.densityY;
      const dew = incDensity > feedDensity;
      points.push({
        T: p.temperatureK,
        P: p.pressurePa,
        kind: dew ? "dew" : "bubble",
        incipient: feedIsY ? p.x : p.y,
        vaporFraction: dew ? 1 : 0,
        segment,
      });
    }
  });
  for (const tr of traces) {
    for (const note of tr.notes)
      warnings.push({ code: "accuracy", message: `phase envelope: ${note}` });
  }

  // critical points, checked against Heidemann-Khalil
  const crossings = traces.flatMap((tr) => tr.critical);
  let criticalCheck: MixtureCriticalPoint | undefined;
  if ((options.checkCritical ?? true) && crossings.length > 0) {
    try {
      // started at the first crossing: its density as the guess, a ceiling a little above it
      const c0 = crossings[0];
      const rho0 = phaseFugacityAtTP(binding.model, c0.T, c0.P, dewSys.z).densityMolPerM3;
      criticalCheck = mixtureCriticalPoint(binding.model, dewSys.z, {
        densityGuessMolPerM3: rho0,
        temperatureCeilingK: 1.1 * c0.T,
        scanStep: 0.03,
      });
    } catch (e) {
      if (!(e instanceof PhaseUnavailableError || e instanceof SolverError)) throw e;
      warnings.push({
        code: "accuracy",
        message: `phase envelope: the Heidemann-Khalil critical point could not be computed to check the crossing (${e.message})`,
      });
    }
  }
  const critical: EnvelopeLandmark[] = crossings.map((c) => {
    if (criticalCheck === undefined) return { T: c.T, P: c.P };
    const dT = Math.abs(criticalCheck.temperatureK - c.T) / c.T;
    const dP = Math.abs(criticalCheck.pressurePa - c.P) / c.P;
    if (dT < CRITICAL_T_AGREEMENT && dP < CRITICAL_P_AGREEMENT) {
      return { T: criticalCheck.temperatureK, P: criticalCheck.pressurePa };
    }
    warnings.push({
      code: "accuracy",
      message: `phase envelope: the line crossed K = 1 at T = ${c.T.toPrecision(6)} K, P = ${c.P.toPrecision(6)} Pa, but the Heidemann-Khalil critical point is T = ${criticalCheck.temperatureK.toPrecision(6)} K, P = ${criticalCheck.pressurePa.toPrecision(6)} Pa; the interpolated crossing is reported`,
    });
    return { T: c.T, P: c.P };
  });
  if (complete && crossings.length === 0) {
    warnings.push({
      code: "accuracy",
      message: "phase envelope: the envelope closed without a critical crossing being located",
    });
  }

  // cricondenbar and cricondentherm: the highest located extremum, which must bound every point
  const pick = (list: { T: number; P: number }[], by: "T" | "P"): EnvelopeLandmark | undefined => {
    let best: EnvelopeLandmark | undefined;
    for (const l of list) if (best === undefined || l[by] > best[by]) best = { T: l.T, P: l.P };
    if (best === undefined) return undefined;
    const top = Math.max(...points.map((p) => p[by]));
    if (top > best[by] * (1 + 1e-9)) {
      warnings.push({
        code: "accuracy",
        message: `phase envelope: a traced point lies above the located ${by === "P" ? "cricondenbar" : "cricondentherm"} (${top} vs ${best[by]}); it is not reported`,
      });
      return undefined;
    }
    return best;
  };
  const cricondenbar = pick(
    traces.flatMap((tr) => tr.maxPressure),
    "P",
  );
  const cricondentherm = pick(
    traces.flatMap((tr) => tr.maxTemperature),
    "T",
  );

  let qualityLines: QualityLine[] | undefined;
  if (fractions.length > 0) {
    qualityLines = [];
    for (const b of fractions) {
      const sys: SaturationSystem = { ...dewSys, beta: b };
      const tr = traceFrom(binding, sys, settings);
      if (typeof tr === "string") {
        warnings.push({ code: "model-limitation", message: `vapour fraction ${b}: ${tr}` });
        continue;
      }
      if (!tr.complete) {
        warnings.push({
          code: tr.stoppedBecause?.includes("third phase") ? "phase-split" : "model-limitation",
          message: `line of vapour fraction ${b} (and ${1 - b}) incomplete: ${tr.stoppedBecause ?? "stopped"}`,
        });
      }
      const lines = new Map<number, EnvelopeLandmark[]>();
      for (const tp of tr.points) {
        const p = tp.point;
        const f = p.densityY < p.densityX ? b : 1 - b;
        const list = lines.get(f) ?? [];
        list.push({ T: p.temperatureK, P: p.pressurePa });
        lines.set(f, list);
      }
      for (const [f, pts] of lines) qualityLines.push({ vaporFraction: f, points: pts });
    }
  }

  let stoppedBecause = complete ? undefined : reasons.join(" | ");
  if (stoppedBecause !== undefined && /third phase \(water/.test(stoppedBecause)) {
    stoppedBecause +=
      " | water forms its own liquid phase in this feed: wetGasEnvelope (phase/envelope/wetGasEnvelope.ts) gives the hydrocarbon envelope on a water-free basis and the water dew line, each point verified";
  }
  if (!complete) {
    warnings.push({
      code: stoppedBecause?.includes("third phase") ? "phase-split" : "model-limitation",
      message: `phase envelope incomplete: ${stoppedBecause}`,
    });
  }
  return {
    ...base,
    points,
    critical,
    criticalCrossings: crossings.map((c) => ({ T: c.T, P: c.P })),
    cricondenbar,
    cricondentherm,
    qualityLines,
    complete,
    stoppedBecause,
    criticalCheck,
    warnings,
  };
}
