/**
 * The sweep engine: many states of one fluid from a specification pair, written into typed
 * arrays. Per point the cheapest exact path is taken:
 *  - lean (models with `densityRootsInto` and `residualInto`, i.e. the cubics): the density
 *    roots, the root choice, the departures (and, only when asked, the ideal gas and the heat
 *    capacities) into reused records of plain numbers (state/stateValuesAt.ts), the same steps
 *    and formulas as stateAtTP, so the same numbers;
 *  - state: other models through stateAtTP / stateAtTRho;
 *  - flash: mixtures at (T, P) through flashTP (or a stability test first), (P, h) and (P, s)
 *    through flashPH / flashPS, pure fluids at (T, rho) inside the dome by the lever rule.
 * A failing point gets an error code and NaN properties; the sweep goes on.
 */
import { R as R_CODATA } from "../constants.js";
import {
  InputError,
  IsochorError,
  OutOfRangeError,
  PhaseUnavailableError,
  SolverError,
  type ResultWarning,
} from "../errors.js";
import type { FluidBinding, FluidState, PhaseLabel } from "../state/types.js";
import { emptyStateValues, type StateValues } from "../state/properties.js";
import { idealGasAt, mixtureMolarMass, stateAtTP, stateAtTRho } from "../state/stateAt.js";
import {
  isLeanModel,
  leanScratch,
  stateValuesAtTP,
  stateValuesAtTRho,
  type LeanExtent,
  type LeanModel,
} from "../state/stateValuesAt.js";
import { checkComposition } from "../state/checkInputs.js";
import { flashTP, type FlashOptions } from "../phase/flash/flashTP.js";
import { flashPH, flashPS } from "../phase/flash/stateFunctionFlash.js";
import type { Equilibrium } from "../phase/flash/types.js";
import { stabilityAtTP, type WilsonConstants } from "../phase/stability.js";
import { saturationAtTemperature } from "../phase/saturation.js";
import { locateCriticalPoint } from "../phase/criticalPoint.js";
import { stateAtTemperatureDensity, type TwoPhaseState } from "../phase/twoPhaseState.js";
import { axisValues } from "./axes.js";
import { CubicTPRows, isRowCubic } from "./leanRows.js";
import {
  MAX_ERROR_MESSAGES,
  SWEEP_ERROR_CODES,
  SWEEP_PHASE_KINDS,
  SWEEP_PROPERTIES,
  PER_AMOUNT,
  sweepUnit,
  type SweepErrorName,
  type SweepPhaseCheck,
  type SweepPointError,
  type SweepProperty,
  type SweepRequest,
  type SweepResult,
  type SweepSpecification,
} from "./types.js";

/** What a sweep needs of the fluid: its binding and the Wilson constants of its components. */
export interface SweepFluid {
  readonly binding: FluidBinding;
  /** Critical constants, one per component (the flashes' and stability tests' Wilson starts). */
  readonly constants: readonly WilsonConstants[];
}

/** A checked request: the point values and the property indices. */
export interface SweepPlan {
  readonly specification: SweepSpecification;
  readonly layout: "grid" | "pairs";
  readonly firstAxis: Float64Array;
  readonly secondAxis: Float64Array;
  readonly count: number;
  readonly shape: readonly [number, number];
  readonly properties: readonly SweepProperty[];
  /** Index of each requested property in SWEEP_PROPERTIES. */
  readonly propertyIds: Int32Array;
  readonly x: readonly number[];
  readonly basis: "molar" | "mass";
  readonly phaseCheck: SweepPhaseCheck;
  readonly precision: "exact" | "fast";
  readonly flash?: FlashOptions;
  readonly stateFlash?: SweepRequest["stateFlash"];
}

/** The typed arrays a range of points is written into (index 0 is the range's first point). */
export interface SweepColumns {
  readonly values: Float64Array[];
  readonly phaseCount: Uint8Array;
  readonly phaseKind: Uint8Array;
  readonly errorCode: Uint8Array;
}

const SPECIFICATIONS: readonly SweepSpecification[] = ["TP", "TRho", "PH", "PS"];

