import { describe, expect, it } from "vitest";
import * as fs from "node:fs";
import * as path from "node:path";
import { corvidK320CampaignCsv } from "../../../notebooks/data/corvidK320Campaign.js";
import { main } from "../../../kernel-lib/src/cli/main.js";
import type { CliIo } from "../../../kernel-lib/src/cli/io.js";
import { referenceFluid } from "../../../kernel-lib/src/fluid/referenceFluids.js";
import { createModel } from "../../../kernel-lib/src/eos/index.js";
import { getComponent } from "../../../kernel-lib/src/components/index.js";
import {
  compareWithModel,
  departuresFromPvt,
  parsePvtCsv,
} from "../../../kernel-lib/src/pvt/index.js";

const FILE = path.join(__dirname, "../../../notebooks/data/corvid-k320-co2-pvt.csv");

describe("demo campaign (invented Corvid Point K-320 CO2, synthetic from Span-Wagner)", () => {
  it("the committed CSV is exactly what the committed generator produces", () => {
    expect(fs.readFileSync(FILE, "utf8")).toBe(corvidK320CampaignCsv());
  });

  it("is labelled invented/synthetic in the file itself", () => {
    expect(fs.readFileSync(FILE, "utf8").split("\n")[0]).toMatch(/INVENTED \/ SYNTHETIC/);
  });

  it("isochor pvt recovers the Span-Wagner departures (the generating truth) within the stated uncertainty", async () => {
    const out: string[] = [];
    const err: string[] = [];
    const io: CliIo = {
      stdout: (t) => void out.push(t),
      stderr: (t) => void err.push(t),
      readStdin: async () => "",
      cwd: process.cwd(),
    };
    const code = await main(["pvt", FILE, "--component", "carbon-dioxide", "--samples", "100"], io);
    expect(code).toBe(0);
    const json = JSON.parse(out.join(""));
    const co2 = referenceFluid("carbon-dioxide");
    const R = co2.gasConstant as number;
    let inside = 0;
    let total = 0;
    let worstZ = 0;
    for (const iso of json.isotherms) {
      for (const p of iso.points) {
        const d = co2.residual(iso.T, p.rho, [1]);
        const RT = R * iso.T;
        const truth = {
          a: RT * d.a,
          s: R * (-d.a - d.aT),
          u: -RT * d.aT,
          h: RT * (d.aD - d.aT),
          g: RT * (d.a + d.aD - Math.log(1 + d.aD)),
        };
        for (const k of ["a", "s", "u", "h", "g"] as const) {
          const z = Math.abs(p.residual[k] - truth[k]) / p.uncertainty[k];
          worstZ = Math.max(worstZ, z);
          total++;
          if (z <= 1.96) inside++;
        }
      }
    }
    expect(json.isotherms.length).toBe(12);
    // one noisy campaign: correlated outputs, so a looser band than the many-seed coverage test
    expect(inside / total).toBeGreaterThan(0.85);
    expect(worstZ).toBeLessThan(4.5);
    // B against the equation's own (limit of (Z-1)/rho, evaluated at 1e-3 mol/m3)
    json.isotherms.forEach((iso: { T: number }, k: number) => {
      const B = co2.residual(iso.T, 1e-3, [1]).aD / 1e-3;
      expect(Math.abs(json.virial.B[k] - B)).toBeLessThanOrEqual(3 * json.virial.uB[k]);
    });
  });

  it("compared with library models: Span-Wagner agrees, Peng-Robinson is measurably off in dense CO2", () => {
    const co2 = getComponent("carbon-dioxide");
    const data = parsePvtCsv(fs.readFileSync(FILE, "utf8"), {
      molarMassKgPerMol: co2.molarMassKgPerMol,
    });
    const result = departuresFromPvt(data, { monteCarloSamples: 0 });
    const sw = compareWithModel(result, referenceFluid("carbon-dioxide"));
    const pr = compareWithModel(result, createModel("peng-robinson", [co2]));
    const beyond = (c: typeof sw) => c.filter((p) => Math.abs(p.z.h) > 3).length / c.length;
    expect(beyond(sw)).toBeLessThan(0.03);
    expect(beyond(pr)).toBeGreaterThan(0.5);
    expect(Math.max(...pr.map((p) => Math.abs(p.difference.h)))).toBeGreaterThan(100); // J/mol
  });
});
