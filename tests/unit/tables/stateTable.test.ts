// States, streams and process steps that table themselves (issue item 14): sensible columns and
// units in one call, still configurable; the phase in words; the reference state in the note.
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import { sharedReferenceState } from "../../../kernel-lib/src/fluid/sharedReferenceState.js";
import { defineStream } from "../../../kernel-lib/src/process/stream.js";
import { valve } from "../../../kernel-lib/src/process/valve.js";
import { stateTable, stepTable } from "../../../kernel-lib/src/tables/stateTable.js";
import { tableHtml } from "../../../kernel-lib/src/tables/tableHtml.js";
import { tableText } from "../../../kernel-lib/src/tables/tableText.js";
import { InputError } from "../../../kernel-lib/src/errors.js";

const gas = defineFluid({ components: ["methane", "propane"], model: "peng-robinson" });
const x = [0.7, 0.3];
const vapour = gas.state({ T: 320, P: 20e5, x });
const split = gas.state({ T: 250, P: 30e5, x });

/** The text table split into cells (two or more spaces between columns). */
const cells = (text: string): string[][] => text.split("\n").map((l) => l.trim().split(/\s{2,}/));

describe("stateTable: one call, sensible columns and units", () => {
  it("default columns: name, T in degC, P in bar, phase, density, Z, h in kJ/mol, s", () => {
    const t = stateTable([vapour], { names: ["feed"] });
    expect(t.columns.map((c) => c.key)).toEqual([
      "name",
      "T",
      "P",
      "phase",
      "density",
      "Z",
      "h",
      "s",
    ]);
    const [head, units, , row] = cells(tableText(t));
    expect(head).toEqual(["State", "T", "P", "Phase", "Density", "Z", "h", "s"]);
    expect(units).toEqual(["°C", "bar", "kg/m³", "kJ/mol", "J/(mol·K)"]);
    // the values, converted from the SI state by hand
    expect(row[0]).toBe("feed");
    expect(row[1]).toBe((320 - 273.15).toFixed(2));
    expect(row[2]).toBe("20.000");
    expect(row[3]).toBe("vapour");
    expect(Number(row[4])).toBeCloseTo(vapour.densityKgPerM3, 2);
    expect(Number(row[6])).toBeCloseTo(vapour.molar.h / 1000, 3);
  });

  it("a two-phase state brings the vapour fraction, with the phases in words", () => {
    expect(split.phases.length).toBe(2);
    const t = stateTable([vapour, split]);
    expect(t.columns.map((c) => c.key)).toContain("vaporFraction");
    expect(t.rows[1].phase).toBe("vapour + liquid");
    expect(t.rows[1].vaporFraction).toBeCloseTo(split.vaporFraction, 12);
    expect(t.rows[0].vaporFraction).toBe(1);
    // cp is undefined in two phases: a dash, never a number made up from one phase
    const withCp = tableText(stateTable([split], { columns: ["T", "cp"] }));
    expect(cells(withCp).at(-1)).toEqual([(250 - 273.15).toFixed(2), "–"]);
  });

  it("mass basis: h in kJ/kg from each row's own molar mass (phases of different composition)", () => {
    const phases = split.phases.map((p) => p.state);
    const t = stateTable(phases, { basis: "mass", columns: ["h", "s", "density"] });
    const rows = cells(tableText(t)).slice(3);
    phases.forEach((p, i) => {
      expect(Number(rows[i][0])).toBeCloseTo(p.mass.h / 1000, 2);
      expect(Number(rows[i][1])).toBeCloseTo(p.mass.s / 1000, 4);
      expect(Number(rows[i][2])).toBeCloseTo(p.densityKgPerM3, 1);
    });
  });

  it("units and columns stay configurable: unitOf, a unit system, a column of your own", () => {
    const t = stateTable([vapour], {
      columns: [
        "P",
        "T",
        {
          key: "rhoIdeal",
          label: "Ideal-gas density",
          unit: "kg/m3",
          digits: 4,
          value: (s) => s.densityMolPerM3 * s.Z,
        },
      ],
      unitOf: { P: "barg" },
      units: { system: "field" },
    });
    const [, units, , row] = cells(tableText(t));
    expect(units).toEqual(["barg", "°F", "kg/m³"]);
    expect(Number(row[0])).toBeCloseTo(20 - 1.01325, 2); // 5 significant figures
    expect(Number(row[1])).toBeCloseTo((320 * 9) / 5 - 459.67, 1);
    expect(Number(row[2])).toBeCloseTo(vapour.densityKgPerM3 * vapour.Z, 2);
  });

  it("streams bring their flows; a flash result (Equilibrium) tables like a state", () => {
    const stream = defineStream({
      fluid: gas,
      z: x,
      T: 320,
      P: 20e5,
      flow: { value: 100, unit: "kmol/h" },
      name: "fuel gas",
    });
    const t = stateTable([stream, stream.state]);
    expect(t.rows[0].name).toBe("fuel gas");
    expect(t.rows[0].molarFlow).toBeCloseTo(100, 9);
    expect(t.rows[0].massFlow).toBeCloseTo(100 * stream.molarMassKgPerMol * 1000, 6);
    expect(t.rows[1].h).toBeCloseTo(vapour.molar.h, 6);
    expect(t.columns.map((c) => c.key)).toEqual(expect.arrayContaining(["molarFlow", "massFlow"]));
    expect(tableHtml(t)).toContain("fuel gas");
  });

  it("the note names the reference state, and says so when rows are on different ones", () => {
    expect(stateTable([vapour]).options.note).toMatch(/^h and s: formation basis/);
    const co2sw = defineFluid({
      components: ["carbon-dioxide"],
      model: referenceFluid("carbon-dioxide"),
    });
    const co2pr = defineFluid({ components: ["carbon-dioxide"], model: "peng-robinson" });
    const own = [co2sw, co2pr].map((f) => f.state({ T: 300, P: 10e5 }));
    expect(stateTable(own).options.note).toMatch(/NOT comparable.*sharedReferenceState/);
    const shared = sharedReferenceState([co2sw, co2pr]);
    const same = shared.fluids.map((f) => f.state({ T: 300, P: 10e5 }));
    expect(stateTable(same, { note: "K-320." }).options.note).toMatch(
      /^K-320\. h and s: h = 0 and s = 0 for each pure ideal gas at 298\.15 K/,
    );
    // no h or s shown: no note about them
    expect(stateTable(own, { columns: ["T", "P"] }).options.note).toBeUndefined();
  });

  it("refuses wrong names, unknown columns and things that are not states", () => {
    expect(() => stateTable([vapour], { names: ["a", "b"] })).toThrow(InputError);
    expect(() => stateTable([vapour], { columns: ["enthalpy" as never] })).toThrow(
      /column names T, P/.source.replace("T, P", "name, T, P"),
    );
    expect(() => stateTable([{ T: 300 }])).toThrow(/temperatureK and pressurePa/);
    expect(() => stateTable("x" as never)).toThrow(InputError);
  });
});

