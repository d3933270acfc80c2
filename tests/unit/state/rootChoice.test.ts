/**
 * The choice between density roots (state/rootChoice.ts): its three entries (the object form
 * chooseDensityRoot, the allocation-free chooseDensityRootInto of the sweeps and
 * chooseDensityRootWithComposition of the single (T, P) state) make the same choice with the same
 * numbers, to the last bit (Object.is), and that choice is the rule stated in the module header:
 * mechanically unstable roots ((dP/drho)_T <= 0) dropped; "vapor" the lightest of the rest,
 * "liquid" the densest, "stable" the lowest g_r/RT = a + aD - ln Z (the first on a tie). Checked
 * on Peng-Robinson methane across its three-root region (below Tc = 190.56 K) and above it, and
 * on root lists with an unstable middle root and with no stable root.
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { createModel } from "../../../kernel-lib/src/eos/createModel.js";
import { getComponent } from "../../../kernel-lib/src/components/getComponent.js";
import { dPdRho, residualGibbsTP } from "../../../kernel-lib/src/eos/residualRelations.js";
import { zeroResidualDraft } from "../../../kernel-lib/src/eos/residualDraft.js";
import {
  chooseDensityRoot,
  chooseDensityRootInto,
  chooseDensityRootWithComposition,
  emptyRootChoice,
  type ModelWithResidualInto,
  type RootChoice,
} from "../../../kernel-lib/src/state/rootChoice.js";
import type { PhaseRequest } from "../../../kernel-lib/src/state/types.js";

const model = createModel("peng-robinson", [getComponent("methane")]) as ModelWithResidualInto;
const x = [1];
const draft = zeroResidualDraft;
const FIELDS = ["densityMolPerM3", "index", "stableCount", "lowestGibbsOverRT"] as const;
const REQUESTS: readonly PhaseRequest[] = ["stable", "liquid", "vapor"];

function sameChoice(a: RootChoice, b: RootChoice, where: string) {
  for (const f of FIELDS) expect(Object.is(a[f], b[f]), `${f} ${where}`).toBe(true);
  expect(Object.is(a.secondGibbsOverRT, b.secondGibbsOverRT), `second ${where}`).toBe(true);
}

/** The three entries on the same roots: same choice, same numbers; returns the object form's. */
function chooseAllWays(T: number, rhos: Float64Array, count: number, request: PhaseRequest) {
  const where = `at ${T} K, roots [${Array.from(rhos.subarray(0, count)).join(", ")}], ${request}`;
  const o = emptyRootChoice();
  const r = chooseDensityRoot(model, T, rhos, x, request, o, count);
  const i = emptyRootChoice();
  const ri = chooseDensityRootInto(model, T, rhos, count, x, request, i, draft(), draft());
  const c = emptyRootChoice();
  const rc = chooseDensityRootWithComposition(
    model,
    T,
    rhos,
    count,
    x,
    request,
    c,
    draft(),
    draft(),
    draft(),
    new Array<number>(1),
  );
  sameChoice(o, i, where);
  // the one-root shortcut of WithComposition compares no g_r/RT (neither do the others then)
  sameChoice(o, c, where);
  expect(ri === undefined, where).toBe(r === undefined);
  expect(rc === undefined, where).toBe(r === undefined);
  if (r !== undefined) {
    for (const k of ["a", "aD", "aDD", "aT", "aTT", "aDT"] as const) {
      expect(Object.is(ri![k], r[k]), `${k} ${where}`).toBe(true);
      expect(Object.is(rc![k], r[k]), `${k} ${where}`).toBe(true);
    }
    expect(Object.is(rc!.dnA![0], r.dnA![0]), `dnA ${where}`).toBe(true);
  }
  return { choice: o, residual: r };
}

/** The rule of the header, computed here root by root. */
function expectedIndex(T: number, rhos: Float64Array, count: number, request: PhaseRequest) {
  const stable: { rho: number; g: number }[] = [];
  for (let k = 0; k < count; k++) {
    const r = model.residual(T, rhos[k], x);
    if (dPdRho(T, r, model.gasConstant) > 0) stable.push({ rho: rhos[k], g: residualGibbsTP(r) });
  }
  if (stable.length === 0) return { stable, index: -1 };
  if (request === "vapor") return { stable, index: 0 };
  if (request === "liquid") return { stable, index: stable.length - 1 };
  let index = 0;
  for (let k = 1; k < stable.length; k++) if (stable[k].g < stable[index].g) index = k;
  return { stable, index };
}

describe("the choice between density roots", () => {
  it("three entries, one choice, the rule of the header (PR methane, 95-400 K)", () => {
    const roots = new Float64Array(3);
    let threeRoots = 0;
    const check = (T: number, P: number) => {
      const count = model.densityRootsInto!(T, P, x, roots);
      if (count === 3) threeRoots++;
      for (const request of REQUESTS) {
        const { choice } = chooseAllWays(T, roots, count, request);
        const { stable, index } = expectedIndex(T, roots, count, request);
        expect(choice.stableCount).toBe(stable.length);
        if (index >= 0) {
          expect(choice.index).toBe(index);
          expect(choice.densityMolPerM3).toBe(stable[index].rho);
        } else {
          expect(Number.isNaN(choice.densityMolPerM3)).toBe(true);
        }
      }
    };
    for (const T of [100, 130, 160, 185, 190.5, 250, 400]) {
      for (const P of [1e4, 1e5, 5e5, 1e6, 2e6, 3e6, 4.5e6, 1e7]) check(T, P);
    }
    fc.assert(
      fc.property(
        fc.double({ min: 95, max: 400, noNaN: true }),
        fc.double({ min: 1e3, max: 3e7, noNaN: true }),
        (T, P) => check(T, P),
      ),
      { numRuns: 300 },
    );
    // the three-root region was crossed (else the comparisons of g_r/RT were not tested)
    expect(threeRoots).toBeGreaterThan(10);
  });

  it("passes over an unstable middle root, and reports none when no root is stable", () => {
    // 150 K, 1 MPa: three roots of PR methane; the middle one is mechanically unstable
    const roots = new Float64Array(3);
    expect(model.densityRootsInto!(150, 1e6, x, roots)).toBe(3);
    const middle = model.residual(150, roots[1], x);
    expect(dPdRho(150, middle, model.gasConstant)).toBeLessThan(0);
    const vapor = chooseAllWays(150, roots, 3, "vapor").choice;
    const liquid = chooseAllWays(150, roots, 3, "liquid").choice;
    const stable = chooseAllWays(150, roots, 3, "stable").choice;
    expect(vapor.stableCount).toBe(2);
    expect(vapor.densityMolPerM3).toBe(roots[0]);
    expect(liquid.index).toBe(1);
    expect(liquid.densityMolPerM3).toBe(roots[2]);
    expect(stable.lowestGibbsOverRT).toBeLessThan(stable.secondGibbsOverRT);
    // the unstable root alone (one root: the shortcut of WithComposition), then twice
    const only = Float64Array.of(roots[1], 0, 0);
    for (const request of REQUESTS) {
      const { choice, residual } = chooseAllWays(150, only, 1, request);
      expect(residual).toBeUndefined();
      expect(choice.stableCount).toBe(0);
      expect(Number.isNaN(choice.densityMolPerM3)).toBe(true);
    }
    const twice = Float64Array.of(roots[1], roots[1], 0);
    const { choice, residual } = chooseAllWays(150, twice, 2, "stable");
    expect(residual).toBeUndefined();
    expect(choice.stableCount).toBe(0);
    expect(choice.lowestGibbsOverRT).toBe(Infinity);
  });
});
