/**
 * Drawing data for the diagram tests. These numbers only have to be shaped like a real diagram
 * (a dome that closes at a critical point, isotherms crossing it); the tests assert what the
 * builders do with them (axes, units, layers, escaping), never thermodynamics.
 */
import type { ChartSaturationRow } from "../../../kernel-lib/src/charts/saturationInput.js";

const TC = 369.8; // K, propane-like scale
const PC = 4.25e6; // Pa

/** A synthetic dome: saturation rows from 0.6 Tc to 0.98 Tc. */
export function syntheticSaturation(): ChartSaturationRow[] {
  const rows: ChartSaturationRow[] = [];
  for (let i = 0; i <= 12; i++) {
    const tr = 0.6 + (0.38 * i) / 12;
    const width = Math.pow(1 - tr, 0.38); // closes like (1 - Tr)^beta
    rows.push({
      temperatureK: tr * TC,
      pressurePa: PC * Math.pow(10, (7 / 3) * 1.15 * (1 - 1 / tr)),
      liquid: {
        enthalpyJPerMol: 20000 - 14000 * width,
        entropyJPerMolK: 80 - 45 * width,
        densityMolPerM3: 5000 * (1 + 1.5 * width),
      },
      vapor: {
        enthalpyJPerMol: 20000 + 7000 * width,
        entropyJPerMolK: 80 + 25 * width,
        densityMolPerM3: 5000 * Math.max(0.02, 1 - 1.8 * width),
      },
    });
  }
  return rows;
}

export const SYNTHETIC_CRITICAL = {
  temperatureK: TC,
  pressurePa: PC,
  enthalpyJPerMol: 20000,
  entropyJPerMolK: 80,
  densityMolPerM3: 5000,
};

/** A synthetic P-h isotherm: vertical-ish liquid, flat in the dome, curving vapour. */
export function syntheticPhIsotherm(tr: number): { pressurePa: number; enthalpyJPerMol: number }[] {
  const out: { pressurePa: number; enthalpyJPerMol: number }[] = [];
  for (let i = 0; i < 40; i++) {
    const p = 2e4 * Math.pow(10, (3 * i) / 39);
    out.push({ pressurePa: p, enthalpyJPerMol: 15000 + 12000 * tr - 600 * Math.log(p / 1e5) });
  }
  return out;
}
