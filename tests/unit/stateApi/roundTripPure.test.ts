/**
 * The one state API on pure fluids: a state at (T, P) re-specified by (P, h), (P, s), (T, s),
 * (T, rho) and (u, rho) comes back at the same T and P (property-based, fast-check), in the gas,
 * the liquid and above the critical point.
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { expectRoundTrips } from "./helpers.js";

const methane = defineFluid({ components: ["methane"], model: "peng-robinson" });
const propane = defineFluid({ components: ["propane"], model: "soave-redlich-kwong" });

describe("pure fluids: every specification pair round-trips", () => {
  it("methane (Peng-Robinson), 120-400 K, 0.2-10 MPa", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 120, max: 400, noNaN: true }),
        fc.double({ min: Math.log(2e5), max: Math.log(1e7), noNaN: true }),
        (T, lnP) => {
          expectRoundTrips(methane, T, Math.exp(lnP), [1]);
        },
      ),
      { numRuns: 30, seed: 12 },
    );
  });
  it("propane (SRK), 250-450 K, 0.1-6 MPa", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 250, max: 450, noNaN: true }),
        fc.double({ min: Math.log(1e5), max: Math.log(6e6), noNaN: true }),
        (T, lnP) => {
          expectRoundTrips(propane, T, Math.exp(lnP), [1]);
        },
      ),
      { numRuns: 30, seed: 7 },
    );
  });
});

describe("pure fluids: the states the property runs must include", () => {
  it("compressed liquid, vapour and supercritical methane each round-trip", () => {
    // methane (PR): T_c about 190.6 K, P_c about 4.6 MPa (from memory of the component table)
    const liquid = expectRoundTrips(methane, 130, 5e6, [1]);
    const vapor = expectRoundTrips(methane, 150, 3e5, [1]);
    const dense = expectRoundTrips(methane, 200, 8e6, [1]);
    expect(liquid.phase).toBe("liquid");
    expect(vapor.phase).toBe("vapor");
    expect(dense.phase).toBe("supercritical");
  });
});
