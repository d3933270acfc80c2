import { describe, expect, it } from "vitest";
import { integrateDormandPrince } from "../../../kernel-lib/src/numerics/dormandPrince.js";
import { minimizeBrent } from "../../../kernel-lib/src/numerics/brentMinimize.js";
import { InputError, SolverError } from "../../../kernel-lib/src/errors.js";

// Every reference here is a closed-form solution of the equation integrated.
describe("integrateDormandPrince", () => {
  it("integrates y' = -y to exp(-t) within the tolerance (closed form)", () => {
    const r = integrateDormandPrince((_t, y) => [-y[0]], 0, [1], 5, { relativeTolerance: 1e-10 });
    const last = r.y[r.y.length - 1][0];
    expect(r.stoppedBecause).toBe("end");
    expect(r.t[r.t.length - 1]).toBe(5);
    expect(Math.abs(last - Math.exp(-5)) / Math.exp(-5)).toBeLessThan(1e-8);
    for (let k = 0; k < r.t.length; k++) {
      expect(Math.abs(r.y[k][0] - Math.exp(-r.t[k]))).toBeLessThan(1e-9);
    }
  });

  it("keeps the harmonic oscillator on its circle over ten periods (closed form cos t, -sin t)", () => {
    const T = 20 * Math.PI;
    const r = integrateDormandPrince((_t, y) => [y[1], -y[0]], 0, [1, 0], T, {
      relativeTolerance: 1e-10,
      absoluteTolerance: 1e-12,
    });
    const [x, v] = r.y[r.y.length - 1];
    expect(Math.abs(x - 1)).toBeLessThan(1e-7);
    expect(Math.abs(v)).toBeLessThan(1e-7);
  });

  it("the global error falls with the tolerance (fifth order: about 10^(-5/5) per decade)", () => {
    const errs = [1e-5, 1e-7, 1e-9].map((tol) => {
      const r = integrateDormandPrince((t, y) => [y[0] * Math.cos(t)], 0, [1], 10, {
        relativeTolerance: tol,
        absoluteTolerance: tol,
      });
      return Math.abs(r.y[r.y.length - 1][0] - Math.exp(Math.sin(10)));
    });
    expect(errs[1]).toBeLessThan(errs[0]);
    expect(errs[2]).toBeLessThan(errs[1]);
    expect(errs[2]).toBeLessThan(1e-8);
  });

  it("dense output between the steps matches the closed form to about the tolerance", () => {
    const r = integrateDormandPrince((_t, y) => [y[1], -y[0]], 0, [0, 1], 6, {
      relativeTolerance: 1e-9,
      absoluteTolerance: 1e-12,
    });
    expect(r.acceptedSteps).toBeGreaterThan(5);
    let worst = 0;
    for (let k = 0; k + 1 < r.t.length; k++) {
      for (const th of [0.25, 0.5, 0.75]) {
        const tq = r.t[k] + th * (r.t[k + 1] - r.t[k]);
        const [s, c] = r.at(tq);
        worst = Math.max(worst, Math.abs(s - Math.sin(tq)), Math.abs(c - Math.cos(tq)));
      }
    }
    expect(worst).toBeLessThan(1e-7);
    // at the mesh points dense output reproduces the steps
    expect(r.at(r.t[3])[0]).toBeCloseTo(r.y[3][0], 14);
  });

  it("locates a terminal event: y = cos t first reaches 0 at pi/2 (closed form)", () => {
    const r = integrateDormandPrince((_t, y) => [y[1], -y[0]], 0, [1, 0], 10, {
      events: [{ name: "zero", g: (_t, y) => y[0], direction: -1 }],
    });
    expect(r.stoppedBecause).toBe("event");
    expect(r.events).toHaveLength(1);
    expect(Math.abs(r.events[0].t - Math.PI / 2)).toBeLessThan(1e-7);
    expect(r.t[r.t.length - 1]).toBe(r.events[0].t);
  });

  it("records non-terminal events and honours the direction (rising zeros of sin t at 2 pi k)", () => {
    const r = integrateDormandPrince(
      (_t, y) => [y[1], -y[0]],
      0.1,
      [Math.sin(0.1), Math.cos(0.1)],
      13,
      {
        events: [{ name: "up", g: (_t, y) => y[0], direction: 1, terminal: false }],
      },
    );
    expect(r.stoppedBecause).toBe("end");
    expect(r.events.map((e) => e.t)).toHaveLength(2);
    expect(Math.abs(r.events[0].t - 2 * Math.PI)).toBeLessThan(1e-6);
    expect(Math.abs(r.events[1].t - 4 * Math.PI)).toBeLessThan(1e-6);
  });

  it("integrates backwards in time (y' = y from t = 1 to 0: y(0) = y(1)/e)", () => {
    const r = integrateDormandPrince((_t, y) => [y[0]], 1, [Math.E], 0, {
      relativeTolerance: 1e-10,
    });
    expect(r.y[r.y.length - 1][0]).toBeCloseTo(1, 8);
  });

  it("stops when the callback says so", () => {
    let calls = 0;
    const r = integrateDormandPrince((_t, y) => [-y[0]], 0, [1], 100, {
      onStep: () => ++calls < 3,
    });
    expect(r.stoppedBecause).toBe("callback");
    expect(r.acceptedSteps).toBe(3);
  });

  it("refuses bad input and reports a blow-up (y' = y^2, y(0) = 1: infinite at t = 1)", () => {
    expect(() => integrateDormandPrince((_t, y) => [y[0]], 0, [1], 0)).toThrow(InputError);
    expect(() => integrateDormandPrince((_t, y) => [y[0]], 0, [NaN], 1)).toThrow(InputError);
    expect(() =>
      integrateDormandPrince((_t, y) => [y[0]], 0, [1], 1, { relativeTolerance: 0 }),
    ).toThrow(InputError);
    expect(() => integrateDormandPrince((_t, y) => [y[0] * y[0]], 0, [1], 2)).toThrow(SolverError);
    expect(() => integrateDormandPrince(() => [NaN], 0, [1], 1)).toThrow(SolverError);
  });
});

describe("minimizeBrent", () => {
  it("finds the minimum of (x - 2)^2 + 1 and of -x e^-x (closed forms 2 and 1)", () => {
    const r = minimizeBrent((x) => (x - 2) ** 2 + 1, 0, 5, { tolerance: 1e-9 });
    expect(Math.abs(r.value - 2)).toBeLessThan(1e-7);
    expect(r.minimum).toBeCloseTo(1, 12);
    const s = minimizeBrent((x) => -x * Math.exp(-x), 0, 10, { tolerance: 1e-10 });
    expect(Math.abs(s.value - 1)).toBeLessThan(1e-6);
  });
  it("ends at the edge when the function is monotone, and refuses a bad interval", () => {
    const r = minimizeBrent((x) => x, 1, 2, { tolerance: 1e-9 });
    expect(r.value - 1).toBeLessThanOrEqual(r.errorEstimate);
    expect(r.errorEstimate).toBeLessThan(1e-7);
    expect(() => minimizeBrent((x) => x, 2, 1)).toThrow(InputError);
  });
});
