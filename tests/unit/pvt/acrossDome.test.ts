import { describe, expect, it } from "vitest";
import {
  departuresAcrossDome,
  departuresFromPvt,
  pvtFromArrays,
} from "../../../kernel-lib/src/pvt/index.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import type { DomeState } from "../../../kernel-lib/src/pvt/index.js";
import { range } from "./campaign.js";
import { departuresPR, pressurePR, saturationPR } from "./pengRobinsonTruth.js";

// Peng-Robinson CO2 (closed-form truth). At 290 K its own saturation is Psat = 5.33 MPa,
// rho_V = 3970 and rho_L = 16930 mol/m3 (computed by saturationPR, equal fugacity). Vapour
// isochores below rho_V and liquid ones above rho_L are measured from 290 K; those in between only
// above Tc, as an isochoric cell would allow.
const T = 290;
const sat = saturationPR(T);
function campaign() {
  const Ts: number[] = [];
  const D: number[] = [];
  const vapour = [100, 250, 600, 1200, 2000, 2800, 3400, 3800];
  const liquid = [17500, 18500, 19500, 21000, 22000];
  const gap = [6000, 10000, 14000];
  for (const d of [...vapour, ...gap, ...liquid]) {
    for (const t of gap.includes(d) ? range(310, 400, 10) : range(290, 400, 23)) {
      Ts.push(t);
      D.push(d);
    }
  }
  return pvtFromArrays({
    temperatureK: Ts,
    densityMolPerM3: D,
    pressurePa: Ts.map((t, i) => pressurePR(t, D[i]!)),
  });
}

describe("departuresAcrossDome (Clapeyron crossing with saturation data)", () => {
  const result = departuresFromPvt(campaign(), { monteCarloSamples: 0, isothermsK: [T] });
  const saturation = {
    pressurePa: sat.pressurePa,
    uPressurePa: 100,
    slopePaPerK: sat.slopePaPerK,
    uSlopePaPerK: 50,
    vaporDensityMolPerM3: sat.rhoV,
    uVaporDensityMolPerM3: 2,
    liquidDensityMolPerM3: sat.rhoL,
    uLiquidDensityMolPerM3: 5,
  };

  it("the route itself stops at the vapour side (gap refusal)", () => {
    expect(result.isotherms[0]!.states.at(-1)!.densityMolPerM3).toBe(3800);
    expect(result.diagnostics.some((d) => d.code === "two-phase" && d.severity === "refusal")).toBe(
      true,
    );
  });

  it("reaches the saturated phases and the compressed liquid, matching PR's closed form within 3 u", () => {
    const r = departuresAcrossDome(result, { temperatureK: T, saturation });
    const check = (rho: number, st: DomeState) => {
      const truth = departuresPR(T, rho);
      for (const k of ["a", "s", "u", "h", "g"] as const) {
        expect(Math.abs(st.residual[k] - truth[k])).toBeLessThanOrEqual(3 * st.uncertainty[k]);
      }
    };
    check(sat.rhoV, r.saturatedVapor);
    check(sat.rhoL, r.saturatedLiquid);
    expect(r.liquid.map((s) => s.densityMolPerM3)).toEqual([17500, 18500, 19500, 21000, 22000]);
    for (const st of r.liquid) check(st.densityMolPerM3, st);
    // equal Gibbs energy on both sides (ln phi_V = ln phi_L), as phase equilibrium requires
    expect(r.saturatedVapor.residual.lnPhi).toBeCloseTo(r.saturatedLiquid.residual.lnPhi, 2);
    // liquid departures are large: h_res about -10 kJ/mol here, recovered to better than 1 %
    const h = departuresPR(T, 21000).h;
    expect(Math.abs(r.liquid[3]!.residual.h / h - 1)).toBeLessThan(0.01);
  });

  it("with exact saturation data the method's own terms (extrapolation, quadrature) stay small and honest", () => {
    const exact = {
      pressurePa: sat.pressurePa,
      slopePaPerK: sat.slopePaPerK,
      vaporDensityMolPerM3: sat.rhoV,
      liquidDensityMolPerM3: sat.rhoL,
    };
    const r = departuresAcrossDome(result, { temperatureK: T, saturation: exact });
    for (const st of r.liquid) {
      const truth = departuresPR(T, st.densityMolPerM3);
      expect(Math.abs(st.residual.h - truth.h)).toBeLessThanOrEqual(3 * st.uncertainty.h);
      expect(Math.abs(st.residual.s - truth.s)).toBeLessThanOrEqual(3 * st.uncertainty.s);
      expect(st.uncertainty.h).toBeLessThan(5); // J/mol, on |h_res| of about 10 kJ/mol
    }
  });

  it("refuses saturation data that do not fit the isotherm, and bad numbers", () => {
    expect(() =>
      departuresAcrossDome(result, {
        temperatureK: T,
        saturation: { ...saturation, vaporDensityMolPerM3: 3000 },
      }),
    ).toThrow(InputError);
    expect(() =>
      departuresAcrossDome(result, {
        temperatureK: T,
        saturation: { ...saturation, pressurePa: Number.NaN },
      }),
    ).toThrow(/saturation.pressurePa/);
    expect(() => departuresAcrossDome(result, { temperatureK: 300, saturation })).toThrow(
      /reported isotherm/,
    );
  });
});
