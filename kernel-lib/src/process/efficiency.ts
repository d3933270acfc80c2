/** Checks of the efficiencies of process steps. */
import { InputError } from "../errors.js";

/** Requires 0 < eta <= 1. */
export function checkEfficiency(input: string, value: unknown): number {
  if (!(typeof value === "number" && value > 0 && value <= 1)) {
    throw new InputError({
      input,
      unit: "-",
      validRange: "> 0 and <= 1 (a fraction, e.g. 0.78; not a percentage)",
      received: value,
      hint:
        typeof value === "number" && value > 1 && value <= 100
          ? `${value} % is ${value / 100}`
          : undefined,
    });
  }
  return value;
}

/** Exactly one of the isentropic and polytropic efficiencies. */
export function oneEfficiency(spec: {
  readonly isentropicEfficiency?: number;
  readonly polytropicEfficiency?: number;
}): { basis: "isentropic" | "polytropic"; eta: number } {
  const hasS = spec.isentropicEfficiency !== undefined;
  const hasP = spec.polytropicEfficiency !== undefined;
  if (hasS === hasP) {
    throw new InputError({
      input: "isentropicEfficiency / polytropicEfficiency",
      unit: "-",
      validRange: "exactly one of the two",
      received: {
        isentropicEfficiency: spec.isentropicEfficiency,
        polytropicEfficiency: spec.polytropicEfficiency,
      },
    });
  }
  return hasS
    ? {
        basis: "isentropic",
        eta: checkEfficiency("isentropicEfficiency", spec.isentropicEfficiency),
      }
    : {
        basis: "polytropic",
        eta: checkEfficiency("polytropicEfficiency", spec.polytropicEfficiency),
      };
}
