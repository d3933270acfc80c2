import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { chartMeta } from "../../../kernel-lib/src/charts/chartSpec.js";
import { R } from "../../../kernel-lib/src/constants.js";
import { createExplorerState } from "../../../kernel-lib/src/explorers/createExplorerState.js";
import { setMoleFraction } from "../../../kernel-lib/src/explorers/departureExplorer.js";
import { explorerDefinition } from "../../../kernel-lib/src/explorers/explorerDefinitions.js";
import { ExplorerFluids } from "../../../kernel-lib/src/explorers/explorerFluids.js";
import type {
  DepartureExplorerState,
  IsothermExplorerState,
  ExplorerState,
  PressureEnthalpyExplorerState,
} from "../../../kernel-lib/src/explorers/explorerState.js";
import {
  pointState,
  pressureEnthalpyExplorer,
} from "../../../kernel-lib/src/explorers/pressureEnthalpyExplorer.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import { expectReference, referenceValue } from "../../fixtures/referenceValues.js";

type Row = Record<string, unknown>;

/** Rows of every layer of a spec whose data has a `series` field equal to `series`. */
function seriesRows(spec: Record<string, unknown>, series: string): Row[] {
  const out: Row[] = [];
  const walk = (node: unknown): void => {
    if (Array.isArray(node)) return node.forEach(walk);
    if (node === null || typeof node !== "object") return;
    const data = (node as { data?: { values?: Row[] } }).data;
    if (data?.values) out.push(...data.values.filter((r) => r.series === series));
    for (const v of Object.values(node)) walk(v);
  };
  walk(spec);
  return out;
}

describe("isotherm explorer", () => {
  it("puts Peng-Robinson's critical point at the table's Tc and Pc", () => {
    // Peng and Robinson, Ind. Eng. Chem. Fundam. 15 (1976) 59, eqs 9-10: a(Tc) and b are set from
    // Tc and Pc so that the equation meets the critical conditions there.
    const state = createExplorerState("isotherms", {
      components: "propane",
      model: "peng-robinson",
    });
    const fluids = new ExplorerFluids(state.components);
    const dome = fluids.dome("peng-robinson");
    expect(dome).not.toBeNull();
    const c = state.components[0];
    expect(Math.abs(dome!.critical.temperatureK / c.criticalTemperatureK - 1)).toBeLessThan(1e-6);
    expect(Math.abs(dome!.critical.pressurePa / c.criticalPressurePa - 1)).toBeLessThan(1e-5);
  });

  it("finds the CO2 critical point of the reference equation", () => {
    // Span and Wagner, J. Phys. Chem. Ref. Data 25 (1996) 1509: Tc = 304.1282 K, pc = 7.3773 MPa
    // (from memory of the paper's section 2).
    const state = createExplorerState("isotherms", { components: "carbon dioxide" });
    const dome = new ExplorerFluids(state.components).dome("reference");
    const sw = (key: string) => referenceValue("span-wagner-1996-co2.json", key);
    expectReference(dome!.critical.temperatureK, sw("critical/T"), "explorer");
    expectReference(dome!.critical.pressurePa / 1e6, sw("critical/p"), "explorer");
  });

  it("draws 400 points that reach the ideal-gas limit at large volume, for every model", () => {
    const state = createExplorerState("isotherms", {
      components: "carbon dioxide",
      temperatureK: 320,
    });
    const fluids = new ExplorerFluids(state.components);
    const def = explorerDefinition(state);
    for (const model of state.models) {
      const s = def.update(state, "model", model, fluids);
      const rows = seriesRows(def.chart(s, fluids), "at the slider temperature");
      expect(rows.length, model).toBeGreaterThanOrEqual(390); // 400 less any clipped non-finite
      // largest molar volume (m3/kmol) with P (MPa): Z = P v / (R T) -> 1 (ideal-gas law)
      const far = rows.reduce((a, b) => ((a.x as number) > (b.x as number) ? a : b));
      const Z = ((far.y as number) * 1e6 * ((far.x as number) / 1000)) / (R * 320);
      expect(Math.abs(Z - 1), model).toBeLessThan(2e-3);
    }
  });

  it("opens on the reference equation at 0 degC with the stable isotherm, the loop on request", () => {
    // The stable isotherm below Tc: vapour branch, flat tie line at the vapour pressure, liquid
    // branch; no point below zero pressure and none outside the drawn window.
    const state = createExplorerState("isotherms", {
      components: "carbon dioxide",
      temperatureK: 273.15,
    });
    expect((state as IsothermExplorerState).insideDome).toBe("tie-line");
    const fluids = new ExplorerFluids(state.components);
    const def = explorerDefinition(state);
    const s = def.update(state, "model", "reference", fluids);
    const Pc = fluids.dome("reference")!.critical.pressurePa / 1e6; // MPa, the chart's unit
    const stable = seriesRows(def.chart(s, fluids), "at the slider temperature");
    expect(stable.length).toBeGreaterThan(100);
    const pressures = stable.map((r) => r.y as number).filter((y) => y <= 2 * Pc);
    expect(Math.min(...pressures)).toBeGreaterThanOrEqual(0);
    expect(def.status!(s, fluids)).toMatch(/stable isotherm runs flat/);
    // The tie line: many points at one pressure (the vapour pressure, 3.485 MPa at 0 degC from
    // memory of Span and Wagner 1996, Table 34; 1 %: the chart samples a grid), spanning the dome.
    const flat = stable.filter((r) => Math.abs((r.y as number) / 3.485 - 1) < 0.01);
    const xs = flat.map((r) => r.x as number);
    expect(flat.length).toBeGreaterThanOrEqual(2);
    expect(Math.max(...xs) / Math.min(...xs)).toBeGreaterThan(5); // vapour to liquid volume
    // The loop view: negative pressures appear, and the status says why the loop looks so.
    const loop = def.update(s, "insideDome", "loop", fluids);
    const looped = seriesRows(def.chart(loop, fluids), "at the slider temperature");
    expect(Math.min(...looped.map((r) => r.y as number))).toBeLessThan(0);
    expect(def.status!(loop, fluids)).toMatch(/no physical meaning/);
    expect(() => def.update(s, "insideDome", "wiggle", fluids)).toThrow(InputError);
  });

  it("names the reference equation once in the subtitle", () => {
    const state = createExplorerState("isotherms", { components: "carbon dioxide" });
    const fluids = new ExplorerFluids(state.components);
    const def = explorerDefinition(state);
    const s = def.update(state, "model", "reference", fluids);
    const text = JSON.stringify(def.chart(s, fluids));
    expect(text).toMatch(/Carbon dioxide \(Span and Wagner 1996\)/);
    expect(text).not.toMatch(/Carbon dioxide, Carbon dioxide/);
  });

  it("refuses control values it cannot take, and leaves the old state alone", () => {
    const state = createExplorerState("isotherms", { components: "methane" });
    const fluids = new ExplorerFluids(state.components);
    const def = explorerDefinition(state);
    const before = JSON.stringify(state);
    const bad: Array<[string, unknown]> = [
      ["temperatureK", NaN],
      ["temperatureK", 1e9],
      ["temperatureK", "300"],
      ["model", "reference-of-something"],
      ["abscissa", "pressure"],
      ["nonsense", 1],
    ];
    for (const [key, value] of bad) {
      expect(() => def.update(state, key, value as number, fluids), key).toThrow(InputError);
    }
    const moved = def.update(state, "temperatureK", state.temperatureRangeK[0], fluids);
    expect(moved).not.toBe(state);
    expect(JSON.stringify(state)).toBe(before);
  });
});

