// States, streams and process steps that table themselves (issue item 14): sensible columns and
// units in one call, still configurable; the phase in words; the reference state in the note.
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import { sharedReferenceState } from "../../../kernel-lib/src/fluid/sharedReferenceState.js";
import { defineStream } from "../../../kernel-lib/src/process/stream.js";
import { valve } from "../../../kernel-lib/src/process/valve.js";
import { compressorStage } from "../../../kernel-lib/src/process/compressor.js";
import { R } from "../../../kernel-lib/src/constants.js";
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
    // SI in the rows (mol/s, kg/s) like every other column; kmol/h and kg/h in the table
    expect(t.rows[0].molarFlow).toBeCloseTo(100 / 3.6, 9);
    expect(t.rows[0].massFlow).toBeCloseTo((100 / 3.6) * stream.molarMassKgPerMol, 9);
    const [head, units, , row] = cells(
      tableText(stateTable([stream], { columns: ["molarFlow", "massFlow"] })),
    );
    expect(head).toEqual(["Molar flow", "Mass flow"]);
    expect(units).toEqual(["kmol/h", "kg/h"]);
    expect(Number(row[0])).toBeCloseTo(100, 9);
    expect(Number(row[1])).toBeCloseTo(100 * stream.molarMassKgPerMol * 1000, 1);
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

