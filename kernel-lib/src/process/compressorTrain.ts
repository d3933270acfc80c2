/**
 * Multistage compressor train: stages (compressor.ts) with intercoolers to a set temperature
 * (the verified isothermal flash at the cooler outlet, at the stage's discharge pressure) and a
 * knock-out drum after each cooler: condensed liquid leaves as its own stream, the vapour goes on
 * to the next stage. Interstage pressures are given, or equal pressure ratios
 * (P_out / P_in)^(1/N) by default. An aftercooler (with its knock-out) after the last stage is
 * optional. The train's energy and material balances are closed over all streams.
 */
import { InputError } from "../errors.js";
import { overallProperty, type StateFlashOptions } from "../phase/flash/stateFunctionFlash.js";
import type { Equilibrium } from "../phase/flash/types.js";
import { closeBalances } from "./balance.js";
import { compressorStage, type CompressorStageResult } from "./compressor.js";
import { checkEfficiency } from "./efficiency.js";
import type { PolytropicPathOptions } from "./polytropicPath.js";
import { splitPhases, streamFromEquilibrium, type Stream } from "./stream.js";
import type { ResultWarning } from "../errors.js";
import { PROCESS_CAUTION, type StepResult } from "./types.js";
import { checkInlet } from "./valve.js";
import { checkOptionalTemperature, describePhases, processWarning } from "./warnings.js";

/** Specification of a {@link compressorTrain}. */
export interface CompressorTrainSpec {
  /** Final discharge pressure, Pa (absolute). */
  readonly outletPressurePa: number;
  /** Number of stages. Default: interstagePressuresPa.length + 1; required otherwise. */
  readonly stages?: number;
  /** Discharge pressures of every stage but the last, Pa, increasing. Default: equal ratios. */
  readonly interstagePressuresPa?: readonly number[];
  /** One for all stages or one per stage. Give this or polytropicEfficiency. */
  readonly isentropicEfficiency?: number | readonly number[];
  readonly polytropicEfficiency?: number | readonly number[];
  /** Intercooler outlet temperature, K: one for all or one per intercooler (stages - 1). */
  readonly intercoolerTemperatureK: number | readonly number[];
  /** Aftercooler outlet temperature, K (with a knock-out drum). Default: no aftercooler. */
  readonly aftercoolerTemperatureK?: number;
  readonly dischargeTemperatureLimitK?: number;
  readonly minimumDesignMetalTemperatureK?: number;
  readonly polytropic?: PolytropicPathOptions;
  readonly flash?: StateFlashOptions;
}

/** A cooler with its knock-out drum. */
export interface TrainCooler {
  /** "intercooler 1", ..., "aftercooler". */
  readonly name: string;
  /** W, negative (heat removed). */
  readonly dutyW: number;
  readonly outletTemperatureK: number;
  /** The cooled stream before the drum (may be two-phase). */
  readonly cooled: Stream;
  /** Vapour leaving the drum (undefined if everything condensed). */
  readonly vapor?: Stream;
  /** Liquid(s) leaving the drum (empty if none condensed). */
  readonly liquids: readonly Stream[];
}

/** The result of a {@link compressorTrain}. */
export interface CompressorTrainResult extends StepResult {
  readonly kind: "compressor-train";
  readonly stages: readonly CompressorStageResult[];
  readonly coolers: readonly TrainCooler[];
  /** All knock-out liquids, in order. */
  readonly knockOutLiquids: readonly Stream[];
  /** Discharge pressure of each stage, Pa. */
  readonly stagePressuresPa: readonly number[];
  /** Sum of the stages' gas powers, W. */
  readonly totalPowerW: number;
  /** Sum of the coolers' duties, W (negative). */
  readonly totalCoolerDutyW: number;
}

function perStage(
  input: string,
  v: number | readonly number[] | undefined,
  n: number,
  check: (name: string, x: number) => number,
): number[] | undefined {
  if (v === undefined) return undefined;
  if (typeof v === "number") return new Array<number>(n).fill(check(input, v));
  if (!(Array.isArray(v) && v.length === n)) {
    throw new InputError({
      input,
      unit: "-",
      validRange: `one number or ${n} numbers (one per ${input.includes("intercooler") ? "intercooler" : "stage"})`,
      received: v,
    });
  }
  return v.map((x, i) => check(`${input}[${i}]`, x));
}

