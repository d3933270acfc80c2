/**
 * Warnings of the heat-transfer steps (heater, cooler, exchanger, mixer, separator), each with
 * its basis: the limit applied and where it comes from.
 */
import type { ProcessCondition, ProcessWarning } from "./types.js";

/** 0 degC, K. */
const FREEZING_K = 273.15;

/** A process warning with its condition and basis. */
export function processWarning(
  condition: ProcessCondition,
  message: string,
  basis: string,
): ProcessWarning {
  return { code: "process-condition", condition, message: `${message} (basis: ${basis})`, basis };
}

/**
 * Warnings on an outlet temperature: below 0 degC, and below a given minimum design metal
 * temperature (MDMT).
 * @param where e.g. "cooler outlet".
 */
export function outletTemperatureWarnings(
  where: string,
  temperatureK: number,
  minimumDesignMetalTemperatureK: number | undefined,
): ProcessWarning[] {
  const out: ProcessWarning[] = [];
  const degC = (T: number) => `${(T - FREEZING_K).toFixed(1)} degC`;
  if (temperatureK < FREEZING_K) {
    out.push(
      processWarning(
        "low-temperature",
        `${where} at ${temperatureK.toFixed(2)} K (${degC(temperatureK)}) is below 0 degC: free water freezes, hydrates may form in wet gas, and the metal is cold`,
        "0 degC, the freezing point of water (common practice, no source)",
      ),
    );
  }
  if (
    minimumDesignMetalTemperatureK !== undefined &&
    temperatureK < minimumDesignMetalTemperatureK
  ) {
    out.push(
      processWarning(
        "below-minimum-design-metal-temperature",
        `${where} at ${temperatureK.toFixed(2)} K (${degC(temperatureK)}) is below the minimum design metal temperature ${minimumDesignMetalTemperatureK.toFixed(2)} K (${degC(minimumDesignMetalTemperatureK)}); check the equipment and piping material with the site's codes`,
        "the minimum design metal temperature given in the specification",
      ),
    );
  }
  return out;
}
