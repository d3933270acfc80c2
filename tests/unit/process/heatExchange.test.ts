/**
 * Heater, cooler and the two-stream exchanger (process/heater.ts, exchanger.ts) with their heat
 * curves (process/heatCurve.ts): steam-table saturation on the flat condensation segment, energy
 * balances closed, the exact bubble and dew points of a mixture, the minimum approach found
 * inside the exchanger where the end differences alone would miss it, and refused input.
 */
import { describe, expect, it } from "vitest";
import { cooler, heater } from "../../../kernel-lib/src/process/heater.js";
import { exchanger } from "../../../kernel-lib/src/process/exchanger.js";
import { PROCESS_CAUTION } from "../../../kernel-lib/src/process/types.js";
import { overallProperty } from "../../../kernel-lib/src/phase/flash/stateFunctionFlash.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import { stepHeatCurveChart } from "../../../kernel-lib/src/charts/heatCurve.js";
import { allLayers, schemaErrors } from "../charts/specCheck.js";
import { iapwsWater, LIGHT_GAS_Z, lightGas, ONE_MOL_PER_S, streamAt } from "./fixtures.js";

// water by its reference equation (IAPWS-95): the saturation line is the equation's own
const water = iapwsWater();
const ATM = 101325;
// Saturation temperature of water at 101.325 kPa: 373.124 K (from memory of the IAPWS-95
// release / Wagner and Pruss, J. Phys. Chem. Ref. Data 31 (2002) 387, normal boiling point).
const T_SAT_1ATM = 373.124;
// Enthalpy of vaporisation at 100 degC: 2256.4 kJ/kg (from memory of the IAPWS-IF97 steam
// tables, e.g. Wagner and Kretzschmar, International Steam Tables, 2008); at 101.325 kPa
// (99.97 degC) it is within 0.1 kJ/kg of that.
const H_VAP_KJ_PER_KG = 2256.4;
const M_WATER = 0.018015268; // kg/mol (IAPWS-95)

const gas = lightGas();
const zGas = LIGHT_GAS_Z;

function relativeEnergyError(inH: number, outH: number, Fin: number, Q: number): number {
  return Math.abs(Fin * (outH - inH) - Q) / Math.max(Math.abs(Q), Fin * Math.abs(inH));
}

