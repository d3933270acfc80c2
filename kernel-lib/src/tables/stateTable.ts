/**
 * States, streams and process steps that table themselves: `stateTable(states)` and
 * `stepTable(steps)` return rows, columns and options ready for tableHtml, tableText, a record's
 * `results` or display's `showTable`, with sensible columns and units (T in degC, P in bar, h in
 * kJ/mol or kJ/kg, ...), the phase in words, and a note naming the reference state of h and s.
 * Columns and units stay configurable: pick columns by name, override a unit, add your own.
 */
import { InputError } from "../errors.js";
import { R } from "../constants.js";
import type { ReferenceState } from "../idealgas/types.js";
import { describeReferenceState } from "../idealgas/referenceState.js";
import { resolveUnit, type QuantityKind, type UnitChoice } from "../charts/displayUnits.js";
import { lookupFlowUnit, type FlowKind } from "../units/flow.js";
import type { NumberColumn, ResultTable, TableColumn, TableOptions } from "./columns.js";

/** Named columns of a state table. */
export type StateColumnName =
  | "name"
  | "T"
  | "P"
  | "phase"
  | "vaporFraction"
  | "density"
  | "Z"
  | "h"
  | "s"
  | "u"
  | "g"
  | "cp"
  | "cv"
  | "w"
  | "jouleThomson"
  | "hResidual"
  | "sResidual"
  | "uResidual"
  | "aResidual"
  | "gResidual"
  | "molarFlow"
  | "massFlow";

/** A column of your own: a table column plus how to get its SI value from a state. */
export type CustomStateColumn<S = TableState> = TableColumn & {
  /** The cell's value from the state (SI, molar; mass units use the row's molar mass). */
  value: (state: S, index: number) => unknown;
};

/** What can be a row: a fluid.state result, a stateAtTP result, a flash result or a stream. */
export type TableState = object;

/** Options of {@link stateTable}. */
export interface StateTableOptions<S = TableState> extends TableOptions {
  /** One name per state, shown first ("State" column). Default: streams' names, else none. */
  names?: readonly string[];
  /** Head of the name column. Default "State". */
  nameLabel?: string;
  /**
   * Columns in order, by name or your own. Default: name, T, P, phase, vapour fraction (when a
   * row has two or more phases), density, Z, h, s, and molar and mass flow for streams.
   */
  columns?: readonly (StateColumnName | CustomStateColumn<S>)[];
  /**
   * Unit of a named column, overriding the default, e.g. { P: "barg", h: "kJ/kg" }; the flows
   * take flow units: { molarFlow: "lbmol/h", massFlow: "t/h" }.
   */
  unitOf?: Partial<Record<StateColumnName, string>>;
  /**
   * Fixed decimals of a named column instead of its default significant figures, e.g.
   * { P: 1, hResidual: 1 } (a column of one unit then lines up on the decimal point).
   */
  decimalsOf?: Partial<Record<StateColumnName, number>>;
  /** Head of a named column instead of its default, e.g. { T: "Outlet T" }. */
  labelOf?: Partial<Record<StateColumnName, string>>;
  /**
   * The ideal gas the departure columns (hResidual, sResidual, uResidual, aResidual, gResidual)
   * compare with: at the same T and P (default, the engineering departure, `state.residual`) or
   * at the same T and density (`state.residualTV`). h and u are the same in both; s, a and g
   * differ by R ln Z. The note says which one the table shows.
   */
  departures?: "same-T-and-P" | "same-T-and-density";
  /** "molar" (default: h in kJ/mol, s in J/(mol K)) or "mass" (kJ/kg, kJ/(kg K)). */
  basis?: "molar" | "mass";
  /** Say the reference state of h and s in the note. Default true. */
  referenceNote?: boolean;
}

interface NamedColumn {
  label: string;
  /** Quantity kind (for `units`), and the default unit on the molar and the mass basis. */
  kind?: QuantityKind;
  molar?: string;
  mass?: string;
  digits?: number;
  decimals?: number;
  text?: true;
}

