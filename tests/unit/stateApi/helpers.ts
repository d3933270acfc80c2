/**
 * Shared checks of the one state API (fluid/phaseState.ts): a state re-specified by another pair
 * must come back at the same T and P, and every PhaseState must satisfy the identities of its
 * overall properties.
 */
import { expect } from "vitest";
import type { Fluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import type { PhaseState, StateRequest } from "../../../kernel-lib/src/fluid/phaseState.js";

/**
 * Tolerances of a round trip. The state-function flashes meet their specification to 1e-9
 * relative and close their outer search on T to 1e-10 T and on ln P to 1e-13 or 1e-14
 * (phase/flash/stateFunctionFlash.ts, flashTV.ts); the recovered T and P are held to looser
 * bounds that still catch a wrong branch or a missed phase by orders of magnitude (derived:
 * dT = dh / cp with dh = 1e-9 max(|h|, RT) gives about 1e-6 K at |h| = 1e5 J/mol, cp = 40 J/(mol K)).
 */
export const ROUND_TRIP = { temperatureK: 1e-6, pressureRelative: 1e-6 } as const;

/** The identities every PhaseState must satisfy (derived: definitions and the lever rule). */
export function expectConsistent(st: PhaseState): void {
  const T = st.temperatureK;
  const scale = Math.max(Math.abs(st.molar.h), 8.314 * T);
  expect(Math.abs(st.molar.g - (st.molar.h - T * st.molar.s))).toBeLessThanOrEqual(1e-9 * scale);
  expect(Math.abs(st.molar.a - (st.molar.u - T * st.molar.s))).toBeLessThanOrEqual(1e-9 * scale);
  // h = u + P v of the whole (each phase at the same P)
  expect(
    Math.abs(st.molar.h - (st.molar.u + st.pressurePa / st.densityMolPerM3)),
  ).toBeLessThanOrEqual(1e-8 * scale);
  expect(st.mass.h * st.molarMassKgPerMol).toBeCloseTo(st.molar.h, 6);
  let amount = 0;
  for (const p of st.phases) amount += p.amount;
  expect(Math.abs(amount - 1)).toBeLessThanOrEqual(1e-12);
  const positive = st.phases.filter((p) => p.amount > 0);
  if (positive.length === 1) {
    expect(Number.isFinite(st.molar.cp)).toBe(true);
    expect(Number.isFinite(st.molar.cv)).toBe(true);
    expect(Number.isFinite(st.jouleThomsonKPerPa)).toBe(true);
    expect(st.residual).toBe(positive[0].residual);
    expect(["vapor", "liquid", "supercritical"]).toContain(st.phase);
  } else {
    // two or three phases: no number, never NaN
    expect(st.molar.cp).toBeUndefined();
    expect(st.molar.cv).toBeUndefined();
    expect(st.speedOfSoundMPerS).toBeUndefined();
    expect(st.jouleThomsonKPerPa).toBeUndefined();
    expect(st.residual).toBeUndefined();
    expect(st.phase).toBe(positive.length === 2 ? "two-phase" : "three-phase");
    expect(st.check).toBeDefined();
    expect(st.check!.maxLnFugacityDifference).toBeLessThanOrEqual(1e-10);
    expect(st.check!.gibbsChangeOverRT).toBeLessThanOrEqual(0);
    expect(st.check!.materialBalanceError).toBeLessThanOrEqual(1e-12);
  }
}

/** Re-specifies a (T, P) state by every other state-function pair and checks T and P come back. */
export function expectRoundTrips(
  fluid: Fluid,
  T: number,
  P: number,
  x: readonly number[],
): PhaseState {
  const base = fluid.state({ T, P, x });
  expectConsistent(base);
  const requests: StateRequest[] = [
    { P, h: base.molar.h, x },
    { P, s: base.molar.s, x },
    { T, s: base.molar.s, x },
    { T, rho: base.densityMolPerM3, x },
    { u: base.molar.u, rho: base.densityMolPerM3, x },
  ];
  for (const request of requests) {
    const again = fluid.state(request);
    const what = `${fluid.componentIds.join("/")} at T = ${T} K, P = ${P} Pa by ${again.specifiedBy.join(", ")}`;
    expect(Math.abs(again.temperatureK - T), what).toBeLessThanOrEqual(ROUND_TRIP.temperatureK);
    expect(Math.abs(again.pressurePa / P - 1), what).toBeLessThanOrEqual(
      ROUND_TRIP.pressureRelative,
    );
    expect(again.phases.length, what).toBe(base.phases.length);
    expect(Math.abs(again.vaporFraction - base.vaporFraction), what).toBeLessThanOrEqual(1e-6);
    expect(again.specification.length, what).toBeGreaterThan(0);
    for (const r of again.specification) expect(r.relativeError, what).toBeLessThanOrEqual(1e-9);
    expectConsistent(again);
  }
  return base;
}
