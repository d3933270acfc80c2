/**
 * The phase-equilibrium part of `isochor eval` (fields added after issue 4; nothing renamed):
 * states that are flashes ("phase": "equilibrium", and every {"P","h"}, {"P","s"}, {"T","s"},
 * {"u","rho"} state), mixture states at given quality, and the request-level "envelope".
 *
 * An equilibrium state entry carries the overall "T", "P", "h", "s", "u", "rho", "Z", "phase"
 * ("vapor" | "liquid" | "supercritical" for one phase, "two-phase", "three-phase"), "quality" (the
 * vapour mole fraction of the feed, 0 without vapour) and "phases": [{"kind": "vapor" | "liquid" |
 * "liquid-2", "amount" (mol per mol of feed), "x", "rho", "Z", "h", "s", "u", "lnPhi"}]. With one
 * phase every single-phase field of eval is there too (cp, cv, w, jt, lnPhi, residual...); with
 * more, the overall h, s, u and rho are amount-weighted sums over the phases (v = sum beta_k v_k),
 * and cp, cv, w, jt, lnPhi, residual and residualTV are null (they belong to each phase; the
 * equal fugacities are in each phase's lnPhi and x). Every returned split was verified by the
 * flash (phase/flash/verifyEquilibrium.ts) and its check is given as "check".
 */
import type { Equilibrium, EquilibriumPhase } from "../phase/flash/types.js";
import type { MixtureSaturationPoint } from "../phase/envelope/saturationPoint.js";
import type { PhaseEnvelope } from "../phase/envelope/phaseEnvelope.js";
import type { FluidState } from "../state/types.js";

/** One phase of an equilibrium state entry. */
export interface EvalPhaseEntry {
  kind: string;
  amount: number;
  x: number[];
  rho: number;
  Z: number;
  h: number;
  s: number;
  u: number;
  lnPhi: number[];
}

/** The overall part of an equilibrium state entry (joined to the single-phase fields). */
export interface EvalEquilibriumFields {
  T: number;
  P: number;
  rho: number;
  Z: number;
  phase: string;
  h: number;
  s: number;
  u: number;
  quality: number;
  phases: EvalPhaseEntry[];
  check?: {
    maxLnFugacityDifference: number;
    gibbsChangeOverRT: number;
    materialBalanceError: number;
    method: string;
  };
}

function phaseEntry(kind: string, amount: number, st: FluidState): EvalPhaseEntry {
  return {
    kind,
    amount,
    x: st.x.slice(),
    rho: st.densityMolPerM3,
    Z: st.Z,
    h: st.molar.h,
    s: st.molar.s,
    u: st.molar.u,
    lnPhi: st.lnPhi.slice(),
  };
}

/** Overall values of phases with amounts (mol per mol of feed), gas constant R. */
function overall(
  T: number,
  P: number,
  phases: readonly { amount: number; state: FluidState }[],
  gasConstant: number,
): { h: number; s: number; u: number; rho: number; Z: number } {
  let h = 0;
  let s = 0;
  let u = 0;
  let v = 0;
  for (const p of phases) {
    h += p.amount * p.state.molar.h;
    s += p.amount * p.state.molar.s;
    u += p.amount * p.state.molar.u;
    v += p.amount / p.state.densityMolPerM3;
  }
  return { h, s, u, rho: 1 / v, Z: (P * v) / (gasConstant * T) };
}

function phaseWord(count: number, single: string): string {
  return count === 1 ? single : count === 2 ? "two-phase" : "three-phase";
}

/** The entry fields of a flash result. */
export function equilibriumFields(eq: Equilibrium, gasConstant: number): EvalEquilibriumFields {
  const phases = eq.phases as readonly EquilibriumPhase[];
  const o = overall(eq.temperatureK, eq.pressurePa, phases, gasConstant);
  const vapor = phases.find((p) => p.kind === "vapor");
  return {
    T: eq.temperatureK,
    P: eq.pressurePa,
    rho: o.rho,
    Z: o.Z,
    phase: phaseWord(phases.length, phases[0].state.phase),
    h: o.h,
    s: o.s,
    u: o.u,
    quality: vapor ? vapor.amount : 0,
    phases: phases.map((p) => phaseEntry(p.kind, p.amount, p.state)),
    check: {
      maxLnFugacityDifference: eq.check.maxLnFugacityDifference,
      gibbsChangeOverRT: eq.check.gibbsChangeOverRT,
      materialBalanceError: eq.check.materialBalanceError,
      method: eq.check.method,
    },
  };
}

/**
 * The entry fields of a mixture saturation point at given quality: both phases listed (the
 * incipient one with amount 0 at a bubble or dew point).
 */
export function saturationPointFields(
  point: MixtureSaturationPoint,
  gasConstant: number,
): EvalEquilibriumFields {
  const beta = point.vaporFraction;
  const phases = [
    { kind: "vapor", amount: beta, state: point.vapor },
    { kind: "liquid", amount: 1 - beta, state: point.liquid },
  ];
  const present = phases.filter((p) => p.amount > 0);
  const o = overall(point.temperatureK, point.pressurePa, present, gasConstant);
  return {
    T: point.temperatureK,
    P: point.pressurePa,
    rho: o.rho,
    Z: o.Z,
    phase: present.length === 2 ? "two-phase" : present[0].kind,
    h: o.h,
    s: o.s,
    u: o.u,
    quality: beta,
    phases: phases.map((p) => phaseEntry(p.kind, p.amount, p.state)),
  };
}

/** The response's "envelope" object (SI: K, Pa). */
export interface EvalEnvelope {
  points: { T: number; P: number; kind: "bubble" | "dew"; incipient: number[] }[];
  critical: { T: number; P: number }[];
  cricondenbar: { T: number; P: number } | null;
  cricondentherm: { T: number; P: number } | null;
  complete: boolean;
  stoppedBecause?: string;
  warnings?: string[];
}

/** The request-level envelope, in the names the batch interface fixes. */
export function envelopeResponse(env: PhaseEnvelope): EvalEnvelope {
  const out: EvalEnvelope = {
    points: env.points.map((p) => ({
      T: p.T,
      P: p.P,
      kind: p.kind,
      incipient: p.incipient.slice(),
    })),
    critical: env.critical.map((c) => ({ T: c.T, P: c.P })),
    cricondenbar: env.cricondenbar ? { T: env.cricondenbar.T, P: env.cricondenbar.P } : null,
    cricondentherm: env.cricondentherm
      ? { T: env.cricondentherm.T, P: env.cricondentherm.P }
      : null,
    complete: env.complete,
  };
  if (env.stoppedBecause !== undefined) out.stoppedBecause = env.stoppedBecause;
  if (env.warnings.length > 0) out.warnings = env.warnings.map((w) => `${w.code}: ${w.message}`);
  return out;
}
