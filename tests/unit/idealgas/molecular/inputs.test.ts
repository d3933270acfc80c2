/**
 * Lookup, user-supplied constants and bad input: typed errors that name the input, unit, range
 * and value received.
 */
import { describe, expect, it } from "vitest";
import {
  getMolecule,
  idealGasFromMolecule,
  listMolecules,
  type MolecularConstants,
} from "../../../../kernel-lib/src/idealgas/molecular/index.js";
import {
  InputError,
  OutOfRangeError,
  UnknownNameError,
} from "../../../../kernel-lib/src/errors.js";

const REQUIRED = [
  "hydrogen",
  "nitrogen",
  "oxygen",
  "carbon-monoxide",
  "carbon-dioxide",
  "water",
  "methane",
  "ethane",
  "ammonia",
  "hydrogen-sulfide",
];

describe("molecule table", () => {
  it("ships the ten required molecules (and more), each with sources", () => {
    const ids = listMolecules();
    for (const id of REQUIRED) expect(ids).toContain(id);
    expect(ids.length).toBeGreaterThanOrEqual(10);
    for (const id of ids) {
      const m = getMolecule(id);
      expect(m.sources.length).toBeGreaterThan(0);
      expect(idealGasFromMolecule(id).source.length).toBeGreaterThan(0);
    }
  });

  it("finds by id (case-insensitive) or formula", () => {
    expect(getMolecule("Ethane").formula).toBe("C2H6");
    expect(getMolecule("C2H6").id).toBe("ethane");
    expect(getMolecule(" H2O ").id).toBe("water");
  });

  it("refuses an unknown name with the closest ids", () => {
    expect(() => getMolecule("ethan")).toThrow(UnknownNameError);
    try {
      getMolecule("ethan");
    } catch (e) {
      expect((e as UnknownNameError).suggestions[0]).toBe("ethane");
    }
    expect(() => idealGasFromMolecule("n-butane")).toThrow(UnknownNameError);
    expect(() => getMolecule(42 as unknown as string)).toThrow(InputError);
  });

  it("the result satisfies the IdealGasPure contract fields", () => {
    const gas = idealGasFromMolecule("ethane");
    expect(gas.componentId).toBe("ethane");
    expect(gas.method).toContain("hindered internal rotor");
    expect(gas.validTemperatureK).toEqual({ min: 50, max: 1500 });
    expect(idealGasFromMolecule("ethane", { maxTemperatureK: 3000 }).validTemperatureK.max).toBe(
      3000,
    );
    expect(idealGasFromMolecule("water").validTemperatureK.min).toBe(201);
  });
});

describe("user-supplied constants", () => {
  const co = getMolecule("carbon-monoxide");

  it("a copy of CO written in a cell gives the same result", () => {
    const mine: MolecularConstants = { ...co, id: "my-co", sources: ["typed in a cell"] };
    expect(idealGasFromMolecule(mine).entropyStandard(500)).toBe(
      idealGasFromMolecule("carbon-monoxide").entropyStandard(500),
    );
  });

  it("refuses bad fields with InputError naming the field", () => {
    const bad = (patch: Partial<MolecularConstants>) => () =>
      idealGasFromMolecule({ ...co, ...patch } as MolecularConstants);
    expect(bad({ molarMassKgPerMol: 28.01 })).toThrow(/kg\/mol/);
    expect(bad({ molarMassKgPerMol: 2.016 })).toThrow(/not g\/mol/);
    expect(bad({ sources: [] })).toThrow(/sources/);
    expect(bad({ sources: undefined as never })).toThrow(/sources/);
    expect(bad({ formula: 7 as never })).toThrow(/formula/);
    expect(bad({ molarMassKgPerMol: NaN })).toThrow(InputError);
    expect(bad({ symmetryNumber: 1.5 })).toThrow(/symmetryNumber/);
    expect(bad({ rotationalConstantsInvCm: [1, 2, 3] })).toThrow(/rotationalConstantsInvCm/);
    expect(bad({ rotationalConstantsInvCm: [-1.9] })).toThrow(/rotationalConstantsInvCm\[0\]/);
    expect(bad({ geometry: "planar" as never })).toThrow(/geometry/);
    expect(bad({ vibrations: [{ wavenumberInvCm: 0, degeneracy: 1 }] })).toThrow(/wavenumber/);
    expect(bad({ vibrations: [{ wavenumberInvCm: 2143, degeneracy: 0 }] })).toThrow(/degeneracy/);
    expect(bad({ electronicLevels: [] })).toThrow(/electronicLevels/);
    expect(bad({ electronicLevels: [{ energyInvCm: 10, degeneracy: 1 }] })).toThrow(/ground/);
    expect(bad({ nuclearSpinWeights: { even: 1, odd: 1 }, symmetryNumber: 1 })).not.toThrow();
    expect(
      bad({
        internalRotors: [{ barrierInvCm: 1, fold: 3, symmetryNumber: 3, reducedMomentAmuA2: 1 }],
      }),
    ).toThrow(/nonlinear/);
  });

  it("an internal rotor must name the torsion it replaces", () => {
    const ethane = getMolecule("ethane");
    const noLink = ethane.vibrations.map((v) => ({ ...v, internalRotorIndex: undefined }));
    expect(() => idealGasFromMolecule({ ...ethane, vibrations: noLink })).toThrow(
      /internalRotors\[0\]/,
    );
    const badLink = ethane.vibrations.map((v) =>
      v.internalRotorIndex === 0 ? { ...v, internalRotorIndex: 3 } : v,
    );
    expect(() => idealGasFromMolecule({ ...ethane, vibrations: badLink })).toThrow(
      /internalRotorIndex/,
    );
  });

  it("refuses an explicit level sum for a homonuclear rotor without spin weights", () => {
    expect(() => idealGasFromMolecule("nitrogen", { linearRotor: "level-sum" })).toThrow(
      OutOfRangeError,
    );
    expect(() => idealGasFromMolecule("ethane", { torsion: "bogus" as never })).toThrow(/torsion/);
    expect(() => idealGasFromMolecule("ethane", { linearRotor: "x" as never })).toThrow(
      /linearRotor/,
    );
  });
});