function checkTemperatureK(name: string, x: number): number {
  if (!(typeof x === "number" && x > 0 && x < 5000)) {
    throw new InputError({ input: name, unit: "K", validRange: "between 0 and 5000", received: x });
  }
  return x;
}

/**
 * Compresses a stream in stages with intercooling and knock-out.
 *
 * @example
 * ```ts
 * const train = compressorTrain(recycleGas, {
 *   outletPressurePa: 90e5, stages: 2, polytropicEfficiency: 0.78,
 *   intercoolerTemperatureK: 313.15,
 * });
 * train.totalPowerW; train.knockOutLiquids;
 * ```
 * @throws InputError for bad pressures, efficiencies, temperatures or counts; SolverError from
 *   the stages, flashes or balances.
 */
export function compressorTrain(inlet: Stream, spec: CompressorTrainSpec): CompressorTrainResult {
  checkInlet(inlet);
  const P1 = inlet.state.pressurePa;
  const Pout = spec.outletPressurePa;
  if (!(typeof Pout === "number" && Pout > P1 && Pout < Infinity)) {
    throw new InputError({
      input: "outletPressurePa",
      unit: "Pa",
      validRange: `above the suction pressure ${P1} Pa`,
      received: Pout,
    });
  }
  const given = spec.interstagePressuresPa;
  const n = spec.stages ?? (given !== undefined ? given.length + 1 : undefined);
  if (!(typeof n === "number" && Number.isInteger(n) && n >= 1 && n <= 12)) {
    throw new InputError({
      input: "stages",
      unit: "-",
      validRange: "an integer from 1 to 12 (or give interstagePressuresPa)",
      received: n,
    });
  }
  let pressures: number[];
  if (given !== undefined) {
    if (!(Array.isArray(given) && given.length === n - 1)) {
      throw new InputError({
        input: "interstagePressuresPa",
        unit: "Pa",
        validRange: `${n - 1} pressures (one per stage but the last)`,
        received: given,
      });
    }
    pressures = [...given, Pout];
    let prev = P1;
    pressures.forEach((p, i) => {
      if (!(typeof p === "number" && p > prev)) {
        throw new InputError({
          input: i < n - 1 ? `interstagePressuresPa[${i}]` : "outletPressurePa",
          unit: "Pa",
          validRange: `above ${prev} Pa (pressures increase from stage to stage)`,
          received: p,
        });
      }
      prev = p;
    });
  } else {
    const r = (Pout / P1) ** (1 / n);
    pressures = Array.from({ length: n }, (_, i) => (i === n - 1 ? Pout : P1 * r ** (i + 1)));
  }
  const etaS = perStage("isentropicEfficiency", spec.isentropicEfficiency, n, checkEfficiency);
  const etaP = perStage("polytropicEfficiency", spec.polytropicEfficiency, n, checkEfficiency);
  if ((etaS === undefined) === (etaP === undefined)) {
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
  const coolT =
    n > 1
      ? perStage("intercoolerTemperatureK", spec.intercoolerTemperatureK, n - 1, checkTemperatureK)!
      : [];
  if (spec.aftercoolerTemperatureK !== undefined) {
    checkTemperatureK("aftercoolerTemperatureK", spec.aftercoolerTemperatureK);
  }
  checkOptionalTemperature("dischargeTemperatureLimitK", spec.dischargeTemperatureLimitK);
  checkOptionalTemperature("minimumDesignMetalTemperatureK", spec.minimumDesignMetalTemperatureK);

  const { fluid } = inlet;
  const stages: CompressorStageResult[] = [];
  const coolers: TrainCooler[] = [];
  const liquids: Stream[] = [];
  const path: Equilibrium[] = [];
  const warnings: ResultWarning[] = [];
  let gas = inlet;
  let totalPower = 0;
  let totalDuty = 0;
  const cool = (hot: Stream, T: number, name: string): Stream | undefined => {
    const eq = fluid.flashTP(T, hot.state.pressurePa, hot.z, spec.flash);
    const cooled = streamFromEquilibrium(fluid, hot.z, eq, hot.molarFlowMolPerS, `${name} outlet`);
    const duty =
      hot.molarFlowMolPerS * (overallProperty(eq, "h") - overallProperty(hot.state, "h"));
    const split = splitPhases(cooled, {
      vapor: `${name} drum vapour`,
      liquid: `${name} drum liquid`,
    });
    coolers.push({
      name,
      dutyW: duty,
      outletTemperatureK: T,
      cooled,
      vapor: split.vapor,
      liquids: split.liquids,
    });
    liquids.push(...split.liquids);
    totalDuty += duty;
    path.push(eq);
    if (split.liquids.length > 0) {
      warnings.push(
        processWarning(
          "knock-out-liquid",
          `${name}: ${describePhases(eq)}; the liquid (${split.liquids.map((l) => `${l.molarFlowMolPerS.toPrecision(4)} mol/s`).join(", ")}) leaves the knock-out drum as its own stream`,
          `the flash at the cooler outlet (${T} K, ${hot.state.pressurePa} Pa) found a liquid phase; the drum is taken as a perfect separator (no entrainment)`,
        ),
      );
    }
    return split.vapor;
  };
  for (let i = 0; i < n; i++) {
    const stage = compressorStage(gas, {
      outletPressurePa: pressures[i],
      isentropicEfficiency: etaS?.[i],
      polytropicEfficiency: etaP?.[i],
      dischargeTemperatureLimitK: spec.dischargeTemperatureLimitK,
      minimumDesignMetalTemperatureK: spec.minimumDesignMetalTemperatureK,
      polytropic: spec.polytropic,
      flash: spec.flash,
      outletName: `stage ${i + 1} discharge`,
    });
    stages.push(stage);
    totalPower += stage.powerW!;
    path.push(...(i === 0 ? stage.path : stage.path.slice(1)));
    warnings.push(
      ...stage.warnings.map((w) => ({ ...w, message: `stage ${i + 1}: ${w.message}` })),
    );
    const coolTo = i < n - 1 ? coolT[i] : spec.aftercoolerTemperatureK;
    if (coolTo === undefined) {
      gas = stage.outlet;
      break;
    }
    const vapor = cool(stage.outlet, coolTo, i < n - 1 ? `intercooler ${i + 1}` : "aftercooler");
    if (vapor === undefined) {
      if (i < n - 1) {
        throw new InputError({
          input: "intercoolerTemperatureK",
          unit: "K",
          validRange: "a temperature at which vapour remains for the next stage",
          received: coolTo,
          hint: `the whole stream condenses in intercooler ${i + 1} at ${pressures[i]} Pa`,
        });
      }
      gas = liquids.pop()!;
      break;
    }
    gas = vapor;
  }
  const outlet = streamFromEquilibrium(
    fluid,
    gas.z,
    gas.state,
    gas.molarFlowMolPerS,
    "train discharge",
  );
  const outlets = [outlet, ...liquids];
  const check = closeBalances("compressor train", [inlet], outlets, totalPower, totalDuty);
  return {
    kind: "compressor-train",
    inlets: [inlet],
    outlet,
    outlets,
    powerW: totalPower,
    dutyW: totalDuty,
    specificWorkJPerMol: totalPower / inlet.molarFlowMolPerS,
    path,
    warnings,
    caution: PROCESS_CAUTION,
    method:
      `${n}-stage compression from ${P1} Pa to ${Pout} Pa (stage discharges ${pressures.map((p) => p.toPrecision(6)).join(", ")} Pa, ${given ? "given" : "equal pressure ratios"}), ` +
      `${n - 1} intercooler(s)${spec.aftercoolerTemperatureK !== undefined ? " and an aftercooler" : ""} to set temperatures at the stage discharge pressure (no cooler pressure drop), each followed by a knock-out drum whose liquid leaves as its own stream. ` +
      `Each stage: ${stages[0].method} Train energy balance closed to ${check.energyBalanceRelativeError.toExponential(2)}, material balance to ${check.massBalanceRelativeError.toExponential(2)} relative.`,
    check,
    stages,
    coolers,
    knockOutLiquids: liquids,
    stagePressuresPa: pressures,
    totalPowerW: totalPower,
    totalCoolerDutyW: totalDuty,
  };
}