describe("departure explorer", () => {
  it("keeps mole fractions summing to 1 with the moved one as set", () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 2, maxLength: 6 }),
        fc.nat(),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (raw, k, value) => {
          const sum = raw.reduce((a, b) => a + b, 0);
          const x = sum > 0 ? raw.map((v) => v / sum) : raw.map(() => 1 / raw.length);
          const i = k % x.length;
          const y = setMoleFraction(x, i, value);
          expect(y[i]).toBe(value);
          expect(Math.abs(y.reduce((a, b) => a + b, 0) - 1)).toBeLessThan(1e-12);
          expect(y.every((v) => v >= 0 && v <= 1 + 1e-15)).toBe(true);
        },
      ),
    );
  });

  it("starts at zero departure in the dilute gas (ideal-gas limit)", () => {
    const state = createExplorerState("departures", {
      components: ["carbon dioxide", "nitrogen"],
      x: [0.9, 0.1],
      temperatureK: 300,
      pressureRangePa: [1e3, 1e7],
      properties: ["h"],
    }) as DepartureExplorerState;
    const fluids = new ExplorerFluids(state.components);
    const rows = seriesRows(
      explorerDefinition(state).chart(state, fluids),
      "at the slider temperature",
    );
    const first = rows.reduce((a, b) => ((a.x as number) < (b.x as number) ? a : b));
    // kJ/mol on the axis; the residual enthalpy is ~ (B - T dB/dT) P, well under 0.1 % of RT at 1 kPa
    expect(Math.abs((first.y as number) * 1000)).toBeLessThan(1e-3 * R * 300);
    const last = rows.reduce((a, b) => ((a.x as number) > (b.x as number) ? a : b));
    expect(last.y as number).toBeLessThan(-0.5); // dense at 100 bar: kJ/mol-scale departure
  });

  it("moves the composition through the x.<i> controls", () => {
    const state = createExplorerState("departures", { components: ["methane", "propane"] });
    const fluids = new ExplorerFluids(state.components);
    const next = explorerDefinition(state).update(
      state,
      "x.1",
      0.2,
      fluids,
    ) as DepartureExplorerState;
    expect(next.x[1]).toBe(0.2);
    expect(next.x[0]).toBeCloseTo(0.8, 14);
    expect(() => explorerDefinition(state).update(state, "x.1", 1.5, fluids)).toThrow(InputError);
    expect(() => explorerDefinition(state).update(state, "properties", [], fluids)).toThrow(
      InputError,
    );
  });
});

