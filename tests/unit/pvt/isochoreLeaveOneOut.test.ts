/**
 * The leave-one-out screen from the fits through all points (Sherman-Morrison identities) must
 * give what refitting without each point gives: the deleted prediction, its Birge-scaled
 * uncertainty, the order chosen again by AICc without the point, and the change when that order
 * is raised by one. The reference here is the explicit refit with fitIsochore.
 */
import { describe, expect, it } from "vitest";
import { seededRandom } from "../../../kernel-lib/src/numerics/seededRandom.js";
import { fitIsochore } from "../../../kernel-lib/src/pvt/isochoreFit.js";
import type { IsochoreFitOptions } from "../../../kernel-lib/src/pvt/isochoreFit.js";
import { isochoreLeaveOneOut } from "../../../kernel-lib/src/pvt/isochoreLeaveOneOut.js";
import { pressurePR } from "./pengRobinsonTruth.js";

/** The screen's statistic by explicit refits (the definition). */
function byRefit(
  T: number[],
  P: number[],
  sigma: number[],
  options: IsochoreFitOptions = {},
): number[] {
  const key = (t: number) => t.toPrecision(10);
  return T.map((_, i) => {
    const keep = T.map((__, q) => q).filter((q) => q !== i);
    const distinct = new Set(keep.map((q) => key(T[q]))).size;
    if (distinct < 3) return Number.NaN;
    const pick = (a: number[]) => keep.map((q) => a[q]);
    const f = fitIsochore(1000, pick(T), pick(P), pick(sigma), options);
    const e = f.evaluate(T[i]);
    const uOrder =
      f.order + 1 <= distinct - 1 && options.order === undefined
        ? Math.abs(
            fitIsochore(1000, pick(T), pick(P), pick(sigma), {
              ...options,
              order: f.order + 1,
            }).evaluate(T[i]).pressurePa - e.pressurePa,
          )
        : 0;
    return (
      Math.abs(P[i] - e.pressurePa) / Math.sqrt(sigma[i] ** 2 + e.uPressurePa ** 2 + uOrder ** 2)
    );
  });
}

describe("isochoreLeaveOneOut", () => {
  const rng = seededRandom(11);
  const T = Array.from({ length: 14 }, (_, k) => 310 + 8 * k);
  T.push(T[3]); // a repeated temperature
  const sigma = T.map((t) => 1e-4 * pressurePR(t, 1000));
  const P = T.map((t, k) => pressurePR(t, 1000) + sigma[k] * rng.normal());
  P[9] += 12 * sigma[9]; // one slip

  it.each([
    ["order by AICc", {}],
    ["fixed order", { order: 2 }],
    ["order range", { minOrder: 1, maxOrder: 3 }],
  ])("equals the refit statistic (%s) to 1e-8 relative", (_name, options) => {
    const fast = isochoreLeaveOneOut(T, P, sigma, options);
    const slow = byRefit(T, P, sigma, options);
    slow.forEach((z, i) => expect(Math.abs(fast[i] / z - 1)).toBeLessThan(1e-8));
    // the slip is the worst point
    const worst = Array.from(fast).indexOf(Math.max(...Array.from(fast)));
    expect(worst).toBe(9);
  });

  it("gives NaN where fewer than 3 temperatures would remain", () => {
    const z = isochoreLeaveOneOut([300, 310, 320], [1e6, 1.1e6, 1.2e6], [1e3, 1e3, 1e3]);
    expect(Array.from(z).every((v) => Number.isNaN(v))).toBe(true);
  });
});
