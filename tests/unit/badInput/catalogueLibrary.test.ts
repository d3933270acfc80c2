/**
 * Bad-input catalogue, part 3: the library API a notebook calls (core.ts). Every case asserts the
 * typed error class and code and that the message names the offending input.
 */
import { describe, expect, it } from "vitest";
import {
  AmbiguousUnitError,
  InputError,
  IsochorError,
  OutOfRangeError,
  PhaseUnavailableError,
  SolverError,
  UnknownNameError,
  defineFluid,
  getComponent,
  parseQuantity,
  toSI,
  referenceFluid,
  referenceFluidBinding,
  referenceStateTP,
  saturationAtPressure,
  saturationAtTemperature,
  stateAtPressureEnthalpy,
  stateAtPressureEntropy,
  stateAtPressureQuality,
  stateAtTemperatureQuality,
  stateAtTemperatureDensity,
  pureFluidPhaseAt,
  simulateVessel,
  type FluidSpec,
  type VesselSpec,
} from "../../../kernel-lib/src/core.js";

type ErrorClass = new (...args: never[]) => IsochorError;

interface Case {
  name: string;
  run: () => unknown;
  cls: ErrorClass;
  code: string;
  names: RegExp;
}

const pr = defineFluid({ components: ["methane"] });
const mix = defineFluid({ components: ["methane", "ethane"] });
const water = referenceFluid("water");
const waterB = referenceFluidBinding(water);
const garbage = (v: unknown) => v as never;
// a vessel blowdown that is accepted as it stands (each case below spoils one field)
const vessel: VesselSpec = {
  fluid: pr,
  shape: { kind: "vertical-cylinder", diameterM: 1, lengthM: 3 },
  initial: { temperatureK: 298.15, pressurePa: 50e5 },
  outlets: [{ diameterM: 0.02, dischargeCoefficient: 0.8, backPressurePa: 1e5 }],
  until: { pressurePa: 40e5 },
};
const outlet = vessel.outlets![0];
// methane + n-butane 50/50 at 300 K and 30 bar splits into gas and liquid (isothermal flash)
const methaneButane = defineFluid({ components: ["methane", "n-butane"] });

