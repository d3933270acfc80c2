// A reference equation takes the zero of h and s the caller asks for: before this, a "zero-at"
// or "formation" reference state given with a reference equation was dropped in favour of the
// publication's convention, so two fluids asked for the same zero disagreed by thousands of J/mol.
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";

const T0 = 298.15;
const P0 = 1e5;

describe("a reference equation on the zero the caller asked for", () => {
  it('"zero-at": the ideal part has h = s = 0 at (T0, P0), so h and s there are the residual parts', () => {
    const fluid = defineFluid({
      components: ["carbon-dioxide"],
      model: referenceFluid("carbon-dioxide"),
      referenceState: { kind: "zero-at", temperatureK: 300, pressurePa: 2e5 },
    });
    const st = fluid.state({ T: 300, P: 2e5 });
    expect(Math.abs(st.molar.h - st.residual!.h)).toBeLessThan(1e-9);
    expect(Math.abs(st.molar.s - st.residual!.s)).toBeLessThan(1e-12);
  });

  it('"formation": the same h and s at (298.15 K, 1 bar) as the cubic on that basis, up to residual parts', () => {
    // both ideal parts then carry the table's enthalpy of formation and third-law entropy at T0, P0
    const ref = defineFluid({
      components: ["carbon-dioxide"],
      model: referenceFluid("carbon-dioxide"),
      referenceState: { kind: "formation" },
    });
    const cubic = defineFluid({ components: ["carbon-dioxide"], model: "peng-robinson" });
    const a = ref.state({ T: T0, P: P0 });
    const b = cubic.state({ T: T0, P: P0 });
    const dh = a.molar.h - b.molar.h - (a.residual!.h - b.residual!.h);
    const ds = a.molar.s - b.molar.s - (a.residual!.s - b.residual!.s);
    expect(Math.abs(dh)).toBeLessThan(1e-6);
    expect(Math.abs(ds)).toBeLessThan(1e-9);
    // CO2's enthalpy of formation, -393.51 kJ/mol (from memory of the CODATA key values, 1989)
    expect(a.molar.h - a.residual!.h).toBeCloseTo(-393510, -2);
  });

  it("differences between states are the publication's, whatever the zero", () => {
    const own = defineFluid({ components: ["water"], model: referenceFluid("water") });
    const moved = defineFluid({
      components: ["water"],
      model: referenceFluid("water"),
      referenceState: { kind: "zero-at", temperatureK: T0, pressurePa: P0 },
    });
    const d = (f: typeof own) =>
      f.state({ T: 500, P: 10e5 }).molar.h - f.state({ T: 350, P: 1e5 }).molar.h;
    expect(Math.abs(d(moved) - d(own))).toBeLessThan(1e-9 * Math.abs(d(own)));
    const e = (f: typeof own) =>
      f.state({ T: 500, P: 10e5 }).molar.s - f.state({ T: 350, P: 1e5 }).molar.s;
    expect(Math.abs(e(moved) - e(own))).toBeLessThan(1e-9 * Math.abs(e(own)) + 1e-12);
  });

  it("no request keeps the publication's convention (IAPWS-95: u = s = 0 for the liquid at the triple point)", () => {
    // from memory of IAPWS-95 (Wagner and Pruss 2002): u and s of the saturated liquid at the
    // triple point (273.16 K, 611.655 Pa) are zero; the liquid there is about 999.79 kg/m3
    const water = defineFluid({ components: ["water"], model: referenceFluid("water") });
    const liquid = water.state({ T: 273.16, vaporFraction: 0 });
    expect(Math.abs(liquid.molar.u)).toBeLessThan(1e-3);
    expect(Math.abs(liquid.molar.s)).toBeLessThan(1e-6);
  });
});