describe("stateTable: departures in either convention, flows in any flow unit", () => {
  const columns = ["hResidual", "uResidual", "sResidual", "aResidual", "gResidual"] as const;

  it("departures from the ideal gas at the same T and P, or at the same T and density", () => {
    const state = vapour.phases[0].state;
    const tp = stateTable([state], { columns });
    const tv = stateTable([state], { columns, departures: "same-T-and-density" });
    expect(tp.rows[0].gResidual).toBe(state.residual.g);
    expect(tv.rows[0].aResidual).toBe(state.residualTV.a);
    // h and u do not depend on the convention; s differs by R ln Z (ideal gas at the same P has
    // density rho Z), as a thermodynamics text derives it (e.g. Smith, Van Ness and Abbott)
    expect(tv.rows[0].hResidual).toBeCloseTo(tp.rows[0].hResidual as number, 9);
    expect(tv.rows[0].uResidual).toBeCloseTo(tp.rows[0].uResidual as number, 9);
    expect((tp.rows[0].sResidual as number) - (tv.rows[0].sResidual as number)).toBeCloseTo(
      R * Math.log(state.Z),
      9,
    );
    expect(tp.options.note).toMatch(/ideal gas at the same T and P\./);
    expect(tv.options.note).toMatch(/ideal gas at the same T and density\./);
    // a one-phase flash result gives its phase's departures; a split gives none (a dash)
    expect(stateTable([vapour], { columns }).rows[0].gResidual).toBe(state.residual.g);
    expect(stateTable([split], { columns }).rows[0].hResidual).toBeUndefined();
    const [head, units] = cells(
      tableText(stateTable([state], { columns, unitOf: { uResidual: "J/mol" } })),
    );
    // no-break spaces: the head does not wrap inside "h − hⁱᵍ"
    expect(head).toEqual(["hh", "uu", "ss", "aa", "gg"].map(([p, q]) => `${p}\u00a0−\u00a0${q}ⁱᵍ`));
    expect(units).toEqual(["kJ/mol", "J/mol", "J/(mol·K)", "kJ/mol", "kJ/mol"]);
    expect(() => stateTable([state], { departures: "same-T" as never })).toThrow(
      /options\.departures/,
    );
  });

  it("fixed decimals of a named column instead of significant figures", () => {
    const t = stateTable([vapour.phases[0].state], {
      columns: ["P", "hResidual"],
      unitOf: { hResidual: "J/mol" },
      decimalsOf: { P: 1, hResidual: 1 },
    });
    const row = cells(tableText(t)).at(-2)!; // the last line is the note
    expect(row).toEqual(["20.0", vapour.phases[0].state.residual.h.toFixed(1)]);
    const steps = [
      valve(
        defineStream({ fluid: gas, z: x, T: 310, P: 40e5, flow: { value: 1, unit: "kmol/h" } }),
        { outletPressurePa: 7e5 },
      ),
    ];
    const s = stepTable(steps, {
      columns: ["outletP", "pressureRatio"],
      decimalsOf: { outletP: 2, pressureRatio: 3 },
    });
    expect(cells(tableText(s)).at(-1)).toEqual(["7.00", (7 / 40).toFixed(3)]);
  });

  it("heads of named columns can be renamed", () => {
    const t = stateTable([vapour], {
      columns: ["name", "T", "h"],
      labelOf: { name: "Point", T: "Outlet T" },
    });
    expect(cells(tableText(t))[0]).toEqual(["Point", "Outlet T", "h"]);
    const s = stepTable(
      [
        valve(
          defineStream({ fluid: gas, z: x, T: 310, P: 40e5, flow: { value: 1, unit: "kmol/h" } }),
          { outletPressurePa: 7e5 },
        ),
      ],
      {
        columns: ["outletT", "pressureRatio"],
        labelOf: { outletT: "Discharge T", pressureRatio: "Ratio" },
        decimalsOf: { pressureRatio: 2 },
      },
    );
    expect(cells(tableText(s))[0]).toEqual(["Discharge T", "Ratio"]);
  });

  it("flow columns in the flow unit asked for; a flow unit of the wrong kind is refused", () => {
    const stream = defineStream({
      fluid: gas,
      z: x,
      T: 320,
      P: 20e5,
      flow: { value: 100, unit: "kmol/h" },
    });
    const t = stateTable([stream], {
      columns: ["molarFlow", "massFlow"],
      unitOf: { molarFlow: "mol/s", massFlow: "t/h" },
    });
    const [, units, , row] = cells(tableText(t));
    expect(units).toEqual(["mol/s", "t/h"]);
    expect(Number(row[0])).toBeCloseTo(100e3 / 3600, 2); // 1 kmol/h = 1000/3600 mol/s
    expect(Number(row[1])).toBeCloseTo(100 * stream.molarMassKgPerMol, 4); // kmol/h x kg/mol = t/h
    expect(() => stateTable([stream], { unitOf: { massFlow: "kmol/h" } })).toThrow(
      /options\.unitOf\.massFlow/,
    );
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

describe("stepTable: columns of your choice (compressor heads, efficiencies, flows, your own)", () => {
  const suction = defineStream({
    fluid: gas,
    z: [0.9, 0.1],
    T: 310,
    P: 5e5,
    flow: { value: 36, unit: "kmol/h" },
    name: "K-1 suction",
  });
  const stage = compressorStage(suction, { outletPressurePa: 15e5, polytropicEfficiency: 0.75 });

  it("named compressor columns read the step's own results, head per kg of the inlet", () => {
    const t = stepTable([stage], {
      columns: [
        "name",
        "pressureRatio",
        "polytropicHead",
        "polytropicExponent",
        "isentropicEfficiency",
        "power",
        "massFlow",
      ],
      unitOf: { massFlow: "t/h" },
    });
    const row = t.rows[0];
    expect(row.pressureRatio).toBe(stage.pressureRatio);
    expect(row.isentropicEfficiency).toBe(stage.isentropicEfficiency);
    expect(row.polytropicExponent).toBe(stage.polytropicExponent);
    const [head, units, , cellsOfRow] = cells(tableText(t));
    expect(head).toEqual([
      "Step",
      "Pressure ratio",
      "Polytropic head",
      "Polytropic exponent",
      "Isentropic efficiency",
      "Power into fluid",
      "Inlet mass flow",
    ]);
    expect(units).toEqual(["kJ/kg", "kW", "t/h"]);
    // kJ/kg = J/mol / (kg/mol) / 1000, by hand
    expect(Number(cellsOfRow[2])).toBeCloseTo(
      stage.polytropicHeadJPerMol! / suction.molarMassKgPerMol / 1000,
      2,
    );
    expect(Number(cellsOfRow[5])).toBeCloseTo(stage.powerW! / 1000, 2);
    // 36 kmol/h x M kg/mol = 36 M t/h
    expect(Number(cellsOfRow[6])).toBeCloseTo(36 * suction.molarMassKgPerMol, 4);
  });

  it("a valve has no head (a dash), a column of your own, and a bad column is refused", () => {
    const v = valve(suction, { outletPressurePa: 2e5 });
    const t = stepTable([stage, v], {
      nameLabel: "Item",
      columns: [
        "name",
        "polytropicHead",
        "pressureRatio",
        {
          key: "dT",
          label: "Outlet T − inlet T",
          unit: "K",
          difference: true,
          digits: 4,
          value: (r) => r.outlet.state.temperatureK - r.inlets[0].state.temperatureK,
        },
      ],
    });
    const lines = cells(tableText(t));
    expect(lines[0][0]).toBe("Item");
    expect(lines[4][1]).toBe("–");
    expect(t.rows[1].pressureRatio).toBeCloseTo(2e5 / 5e5, 12);
    expect(t.rows[1].dT).toBe(v.outlet.state.temperatureK - v.inlets[0].state.temperatureK);
    expect(() => stepTable([stage], { columns: ["head" as never] })).toThrow(/pressureRatio/);
    expect(() => stepTable([stage], { columns: [{ key: "k", label: "k" } as never] })).toThrow(
      /options\.columns\[0\]/,
    );
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
