/**
 * Builds and checks the initial state of an explorer from the caller's options: components looked
 * up in the component table (or given as records), defaults chosen from the critical constants,
 * every number checked so a bad option fails in the notebook cell, not in the page.
 *
 * Browser-safe (the Node side calls it; the page could too).
 */
import {
  DISPLAY_UNITS,
  resolveUnit,
  type QuantityKind,
  type UnitChoice,
} from "../charts/displayUnits.js";
import type { DepartureProperty } from "../charts/departures.js";
import { getComponent } from "../components/getComponent.js";
import type { Component } from "../components/types.js";
import type { CubicModelId } from "../eos/cubic/cubicFamilies.js";
import { InputError } from "../errors.js";
import { stateAtTP } from "../state/stateAt.js";
import { requireChoice, requireInRange, requirePositive } from "../validate.js";
import { DEPARTURE_PROPERTIES } from "./departureExplorer.js";
import { checkExplorerModelId, ExplorerFluids, hasReferenceEquation } from "./explorerFluids.js";
import {
  EXPLORER_KINDS,
  protocolFields,
  type DepartureExplorerState,
  type ExplorerKind,
  type ExplorerModelId,
  type ExplorerState,
  type IsothermExplorerState,
  type PressureEnthalpyExplorerState,
} from "./explorerState.js";

/** Options every explorer takes. */
export interface ExplorerOptionsBase {
  /** Component ids or names from the component table, or Component records; one for a pure fluid. */
  components: string | Component | readonly (string | Component)[];
  /**
   * Model shown first. Default: "reference" when the fluid has a reference equation, else
   * "peng-robinson".
   */
  model?: ExplorerModelId;
  /**
   * Models offered in the selector. Default: van der Waals, Redlich-Kwong, Soave-Redlich-Kwong,
   * Peng-Robinson (1976 and 1978), and "reference" where the pure fluid has a reference equation.
   */
  models?: readonly ExplorerModelId[];
  /** Chart title (plain text). Default: the diagram's name. */
  title?: string;
  /** Display units ("SI", "field", or a system with overrides). Default "SI". */
  units?: UnitChoice;
  /** Plot width, CSS px. Default 520. */
  width?: number;
  /** Plot height, CSS px. Default 340. */
  height?: number;
}

/** Options of the isotherm explorer. */
export interface IsothermExplorerOptions extends ExplorerOptionsBase {
  /** Starting temperature, K. Default: 0.9 Tc (table Tc of the first component). */
  temperatureK?: number;
  /** Slider range, K. Default [0.6 Tc, 1.4 Tc]. */
  temperatureRangeK?: readonly [number, number];
  /** Points on the isotherm. Default 400. Range 20 to 4000. */
  points?: number;
  /** Abscissa: "molarVolume" (log, default) or "density". */
  abscissa?: "molarVolume" | "density";
  /** Inside the dome: "tie-line" (stable isotherm, default) or "loop" (the model's loop). */
  insideDome?: "tie-line" | "loop";
}

/** Options of the departure explorer. */
export interface DepartureExplorerOptions extends ExplorerOptionsBase {
  /** Starting temperature, K. Default: 1.05 x the mole-fraction average of Tc. */
  temperatureK?: number;
  /** Slider range, K. Default [0.6, 2] x the average Tc. */
  temperatureRangeK?: readonly [number, number];
  /** Mole fractions (summing to 1 within 1e-9). Default: equal. */
  x?: readonly number[];
  /** Pressures, Pa, [low, high] (log spaced). Default [1e4, 3 x the average Pc]. */
  pressureRangePa?: readonly [number, number];
  /** Points on the isotherm. Default 400. */
  points?: number;
  /** Departures drawn. Default ["h", "s"]. */
  properties?: readonly DepartureProperty[];
  /** Abscissa: "pressure" (log, default) or "density". */
  abscissa?: "pressure" | "density";
}

/** Options of the P-h explorer (pure fluids). */
export interface PressureEnthalpyExplorerOptions extends ExplorerOptionsBase {
  /** State point temperature, K. Default 0.9 Tc. */
  temperatureK?: number;
  /** State point pressure, Pa. Default 0.3 Pc. */
  pressurePa?: number;
  /** Pressure axis, Pa. Default [0.01 Pc, 3 Pc]. */
  pressureRangePa?: readonly [number, number];
  /** Temperatures the typed input accepts (and the hot end of the enthalpy axis), K. Default [0.5 Tc, 1.8 Tc]. */
  temperatureRangeK?: readonly [number, number];
  /** Points on the isotherm through the point. Default 400. */
  points?: number;
  /** Enthalpy per kg (true, default) or per mole. */
  massBasis?: boolean;
}

