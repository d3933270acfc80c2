/**
 * INVENTED / SYNTHETIC demo data: the "Corvid Point Refinery" (invented) laboratory campaign on the
 * high-purity CO2 sent from HGU-3 to the K-320 export compressor. No real plant, laboratory or
 * person is described. The "measurements" are generated from the Span-Wagner reference equation
 * for carbon dioxide (Span & Wagner, J. Phys. Chem. Ref. Data 25 (1996) 1509, as shipped in
 * kernel-lib/src/eos/multiparameter/data/carbon-dioxide.json) with stated, seeded Gaussian noise:
 *   u(P) = 1e-4 P + 200 Pa, u(T) = 10 mK, u(rho) = 2e-4 rho (standard uncertainties, stated in the file).
 * Layout: an isochoric cell (invented "IC-2") filled 12 times, each filling heated through
 * 12 set points from 310 K to 420 K (all above Tc = 304.13 K, so no isotherm crosses the dome).
 *
 * Regenerate the CSV with `node notebooks/data/generate-corvid-k320-co2-pvt.mjs`; the unit test
 * tests/unit/pvt/demoCampaign.test.ts checks that the committed file equals this function's output.
 */
import { getComponent } from "../../kernel-lib/src/components/index.js";
import { referenceFluid } from "../../kernel-lib/src/fluid/referenceFluids.js";
import { seededRandom } from "../../kernel-lib/src/pvt/seededRandom.js";

/** Seed of the noise (stated in the file). */
export const CAMPAIGN_SEED = 320;
/** Nominal filling densities, mol/m3 (about 6.6 to 528 kg/m3), geometric spacing. */
export const FILLING_DENSITIES = Array.from(
  { length: 12 },
  (_, i) => 150 * (12000 / 150) ** (i / 11),
);
/** Temperature set points, K. */
export const SET_POINTS_K = Array.from({ length: 12 }, (_, i) => 310 + 10 * i);

export function corvidK320CampaignCsv(): string {
  const co2 = referenceFluid("carbon-dioxide");
  const R = co2.gasConstant as number;
  const M = getComponent("carbon-dioxide").molarMassKgPerMol;
  const rng = seededRandom(CAMPAIGN_SEED);
  const lines = [
    "# INVENTED / SYNTHETIC DATA for the isochor demonstrations. Corvid Point Refinery is invented; no real plant, lab or person.",
    "# Stream: high-purity CO2 from HGU-3 CO2 removal to the K-320 export compressor (invented scenario).",
    "# Campaign: isochoric cell IC-2 (invented), 12 fillings x 12 temperature set points, 310-420 K.",
    "# Generated from the Span-Wagner CO2 equation (J. Phys. Chem. Ref. Data 25 (1996) 1509) with seeded Gaussian noise:",
    `#   u(P) = 1e-4 P + 200 Pa, u(T) = 0.010 K, u(rho) = 2e-4 rho (standard uncertainties); seed ${CAMPAIGN_SEED}.`,
    `# Density in kg/m3 with M = ${M} kg/mol (isochor component table); read with --component carbon-dioxide.`,
    "# Regenerate: node notebooks/data/generate-corvid-k320-co2-pvt.mjs",
    "T [degC],rho [kg/m3],P [bar],u(T) [K],u(rho) [kg/m3],u(P) [bar]",
  ];
  for (const rho of FILLING_DENSITIES) {
    for (const T of SET_POINTS_K) {
      const P = rho * R * T * (1 + co2.residual(T, rho, [1]).aD);
      const uP = 1e-4 * P + 200;
      const uT = 0.01;
      const uRho = 2e-4 * rho;
      // What the instruments read: true value plus noise (same draw order every run).
      const tMeas = T + uT * rng.normal();
      const rhoMeas = rho + uRho * rng.normal();
      const pMeas = P + uP * rng.normal();
      lines.push(
        [
          (tMeas - 273.15).toFixed(3),
          (rhoMeas * M).toFixed(4),
          (pMeas / 1e5).toFixed(5),
          uT.toFixed(3),
          (uRho * M).toFixed(4),
          (uP / 1e5).toFixed(5),
        ].join(","),
      );
    }
  }
  return lines.join("\n") + "\n";
}