describe("heater and cooler", () => {
  it("cooling steam at 1 atm: the flat segment sits at the steam-table saturation temperature", () => {
    const steam = streamAt(water, undefined, 500, ATM);
    const r = cooler(steam, { outletTemperatureK: 350 });
    expect(r.kind).toBe("cooler");
    expect(r.dutyW).toBeLessThan(0);
    expect(r.caution).toBe(PROCESS_CAUTION);
    const [dew, bubble] = r.heatCurve.saturationPoints;
    expect(dew.kind).toBe("dew");
    expect(bubble.kind).toBe("bubble");
    expect(Math.abs(dew.temperatureK - T_SAT_1ATM)).toBeLessThan(1e-3);
    expect(Math.abs(bubble.temperatureK - T_SAT_1ATM)).toBeLessThan(1e-3);
    // every point between the dew and the bubble point is at the saturation temperature
    const inside = r.heatCurve.points.filter((p) => p.dutyW < dew.dutyW && p.dutyW > bubble.dutyW);
    expect(inside.length).toBeGreaterThan(10);
    for (const p of inside) expect(Math.abs(p.temperatureK - dew.temperatureK)).toBeLessThan(1e-6);
    // the length of the flat segment is the enthalpy of vaporisation
    const hvap = (dew.dutyW - bubble.dutyW) / 1 / M_WATER / 1e3; // kJ/kg at 1 mol/s
    expect(Math.abs(hvap - H_VAP_KJ_PER_KG)).toBeLessThan(0.5);
    // points in order of duty, markers included once each
    const duties = r.heatCurve.points.map((p) => p.dutyW);
    for (let k = 1; k < duties.length; k++) expect(duties[k]).toBeLessThan(duties[k - 1]);
    expect(r.check.energyBalanceRelativeError).toBeLessThan(1e-9);
  });

  it("a mixture heated by a duty: energy balance to 1e-9 and the exact bubble and dew points", () => {
    const feed = streamAt(gas, zGas, 220, 20e5, { value: 36, unit: "kmol/h" });
    const Q = 180e3;
    const r = heater(feed, { dutyW: Q, outletPressurePa: 19.5e5 });
    const hIn = overallProperty(feed.state, "h");
    const hOut = overallProperty(r.outlet.state, "h");
    expect(relativeEnergyError(hIn, hOut, feed.molarFlowMolPerS, Q)).toBeLessThan(1e-9);
    expect(r.outlet.state.pressurePa).toBe(19.5e5);
    // the markers are the saturation points of the feed at the pressure where the path meets them
    for (const m of r.heatCurve.saturationPoints) {
      const sat =
        m.kind === "bubble"
          ? gas.bubblePointAtPressure(m.pressurePa, zGas)
          : gas.dewPointAtPressure(m.pressurePa, zGas);
      expect(Math.abs(sat.temperatureK - m.temperatureK)).toBeLessThan(1e-6);
      // and on the path: h of the marker equals h_in + duty / F
      const h = (m.kind === "bubble" ? sat.liquid : sat.vapor).molar.h;
      expect(Math.abs(hIn + m.dutyW / feed.molarFlowMolPerS - h)).toBeLessThan(1e-6 * Math.abs(h));
    }
    // this path starts two-phase at 220 K and ends as vapour: it crosses the dew point only
    expect(r.heatCurve.saturationPoints.map((m) => m.kind)).toEqual(["dew"]);
  });

  it("outlet T and duty specifications agree with each other", () => {
    const feed = streamAt(gas, zGas, 350, 20e5);
    const byT = cooler(feed, { outletTemperatureK: 260 });
    const byQ = cooler(feed, { dutyW: byT.dutyW });
    expect(Math.abs(byQ.outlet.state.temperatureK - 260)).toBeLessThan(1e-6);
    expect(byT.check.energyBalanceRelativeError).toBeLessThan(1e-9);
  });

  it("warns below 0 degC and below a given minimum design metal temperature, with basis", () => {
    const feed = streamAt(gas, zGas, 300, 20e5);
    const r = cooler(feed, { outletTemperatureK: 240, minimumDesignMetalTemperatureK: 244 });
    const conditions = r.warnings.map((w) => (w as { condition?: string }).condition);
    expect(conditions).toContain("low-temperature");
    expect(conditions).toContain("below-minimum-design-metal-temperature");
    for (const w of r.warnings.filter((x) => x.code === "process-condition"))
      expect((w as { basis?: string }).basis).toBeTruthy();
  });

  it("refuses a heater that cools, a cooler that heats, and both or neither specification", () => {
    const feed = streamAt(gas, zGas, 300, 20e5);
    expect(() => heater(feed, { outletTemperatureK: 280 })).toThrow(/spec\.outletTemperatureK/);
    expect(() => cooler(feed, { dutyW: 100 })).toThrow(/spec\.dutyW/);
    expect(() => heater(feed, {})).toThrow(InputError);
    expect(() => heater(feed, { dutyW: 1, outletTemperatureK: 310 })).toThrow(InputError);
    expect(() => heater(feed, { dutyW: 1, outletPressurePa: -1 })).toThrow(/outletPressurePa/);
  });
});