// departure heads keep "h − hⁱᵍ" on one line (no-break spaces) in a narrow notebook table
const NAMED: Readonly<Record<StateColumnName, NamedColumn>> = {
  name: { label: "State", text: true },
  T: { label: "T", kind: "temperature", molar: "degC", decimals: 2 },
  P: { label: "P", kind: "pressure", molar: "bar", digits: 5 },
  phase: { label: "Phase", text: true },
  vaporFraction: { label: "Vapour fraction", molar: "-", decimals: 4 },
  density: { label: "Density", kind: "massDensity", molar: "kg/m3", digits: 5 },
  Z: { label: "Z", molar: "-", decimals: 4 },
  h: { label: "h", kind: "molarEnergy", molar: "kJ/mol", mass: "kJ/kg", digits: 6 },
  s: { label: "s", kind: "molarEntropy", molar: "J/(mol K)", mass: "kJ/(kg K)", digits: 5 },
  u: { label: "u", kind: "molarEnergy", molar: "kJ/mol", mass: "kJ/kg", digits: 6 },
  g: { label: "g", kind: "molarEnergy", molar: "kJ/mol", mass: "kJ/kg", digits: 6 },
  cp: { label: "cp", kind: "molarEntropy", molar: "J/(mol K)", mass: "kJ/(kg K)", digits: 5 },
  cv: { label: "cv", kind: "molarEntropy", molar: "J/(mol K)", mass: "kJ/(kg K)", digits: 5 },
  w: { label: "Speed of sound", kind: "speed", molar: "m/s", digits: 4 },
  jouleThomson: { label: "Joule-Thomson", molar: "K/bar", digits: 3 },
  hResidual: {
    label: "h\u00a0−\u00a0hⁱᵍ",
    kind: "molarEnergy",
    molar: "kJ/mol",
    mass: "kJ/kg",
    digits: 5,
  },
  uResidual: {
    label: "u\u00a0−\u00a0uⁱᵍ",
    kind: "molarEnergy",
    molar: "kJ/mol",
    mass: "kJ/kg",
    digits: 5,
  },
  aResidual: {
    label: "a\u00a0−\u00a0aⁱᵍ",
    kind: "molarEnergy",
    molar: "kJ/mol",
    mass: "kJ/kg",
    digits: 5,
  },
  gResidual: {
    label: "g\u00a0−\u00a0gⁱᵍ",
    kind: "molarEnergy",
    molar: "kJ/mol",
    mass: "kJ/kg",
    digits: 5,
  },
  sResidual: {
    label: "s\u00a0−\u00a0sⁱᵍ",
    kind: "molarEntropy",
    molar: "J/(mol K)",
    mass: "kJ/(kg K)",
    digits: 5,
  },
  molarFlow: { label: "Molar flow", molar: "kmol/h", digits: 5 },
  massFlow: { label: "Mass flow", molar: "kg/h", digits: 5 },
};

/** Field of the row that holds its molar mass (for mass units). */
const MOLAR_MASS_KEY = "molarMassKgPerMol";

/** Phase words, one spelling everywhere in tables. */
const PHASE_WORDS: Readonly<Record<string, string>> = {
  vapor: "vapour",
  liquid: "liquid",
  "liquid-2": "second liquid",
  supercritical: "supercritical",
};

interface PhaseLike {
  kind: string;
  amount: number;
  state?: { molar?: Record<string, number>; densityMolPerM3?: number; molarMassKgPerMol?: number };
}

/** The overall values of one state, SI molar, and what it is. */
interface Extracted {
  row: Record<string, unknown>;
  phaseCount: number;
  referenceState?: ReferenceState;
  isStream: boolean;
}

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}

