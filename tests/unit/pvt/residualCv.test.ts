import { describe, expect, it } from "vitest";
import {
  checkCalorimetry,
  departuresFromPvt,
  residualCvFromPvt,
} from "../../../kernel-lib/src/pvt/index.js";
import { InputError } from "../../../kernel-lib/src/errors.js";
import { campaign, geometric, range } from "./campaign.js";
import { departuresPR, pressurePR } from "./pengRobinsonTruth.js";

/** cv_res of PR: central difference of its closed-form u_res at constant density (step 1 mK). */
const cvResPR = (t: number, rho: number) =>
  (departuresPR(t + 1e-3, rho).u - departuresPR(t - 1e-3, rho).u) / 2e-3;

describe("residual cv from P-V-T data and the calorimetric check", () => {
  const result = departuresFromPvt(
    campaign({
      densities: geometric(50, 7000, 17),
      temperatures: range(310, 400, 19),
      pressure: pressurePR,
    }),
    { monteCarloSamples: 0 },
  );

  it("recovers PR's residual cv (closed form, differenced) within 3 u plus 1 % on an interior isotherm", () => {
    const p = residualCvFromPvt(result, 355);
    p.densityMolPerM3.forEach((rho, k) => {
      const truth = cvResPR(355, rho);
      expect(Math.abs(p.cvResidualJPerMolK[k]! - truth)).toBeLessThanOrEqual(
        3 * p.uCvResidualJPerMolK[k]! + 0.01 * Math.abs(truth),
      );
    });
    // cv_res grows with density towards the critical region: positive and a few J/(mol K) at 7 kmol/m3
    expect(p.cvResidualJPerMolK.at(-1)!).toBeGreaterThan(1);
  });

  it("accepts consistent calorimetry and flags a contradicting value", () => {
    const rho = result.isotherms[9]!.states[12]!.densityMolPerM3;
    const T = result.isotherms[9]!.temperatureK;
    const good = {
      temperatureK: T,
      densityMolPerM3: rho,
      cvResidualJPerMolK: cvResPR(T, rho),
      uCvResidualJPerMolK: 0.05,
    };
    const ok = checkCalorimetry(result, [good]);
    expect(ok.diagnostics[0]?.severity).toBe("info");
    const bad = checkCalorimetry(result, [
      good,
      { ...good, cvResidualJPerMolK: good.cvResidualJPerMolK + 1 },
    ]);
    expect(bad.diagnostics[0]?.severity).toBe("warning");
    expect(bad.diagnostics[0]?.message).toMatch(/1 of 2 calorimetric cv values contradict/);
  });

  it("refuses a temperature that is not a reported isotherm and a density off the isochores", () => {
    expect(() => residualCvFromPvt(result, 356)).toThrow(InputError);
    const T = result.isotherms[0]!.temperatureK;
    expect(() =>
      checkCalorimetry(result, [
        { temperatureK: T, densityMolPerM3: 1234, cvResidualJPerMolK: 1, uCvResidualJPerMolK: 0.1 },
      ]),
    ).toThrow(/isochore density/);
  });
});