describe("two-stream counter-current exchanger", () => {
  // a condensing hot stream (steam at 1 atm, superheated at 400 K) against boiler feed water
  // (liquid at 5 bar) : the pinch is where condensation starts, inside the exchanger
  const steam = () => streamAt(water, undefined, 400, ATM, ONE_MOL_PER_S, "steam");
  const bfw = (F: number) =>
    streamAt(water, undefined, 300, 5e5, { value: F, unit: "mol/s" }, "bfw");

  it("finds the minimum approach inside, where the ends alone would miss it", () => {
    const Q = 30e3;
    const r = exchanger(steam(), bfw(6), { dutyW: Q });
    const m = r.minimumApproach;
    expect(m.location).toBe("inside");
    expect(m.temperatureDifferenceK).toBeLessThan(r.hotEndDifferenceK - 10);
    expect(m.temperatureDifferenceK).toBeLessThan(r.coldEndDifferenceK - 10);
    // it is at the dew point of the steam: the hot side is at the saturation temperature
    expect(Math.abs(m.hotTemperatureK - T_SAT_1ATM)).toBeLessThan(1e-3);
    // independent check: dense flashes of both streams at the same heat never come closer
    const hs = r.inlets[0];
    const cs = r.inlets[1];
    const hH = overallProperty(hs.state, "h");
    const hC = overallProperty(cs.state, "h");
    let dense = Infinity;
    for (let k = 0; k <= 120; k++) {
      const x = (Q * k) / 120;
      const Th = water.flashPH(ATM, hH - (Q - x) / 1).temperatureK;
      const Tc = water.flashPH(5e5, hC + x / 6).temperatureK;
      dense = Math.min(dense, Th - Tc);
    }
    expect(m.temperatureDifferenceK).toBeLessThanOrEqual(dense + 1e-9);
    expect(dense - m.temperatureDifferenceK).toBeLessThan(0.05);
    // balances: both streams' enthalpy changes equal the duty
    expect(r.check.energyBalanceRelativeError).toBeLessThan(1e-9);
    const dHot = hs.molarFlowMolPerS * (hH - overallProperty(r.hotOutlet.state, "h"));
    const dCold = cs.molarFlowMolPerS * (overallProperty(r.coldOutlet.state, "h") - hC);
    expect(Math.abs(dHot - Q) / Q).toBeLessThan(1e-9);
    expect(Math.abs(dCold - Q) / Q).toBeLessThan(1e-9);
  });

  it("refuses an internal temperature cross (or warns when asked)", () => {
    // with 5 mol/s of water the cold stream passes the condensing steam inside, while both
    // end differences stay positive
    expect(() => exchanger(steam(), bfw(5), { dutyW: 30e3 })).toThrow(/temperature cross/);
    const r = exchanger(steam(), bfw(5), { dutyW: 30e3, onTemperatureCross: "warn" });
    expect(r.hotEndDifferenceK).toBeGreaterThan(0);
    expect(r.coldEndDifferenceK).toBeGreaterThan(0);
    expect(r.minimumApproach.temperatureDifferenceK).toBeLessThan(0);
    expect(r.minimumApproach.location).toBe("inside");
    expect(r.warnings.map((w) => (w as { condition?: string }).condition)).toContain(
      "temperature-cross",
    );
  });

  it("charts both curves with the dew point and the pinch (a valid Vega-Lite spec)", () => {
    const r = exchanger(steam(), bfw(6), { dutyW: 30e3 });
    const spec = stepHeatCurveChart(r, { units: { system: "SI", temperature: "degC" } });
    expect(schemaErrors(spec)).toEqual([]);
    const layers = allLayers(spec as Record<string, unknown>);
    expect(layers.some((l) => (l.mark as { type: string }).type === "rule")).toBe(true);
    const texts = JSON.stringify(layers);
    expect(texts).toContain("dew point");
    expect(texts).toContain("hot: steam");
    expect(texts).toContain("cold: bfw");
    // the cooler's curve runs from the cold end (its outlet, heat 0) to its inlet (|Q|)
    const c = cooler(steam(), { outletTemperatureK: 350 });
    const rows = (
      allLayers(stepHeatCurveChart(c) as Record<string, unknown>)[0].data as {
        values: { x: number; y: number }[];
      }
    ).values;
    expect(rows[0].y).toBeCloseTo(400, 9);
    expect(rows[0].x).toBeCloseTo(Math.abs(c.dutyW) / 1e3, 4);
    expect(rows[rows.length - 1].x).toBeCloseTo(0, 9);
  });

  it("the duty from a minimum approach meets that approach", () => {
    const r = exchanger(steam(), bfw(6), { minimumApproachK: 10 });
    expect(Math.abs(r.minimumApproach.temperatureDifferenceK - 10)).toBeLessThan(1e-5);
    expect(r.minimumApproach.location).toBe("inside");
    expect(r.check.energyBalanceRelativeError).toBeLessThan(1e-9);
  });

  it("refuses a cold stream hotter than the hot one and an impossible approach", () => {
    expect(() => exchanger(bfw(6), steam(), { dutyW: 1e3 })).toThrow(/hot/);
    expect(() => exchanger(steam(), bfw(6), { minimumApproachK: 150 })).toThrow(
      /spec\.minimumApproachK/,
    );
    expect(() => exchanger(steam(), bfw(6), { dutyW: -5 })).toThrow(/spec\.dutyW/);
  });
});
