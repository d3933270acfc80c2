/**
 * Bad-input property (fast-check): the public state functions, given random garbage (numbers of
 * any magnitude including NaN, infinities, subnormals and -0; strings; null; undefined; arrays;
 * objects), either return a result whose every number is finite (a non-finite number only in a
 * result that carries a warning saying why, as documented: speed of sound and the departures at
 * the same T and P where Z <= 0) or throw a typed IsochorError. Never an untyped TypeError or
 * RangeError, never a silent NaN.
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { IsochorError } from "../../../kernel-lib/src/errors.js";
import { defineFluid, type FluidSpec } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import {
  referenceFluidBinding,
  referenceStateTP,
  referenceStateTRho,
} from "../../../kernel-lib/src/state/referenceStates.js";
import {
  stateAtPressureEnthalpy,
  stateAtPressureEntropy,
  stateAtPressureQuality,
  stateAtTemperatureDensity,
  stateAtTemperatureQuality,
} from "../../../kernel-lib/src/phase/twoPhaseState.js";
import {
  saturationAtPressure,
  saturationAtTemperature,
} from "../../../kernel-lib/src/phase/saturation.js";
import { pureFluidPhaseAt } from "../../../kernel-lib/src/phase/pureFluidPhase.js";
import { runEvalRequest } from "../../../kernel-lib/src/cli/eval.js";

const pr = defineFluid({ components: ["methane"] });
const virial = defineFluid({ components: ["ethane"], model: "virial" });
const mix = defineFluid({ components: ["methane", "ethane"], model: "soave-redlich-kwong" });
const water = referenceFluid("water");
const co2 = referenceFluid("carbon-dioxide");
const waterB = referenceFluidBinding(water);

const number = fc.oneof(
  fc.double(),
  fc.double({ min: 1, max: 3000, noNaN: true }),
  fc.double({ min: 1e2, max: 1e8, noNaN: true }),
  fc.double({ min: -2e5, max: 2e5, noNaN: true }),
  fc.double({ min: 0, max: 1, noNaN: true }),
  fc.double({ min: 90, max: 190, noNaN: true }),
  fc.constantFrom(0, -0, 1, 1e308, -1e308, 5e-324, NaN, Infinity, -Infinity, 0.5),
);
const garbage: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 6, arbitrary: number },
  { weight: 1, arbitrary: fc.constantFrom(null, undefined, true, "300", "", "NaN") },
  { weight: 1, arbitrary: fc.string({ maxLength: 12 }) },
  { weight: 1, arbitrary: fc.array(number, { maxLength: 3 }) },
  { weight: 1, arbitrary: fc.constantFrom([0.5, 0.5], [1], [0.3, 0.7], {}, { phase: "liquid" }) },
);

// a fixed seed keeps the suite deterministic for everyone; FC_SEED=random explores new draws
const SEED =
  process.env.FC_SEED === "random"
    ? Date.now() % 2147483647
    : Number(process.env.FC_SEED ?? 424242);

type Call = (a: unknown, b: unknown, c: unknown) => unknown;
const g = (v: unknown) => v as never;

const calls: Record<string, Call> = {
  "fluid.stateAtTP": (a, b) => pr.stateAtTP(g(a), g(b)),
  "fluid.stateAtTP x": (a, b, c) => pr.stateAtTP(g(a), g(b), g(c)),
  "fluid.stateAtTP options": (a, b, c) => pr.stateAtTP(g(a), g(b), undefined, g(c)),
  "mixture stateAtTP": (a, b, c) => mix.stateAtTP(g(a), g(b), g(c)),
  "virial stateAtTP": (a, b) => virial.stateAtTP(g(a), g(b)),
  "fluid.stateAtTRho": (a, b) => pr.stateAtTRho(g(a), g(b)),
  "fluid.densityRoots": (a, b) => pr.densityRoots(g(a), g(b)),
  "fluid.temperatureAtPH": (a, b) => pr.temperatureAtPH(g(a), g(b)),
  "fluid.temperatureAtPS": (a, b, c) => pr.temperatureAtPS(g(a), g(b), undefined, g(c)),
  "virial temperatureAtPH": (a, b) => virial.temperatureAtPH(g(a), g(b)),
  "mixture stabilityAtTP": (a, b, c) => mix.stabilityAtTP(g(a), g(b), g(c)),
  stateAtPressureEnthalpy: (a, b) => stateAtPressureEnthalpy(pr, g(a), g(b)),
  "stateAtPressureEntropy (water)": (a, b) => stateAtPressureEntropy(waterB, g(a), g(b)),
  stateAtPressureQuality: (a, b) => stateAtPressureQuality(pr, g(a), g(b)),
  stateAtTemperatureQuality: (a, b) => stateAtTemperatureQuality(pr, g(a), g(b)),
  stateAtTemperatureDensity: (a, b) => stateAtTemperatureDensity(pr, g(a), g(b)),
  saturationAtTemperature: (a, b) => saturationAtTemperature(pr.model, g(a), g(b)),
  "saturationAtPressure (water)": (a) => saturationAtPressure(water, g(a)),
  "pureFluidPhaseAt (water)": (a, b) => pureFluidPhaseAt(water, g(a), g(b)),
  "referenceStateTP (CO2)": (a, b) => referenceStateTP(co2, g(a), g(b)),
  "referenceStateTRho (water)": (a, b) => referenceStateTRho(water, g(a), g(b)),
  defineFluid: (a, b) => defineFluid({ components: g(a), model: g(b) } as FluidSpec),
  "defineFluid(garbage)": (a) => defineFluid(g(a)),
  "isochor eval": (a, b) =>
    runEvalRequest({ model: "peng-robinson", components: ["methane"], states: [{ T: a, P: b }] }),
  "isochor eval options": (a, b, c) =>
    runEvalRequest({
      model: "peng-robinson",
      components: ["methane"],
      states: [{ T: a, P: b }],
      phase: c,
    }),
};

const COMMON_VALID = new Set([
  "fluid.stateAtTP",
  "fluid.stateAtTRho",
  "fluid.densityRoots",
  "fluid.temperatureAtPH",
  "isochor eval",
]);

/** Paths of non-finite numbers in a result (depth-limited; functions and cycles skipped). */
function nonFinite(value: unknown, path = "$", out: string[] = [], depth = 0): string[] {
  if (typeof value === "number") {
    if (!Number.isFinite(value)) out.push(`${path} = ${value}`);
  } else if (value && typeof value === "object" && depth < 6) {
    for (const [k, v] of Object.entries(value)) nonFinite(v, `${path}.${k}`, out, depth + 1);
  }
  return out;
}

