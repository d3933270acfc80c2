/**
 * States at (T, P) and (T, rho) as plain numbers in a caller's record, without per-state objects:
 * the lean path of the sweeps for models that offer `densityRootsInto` and `residualInto` (the
 * cubics). The same steps as stateAt.ts (roots, the choice of rootChoice.ts, the formulas of
 * properties.ts, the ideal gas of the state layer's cache), so the same numbers; what is not
 * asked for (the ideal-gas part, heat capacities) is not computed.
 */
import { R as R_CODATA } from "../constants.js";
import { OutOfRangeError, PhaseUnavailableError } from "../errors.js";
import type { ResidualDerivativesDraft, ResidualModel } from "../eos/types.js";
import { pressureFromResidual } from "../eos/residualRelations.js";
import { checkDensity, checkPressure, checkTemperature } from "./checkInputs.js";
import { chooseDensityRootInto, emptyRootChoice, type RootChoice } from "./rootChoice.js";
import { residualValuesInto, stateValuesInto, type StateValues } from "./properties.js";
import { idealGasAt, mixtureMolarMass } from "./stateAt.js";
import { phaseLabel } from "./phaseLabel.js";
import { MAX_PRESSURE_PA } from "./physicalLimits.js";
import type { FluidBinding, PhaseLabel, PhaseRequest } from "./types.js";

/** A model with the allocation-free members the lean path needs. */
export type LeanModel = ResidualModel & {
  residualInto: NonNullable<ResidualModel["residualInto"]>;
  densityRootsInto: NonNullable<ResidualModel["densityRootsInto"]>;
};

/** Whether the lean path serves this model (it offers both allocation-free members). */
export function isLeanModel(model: ResidualModel): model is LeanModel {
  return typeof model.residualInto === "function" && typeof model.densityRootsInto === "function";
}

/** Scratch of the lean path: one per caller (a sweep), reused for every state. */
export interface LeanScratch {
  readonly roots: Float64Array;
  readonly a: ResidualDerivativesDraft;
  readonly b: ResidualDerivativesDraft;
  readonly choice: RootChoice;
  /** The values of the last state. */
  readonly values: StateValues;
  /** Density of the last state, mol/m3. */
  densityMolPerM3: number;
  /** Molar mass of the last state's composition, kg/mol. */
  molarMassKgPerMol: number;
}

const draft = (): ResidualDerivativesDraft => ({
  a: 0,
  aD: 0,
  aDD: 0,
  aT: 0,
  aTT: 0,
  aDT: 0,
  aDDD: 0,
  dnA: undefined,
});

/** A fresh scratch for {@link stateValuesAtTP}. */
export function leanScratch(values: StateValues): LeanScratch {
  return {
    roots: new Float64Array(3),
    a: draft(),
    b: draft(),
    choice: emptyRootChoice(),
    values,
    densityMolPerM3: NaN,
    molarMassKgPerMol: NaN,
  };
}

/** What {@link stateValuesAtTP} computes: the departures only, or every property. */
export type LeanExtent = "residual" | "all";

/**
 * The state at T (K), P (Pa), x in the stable or requested phase into `scratch.values` (with
 * `extent` "residual": pressure, Z and the departures only); returns its phase label (the rule of
 * state/phaseLabel.ts, as stateAtTP). Throws the typed errors of stateAtTP for bad input and for
 * a missing root; the root at a phase-boundary tie is the one stateAtTP returns (no warning here).
 * The composition is not checked here: the caller checks it once for all its states.
 */
