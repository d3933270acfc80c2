// Internal-consistency and cross-checks of the component table (kernel-lib/src/components/data).
// The table was written from memory; these checks exist to catch typos and misremembered values.
import { describe, expect, it } from "vitest";
import { listComponents, getComponent } from "../../../kernel-lib/src/components/getComponent.js";
import { rawComponentTable } from "../../../kernel-lib/src/components/table.js";
import { parseFormula } from "../../../kernel-lib/src/components/formula.js";
import { correlationCp } from "../../../kernel-lib/src/idealgas/cpCorrelation.js";
import { leeKeslerAcentricFactor } from "../../../kernel-lib/src/petroleum/leeKeslerAcentric.js";
import { R } from "../../../kernel-lib/src/constants.js";
import { expectReference, referenceValues } from "../../fixtures/referenceValues.js";

const T0 = 298.15;
const elementS = rawComponentTable.elementEntropiesJPerMolK as Record<string, number>;
const raw = new Map(rawComponentTable.components.map((r) => [r.id, r]));

describe("component table", () => {
  it("has at least 60 components, each with every source group filled", () => {
    const all = listComponents();
    expect(all.length).toBeGreaterThanOrEqual(60);
    for (const c of all) {
      for (const text of Object.values(c.sources)) expect(text.length, c.id).toBeGreaterThan(10);
      expect(c.origin).toBe("table");
    }
  });

  it("contains the components the issue lists", () => {
    for (const name of [
      "H2",
      "N2",
      "O2",
      "Ar",
      "He",
      "CO",
      "CO2",
      "H2S",
      "SO2",
      "NH3",
      "H2O",
      "methanol",
      "ethanol",
      "methane",
      "ethane",
      "propane",
      "n-butane",
      "n-pentane",
      "n-hexane",
      "n-heptane",
      "n-octane",
      "n-nonane",
      "n-decane",
      "isobutane",
      "isopentane",
      "neopentane",
      "2-methylpentane",
      "3-methylpentane",
      "ethylene",
      "propylene",
      "1-butene",
      "isobutene",
      "1,3-butadiene",
      "cyclopentane",
      "cyclohexane",
      "methylcyclohexane",
      "benzene",
      "toluene",
      "ethylbenzene",
      "o-xylene",
      "m-xylene",
      "p-xylene",
      "n-dodecane",
      "n-hexadecane",
      "MEA",
    ]) {
      expect(() => getComponent(name), name).not.toThrow();
    }
  });

  it("molar masses agree with the formulas (IUPAC 2013 standard atomic weights, from memory) within 0.05 %", () => {
    // tests/fixtures/iupac-2013-atomic-weights.json; the 0.05 % and its reason are the fixture's
    const weights = referenceValues("iupac-2013-atomic-weights.json");
    const w: Record<string, number> = {};
    for (const [el, ref] of weights) w[el] = ref.value;
    const tolerance = weights.get("C")!.tolerance.relative!;
    for (const c of listComponents()) {
      const m = Object.entries(parseFormula(c.formula)).reduce(
        (sum, [el, n]) => sum + w[el] * n,
        0,
      );
      expect(m, `${c.id}: an element of ${c.formula} has no atomic weight`).toBeGreaterThan(0);
      expect(Math.abs(c.molarMassKgPerMol * 1000 - m) / m, c.id).toBeLessThan(tolerance);
    }
  });

  it("Gf = Hf - T (S - sum S_elements) within 0.6 kJ/mol where S is an independent value", () => {
    // Element entropies: CODATA key values (Cox, Wagman & Medvedev 1989), from memory.
    let checked = 0;
    for (const c of listComponents()) {
      const r = raw.get(c.id)!;
      if (r.sources.entropy === "derived-entropy" || !Number.isFinite(c.enthalpyOfFormationJPerMol))
        continue;
      const sElements = Object.entries(parseFormula(c.formula)).reduce(
        (s, [el, n]) => s + elementS[el] * n,
        0,
      );
      const gf = c.enthalpyOfFormationJPerMol - T0 * (c.absoluteEntropyJPerMolK - sElements);
      expect(Math.abs(gf - c.gibbsEnergyOfFormationJPerMol), c.id).toBeLessThan(600);
      checked++;
    }
    expect(checked).toBeGreaterThan(45);
  });

  it("Zc listed by the source agrees with Pc Vc / (R Tc) within 2 % (catches typos in Vc, Pc, Tc)", () => {
    for (const c of listComponents()) {
      const listed = raw.get(c.id)!.criticalCompressibility;
      expect(Math.abs(c.criticalCompressibility / listed - 1), c.id).toBeLessThan(0.02);
      expect(c.criticalCompressibility).toBeCloseTo(
        (c.criticalPressurePa * c.criticalVolumeM3PerMol) / (R * c.criticalTemperatureK),
        12,
      );
    }
  });

  it("acentric factors agree with the Lee-Kesler estimate from Tb, Tc, Pc within 0.03 (hydrocarbons)", () => {
    // Lee-Kesler (1975) vapour-pressure equation at Tb; a consistency check, not a reference value.
    for (const c of listComponents()) {
      const el = Object.keys(parseFormula(c.formula));
      if (!el.every((e) => e === "C" || e === "H") || c.criticalTemperatureK < 250) continue;
      const w = leeKeslerAcentricFactor(
        c.normalBoilingPointK,
        c.criticalTemperatureK,
        c.criticalPressurePa,
        0.7,
      );
      expect(Math.abs(w - c.acentricFactor), c.id).toBeLessThan(0.03);
    }
  });

  it("normal boiling points lie below Tc and cp correlations are positive across their ranges", () => {
    for (const c of listComponents()) {
      expect(c.normalBoilingPointK).toBeLessThan(c.criticalTemperatureK);
      const cp = c.idealGasCp;
      for (let i = 0; i <= 50; i++) {
        const t = cp.minTemperatureK + ((cp.maxTemperatureK - cp.minTemperatureK) * i) / 50;
        expect(correlationCp(cp, t)).toBeGreaterThan(2.4 * R);
      }
    }
  });

  it("polynomial segments join continuously (cp jumps below 0.2 % at joints)", () => {
    for (const c of listComponents()) {
      const cp = c.idealGasCp;
      if (cp.form !== "polynomial" || cp.segments.length < 2) continue;
      for (let i = 0; i < cp.segments.length - 1; i++) {
        const t = cp.segments[i].maxTemperatureK;
        const poly = (a: readonly number[]) => a.reduce((s, ak, k) => s + ak * t ** k, 0);
        const left = poly(cp.segments[i].coefficients);
        const right = poly(cp.segments[i + 1].coefficients);
        expect(Math.abs(left / right - 1), c.id).toBeLessThan(0.002);
      }
    }
  });
});

// cp at 298.15 K, J/(mol K), from memory of the NIST Chemistry WebBook (gas-phase data, mostly TRC /
// Chao et al. / Scott 1974 evaluations): tests/fixtures/nist-webbook-gas.json. Tolerance 1.5 % for
// the Aly-Lee and Poling polynomials recalled from memory, 4.5 % for group-contribution fits (the
// fixture's "group-contribution" use); the reasons are in the fixture.
const WEBBOOK = referenceValues("nist-webbook-gas.json");
const WEBBOOK_CP298 = [...WEBBOOK.values()].filter((r) => r.key.endsWith("/298.15/Cp"));
describe("cp at 298.15 K against the NIST Chemistry WebBook (from memory)", () => {
  it("covers the 31 components of the fixture", () => {
    expect(WEBBOOK_CP298).toHaveLength(31);
  });
  for (const ref of WEBBOOK_CP298) {
    const id = ref.key.slice(0, ref.key.indexOf("/"));
    it(id, () => {
      const c = getComponent(id);
      const group = /Benson|Joback/.test(c.sources.heatCapacity);
      expectReference(
        correlationCp(c.idealGasCp, 298.15),
        ref,
        group ? "group-contribution" : undefined,
      );
    });
  }
});
