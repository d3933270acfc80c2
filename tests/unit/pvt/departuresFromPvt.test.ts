import { describe, expect, it } from "vitest";
import {
  pvtFromArrays,
  compareWithModel,
  departuresFromPvt,
  surfaceDerivatives,
  surfacePressureModel,
  surfaceResidualModel,
} from "../../../kernel-lib/src/pvt/index.js";
import type { PvtRouteResult } from "../../../kernel-lib/src/pvt/index.js";
import type { ResidualModel } from "../../../kernel-lib/src/eos/types.js";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import { campaign, geometric, range } from "./campaign.js";
import { departuresPR, pressurePR, secondVirialPR } from "./pengRobinsonTruth.js";

const KEYS = ["a", "s", "u", "h", "g"] as const;

function worst(
  result: PvtRouteResult,
  truth: (T: number, rho: number) => Record<(typeof KEYS)[number], number>,
) {
  let maxErr = { s: 0, h: 0 };
  let maxZ = 0;
  for (const iso of result.isotherms) {
    for (const st of iso.states) {
      const tr = truth(iso.temperatureK, st.densityMolPerM3);
      maxErr = {
        s: Math.max(maxErr.s, Math.abs(st.residual.s - tr.s)),
        h: Math.max(maxErr.h, Math.abs(st.residual.h - tr.h)),
      };
      for (const k of KEYS) {
        const z = Math.abs(st.residual[k] - tr[k]) / st.uncertainty[k];
        maxZ = Math.max(maxZ, z);
      }
    }
  }
  return { maxErr, maxZ };
}

// Supercritical CO2 (Tc = 304.13 K), gas to near-critical densities (rho_c ~ 10.6 kmol/m3).
const coarse = {
  densities: geometric(100, 7000, 9),
  temperatures: range(310, 400, 10),
  pressure: pressurePR,
};
const dense = {
  densities: geometric(50, 7000, 17),
  temperatures: range(310, 400, 19),
  pressure: pressurePR,
};

describe("departuresFromPvt on noise-free synthetic data (Peng-Robinson CO2 as the closed-form truth)", () => {
  const rc = departuresFromPvt(campaign(coarse), { monteCarloSamples: 0 });
  const rd = departuresFromPvt(campaign(dense), { monteCarloSamples: 0 });

  it("takes the isochore route and reports every measured isotherm and density", () => {
    expect(rc.route).toBe("isochores");
    expect(rc.isotherms).toHaveLength(10);
    expect(rc.isotherms[0]?.states).toHaveLength(9);
  });

  it("recovers s, u, a, h, g within the stated uncertainty (fit + quadrature + bridge), |error| <= 3 u", () => {
    expect(worst(rc, departuresPR).maxZ).toBeLessThan(3);
    expect(worst(rd, departuresPR).maxZ).toBeLessThan(3);
  });

  it("errors shrink as the data get denser (9 x 10 -> 17 x 19 points)", () => {
    const a = worst(rc, departuresPR).maxErr;
    const b = worst(rd, departuresPR).maxErr;
    expect(b.s).toBeLessThan(a.s / 2);
    expect(b.h).toBeLessThan(a.h / 2);
    // and they are small in engineering terms: 1e-3 J/(mol K) and 0.2 J/mol on departures of ~7 J/(mol K) and ~5 kJ/mol
    expect(b.s).toBeLessThan(1e-3);
    expect(b.h).toBeLessThan(0.2);
  });

  it("recovers the second virial coefficient B = b - a/(RT) of PR (exact closed form) within 2 uB and 1e-4 relative", () => {
    for (const iso of rd.isotherms) {
      const B = secondVirialPR(iso.temperatureK);
      expect(Math.abs(iso.B - B)).toBeLessThanOrEqual(2 * iso.uB);
      expect(Math.abs(iso.B / B - 1)).toBeLessThan(1e-4);
    }
  });

  it("states the bridge from zero density to the first node with its uncertainty", () => {
    const br = rc.isotherms[0]?.bridge;
    expect(br?.toDensityMolPerM3).toBeCloseTo(100, 9);
    const t = rc.isotherms[0]!.temperatureK;
    // the bridge integral of a_res up to 100 mol/m3 is close to the whole a_res there
    expect(br!.aJPerMol).toBeCloseTo(departuresPR(t, 100).a, 2);
    expect(br!.uAJPerMol).toBeGreaterThanOrEqual(0);
  });
});