/** Checks a request (throws InputError naming the field) and lays out its points. */
export function planSweep(request: SweepRequest, componentCount: number): SweepPlan {
  if (request === null || typeof request !== "object") {
    throw new InputError({
      input: "request",
      unit: "-",
      validRange: "an object { specification, first, second, properties }",
      received: request,
    });
  }
  const specification = request.specification;
  if (!SPECIFICATIONS.includes(specification)) {
    throw new InputError({
      input: "specification",
      unit: "-",
      validRange: SPECIFICATIONS.map((s) => `"${s}"`).join(" or "),
      received: specification,
    });
  }
  const layout = request.layout ?? "grid";
  if (!(layout === "grid" || layout === "pairs")) {
    throw new InputError({
      input: "layout",
      unit: "-",
      validRange: '"grid" or "pairs"',
      received: layout,
    });
  }
  const basis = request.basis ?? "molar";
  if (!(basis === "molar" || basis === "mass")) {
    throw new InputError({
      input: "basis",
      unit: "-",
      validRange: '"molar" or "mass"',
      received: basis,
    });
  }
  const phaseCheck = request.phaseCheck ?? "flash";
  if (!(phaseCheck === "flash" || phaseCheck === "stability" || phaseCheck === "none")) {
    throw new InputError({
      input: "phaseCheck",
      unit: "-",
      validRange: '"flash" or "stability" or "none"',
      received: phaseCheck,
    });
  }
  const precision = request.precision ?? "exact";
  if (!(precision === "exact" || precision === "fast")) {
    throw new InputError({
      input: "precision",
      unit: "-",
      validRange: '"exact" or "fast"',
      received: precision,
    });
  }
  const properties = request.properties;
  if (!(Array.isArray(properties) && properties.length > 0)) {
    throw new InputError({
      input: "properties",
      unit: "-",
      validRange: `a non-empty list of ${SWEEP_PROPERTIES.join(", ")}`,
      received: properties,
    });
  }
  const propertyIds = new Int32Array(properties.length);
  properties.forEach((p, i) => {
    const id = SWEEP_PROPERTIES.indexOf(p);
    if (id < 0) {
      throw new InputError({
        input: `properties[${i}]`,
        unit: "-",
        validRange: SWEEP_PROPERTIES.join(", "),
        received: p,
      });
    }
    if (properties.indexOf(p) !== i) {
      throw new InputError({
        input: `properties[${i}]`,
        unit: "-",
        validRange: "each property once",
        received: p,
      });
    }
    propertyIds[i] = id;
  });
  let x = request.x;
  if (x === undefined) {
    if (componentCount !== 1) {
      throw new InputError({
        input: "x",
        unit: "mol/mol",
        validRange: `${componentCount} mole fractions (required for a mixture)`,
        received: x,
      });
    }
    x = [1];
  }
  checkComposition(x, componentCount);
  const firstAxis = axisValues(request.first, "first");
  const secondAxis = axisValues(request.second, "second");
  let count: number;
  let shape: [number, number];
  if (layout === "grid") {
    count = firstAxis.length * secondAxis.length;
    shape = [firstAxis.length, secondAxis.length];
  } else {
    if (firstAxis.length !== secondAxis.length) {
      throw new InputError({
        input: "second",
        unit: "-",
        validRange: `as many values as first (${firstAxis.length}) for layout "pairs"`,
        received: `${secondAxis.length} values`,
      });
    }
    count = firstAxis.length;
    shape = [count, 1];
  }
  return {
    specification,
    layout,
    firstAxis,
    secondAxis,
    count,
    shape,
    properties: properties.slice(),
    propertyIds,
    x: Array.from(x),
    basis,
    phaseCheck,
    precision,
    flash: request.flash,
    stateFlash: request.stateFlash,
  };
}

/** Typed arrays for `count` points of a plan. */
export function allocateColumns(plan: SweepPlan, count: number): SweepColumns {
  return {
    values: plan.properties.map(() => new Float64Array(count)),
    phaseCount: new Uint8Array(count),
    phaseKind: new Uint8Array(count),
    errorCode: new Uint8Array(count),
  };
}

