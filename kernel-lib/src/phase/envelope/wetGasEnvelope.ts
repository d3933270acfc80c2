/**
 * The phase boundaries of a gas that carries water. Water and hydrocarbons are nearly immiscible
 * as liquids, so a wet gas has three phases (vapour, hydrocarbon liquid, aqueous liquid) over much
 * of the region where a dry gas has two, and the single envelope of phaseEnvelope.ts stops at its
 * first point (a third phase, water, has a negative tangent-plane distance there). This traces
 * what an engineer reads instead:
 *
 * - the hydrocarbon envelope of the water-free feed (phaseEnvelope.ts on z without water,
 *   renormalised): where the hydrocarbon liquid appears. With free water present the vapour also
 *   holds water at its saturation content (of order 1e-3 mole fraction at plant conditions),
 *   which moves this line a little; `threePhaseCheck` puts a number on it at given points;
 * - the water dew line of the wet feed: dew points whose incipient liquid is aqueous, by
 *   Michelsen's saturation equations (saturationPoint.ts) started from nearly pure water at
 *   Wilson's estimate of the water dew temperature, z_w P = P_sat,w(T). Each point is verified
 *   (equal fugacity, in the solver) and bracketed by two flashes (flash/flashTP.ts, verified):
 *   a little colder the feed is vapour + aqueous liquid, a little warmer it is one phase, when the
 *   water dew point is the outer boundary; when the warmer flash already holds a hydrocarbon
 *   liquid, the water dew point lies inside the hydrocarbon two-phase region and the point says
 *   so (`outerBoundary` false).
 *
 * Methods: M. L. Michelsen, Fluid Phase Equilib. 4 (1980) 1-10 (saturation points) and 9 (1982)
 * 1-19 and 21-40 (stability test, flash); Wilson's K-factors (wilson.ts). Hydrates are not
 * modelled: where water and low temperature meet, a hydrate may form above every line drawn here.
 */
import {
  InputError,
  PhaseUnavailableError,
  SolverError,
  type ResultWarning,
} from "../../errors.js";
import type { ModelInfo } from "../../eos/types.js";
import type { FluidBinding } from "../../state/types.js";
import { requirePositive } from "../../validate.js";
import { flashTP } from "../flash/flashTP.js";
import type { Equilibrium } from "../flash/types.js";
import { wilsonLnReducedVaporPressure } from "../wilson.js";
import { dewPointAtPressure } from "./bubbleDew.js";
import { phaseEnvelope, type PhaseEnvelope, type PhaseEnvelopeOptions } from "./phaseEnvelope.js";
import { modelConstants, saturationSystemOf } from "./saturationStarts.js";

/** Options of {@link wetGasEnvelope}. */
export interface WetGasEnvelopeOptions extends PhaseEnvelopeOptions {
  /** Index of water in the model's components. Default: the component with id "water". */
  waterIndex?: number;
  /**
   * Pressures of the water dew line, Pa, ascending. Default: 25 pressures spaced evenly in ln P
   * from the minimum pressure of the envelope to 200 bar (or its maximum pressure, if lower).
   */
  waterDewPressuresPa?: readonly number[];
  /** Temperature offset of the two flashes that bracket each water dew point, K. Default 0.05. */
  bracketK?: number;
}

/** How the feed splits in a flash a little off a water dew point. */
export interface BracketFlash {
  /** K */
  readonly T: number;
  /** Phase kinds and amounts (mol per mol of feed), lightest first. */
  readonly phases: readonly { kind: string; amount: number; water: number }[];
}

/** A verified water dew point of the wet feed. */
export interface WaterDewPoint {
  /** K */
  readonly T: number;
  /** Pa */
  readonly P: number;
  /** Composition of the incipient aqueous liquid (model order). */
  readonly incipient: readonly number[];
  /** max |ln f_i(vapour) - ln f_i(aqueous)| recomputed by the solver. */
  readonly fugacityResidual: number;
  /** The flash `bracketK` colder: vapour + aqueous liquid (+ hydrocarbon liquid inside that region). */
  readonly colder: BracketFlash;
  /** The flash `bracketK` warmer: one phase when this point is on the outer boundary. */
  readonly warmer: BracketFlash;
  /**
   * True when the feed is one phase just above this point: the water dew point is where the first
   * liquid appears on cooling. False: a hydrocarbon liquid is already there (see `note`).
   */
  readonly outerBoundary: boolean;
  readonly note?: string;
}

