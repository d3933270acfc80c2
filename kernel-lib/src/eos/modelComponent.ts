/**
 * What an equation of state needs to know about one component: its critical constants, acentric
 * factor and molar mass. A table `Component` (components/) satisfies this type, so does a user's
 * own record or a petroleum pseudo-component; `isochor eval` builds them from `constants` overrides.
 */
import type { Component } from "../components/types.js";
import { InputError } from "../errors.js";

/** The subset of a component record the equation-of-state models read. SI units. */
export type ModelComponent = Pick<
  Component,
  | "id"
  | "criticalTemperatureK"
  | "criticalPressurePa"
  | "acentricFactor"
  | "molarMassKgPerMol"
  | "criticalVolumeM3PerMol"
>;

/**
 * Checks the constants a model is about to use, so a bad table entry or user override fails at
 * model construction with a message naming the component and the field.
 *
 * @param needVolume - true when the model uses the critical volume (virial mixing, Lee-Kesler is
 *   not one of them: it uses Zc = 0.2905 - 0.085 omega).
 */
export function checkModelComponents(
  components: readonly ModelComponent[],
  needVolume = false,
): void {
  if (!(components.length > 0)) {
    throw new InputError({
      input: "components",
      unit: "-",
      validRange: "a non-empty list of components",
      received: components.length,
    });
  }
  components.forEach((c, i) => {
    const name = `components[${i}] (${c.id})`;
    const positive: [string, number, string][] = [
      ["criticalTemperatureK", c.criticalTemperatureK, "K"],
      ["criticalPressurePa", c.criticalPressurePa, "Pa"],
      ["molarMassKgPerMol", c.molarMassKgPerMol, "kg/mol"],
    ];
    if (needVolume) positive.push(["criticalVolumeM3PerMol", c.criticalVolumeM3PerMol, "m3/mol"]);
    for (const [field, value, unit] of positive) {
      if (!(value > 0 && value < Infinity)) {
        throw new InputError({
          input: `${name}.${field}`,
          unit,
          validRange: "a finite number > 0",
          received: value,
        });
      }
    }
    if (!(c.acentricFactor > -1 && c.acentricFactor < 3)) {
      throw new InputError({
        input: `${name}.acentricFactor`,
        unit: "-",
        validRange: "between -1 and 3",
        received: c.acentricFactor,
      });
    }
  });
}