describe("bad temperatures", () => {
  const gas = idealGasFromMolecule("nitrogen");
  for (const t of [NaN, -1, 0, Infinity, -Infinity]) {
    it(`refuses T = ${t} with InputError`, () => {
      expect(() => gas.cp(t)).toThrow(InputError);
      expect(() => gas.enthalpyFrom298(t)).toThrow(/temperatureK/);
      expect(() => gas.entropyStandard(t)).toThrow(/temperatureK/);
    });
  }

  it("shares the range policy of the correlation route: 10 % extrapolation, then OutOfRangeError", () => {
    // Inside the margin the same formulas are used (the mixture layer adds the warning).
    expect(gas.cp(46)).toBeGreaterThan(0);
    expect(gas.cp(1640)).toBeGreaterThan(0);
    expect(() => gas.cp(44)).toThrow(OutOfRangeError);
    expect(() => gas.cp(1651)).toThrow(/50 K to 1500 K/);
    expect(() => idealGasFromMolecule("water").entropyStandard(150)).toThrow(/201 K/);
    expect(() => idealGasFromMolecule("hydrogen").cp(20)).not.toThrow();
    const strict = idealGasFromMolecule("nitrogen", { extrapolationMargin: 0 });
    expect(() => strict.cp(49)).toThrow(OutOfRangeError);
    expect(() => strict.cp(1501)).toThrow(OutOfRangeError);
    const wide = idealGasFromMolecule("nitrogen", {
      maxTemperatureK: 3000,
      extrapolationMargin: 0,
    });
    expect(wide.cp(3000)).toBeGreaterThan(0);
    expect(() => wide.cp(3001)).toThrow(OutOfRangeError);
    for (const bad of [3001, 299, NaN, Infinity]) {
      expect(() => idealGasFromMolecule("nitrogen", { maxTemperatureK: bad })).toThrow(
        /maxTemperatureK/,
      );
    }
    expect(() => idealGasFromMolecule("nitrogen", { extrapolationMargin: -0.1 })).toThrow(
      /extrapolationMargin/,
    );
    expect(() => idealGasFromMolecule("nitrogen", { extrapolationMargin: NaN })).toThrow(
      OutOfRangeError,
    );
  });
});

describe("no shared mutable state", () => {
  it("editing the caller's constants after construction does not change the model", () => {
    const mine = JSON.parse(JSON.stringify(getMolecule("carbon-monoxide"))) as {
      -readonly [K in keyof MolecularConstants]: MolecularConstants[K];
    };
    const gas = idealGasFromMolecule(mine);
    const before = gas.entropyStandard(400);
    mine.rotationalConstantsInvCm = [10];
    mine.molarMassKgPerMol = 1;
    expect(gas.entropyStandard(401)).toBeGreaterThan(before);
    expect(gas.entropyStandard(400)).toBe(before);
  });

  it("the memoised contributions cannot be altered by a caller", () => {
    const gas = idealGasFromMolecule("methane");
    const parts = gas.contributions(500);
    expect(Object.isFrozen(parts)).toBe(true);
    expect(Object.isFrozen(parts.total)).toBe(true);
    expect(gas.contributions(500).total.cp).toBe(parts.total.cp);
  });
});

describe("shipped table is read-only", () => {
  it("getMolecule returns a deeply frozen record", () => {
    const ethane = getMolecule("ethane");
    expect(Object.isFrozen(ethane)).toBe(true);
    expect(Object.isFrozen(ethane.vibrations[0])).toBe(true);
    expect(() => {
      (ethane.rotationalConstantsInvCm as number[])[0] = 1;
    }).toThrow(TypeError);
  });
});