function hasWarning(value: unknown): boolean {
  const w = (value as { warnings?: unknown[] } | null)?.warnings;
  const stateW = (value as { state?: { warnings?: unknown[] } } | null)?.state?.warnings;
  return (Array.isArray(w) && w.length > 0) || (Array.isArray(stateW) && stateW.length > 0);
}

describe("garbage in: a typed error or a finite result, never untyped, never a silent NaN", () => {
  for (const [name, call] of Object.entries(calls)) {
    it(name, () => {
      let results = 0;
      fc.assert(
        fc.property(garbage, garbage, garbage, (a, b, c) => {
          let r: unknown;
          try {
            r = call(a, b, c);
          } catch (e) {
            if (!(e instanceof IsochorError)) {
              throw new Error(
                `untyped ${(e as Error)?.constructor?.name}: ${(e as Error)?.message} for ${JSON.stringify([a, b, c])}`,
                { cause: e },
              );
            }
            return;
          }
          results++;
          if (name.startsWith("isochor eval")) {
            // every state entry of the response: a state or an error entry with a code
            for (const st of (r as { states: Record<string, unknown>[] }).states) {
              if ("error" in st) expect(typeof (st.error as { code: string }).code).toBe("string");
              else if (nonFinite(st).length > 0) expect(st.warnings).toBeDefined();
            }
            return;
          }
          const bad = nonFinite(r);
          if (bad.length > 0 && !hasWarning(r)) {
            throw new Error(
              `non-finite ${bad.join(", ")} without a warning for ${JSON.stringify([a, b, c])}`,
            );
          }
        }),
        { numRuns: 150, seed: SEED },
      );
      // the property must not pass by refusing everything: where valid draws are common (two
      // plausible numbers), some calls must have returned a result
      if (COMMON_VALID.has(name)) expect(results).toBeGreaterThan(0);
    });
  }
});
