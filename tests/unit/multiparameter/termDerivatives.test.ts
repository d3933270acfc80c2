/**
 * The term engine's analytic derivatives against numerical derivatives of the next-lower analytic
 * derivative (an identity, no external reference), for every shipped equation over random
 * (tau, delta), and the engine's edge cases.
 *
 * Numerical derivative: Ridders' method, C. J. F. Ridders, "Accurate computation of F'(x) and
 * F'(x) F''(x)", Advances in Engineering Software 4(2), 75-76 (1982): central differences at a
 * geometric sequence of steps h0, h0/1.4, h0/1.4^2, ... extrapolated to h -> 0 in a Neville
 * tableau (Richardson extrapolation in h^2). The tableau gives its own error estimate (the change
 * between successive extrapolations), which covers the truncation error of the scheme at the step
 * sizes actually used, and the growth of rounding error as the step shrinks stops the sequence.
 *
 * Why not a fixed step and a fixed tolerance: the Gaussian bell-shaped terms of nitrogen and
 * carbon dioxide have beta up to several hundred in tau, so near their centres the third
 * derivative in tau reaches ~1e4-1e5. A plain central difference with h = 1e-5 tau then has a
 * truncation error h^2 f'''/6 of several 1e-6 relative, and a fixed 1e-6 tolerance failed at
 * random states (e.g. nitrogen at (tau, delta) = (1.036, 0.811)). The tolerance here is derived
 * from the scheme: `SAFETY` times the tableau's error estimate plus a rounding floor, and the test
 * also requires that tolerance to stay below 1e-6 of max(1, |value|), so the comparison stays
 * sharp enough to catch a derivative wrong by 1e-5 (shown in the last block of this group).
 *
 * fast-check runs with a fixed seed (`SEED`), so a failure is reproducible; change the seed to
 * explore other states (any failure then is a real finding, not noise).
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { referenceFluidIds } from "../../../kernel-lib/src/eos/multiparameter/referenceFluids.js";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import {
  compileResidualPart,
  emptyReducedHelmholtz,
} from "../../../kernel-lib/src/eos/multiparameter/residualPart.js";

type Reduced = ReturnType<typeof emptyReducedHelmholtz>;
type Part = (tau: number, delta: number) => Reduced;

/** Fixed fast-check seed: the random states are the same in every run (reproducible). */
const SEED = 20261201;
/** Multiplier on the Ridders error estimate. */
const SAFETY = 8;
/**
 * Relative floor for double-precision evaluation of ~50 cancelling terms and their exponentials
 * (the rounding bound of a single difference can miss it; seen up to 6e-11 in the dense liquid of
 * water). Three decades under SHARPNESS.
 */
const ARITHMETIC_FLOOR = 1e-9;
/** The tolerance must stay below this fraction of max(1, |value|) for the check to be sharp. */
const SHARPNESS = 1e-6;

interface NumericDerivative {
  value: number;
  /** Truncation error estimate from the extrapolation tableau. */
  errorEstimate: number;
  /** Bound on the rounding error of `value` (see riddersDerivative). */
  roundingBound: number;
}

/**
 * Ridders' extrapolated central difference of g at x (Ridders 1982, see file header), starting
 * from step h0 and shrinking it by 1.4 per level, at most `levels` levels. The rounding bound is
 * 1000 eps max|g| / h at the step of the accepted value: eps |g| / h is the rounding of one
 * central difference of values correct to eps |g|; the factor 1000 allows for g itself being a
 * sum of up to ~50 terms that cancel (in the dense liquid and at low density the terms are tens to
 * hundreds of times |g|, so g's own rounding exceeds eps |g| by that much) and for the
 * amplification of noise by the extrapolation weights. At the steps used (>= 2.4e-4 x) the bound
 * stays below ~1e-9 relative, three decades under SHARPNESS.
 */