// properties that need the ideal gas or second derivatives (the "all" extent of the lean path)
const NEEDS_ALL: ReadonlySet<SweepProperty> = new Set<SweepProperty>([
  "h",
  "s",
  "u",
  "a",
  "g",
  "cp",
  "cv",
  "w",
  "jt",
  "kappaT",
  "beta",
  "cpRes",
  "cvRes",
]);

// property ids (indices in SWEEP_PROPERTIES; a test checks the order), for the switch of the
// write loop: a literal object of constants (Object.fromEntries made a slow dictionary)
export const PROPERTY_ID = {
  T: 0,
  P: 1,
  rho: 2,
  rhoMass: 3,
  Z: 4,
  h: 5,
  s: 6,
  u: 7,
  a: 8,
  g: 9,
  cp: 10,
  cv: 11,
  w: 12,
  jt: 13,
  kappaT: 14,
  beta: 15,
  hRes: 16,
  sRes: 17,
  uRes: 18,
  aRes: 19,
  gRes: 20,
  cpRes: 21,
  cvRes: 22,
  quality: 23,
} as const;
const ID = PROPERTY_ID;

/** One point's numbers, shared by every path (a reused record of plain numbers). */
interface Point {
  readonly v: StateValues;
  T: number;
  rho: number;
  M: number;
  cpRes: number;
  quality: number;
  phaseCount: number;
  phaseKind: number;
}

function labelKind(label: PhaseLabel): number {
  return label === "vapor"
    ? SWEEP_PHASE_KINDS.vapor
    : label === "liquid"
      ? SWEEP_PHASE_KINDS.liquid
      : SWEEP_PHASE_KINDS.supercritical;
}

function labelQuality(label: PhaseLabel): number {
  return label === "vapor" ? 1 : label === "liquid" ? 0 : NaN;
}

/** A full single-phase state into the point. */
function fromState(state: FluidState, pt: Point): void {
  const v = pt.v;
  v.pressurePa = state.pressurePa;
  v.Z = state.Z;
  v.h = state.molar.h;
  v.s = state.molar.s;
  v.u = state.molar.u;
  v.a = state.molar.a;
  v.g = state.molar.g;
  v.cp = state.molar.cp;
  v.cv = state.molar.cv;
  v.hRes = state.residual.h;
  v.sTP = state.residual.s;
  v.uRes = state.residual.u;
  v.aTP = state.residual.a;
  v.gTP = state.residual.g;
  v.cvRes = state.residual.cv;
  v.speedOfSound = state.speedOfSoundMPerS;
  v.jt = state.jouleThomsonKPerPa;
  v.kappaT = state.isothermalCompressibilityPerPa;
  v.beta = state.thermalExpansionPerK;
  pt.cpRes = state.residual.cp;
  pt.T = state.temperatureK;
  pt.rho = state.densityMolPerM3;
  pt.M = state.molarMassKgPerMol;
  pt.phaseCount = 1;
  pt.phaseKind = labelKind(state.phase);
  pt.quality = labelQuality(state.phase);
}

/**
 * Overall values of several phases at T, P: h, s, u, a, g and volume add up by amount; the
 * departures are taken from the ideal gas of the feed at the same T and P; one-phase properties
 * (cp, cv, w, jt, kappa, beta) are NaN.
 */
