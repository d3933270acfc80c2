/**
 * The fitted P-V-T surface as an engine model: it implements the ResidualModel contract of
 * eos/types.ts with closed-form reduced derivatives (virialSurface.ts), so every property the
 * engine computes (states at T and P, heat capacities, speed of sound, flash of a pure fluid) is
 * available from measured data. Outside the fitted range the model still evaluates (a polynomial
 * does), but `checkValidity` warns with the range.
 */
import type { ResidualModel } from "../eos/types.js";
import type { ResultWarning } from "../errors.js";
import { surfaceDerivatives } from "./virialSurface.js";
import type { VirialSurface } from "./virialSurface.js";

/** Options of {@link surfaceResidualModel}. */
export interface SurfaceModelOptions {
  /** Model id. Default "pvt-surface". */
  id?: string;
  /** Human name. Default "virial-type surface fitted to P-V-T data". */
  name?: string;
  /** Component ids (one for a pure fluid or a fixed-composition mixture treated as one). Default ["fluid"]. */
  componentIds?: readonly string[];
  /** Where the data came from (file, campaign), shown in the citation. */
  dataSource?: string;
  /** Gas constant used in the fit, J/(mol K). */
  gasConstant?: number;
}

/** The fitted surface as a ResidualModel (closed-form alpha_r and derivatives). */
export function surfaceResidualModel(
  surface: VirialSurface,
  options: SurfaceModelOptions = {},
): ResidualModel {
  const { minTemperatureK, maxTemperatureK, maxDensityMolPerM3 } = surface.range;
  return {
    info: {
      id: options.id ?? "pvt-surface",
      name: options.name ?? "virial-type surface fitted to P-V-T data",
      citation:
        `Fitted by isochor pvt (${surface.densityTerms} density x ${surface.temperatureTerms} temperature terms, weighted least squares)` +
        (options.dataSource ? ` to ${options.dataSource}` : ""),
      componentIds: options.componentIds ?? ["fluid"],
    },
    ...(options.gasConstant !== undefined ? { gasConstant: options.gasConstant } : {}),
    residual: (temperatureK, densityMolPerM3) =>
      surfaceDerivatives(surface, temperatureK, densityMolPerM3),
    maxDensity: () => Infinity,
    checkValidity(temperatureK, densityMolPerM3): ResultWarning[] {
      const out: ResultWarning[] = [];
      if (
        !(temperatureK >= minTemperatureK && temperatureK <= maxTemperatureK) ||
        !(densityMolPerM3 <= maxDensityMolPerM3)
      ) {
        out.push({
          code: "extrapolated",
          message: `state (${temperatureK} K, ${densityMolPerM3} mol/m3) is outside the fitted data (${minTemperatureK}-${maxTemperatureK} K, up to ${maxDensityMolPerM3.toPrecision(5)} mol/m3)`,
        });
      }
      return out;
    },
  };
}