describe("stepTable: one row per process step", () => {
  const inlet = (T: number, name: string) =>
    defineStream({ fluid: gas, z: x, T, P: 40e5, flow: { value: 1, unit: "kmol/h" }, name });
  const steps = [
    valve(inlet(310, "A"), { outletPressurePa: 7e5 }),
    valve(inlet(300, "B"), { outletPressurePa: 7e5 }),
  ];

  it("inlet and outlet T and P, the change, the outlet phase, the balance", () => {
    const t = stepTable(steps);
    expect(t.rows.map((r) => r.name)).toEqual(["A", "B"]);
    steps.forEach((s, i) => {
      const row = t.rows[i];
      expect(row.outletT).toBe(s.outlet.state.temperatureK);
      expect(row.changeT).toBeCloseTo(
        s.outlet.state.temperatureK - s.inlets[0].state.temperatureK,
        12,
      );
      expect(row.balance).toBe(s.check.energyBalanceRelativeError);
    });
    // a valve has neither power nor duty: no such columns
    expect(t.columns.map((c) => c.key)).not.toContain("power");
    const [head, units] = cells(tableText(t));
    expect(head.slice(0, 6)).toEqual([
      "Step",
      "Inlet T",
      "Inlet P",
      "Outlet T",
      "Outlet P",
      "Change of T",
    ]);
    expect(units.slice(0, 5)).toEqual(["°C", "bar", "°C", "bar", "K"]);
  });

  it("names and units can be given; a bad step is refused", () => {
    const t = stepTable(steps, { names: ["PV-1", "PV-2"], unitOf: { P: "barg" } });
    expect(t.rows[1].name).toBe("PV-2");
    expect(cells(tableText(t))[1][1]).toBe("barg");
    expect(() => stepTable(steps, { names: ["one"] })).toThrow(InputError);
    expect(() => stepTable([{} as never])).toThrow(/steps\[0\]/);
  });
});

describe("a record takes the table in one call", () => {
  it("rec.results(stateTable(...)) records the rows, the columns, the note and the warnings", async () => {
    const { startRecord } = await import("../../../kernel-lib/src/records/calculationRecord.js");
    const rec = startRecord({
      question: "Which states does the FG-100 letdown pass through?",
      site: "Corvid Point Refinery (invented)",
      register: false,
    });
    const model = rec.model(gas, { label: "Peng-Robinson" });
    const t = rec.results(stateTable([vapour, split], { names: ["feed", "chilled"] }), {
      caption: "States",
      model,
    });
    expect(t.rows).toBe(2);
    expect(t.markdown).toContain("| State | T (°C) | P (bar) | Phase | Vapour fraction |");
    expect(t.markdown).toContain("vapour + liquid");
    expect(t.markdown).toContain("h and s: formation basis");
    // the options given to results override the table's own caption
    expect(t.markdown).toContain("T1. States");
  });
});
