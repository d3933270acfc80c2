/**
 * The plant warnings of process steps, each with its basis: what limit or rule it applies and
 * where that comes from. Kept in one place so every step words them alike.
 */
import type { Equilibrium } from "../phase/flash/types.js";
import { InputError } from "../errors.js";
import type { ProcessCondition, ProcessWarning } from "./types.js";

/** 0 degC, K. */
export const WATER_FREEZING_K = 273.15;

/** A process warning. */
export function processWarning(
  condition: ProcessCondition,
  message: string,
  basis: string,
): ProcessWarning {
  return { code: "process-condition", condition, message, basis };
}

const degC = (T: number): string => `${(T - 273.15).toFixed(1)} degC`;

/**
 * Is this phase a liquid? Its kind, or for a single phase also the state's own label (the flash
 * labels the one phase of a reference equation's pure fluid "vapor" even when the state says
 * "liquid": the state's label, from the fluid's own critical point, is taken then).
 */
export function isLiquidPhase(eq: Equilibrium, index: number): boolean {
  const p = eq.phases[index];
  return p.kind !== "vapor" || (eq.phases.length === 1 && p.state.phase === "liquid");
}

/** Liquid mole fraction of an equilibrium (all liquid phases). */
export function liquidFraction(eq: Equilibrium): number {
  let l = 0;
  eq.phases.forEach((p, i) => {
    if (isLiquidPhase(eq, i)) l += p.amount;
  });
  return l;
}

/**
 * Outlet temperature warnings: below 0 degC, and below the minimum design metal temperature when
 * one is given.
 */
export function temperatureWarnings(
  eq: Equilibrium,
  where: string,
  minimumDesignMetalTemperatureK: number | undefined,
): ProcessWarning[] {
  const out: ProcessWarning[] = [];
  const T = eq.temperatureK;
  if (T < WATER_FREEZING_K) {
    out.push(
      processWarning(
        "low-temperature",
        `${where} is at ${degC(T)}, below 0 degC`,
        "0 degC: free water freezes and hydrates may form in wet gas, and carbon steel loses toughness at low temperature (common practice, no source); check the equipment's minimum design metal temperature and the hydrate temperature of the stream",
      ),
    );
  }
  if (minimumDesignMetalTemperatureK !== undefined && T < minimumDesignMetalTemperatureK) {
    out.push(
      processWarning(
        "below-minimum-design-metal-temperature",
        `${where} is at ${degC(T)}, below the minimum design metal temperature ${degC(minimumDesignMetalTemperatureK)}`,
        `the minimum design metal temperature ${minimumDesignMetalTemperatureK} K given by the caller (from the equipment's design data); metal colder than its MDMT may fracture brittly: a licensed engineer must review`,
      ),
    );
  }
  return out;
}

/** Checks an optional temperature limit given by the caller. */
export function checkOptionalTemperature(input: string, value: number | undefined): void {
  if (value === undefined) return;
  if (!(typeof value === "number" && value > 0 && value < 5000)) {
    throw new InputError({
      input,
      unit: "K",
      validRange: "between 0 and 5000 (absolute)",
      received: value,
    });
  }
}

/** Checks that a step's spec is an object; `validRange` says what the step takes. */
export function requireSpecObject(spec: unknown, validRange: string): void {
  if (spec === null || typeof spec !== "object") {
    throw new InputError({ input: "spec", unit: "-", validRange, received: spec });
  }
}

/** Checks that a stream flow is positive; `input` names it, `validRange` may say why. */
export function requirePositiveFlow(input: string, flow: number, validRange = "> 0"): void {
  if (!(flow > 0)) {
    throw new InputError({ input, unit: "mol/s", validRange, received: flow });
  }
}

/** A description of the phases of an equilibrium, e.g. "vapour 0.93, liquid 0.07". */
export function describePhases(eq: Equilibrium): string {
  return eq.phases.map((p) => `${p.kind} ${p.amount.toPrecision(4)}`).join(", ");
}
