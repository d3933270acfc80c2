/**
 * Petroleum pseudo-component from a cut's normal boiling point and specific gravity (and optionally
 * its measured molar mass): critical constants by a chosen published correlation, the acentric
 * factor by Kesler-Lee (1976), and the ideal-gas cp by Kesler-Lee (1976). The result is an ordinary
 * Component (origin "petroleum-pseudo-component"), usable anywhere a table component is. It has no
 * formation data (NaN): use a "zero-at" reference state for its enthalpy and entropy.
 */
import { InputError, type ResultWarning } from "../errors.js";
import { requirePositive } from "../validate.js";
import { defineComponent } from "../components/defineComponent.js";
import type { Component } from "../components/types.js";
import { keslerLee1976 } from "./keslerLee.js";
import { KESLER_LEE_CP_1976, keslerLeeIdealGasCp } from "./keslerLeeCp.js";
import { leeKeslerAcentricFactor } from "./leeKeslerAcentric.js";
import {
  riaziDaubert1980,
  riaziDaubert1987,
  type FractionCriticalEstimate,
} from "./riaziDaubert.js";
import { watsonK } from "./watsonK.js";

/** Which correlation estimates Tc, Pc (and M when not given). */
export type CriticalPropertyMethod =
  "riazi-daubert-1980" | "riazi-daubert-1987" | "kesler-lee-1976";

/** Inputs of `petroleumPseudoComponent`. */
export interface PseudoComponentSpec {
  /** Id of the new component, e.g. "corvid-kero-cut-3". */
  id: string;
  /** Display name. Default: the id. */
  name?: string;
  /** Normal (atmospheric, mid-volume or mean average) boiling point of the cut, K. */
  normalBoilingPointK: number;
  /** Specific gravity at 60/60 degF (15.6 degC), dimensionless. */
  specificGravity: number;
  /** Measured molar mass, kg/mol. Default: estimated by the chosen method. */
  molarMassKgPerMol?: number;
  /** Method for Tc, Pc (and M). Default "riazi-daubert-1980". */
  criticalPropertyMethod?: CriticalPropertyMethod;
  /**
   * Compute even when Tb or SG is outside a correlation's validity range; the component then carries
   * "outside-validity" warnings. Default false (refused with OutOfRangeError).
   */
  allowOutsideRange?: boolean;
}

/**
 * Characterises a petroleum cut as a pseudo-component.
 * @example petroleumPseudoComponent({ id: "corvid-naphtha", normalBoilingPointK: 400, specificGravity: 0.74 })
 */
export function petroleumPseudoComponent(spec: PseudoComponentSpec): Component {
  const tb = requirePositive("normalBoilingPointK", spec.normalBoilingPointK, "K");
  const sg = requirePositive("specificGravity", spec.specificGravity, "-");
  const allow = spec.allowOutsideRange ?? false;
  const method = spec.criticalPropertyMethod ?? "riazi-daubert-1980";
  let estimate: FractionCriticalEstimate;
  switch (method) {
    case "riazi-daubert-1980":
      estimate = riaziDaubert1980(tb, sg, { allowOutsideRange: allow });
      break;
    case "riazi-daubert-1987":
      estimate = riaziDaubert1987(tb, sg, { allowOutsideRange: allow });
      break;
    case "kesler-lee-1976":
      estimate = keslerLee1976(tb, sg, { allowOutsideRange: allow });
      break;
    default:
      throw new InputError({
        input: "criticalPropertyMethod",
        unit: "-",
        validRange: '"riazi-daubert-1980", "riazi-daubert-1987" or "kesler-lee-1976"',
        received: method,
      });
  }
  const warnings: ResultWarning[] = [...estimate.warnings];
  const molarMass =
    spec.molarMassKgPerMol === undefined
      ? estimate.molarMassKgPerMol
      : requirePositive("molarMassKgPerMol", spec.molarMassKgPerMol, "kg/mol");
  const omega = leeKeslerAcentricFactor(
    tb,
    estimate.criticalTemperatureK,
    estimate.criticalPressurePa,
    sg,
  );
  const kw = watsonK(tb, sg);
  return defineComponent(
    {
      id: spec.id,
      name: spec.name,
      synonyms: [],
      molarMassKgPerMol: molarMass,
      criticalTemperatureK: estimate.criticalTemperatureK,
      criticalPressurePa: estimate.criticalPressurePa,
      criticalVolumeM3PerMol: estimate.criticalVolumeM3PerMol,
      acentricFactor: omega,
      normalBoilingPointK: tb,
      idealGasCp: keslerLeeIdealGasCp(kw, omega, molarMass),
      sources: {
        critical:
          `${estimate.source}; acentric factor by Kesler & Lee (1976); Tb = ${tb} K, SG = ${sg}, Kw = ${kw.toFixed(3)}` +
          (spec.molarMassKgPerMol === undefined ? "" : "; molar mass user-supplied"),
        boilingPoint: "user-supplied (characterisation input)",
        formation: "none: pseudo-component (use a zero-at reference state)",
        entropy: "none: pseudo-component (use a zero-at reference state)",
        heatCapacity: KESLER_LEE_CP_1976,
      },
      warnings,
    },
    { origin: "petroleum-pseudo-component" },
  );
}