/** Reads a state, an equilibrium or a stream into SI molar row values. */
function extract(
  input: unknown,
  index: number,
  departures: StateTableOptions["departures"] = "same-T-and-P",
): Extracted {
  if (!isObject(input)) {
    throw new InputError({
      input: `states[${index}]`,
      unit: "-",
      validRange: "a state (fluid.state, stateAtTP), a flash result or a stream",
      received: input,
    });
  }
  const stream = isObject(input.state) && typeof input.molarFlowMolPerS === "number";
  const s = (stream ? input.state : input) as Record<string, unknown>;
  if (typeof s.temperatureK !== "number" || typeof s.pressurePa !== "number") {
    throw new InputError({
      input: `states[${index}]`,
      unit: "-",
      validRange: "an object with temperatureK and pressurePa (a state, flash result or stream)",
      received: Object.keys(s),
    });
  }
  const phases = Array.isArray(s.phases) ? (s.phases as PhaseLike[]) : undefined;
  const present = phases?.filter((p) => p.amount > 0) ?? [];
  const molar = isObject(s.molar) ? (s.molar as Record<string, number | undefined>) : undefined;
  // overall values: the state's own (fluid.state, stateAtTP), else summed over the phases (flash)
  const overall = (key: string): number | undefined => {
    if (molar && typeof molar[key] === "number") return molar[key];
    if (present.length === 0) return undefined;
    let sum = 0;
    for (const p of present) {
      const v = p.state?.molar?.[key];
      if (typeof v !== "number") return undefined;
      sum += p.amount * v;
    }
    return sum;
  };
  let volume = 0;
  let mass = 0;
  for (const p of present) {
    volume += p.amount / (p.state?.densityMolPerM3 ?? NaN);
    mass += p.amount * (p.state?.molarMassKgPerMol ?? NaN);
  }
  const density =
    typeof s.densityMolPerM3 === "number" ? s.densityMolPerM3 : present.length ? 1 / volume : NaN;
  const molarMass =
    typeof s.molarMassKgPerMol === "number"
      ? s.molarMassKgPerMol
      : stream && typeof input.molarMassKgPerMol === "number"
        ? input.molarMassKgPerMol
        : mass;
  const single = present.length <= 1;
  // departures: the state's own, else those of the one phase of a one-phase flash result
  const residualKey = departures === "same-T-and-density" ? "residualTV" : "residual";
  const ownResidual = isObject(s[residualKey])
    ? s[residualKey]
    : present.length === 1 && isObject(present[0].state)
      ? (present[0].state as Record<string, unknown>)[residualKey]
      : undefined;
  const residual = isObject(ownResidual) ? (ownResidual as Record<string, number>) : undefined;
  const kinds = present.map((p) => p.kind);
  const phaseWord =
    present.length > 1
      ? kinds.map((k) => PHASE_WORDS[k] ?? k).join(" + ")
      : typeof s.phase === "string"
        ? (PHASE_WORDS[s.phase] ?? s.phase)
        : kinds.length === 1
          ? (PHASE_WORDS[kinds[0]] ?? kinds[0])
          : undefined;
  const vapour =
    typeof s.vaporFraction === "number"
      ? s.vaporFraction
      : phases
        ? present.filter((p) => p.kind === "vapor").reduce((a, p) => a + p.amount, 0)
        : s.phase === "vapor"
          ? 1
          : s.phase === "liquid"
            ? 0
            : undefined;
  const flow = stream ? (input.molarFlowMolPerS as number) : undefined;
  const warnings = [
    ...(Array.isArray(s.warnings) ? s.warnings : []),
    ...(stream || !Array.isArray(input.warnings) || input === s ? [] : input.warnings),
  ];
  const row: Record<string, unknown> = {
    name: stream && typeof input.name === "string" ? input.name : undefined,
    T: s.temperatureK,
    P: s.pressurePa,
    phase: phaseWord,
    vaporFraction: vapour,
    density,
    Z: typeof s.Z === "number" ? s.Z : s.pressurePa / (density * R * s.temperatureK),
    h: overall("h"),
    s: overall("s"),
    u: overall("u"),
    g: overall("g"),
    cp: single ? overall("cp") : undefined,
    cv: single ? overall("cv") : undefined,
    w: single && typeof s.speedOfSoundMPerS === "number" ? s.speedOfSoundMPerS : undefined,
    jouleThomson:
      single && typeof s.jouleThomsonKPerPa === "number" ? s.jouleThomsonKPerPa : undefined,
    hResidual: single ? residual?.h : undefined,
    sResidual: single ? residual?.s : undefined,
    uResidual: single ? residual?.u : undefined,
    aResidual: single ? residual?.a : undefined,
    gResidual: single ? residual?.g : undefined,
    molarFlow: flow,
    massFlow: flow !== undefined ? flow * molarMass : undefined,
    [MOLAR_MASS_KEY]: molarMass,
    warnings,
  };
  const firstPhaseState = present[0]?.state as { referenceState?: ReferenceState } | undefined;
  const referenceState = isObject(s.referenceState)
    ? (s.referenceState as unknown as ReferenceState)
    : firstPhaseState?.referenceState;
  return { row, phaseCount: present.length, referenceState, isStream: stream };
}

