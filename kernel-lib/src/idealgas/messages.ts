/**
 * Warnings of the ideal-gas layer, written once here so their wording stays consistent and tests
 * can match them. Each says what is wrong and what to do.
 */
import type { ResultWarning } from "../errors.js";
import { listMolecules } from "./molecular/moleculeTable.js";

/** A temperature outside a method's range but within the allowed extrapolation margin. */
export function extrapolatedTemperatureWarning(
  componentId: string,
  method: string,
  temperatureK: number,
  range: { readonly min: number; readonly max: number },
): ResultWarning {
  return {
    code: "extrapolated",
    message:
      `${componentId}: ${kelvin(temperatureK)} K is outside the ${range.min}-${range.max} K range of its ` +
      `${method}; the value is extrapolated. Check it against another source, or use a component ` +
      `with a wider-range correlation.`,
  };
}

/** Adds a warning to a list unless an identical message is already there. */
export function pushUnique(warnings: ResultWarning[], warning: ResultWarning): void {
  if (!warnings.some((w) => w.code === warning.code && w.message === warning.message)) {
    warnings.push(warning);
  }
}

/**
 * What an engineer can do about a temperature outside a method's range beyond the allowed
 * extrapolation: the molecular route when the species has molecular constants (and the refusal came
 * from a correlation), a wider correlation, or a larger extrapolation margin (with the margin that
 * would reach the temperature asked, when one below 1 would).
 */
export function outOfRangeAdvice(
  componentId: string,
  method: string,
  range: { readonly min: number; readonly max: number },
  temperatureK: number,
): string {
  const choices: string[] = [];
  const isCorrelation = method.startsWith("heat-capacity correlation");
  if (isCorrelation && listMolecules().includes(componentId)) {
    choices.push(
      `use the statistical-mechanics route, which has molecular constants for ${componentId} ` +
        `(idealGasFromMolecule("${componentId}"), or idealGas: "molecular" in defineFluid; its ` +
        `validTemperatureK says how far down it goes)`,
    );
  }
  choices.push(
    isCorrelation
      ? `give ${componentId} a cp correlation valid at ${kelvin(temperatureK)} K (defineComponent with ` +
          `your own idealGasCp, cited)`
      : "use a model valid at this temperature",
  );
  const needed =
    temperatureK < range.min ? 1 - temperatureK / range.min : temperatureK / range.max - 1;
  const margin = Math.ceil(needed * 100) / 100;
  if (margin < 1) {
    const caution = /Benson|Joback/.test(method)
      ? " (group-contribution cp fits extrapolated below about 270 K read low: about 3-5 % at " +
        "233 K and 10 % at 200 K for the n-alkanes against Perry's Aly-Lee correlations)"
      : /Aly-Lee/.test(method) && temperatureK < range.min
        ? " (the Aly-Lee form levels off at its constant A below its range, so an extrapolated cp " +
          "reads high: for propane it read 8 % high at 150 K and 26 % high at 100 K against the " +
          "molecular route before propane got its low-temperature segment)"
        : "";
    const factory = isCorrelation ? "idealGasFromCorrelation" : "idealGasFromMolecule";
    choices.push(
      `accept an extrapolated value with a warning: ${factory}("${componentId}", ` +
        `{ extrapolationMargin: ${margin} }), and the same option to idealGasMixture${caution}`,
    );
  }
  return `To go on: ${choices.join("; or ")}`;
}

/** A temperature for a message: rounded to 1e-6 K, so 273.15 + (-80) reads 193.15, not 193.14999999999998. */
function kelvin(temperatureK: number): string {
  return String(Number(temperatureK.toFixed(6)));
}