function fromPhases(
  binding: FluidBinding,
  T: number,
  P: number,
  z: readonly number[],
  phases: readonly { amount: number; state: FluidState; kind: string }[],
  pt: Point,
): void {
  const v = pt.v;
  let h = 0;
  let s = 0;
  let u = 0;
  let volume = 0;
  let quality = 0;
  let liquids = 0;
  for (const p of phases) {
    h += p.amount * p.state.molar.h;
    s += p.amount * p.state.molar.s;
    u += p.amount * p.state.molar.u;
    volume += p.amount / p.state.densityMolPerM3;
    if (p.kind === "vapor") quality += p.amount;
    else liquids++;
  }
  const Rg = binding.model.gasConstant ?? R_CODATA;
  const ig = idealGasAt(binding, T, z);
  // the ideal gas of the feed at (T, P): s moved from the cache's pressure to P
  const sIdeal = ig.s - Rg * Math.log(P / ig.pressurePa);
  const rho = 1 / volume;
  v.pressurePa = P;
  v.Z = P / (rho * Rg * T);
  v.h = h;
  v.s = s;
  v.u = u;
  v.a = u - T * s;
  v.g = h - T * s;
  v.hRes = h - ig.h;
  v.sTP = s - sIdeal;
  v.uRes = u - ig.u;
  v.aTP = v.uRes - T * v.sTP;
  v.gTP = v.hRes - T * v.sTP;
  v.cp = NaN;
  v.cv = NaN;
  v.cvRes = NaN;
  v.speedOfSound = NaN;
  v.jt = NaN;
  v.kappaT = NaN;
  v.beta = NaN;
  pt.cpRes = NaN;
  pt.T = T;
  pt.rho = rho;
  pt.M = mixtureMolarMass(binding, z);
  pt.phaseCount = phases.length;
  pt.phaseKind =
    phases.length === 3
      ? SWEEP_PHASE_KINDS["vapor-liquid-liquid"]
      : liquids === 2
        ? SWEEP_PHASE_KINDS["liquid-liquid"]
        : SWEEP_PHASE_KINDS["vapor-liquid"];
  pt.quality = quality;
}

function fromEquilibrium(binding: FluidBinding, eq: Equilibrium, pt: Point): void {
  if (eq.phases.length === 1) {
    fromState(eq.phases[0].state, pt);
    return;
  }
  fromPhases(binding, eq.temperatureK, eq.pressurePa, eq.z, eq.phases, pt);
}

function fromTwoPhase(binding: FluidBinding, ts: TwoPhaseState, pt: Point): void {
  fromPhases(
    binding,
    ts.temperatureK,
    ts.pressurePa,
    [1],
    [
      { amount: 1 - ts.quality, state: ts.liquid, kind: "liquid" },
      { amount: ts.quality, state: ts.vapor, kind: "vapor" },
    ],
    pt,
  );
}

function errorName(e: unknown): SweepErrorName {
  if (e instanceof InputError || e instanceof OutOfRangeError) return "bad-input";
  if (e instanceof PhaseUnavailableError) return "no-phase";
  if (e instanceof SolverError) return "solver-failed";
  if (e instanceof TwoPhaseNotFlashed) return "two-phase-not-flashed";
  return "other";
}

/** A mixture (T, rho) point that is not one stable phase (no (T, V) flash yet). */
class TwoPhaseNotFlashed extends IsochorError {
  constructor(message: string) {
    super("phase-unavailable", message);
  }
}

/** Per-range state of the evaluation (caches that depend on the fluid only). */
interface RangeContext {
  readonly fluid: SweepFluid;
  readonly plan: SweepPlan;
  readonly lean: boolean;
  readonly extent: LeanExtent;
  readonly pure: boolean;
  readonly pt: Point;
  readonly scratch: ReturnType<typeof leanScratch>;
  /** Pure (T, rho): the last saturation looked up (per temperature). */
  satT: number;
  satLiquid: number;
  satVapor: number;
}

/**
 * Evaluates points [start, end) of a plan into `columns` (index 0 = point `start`), appending
 * the first failures to `errors`; `onChunk(done)` is called every `chunk` points (progress,
 * cancellation between chunks in the Node-side runner). Returns the number of failed points.
 */
