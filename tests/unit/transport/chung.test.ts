// Chung, Ajlan, Lee and Starling (1988) against published values within the method's stated
// accuracy (the tolerance of each fixture value says why); the densities are the sources' own
// (or come from the project's reference equations), so the comparison is of the transport method
// alone.
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import {
  referenceFluidBinding,
  referenceStateTP,
} from "../../../kernel-lib/src/state/referenceStates.js";
import {
  transportAtTRho,
  transportOfState,
} from "../../../kernel-lib/src/transport/transportAt.js";
import {
  chungDiluteViscosity,
  chungParameters,
  chungThermalConductivity,
  chungViscosity,
  type ChungComponent,
} from "../../../kernel-lib/src/transport/chung.js";
import { POLARITY_IDS } from "../../../kernel-lib/src/transport/polarity.js";
import { tableComponents } from "../../../kernel-lib/src/components/table.js";
import {
  expectReference,
  referenceValue,
  referenceValues,
} from "../../fixtures/referenceValues.js";

describe("nitrogen: Lemmon and Jacobsen (2004) check values", () => {
  const n2 = defineFluid({ components: ["nitrogen"] });
  for (const ref of referenceValues("lemmon-jacobsen-2004-nitrogen.json").values()) {
    const m = /^T([\d.]+)-rho([\d.]+)\/(eta|lambda)$/.exec(ref.key)!;
    const T = Number(m[1]);
    const rho = Number(m[2]) * 1e3; // mol/dm3 -> mol/m3
    it(ref.key, () => {
      const r = transportAtTRho(n2, T, rho);
      if (ref.key === "T126.195-rho11.18/lambda") {
        // the critical enhancement Chung's method does not contain: far below the true value
        expect(r.thermalConductivityWPerMK * 1e3).toBeLessThan(0.1 * ref.value);
        expect(r.warnings.map((w) => w.code)).toContain("model-limitation");
        return;
      }
      expectReference(
        m[3] === "eta" ? r.viscosityPaS * 1e6 : r.thermalConductivityWPerMK * 1e3,
        ref,
      );
    });
  }
});

describe("gases at 300 K and 1 bar: CRC Handbook", () => {
  const crc = (key: string) => referenceValue("crc-handbook-transport.json", key);
  for (const id of ["nitrogen", "methane", "carbon-dioxide"]) {
    it(`${id}: states of the reference equation, components looked up by id`, () => {
      const fluid = referenceFluid(id);
      const state = referenceStateTP(fluid, 300, 1e5);
      const r = transportOfState(referenceFluidBinding(fluid), state);
      expect(r.method).toBe("chung-1988");
      expect(r.phase).toBe(state.phase);
      expect(r.pressurePa / 1e5).toBeCloseTo(1, 12);
      expectReference(r.viscosityPaS * 1e6, crc(`${id}/T300-P1bar/eta`));
      expectReference(r.thermalConductivityWPerMK * 1e3, crc(`${id}/T300-P1bar/lambda`));
      expect(r.warnings).toEqual([]);
    });
  }

  it("air as nitrogen, oxygen and argon (a mixture through Chung's mixing rules)", () => {
    // dry-air composition 0.7812, 0.2096, 0.0092: from memory of Lemmon, Jacobsen, Penoncello
    // and Friend (2000), J. Phys. Chem. Ref. Data 29, 331 (their air)
    const air = defineFluid({ components: ["nitrogen", "oxygen", "argon"] });
    const r = air.transportAtTP(300, 1e5, [0.7812, 0.2096, 0.0092]);
    expect(r.warnings).toEqual([]);
    expectReference(r.viscosityPaS * 1e6, crc("air/T300-P1bar/eta"));
    expectReference(r.thermalConductivityWPerMK * 1e3, crc("air/T300-P1bar/lambda"));
  });
});

describe("a polar gas: the dipole moment in Fc", () => {
  it("sulfur dioxide at 40 degC and 1 bar (Poling et al. 2001, section 9-4 example)", () => {
    const so2 = defineFluid({ components: ["sulfur-dioxide"] });
    const r = so2.transportAtTP(313.15, 1e5);
    const ref = referenceValue("poling-2001-transport.json", "sulfur-dioxide/T313.15-P1bar/eta");
    expectReference(r.viscosityPaS * 1e7, ref); // Pa s -> micropoise
    // the dipole moment matters here: without it the value is about 4 % lower (mu_r^4 term of Fc)
    const nonpolar = defineFluid({
      components: [{ ...so2.components[0], id: "so2-without-dipole" }],
    }).transportAtTP(313.15, 1e5);
    expect(nonpolar.viscosityPaS).toBeLessThan(0.97 * r.viscosityPaS);
  });
});