describe("pressure-enthalpy explorer", () => {
  const co2 = (): { state: PressureEnthalpyExplorerState; fluids: ExplorerFluids } => {
    const state = createExplorerState("pressure-enthalpy", {
      components: "carbon dioxide",
      temperatureK: 300,
      pressurePa: 3e6,
      pressureRangePa: [6e5, 2e7],
    }) as PressureEnthalpyExplorerState;
    return { state, fluids: new ExplorerFluids(state.components) };
  };

  it("puts a point inside the dome at the CO2 vapour pressure of 0 degC at 273.15 K", () => {
    // Span and Wagner (1996), saturation table: p_sat(273.15 K) = 3.4851 MPa (from memory of the
    // paper's Table 34).
    const { state, fluids } = co2();
    const def = pressureEnthalpyExplorer;
    const pSat = referenceValue("span-wagner-1996-co2.json", "saturation/T273.15/p").value * 1e6;
    const atP = def.update(state, "pressurePa", pSat, fluids);
    const dome = fluids.dome("reference")!;
    // h halfway between the saturated phases at the dome row nearest 273 K
    const row = dome.saturation.reduce((a, b) =>
      Math.abs(a.temperatureK - 273.15) < Math.abs(b.temperatureK - 273.15) ? a : b,
    );
    const mid = 0.5 * (row.liquid.enthalpyJPerMol! + row.vapor.enthalpyJPerMol!);
    const inside = def.update(atP, "enthalpyJPerMol", mid, fluids);
    const point = pointState(inside, fluids);
    expect(point.kind).toBe("two-phase");
    if (point.kind === "two-phase") {
      expect(point.temperatureK).toBeCloseTo(273.15, 1);
      expect(point.quality).toBeGreaterThan(0);
      expect(point.quality).toBeLessThan(1);
    }
    const table = def.table!(inside, fluids);
    expect(table).toContain("saturated liquid");
    expect(table).toContain("saturated vapour");
  });

  it("keeps T and P when the model changes, and picks points in display units", () => {
    const { state, fluids } = co2();
    const def = pressureEnthalpyExplorer;
    const pr = def.update(state, "model", "peng-robinson", fluids);
    const a = pointState(state, fluids);
    const b = pointState(pr, fluids);
    expect(a.kind).toBe("single-phase");
    if (a.kind === "single-phase" && b.kind === "single-phase") {
      expect(b.state.temperatureK).toBeCloseTo(a.state.temperatureK, 6);
    }
    // SI display units: h in kJ/kg (mass basis), P in MPa
    const M = state.components[0].molarMassKgPerMol;
    const picked = def.pick!(state, { x: state.enthalpyJPerMol / M / 1000, y: 5 }, fluids);
    expect(picked.pressurePa).toBeCloseTo(5e6, 3);
    expect(picked.enthalpyJPerMol).toBeCloseTo(state.enthalpyJPerMol, 6);
    expect(() => def.pick!(state, { x: 0, y: 1e6 }, fluids)).toThrow(InputError); // off the axes
  });
});

describe("every explorer", () => {
  it("redraws on each of its own controls without throwing", () => {
    const states: ExplorerState[] = [
      createExplorerState("isotherms", { components: "methane" }),
      createExplorerState("departures", { components: ["methane", "ethane"] }),
      createExplorerState("pressure-enthalpy", { components: "propane" }),
    ];
    for (const state of states) {
      const fluids = new ExplorerFluids(state.components);
      const def = explorerDefinition(state);
      for (const c of def.controls(state, fluids)) {
        const value =
          c.type === "slider"
            ? c.min + 0.37 * (c.max - c.min)
            : c.type === "select"
              ? c.options[c.options.length - 1].value
              : c.type === "checklist"
                ? [c.options[0].value]
                : (c.value ?? 300);
        const next = def.update(state, c.key, value, fluids);
        expect(chartMeta(def.chart(next, fluids))?.chart, `${state.kind} ${c.key}`).toBeTruthy();
      }
    }
  });
});
