/**
 * Saturated-liquid molar volume by the modified Rackett equation (Spencer & Danner, J. Chem. Eng.
 * Data 17 (1972) 236-241, from Rackett, J. Chem. Eng. Data 15 (1970) 514):
 *   V_s = (R Tc / Pc) Z_RA^(1 + (1 - Tr)^(2/7)),   Tr = T / Tc,
 * with the Rackett compressibility Z_RA fitted to liquid densities (data/rackett.json) or, for a
 * component not listed, estimated by Z_RA = 0.29056 - 0.08775 omega (Yamada & Gunn, J. Chem. Eng.
 * Data 18 (1973) 234). Accuracy (from memory of Spencer & Danner 1972 and of Poling, Prausnitz &
 * O'Connell 2001, ch. 4): about 1 % for non-polar liquids from the triple point to Tr = 0.95 with a
 * fitted Z_RA, a few per cent with the estimate; poorer near the critical point.
 */
import rackett from "./data/rackett.json";
import { R } from "../constants.js";
import { InputError } from "../errors.js";
import type { Component } from "./types.js";

/** A Rackett compressibility factor and where it came from. */
export interface RackettCompressibility {
  /** Z_RA, dimensionless. */
  readonly value: number;
  /** "table" (data/rackett.json) or "yamada-gunn" (estimated from the acentric factor). */
  readonly basis: "table" | "yamada-gunn";
  /** Citation text. */
  readonly source: string;
}

/** What the Rackett equation reads from a component. */
export type RackettComponent = Pick<
  Component,
  "id" | "criticalTemperatureK" | "criticalPressurePa" | "acentricFactor"
>;

const VALUES = rackett.values as Record<string, number>;

/** Z_RA of a component: the table's value when listed, the Yamada-Gunn estimate otherwise. */
export function rackettCompressibility(component: RackettComponent): RackettCompressibility {
  const listed = VALUES[component.id];
  if (listed !== undefined) return { value: listed, basis: "table", source: rackett.source };
  const w = component.acentricFactor;
  if (!(w > -1 && w < 3)) {
    throw new InputError({
      input: `${component.id}.acentricFactor`,
      unit: "-",
      validRange: "-1 < omega < 3",
      received: w,
    });
  }
  return {
    value: 0.29056 - 0.08775 * w,
    basis: "yamada-gunn",
    source:
      "estimated: Z_RA = 0.29056 - 0.08775 omega (Yamada & Gunn, J. Chem. Eng. Data 18 (1973) 234)",
  };
}

/** Options of {@link rackettSaturatedLiquidVolume}. */
export interface RackettOptions {
  /** Z_RA to use instead of the table's value or estimate (e.g. fitted to the plant's own data). */
  readonly rackettZ?: number;
}

/**
 * Saturated-liquid molar volume, m3/mol, at T (K) below the critical temperature.
 *
 * @throws InputError for T not in (0, Tc) or a Z_RA not in (0.1, 0.4).
 * @example rackettSaturatedLiquidVolume(getComponent("propane"), 298.15) // 8.96e-5 m3/mol (492 kg/m3)
 */
export function rackettSaturatedLiquidVolume(
  component: RackettComponent,
  temperatureK: number,
  options: RackettOptions = {},
): number {
  const Tc = component.criticalTemperatureK;
  if (!(temperatureK > 0 && temperatureK < Tc)) {
    throw new InputError({
      input: "temperatureK",
      unit: "K",
      validRange: `between 0 and the critical temperature of ${component.id}, ${Tc} K (saturated liquid)`,
      received: temperatureK,
    });
  }
  const z = options.rackettZ ?? rackettCompressibility(component).value;
  if (!(z > 0.1 && z < 0.4)) {
    throw new InputError({
      input: "rackettZ",
      unit: "-",
      validRange: "0.1 < Z_RA < 0.4",
      received: z,
    });
  }
  const tau = 1 - temperatureK / Tc;
  return ((R * Tc) / component.criticalPressurePa) * Math.pow(z, 1 + Math.pow(tau, 2 / 7));
}