export function evaluateSweepRange(
  fluid: SweepFluid,
  plan: SweepPlan,
  start: number,
  end: number,
  columns: SweepColumns,
  errors: SweepPointError[],
  onChunk?: (done: number) => void,
  chunk = 4096,
): number {
  const model = fluid.binding.model;
  const values = emptyStateValues();
  const extent: LeanExtent = plan.properties.some((p) => NEEDS_ALL.has(p)) ? "all" : "residual";
  const ctx: RangeContext = {
    fluid,
    plan,
    lean: isLeanModel(model),
    extent,
    pure: plan.x.length === 1,
    pt: {
      v: values,
      T: NaN,
      rho: NaN,
      M: NaN,
      cpRes: NaN,
      quality: NaN,
      phaseCount: 0,
      phaseKind: 0,
    },
    scratch: leanScratch(values),
    satT: NaN,
    satLiquid: NaN,
    satVapor: NaN,
  };
  const n2 = plan.secondAxis.length;
  const grid = plan.layout === "grid";
  const ids = plan.propertyIds;
  const cols = columns.values;
  const nProps = ids.length;
  const mass = plan.basis === "mass";
  const perAmount = new Uint8Array(nProps);
  for (let k = 0; k < nProps; k++) perAmount[k] = PER_AMOUNT.has(plan.properties[k]) ? 1 : 0;
  // (T, P) points of one phase of the feed of a cubic through the row kernel (leanRows.ts)
  const rows =
    plan.specification === "TP" && (ctx.pure || plan.phaseCheck === "none") && isRowCubic(model)
      ? new CubicTPRows(fluid.binding, plan, columns)
      : undefined;
  let failed = 0;
  let nextChunk = start + chunk;
  // grid position of point `start`, advanced without a division per point
  let row = grid ? Math.floor(start / n2) : 0;
  let col = grid ? start - row * n2 : 0;
  // precision "fast" on a grid: runs of a row through the row kernel's loop (fastRun), each
  // ending at the row's end, the range's end or the next progress chunk
  const runs = rows !== undefined && grid && rows.fastRuns;
  for (let i = start; i < end; i++) {
    if (runs) {
      let last = Math.min(n2, col + (end - i));
      if (onChunk !== undefined) last = Math.min(last, col + (nextChunk - i));
      const done = rows.fastRun(row, col, last, i - start);
      if (done > 0) {
        i += done;
        col += done;
        if (col === n2) {
          col = 0;
          row++;
        }
        if (onChunk !== undefined && i === nextChunk) {
          onChunk(i - start);
          nextChunk += chunk;
        }
        i--;
        continue;
      }
    }
    const local = i - start;
    // positions on the two axes (the row kernel takes them as integers: no boxed numbers)
    const ia = grid ? row : i;
    const ib = grid ? col : i;
    if (grid && ++col === n2) {
      col = 0;
      row++;
    }
    const a = plan.firstAxis[ia];
    const b = plan.secondAxis[ib];
    try {
      if (rows === undefined || !rows.point(ia, ib, local)) {
        evaluatePoint(ctx, a, b);
        const pt = ctx.pt;
        const scale = mass ? 1 / pt.M : 1;
        for (let k = 0; k < nProps; k++) {
          const value = valueOf(ids[k], pt, b, plan.specification);
          cols[k][local] = perAmount[k] === 1 && mass ? value * scale : value;
        }
        columns.phaseCount[local] = pt.phaseCount;
        columns.phaseKind[local] = pt.phaseKind;
        columns.errorCode[local] = 0;
      }
    } catch (e) {
      failed++;
      const name = errorName(e);
      for (let k = 0; k < nProps; k++) cols[k][local] = NaN;
      columns.phaseCount[local] = 0;
      columns.phaseKind[local] = SWEEP_PHASE_KINDS.none;
      columns.errorCode[local] = SWEEP_ERROR_CODES[name];
      if (errors.length < MAX_ERROR_MESSAGES) {
        errors.push({ index: i, code: name, message: e instanceof Error ? e.message : String(e) });
      }
    }
    if (onChunk !== undefined && i + 1 === nextChunk) {
      onChunk(i + 1 - start);
      nextChunk += chunk;
    }
  }
  if (onChunk !== undefined) onChunk(end - start);
  return failed;
}

function valueOf(id: number, pt: Point, second: number, spec: SweepSpecification): number {
  const v = pt.v;
  switch (id) {
    case ID.T:
      return pt.T;
    case ID.P:
      // the given pressure itself where it was given (no round trip through rho R T Z)
      return spec === "TP" ? second : v.pressurePa;
    case ID.rho:
      return pt.rho;
    case ID.rhoMass:
      return pt.rho * pt.M;
    case ID.Z:
      return v.Z;
    case ID.h:
      return v.h;
    case ID.s:
      return v.s;
    case ID.u:
      return v.u;
    case ID.a:
      return v.a;
    case ID.g:
      return v.g;
    case ID.cp:
      return v.cp;
    case ID.cv:
      return v.cv;
    case ID.w:
      return v.speedOfSound;
    case ID.jt:
      return v.jt;
    case ID.kappaT:
      return v.kappaT;
    case ID.beta:
      return v.beta;
    case ID.hRes:
      return v.hRes;
    case ID.sRes:
      return v.sTP;
    case ID.uRes:
      return v.uRes;
    case ID.aRes:
      return v.aTP;
    case ID.gRes:
      return v.gTP;
    case ID.cpRes:
      return pt.cpRes;
    case ID.cvRes:
      return v.cvRes;
    case ID.quality:
      return pt.quality;
    default:
      return NaN;
  }
}

