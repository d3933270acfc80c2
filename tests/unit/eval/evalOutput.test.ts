/**
 * `isochor eval` inputs echoed as given, and outputs in the asked units and basis.
 * Reference conversions are the unit definitions (NIST SP 811, 2008, App. B.8, from memory of
 * the document): 1 bar = 1e5 Pa; t/degC = T/K - 273.15; t/degF = 1.8 T/K - 459.67;
 * 1 psi = 6894.757293168 Pa (0.45359237 kg x 9.80665 m/s2 / 0.0254^2 m2); gauge pressures against
 * the standard atmosphere 101325 Pa; 1 lb = 0.45359237 kg; 1 ft = 0.3048 m; Btu (IT) = 1055.05585262 J.
 * Mass-based values are the molar ones divided by the molar mass of methane from the component
 * table (the conversion's own input).
 */
import { describe, expect, it } from "vitest";
import { evalCommand, runEvalRequest } from "../../../kernel-lib/src/cli/eval.js";
import { getComponent } from "../../../kernel-lib/src/components/getComponent.js";
import { fakeIo } from "./fakeIo.js";

const base = { model: "peng-robinson", components: ["methane"] };
type Entry = Record<string, unknown> & { residual: Record<string, number> };

function entries(request: object): { units?: Record<string, string>; states: Entry[] } {
  return runEvalRequest({ ...base, ...request }) as unknown as {
    units?: Record<string, string>;
    states: Entry[];
  };
}

describe("isochor eval: inputs echoed as given", () => {
  it("echoes the given strings and numbers exactly, with the SI values", () => {
    const r = entries({
      states: [
        { T: "30 degC", P: "40 bar" },
        { T: 300.5, P: 5e6 },
      ],
    });
    expect(r.states[0].input).toEqual({
      given: { T: "30 degC", P: "40 bar" },
      SI: { T: 303.15, P: 4e6 },
    });
    expect(r.states[1].input).toEqual({ given: { T: 300.5, P: 5e6 }, SI: { T: 300.5, P: 5e6 } });
    // the entry's own P is the model's p(T, rho) at the density found (round-off of the density
    // solve shows in its last digits); the echo above is what was asked
    expect(Math.abs((r.states[0].P as number) / 4e6 - 1)).toBeLessThan(1e-12);
  });

  it("a psig pressure comes back in SI as 100 psi + 101325 Pa to 15 digits", () => {
    const r = entries({ states: [{ T: 300, P: "100 psig" }] });
    const si = (r.states[0].input as { SI: { P: number } }).SI.P;
    expect(si).toBe(Number((100 * 6894.757293168361 + 101325).toPrecision(15)));
  });

  it("a request without units or output is answered as before (no input echo, no units map)", () => {
    const r = entries({ states: [{ T: 300, P: 5e6 }] });
    expect(r.units).toBeUndefined();
    expect(r.states[0].input).toBeUndefined();
  });
});