/** The phase boundaries of a wet gas. */
export interface WetGasEnvelope {
  /** Feed mole fractions (normalised, model order). */
  readonly z: readonly number[];
  readonly waterIndex: number;
  /** Water-free feed (water set to 0, the rest renormalised), model order. */
  readonly dryFeed: readonly number[];
  /** Phase envelope of the water-free feed: where the hydrocarbon liquid appears. */
  readonly hydrocarbon: PhaseEnvelope;
  /** Water dew points in order of pressure. */
  readonly waterDewLine: readonly WaterDewPoint[];
  /** Pressures where no water dew point was found, with the reason. */
  readonly waterDewMissing: readonly { P: number; reason: string }[];
  readonly method: string;
  readonly model: ModelInfo;
  readonly warnings: readonly ResultWarning[];
}

const METHOD =
  "hydrocarbon envelope of the water-free feed (Michelsen 1980 continuation) + water dew points of the wet feed (Michelsen 1980 saturation equations from an aqueous start), each bracketed by verified flashes (Michelsen 1982)";

// an incipient liquid with at least this much water is "aqueous" (common practice, no source:
// PR with the table's k_ij puts hydrocarbons in water at 1e-5 to 1e-3 mole fraction)
const AQUEOUS_WATER_FRACTION = 0.5;

// water's triple-point temperature (ITS-90 fixed point, by definition of the kelvin before 2019)
const WATER_TRIPLE_K = 273.16;

const HYDRATE_NOTE =
  "hydrates are not modelled: a gas hydrate can form where free water meets low temperature, at temperatures well above the lines drawn here; check hydrate formation separately";

function bracket(eq: Equilibrium, water: number): BracketFlash {
  return {
    T: eq.temperatureK,
    phases: eq.phases.map((p) => ({
      kind: p.kind,
      amount: p.amount,
      water: p.state.x[water],
    })),
  };
}

function tryFlash(
  binding: FluidBinding,
  T: number,
  P: number,
  z: readonly number[],
  constants: Parameters<typeof flashTP>[4],
): Equilibrium | string {
  try {
    return flashTP(binding, T, P, z, constants);
  } catch (e) {
    if (e instanceof SolverError || e instanceof PhaseUnavailableError) return e.message;
    throw e;
  }
}

/**
 * The hydrocarbon envelope (water-free basis) and the water dew line of a wet gas z.
 *
 * @example
 * ```ts
 * const wet = wetGasEnvelope(gas, z);
 * wet.hydrocarbon.cricondentherm; wet.waterDewLine[0].T;
 * ```
 * @throws InputError when z holds no water or no hydrocarbon, or for bad options.
 */