/** The table column of a named column with its unit. */
function namedColumn(
  name: StateColumnName,
  options: StateTableOptions<never>,
  nameLabel: string,
): TableColumn {
  const spec = NAMED[name];
  if (spec === undefined) {
    throw new InputError({
      input: "options.columns",
      unit: "-",
      validRange: `column names ${Object.keys(NAMED).join(", ")}, or { key, label, value } objects`,
      received: name,
    });
  }
  const label = options.labelOf?.[name] ?? (name === "name" ? nameLabel : spec.label);
  if (spec.text) return { key: name, label, text: true };
  // a flow unit asked for: of the column's kind (molar or mass)
  if (name === "molarFlow" || name === "massFlow")
    flowUnitOf(options.unitOf?.[name], name === "molarFlow" ? "molar" : "mass", name);
  const mass = options.basis === "mass" && spec.mass !== undefined;
  const kind = spec.kind && mass ? massKind(spec.kind) : spec.kind;
  const unit =
    options.unitOf?.[name] ??
    (options.units !== undefined && kind !== undefined
      ? resolveUnit(kind, options.units as UnitChoice).id
      : mass
        ? spec.mass
        : spec.molar);
  const column: NumberColumn = {
    key: name,
    label,
    unit: unit === undefined || unit === "-" ? undefined : unit,
    molarMassKey: MOLAR_MASS_KEY,
  };
  // an overridden unit keeps the column's digits unless the default counted decimals of degC
  if (options.decimalsOf?.[name] !== undefined) column.decimals = options.decimalsOf[name];
  else if (spec.decimals !== undefined && unit === (mass ? spec.mass : spec.molar))
    column.decimals = spec.decimals;
  else column.digits = spec.digits ?? 5;
  return column;
}

/** Checks that a flow unit asked for a flow column is of its kind (molar or mass). */
function flowUnitOf(
  unit: string | undefined,
  kind: FlowKind,
  column: "molarFlow" | "massFlow",
): void {
  if (unit === undefined) return;
  const def = lookupFlowUnit(unit);
  if (def.kind !== kind) {
    throw new InputError({
      input: `options.unitOf.${column}`,
      unit: "-",
      validRange: `a ${kind} flow unit (${kind === "molar" ? "mol/s, kmol/h, lbmol/h" : "kg/s, kg/h, t/h, lb/h"})`,
      received: unit,
    });
  }
}

function massKind(kind: QuantityKind): QuantityKind {
  if (kind === "molarEnergy") return "massEnergy";
  if (kind === "molarEntropy") return "massEntropy";
  return kind;
}

/** The options every table format takes, without the state-table ones. */
function tableOptionsOf(options: TableOptions): TableOptions {
  const out: TableOptions = {};
  if (options.caption !== undefined) out.caption = options.caption;
  if (options.note !== undefined) out.note = options.note;
  if (options.units !== undefined) out.units = options.units;
  if (options.molarMassKgPerMol !== undefined) out.molarMassKgPerMol = options.molarMassKgPerMol;
  if (options.missing !== undefined) out.missing = options.missing;
  return out;
}

/** Same reference state? (compared field by field) */
function sameReference(a: ReferenceState, b: ReferenceState): boolean {
  return JSON.stringify(a) === JSON.stringify(b);
}

/** The note on the reference state of h, s, u, g of the rows. */
function referenceNote(refs: readonly (ReferenceState | undefined)[]): string | undefined {
  const known = refs.filter((r): r is ReferenceState => r !== undefined);
  if (known.length === 0) return undefined;
  const distinct: ReferenceState[] = [];
  for (const r of known) if (!distinct.some((d) => sameReference(d, r))) distinct.push(r);
  if (distinct.length === 1)
    return `h and s: ${describeReferenceState(distinct[0]).replace(/\.?$/, ".")}`;
  return (
    `h and s are NOT comparable between these rows: they are on ${distinct.length} different ` +
    `reference states (${distinct.map(describeReferenceState).join("; ")}). Put the fluids on ` +
    "one zero with sharedReferenceState(fluids) before comparing them."
  );
}

/**
 * A table of states: fluid.state or stateAtTP results, flash results, or streams (with their
 * flows). Values stay SI in the rows; the columns convert them.
 * @example
 * ```ts
 * showTable(stateTable([inlet, outlet], { names: ["suction", "discharge"] }));
 * rec.results(stateTable(states, { columns: ["name", "T", "P", "h"], unitOf: { P: "barg" } }), { caption: "States" });
 * ```
 */