/** Options by explorer kind. */
export interface ExplorerOptionsByKind {
  isotherms: IsothermExplorerOptions;
  departures: DepartureExplorerOptions;
  "pressure-enthalpy": PressureEnthalpyExplorerOptions;
}

const CUBICS: readonly CubicModelId[] = [
  "van-der-waals",
  "redlich-kwong",
  "soave-redlich-kwong",
  "peng-robinson",
  "peng-robinson-1978",
];

function resolveComponents(value: ExplorerOptionsBase["components"]): Component[] {
  const list = typeof value === "string" || !Array.isArray(value) ? [value] : value;
  if (list.length === 0 || list.some((c) => c === undefined || c === null)) {
    throw new InputError({
      input: "components",
      unit: "-",
      validRange: "one or more component ids or Component records",
      received: value,
    });
  }
  return (list as readonly (string | Component)[]).map((c) =>
    typeof c === "string" ? getComponent(c) : c,
  );
}

function checkRange(input: string, range: readonly number[], unit: string): [number, number] {
  if (!(
    Array.isArray(range) &&
    range.length === 2 &&
    range[0] > 0 &&
    range[1] > range[0] &&
    range[1] < Infinity
  )) {
    throw new InputError({
      input,
      unit,
      validRange: "[low, high] with 0 < low < high, finite",
      received: range,
    });
  }
  return [range[0], range[1]];
}

function checkCount(input: string, n: number, lo: number, hi: number): number {
  if (!(Number.isInteger(n) && n >= lo && n <= hi)) {
    throw new InputError({
      input,
      unit: "-",
      validRange: `an integer from ${lo} to ${hi}`,
      received: n,
    });
  }
  return n;
}

function baseState(kind: ExplorerKind, options: ExplorerOptionsBase) {
  const components = resolveComponents(options.components);
  const withReference = hasReferenceEquation(components);
  const models = (
    options.models ?? [...CUBICS, ...(withReference ? ["reference" as const] : [])]
  ).map((m, i) => checkExplorerModelId(m, components, `models[${i}]`));
  if (models.length === 0) {
    throw new InputError({
      input: "models",
      unit: "-",
      validRange: "at least one model",
      received: [],
    });
  }
  const model = checkExplorerModelId(
    options.model ??
      (withReference && models.includes("reference")
        ? "reference"
        : models.includes("peng-robinson")
          ? "peng-robinson"
          : models[0]),
    components,
  );
  if (!models.includes(model)) {
    throw new InputError({
      input: "model",
      unit: "-",
      validRange: `one of models: ${models.join(", ")}`,
      received: model,
    });
  }
  const units: UnitChoice = options.units ?? "SI";
  // throws UnknownNameError for a bad unit id of any quantity
  for (const kind of Object.keys(DISPLAY_UNITS) as QuantityKind[]) resolveUnit(kind, units);
  if (options.title !== undefined && typeof options.title !== "string") {
    throw new InputError({
      input: "title",
      unit: "-",
      validRange: "a string",
      received: options.title,
    });
  }
  const width = requireInRange("width", options.width ?? 520, "px", 120, 4000);
  const height = requireInRange("height", options.height ?? 340, "px", 80, 4000);
  return {
    ...protocolFields(kind),
    kind,
    ...(options.title !== undefined ? { title: options.title } : {}),
    components,
    models,
    model,
    units,
    width,
    height,
  };
}

function inRange(input: string, value: number, range: readonly [number, number], unit: string) {
  return requireInRange(input, value, unit, range[0], range[1]);
}

function averageCritical(components: readonly Component[], x: readonly number[]) {
  let T = 0;
  let P = 0;
  components.forEach((c, i) => {
    T += x[i] * c.criticalTemperatureK;
    P += x[i] * c.criticalPressurePa;
  });
  return { T, P };
}

function isothermState(options: IsothermExplorerOptions): IsothermExplorerState {
  const base = baseState("isotherms", options);
  const Tc = base.components[0].criticalTemperatureK;
  const range = checkRange(
    "temperatureRangeK",
    options.temperatureRangeK ?? [0.6 * Tc, 1.4 * Tc],
    "K",
  );
  const abscissa = requireChoice("abscissa", options.abscissa ?? "molarVolume", [
    "molarVolume",
    "density",
  ]);
  return {
    ...base,
    kind: "isotherms",
    temperatureK: inRange("temperatureK", options.temperatureK ?? 0.9 * Tc, range, "K"),
    temperatureRangeK: range,
    points: checkCount("points", options.points ?? 400, 20, 4000),
    abscissa,
    insideDome: requireChoice("insideDome", options.insideDome ?? "tie-line", ["tie-line", "loop"]),
  };
}