export function stateValuesAtTP(
  binding: FluidBinding & { model: LeanModel },
  temperatureK: number,
  pressurePa: number,
  x: readonly number[],
  request: PhaseRequest,
  extent: LeanExtent,
  scratch: LeanScratch,
): PhaseLabel {
  const model = binding.model;
  checkTemperature(temperatureK);
  checkPressure(pressurePa);
  const count = model.densityRootsInto(temperatureK, pressurePa, x, scratch.roots);
  const choice = scratch.choice;
  const d = chooseDensityRootInto(
    model,
    temperatureK,
    scratch.roots,
    count,
    x,
    request,
    choice,
    scratch.a,
    scratch.b,
  );
  if (d === undefined) {
    throw new PhaseUnavailableError(
      `${model.info.name} has no mechanically stable density root at T = ${temperatureK} K, P = ${pressurePa} Pa`,
    );
  }
  const rho = choice.densityMolPerM3;
  const n = choice.stableCount;
  const position: "lowest" | "highest" | "only" =
    n === 1 ? "only" : choice.index === 0 ? "lowest" : choice.index === n - 1 ? "highest" : "only";
  const Z = 1 + d.aD;
  const label = phaseLabel(model, temperatureK, pressurePa, rho, x, position, Z);
  if (n === 1 && request !== "stable" && label !== "supercritical" && label !== request) {
    throw new PhaseUnavailableError(
      `no ${request} root at T = ${temperatureK} K, P = ${pressurePa} Pa: the single stable root is ${label}-like`,
    );
  }
  fill(binding, temperatureK, rho, x, d, extent, scratch, pressurePa);
  return label;
}

/**
 * The state at T (K), rho (mol/m3), x into `scratch.values`; returns its phase label (as
 * stateAtTRho). Throws the typed errors of stateAtTRho. The composition is not checked here.
 */
export function stateValuesAtTRho(
  binding: FluidBinding & { model: LeanModel },
  temperatureK: number,
  densityMolPerM3: number,
  x: readonly number[],
  extent: LeanExtent,
  scratch: LeanScratch,
): PhaseLabel {
  const model = binding.model;
  checkTemperature(temperatureK);
  checkDensity(densityMolPerM3);
  const max = model.maxDensity(temperatureK, x);
  if (!(densityMolPerM3 < max)) {
    throw new OutOfRangeError({
      input: "densityMolPerM3",
      unit: "mol/m3",
      validRange: `below the model's maximum density ${max.toPrecision(6)} mol/m3 (${model.info.name} at ${temperatureK} K)`,
      received: densityMolPerM3,
    });
  }
  const d = scratch.a;
  model.residualInto(temperatureK, densityMolPerM3, x, d);
  const Rg = model.gasConstant ?? R_CODATA;
  const P = pressureFromResidual(temperatureK, densityMolPerM3, d.aD, Rg);
  if (!(P <= MAX_PRESSURE_PA)) {
    throw new OutOfRangeError({
      input: "densityMolPerM3",
      unit: "mol/m3",
      validRange: `a density whose pressure is at most ${MAX_PRESSURE_PA} Pa (state/physicalLimits.ts; ${model.info.name} gives P = ${P} Pa at ${temperatureK} K)`,
      received: densityMolPerM3,
    });
  }
  const label = phaseLabel(model, temperatureK, P, densityMolPerM3, x, "only", 1 + d.aD);
  fill(binding, temperatureK, densityMolPerM3, x, d, extent, scratch);
  return label;
}

function fill(
  binding: FluidBinding,
  T: number,
  rho: number,
  x: readonly number[],
  d: ResidualDerivativesDraft,
  extent: LeanExtent,
  scratch: LeanScratch,
  givenPressurePa?: number,
): void {
  const Rg = binding.model.gasConstant ?? R_CODATA;
  const v = scratch.values;
  scratch.densityMolPerM3 = rho;
  scratch.molarMassKgPerMol = mixtureMolarMass(binding, x);
  if (extent === "residual") {
    v.pressurePa = pressureFromResidual(T, rho, d.aD, Rg);
    v.Z = 1 + d.aD;
    residualValuesInto(T, d, Rg, v);
  } else {
    stateValuesInto(
      T,
      rho,
      d,
      idealGasAt(binding, T, x),
      scratch.molarMassKgPerMol,
      Rg,
      v,
      givenPressurePa,
    );
  }
}