/** The lean single-phase state at (T, P) into the point. */
function leanTP(ctx: RangeContext, T: number, P: number): void {
  const binding = ctx.fluid.binding as FluidBinding & { model: LeanModel };
  const x = ctx.plan.x;
  const pt = ctx.pt;
  const label = stateValuesAtTP(binding, T, P, x, "stable", ctx.extent, ctx.scratch);
  pt.T = T;
  pt.rho = ctx.scratch.densityMolPerM3;
  pt.M = ctx.scratch.molarMassKgPerMol;
  pt.cpRes = ctx.extent === "all" ? pt.v.cp - idealGasAt(binding, T, x).cp : NaN;
  pt.phaseCount = 1;
  pt.phaseKind = labelKind(label);
  pt.quality = labelQuality(label);
}

function singleTP(ctx: RangeContext, T: number, P: number): void {
  if (ctx.lean) leanTP(ctx, T, P);
  else fromState(stateAtTP(ctx.fluid.binding, T, P, ctx.plan.x), ctx.pt);
}

function flashOptions(ctx: RangeContext): FlashOptions {
  const o = ctx.plan.flash;
  return { ...o, stability: { constants: ctx.fluid.constants, ...o?.stability } };
}

function evaluatePoint(ctx: RangeContext, a: number, b: number): void {
  const binding = ctx.fluid.binding;
  const x = ctx.plan.x;
  switch (ctx.plan.specification) {
    case "TP": {
      if (ctx.pure || ctx.plan.phaseCheck === "none") {
        singleTP(ctx, a, b);
        return;
      }
      if (ctx.plan.phaseCheck === "stability") {
        const test = stabilityAtTP(binding.model, a, b, x, {
          constants: ctx.fluid.constants,
          ...ctx.plan.flash?.stability,
        });
        if (test.stable) {
          singleTP(ctx, a, b);
          return;
        }
      }
      fromEquilibrium(binding, flashTP(binding, a, b, x, flashOptions(ctx)), ctx.pt);
      return;
    }
    case "TRho":
      evaluateTRho(ctx, a, b);
      return;
    case "PH":
    case "PS": {
      const M = mixtureMolarMass(binding, x);
      const target = ctx.plan.basis === "mass" ? b * M : b;
      const options = {
        ...ctx.plan.stateFlash,
        stability: { constants: ctx.fluid.constants, ...ctx.plan.stateFlash?.stability },
      };
      const eq =
        ctx.plan.specification === "PH"
          ? flashPH(binding, a, target, x, options)
          : flashPS(binding, a, target, x, options);
      fromEquilibrium(binding, eq, ctx.pt);
      return;
    }
  }
}