function riddersDerivative(
  g: (x: number) => number,
  x: number,
  h0: number,
  levels = 10,
): NumericDerivative {
  const shrink = 1.4;
  const shrink2 = shrink * shrink;
  let gMax = 0;
  const difference = (h: number): number => {
    const up = g(x + h);
    const down = g(x - h);
    gMax = Math.max(gMax, Math.abs(up), Math.abs(down));
    return (up - down) / (2 * h);
  };
  let h = h0;
  let previousRow = [difference(h)];
  let best = previousRow[0];
  let bestError = Number.POSITIVE_INFINITY;
  let bestStep = h;
  for (let i = 1; i < levels; i++) {
    h /= shrink;
    const row = [difference(h)];
    let factor = shrink2;
    for (let j = 1; j <= i; j++) {
      row[j] = (row[j - 1] * factor - previousRow[j - 1]) / (factor - 1);
      factor *= shrink2;
      const change = Math.max(Math.abs(row[j] - row[j - 1]), Math.abs(row[j] - previousRow[j - 1]));
      if (change <= bestError) {
        bestError = change;
        best = row[j];
        bestStep = h;
      }
    }
    // rounding error has started to dominate: the diagonal grew by more than twice the estimate
    if (Math.abs(row[i] - previousRow[i - 1]) >= 2 * bestError) break;
    previousRow = row;
  }
  const roundingBound = (1000 * Number.EPSILON * Math.max(gMax, 1e-300)) / bestStep;
  return { value: best, errorEstimate: bestError, roundingBound };
}

/**
 * Compare an analytic derivative with Ridders' estimate. The tolerance is SAFETY x the tableau's
 * error estimate plus the rounding bound plus ARITHMETIC_FLOOR of max(1, |value|); it must itself be sharp (below SHARPNESS of
 * max(1, |value|)), otherwise the state is reported as one the check cannot judge (a failure,
 * not a pass). `analyticErrorRelative` is the documented error of the "analytic" side itself,
 * relative to max(1, |value|).
 */
function check(
  name: string,
  analytic: number,
  numeric: NumericDerivative,
  analyticErrorRelative = 0,
): void {
  const scale = Math.max(1, Math.abs(analytic));
  const tol =
    SAFETY * numeric.errorEstimate +
    numeric.roundingBound +
    (ARITHMETIC_FLOOR + analyticErrorRelative) * scale;
  if (!(tol <= SHARPNESS * scale)) {
    throw new Error(
      `${name}: numerical derivative too uncertain to judge (tolerance ${tol}, value ${analytic})`,
    );
  }
  if (!(Math.abs(analytic - numeric.value) <= tol)) {
    throw new Error(`${name}: analytic ${analytic}, numerical ${numeric.value} +/- ${tol}`);
  }
}

/**
 * Initial step of the Ridders sequence, relative to the variable: well inside the narrowest
 * Gaussian bell in tau (beta up to ~400, width ~0.05) and the distance to water's non-analytic
 * point kept by the state filter.
 */
const H0 = 0.005;

/**
 * Ridders' derivative from the initial step H0 x; where the function varies on a shorter scale
 * (near the critical point, where the non-analytic terms of water and carbon dioxide vary over
 * ~0.01 in tau) and the tableau cannot reach SHARPNESS, start again from a step 10 and 100 times
 * smaller. The first sharp result is returned, else the last one (which `check` then reports).
 */
function sharpDerivative(g: (x: number) => number, x: number): NumericDerivative {
  let result = riddersDerivative(g, x, H0 * x);
  for (const shrink of [10, 100]) {
    const tol = SAFETY * result.errorEstimate + result.roundingBound;
    if (tol <= 0.1 * SHARPNESS * Math.max(1, Math.abs(result.value))) break;
    const retry = riddersDerivative(g, x, (H0 * x) / shrink);
    if (retry.errorEstimate + retry.roundingBound < result.errorEstimate + result.roundingBound) {
      result = retry;
    }
  }
  return result;
}

/**
 * For equations with non-analytic terms (water, carbon dioxide) the engine's delta^3 phi_ddd of
 * those terms is itself a central difference (step 1e-6 delta, residualPart.ts header: ~1e-9 of
 * those terms); allowed here as 1e-8 of max(1, |phi_ddd|), still 100 times under SHARPNESS.
 */
const NON_ANALYTIC_THIRD_ERROR = 1e-8;