describe("liquids", () => {
  it("n-hexane at 25 degC (CRC Handbook), with the cold-liquid warning", () => {
    const crc = (key: string) => referenceValue("crc-handbook-transport.json", key);
    const hexane = defineFluid({ components: ["n-hexane"] });
    const rho = (crc("n-hexane/T298.15/rho").value * 1e3) / hexane.molarMassesKgPerMol[0];
    const r = transportAtTRho(hexane, 298.15, rho);
    expectReference(r.viscosityPaS * 1e3, crc("n-hexane/T298.15/eta"));
    expectReference(r.thermalConductivityWPerMK, crc("n-hexane/T298.15/lambda"));
    // the liquid-density and cold-liquid warnings
    expect(r.warnings.map((w) => w.code)).toEqual(["accuracy", "accuracy"]);
    expect(r.warnings[0].message).toContain("liquid-like density");
    expect(r.warnings[1].message).toContain("Tr = 0.587");
  });

  it("methane at its normal boiling point (Younglove and Ely 1987)", () => {
    const ye = (key: string) => referenceValue("younglove-ely-1987-methane.json", key);
    const methane = defineFluid({ components: ["methane"] });
    const rho = ye("methane/nbp/rho").value / methane.molarMassesKgPerMol[0];
    const r = transportAtTRho(methane, ye("methane/nbp/T").value, rho);
    expectReference(r.viscosityPaS * 1e6, ye("methane/nbp/eta"));
    expectReference(r.thermalConductivityWPerMK * 1e3, ye("methane/nbp/lambda"));
  });

  it("carbon dioxide, saturated liquid at 0 degC (Vesovic et al. 1990): viscosity", () => {
    const v = (key: string) => referenceValue("vesovic-1990-co2.json", key);
    const co2 = defineFluid({ components: ["carbon-dioxide"] });
    const r = transportAtTRho(co2, 273.15, v("co2/T273.15-satliquid/rho").value / 0.0440095);
    expectReference(r.viscosityPaS * 1e6, v("co2/T273.15-satliquid/eta"));
    // the conductivity value is marked disputed in the fixture (the recollection is not reliable
    // enough); it is not asserted
    expect(v("co2/T273.15-satliquid/lambda").disputed).toBe(true);
  });
});

const methaneC: ChungComponent = {
  criticalTemperatureK: 190.564,
  criticalVolumeM3PerMol: 98.6e-6,
  molarMassKgPerMol: 0.016043,
  acentricFactor: 0.011,
  dipoleDebye: 0,
  association: 0,
};
const butaneC: ChungComponent = {
  criticalTemperatureK: 425.12,
  criticalVolumeM3PerMol: 255e-6,
  molarMassKgPerMol: 0.058123,
  acentricFactor: 0.2,
  dipoleDebye: 0,
  association: 0,
};

describe("limits and identities of the equations", () => {
  it("the dense-fluid equations reduce to the dilute gas as rho -> 0", () => {
    const p = chungParameters([methaneC], [1]);
    const dilute = chungDiluteViscosity(p, 300);
    // the printed constants agree to 7e-6: 36.344 sqrt(1.2593) = 40.7847 against 40.785
    const limit = chungViscosity(p, 300, 0);
    expect(Math.abs(limit / dilute - 1)).toBeLessThan(1e-5);
    // and continuously: at 1e-3 mol/m3 within 1e-6 of the limit
    expect(Math.abs(chungViscosity(p, 300, 1e-3) / limit - 1)).toBeLessThan(1e-6);
    const l0 = chungThermalConductivity(p, 300, 0, 27.0);
    expect(Math.abs(chungThermalConductivity(p, 300, 1e-3, 27.0) / l0 - 1)).toBeLessThan(1e-6);
  });

  it("the dilute limit through the public entry: rho = 0 equals a vanishing density", () => {
    const n2 = defineFluid({ components: ["nitrogen"] });
    const a = transportAtTRho(n2, 300, 0);
    const b = transportAtTRho(n2, 300, 1e-6);
    expect(Math.abs(b.viscosityPaS / a.viscosityPaS - 1)).toBeLessThan(1e-8);
    expect(Math.abs(b.thermalConductivityWPerMK / a.thermalConductivityWPerMK - 1)).toBeLessThan(
      1e-8,
    );
  });

  it("viscosity and conductivity rise with density along a supercritical isotherm", () => {
    const p = chungParameters([methaneC], [1]);
    let lastEta = 0;
    let lastLambda = 0;
    for (const rho of [0, 1000, 3000, 6000, 10000, 15000, 20000]) {
      const eta = chungViscosity(p, 300, rho);
      const lambda = chungThermalConductivity(p, 300, rho, 27.0);
      expect(eta).toBeGreaterThan(lastEta);
      expect(lambda).toBeGreaterThan(lastLambda);
      lastEta = eta;
      lastLambda = lambda;
    }
  });
});

