/**
 * Lines of a pure fluid for the P-h and T-s diagrams: isotherms and isobars from the stable state
 * at (T, P) (one sweep per line, sampleSweep.ts: the same numbers as state/stateAtTP) with the
 * saturated liquid and vapour inserted where the line crosses the dome (so it runs flat across the two-phase region), and isentropes from the
 * (P, s) state across the dome (phase/stateAtPressureEntropy). Below a model's published
 * triple point (pressure for an isobar, temperature for an isotherm) there is no vapour-liquid
 * equilibrium (the fluid sublimes or melts there), so no flat two-phase part is inserted.
 */
import { saturationAtPressure, saturationAtTemperature } from "../../phase/saturation.js";
import { stateAtPressureEntropy } from "../../phase/twoPhaseState.js";
import { stateAtTRho } from "../../state/stateAt.js";
import type { FluidBinding } from "../../state/types.js";
import { requireFinite, requirePositive } from "../../validate.js";
import type { PressureEnthalpyPoint } from "../pressureEnthalpy.js";
import type { TemperatureEntropyPoint } from "../temperatureEntropy.js";
import type { SaturationHints } from "../../phase/pureFluid.js";
import { tryPoint } from "./sampleGuard.js";
import { sweepTPRows } from "./sampleSweep.js";

const PURE = [1];

/** Isotherm of a pure fluid on P-h: stable states at the pressures, plus the flat two-phase part. */
export function isothermOnPressureEnthalpy(
  fluid: FluidBinding,
  temperatureK: number,
  pressuresPa: readonly number[],
): { temperatureK: number; points: PressureEnthalpyPoint[] } {
  requirePositive("temperatureK", temperatureK, "K");
  const triple = (fluid.model as SaturationHints).triple;
  const sat =
    triple && temperatureK < triple.temperatureK
      ? undefined
      : tryPoint(() => saturationAtTemperature(fluid.model, temperatureK));
  const ps = [...pressuresPa].sort((a, b) => a - b);
  for (const P of ps) requirePositive("pressurePa", P, "Pa");
  const line = sweepTPRows(fluid, [temperatureK], ps, PURE, ["h"]).rows[0].h;
  const points: PressureEnthalpyPoint[] = [];
  let inserted = false;
  ps.forEach((P, j) => {
    if (sat && !inserted && P >= sat.pressurePa) {
      for (const rho of [sat.vaporDensityMolPerM3, sat.liquidDensityMolPerM3]) {
        points.push({
          pressurePa: sat.pressurePa,
          enthalpyJPerMol: stateAtTRho(fluid, temperatureK, rho, PURE).molar.h,
        });
      }
      inserted = true;
    }
    points.push({ pressurePa: P, enthalpyJPerMol: line[j] });
  });
  return { temperatureK, points };
}

/** Isobar of a pure fluid on T-s: stable states at the temperatures, plus the flat two-phase part. */
export function isobarOnTemperatureEntropy(
  fluid: FluidBinding,
  pressurePa: number,
  temperaturesK: readonly number[],
): { pressurePa: number; points: TemperatureEntropyPoint[] } {
  requirePositive("pressurePa", pressurePa, "Pa");
  const triple = (fluid.model as SaturationHints).triple;
  const sat =
    triple && pressurePa < triple.pressurePa
      ? undefined
      : tryPoint(() => saturationAtPressure(fluid.model, pressurePa));
  const ts = [...temperaturesK].sort((a, b) => a - b);
  for (const T of ts) requirePositive("temperatureK", T, "K");
  const line = sweepTPRows(fluid, ts, [pressurePa], PURE, ["s"]).rows;
  const points: TemperatureEntropyPoint[] = [];
  let inserted = false;
  ts.forEach((T, i) => {
    if (sat && !inserted && T >= sat.temperatureK) {
      for (const rho of [sat.liquidDensityMolPerM3, sat.vaporDensityMolPerM3]) {
        points.push({
          temperatureK: sat.temperatureK,
          entropyJPerMolK: stateAtTRho(fluid, sat.temperatureK, rho, PURE).molar.s,
        });
      }
      inserted = true;
    }
    points.push({ temperatureK: T, entropyJPerMolK: line[i].s[0] });
  });
  return { pressurePa, points };
}

/** Isentrope of a pure fluid on P-h: h at (P, s) for each pressure, across the dome. */
export function isentropeOnPressureEnthalpy(
  fluid: FluidBinding,
  entropyJPerMolK: number,
  pressuresPa: readonly number[],
): { entropyJPerMolK: number; points: PressureEnthalpyPoint[] } {
  requireFinite("entropyJPerMolK", entropyJPerMolK, "J/(mol K)");
  const points = [...pressuresPa]
    .sort((a, b) => a - b)
    .map((P) => {
      requirePositive("pressurePa", P, "Pa");
      const r = tryPoint(() => stateAtPressureEntropy(fluid, P, entropyJPerMolK));
      const h = r === undefined ? NaN : r.kind === "two-phase" ? r.molar.h : r.state.molar.h;
      return { pressurePa: P, enthalpyJPerMol: h };
    });
  return { entropyJPerMolK, points };
}
