/**
 * The multiphase Rachford-Rice minimisation (phase/flash/multiphaseRachfordRice.ts) with a trace
 * aqueous phase: the K-values of a three-phase flash of a natural gas with 100 ppm water at 50 bar,
 * 267.6 K (Peng-Robinson; vapour, hydrocarbon liquid, aqueous liquid). The aqueous amount is about
 * 1.5e-5, the Hessian of Michelsen's Q function is large in that direction, and the decrease of Q
 * fell below its rounding while the gradient was still 1.7e-6: the line search refused every step
 * and the flash threw. Checked: convergence, each phase's mole fractions sum to one, and the
 * material balance closes (exact conditions of the minimum, Michelsen 1994).
 */
import { describe, expect, it } from "vitest";
import { solveMultiphaseSplit } from "../../../kernel-lib/src/phase/flash/multiphaseRachfordRice.js";

const z = [0.0119988, 0.0179982, 0.849915, 0.059994, 0.0349965, 0.0149985, 0.009999, 0.0001];
const K = [
  [1, 1, 1, 1, 1, 1, 1, 1],
  [
    0.1024560468503634, 0.7902724463657849, 0.32110822829759733, 1.6088632606584925,
    5.2078693668361415, 16.514091163184702, 140.4154875220391, 0.7166324354497897,
  ],
  [
    2.111986380688332e-8, 0.00007382296574124596, 2.3632610916667452e-8, 1.2956704524017372e-10,
    1.7659381483291192e-14, 3.50692785774989e-17, 1.7599514000647834e-24, 11636.557448395895,
  ],
];

describe("multiphase split with a trace aqueous phase", () => {
  it("converges from the flash's own start and closes the balances", () => {
    const r = solveMultiphaseSplit(z, K, {
      start: [0.922396830433864, 0.027603169566135982, 0.05],
    });
    expect(r.gradient).toBeLessThan(1e-12);
    expect(r.beta[2]).toBeGreaterThan(1e-5);
    expect(r.beta[2]).toBeLessThan(2e-5);
    for (const x of r.x) expect(Math.abs(x.reduce((a, b) => a + b, 0) - 1)).toBeLessThan(1e-12);
    for (let i = 0; i < z.length; i++) {
      const sum = r.beta.reduce((a, b, k) => a + b * r.x[k][i], 0);
      expect(Math.abs(sum - z[i])).toBeLessThan(1e-13);
    }
  });
});