export function wetGasEnvelope(
  binding: FluidBinding,
  z: readonly number[],
  options: WetGasEnvelopeOptions = {},
): WetGasEnvelope {
  const ids = binding.model.info.componentIds;
  const water = options.waterIndex ?? ids.indexOf("water");
  if (!(Number.isInteger(water) && water >= 0 && water < ids.length)) {
    throw new InputError({
      input: "options.waterIndex",
      unit: "-",
      validRange: `the index of water among the components (0 to ${ids.length - 1}); no component "water" found`,
      received: options.waterIndex,
    });
  }
  const sys = saturationSystemOf(binding, z, 1);
  const feed = sys.z;
  const zw = feed[water];
  if (!(zw > 0 && zw < 1)) {
    throw new InputError({
      input: `z[${water}] (water)`,
      unit: "mol/mol",
      validRange: "strictly between 0 and 1 (a gas with water and at least one other component)",
      received: zw,
    });
  }
  const bracketK = requirePositive("options.bracketK", options.bracketK ?? 0.05, "K");
  const constants = modelConstants(binding, options.constants);
  const flashOptions = constants ? { stability: { constants } } : {};
  const warnings: ResultWarning[] = [{ code: "model-limitation", message: HYDRATE_NOTE }];

  const dryFeed = feed.map((v, i) => (i === water ? 0 : v / (1 - zw)));
  const envelopeOptions: PhaseEnvelopeOptions = { ...options };
  delete (envelopeOptions as WetGasEnvelopeOptions).waterIndex;
  delete (envelopeOptions as WetGasEnvelopeOptions).waterDewPressuresPa;
  delete (envelopeOptions as WetGasEnvelopeOptions).bracketK;
  const hydrocarbon = phaseEnvelope(binding, dryFeed, envelopeOptions);
  for (const w of hydrocarbon.warnings) {
    warnings.push({ code: w.code, message: `hydrocarbon envelope (water-free): ${w.message}` });
  }

  const minP = options.minimumPressurePa ?? 1e5;
  const topP = Math.min(options.maximumPressurePa ?? 1e8, 2e7);
  const pressures = options.waterDewPressuresPa
    ? [...options.waterDewPressuresPa]
    : Array.from({ length: 25 }, (_, k) => minP * Math.pow(topP / minP, k / 24));
  pressures.forEach((P, k) => {
    requirePositive(`options.waterDewPressuresPa[${k}]`, P, "Pa");
    if (k > 0 && !(P > pressures[k - 1])) {
      throw new InputError({
        input: `options.waterDewPressuresPa[${k}]`,
        unit: "Pa",
        validRange: `above the pressure before it (${pressures[k - 1]} Pa): ascending`,
        received: P,
      });
    }
  });

  const wc = constants?.[water];
  const waterDewLine: WaterDewPoint[] = [];
  const waterDewMissing: { P: number; reason: string }[] = [];
  /** A verified, bracketed water dew point at P from a start (T, incipient), or why not. */
  const waterDewAt = (
    P: number,
    T0: number | undefined,
    x: readonly number[],
  ): WaterDewPoint | string => {
    const kFactors = feed.map((v, i) => Math.max(v, 1e-300) / Math.max(x[i], 1e-300));
    let point;
    try {
      point = dewPointAtPressure(binding, P, feed, {
        ...(constants ? { constants } : {}),
        start: { ...(T0 !== undefined ? { temperatureK: T0 } : {}), kFactors },
      });
    } catch (e) {
      if (!(e instanceof SolverError || e instanceof PhaseUnavailableError)) throw e;
      return e.message;
    }
    const incipient = point.incipient ?? point.liquid.x;
    if (!(incipient[water] >= AQUEOUS_WATER_FRACTION)) {
      return `the dew point found at ${point.temperatureK.toPrecision(6)} K has a hydrocarbon incipient liquid (water ${incipient[water].toPrecision(3)}), not an aqueous one`;
    }
    const T = point.temperatureK;
    const cold = tryFlash(binding, T - bracketK, P, feed, flashOptions);
    const warm = tryFlash(binding, T + bracketK, P, feed, flashOptions);
    if (typeof cold === "string" || typeof warm === "string") {
      return `water dew point at ${T.toPrecision(6)} K found, but a bracketing flash failed: ${typeof cold === "string" ? cold : warm}`;
    }
    const coldHasAqueous = cold.phases.some(
      (p) => p.kind !== "vapor" && p.state.x[water] >= AQUEOUS_WATER_FRACTION,
    );
    const warmOne = warm.phases.length === 1;
    let note: string | undefined;
    if (!coldHasAqueous) {
      note = `the flash ${bracketK} K colder (${cold.phases.map((p) => p.kind).join(" + ")}) holds no aqueous liquid`;
    } else if (!warmOne) {
      note = `at ${T.toPrecision(6)} K, ${P.toPrecision(6)} Pa the feed already holds a hydrocarbon liquid ${bracketK} K warmer (${warm.phases.map((p) => `${p.kind} ${p.amount.toPrecision(3)}`).join(", ")}): the water dew point lies inside the hydrocarbon two-phase region, and the first liquid on cooling there is hydrocarbon`;
    }
    return {
      T,
      P,
      incipient,
      fugacityResidual: point.fugacityResidual,
      colder: bracket(cold, water),
      warmer: bracket(warm, water),
      outerBoundary: coldHasAqueous && warmOne,
      ...(note ? { note } : {}),
    };
  };

  let previous: WaterDewPoint | undefined;
  for (const P of pressures) {
    // start: the previous point, else Wilson's water dew temperature, z_w P = P_sat,w(T), with a
    // nearly pure water incipient liquid
    let T0: number | undefined = previous?.T;
    if (T0 === undefined && wc) {
      // ln(z_w P / Pc) = c (1 - Tc / T) solved for T, with Wilson's c = 5.373 (1 + omega) read
      // from wilson.ts as minus its value at T = Tc / 2
      const c = -wilsonLnReducedVaporPressure(
        wc.criticalTemperatureK / 2,
        wc.criticalTemperatureK,
        wc.acentricFactor,
      );
      T0 = wc.criticalTemperatureK / (1 - Math.log((zw * P) / wc.criticalPressurePa) / c);
    }
    const x = previous
      ? previous.incipient.slice()
      : feed.map((v, i) => (i === water ? 0 : Math.max(v * 1e-4, 1e-12)));
    if (!previous) x[water] = 1 - x.reduce((a, b) => a + b, 0);
    const found = waterDewAt(P, T0, x);
    if (typeof found === "string") {
      waterDewMissing.push({ P, reason: found });
      previous = undefined;
      continue;
    }
    waterDewLine.push(found);
    previous = found;
  }
  // a second pass for the pressures where the first start fell on a hydrocarbon dew point or
  // failed: started from the nearest verified water dew point (continuation in ln P)
  if (waterDewMissing.length > 0 && waterDewLine.length > 0) {
    const retry = waterDewMissing.splice(0, waterDewMissing.length);
    for (const miss of retry) {
      const near = waterDewLine.reduce((a, b) =>
        Math.abs(Math.log(b.P / miss.P)) < Math.abs(Math.log(a.P / miss.P)) ? b : a,
      );
      const found = waterDewAt(miss.P, near.T, near.incipient);
      if (typeof found === "string")
        waterDewMissing.push({
          P: miss.P,
          reason: `${miss.reason}; from the nearest water dew point: ${found}`,
        });
      else waterDewLine.push(found);
    }
    waterDewLine.sort((a, b) => a.P - b.P);
  }
  const belowTriple = waterDewLine.filter((p) => p.T < WATER_TRIPLE_K);
  if (belowTriple.length > 0) {
    warnings.push({
      code: "model-limitation",
      message: `water dew line: ${belowTriple.length} point(s) lie below water's triple point (273.16 K), from ${belowTriple[0].T.toPrecision(5)} K at ${belowTriple[0].P.toPrecision(4)} Pa: there the equation of state gives the dew point of supercooled liquid water, while the real deposit is ice or hydrate (neither is modelled)`,
    });
  }
  if (waterDewMissing.length > 0) {
    warnings.push({
      code: "model-limitation",
      message: `water dew line: no verified point at ${waterDewMissing.length} of ${pressures.length} pressures (first at ${waterDewMissing[0].P.toPrecision(4)} Pa: ${waterDewMissing[0].reason})`,
    });
  }
  const inside = waterDewLine.filter((p) => !p.outerBoundary);
  if (inside.length > 0) {
    warnings.push({
      code: "phase-split",
      message: `water dew line: at ${inside.length} pressure(s) (from ${inside[0].P.toPrecision(4)} Pa) the water dew point lies inside the hydrocarbon two-phase region (${inside[0].note ?? ""})`,
    });
  }
  return {
    z: feed.slice(),
    waterIndex: water,
    dryFeed,
    hydrocarbon,
    waterDewLine,
    waterDewMissing,
    method: METHOD,
    model: binding.model.info,
    warnings,
  };
}