const cases: Case[] = [
  // defineFluid: the spec
  {
    name: "defineFluid(null)",
    run: () => defineFluid(garbage(null)),
    cls: InputError,
    code: "bad-input",
    names: /^spec must be an object.*received null/,
  },
  {
    name: "defineFluid(42)",
    run: () => defineFluid(garbage(42)),
    cls: InputError,
    code: "bad-input",
    names: /^spec.*received 42/,
  },
  {
    name: "defineFluid('methane')",
    run: () => defineFluid(garbage("methane")),
    cls: InputError,
    code: "bad-input",
    names: /^spec.*"methane"/,
  },
  {
    name: "components missing",
    run: () => defineFluid(garbage({})),
    cls: InputError,
    code: "bad-input",
    names: /^components/,
  },
  {
    name: "components empty",
    run: () => defineFluid({ components: [] }),
    cls: InputError,
    code: "bad-input",
    names: /^components.*\[\]/,
  },
  {
    name: "components a string",
    run: () => defineFluid(garbage({ components: "methane" })),
    cls: InputError,
    code: "bad-input",
    names: /^components.*"methane"/,
  },
  {
    name: "component entry null",
    run: () => defineFluid(garbage({ components: [null] })),
    cls: InputError,
    code: "bad-input",
    names: /^components\[0\]/,
  },
  {
    name: "component entry a number",
    run: () => defineFluid(garbage({ components: [74828] })),
    cls: InputError,
    code: "bad-input",
    names: /^components\[0\].*74828/,
  },
  {
    name: "unknown component",
    run: () => defineFluid({ components: ["methan3"] }),
    cls: UnknownNameError,
    code: "unknown-name",
    names: /"methan3".*closest: methane/,
  },
  {
    name: "ambiguous formula",
    run: () => defineFluid({ components: ["C4H10"] }),
    cls: UnknownNameError,
    code: "unknown-name",
    names: /"C4H10".*n-butane/,
  },
  {
    name: "duplicate by id",
    run: () => defineFluid({ components: ["methane", "methane"] }),
    cls: InputError,
    code: "bad-input",
    names: /components\[0\] "methane" and components\[1\] "methane"/,
  },
  {
    name: "duplicate by CAS",
    run: () => defineFluid({ components: ["ethane", "74-84-0"] }),
    cls: InputError,
    code: "bad-input",
    names: /"ethane".*"74-84-0"/,
  },
  {
    name: "unknown model",
    run: () => defineFluid({ components: ["methane"], model: garbage("pr") }),
    cls: UnknownNameError,
    code: "unknown-name",
    names: /"pr"/,
  },
  {
    name: "kij wrong size",
    run: () => defineFluid({ components: ["methane", "ethane"], kij: [[0]] }),
    cls: InputError,
    code: "bad-input",
    names: /kij/,
  },
  {
    name: "kij NaN",
    run: () =>
      defineFluid({
        components: ["methane", "ethane"],
        kij: [
          [0, NaN],
          [NaN, 0],
        ],
      }),
    cls: InputError,
    code: "bad-input",
    names: /kij.*NaN/,
  },
  {
    name: "constant Tc negative",
    run: () =>
      defineFluid({ components: ["methane"], constants: [{ criticalTemperatureK: -5 }] }).stateAtTP(
        300,
        1e5,
      ),
    cls: InputError,
    code: "bad-input",
    names: /criticalTemperatureK|Tc/,
  },
  ...(
    [
      ["model 42", { model: 42 }, /^model.*42/],
      ["model {}", { model: {} }, /^model.*\{\}/],
      ["idealGas unknown", { idealGas: "nasa" }, /^idealGas.*"nasa"/],
      ["departure unknown", { departure: "exact" }, /^departure.*"exact"/],
      ["constants a string", { constants: "none" }, /^constants.*"none"/],
      ["constants entry a number", { constants: [5] }, /^constants\[0\].*5/],
      [
        "referenceState unknown kind",
        { referenceState: { kind: "ashrae" } },
        /^referenceState.*ashrae/,
      ],
    ] as const
  ).map(([name, extra, names]): Case => ({
    name: `defineFluid with ${name}`,
    run: () => defineFluid({ components: ["methane"], ...(extra as object) } as FluidSpec),
    cls: InputError,
    code: "bad-input",
    names,
  })),
  // states at (T, P) and (T, rho)
  {
    name: "T NaN",
    run: () => pr.stateAtTP(NaN, 1e5),
    cls: InputError,
    code: "bad-input",
    names: /^temperatureK.*NaN/,
  },
  {
    name: "T Infinity",
    run: () => pr.stateAtTP(Infinity, 1e5),
    cls: InputError,
    code: "bad-input",
    names: /^temperatureK.*Infinity/,
  },
  {
    name: "T a string",
    run: () => pr.stateAtTP(garbage("300"), 1e5),
    cls: InputError,
    code: "bad-input",
    names: /^temperatureK.*"300"/,
  },
  {
    name: "T -Infinity",
    run: () => pr.stateAtTP(-Infinity, 1e5),
    cls: InputError,
    code: "bad-input",
    names: /^temperatureK/,
  },
  {
    name: "T 1e308",
    run: () => pr.stateAtTP(1e308, 1e5),
    cls: OutOfRangeError,
    code: "out-of-range",
    names: /^temperatureK.*1e\+308/,
  },
  {
    name: "T 5e-324",
    run: () => pr.stateAtTP(5e-324, 1e5),
    cls: OutOfRangeError,
    code: "out-of-range",
    names: /^temperatureK.*5e-324/,
  },
  {
    name: "P null",
    run: () => pr.stateAtTP(300, garbage(null)),
    cls: InputError,
    code: "bad-input",
    names: /^pressurePa.*null/,
  },
  {
    name: "P 0",
    run: () => pr.stateAtTP(300, 0),
    cls: InputError,
    code: "bad-input",
    names: /^pressurePa.*received 0/,
  },
  {
    name: "P 1e15",
    run: () => pr.stateAtTP(300, 1e15),
    cls: OutOfRangeError,
    code: "out-of-range",
    names: /^pressurePa.*1000000000000000/,
  },
  {
    name: "mixture without x",
    run: () => mix.stateAtTP(300, 1e5),
    cls: InputError,
    code: "bad-input",
    names: /^x/,
  },
  {
    name: "x wrong length",
    run: () => mix.stateAtTP(300, 1e5, [1]),
    cls: InputError,
    code: "bad-input",
    names: /^x/,
  },
  {
    name: "x not summing to 1",
    run: () => mix.stateAtTP(300, 1e5, [0.5, 0.6]),
    cls: InputError,
    code: "bad-input",
    names: /\bx\b/,
  },
  {
    name: "x with NaN",
    run: () => mix.stateAtTP(300, 1e5, [NaN, 1]),
    cls: InputError,
    code: "bad-input",
    names: /^x/,
  },
  {
    name: "x negative",
    run: () => mix.stateAtTP(300, 1e5, [-0.5, 1.5]),
    cls: InputError,
    code: "bad-input",
    names: /^x/,
  },
  {
    name: "phase option unknown",
    run: () => pr.stateAtTP(300, 1e5, undefined, { phase: garbage("solid") }),
    cls: InputError,
    code: "bad-input",
    names: /^options\.phase.*"solid"/,
  },
  {
    name: "liquid where none exists",
    run: () => pr.stateAtTP(400, 1e5, undefined, { phase: "liquid" }),
    cls: PhaseUnavailableError,
    code: "phase-unavailable",
    names: /liquid/,
  },
  {
    name: "rho negative",
    run: () => pr.stateAtTRho(300, -1),
    cls: InputError,
    code: "bad-input",
    names: /^densityMolPerM3.*-1/,
  },
  {
    name: "rho above 1/b",
    run: () => pr.stateAtTRho(300, 1e6),
    cls: OutOfRangeError,
    code: "out-of-range",
    names: /^densityMolPerM3.*maximum density/,
  },
  // inversions
  {
    name: "(P, h) with h NaN",
    run: () => pr.temperatureAtPH(1e5, NaN),
    cls: InputError,
    code: "bad-input",
    names: /^enthalpyJPerMol.*NaN/,
  },
  {
    name: "(P, s) with P negative",
    run: () => pr.temperatureAtPS(-1, 100),
    cls: InputError,
    code: "bad-input",
    names: /^pressurePa/,
  },
  {
    name: "(P, h) min above max",
    run: () =>
      pr.temperatureAtPH(1e5, 0, undefined, { minTemperatureK: 500, maxTemperatureK: 400 }),
    cls: InputError,
    code: "bad-input",
    names: /minTemperatureK/,
  },
  {
    name: "(P, h) target beyond the cp range",
    run: () => pr.temperatureAtPH(1e5, 1e9),
    cls: SolverError,
    code: "solver-failed",
    names: /enthalpyJPerMol|h = 1000000000.*above/,
  },
  {
    name: "dome (P, h) with h Infinity",
    run: () => stateAtPressureEnthalpy(pr, 1e6, Infinity),
    cls: InputError,
    code: "bad-input",
    names: /^enthalpyJPerMol/,
  },
  {
    name: "dome (P, s) with P NaN",
    run: () => stateAtPressureEntropy(pr, NaN, 100),
    cls: InputError,
    code: "bad-input",
    names: /^pressurePa.*NaN/,
  },
  {
    name: "dome (P, h) on a mixture",
    run: () => stateAtPressureEnthalpy(mix, 1e6, 0),
    cls: InputError,
    code: "bad-input",
    names: /^model.*single-component/,
  },
  // saturation and quality
  {
    name: "saturation T NaN",
    run: () => saturationAtTemperature(pr.model, NaN),
    cls: InputError,
    code: "bad-input",
    names: /^temperatureK.*NaN/,
  },
  {
    name: "saturation above Tc",
    run: () => saturationAtTemperature(pr.model, 250),
    cls: PhaseUnavailableError,
    code: "phase-unavailable",
    names: /T = 250 K.*critical temperature/,
  },
  {
    name: "saturation P above Pc",
    run: () => saturationAtPressure(pr.model, 1e8),
    cls: PhaseUnavailableError,
    code: "phase-unavailable",
    names: /P = 100000000 Pa.*critical pressure/,
  },
  {
    name: "saturation P below reach of a cubic",
    run: () => saturationAtPressure(pr.model, 1e-20),
    cls: PhaseUnavailableError,
    code: "phase-unavailable",
    names: /P = 1e-20 Pa.*0\.3 Tc/,
  },
  {
    name: "saturation P below the triple point",
    run: () => saturationAtPressure(water, 1e-6),
    cls: PhaseUnavailableError,
    code: "phase-unavailable",
    names: /P = 0\.000001 Pa.*triple point/,
  },
  {
    name: "saturation of a mixture",
    run: () => saturationAtTemperature(mix.model, 200),
    cls: InputError,
    code: "bad-input",
    names: /^model/,
  },
  {
    name: "saturation tolerance 2",
    run: () => saturationAtTemperature(pr.model, 150, { tolerance: 2 }),
    cls: InputError,
    code: "bad-input",
    names: /^options\.tolerance/,
  },
  {
    name: "saturation maxIterations 0",
    run: () => saturationAtTemperature(pr.model, 150, { maxIterations: 0 }),
    cls: InputError,
    code: "bad-input",
    names: /^options\.maxIterations/,
  },
  {
    name: "quality NaN",
    run: () => stateAtPressureQuality(pr, 1e6, NaN),
    cls: InputError,
    code: "bad-input",
    names: /^quality.*NaN/,
  },
  {
    name: "quality 2",
    run: () => stateAtTemperatureQuality(pr, 150, 2),
    cls: InputError,
    code: "bad-input",
    names: /^quality.*2/,
  },
  {
    name: "(T, rho) dome state with rho 0",
    run: () => stateAtTemperatureDensity(pr, 150, 0),
    cls: InputError,
    code: "bad-input",
    names: /^densityMolPerM3/,
  },
  {
    name: "phase on the saturation line",
    run: () => pureFluidPhaseAt(water, 373.124, saturationAtTemperature(water, 373.124).pressurePa),
    cls: PhaseUnavailableError,
    code: "phase-unavailable",
    names: /saturation line/,
  },
  {
    name: "reference water at 200 K, 1 bar",
    run: () => referenceStateTP(water, 200, 1e5),
    cls: PhaseUnavailableError,
    code: "phase-unavailable",
    names: /T = 200 K.*triple point.*solid region/,
  },
  {
    name: "reference water at 6000 K",
    run: () => referenceStateTP(water, 6000, 1e5),
    cls: OutOfRangeError,
    code: "out-of-range",
    names: /temperatureK|6000/,
  },
  {
    name: "reference binding (P, h) with h NaN",
    run: () => stateAtPressureEnthalpy(waterB, 1e5, NaN),
    cls: InputError,
    code: "bad-input",
    names: /^enthalpyJPerMol/,
  },
  // components and units
  {
    name: "getComponent('')",
    run: () => getComponent(""),
    cls: UnknownNameError,
    code: "unknown-name",
    names: /unknown component ""/,
  },
  {
    name: "getComponent(42)",
    run: () => getComponent(garbage(42)),
    cls: UnknownNameError,
    code: "unknown-name",
    names: /"42"/,
  },
  {
    name: "getComponent(1 MB)",
    run: () => getComponent("y".repeat(1 << 20)),
    cls: UnknownNameError,
    code: "unknown-name",
    names: /1048576 characters/,
  },
  {
    name: "toSI with an unknown unit",
    run: () => toSI(1, "furlong"),
    cls: UnknownNameError,
    code: "unknown-name",
    names: /"furlong"/,
  },
  {
    name: "toSI with a bare psi",
    run: () => toSI(1, "psi"),
    cls: AmbiguousUnitError,
    code: "ambiguous-unit",
    names: /"psi"/,
  },
  {
    name: "parseQuantity of a word",
    run: () => parseQuantity("hot"),
    cls: IsochorError,
    code: "bad-input",
    names: /"hot"/,
  },
  // the state API, fluid.state({ ... })
  {
    name: "fluid.state with one specification",
    run: () => pr.state({ T: 300 }),
    cls: InputError,
    code: "bad-input",
    names: /^state specification must be exactly one of the pairs \(T, P\).*given: \(T\)/,
  },
  {
    name: "fluid.state with three specifications",
    run: () => pr.state({ T: 300, P: 1e5, h: 0 }),
    cls: InputError,
    code: "bad-input",
    names: /given: \(T, P, h\)/,
  },
  {
    name: "fluid.state with a misspelt field",
    run: () => pr.state(garbage({ T: 300, pressure: 1e5 })),
    cls: InputError,
    code: "bad-input",
    names: /^state request field pressure must be one of T, P, rho/,
  },
  {
    name: "fluid.state of a mixture without x",
    run: () => mix.state({ T: 300, P: 1e5 }),
    cls: InputError,
    code: "bad-input",
    names: /^x must be 2 mole fractions/,
  },
  {
    name: "fluid.state with a vapour fraction above 1",
    run: () => pr.state({ T: 150, vaporFraction: 1.5 }),
    cls: InputError,
    code: "bad-input",
    names: /vaporFraction/,
  },
  {
    name: "fluid.state with a vapour fraction above the critical temperature",
    run: () => pr.state({ T: 250, vaporFraction: 0.5 }),
    cls: PhaseUnavailableError,
    code: "phase-unavailable",
    names: /T = 250 K.*critical temperature/,
  },
  // simulateVessel: the vessel, its outlets, wall and stop criterion
  {
    name: "vessel of zero volume",
    run: () => simulateVessel({ ...vessel, shape: { kind: "volume", volumeM3: 0 } }),
    cls: InputError,
    code: "bad-input",
    names: /volumeM3 must be a finite number > 0 \(unit: m3\); received 0/,
  },
  {
    name: "vessel of negative volume",
    run: () => simulateVessel({ ...vessel, shape: { kind: "volume", volumeM3: -2 } }),
    cls: InputError,
    code: "bad-input",
    names: /volumeM3 must be a finite number > 0.*received -2/,
  },
  {
    name: "vessel orifice larger than the vessel",
    run: () => simulateVessel({ ...vessel, outlets: [{ ...outlet, diameterM: 1.2 }] }),
    cls: InputError,
    code: "bad-input",
    names:
      /^spec\.outlets\[0\]\.diameterM must be > 0 and smaller than the vessel's diameter 1\.000 m/,
  },
  {
    name: "vessel back pressure equal to the vessel pressure",
    run: () => simulateVessel({ ...vessel, outlets: [{ ...outlet, backPressurePa: 50e5 }] }),
    cls: InputError,
    code: "bad-input",
    names:
      /^spec\.outlets\[0\]\.backPressurePa must be > 0 and below the initial vessel pressure 5000000 Pa/,
  },
  {
    name: "vessel back pressure above the vessel pressure",
    run: () => simulateVessel({ ...vessel, outlets: [{ ...outlet, backPressurePa: 80e5 }] }),
    cls: InputError,
    code: "bad-input",
    names:
      /^spec\.outlets\[0\]\.backPressurePa must be .*below the initial vessel pressure.*received 8000000/,
  },
  {
    name: "vessel initial state inside the two-phase region without a liquid level",
    run: () =>
      simulateVessel({
        ...vessel,
        fluid: methaneButane,
        initial: { temperatureK: 300, pressurePa: 30e5, z: [0.5, 0.5] },
        until: { pressurePa: 20e5 },
      }),
    cls: InputError,
    code: "bad-input",
    names:
      /^spec\.initial must be a state stable as one phase.*or a gas over a liquid layer.*levelM/,
  },
  {
    name: "vessel discharge coefficient zero",
    run: () => simulateVessel({ ...vessel, outlets: [{ ...outlet, dischargeCoefficient: 0 }] }),
    cls: InputError,
    code: "bad-input",
    names: /^spec\.outlets\[0\]\.dischargeCoefficient must be > 0 and <= 1; received 0/,
  },
  {
    name: "vessel discharge coefficient negative",
    run: () => simulateVessel({ ...vessel, outlets: [{ ...outlet, dischargeCoefficient: -0.6 }] }),
    cls: InputError,
    code: "bad-input",
    names: /^spec\.outlets\[0\]\.dischargeCoefficient must be > 0 and <= 1; received -0\.6/,
  },
  {
    name: "vessel discharge coefficient above 1",
    run: () => simulateVessel({ ...vessel, outlets: [{ ...outlet, dischargeCoefficient: 1.3 }] }),
    cls: InputError,
    code: "bad-input",
    names: /^spec\.outlets\[0\]\.dischargeCoefficient must be > 0 and <= 1; received 1\.3/,
  },
  {
    name: "vessel wall thickness negative (adiabatic run)",
    run: () => simulateVessel({ ...vessel, wall: { thicknessM: -0.02 } }),
    cls: InputError,
    code: "bad-input",
    names: /^spec\.wall\.thicknessM must be > 0 \(unit: m\); received -0\.02/,
  },
  {
    name: "vessel wall mass negative",
    run: () =>
      simulateVessel({
        ...vessel,
        wall: { thicknessM: 0.02, massKg: -500 },
        heat: { kind: "wall", inside: { coefficientWPerM2K: 50 }, outside: { kind: "insulated" } },
      }),
    cls: InputError,
    code: "bad-input",
    names: /^spec\.wall\.massKg must be > 0 \(unit: kg\); received -500/,
  },
  {
    name: "vessel until without a stop criterion",
    run: () => simulateVessel({ ...vessel, until: {} }),
    cls: InputError,
    code: "bad-input",
    names: /^spec\.until must be a stop criterion: \{ pressurePa \}.*and\/or \{ timeS \}/,
  },
  {
    name: "vessel until missing",
    run: () => simulateVessel({ ...vessel, until: garbage(undefined) }),
    cls: InputError,
    code: "bad-input",
    names: /^spec\.until must be a stop criterion.*received undefined/,
  },
  {
    name: "vessel until time not finite",
    run: () => simulateVessel({ ...vessel, until: { timeS: Infinity } }),
    cls: InputError,
    code: "bad-input",
    names: /^spec\.until\.timeS must be > 0 and finite \(unit: s\)/,
  },
];

describe("library API: bad input gives a typed error naming it", () => {
  for (const c of cases) {
    it(c.name, () => {
      let err: unknown;
      try {
        c.run();
      } catch (e) {
        err = e;
      }
      expect(err).toBeInstanceOf(c.cls);
      const e = err as IsochorError;
      expect(e.code).toBe(c.code);
      expect(e.message).toMatch(c.names);
      expect(e.message.length).toBeLessThan(3000);
    });
  }
});

export const LIBRARY_CASES = cases.length;