function evaluateTRho(ctx: RangeContext, T: number, rho: number): void {
  const binding = ctx.fluid.binding;
  const x = ctx.plan.x;
  const pt = ctx.pt;
  if (ctx.pure) {
    // inside the dome: the lever rule of phase/twoPhaseState.ts; saturation looked up per T
    if (T !== ctx.satT) {
      ctx.satT = T;
      ctx.satLiquid = NaN;
      ctx.satVapor = NaN;
      if (T > 0 && T < locateCriticalPoint(binding.model).temperatureK) {
        const sat = saturationAtTemperature(binding.model, T);
        ctx.satLiquid = sat.liquidDensityMolPerM3;
        ctx.satVapor = sat.vaporDensityMolPerM3;
      }
    }
    if (rho > ctx.satVapor && rho < ctx.satLiquid) {
      const r = stateAtTemperatureDensity(binding, T, rho);
      if (r.kind === "two-phase") fromTwoPhase(binding, r, pt);
      else fromState(r.state, pt);
      return;
    }
  }
  if (ctx.lean) {
    const lb = binding as FluidBinding & { model: LeanModel };
    const label = stateValuesAtTRho(lb, T, rho, x, ctx.extent, ctx.scratch);
    pt.T = T;
    pt.rho = rho;
    pt.M = ctx.scratch.molarMassKgPerMol;
    pt.cpRes = ctx.extent === "all" ? pt.v.cp - idealGasAt(binding, T, x).cp : NaN;
    pt.phaseCount = 1;
    pt.phaseKind = labelKind(label);
    pt.quality = labelQuality(label);
  } else {
    fromState(stateAtTRho(binding, T, rho, x), pt);
  }
  if (!ctx.pure && ctx.plan.phaseCheck !== "none") {
    // one stable phase only if the mixture passes the test at (T, P) and rho is its stable root
    const P = pt.v.pressurePa;
    const test = stabilityAtTP(binding.model, T, P, x, {
      constants: ctx.fluid.constants,
      ...ctx.plan.flash?.stability,
    });
    const stableRho = test.feedDensityMolPerM3;
    if (!test.stable || !(Math.abs(stableRho - rho) <= 1e-8 * rho)) {
      throw new TwoPhaseNotFlashed(
        `the mixture at T = ${T} K, rho = ${rho} mol/m3 (P = ${P} Pa) is not one stable phase (${test.stable ? `the stable root at this T and P is ${stableRho} mol/m3` : "the tangent-plane test finds a split"}); a (T, rho) flash is not available, so the point is flagged`,
      );
    }
  }
}

/**
 * Runs a whole sweep in this thread (the Node side splits large sweeps across worker threads:
 * parallel/). Throws only for a malformed request; point failures go to `errorCode`.
 */
export function runSweep(fluid: SweepFluid, request: SweepRequest): SweepResult {
  const plan = planSweep(request, fluid.binding.model.info.componentIds.length);
  const columns = allocateColumns(plan, plan.count);
  const errors: SweepPointError[] = [];
  const failed = evaluateSweepRange(fluid, plan, 0, plan.count, columns, errors);
  return sweepResult(fluid, plan, columns, errors, failed);
}

/** The result record of a plan's columns (shared with the parallel runner). */
export function sweepResult(
  fluid: SweepFluid,
  plan: SweepPlan,
  columns: SweepColumns,
  errors: readonly SweepPointError[],
  failed: number,
): SweepResult {
  const binding = fluid.binding;
  const valuesOut: Partial<Record<SweepProperty, Float64Array>> = {};
  const units: Partial<Record<SweepProperty, string>> = {};
  plan.properties.forEach((p, k) => {
    valuesOut[p] = columns.values[k];
    units[p] = sweepUnit(p, plan.basis);
  });
  const warnings: ResultWarning[] = [];
  if (plan.x.length > 1 && plan.phaseCheck === "none") {
    warnings.push({
      code: "phase-split",
      message:
        'mixture points were not tested for a phase split (phaseCheck "none"): every point is one phase of the feed composition, which is metastable or unstable wherever the fluid splits',
    });
  }
  const isMixtureFlash = plan.x.length > 1 && plan.phaseCheck !== "none";
  const lean = isLeanModel(binding.model);
  const path =
    plan.specification === "PH" || plan.specification === "PS"
      ? "flash"
      : isMixtureFlash && plan.specification === "TP"
        ? `flash (${plan.phaseCheck})`
        : lean
          ? "lean"
          : "state";
  return {
    specification: plan.specification,
    layout: plan.layout,
    count: plan.count,
    shape: plan.shape,
    firstAxis: plan.firstAxis,
    secondAxis: plan.secondAxis,
    values: valuesOut,
    units,
    basis: plan.basis,
    phaseCount: columns.phaseCount,
    phaseKind: columns.phaseKind,
    errorCode: columns.errorCode,
    errors,
    failed,
    path,
    model: binding.model.info,
    componentIds: binding.model.info.componentIds,
    x: plan.x,
    referenceState: binding.idealGas.referenceState,
    warnings,
  };
}