function checkAll(part: Part, tau: number, delta: number, thirdError = 0): void {
  const at = part(tau, delta);
  const inDelta = (g: (d: number) => number): NumericDerivative => sharpDerivative(g, delta);
  const inTau = (g: (t: number) => number): NumericDerivative => sharpDerivative(g, tau);
  check(
    "phi_d",
    at.fD / delta,
    inDelta((d) => part(tau, d).f),
  );
  check(
    "phi_dd",
    at.fDD / delta ** 2,
    inDelta((d) => part(tau, d).fD / d),
  );
  check(
    "phi_ddd",
    at.fDDD / delta ** 3,
    inDelta((d) => part(tau, d).fDD / d ** 2),
    thirdError,
  );
  check(
    "phi_t",
    at.fT / tau,
    inTau((t) => part(t, delta).f),
  );
  check(
    "phi_tt",
    at.fTT / tau ** 2,
    inTau((t) => part(t, delta).fT / t),
  );
  check(
    "phi_dt",
    at.fDT / (delta * tau),
    inTau((t) => part(t, delta).fD / delta),
  );
}

/** True when the equation has non-analytic terms (its fDDD is NaN unless `third` is asked). */
const hasNonAnalyticTerms = (id: string): boolean =>
  Number.isNaN(referenceFluid(id).residualReduced(1.2, 2, emptyReducedHelmholtz()).fDDD);
const thirdErrorOf = (id: string): number =>
  hasNonAnalyticTerms(id) ? NON_ANALYTIC_THIRD_ERROR : 0;

const residualOf =
  (id: string): Part =>
  (tau, delta) =>
    referenceFluid(id).residualReduced(tau, delta, emptyReducedHelmholtz(), true);

/** Random reduced states; away from water's non-analytic point tau = delta = 1. */
const states = fc
  .tuple(
    fc.double({ min: 0.3, max: 2.5, noNaN: true }),
    fc.double({ min: 0.01, max: 3.2, noNaN: true }),
  )
  .filter(([tau, delta]) => Math.abs(delta - 1) > 0.05 || Math.abs(tau - 1) > 0.05);

describe("analytic derivatives = Ridders-extrapolated differences", () => {
  for (const id of referenceFluidIds()) {
    it(`${id}: residual part over random states (third derivative included), seed ${SEED}`, () => {
      const part = residualOf(id);
      fc.assert(
        fc.property(states, ([tau, delta]) => checkAll(part, tau, delta, thirdErrorOf(id))),
        { numRuns: 150, seed: SEED },
      );
    });
    it(`${id}: ideal part`, () => {
      const fluid = referenceFluid(id);
      const part: Part = (tau, delta) => fluid.idealReduced(tau, delta, emptyReducedHelmholtz());
      for (const [tau, delta] of [
        [0.5, 0.1],
        [1.3, 2.5],
        [2.2, 1e-4],
      ]) {
        checkAll(part, tau, delta);
      }
    });
  }

  it("the nitrogen state that failed a fixed-step 1e-6 check passes", () => {
    // (tau, delta) = (1.036, 0.811): a plain central difference (h = 1e-5 tau) gave phi_tt
    // -4.647354425 against the analytic -4.647359072 (truncation error of the fixed step)
    expect(() => checkAll(residualOf("nitrogen"), 1.036, 0.811)).not.toThrow();
  });

  it("a derivative wrong by a factor 1 + 1e-5 is caught, for each of the six", () => {
    const keys = ["fD", "fDD", "fDDD", "fT", "fTT", "fDT"] as const;
    const names = ["phi_d", "phi_dd", "phi_ddd", "phi_t", "phi_tt", "phi_dt"];
    const sample = fc.sample(states, { numRuns: 40, seed: SEED });
    for (const id of referenceFluidIds()) {
      const exact = residualOf(id);
      keys.forEach((key, k) => {
        // only the value at the checked point is wrong; the numerical side uses the exact part
        const wrongAt =
          (tau0: number, delta0: number): Part =>
          (tau, delta) => {
            const r = exact(tau, delta);
            if (tau === tau0 && delta === delta0) r[key] *= 1 + 1e-5;
            return r;
          };
        let caught = 0;
        for (const [tau, delta] of sample) {
          try {
            checkAll(wrongAt(tau, delta), tau, delta, thirdErrorOf(id));
          } catch (e) {
            expect(String(e)).toMatch(new RegExp(`${names[k]}: analytic`));
            caught++;
          }
        }
        // missed only where the derivative itself is below ~0.1 of max(1, |value|)
        expect(caught, `${id} ${names[k]}`).toBeGreaterThan(0.5 * sample.length);
      });
    }
  });

  it("residual() conversion: aT = T d(alpha_r)/dT, aTT, aDT = rho T d2(alpha_r)/drho dT", () => {
    const water = referenceFluid("water");
    const T = 450;
    const rho = 50000; // compressed liquid (900 kg/m3), a stable state
    const at = water.residual(T, rho, [1]);
    const inT = (g: (t: number) => number): NumericDerivative => riddersDerivative(g, T, 0.005 * T);
    const dA = inT((t) => water.residual(t, rho, [1]).a);
    check("aT", at.aT, {
      ...dA,
      value: T * dA.value,
      errorEstimate: T * dA.errorEstimate,
      roundingBound: T * dA.roundingBound,
    });
    // aTT = T^2 a'' = T d(aT)/dT - aT
    const dAT = inT((t) => water.residual(t, rho, [1]).aT);
    check("aTT", at.aTT, {
      ...dAT,
      value: T * dAT.value - at.aT,
      errorEstimate: T * dAT.errorEstimate,
      roundingBound: T * dAT.roundingBound,
    });
    const dAD = inT((t) => water.residual(t, rho, [1]).aD);
    check("aDT", at.aDT, {
      ...dAD,
      value: T * dAD.value,
      errorEstimate: T * dAD.errorEstimate,
      roundingBound: T * dAD.roundingBound,
    });
  });
});