describe("isochor eval: output units and basis", () => {
  const M = getComponent("methane").molarMassKgPerMol;
  const si = entries({ states: [{ T: 300, P: 5e6 }] }).states[0] as Entry & {
    h: number;
    s: number;
    rho: number;
    cp: number;
    w: number;
    jt: number;
  };

  it("T in degC, P in bar and barg, h in kJ/kg, s in kJ/(kg K), rho in kg/m3", () => {
    const r = entries({
      states: [{ T: 300, P: 5e6 }],
      output: {
        units: { T: "degC", P: "bar", h: "kJ/kg", s: "kJ/(kg K)", rho: "kg/m3" },
      },
    });
    const e = r.states[0] as Record<string, number> & Entry;
    expect(e.T).toBeCloseTo(300 - 273.15, 12);
    expect(e.P).toBeCloseTo(50, 12);
    expect(e.h).toBeCloseTo(si.h / M / 1000, 9);
    expect(e.s).toBeCloseTo(si.s / M / 1000, 12);
    expect(e.rho).toBeCloseTo(si.rho * M, 10);
    expect(e.residual.h).toBeCloseTo(si.residual.h / M / 1000, 12);
    expect(r.units).toMatchObject({
      T: "degC",
      P: "bar",
      h: "kJ/kg",
      s: "kJ/(kg K)",
      rho: "kg/m3",
      cp: "J/(mol K)",
      "residual.h": "kJ/kg",
    });
    const g = entries({ states: [{ T: 300, P: 5e6 }], output: { units: { P: "barg" } } });
    expect(g.states[0].P).toBeCloseTo((5e6 - 101325) / 1e5, 12);
  });

  it('basis "mass" in SI: J/kg, J/(kg K), kg/m3; Z and lnPhi unchanged', () => {
    const r = entries({ states: [{ T: 300, P: 5e6 }], output: { basis: "mass" } });
    const e = r.states[0] as Record<string, unknown>;
    expect(e.h as number).toBeCloseTo(si.h / M, 6);
    expect(e.cp as number).toBeCloseTo(si.cp / M, 9);
    expect(e.rho as number).toBeCloseTo(si.rho * M, 10);
    expect(e.T).toBe(300);
    expect(e.Z).toBe(si.Z);
    expect(e.lnPhi).toEqual(si.lnPhi);
    expect(r.units).toMatchObject({ h: "J/kg", s: "J/(kg K)", rho: "kg/m3", T: "K", P: "Pa" });
  });

  it('"field" units, molar and mass', () => {
    const lb = 0.45359237;
    const ft = 0.3048;
    const btu = 1055.05585262;
    const psi = (lb * 9.80665) / (0.0254 * 0.0254);
    const molar = entries({ states: [{ T: 300, P: 5e6 }], output: { units: "field" } });
    const e = molar.states[0] as Record<string, number>;
    expect(e.T).toBeCloseTo(300 * 1.8 - 459.67, 10);
    expect(e.P).toBeCloseTo(5e6 / psi, 9);
    expect(e.w).toBeCloseTo(si.w / ft, 9);
    // Btu/lbmol: J/mol x (453.59237 mol/lbmol) / (J/Btu)
    expect(e.h).toBeCloseTo((si.h * 1000 * lb) / btu, 6);
    expect(e.jt).toBeCloseTo((si.jt * psi) / (5 / 9), 12);
    const mass = entries({
      states: [{ T: 300, P: 5e6 }],
      output: { units: "field", basis: "mass" },
    });
    const m = mass.states[0] as Record<string, number>;
    expect(m.h).toBeCloseTo(((si.h / M) * lb) / btu, 6);
    expect(m.rho).toBeCloseTo((si.rho * M * ft ** 3) / lb, 10);
    expect(mass.units).toMatchObject({ h: "Btu/lb", rho: "lb/ft3", T: "degF", P: "psia" });
  });

  it("converts each phase of a flash with its own composition's molar mass", () => {
    const feed = {
      model: "peng-robinson",
      components: ["methane", "n-butane"],
      x: [0.5, 0.5],
      states: [{ T: 300, P: 3e6 }],
      phase: "equilibrium",
    };
    const mol = runEvalRequest(feed) as unknown as { states: { phases: Entry[] }[] };
    const kg = runEvalRequest({ ...feed, output: { basis: "mass" } }) as unknown as {
      states: { phases: Entry[] }[];
    };
    const Ms = [getComponent("methane"), getComponent("n-butane")].map((c) => c.molarMassKgPerMol);
    expect(mol.states[0].phases.length).toBe(2);
    mol.states[0].phases.forEach((p, k) => {
      const x = p.x as number[];
      const Mp = x[0] * Ms[0] + x[1] * Ms[1];
      expect(kg.states[0].phases[k].h as number).toBeCloseTo((p.h as number) / Mp, 6);
      expect(kg.states[0].phases[k].x).toEqual(x);
    });
  });

  it("with transport the units map names viscosity and conductivity in SI", () => {
    const r = entries({
      states: [{ T: 300, P: 5e6 }],
      transport: true,
      output: { units: "field" },
    });
    expect(r.units).toMatchObject({ viscosity: "Pa s", thermalConductivity: "W/(m K)" });
    const plain = entries({ states: [{ T: 300, P: 5e6 }], transport: true });
    expect(r.states[0].viscosity).toBe(plain.states[0].viscosity);
    // numbers given in SI are echoed when output is asked
    expect(r.states[0].input).toEqual({ given: { T: 300, P: 5e6 }, SI: { T: 300, P: 5e6 } });
  });

  it("the envelope's T and P come in the output units too", () => {
    type Env = { envelope: { points: { T: number; P: number }[]; cricondenbar: { P: number } } };
    const gas = { model: "peng-robinson", components: ["methane", "n-butane"], x: [0.6, 0.4] };
    const a = runEvalRequest({ ...gas, envelope: true }) as unknown as Env;
    const b = runEvalRequest({
      ...gas,
      envelope: true,
      output: { units: { T: "degC", P: "bar" } },
    }) as unknown as Env;
    expect(b.envelope.points.length).toBe(a.envelope.points.length);
    a.envelope.points.forEach((p, i) => {
      expect(b.envelope.points[i].T).toBeCloseTo(p.T - 273.15, 9);
      expect(b.envelope.points[i].P).toBeCloseTo(p.P / 1e5, 9);
    });
    expect(b.envelope.cricondenbar.P).toBeCloseTo(a.envelope.cricondenbar.P / 1e5, 9);
  });

  it("refuses unknown, ambiguous and wrong-dimension units and unknown fields with the path", async () => {
    for (const [output, path, words] of [
      [{ units: { P: "psi" } }, "$.output.units.P", /psia, psig/],
      [{ units: { h: "degC" } }, "$.output.units.h", /molar-energy/],
      [{ units: { T: "kelvins" } }, "$.output.units.T", /kelvins/],
      [{ units: { Q: "K" } }, "$.output.units.Q", /unknown field/],
      [{ units: "imperial" }, "$.output.units", /"SI", "field"/],
      [{ basis: "weight" }, "$.output.basis", /molar/],
      [{ unit: "SI" }, "$.output.unit", /unknown field/],
    ] as const) {
      const io = fakeIo(JSON.stringify({ ...base, states: [{ T: 300, P: 1e5 }], output }));
      const code = await evalCommand([], io);
      expect(code).toBe(2);
      const out = JSON.parse(io.out) as { error: { path: string; message: string } };
      expect(out.error.path).toBe(path);
      expect(out.error.message).toMatch(words);
    }
  });
});