export function stateTable<S extends TableState>(
  states: readonly S[],
  options: StateTableOptions<S> = {},
): ResultTable {
  if (!Array.isArray(states)) {
    throw new InputError({
      input: "states",
      unit: "-",
      validRange: "an array of states, flash results or streams",
      received: states,
    });
  }
  const names = options.names;
  if (names !== undefined && (!Array.isArray(names) || names.length !== states.length)) {
    throw new InputError({
      input: "options.names",
      unit: "-",
      validRange: `${states.length} names, one per state`,
      received: names,
    });
  }
  const departures = options.departures ?? "same-T-and-P";
  if (departures !== "same-T-and-P" && departures !== "same-T-and-density") {
    throw new InputError({
      input: "options.departures",
      unit: "-",
      validRange: '"same-T-and-P" or "same-T-and-density"',
      received: departures,
    });
  }
  const extracted = states.map((s, i) => extract(s, i, departures));
  const rows = extracted.map((e, i) => {
    const row = { ...e.row };
    if (names !== undefined) row.name = names[i];
    return row;
  });
  const hasNames = rows.some((r) => r.name !== undefined);
  const split = extracted.some((e) => e.phaseCount > 1);
  const streams = extracted.some((e) => e.isStream);
  const chosen: readonly (StateColumnName | CustomStateColumn<S>)[] = options.columns ?? [
    ...(hasNames ? (["name"] as const) : []),
    "T",
    "P",
    "phase",
    ...(split ? (["vaporFraction"] as const) : []),
    "density",
    "Z",
    "h",
    "s",
    ...(streams ? (["molarFlow", "massFlow"] as const) : []),
  ];
  const nameLabel = options.nameLabel ?? "State";
  const columns: TableColumn[] = chosen.map((c, j) => {
    if (typeof c === "string") return namedColumn(c, options, nameLabel);
    if (!isObject(c) || typeof c.value !== "function") {
      throw new InputError({
        input: `options.columns[${j}]`,
        unit: "-",
        validRange: "a column name or { key, label, value: (state, index) => value, ... }",
        received: c,
      });
    }
    const { value, ...column } = c;
    rows.forEach((row, i) => {
      row[column.key] = value(states[i], i);
    });
    return "text" in column ? column : { molarMassKey: MOLAR_MASS_KEY, ...column };
  });
  const showsEnergy = chosen.some((c) => c === "h" || c === "s" || c === "u" || c === "g");
  const showsDepartures = chosen.some((c) => typeof c === "string" && c.endsWith("Residual"));
  const note = [
    options.note,
    showsDepartures
      ? `Departures: real minus the ideal gas at the same T and ${departures === "same-T-and-P" ? "P" : "density"}.`
      : undefined,
    options.referenceNote === false || !showsEnergy
      ? undefined
      : referenceNote(extracted.map((e) => e.referenceState)),
  ]
    .filter((t) => t !== undefined)
    .join(" ");
  return {
    rows,
    columns,
    options: { ...tableOptionsOf(options), ...(note ? { note } : {}) },
  };
}

/** What a step result looks like to {@link stepTable}: a valve, compressor, turbine, ... result. */
export interface TableStep {
  kind: string;
  inlets: readonly unknown[];
  outlet: unknown;
  powerW?: number;
  dutyW?: number;
  check?: { energyBalanceRelativeError?: number };
  warnings?: readonly unknown[];
}

/** Named columns of a step table. */
export type StepColumnName =
  | "name"
  | "inletT"
  | "inletP"
  | "outletT"
  | "outletP"
  | "changeT"
  | "phase"
  | "vaporFraction"
  | "power"
  | "duty"
  | "balance"
  | "pressureRatio"
  | "isentropicEfficiency"
  | "polytropicEfficiency"
  | "polytropicExponent"
  | "polytropicHead"
  | "isentropicHead"
  | "molarFlow"
  | "massFlow";

/** A step column of your own: a table column plus how to get its SI value from a step. */
export type CustomStepColumn<S = TableStep> = TableColumn & {
  /** The cell's value from the step result (SI: K, Pa, W, J/mol). */
  value: (step: S, index: number) => unknown;
};

