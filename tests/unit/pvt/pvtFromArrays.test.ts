import { describe, expect, it } from "vitest";
import { pvtFromArrays, PvtFormatError } from "../../../kernel-lib/src/pvt/index.js";

describe("pvtFromArrays", () => {
  it("accepts SI arrays and a scalar uncertainty for all points", () => {
    const d = pvtFromArrays({
      temperatureK: [300, 310],
      densityMolPerM3: [100, 100],
      pressurePa: [2.4e5, 2.5e5],
      uPressurePa: 50,
    });
    expect(d.points.map((p) => p.uPressurePa)).toEqual([50, 50]);
    expect(d.points[1]?.line).toBe(2);
  });

  it("converts molar volumes to densities", () => {
    const d = pvtFromArrays({
      temperatureK: [300],
      molarVolumeM3PerMol: [0.01],
      pressurePa: [2.4e5],
    });
    expect(d.points[0]?.densityMolPerM3).toBeCloseTo(100, 12);
  });

  it.each([
    [
      "NaN temperature",
      { temperatureK: [Number.NaN], densityMolPerM3: [1], pressurePa: [1] },
      1,
      "temperatureK",
    ],
    [
      "negative pressure",
      { temperatureK: [300, 300], densityMolPerM3: [1, 2], pressurePa: [1, -1] },
      2,
      "pressurePa",
    ],
    [
      "infinite density",
      { temperatureK: [300], densityMolPerM3: [Infinity], pressurePa: [1] },
      1,
      "densityMolPerM3",
    ],
    [
      "zero uncertainty",
      { temperatureK: [300], densityMolPerM3: [1], pressurePa: [1], uPressurePa: 0 },
      1,
      "uPressurePa",
    ],
  ])("refuses %s naming the array and the point", (_name, arrays, line, header) => {
    try {
      pvtFromArrays(arrays);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(PvtFormatError);
      expect([(e as PvtFormatError).line, (e as PvtFormatError).header]).toEqual([line, header]);
    }
  });

  it("refuses arrays of unequal length and both density and volume", () => {
    expect(() =>
      pvtFromArrays({ temperatureK: [300, 310], densityMolPerM3: [1], pressurePa: [1, 2] }),
    ).toThrow(/array of 2 numbers/);
    expect(() =>
      pvtFromArrays({
        temperatureK: [300],
        densityMolPerM3: [1],
        molarVolumeM3PerMol: [1],
        pressurePa: [1],
      }),
    ).toThrow(/not both/);
  });
});
