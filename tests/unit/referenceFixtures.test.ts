// Every fixture of tests/fixtures loads and holds what makes it a reference (source, where
// printed, printed form, provenance, tolerance with reason), including files no test reads yet;
// and the loader refuses the defects it exists to catch.
import { describe, expect, it } from "vitest";
import {
  allowedDeviation,
  fixtureFiles,
  parseReferenceValues,
  referenceValues,
} from "../fixtures/referenceValues.js";

const good = {
  key: "x",
  value: 2.04797733,
  unit: "1",
  printed: "0.204797733e1",
  source: "a source",
  where: "Table 6",
  provenance: "from memory of a source",
  tolerance: { relative: 1e-8, reason: "nine printed digits" },
};
const parse = (entry: Record<string, unknown>) =>
  parseReferenceValues("test.json", { values: [entry] });

describe("reference fixtures", () => {
  const files = fixtureFiles();
  it("there are fixture files", () => {
    expect(files.length).toBeGreaterThanOrEqual(20);
  });
  for (const file of files) {
    it(`${file} loads, every value complete`, () => {
      const values = referenceValues(file);
      expect(values.size).toBeGreaterThan(0);
      for (const v of values.values()) {
        expect(allowedDeviation(v)).toBeGreaterThanOrEqual(0);
        for (const use of Object.keys(v.uses ?? {})) {
          expect(allowedDeviation(v, use)).toBeGreaterThanOrEqual(0);
        }
      }
    });
  }
});

describe("the loader refuses a defective entry", () => {
  it("accepts a complete one", () => {
    expect(parse(good).get("x")?.value).toBe(2.04797733);
  });
  it("refuses a missing source, place, printed form or provenance", () => {
    for (const f of ["source", "where", "printed", "provenance", "unit"]) {
      expect(() => parse({ ...good, [f]: undefined }), f).toThrow(new RegExp(`needs ${f}`));
    }
  });
  it("refuses a provenance that does not say how the value was obtained", () => {
    expect(() => parse({ ...good, provenance: "IAPWS" })).toThrow(/provenance/);
  });
  it("refuses a tolerance without a reason or a bound", () => {
    expect(() => parse({ ...good, tolerance: { relative: 1e-8 } })).toThrow(/reason/);
    expect(() => parse({ ...good, tolerance: { reason: "why" } })).toThrow(/bound/);
    expect(() => parse({ ...good, uses: { other: { absolute: 1 } } })).toThrow(/use "other"/);
  });
  it("refuses a value that differs from its printed form", () => {
    expect(() => parse({ ...good, value: 2.04797734 })).toThrow(/differs from the printed/);
  });
  it("refuses a disputed value without a note, and a duplicate key", () => {
    expect(() => parse({ ...good, disputed: true })).toThrow(/disputed/);
    expect(() => parseReferenceValues("t.json", { values: [good, good] })).toThrow(/duplicate/);
    expect(() => parseReferenceValues("t.json", { values: [] })).toThrow(/no values/);
  });
});