/** Options of {@link stepTable}. */
export interface StepTableOptions<S = TableStep> extends TableOptions {
  /** One name per step. Default: the inlet stream's name, else the step's kind. */
  names?: readonly string[];
  /** Head of the name column. Default "Step". */
  nameLabel?: string;
  /** Fixed decimals of a named column instead of its default, e.g. { power: 0, outletT: 1 }. */
  decimalsOf?: Partial<Record<StepColumnName, number>>;
  /** Head of a named column instead of its default, e.g. { outletT: "Discharge T" }. */
  labelOf?: Partial<Record<StepColumnName, string>>;
  /**
   * Columns in order, by name or your own. Default: name, inlet and outlet T and P, the change of
   * T, the outlet phase and vapour fraction, power and duty (when a step has some) and the energy
   * balance. Compressor and turbine steps also offer pressureRatio, isentropicEfficiency,
   * polytropicEfficiency, polytropicExponent, polytropicHead and isentropicHead; every step the
   * first inlet's molarFlow and massFlow.
   */
  columns?: readonly (StepColumnName | CustomStepColumn<S>)[];
  /**
   * Units, e.g. { T: "degF", P: "barg", power: "MW", head: "J/mol", massFlow: "t/h" }.
   * Defaults: degC, bar, kW, kJ/kg (per kg of the first inlet), kmol/h, kg/h.
   */
  unitOf?: {
    T?: string;
    P?: string;
    power?: string;
    head?: string;
    molarFlow?: string;
    massFlow?: string;
  };
}

/**
 * One row per process step (valve, compressor, turbine, heater, ...): inlet and outlet T and P,
 * the outlet's phases and vapour fraction, power or duty into the fluid, and the energy balance
 * the step closed; or the columns you pick (heads, efficiencies, flows, your own). For the
 * streams of one step in full, use stateTable([...r.inlets, ...r.outlets]).
 * @example
 * ```ts
 * showTable(stepTable([valveA, valveB], { names: ["PV-2104", "PV-4312"] }));
 * showTable(stepTable(train.stages, { columns: ["name", "outletT", "pressureRatio", "polytropicHead", "power"] }));
 * ```
 */
