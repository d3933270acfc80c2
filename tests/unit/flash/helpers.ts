/**
 * Independent checks of a returned equilibrium, used by every flash test: fugacities recomputed
 * from the returned states (ln f = ln x + ln phi + ln P), the material balance, the ordering and
 * labels by density, and the tangent-plane test run again on each returned phase.
 */
import { expect } from "vitest";
import type { Equilibrium } from "../../../kernel-lib/src/phase/flash/types.js";
import type { FluidBinding } from "../../../kernel-lib/src/state/types.js";
import { stabilityAtTP } from "../../../kernel-lib/src/phase/stability.js";

/** max |ln f_i(a) - ln f_i(b)| over present components and pairs, from the states alone. */
export function recomputedFugacityGap(eq: Equilibrium): number {
  let gap = 0;
  const ps = eq.phases;
  for (let a = 0; a < ps.length; a++) {
    for (let b = a + 1; b < ps.length; b++) {
      for (let i = 0; i < eq.z.length; i++) {
        if (!(eq.z[i] > 0)) continue;
        const fa = Math.log(ps[a].state.x[i] * ps[a].state.pressurePa) + ps[a].state.lnPhi[i];
        const fb = Math.log(ps[b].state.x[i] * ps[b].state.pressurePa) + ps[b].state.lnPhi[i];
        gap = Math.max(gap, Math.abs(fa - fb));
      }
    }
  }
  return gap;
}

/** Every check a returned equilibrium must pass; returns the number of phases. */
export function expectVerified(
  binding: FluidBinding,
  eq: Equilibrium,
  options: { stability?: boolean } = {},
): number {
  expect(recomputedFugacityGap(eq)).toBeLessThanOrEqual(1e-10);
  let total = 0;
  for (let i = 0; i < eq.z.length; i++) {
    let s = 0;
    for (const p of eq.phases) s += p.amount * p.state.x[i];
    expect(Math.abs(s - eq.z[i])).toBeLessThanOrEqual(1e-12);
  }
  for (const p of eq.phases) {
    expect(p.amount).toBeGreaterThan(0);
    total += p.amount;
  }
  expect(Math.abs(total - 1)).toBeLessThan(1e-12);
  expect(eq.check.gibbsChangeOverRT).toBeLessThanOrEqual(1e-12);
  // order: increasing density; labels: vapour only as the lightest, liquid before liquid-2
  for (let k = 1; k < eq.phases.length; k++) {
    expect(eq.phases[k].state.densityMolPerM3).toBeGreaterThan(
      eq.phases[k - 1].state.densityMolPerM3,
    );
    expect(eq.phases[k].kind).not.toBe("vapor");
  }
  const kinds = eq.phases.map((p) => p.kind).join(",");
  expect(["vapor", "liquid", "vapor,liquid", "liquid,liquid-2", "vapor,liquid,liquid-2"]).toContain(
    kinds,
  );
  if (options.stability !== false) {
    // the tangent-plane test of each returned phase finds nothing lower
    for (const p of eq.phases) {
      const t = stabilityAtTP(binding.model, eq.temperatureK, eq.pressurePa, p.state.x.slice());
      expect(t.stable, `phase ${p.kind} at T = ${eq.temperatureK}, P = ${eq.pressurePa}`).toBe(
        true,
      );
    }
  }
  return eq.phases.length;
}
