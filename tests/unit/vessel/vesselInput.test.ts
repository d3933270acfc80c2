/**
 * Bad input refused with typed errors, the geometry against solid-geometry closed forms, and
 * the natural-convection correlations against their published forms.
 */
import { describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import { simulateVessel } from "../../../kernel-lib/src/process/vessel/simulateVessel.js";
import type { VesselSpec } from "../../../kernel-lib/src/process/vessel/types.js";
import { vesselGeometry } from "../../../kernel-lib/src/process/vessel/geometry.js";
import {
  airAt,
  naturalConvectionNusselt,
} from "../../../kernel-lib/src/process/vessel/heatTransfer.js";

const methane = defineFluid({ components: ["methane"], model: "peng-robinson" });
const good: VesselSpec = {
  fluid: methane,
  shape: { kind: "vertical-cylinder", diameterM: 1, lengthM: 3 },
  initial: { temperatureK: 298.15, pressurePa: 50e5 },
  outlets: [{ diameterM: 0.02, dischargeCoefficient: 0.8, backPressurePa: 1e5 }],
  until: { pressurePa: 40e5 },
};

function refused(spec: VesselSpec, input: RegExp): void {
  let error: unknown;
  try {
    simulateVessel(spec);
  } catch (e) {
    error = e;
  }
  expect(error).toBeInstanceOf(InputError);
  expect((error as InputError).input).toMatch(input);
}

describe("bad input is refused with typed errors naming the input", () => {
  it("zero, negative and NaN volume or dimensions", () => {
    refused({ ...good, shape: { kind: "volume", volumeM3: 0 } }, /volumeM3/);
    refused({ ...good, shape: { kind: "volume", volumeM3: -1 } }, /volumeM3/);
    refused({ ...good, shape: { kind: "sphere", diameterM: NaN } }, /diameterM/);
    refused(
      { ...good, shape: { kind: "horizontal-cylinder", diameterM: 1, lengthM: 0 } },
      /lengthM/,
    );
  });

  it("an orifice larger than the vessel", () => {
    refused(
      { ...good, outlets: [{ diameterM: 1.5, dischargeCoefficient: 0.8, backPressurePa: 1e5 }] },
      /outlets\[0\]\.diameterM/,
    );
    refused(
      { ...good, outlets: [{ diameterM: 0.02, dischargeCoefficient: 1.2, backPressurePa: 1e5 }] },
      /dischargeCoefficient/,
    );
  });

  it("a back pressure at or above the vessel pressure, and unreachable targets", () => {
    refused(
      { ...good, outlets: [{ diameterM: 0.02, dischargeCoefficient: 0.8, backPressurePa: 60e5 }] },
      /backPressurePa/,
    );
    refused({ ...good, until: { pressurePa: 0.5e5 } }, /until\.pressurePa/);
    refused({ ...good, until: {} }, /until/);
  });

  it("an initial state inside the two-phase region without a liquid level", () => {
    // methane + n-butane 50/50 at 300 K and 30 bar splits into gas and liquid (isothermal flash)
    const mix = defineFluid({ components: ["methane", "n-butane"], model: "peng-robinson" });
    expect(mix.flashTP(300, 30e5, [0.5, 0.5]).phases.length).toBe(2);
    refused(
      {
        ...good,
        fluid: mix,
        initial: { temperatureK: 300, pressurePa: 30e5, z: [0.5, 0.5] },
        until: { pressurePa: 20e5 },
      },
      /initial/,
    );
  });

  it("a wall heat exchange without the wall, a heat flux without its basis", () => {
    refused(
      {
        ...good,
        heat: { kind: "wall", inside: { coefficientWPerM2K: 100 }, outside: { kind: "insulated" } },
      },
      /wall/,
    );
    refused(
      {
        ...good,
        wall: { thicknessM: 0.02 },
        heat: {
          kind: "wall",
          inside: { coefficientWPerM2K: 100 },
          outside: { kind: "heat-flux", fluxWPerM2: 50e3, basis: "" },
        },
      },
      /basis/,
    );
    // a fluid object without a transport method, and no transport function given
    const noTransport = { ...methane, transportOfState: undefined } as unknown as typeof methane;
    refused(
      {
        ...good,
        fluid: noTransport,
        wall: { thicknessM: 0.02 },
        heat: { kind: "wall", outside: { kind: "insulated" } },
      },
      /transport/,
    );
  });
});

describe("vessel geometry (solid-geometry closed forms)", () => {
  it("a cylinder with hemispherical heads is a cylinder plus a sphere", () => {
    const g = vesselGeometry({
      kind: "vertical-cylinder",
      diameterM: 2,
      lengthM: 5,
      heads: "hemispherical",
    });
    expect(g.volumeM3).toBeCloseTo(Math.PI * 5 + (4 / 3) * Math.PI, 12);
    expect(g.innerAreaM2).toBeCloseTo(Math.PI * 2 * 5 + 4 * Math.PI, 12);
    expect(g.heightM).toBe(7);
    expect(g.liquidVolumeAt(g.heightM)).toBeCloseTo(g.volumeM3, 12);
    expect(g.liquidVolumeAt(1)).toBeCloseTo((2 / 3) * Math.PI, 12); // half sphere
    expect(g.levelOf(g.liquidVolumeAt(3.3))).toBeCloseTo(3.3, 9);
  });

  it("2:1 ellipsoidal heads hold pi D^3 / 24 each; a horizontal vessel half full holds half", () => {
    const D = 1.6;
    const L = 4;
    const g = vesselGeometry({ kind: "horizontal-cylinder", diameterM: D, lengthM: L });
    expect(g.volumeM3).toBeCloseTo((Math.PI * D * D * L) / 4 + (Math.PI * D ** 3) / 12, 12);
    expect(g.liquidVolumeAt(D / 2)).toBeCloseTo(g.volumeM3 / 2, 12);
    expect(g.wettedAreaAt(D / 2)).toBeCloseTo(g.innerAreaM2 / 2, 12);
    expect(g.levelOf(0.25 * g.volumeM3)).toBeLessThan(D / 2);
  });

  it("a sphere: volume pi D^3 / 6, area pi D^2, a cap's volume pi h^2 (3R - h) / 3", () => {
    const g = vesselGeometry({ kind: "sphere", diameterM: 3 });
    expect(g.volumeM3).toBeCloseTo(4.5 * Math.PI, 12);
    expect(g.innerAreaM2).toBeCloseTo(9 * Math.PI, 12);
    expect(g.liquidVolumeAt(0.5)).toBeCloseTo((Math.PI * 0.25 * (4.5 - 0.5)) / 3, 12);
    expect(() => g.liquidVolumeAt(4)).toThrow(InputError);
  });
});

describe("natural convection correlations", () => {
  it("Churchill and Chu (1975): the conduction limits and a hand-evaluated point", () => {
    // Ra -> 0: Nu -> 0.825^2 (vertical plate), 0.60^2 (horizontal cylinder), 2 (sphere)
    // (the constant terms of the published equations)
    expect(naturalConvectionNusselt("vertical", 0, 0.7)).toBeCloseTo(0.825 ** 2, 12);
    expect(naturalConvectionNusselt("horizontal-cylinder", 0, 0.7)).toBeCloseTo(0.36, 12);
    expect(naturalConvectionNusselt("sphere", 0, 0.7)).toBe(2);
    // Ra = 1e9, Pr = 0.71, vertical: {0.825 + 0.387 * 31.6228 / 1.19290}^2 = 122.8 (evaluated
    // by hand from eq. (4) of Churchill and Chu 1975)
    expect(naturalConvectionNusselt("vertical", 1e9, 0.71)).toBeCloseTo(122.8, 0);
    expect(() => naturalConvectionNusselt("vertical", -1, 0.7)).toThrow(InputError);
  });

  it("air at 300 K: viscosity 1.85e-5 Pa s, conductivity 0.0263 W/(m K), Pr 0.707", () => {
    // from memory of F. P. Incropera and D. P. DeWitt, Fundamentals of Heat and Mass Transfer,
    // Table A.4 (air at 300 K: mu = 184.6e-7 N s/m2, k = 26.3e-3 W/(m K), Pr = 0.707); Sutherland
    // fits within about 2 %
    const a = airAt(300);
    expect(Math.abs(a.viscosityPaS / 184.6e-7 - 1)).toBeLessThan(0.02);
    expect(Math.abs(a.thermalConductivityWPerMK / 26.3e-3 - 1)).toBeLessThan(0.02);
    expect(
      Math.abs((a.viscosityPaS * a.cpJPerKgK) / a.thermalConductivityWPerMK / 0.707 - 1),
    ).toBeLessThan(0.03);
  });
});