export function stepTable<S extends TableStep>(
  steps: readonly S[] | S,
  options: StepTableOptions<S> = {},
): ResultTable {
  const list = (Array.isArray(steps) ? steps : [steps]) as readonly S[];
  list.forEach((r, i) => {
    if (!isObject(r) || !Array.isArray(r.inlets) || r.inlets.length === 0 || !isObject(r.outlet)) {
      throw new InputError({
        input: `steps[${i}]`,
        unit: "-",
        validRange: "a process step result (valve, compressorStage, turbine, heater, ...)",
        received: r,
      });
    }
  });
  if (options.names !== undefined && options.names.length !== list.length) {
    throw new InputError({
      input: "options.names",
      unit: "-",
      validRange: `${list.length} names, one per step`,
      received: options.names,
    });
  }
  flowUnitOf(options.unitOf?.molarFlow, "molar", "molarFlow");
  flowUnitOf(options.unitOf?.massFlow, "mass", "massFlow");
  const numberOf = (r: object, key: string): number | undefined => {
    const v = (r as Record<string, unknown>)[key];
    return typeof v === "number" ? v : undefined;
  };
  const rows: Record<string, unknown>[] = list.map((r, i) => {
    const inlet = extract(r.inlets[0], i).row;
    const outlet = extract(r.outlet, i).row;
    const inletName = (r.inlets[0] as { name?: unknown }).name;
    return {
      name: options.names?.[i] ?? (typeof inletName === "string" ? inletName : r.kind),
      inletT: inlet.T,
      inletP: inlet.P,
      outletT: outlet.T,
      outletP: outlet.P,
      changeT: (outlet.T as number) - (inlet.T as number),
      phase: outlet.phase,
      vaporFraction: outlet.vaporFraction,
      power: r.powerW,
      duty: r.dutyW,
      balance: r.check?.energyBalanceRelativeError,
      pressureRatio: numberOf(r, "pressureRatio") ?? (outlet.P as number) / (inlet.P as number),
      isentropicEfficiency: numberOf(r, "isentropicEfficiency"),
      polytropicEfficiency: numberOf(r, "polytropicEfficiency"),
      polytropicExponent: numberOf(r, "polytropicExponent"),
      polytropicHead: numberOf(r, "polytropicHeadJPerMol"),
      isentropicHead: numberOf(r, "isentropicHeadJPerMol"),
      // flows of the first inlet, mol/s and kg/s
      molarFlow: inlet.molarFlow,
      massFlow: inlet.massFlow,
      [MOLAR_MASS_KEY]: inlet[MOLAR_MASS_KEY],
      warnings: [...(r.warnings ?? []), ...(outlet.warnings as unknown[])],
    };
  });
  const T = options.unitOf?.T ?? "degC";
  const P = options.unitOf?.P ?? "bar";
  const W = options.unitOf?.power ?? "kW";
  const head = options.unitOf?.head ?? "kJ/kg";
  const num = (key: string, label: string, unit: string | undefined, digits: number) =>
    ({ key, label, ...(unit ? { unit } : {}), digits }) as NumberColumn;
  // temperatures in degC or K to 0.01 K, like stateTable's; other units to 5 figures
  const temperature = (key: string, label: string, unit: string): NumberColumn =>
    unit === "degC" || unit === "K" ? { key, label, unit, decimals: 2 } : num(key, label, unit, 5);
  const named: Record<StepColumnName, TableColumn> = {
    name: { key: "name", label: options.nameLabel ?? "Step", text: true },
    inletT: temperature("inletT", "Inlet T", T),
    inletP: num("inletP", "Inlet P", P, 5),
    outletT: temperature("outletT", "Outlet T", T),
    outletP: num("outletP", "Outlet P", P, 5),
    changeT: { ...temperature("changeT", "Change of T", T === "degC" ? "K" : T), difference: true },
    phase: { key: "phase", label: "Outlet phase", text: true },
    vaporFraction: num("vaporFraction", "Outlet vapour fraction", undefined, 4),
    power: num("power", "Power into fluid", W, 5),
    duty: num("duty", "Duty into fluid", W, 5),
    balance: num("balance", "Energy balance closed to (relative)", undefined, 1),
    pressureRatio: num("pressureRatio", "Pressure ratio", undefined, 4),
    isentropicEfficiency: num("isentropicEfficiency", "Isentropic efficiency", undefined, 4),
    polytropicEfficiency: num("polytropicEfficiency", "Polytropic efficiency", undefined, 4),
    polytropicExponent: num("polytropicExponent", "Polytropic exponent", undefined, 4),
    polytropicHead: {
      ...num("polytropicHead", "Polytropic head", head, 5),
      molarMassKey: MOLAR_MASS_KEY,
    },
    isentropicHead: {
      ...num("isentropicHead", "Isentropic head", head, 5),
      molarMassKey: MOLAR_MASS_KEY,
    },
    molarFlow: num("molarFlow", "Inlet molar flow", options.unitOf?.molarFlow ?? "kmol/h", 5),
    massFlow: num("massFlow", "Inlet mass flow", options.unitOf?.massFlow ?? "kg/h", 5),
  };
  const chosen: readonly (StepColumnName | CustomStepColumn<S>)[] = options.columns ?? [
    "name",
    "inletT",
    "inletP",
    "outletT",
    "outletP",
    "changeT",
    "phase",
    "vaporFraction",
    // power and duty only when a step has some (a valve has neither)
    ...(rows.some((r) => !!r.power) ? (["power"] as const) : []),
    ...(rows.some((r) => !!r.duty) ? (["duty"] as const) : []),
    "balance",
  ];
  const columns: TableColumn[] = chosen.map((c, j) => {
    if (typeof c === "string") {
      const column = named[c];
      if (column === undefined) {
        throw new InputError({
          input: "options.columns",
          unit: "-",
          validRange: `column names ${Object.keys(named).join(", ")}, or { key, label, value } objects`,
          received: c,
        });
      }
      const label = options.labelOf?.[c] ?? column.label;
      const decimals = options.decimalsOf?.[c];
      if (decimals === undefined || "text" in column) return { ...column, label };
      const { digits: _digits, ...rest } = column;
      return { ...rest, label, decimals };
    }
    if (!isObject(c) || typeof c.value !== "function") {
      throw new InputError({
        input: `options.columns[${j}]`,
        unit: "-",
        validRange: "a column name or { key, label, value: (step, index) => value, ... }",
        received: c,
      });
    }
    const { value, ...column } = c;
    rows.forEach((row, i) => {
      row[column.key] = value(list[i], i);
    });
    return "text" in column ? column : { molarMassKey: MOLAR_MASS_KEY, ...column };
  });
  return { rows, columns, options: tableOptionsOf(options) };
}
