// Bad input to the transport functions is refused with a typed error naming the input and the
// valid range, never answered with NaN.
import { describe, expect, it } from "vitest";
import { InputError, OutOfRangeError } from "../../../kernel-lib/src/errors.js";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { transportAtTRho } from "../../../kernel-lib/src/transport/transportAt.js";
import type { TransportOptions } from "../../../kernel-lib/src/transport/types.js";

const methane = defineFluid({ components: ["methane"] });
const gas = defineFluid({ components: ["methane", "ethane"] });

function refused(f: () => unknown, input: string, kind: typeof InputError = InputError): void {
  let caught: unknown;
  try {
    f();
  } catch (e) {
    caught = e;
  }
  expect(caught).toBeInstanceOf(kind);
  expect((caught as InputError).input).toBe(input);
  expect((caught as InputError).message).toContain(input);
}

describe("transport: bad input refused with typed errors", () => {
  it.each([
    ["negative T", -10],
    ["zero T", 0],
    ["NaN T", Number.NaN],
    ["infinite T", Number.POSITIVE_INFINITY],
  ])("%s", (_, T) => {
    refused(() => transportAtTRho(methane, T, 100), "temperatureK");
  });

  it.each([
    ["negative rho", -1],
    ["NaN rho", Number.NaN],
    ["infinite rho", Number.POSITIVE_INFINITY],
  ])("%s", (_, rho) => {
    refused(() => transportAtTRho(methane, 300, rho), "densityMolPerM3");
  });

  it("a density beyond Chung's range (rho Vc / 6 >= 0.6): OutOfRangeError", () => {
    refused(() => transportAtTRho(methane, 300, 40000), "densityMolPerM3", OutOfRangeError);
  });

  it("a mixture without x, x of the wrong length, x not summing to 1", () => {
    refused(() => transportAtTRho(gas, 300, 100), "x");
    refused(() => transportAtTRho(gas, 300, 100, [1]), "x.length");
    refused(() => transportAtTRho(gas, 300, 100, [0.5, 0.6]), "sum of x");
  });

  it("an unknown method", () => {
    const options = { method: "fast" } as unknown as TransportOptions;
    refused(() => transportAtTRho(methane, 300, 100, undefined, options), "options.method");
  });

  it("the Fluid method refuses a negative pressure", () => {
    refused(() => methane.transportAtTP(300, -1e5), "pressurePa");
  });
});