describe("departuresFromPvt against a reference equation (IAPWS-95 water, noise-free)", () => {
  // Supercritical steam, 700-850 K (Tc = 647.096 K), up to ~2.5 kmol/m3 (45 kg/m3).
  const water = referenceFluid("water");
  const Rw = water.gasConstant as number;
  const pressure = (T: number, rho: number) => rho * Rw * T * (1 + water.residual(T, rho, [1]).aD);
  const truth = (T: number, rho: number) => {
    const d = water.residual(T, rho, [1]);
    const RT = Rw * T;
    const Z = 1 + d.aD;
    const lnPhi = d.a + d.aD - Math.log(Z);
    return {
      a: RT * d.a,
      s: Rw * (-d.a - d.aT),
      u: -RT * d.aT,
      h: RT * (d.aD - d.aT),
      g: RT * lnPhi,
    };
  };
  const result = departuresFromPvt(
    campaign({ densities: geometric(40, 2500, 14), temperatures: range(700, 850, 16), pressure }),
    { monteCarloSamples: 0, gasConstant: Rw },
  );

  it("recovers the equation's own residual properties within the stated uncertainty", () => {
    const w = worst(result, truth);
    expect(w.maxZ).toBeLessThan(3);
    expect(w.maxErr.s).toBeLessThan(2e-3);
    expect(w.maxErr.h).toBeLessThan(0.5);
  });

  it("recovers the equation's second virial coefficient, lim (Z-1)/rho (numerically, at 1e-3 mol/m3)", () => {
    for (const iso of result.isotherms) {
      const B = water.residual(iso.temperatureK, 1e-3, [1]).aD / 1e-3;
      expect(Math.abs(iso.B - B)).toBeLessThanOrEqual(2 * iso.uB + 1e-3 * Math.abs(B));
    }
  });
});

describe("departuresFromPvt: routes, refusals and the model hand-off", () => {
  it("uses the surface route for data on isotherms (no isochores) and still recovers the departures", () => {
    const T: number[] = [];
    const D: number[] = [];
    const P: number[] = [];
    [320, 335, 350, 365, 380].forEach((t, k) => {
      geometric(80, 4000, 12).forEach((d) => {
        const rho = d * (1 + 0.03 * k); // each isotherm at its own densities: no isochores
        T.push(t);
        D.push(rho);
        P.push(pressurePR(t, rho));
      });
    });
    const r = departuresFromPvt(
      {
        source: "iso",
        points: T.map((t, i) => ({
          temperatureK: t,
          densityMolPerM3: D[i]!,
          pressurePa: P[i]!,
          line: i + 2,
        })),
        setAside: [],
        columns: [],
        comments: [],
      },
      { monteCarloSamples: 0 },
    );
    expect(r.route).toBe("surface");
    expect(r.diagnostics.some((d) => d.code === "route")).toBe(true);
    const w = worst(r, departuresPR);
    expect(w.maxZ).toBeLessThan(3);
    expect(w.maxErr.s).toBeLessThan(1e-2);
    expect(w.maxErr.h).toBeLessThan(2);
  });

  it("refuses to integrate through the two-phase region and says why (PR loop below Tc)", () => {
    // Subcritical isotherms (292-300 K < Tc = 304.13 K): PR's van der Waals loop makes P fall with
    // density inside the dome (positive throughout at these T), which the route must detect
    // instead of integrating through.
    const r = departuresFromPvt(
      campaign({
        densities: [500, 1000, 2000, 3500, 5000, 7000, 9000, 11000, 13000, 15000],
        temperatures: range(292, 300, 5),
        pressure: pressurePR,
      }),
      { monteCarloSamples: 0 },
    );
    const refusal = r.diagnostics.find((d) => d.code === "two-phase");
    expect(refusal?.severity).toBe("refusal");
    expect(refusal?.message).toMatch(/cannot be integrated through the dome/);
    for (const iso of r.isotherms) {
      const ps = iso.states.map((s) => s.pressurePa);
      for (let i = 1; i < ps.length; i++) expect(ps[i]!).toBeGreaterThan(ps[i - 1]!);
    }
  });

  it("refuses route 'isochores' when the data have no isochores, and too few points", () => {
    const ds = campaign({
      densities: [100, 200],
      temperatures: range(300, 340, 5),
      pressure: pressurePR,
    });
    expect(() => departuresFromPvt(ds, { route: "isochores" })).toThrow(InputError);
    const tiny = campaign({
      densities: [100],
      temperatures: [300, 310, 320],
      pressure: pressurePR,
    });
    expect(() => departuresFromPvt(tiny)).toThrow(/at least 6/);
  });

  it("hands the fitted surface to the engine as a ResidualModel whose pressure reproduces the data", () => {
    const r = departuresFromPvt(campaign(coarse), { monteCarloSamples: 0 });
    const model = surfaceResidualModel(r.surfaceFit.surface, { dataSource: "synthetic PR" });
    const T = 355;
    const rho = 3000;
    const d = model.residual(T, rho, [1]);
    const P = rho * 8.314462618 * T * (1 + d.aD);
    expect(Math.abs(P / pressurePR(T, rho) - 1)).toBeLessThan(1e-4);
    expect(model.checkValidity?.(T, rho, [1])).toEqual([]);
    expect(model.checkValidity?.(500, rho, [1])[0]?.code).toBe("extrapolated");
    // reduced derivatives are consistent: aT by central difference of a (step 1e-3 K)
    const h = 1e-3;
    const aT =
      (T * (model.residual(T + h, rho, [1]).a - model.residual(T - h, rho, [1]).a)) / (2 * h);
    expect(d.aT).toBeCloseTo(aT, 8);
  });

  it("hands the surface to the engine's own integrator (modelFromPressure): same derivatives as the closed form", () => {
    const r = departuresFromPvt(campaign(coarse), { monteCarloSamples: 0 });
    const engine = surfacePressureModel(r.surfaceFit.surface);
    for (const [T, rho] of [
      [320, 300],
      [355, 3000],
      [395, 6500],
    ] as const) {
      const a = engine.residual(T, rho, [1]);
      const b = surfaceDerivatives(r.surfaceFit.surface, T, rho);
      for (const k of ["a", "aD", "aT", "aDD", "aTT", "aDT"] as const) {
        expect(Math.abs(a[k] - b[k])).toBeLessThan(1e-9 * (1 + Math.abs(b[k])));
      }
    }
  });

  it("compares the data-derived departures with a model (PR itself: differences within 3 u)", () => {
    const r = departuresFromPvt(campaign(coarse), { monteCarloSamples: 0 });
    const prModel: ResidualModel = {
      info: {
        id: "pr-test",
        name: "PR CO2 (test)",
        citation: "Peng & Robinson 1976",
        componentIds: ["carbon-dioxide"],
      },
      residual(T, rho) {
        const d = departuresPR(T, rho);
        const RT = 8.314462618 * T;
        const a = d.a / RT;
        const aT = -d.u / RT;
        const Z = pressurePR(T, rho) / (rho * RT);
        return { a, aT, aD: Z - 1, aDD: Number.NaN, aTT: Number.NaN, aDT: Number.NaN };
      },
      maxDensity: () => Infinity,
    };
    const cmp = compareWithModel(r, prModel);
    expect(cmp).toHaveLength(90);
    for (const c of cmp) for (const k of KEYS) expect(Math.abs(c.z[k])).toBeLessThan(3);
  });
});

