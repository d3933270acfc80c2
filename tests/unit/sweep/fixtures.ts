/**
 * The shared arrange and check steps of the sweep tests: a (T, P) grid swept and compared point by
 * point with the single state (sweepKernel and sweepFast tests), the fluids and requests of the
 * worker tests, and the element-by-element comparison of a parallel sweep with the single-thread
 * one (sweepWorkerPool, sweepOnWorkers and sweepOnWorkersFast tests). Only set-up and comparisons:
 * each test file keeps its own tolerances and its own assertions on top.
 */
import { expect } from "vitest";
import fc from "fast-check";
import { defineFluid, type Fluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import type { ProgressSnapshot } from "../../../kernel-lib/src/progress/progressTypes.js";
import type { FluidState } from "../../../kernel-lib/src/state/types.js";
import type {
  SweepProperty,
  SweepRequest,
  SweepResult,
} from "../../../kernel-lib/src/sweep/types.js";
import { SWEEP_PHASE_KINDS } from "../../../kernel-lib/src/sweep/types.js";

/** The sweep's phase-kind code of a single state's phase label. */
export const kindOf = (label: string) =>
  label === "vapor"
    ? SWEEP_PHASE_KINDS.vapor
    : label === "liquid"
      ? SWEEP_PHASE_KINDS.liquid
      : SWEEP_PHASE_KINDS.supercritical;

/** An ascending axis of 1 to `max` distinct values in [lo, hi]. */
export const axis = (lo: number, hi: number, max: number) =>
  fc
    .uniqueArray(fc.double({ min: lo, max: hi, noNaN: true }), { minLength: 1, maxLength: max })
    .map((v) => v.sort((p, q) => p - q));

/** A five-component natural gas (labels by the PIP when swept without a phase check). */
export function fiveComponentGas() {
  const fluid = defineFluid({
    components: ["methane", "ethane", "propane", "nitrogen", "carbon-dioxide"],
    model: "peng-robinson",
  });
  return { fluid, x: [0.85, 0.06, 0.03, 0.02, 0.04] };
}

/**
 * Sweeps the (T, P) grid Ts x Ps (a mixture without a phase check) and compares every point with
 * `fluid.stateAtTP`: where the single state throws, the sweep's error code must be 2 for
 * "phase-unavailable" and 1 otherwise; where it does not, the error code must be 0 and the phase
 * kind that of the single state, and `check` compares the values of point k.
 */
export function sweepGridAgainstStates(
  fluid: Fluid,
  Ts: readonly number[],
  Ps: readonly number[],
  x: number[] | undefined,
  properties: readonly SweepProperty[],
  precision: "fast" | undefined,
  check: (values: SweepResult["values"], k: number, st: FluidState, T: number, P: number) => void,
): void {
  const r = fluid.sweep({
    specification: "TP",
    first: Ts,
    second: Ps,
    x,
    phaseCheck: x === undefined ? undefined : "none",
    properties: [...properties],
    ...(precision === undefined ? {} : { precision }),
  });
  for (let i = 0; i < Ts.length; i++) {
    for (let j = 0; j < Ps.length; j++) {
      const k = i * Ps.length + j;
      let st: FluidState;
      try {
        st = fluid.stateAtTP(Ts[i], Ps[j], x);
      } catch (e) {
        expect(r.errorCode[k]).toBe((e as { code?: string }).code === "phase-unavailable" ? 2 : 1);
        continue;
      }
      expect(r.errorCode[k], `error at ${Ts[i]} K, ${Ps[j]} Pa`).toBe(0);
      expect(r.phaseKind[k]).toBe(kindOf(st.phase));
      check(r.values, k, st, Ts[i], Ps[j]);
    }
  }
}

/** Methane + ethane + propane (Peng-Robinson), the fluid of the worker tests; a new one per call. */
export const threeAlkaneGas = () =>
  defineFluid({ components: ["methane", "ethane", "propane"], model: "peng-robinson" });
/** The feed of the worker tests. */
export const threeAlkaneX = [0.85, 0.1, 0.05];

/** 160,000 points of the feed with the phase check: a sweep long enough to be cancelled. */
export const longRequest = (x: number[]): SweepRequest => ({
  specification: "TP",
  first: { from: 200, to: 500, count: 400 },
  second: { from: 1e5, to: 2e7, count: 400 },
  x,
  properties: ["h"],
});

/**
 * Progress options that abort `controller` at the first snapshot with some points done (reason:
 * "stopped by the test"), after passing every snapshot to `also`.
 */
export function abortAtFirstProgress(
  controller: AbortController,
  also?: { show: (s: ProgressSnapshot) => void },
) {
  return {
    sink: {
      show(s: ProgressSnapshot) {
        also?.show(s);
        if (s.done > 0) controller.abort(new Error("stopped by the test"));
      },
    },
    maxUpdatesPerSecond: 1000,
  };
}

/**
 * The parallel sweep equals the single-thread one: the count, every value of `properties` to the
 * last bit (Object.is), the error codes and the phase kinds.
 */
export function expectSameArrays(
  single: SweepResult,
  parallel: SweepResult,
  properties: readonly SweepProperty[],
): void {
  expect(parallel.count).toBe(single.count);
  for (const p of properties) {
    const a = single.values[p]!;
    const b = parallel.values[p]!;
    for (let i = 0; i < a.length; i++) expect(Object.is(a[i], b[i]), `${p}[${i}]`).toBe(true);
  }
  expect(Array.from(parallel.errorCode)).toEqual(Array.from(single.errorCode));
  expect(Array.from(parallel.phaseKind)).toEqual(Array.from(single.phaseKind));
}
