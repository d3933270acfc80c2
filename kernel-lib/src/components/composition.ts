/**
 * Mole-fraction checks shared by the ideal-gas mixture and the equation-of-state engine.
 * Mole fractions must be finite, >= 0, one per component and sum to 1 within a tolerance; they are
 * never normalised silently. `normalizeMoleFractions` does it on request.
 */
import { InputError } from "../errors.js";

/** Options for `checkMoleFractions`. */
export interface CheckMoleFractionsOptions {
  /** Name of the input in error messages. Default "x". */
  input?: string;
  /** Allowed |sum(x) - 1|. Default 1e-9. */
  tolerance?: number;
}

/**
 * Checks that x is an array of `componentCount` finite, non-negative numbers summing to 1 within
 * the tolerance; returns x unchanged. Throws InputError naming the offending entry.
 */
export function checkMoleFractions(
  x: readonly number[],
  componentCount: number,
  options: CheckMoleFractionsOptions = {},
): readonly number[] {
  const input = options.input ?? "x";
  const tolerance = options.tolerance ?? 1e-9;
  if (!Array.isArray(x)) {
    throw new InputError({
      input,
      unit: "mol/mol",
      validRange: `an array of ${componentCount} mole fractions`,
      received: x,
    });
  }
  if (x.length !== componentCount) {
    throw new InputError({
      input: `${input}.length`,
      unit: "-",
      validRange: `${componentCount} (one mole fraction per component)`,
      received: x.length,
    });
  }
  let sum = 0;
  for (let i = 0; i < x.length; i++) {
    const xi = x[i];
    if (!(typeof xi === "number" && xi >= 0 && xi <= 1)) {
      throw new InputError({
        input: `${input}[${i}]`,
        unit: "mol/mol",
        validRange: "between 0 and 1",
        received: xi,
      });
    }
    sum += xi;
  }
  if (!(Math.abs(sum - 1) <= tolerance)) {
    throw new InputError({
      input: `sum of ${input}`,
      unit: "mol/mol",
      validRange: `1 within ${tolerance}`,
      received: sum,
      hint: "Pass the fractions through normalizeMoleFractions(x) if they are amounts or rounded values",
    });
  }
  return x;
}

/**
 * Divides finite, non-negative amounts (mole fractions, moles, percentages) by their sum. Refuses
 * NaN, negative or infinite entries and an all-zero vector.
 *
 * @example normalizeMoleFractions([70, 20, 10]) // [0.7, 0.2, 0.1]
 */
export function normalizeMoleFractions(
  x: readonly number[],
  options: { input?: string } = {},
): number[] {
  const input = options.input ?? "x";
  if (!Array.isArray(x) || x.length === 0) {
    throw new InputError({
      input,
      unit: "-",
      validRange: "a non-empty array of amounts",
      received: x,
    });
  }
  let sum = 0;
  x.forEach((xi, i) => {
    if (!(typeof xi === "number" && xi >= 0 && xi < Infinity)) {
      throw new InputError({
        input: `${input}[${i}]`,
        unit: "-",
        validRange: "a finite number >= 0",
        received: xi,
      });
    }
    sum += xi;
  });
  if (!(sum > 0)) {
    throw new InputError({ input: `sum of ${input}`, unit: "-", validRange: "> 0", received: sum });
  }
  return x.map((xi) => xi / sum);
}

/**
 * Mole fractions from amounts of substance (mol): each amount finite and >= 0, total > 0.
 * @example moleFractionsFromAmounts([3, 1]) // [0.75, 0.25]
 */
export function moleFractionsFromAmounts(amountsMol: readonly number[]): number[] {
  if (!Array.isArray(amountsMol) || amountsMol.length === 0) {
    throw new InputError({
      input: "amountsMol",
      unit: "mol",
      validRange: "a non-empty array of amounts",
      received: amountsMol,
    });
  }
  let total = 0;
  amountsMol.forEach((n, i) => {
    if (!(typeof n === "number" && n >= 0 && n < Infinity)) {
      throw new InputError({
        input: `amountsMol[${i}]`,
        unit: "mol",
        validRange: "a finite number >= 0",
        received: n,
      });
    }
    total += n;
  });
  if (!(total > 0)) {
    throw new InputError({
      input: "total amount (sum of amountsMol)",
      unit: "mol",
      validRange: "> 0",
      received: total,
    });
  }
  return amountsMol.map((n) => n / total);
}
