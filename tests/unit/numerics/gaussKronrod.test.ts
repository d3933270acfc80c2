import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { integrateAdaptive, KRONROD_15 } from "../../../kernel-lib/src/numerics/gaussKronrod.js";
import { InputError, SolverError } from "../../../kernel-lib/src/errors.js";

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

/** Legendre polynomial P_n(x) by the three-term recurrence (closed form). */
function legendre(n: number, x: number): number {
  let p0 = 1;
  let p1 = x;
  for (let k = 2; k <= n; k++) {
    const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
    p0 = p1;
    p1 = p2;
  }
  return n === 0 ? p0 : p1;
}

/** The fixed 15-point Kronrod rule on [a, b], from the tabulated nodes and weights. */
function kronrodFixed(f: (x: number) => number, a: number, b: number): number {
  const c = (a + b) / 2;
  const h = (b - a) / 2;
  let s = KRONROD_15.kronrodWeights[7] * f(c);
  for (let j = 0; j < 7; j++) {
    const dx = h * KRONROD_15.nodes[j];
    s += KRONROD_15.kronrodWeights[j] * (f(c - dx) + f(c + dx));
  }
  return s * h;
}

describe("Kronrod 7-15 table (Piessens et al. 1983, QK15)", () => {
  it("has the 7-point Gauss nodes at the roots of P_7 (closed form)", () => {
    for (const j of [1, 3, 5, 7]) {
      expect(Math.abs(legendre(7, KRONROD_15.nodes[j]))).toBeLessThan(1e-14);
    }
  });

  it("integrates monomials exactly: Kronrod to degree 22, Gauss to degree 13 (closed forms)", () => {
    for (let k = 0; k <= 22; k++) {
      // Integral of x^k over [-1, 1] is 2/(k+1) for even k, 0 for odd k.
      const exact = k % 2 === 0 ? 2 / (k + 1) : 0;
      let sk = KRONROD_15.kronrodWeights[7] * (k === 0 ? 1 : 0);
      for (let j = 0; j < 7; j++)
        sk += KRONROD_15.kronrodWeights[j] * 2 * (k % 2 === 0 ? KRONROD_15.nodes[j] ** k : 0);
      expect(Math.abs(sk - exact)).toBeLessThan(1e-14);
      if (k <= 13) {
        let sg = KRONROD_15.gaussWeights[3] * (k === 0 ? 1 : 0);
        for (const [g, j] of [
          [0, 1],
          [1, 3],
          [2, 5],
        ]) {
          sg += KRONROD_15.gaussWeights[g] * 2 * (k % 2 === 0 ? KRONROD_15.nodes[j] ** k : 0);
        }
        expect(Math.abs(sg - exact)).toBeLessThan(1e-14);
      }
    }
  });
});