function departureState(options: DepartureExplorerOptions): DepartureExplorerState {
  const base = baseState("departures", options);
  const n = base.components.length;
  const x = options.x ? [...options.x] : base.components.map(() => 1 / n);
  const sum = x.reduce((a, b) => a + b, 0);
  if (!(x.length === n && x.every((v) => v >= 0 && v <= 1) && Math.abs(sum - 1) < 1e-9)) {
    throw new InputError({
      input: "x",
      unit: "mol/mol",
      validRange: `${n} mole fractions in [0, 1] summing to 1`,
      received: options.x,
    });
  }
  const c = averageCritical(base.components, x);
  const range = checkRange(
    "temperatureRangeK",
    options.temperatureRangeK ?? [0.6 * c.T, 2 * c.T],
    "K",
  );
  const pressures = checkRange("pressureRangePa", options.pressureRangePa ?? [1e4, 3 * c.P], "Pa");
  const properties = [...(options.properties ?? ["h", "s"])];
  const known = DEPARTURE_PROPERTIES.map((p) => p.value as string);
  if (properties.length === 0 || properties.some((p) => !known.includes(p))) {
    throw new InputError({
      input: "properties",
      unit: "-",
      validRange: 'one or more of "h", "s", "u", "a", "g"',
      received: options.properties,
    });
  }
  const abscissa = requireChoice("abscissa", options.abscissa ?? "pressure", [
    "pressure",
    "density",
  ]);
  return {
    ...base,
    kind: "departures",
    temperatureK: inRange("temperatureK", options.temperatureK ?? 1.05 * c.T, range, "K"),
    temperatureRangeK: range,
    x,
    pressureRangePa: pressures,
    points: checkCount("points", options.points ?? 400, 20, 4000),
    properties,
    abscissa,
  };
}

function pressureEnthalpyState(
  options: PressureEnthalpyExplorerOptions,
): PressureEnthalpyExplorerState {
  const base = baseState("pressure-enthalpy", options);
  if (base.components.length !== 1) {
    throw new InputError({
      input: "components",
      unit: "-",
      validRange: "one component (the P-h explorer draws a pure fluid's dome)",
      received: base.components.map((c) => c.id),
    });
  }
  const { criticalTemperatureK: Tc, criticalPressurePa: Pc } = base.components[0];
  const pressures = checkRange(
    "pressureRangePa",
    options.pressureRangePa ?? [0.01 * Pc, 3 * Pc],
    "Pa",
  );
  const temperatures = checkRange(
    "temperatureRangeK",
    options.temperatureRangeK ?? [0.5 * Tc, 1.8 * Tc],
    "K",
  );
  const T = inRange("temperatureK", options.temperatureK ?? 0.9 * Tc, temperatures, "K");
  const P = inRange("pressurePa", options.pressurePa ?? 0.3 * Pc, pressures, "Pa");
  const massBasis = options.massBasis ?? true;
  if (typeof massBasis !== "boolean") {
    throw new InputError({
      input: "massBasis",
      unit: "-",
      validRange: "true or false",
      received: massBasis,
    });
  }
  const fluids = new ExplorerFluids(base.components);
  const h = stateAtTP(fluids.fluid(base.model).binding, T, P, [1]).molar.h;
  return {
    ...base,
    kind: "pressure-enthalpy",
    pressurePa: requirePositive("pressurePa", P, "Pa"),
    enthalpyJPerMol: h,
    pressureRangePa: pressures,
    temperatureRangeK: temperatures,
    points: checkCount("points", options.points ?? 400, 20, 4000),
    massBasis,
  };
}

/**
 * The initial state of an explorer.
 * @throws InputError for a bad option (naming it), UnknownNameError for an unknown component,
 *   model or unit.
 * @example createExplorerState("isotherms", { components: "carbon dioxide", temperatureK: 290 })
 */
export function createExplorerState<K extends ExplorerKind>(
  kind: K,
  options: ExplorerOptionsByKind[K],
): ExplorerState {
  if (!EXPLORER_KINDS.includes(kind)) {
    throw new InputError({
      input: "kind",
      unit: "-",
      validRange: EXPLORER_KINDS.join(", "),
      received: kind,
    });
  }
  if (options === null || typeof options !== "object") {
    throw new InputError({
      input: "options",
      unit: "-",
      validRange: "an options object with components",
      received: options,
    });
  }
  if (kind === "isotherms") return isothermState(options as IsothermExplorerOptions);
  if (kind === "departures") return departureState(options as DepartureExplorerOptions);
  return pressureEnthalpyState(options as PressureEnthalpyExplorerOptions);
}
