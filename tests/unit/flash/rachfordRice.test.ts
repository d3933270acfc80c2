/**
 * Rachford-Rice solvers against a high-precision reference: bisection of the same equation in
 * 60-digit decimal arithmetic (decimal.js from npm, with the exact binary values of the inputs), so round-off of the double-precision solver
 * shows up as a disagreement in the phase compositions (which near a pole carry the round-off of
 * beta - c_i magnified).
 */
import { describe, expect, it } from "vitest";
import Decimal from "decimal.js";
import { solveRachfordRice } from "../../../kernel-lib/src/phase/flash/rachfordRice.js";
import { solveMultiphaseSplit } from "../../../kernel-lib/src/phase/flash/multiphaseRachfordRice.js";
import { SolverError } from "../../../kernel-lib/src/errors.js";

const D = Decimal.clone({ precision: 60 });

/** The exact value of a double as a decimal (a literal like 1.0001 is not exactly 1.0001). */
function exact(v: number): Decimal {
  if (v === 0) return new D(0);
  const view = new DataView(new ArrayBuffer(8));
  view.setFloat64(0, v);
  const bits = view.getBigUint64(0);
  const sign = bits >> 63n ? -1 : 1;
  const e = Number((bits >> 52n) & 0x7ffn);
  let m = bits & 0xfffffffffffffn;
  let exp: number;
  if (e === 0) exp = -1074;
  else {
    m |= 1n << 52n;
    exp = e - 1075;
  }
  return new D(m.toString()).times(new D(2).pow(exp)).times(sign);
}

/** beta and x_i by bisection in decimal arithmetic between the poles. */
function referenceSplit(
  z: readonly number[],
  K: readonly number[],
): { beta: Decimal; x: Decimal[] } {
  const zs = z.map(exact);
  const Ks = K.map(exact);
  const f = (b: Decimal): Decimal =>
    zs.reduce(
      (acc, zi, i) =>
        zi.isZero() ? acc : acc.plus(zi.times(Ks[i].minus(1)).div(Ks[i].minus(1).times(b).plus(1))),
      new D(0),
    );
  // the open interval between the poles next to the root, c = 1 / (1 - K) (not the
  // Leibovici-Neoschil window, which assumes sum z = 1 exactly; the doubles of a feed may not)
  let lo = new D(-1e300);
  let hi = new D(1e300);
  zs.forEach((zi, i) => {
    if (zi.isZero()) return;
    const c = new D(1).div(new D(1).minus(Ks[i]));
    if (Ks[i].gt(1)) lo = D.max(lo, c);
    if (Ks[i].lt(1)) hi = D.min(hi, c);
  });
  for (let it = 0; it < 260; it++) {
    const mid = lo.plus(hi).div(2);
    if (f(mid).gt(0)) lo = mid;
    else hi = mid;
  }
  const beta = lo.plus(hi).div(2);
  const x = zs.map((zi, i) => zi.div(Ks[i].minus(1).times(beta).plus(1)));
  return { beta, x };
}

function relErr(a: number, b: Decimal): number {
  if (b.isZero()) return Math.abs(a);
  return exact(a).minus(b).div(b).abs().toNumber();
}

