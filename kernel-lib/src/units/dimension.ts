/**
 * The physical dimensions the units module converts, each with its SI unit on the library's
 * molar basis (SI inside: K, Pa, mol, J, m3).
 */

/** A physical dimension known to the units module. */
export type Dimension =
  | "temperature"
  | "pressure"
  | "amount"
  | "molar-mass"
  | "molar-energy"
  | "molar-entropy"
  | "molar-volume"
  | "molar-density"
  | "speed"
  | "joule-thomson"
  | "power";

/**
 * SI unit of each dimension, the unit every value inside the library uses.
 * - "molar-energy": enthalpy, internal energy, Gibbs and Helmholtz energies per mole.
 * - "molar-entropy": entropy and heat capacities per mole.
 * - "joule-thomson": the Joule-Thomson coefficient (∂T/∂P)_H.
 */
export const SI_UNITS: Readonly<Record<Dimension, string>> = Object.freeze({
  temperature: "K",
  pressure: "Pa",
  amount: "mol",
  "molar-mass": "kg/mol",
  "molar-energy": "J/mol",
  "molar-entropy": "J/(mol K)",
  "molar-volume": "m3/mol",
  "molar-density": "mol/m3",
  speed: "m/s",
  "joule-thomson": "K/Pa",
  power: "W",
});

/** All dimensions, in a stable order. */
export const DIMENSIONS: readonly Dimension[] = Object.freeze(Object.keys(SI_UNITS) as Dimension[]);

/** Type guard: is `name` one of the known dimensions? */
export function isDimension(name: unknown): name is Dimension {
  return typeof name === "string" && (DIMENSIONS as readonly string[]).includes(name);
}
