import { describe, expect, it } from "vitest";
import {
  departuresAroundCriticalPoint,
  departuresFromPvt,
  pvtFromArrays,
} from "../../../kernel-lib/src/pvt/index.js";
import { InputError, OutOfRangeError } from "../../../kernel-lib/src/errors.js";
import { geometric, range } from "./campaign.js";
import { departuresPR, pressurePR } from "./pengRobinsonTruth.js";

// Peng-Robinson CO2 (closed-form truth; Tc = 304.13 K). Gas and supercritical isochores measured
// from 310 K up; one liquid isochore (21 kmol/m3) also measured below Tc, down to 285 K, where no
// isotherm can be integrated from zero density (it would cross the dome).
const LIQUID = 21000;
function liquidCampaign() {
  const T: number[] = [];
  const D: number[] = [];
  for (const d of [...geometric(100, 17000, 13), LIQUID]) {
    const temps = d === LIQUID ? range(285, 400, 24) : range(310, 400, 10);
    for (const t of temps) {
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
/** Residual cv of PR by a central difference of its closed-form u_res (step 1 mK). */
const cvResPR = (t: number) =>
  (departuresPR(t + 1e-3, LIQUID).u - departuresPR(t - 1e-3, LIQUID).u) / 2e-3;

describe("departuresAroundCriticalPoint", () => {
  const result = departuresFromPvt(liquidCampaign(), { monteCarloSamples: 0 });

  it("the isotherm route itself does not reach 285 K (too few isochores there)", () => {
    expect(result.isotherms.some((i) => i.temperatureK < 304)).toBe(false);
  });

  it("reaches (285 K, 21 kmol/m3) from the 320 K isotherm with a modelled cv, matching PR's closed form", () => {
    const r = departuresAroundCriticalPoint(result, {
      temperatureK: 285,
      isochoreDensityMolPerM3: LIQUID,
      viaIsothermK: 320,
      cvResidual: cvResPR,
    });
    const truth = departuresPR(285, LIQUID);
    for (const k of ["a", "s", "u", "h", "g"] as const) {
      expect(Math.abs(r.residual[k] - truth[k])).toBeLessThanOrEqual(
        3 * r.uncertainty[k] + 1e-6 * Math.abs(truth[k]),
      );
    }
    expect(Math.abs(r.residual.h / truth.h - 1)).toBeLessThan(1e-3);
    expect(r.path).toMatch(/isochore down to 285.00 K/);
  });

  it("accepts tabulated cv with uncertainties (propagated as fully correlated)", () => {
    const ts = range(280, 330, 26);
    const cv = ts.map(cvResPR);
    const r = departuresAroundCriticalPoint(result, {
      temperatureK: 285,
      isochoreDensityMolPerM3: LIQUID,
      viaIsothermK: 320,
      cvResidual: {
        temperatureK: ts,
        cvResidualJPerMolK: cv,
        uCvResidualJPerMolK: cv.map((c) => 0.01 * Math.abs(c)),
      },
    });
    const truth = departuresPR(285, LIQUID);
    expect(Math.abs(r.residual.s - truth.s)).toBeLessThan(3 * r.uncertainty.s);
    // 1 % of cv_res over 35 K dominates the entropy uncertainty: int 0.01 |cv_res|/T dT
    expect(r.uncertainty.s).toBeGreaterThan(0.5 * 0.01 * Math.abs(cv[10]!) * Math.log(320 / 285));
  });

  it("refuses an isotherm, isochore or temperature it cannot use", () => {
    expect(() =>
      departuresAroundCriticalPoint(result, {
        temperatureK: 285,
        isochoreDensityMolPerM3: LIQUID,
        viaIsothermK: 321,
        cvResidual: cvResPR,
      }),
    ).toThrow(InputError);
    expect(() =>
      departuresAroundCriticalPoint(result, {
        temperatureK: 285,
        isochoreDensityMolPerM3: 12345,
        viaIsothermK: 320,
        cvResidual: cvResPR,
      }),
    ).toThrow(/isochore/);
    expect(() =>
      departuresAroundCriticalPoint(result, {
        temperatureK: 270,
        isochoreDensityMolPerM3: LIQUID,
        viaIsothermK: 320,
        cvResidual: cvResPR,
      }),
    ).toThrow(OutOfRangeError);
    expect(() =>
      departuresAroundCriticalPoint(result, {
        temperatureK: Number.NaN,
        isochoreDensityMolPerM3: LIQUID,
        viaIsothermK: 320,
        cvResidual: cvResPR,
      }),
    ).toThrow(InputError);
    expect(() =>
      departuresAroundCriticalPoint(result, {
        temperatureK: 285,
        isochoreDensityMolPerM3: LIQUID,
        viaIsothermK: 320,
        cvResidual: { temperatureK: [290, 300, 310], cvResidualJPerMolK: [1, 1, 1] },
      }),
    ).toThrow(/spanning/);
  });
});