describe("term engine edge cases", () => {
  it("an empty equation is zero", () => {
    const p = compileResidualPart({
      polynomialExponential: [],
      gaussianBell: [],
      nearCritical: [],
    });
    const r = p.evaluate(1.1, 0.7, emptyReducedHelmholtz());
    expect([r.f, r.fD, r.fDD, r.fDDD, r.fT, r.fTT, r.fDT]).toEqual([0, 0, 0, 0, 0, 0, 0]);
  });

  it("a single polynomial term n delta^d tau^t matches its closed form", () => {
    const p = compileResidualPart({
      polynomialExponential: [{ n: 0.7, d: 3, t: 1.5, c: 0 }],
      gaussianBell: [],
      nearCritical: [],
    });
    const r = p.evaluate(1.2, 0.4, emptyReducedHelmholtz());
    const f = 0.7 * 0.4 ** 3 * 1.2 ** 1.5;
    expect(r.f).toBeCloseTo(f, 15);
    expect(r.fD).toBeCloseTo(3 * f, 15);
    expect(r.fDD).toBeCloseTo(6 * f, 15);
    expect(r.fDDD).toBeCloseTo(6 * f, 15);
    expect(r.fT).toBeCloseTo(1.5 * f, 15);
    expect(r.fTT).toBeCloseTo(1.5 * 0.5 * f, 15);
    expect(r.fDT).toBeCloseTo(4.5 * f, 15);
  });

  it("rejects a non-integer density exponent", () => {
    expect(() =>
      compileResidualPart({
        polynomialExponential: [{ n: 1, d: 1.5, t: 1, c: 0 }],
        gaussianBell: [],
        nearCritical: [],
      }),
    ).toThrow(RangeError);
  });

  it("water at exactly (tau, delta) = (1, 1) stays finite (non-analytic terms nudged)", () => {
    const r = referenceFluid("water").residualReduced(1, 1, emptyReducedHelmholtz());
    for (const v of [r.f, r.fD, r.fDD, r.fT, r.fTT, r.fDT]) expect(Number.isFinite(v)).toBe(true);
  });

  it("without `third`, fDDD is NaN for an equation with non-analytic terms and aDDD absent", () => {
    const water = referenceFluid("water");
    expect(Number.isNaN(water.residualReduced(1.2, 2, emptyReducedHelmholtz()).fDDD)).toBe(true);
    expect(water.residual(500, 30000, [1]).aDDD).toBeUndefined();
    expect(referenceFluid("methane").residual(150, 20000, [1]).aDDD).toBeDefined();
  });
});