describe("Rachford-Rice, two phases", () => {
  it("a textbook case: beta in (0, 1), compositions sum to one (reference: decimal bisection)", () => {
    const z = [0.5, 0.3, 0.2];
    const K = [3.0, 0.8, 0.1];
    const r = solveRachfordRice(z, K);
    const ref = referenceSplit(z, K);
    expect(relErr(r.beta, ref.beta)).toBeLessThan(1e-14);
    r.x.forEach((xi, i) => expect(relErr(xi, ref.x[i])).toBeLessThan(1e-14));
    expect(Math.abs(r.x.reduce((a, b) => a + b, 0) - 1)).toBeLessThan(1e-15);
    expect(Math.abs(r.y.reduce((a, b) => a + b, 0) - 1)).toBeLessThan(1e-15);
    expect(Math.abs(r.beta + r.oneMinusBeta - 1)).toBeLessThan(1e-15);
  });

  it("extreme K-values 1e-12 .. 1e12 with trace components: compositions to 1e-12 relative", () => {
    const cases: { z: number[]; K: number[] }[] = [
      // a root 1e-13 from the pole of the lightest component (the case of round-off loss)
      { z: [1e-8, 0.5, 0.5 - 1e-8], K: [1e12, 1e-3, 1e-12] },
      { z: [0.999999, 1e-6], K: [1.0001, 1e-12] },
      { z: [1e-10, 1 - 2e-10, 1e-10], K: [1e12, 0.9999999, 1e-12] },
      { z: [0.3, 0.3, 0.4 - 1e-8, 1e-8], K: [1e12, 1e6, 1e-6, 1e-12] },
      { z: [0.2, 0.2, 0.2, 0.2, 0.2], K: [1e12, 10, 1, 0.1, 1e-12] },
      { z: [1 - 1e-9, 1e-9], K: [1 + 1e-9, 1e-12] },
    ];
    for (const { z, K } of cases) {
      const r = solveRachfordRice(z, K);
      const ref = referenceSplit(z, K);
      r.x.forEach((xi, i) =>
        expect(relErr(xi, ref.x[i]), `x[${i}] of z=${z} K=${K}`).toBeLessThan(1e-12),
      );
      const ySum = r.y.reduce((a, b) => a + b, 0);
      expect(Math.abs(ySum - 1)).toBeLessThan(1e-13);
      expect(Math.abs(r.x.reduce((a, b) => a + b, 0) - 1)).toBeLessThan(1e-13);
      // the phase amount itself to an absolute 1e-15 of the reference
      expect(Math.abs(exact(r.beta).minus(ref.beta).toNumber())).toBeLessThan(1e-14);
    }
  });

  it("random K-values over 24 decades: 120 cases against the decimal reference", () => {
    let seed = 12345;
    const rnd = (): number => (seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648;
    for (let c = 0; c < 120; c++) {
      const n = 2 + Math.floor(rnd() * 5);
      const z = Array.from({ length: n }, () => (rnd() < 0.2 ? 1e-8 * rnd() + 1e-12 : rnd()));
      const s = z.reduce((a, b) => a + b, 0);
      for (let i = 0; i < n; i++) z[i] /= s;
      const K = Array.from({ length: n }, () => Math.pow(10, -12 + 24 * rnd()));
      K[0] = Math.max(K[0], 1.5);
      K[1] = Math.min(K[1], 0.5);
      const r = solveRachfordRice(z, K);
      const ref = referenceSplit(z, K);
      r.x.forEach((xi, i) => expect(relErr(xi, ref.x[i]), `case ${c} x[${i}]`).toBeLessThan(1e-11));
    }
  });

  it("absent components get zero in both phases; no root is a typed error", () => {
    const r = solveRachfordRice([0.5, 0, 0.5], [2, 5, 0.5]);
    expect(r.x[1]).toBe(0);
    expect(r.y[1]).toBe(0);
    expect(r.beta).toBeCloseTo(0.5, 14); // symmetric: z (K - 1)/(1 + b (K - 1)) cancels at b = 0.5 (hand calculation)
    expect(() => solveRachfordRice([0.5, 0.5], [2, 3])).toThrow(SolverError);
    expect(() => solveRachfordRice([0.5, 0.5], [0.2, 0.3])).toThrow(SolverError);
  });

  it("negative flash: beta outside [0, 1] is returned as such", () => {
    // f(0) = sum z (K - 1) < 0 here, so beta < 0 (hand calculation)
    const r = solveRachfordRice([0.5, 0.5], [1.1, 0.5]);
    expect(r.beta).toBeLessThan(0);
    const ref = referenceSplit([0.5, 0.5], [1.1, 0.5]);
    expect(relErr(r.beta, ref.beta)).toBeLessThan(1e-14);
  });
});

describe("multiphase split (Michelsen's Q function)", () => {
  it("two phases agree with the Rachford-Rice root", () => {
    const z = [0.5, 0.3, 0.2];
    const K = [3.0, 0.8, 0.1];
    const m = solveMultiphaseSplit(z, [[1, 1, 1], K]);
    const r = solveRachfordRice(z, K);
    expect(m.beta[1]).toBeCloseTo(r.beta, 12);
    expect(m.beta[0]).toBeCloseTo(1 - r.beta, 12);
  });

  it("three phases: amounts sum to one, balances close, compositions sum to one", () => {
    // an invented vapour / oil / water-like K set (reference phase: the oil)
    const z = [0.3, 0.3, 0.4];
    const Kv = [20, 0.3, 0.05];
    const Kw = [0.01, 0.001, 50];
    const m = solveMultiphaseSplit(z, [[1, 1, 1], Kv, Kw]);
    expect(m.beta.every((b) => b > 0)).toBe(true);
    expect(Math.abs(m.beta.reduce((a, b) => a + b, 0) - 1)).toBeLessThan(1e-12);
    for (let i = 0; i < 3; i++) {
      const bal = m.beta.reduce((a, b, k) => a + b * m.x[k][i], 0);
      expect(Math.abs(bal - z[i])).toBeLessThan(1e-13);
    }
    for (const row of m.x) expect(Math.abs(row.reduce((a, b) => a + b, 0) - 1)).toBeLessThan(1e-12);
  });

  it("a phase that cannot exist ends at zero amount (active bound)", () => {
    // the third phase's K equal to the second's scaled down: it is never needed
    const z = [0.5, 0.5];
    const m = solveMultiphaseSplit(z, [
      [1, 1],
      [4, 0.25],
      [0.5, 0.5],
    ]);
    expect(m.beta[2]).toBe(0);
    expect(m.beta[0] + m.beta[1]).toBeCloseTo(1, 12);
  });
});
