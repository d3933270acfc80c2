/**
 * Large files: 200,000 rows through the CSV import, the array import, the fits that once spread
 * the data into Math.min/Math.max ("Maximum call stack size exceeded") and the whole route.
 * Pressures from the Peng-Robinson closed form for CO2 (pengRobinsonTruth.ts) on a grid, so the
 * departures can be checked against the same closed form. Not a timing test: it only has to run.
 */
import { describe, expect, it } from "vitest";
import { extent } from "../../../kernel-lib/src/numerics/extent.js";
import {
  departuresFromPvt,
  fitIsochore,
  fitVirialSurface,
  parsePvtCsv,
  pvtFromArrays,
} from "../../../kernel-lib/src/pvt/index.js";
import type { PvtRouteProgress } from "../../../kernel-lib/src/pvt/index.js";
import { departuresPR, pressurePR } from "./pengRobinsonTruth.js";

const ROWS = 200_000;
const N_RHO = 200;
const N_T = ROWS / N_RHO;
const rhoOf = (i: number) => 100 * 60 ** (i / (N_RHO - 1)); // 100 to 6000 mol/m3
const tOf = (j: number) => 310 + (140 * j) / (N_T - 1); // 310 to 450 K, above Tc of CO2

function grid(): { T: number[]; rho: number[]; P: number[]; uP: number[] } {
  const T: number[] = [];
  const rho: number[] = [];
  const P: number[] = [];
  const uP: number[] = [];
  for (let i = 0; i < N_RHO; i++) {
    for (let j = 0; j < N_T; j++) {
      const p = pressurePR(tOf(j), rhoOf(i));
      T.push(tOf(j));
      rho.push(rhoOf(i));
      P.push(p);
      uP.push(1e-5 * p);
    }
  }
  return { T, rho, P, uP };
}

describe("200,000-row P-V-T data", () => {
  const g = grid();

  it("extent handles 200,000 values (Math.min(...values) overflows the stack there)", () => {
    expect(() => Math.min(...new Array<number>(2_000_000).fill(1))).toThrow(RangeError);
    expect(extent(g.T)).toEqual({ min: 310, max: 450 });
  });

  it("imports a 200,000-row CSV text and the same arrays", () => {
    const lines = ["T [K];rho [mol/m3];P [Pa];u(P) [Pa]"];
    for (let k = 0; k < ROWS; k++) lines.push(`${g.T[k]};${g.rho[k]};${g.P[k]};${g.uP[k]}`);
    const fromCsv = parsePvtCsv(lines.join("\n"), { source: "big.csv" });
    expect(fromCsv.points).toHaveLength(ROWS);
    expect(fromCsv.points[ROWS - 1]?.pressurePa).toBe(g.P[ROWS - 1]);
    const fromArrays = pvtFromArrays({
      temperatureK: g.T,
      densityMolPerM3: g.rho,
      pressurePa: g.P,
      uPressurePa: g.uP,
    });
    expect(fromArrays.points).toHaveLength(ROWS);
  });

  it("fits the surface to 200,000 points and one isochore of 200,000 points", () => {
    const points = g.T.map((t, k) => ({
      temperatureK: t,
      densityMolPerM3: g.rho[k],
      pressurePa: g.P[k],
    }));
    const s = fitVirialSurface(points, g.uP, { densityTerms: 4, temperatureTerms: 3 });
    expect(s.surface.range).toEqual({
      minTemperatureK: 310,
      maxTemperatureK: 450,
      maxDensityMolPerM3: 6000,
    });
    // one isochore, 200,000 temperatures between 310 and 450 K
    const T = Array.from({ length: ROWS }, (_, k) => 310 + (140 * k) / (ROWS - 1));
    const f = fitIsochore(
      1000,
      T,
      T.map((t) => pressurePR(t, 1000)),
      undefined,
      { order: 3 },
    );
    expect(f.minTemperatureK).toBe(310);
    expect(f.maxTemperatureK).toBe(450);
    // along an isochore PR's P(T) is linear but for a(T), which has sqrt(T) terms: a cubic over
    // 140 K follows it to about 1e-6 (1.4e-6 seen), so 1e-5 is asserted
    expect(Math.abs(f.evaluate(380).pressurePa / pressurePR(380, 1000) - 1)).toBeLessThan(1e-5);
  });

  it("runs the whole route on 200,000 rows and reports progress", () => {
    const data = pvtFromArrays({
      temperatureK: g.T,
      densityMolPerM3: g.rho,
      pressurePa: g.P,
      uPressurePa: g.uP,
    });
    const reports: PvtRouteProgress[] = [];
    const r = departuresFromPvt(data, {
      isothermsK: [320, 400],
      surface: { densityTerms: 4, temperatureTerms: 3 },
      monteCarloSamples: 0,
      onProgress: (p) => void reports.push(p),
    });
    expect(r.route).toBe("isochores");
    expect(r.isochoreFits).toHaveLength(N_RHO);
    expect(r.isotherms.map((i) => i.temperatureK)).toEqual([320, 400]);
    // the route's h_res against the closed form at the densest node (same model, noise-free data)
    const iso = r.isotherms[1];
    const last = iso?.states.at(-1);
    expect(last).toBeDefined();
    if (iso && last) {
      const exact = departuresPR(iso.temperatureK, last.densityMolPerM3);
      expect(Math.abs(last.residual.h - exact.h)).toBeLessThan(1 + 3 * last.uncertainty.h);
    }
    const stages = [...new Set(reports.map((p) => p.stage))];
    expect(stages).toEqual([
      "surface fit",
      "outlier screen",
      "isochore fits",
      "isotherms",
      "linearised",
    ]);
    for (const p of reports) expect(p.done).toBeLessThanOrEqual(p.total);
  }, 120_000);
});