describe("integrateAdaptive", () => {
  it("integrates smooth functions in one rule to near machine precision (closed forms)", () => {
    const r = integrateAdaptive(Math.exp, 0, 1);
    expect(rel(r.value, Math.E - 1)).toBeLessThan(1e-15);
    expect(r.subdivisions).toBe(1);
    expect(r.evaluations).toBe(15);
    const s = integrateAdaptive(Math.sin, 0, Math.PI);
    expect(rel(s.value, 2)).toBeLessThan(1e-14);
    // 1/(1 + x^2) on [0, 1] = pi/4
    const t = integrateAdaptive((x) => 1 / (1 + x * x), 0, 1);
    expect(rel(t.value, Math.PI / 4)).toBeLessThan(1e-14);
  });

  it("integrates an odd function to zero at the rounding floor instead of failing (closed form 0)", () => {
    const r = integrateAdaptive((x) => Math.sin(3 * x) * Math.exp(-x * x), -2, 2);
    expect(Math.abs(r.value)).toBeLessThan(1e-14);
    expect(r.errorEstimate).toBeLessThan(1e-12);
    expect(integrateAdaptive(() => 0, 0, 1).value).toBe(0);
  });

  it("reverses sign when a > b and returns 0 for an empty interval", () => {
    expect(integrateAdaptive(Math.exp, 1, 0).value).toBeCloseTo(-(Math.E - 1), 14);
    expect(integrateAdaptive(Math.exp, 2, 2).value).toBe(0);
  });

  it("handles a sqrt endpoint where the fixed 15-point rule fails (closed form 2/3)", () => {
    const fixed = kronrodFixed(Math.sqrt, 0, 1);
    expect(rel(fixed, 2 / 3)).toBeGreaterThan(1e-6);
    const r = integrateAdaptive(Math.sqrt, 0, 1);
    expect(rel(r.value, 2 / 3)).toBeLessThan(1e-10);
    expect(Math.abs(r.value - 2 / 3)).toBeLessThanOrEqual(r.errorEstimate);
    expect(r.subdivisions).toBeGreaterThan(1);
  });

  it("handles a sharp peak where the fixed rule fails (closed form via atan)", () => {
    // f = 1 / (1e-6 + (x - 0.3)^2): integral over [0, 1] = (atan(0.7/1e-3) + atan(0.3/1e-3)) / 1e-3
    const eps = 1e-3;
    const f = (x: number) => 1 / (eps * eps + (x - 0.3) * (x - 0.3));
    const exact = (Math.atan(0.7 / eps) + Math.atan(0.3 / eps)) / eps;
    expect(rel(kronrodFixed(f, 0, 1), exact)).toBeGreaterThan(0.1);
    const r = integrateAdaptive(f, 0, 1);
    expect(rel(r.value, exact)).toBeLessThan(1e-10);
  });

  it("handles an integrable 1/sqrt singularity at an end point (closed form 2)", () => {
    // Nodes never touch the end points, so 1/sqrt(x) is only evaluated inside (0, 1].
    const r = integrateAdaptive((x) => 1 / Math.sqrt(x), 0, 1, { maxSubdivisions: 500 });
    expect(rel(r.value, 2)).toBeLessThan(1e-9);
  });

  it("meets the requested tolerance for random Gaussian bumps (property, closed form via erf-free symmetric integral)", () => {
    // Integral over the whole real line of exp(-(x - m)^2 / (2 s^2)) is s sqrt(2 pi); over
    // [m - 12 s, m + 12 s] the tail lost is below 1e-31 relative (closed form).
    fc.assert(
      fc.property(
        fc.double({ min: -5, max: 5, noNaN: true }),
        fc.double({ min: 1e-3, max: 10, noNaN: true }),
        (m, s) => {
          const r = integrateAdaptive(
            (x) => Math.exp(-((x - m) * (x - m)) / (2 * s * s)),
            m - 12 * s,
            m + 12 * s,
          );
          expect(rel(r.value, s * Math.sqrt(2 * Math.PI))).toBeLessThan(1e-10);
        },
      ),
      { numRuns: 200 },
    );
  });

  it("supports nested integration (integrand calling the integrator): ∫0^1 ∫0^1 x y dy dx = 1/4", () => {
    const r = integrateAdaptive((x) => integrateAdaptive((y) => x * y, 0, 1).value, 0, 1);
    expect(r.value).toBeCloseTo(0.25, 14);
    // A nested sqrt forces subdivision in both levels: ∫0^1 ∫0^1 sqrt(x y) dy dx = 4/9.
    const s = integrateAdaptive(
      (x) => integrateAdaptive((y) => Math.sqrt(x * y), 0, 1).value,
      0,
      1,
    );
    expect(rel(s.value, 4 / 9)).toBeLessThan(1e-9);
  });

  it("reports failure with the achieved error when subdivisions run out", () => {
    // sin(1/x) oscillates infinitely often near 0.
    try {
      integrateAdaptive((x) => Math.sin(1 / x), 1e-6, 1, { maxSubdivisions: 20 });
      expect.unreachable();
    } catch (err) {
      expect(err).toBeInstanceOf(SolverError);
      expect((err as Error).message).toMatch(/achieved error estimate [0-9.e-]+/);
      expect((err as Error).message).toContain("maxSubdivisions 20");
    }
  });

  it("refuses bad input and non-finite integrands", () => {
    expect(() => integrateAdaptive(Math.exp, NaN, 1)).toThrow(InputError);
    expect(() => integrateAdaptive(Math.exp, 0, Infinity)).toThrow(InputError);
    expect(() => integrateAdaptive(Math.exp, 0, 1, { relTolerance: -1 })).toThrow(InputError);
    expect(() => integrateAdaptive(Math.exp, 0, 1, { relTolerance: 0 })).toThrow(InputError);
    expect(() => integrateAdaptive(Math.exp, 0, 1, { maxSubdivisions: 0 })).toThrow(InputError);
    expect(() => integrateAdaptive((x) => 1 / (x - 0.5), 0, 1)).toThrow(SolverError);
    expect(() => integrateAdaptive(() => NaN, 0, 1)).toThrow(/NaN or infinite/);
  });
});