describe("departuresFromPvt: an isochoric campaign that meets the dome (no loop in the data)", () => {
  // Vapour isochores (<= 2 kmol/m3) and liquid ones (>= 21 kmol/m3) measured from 285 K; the ones
  // in between only from 310 K (above Tc = 304.13 K), as a cell that meets the two-phase region
  // would. The smoothed P still rises with density at 290 K, so only the gap check can stop the
  // route from integrating straight across the dome.
  function domeCampaign() {
    const T: number[] = [];
    const D: number[] = [];
    const dens = [100, 250, 600, 1200, 2000, 4000, 8000, 12000, 17000, 21000, 22000, 23000];
    for (const d of dens) {
      for (const t of d <= 2000 || d >= 21000 ? range(285, 400, 24) : range(310, 400, 19)) {
        T.push(t);
        D.push(d);
      }
    }
    return pvtFromArrays({
      temperatureK: T,
      densityMolPerM3: D,
      pressurePa: T.map((t, i) => pressurePR(t, D[i]!)),
    });
  }

  it("stops the 290 K isotherm at the gap and says why", () => {
    const r = departuresFromPvt(domeCampaign(), { monteCarloSamples: 0, isothermsK: [290, 350] });
    const refusal = r.diagnostics.find((d) => d.code === "two-phase");
    expect(refusal?.severity).toBe("refusal");
    expect(refusal?.message).toMatch(
      /isotherm 290.00 K: the isochore at 4000.0 mol\/m3 lies between the nodes 2000.0 and 21000 mol\/m3/,
    );
    const at290 = r.isotherms.find((i) => i.temperatureK === 290)!;
    expect(at290.states.map((s) => s.densityMolPerM3)).toEqual([100, 250, 600, 1200, 2000]);
    // the vapour part is still right (PR closed form)
    for (const s of at290.states)
      expect(Math.abs(s.residual.h - departuresPR(290, s.densityMolPerM3).h)).toBeLessThan(
        3 * s.uncertainty.h + 0.05,
      );
    // the supercritical isotherm keeps every node
    expect(r.isotherms.find((i) => i.temperatureK === 350)!.states).toHaveLength(12);
  });

  it("warns below the critical temperature when it is given", () => {
    const r = departuresFromPvt(domeCampaign(), {
      monteCarloSamples: 0,
      isothermsK: [290],
      criticalTemperatureK: 304.13,
    });
    expect(r.diagnostics.some((d) => d.code === "below-critical" && d.severity === "warning")).toBe(
      true,
    );
  });
});