describe("mixing rules (Chung et al. 1988)", () => {
  it("a mixture of one component with itself is the pure component", () => {
    const pure = chungParameters([methaneC], [1]);
    const split = chungParameters([methaneC, methaneC], [0.3, 0.7]);
    for (const key of Object.keys(pure) as (keyof typeof pure)[]) {
      expect(Math.abs(split[key] - pure[key])).toBeLessThanOrEqual(1e-12 * Math.abs(pure[key]));
    }
  });

  it("x = (1, 0) is the first component; the order of components does not matter", () => {
    const pure = chungParameters([butaneC], [1]);
    const edge = chungParameters([butaneC, methaneC], [1, 0]);
    expect(edge.criticalTemperatureK).toBeCloseTo(pure.criticalTemperatureK, 10);
    expect(edge.molarMassGPerMol).toBeCloseTo(pure.molarMassGPerMol, 10);
    const ab = chungParameters([methaneC, butaneC], [0.8, 0.2]);
    const ba = chungParameters([butaneC, methaneC], [0.2, 0.8]);
    expect(chungViscosity(ab, 350, 5000)).toBeCloseTo(chungViscosity(ba, 350, 5000), 15);
  });

  it("a mixture's values lie between those of its components at the same reduced state", () => {
    const gas = defineFluid({ components: ["methane", "n-butane"] });
    const mix = transportAtTRho(gas, 400, 40, [0.5, 0.5]).viscosityPaS;
    const a = transportAtTRho(gas, 400, 40, [1, 0]).viscosityPaS;
    const b = transportAtTRho(gas, 400, 40, [0, 1]).viscosityPaS;
    expect(mix).toBeGreaterThan(Math.min(a, b));
    expect(mix).toBeLessThan(Math.max(a, b));
  });

  it("an equilibrium phase of a flash: transportOfState of each phase", () => {
    const fluid = defineFluid({ components: ["methane", "n-butane"] });
    const eq = fluid.flashTP(300, 50e5, [0.5, 0.5]);
    expect(eq.phases.length).toBe(2);
    const [vapour, liquid] = [...eq.phases].sort(
      (p, q) => p.state.densityMolPerM3 - q.state.densityMolPerM3,
    );
    const tv = fluid.transportOfState(vapour.state);
    const tl = fluid.transportOfState(liquid.state);
    expect(tl.viscosityPaS).toBeGreaterThan(5 * tv.viscosityPaS);
    expect(tl.x).toEqual(liquid.state.x);
  });
});

describe("component data", () => {
  it("every table component has its dipole moment and association factor listed", () => {
    const ids = tableComponents().map((c) => c.id);
    expect(ids.filter((id) => !POLARITY_IDS.includes(id))).toEqual([]);
  });

  it("a user component not in the polarity table gets zero, with a warning", () => {
    const fluid = defineFluid({
      components: [{ ...tableComponents().find((c) => c.id === "n-octane")!, id: "my-cut" }],
    });
    const r = fluid.transportAtTP(300, 1e5);
    expect(r.warnings.some((w) => w.message.includes("my-cut"))).toBe(true);
  });
});

describe("a component without a critical volume", () => {
  it("gets Pitzer's Zc = 0.291 - 0.080 omega, with a warning, and a value near the table's", () => {
    const octane = tableComponents().find((c) => c.id === "n-octane")!;
    const cut = { ...octane, id: "cut-without-vc", criticalVolumeM3PerMol: Number.NaN };
    const withVc = defineFluid({ components: [octane] }).transportAtTP(450, 1e5);
    const estimated = defineFluid({ components: [cut] }).transportAtTP(450, 1e5);
    expect(estimated.warnings.some((w) => w.message.includes("no critical volume"))).toBe(true);
    // n-octane: Zc = Pc Vc / (R Tc) = 0.2591 from the table's constants and Pitzer's estimate
    // 0.291 - 0.080 * 0.399 = 0.2591 agree within 0.1 %, so the viscosities agree within 0.5 %
    expect(Math.abs(estimated.viscosityPaS / withVc.viscosityPaS - 1)).toBeLessThan(0.005);
  });
});

describe("range warnings", () => {
  it("T* above 100 (the collision integral's range, Neufeld et al. 1972) is warned", () => {
    const helium = defineFluid({ components: ["helium"] });
    // Tc = 5.2 K: T* = 1.2593 T / Tc is about 240 at 1000 K
    const r = transportAtTRho(helium, 1000, 0);
    expect(r.warnings.some((w) => w.code === "outside-validity" && w.message.includes("T*"))).toBe(
      true,
    );
    expect(transportAtTRho(helium, 300, 0).warnings).toEqual([]);
  });

  it("a polar mixture: x = (1, 0) with water first is pure water by Chung", () => {
    const wet = defineFluid({ components: ["water", "methane"] });
    const pure = defineFluid({ components: ["water"] });
    const a = transportAtTRho(wet, 600, 100, [1, 0]);
    const b = transportAtTRho(pure, 600, 100);
    expect(a.viscosityPaS / b.viscosityPaS).toBeCloseTo(1, 12);
    expect(a.thermalConductivityWPerMK / b.thermalConductivityWPerMK).toBeCloseTo(1, 12);
  });
});
