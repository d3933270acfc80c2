/**
 * Compressor stage on the real fluid, with an isentropic or a polytropic efficiency.
 *
 * Isentropic efficiency eta_s: the isentropic discharge is the verified (P, s) flash at the
 * outlet pressure and the inlet entropy; the work is w = (h2s - h1) / eta_s and the discharge the
 * (P, h) flash at h1 + w. The power F w is then checked against the discharge's own enthalpy.
 *
 * Polytropic efficiency eta_p: the discharge is the end of the exact polytropic path dh = v dP /
 * eta_p (polytropicPath.ts), the work its enthalpy change, the polytropic head eta_p (h2 - h1),
 * checked against the integral of v dP along the path; the isentropic discharge is the end of the
 * isentrope (the same integration with k = 1, its entropy checked against the inlet's). Beside
 * it: the result of Schultz's (1962) correction-factor method and its error against the exact
 * path (schultz.ts).
 *
 * Reported: pressure ratio, discharge temperature, isentropic and polytropic heads, the
 * polytropic volume exponent n = ln(P2/P1) / ln(v1/v2) of the end states, power and gas power
 * of the stage (no mechanical losses: the shaft needs more, from the vendor's data).
 */
import { R as R_CODATA } from "../constants.js";
import { InputError } from "../errors.js";
import { overallProperty, type StateFlashOptions } from "../phase/flash/stateFunctionFlash.js";
import type { Equilibrium } from "../phase/flash/types.js";
import { closeBalances } from "./balance.js";
import { oneEfficiency } from "./efficiency.js";
import {
  integratePolytropicPath,
  type PolytropicPath,
  type PolytropicPathOptions,
} from "./polytropicPath.js";
import { schultzCompression, type SchultzResult } from "./schultz.js";
import { streamFromEquilibrium, type Stream } from "./stream.js";
import { PROCESS_CAUTION, type ProcessWarning, type StepResult } from "./types.js";
import { checkInlet } from "./valve.js";
import {
  checkOptionalTemperature,
  describePhases,
  liquidFraction,
  processWarning,
  temperatureWarnings,
} from "./warnings.js";

/** Specification of a {@link compressorStage}. */
export interface CompressorSpec {
  /** Discharge pressure, Pa (absolute), above the suction pressure. */
  readonly outletPressurePa: number;
  /** Isentropic efficiency, 0 < eta <= 1. Give this or `polytropicEfficiency`. */
  readonly isentropicEfficiency?: number;
  /** Polytropic efficiency, 0 < eta <= 1: the exact polytropic path is integrated. */
  readonly polytropicEfficiency?: number;
  /** Warn when the discharge is hotter than this, K (the limit of the machine or its seals). */
  readonly dischargeTemperatureLimitK?: number;
  /** Warn when suction or discharge is colder than this, K. */
  readonly minimumDesignMetalTemperatureK?: number;
  /** Options of the exact polytropic path (tolerance, steps, path points). */
  readonly polytropic?: PolytropicPathOptions;
  /** Options of the flashes. */
  readonly flash?: StateFlashOptions;
  readonly outletName?: string;
}

/** The result of a {@link compressorStage}. */
export interface CompressorStageResult extends StepResult {
  readonly kind: "compressor";
  readonly efficiencyBasis: "isentropic" | "polytropic";
  /** Given, or implied by the polytropic discharge: (h2s - h1) / (h2 - h1). */
  readonly isentropicEfficiency: number;
  /** Given (polytropic basis only). */
  readonly polytropicEfficiency?: number;
  readonly pressureRatio: number;
  readonly dischargeTemperatureK: number;
  readonly isentropicDischargeTemperatureK: number;
  /** h2s - h1, J/mol. */
  readonly isentropicHeadJPerMol: number;
  /** eta_p (h2 - h1), J/mol (polytropic basis). */
  readonly polytropicHeadJPerMol?: number;
  /** n = ln(P2/P1) / ln(v1/v2) of the end states. */
  readonly polytropicExponent: number;
  /** The isentropic discharge state. */
  readonly isentropicOutlet: Equilibrium;
  /** The exact polytropic path (polytropic basis). */
  readonly polytropicPath?: PolytropicPath;
  /** Schultz's method beside the exact path (polytropic basis, single-phase path). */
  readonly schultz?: SchultzResult;
  /** Gas power of the stage, W (= powerW; no mechanical or seal losses). */
  readonly gasPowerW: number;
}

/**
 * The isentropic discharge: on a one-phase path, Newton's method on T for s(T, P2) = s1 with
 * (ds/dT)_P = cp / T on single-phase states (a few states instead of a state-function flash),
 * then the flash at the root (Wilson-started stability test) to confirm one phase; otherwise,
 * or when Newton does not converge in 30 steps, the (P, s) flash.
 */
function isentropicDischarge(
  inlet: Stream,
  P2: number,
  s1: number,
  singlePhase: boolean,
  flash: StateFlashOptions | undefined,
): Equilibrium {
  const { fluid, z } = inlet;
  if (singlePhase && inlet.state.phases.length === 1) {
    const T1 = inlet.state.temperatureK;
    const cp1 = inlet.state.phases[0].state.molar.cp;
    const R = fluid.model.gasConstant ?? R_CODATA;
    // ideal-gas estimate T1 (P2/P1)^(R/cp)
    let T = T1 * (P2 / inlet.state.pressurePa) ** (R / cp1);
    for (let k = 0; k < 30; k++) {
      const st = fluid.stateAtTP(T, P2, z);
      const ds = st.molar.s - s1;
      if (Math.abs(ds) <= 1e-12 * Math.max(Math.abs(s1), R)) {
        const eq = fluid.flashTP(T, P2, z, { ...flash, extraTrials: "none" });
        if (
          eq.phases.length === 1 &&
          Math.abs(overallProperty(eq, "s") - s1) <= 1e-10 * Math.max(Math.abs(s1), R)
        ) {
          return {
            ...eq,
            check: {
              ...eq.check,
              method: `Newton on T for s(T, P2) = s1 (${k} steps); ${eq.check.method}`,
            },
          };
        }
        break;
      }
      const step = (ds * T) / st.molar.cp;
      T = Math.max(0.5 * T, Math.min(2 * T, T - step));
    }
  }
  return fluid.flashPS(P2, s1, z, flash);
}

function suctionWarnings(inlet: Stream): ProcessWarning[] {
  const eq = inlet.state;
  const liquid = liquidFraction(eq);
  if (liquid > 0) {
    return [
      processWarning(
        "liquid-at-suction",
        `liquid at the compressor suction: ${describePhases(eq)} (${(liquid * 100).toPrecision(3)} % of the moles)`,
        "the flash of the suction stream found a liquid phase; compressors take dry gas (liquid erodes and breaks impellers and valves): a knock-out drum upstream is common practice (no source)",
      ),
    ];
  }
  return [];
}

/**
 * Compresses a stream to a higher pressure.
 *
 * @example
 * ```ts
 * const r = compressorStage(feed, { outletPressurePa: 60e5, polytropicEfficiency: 0.78 });
 * r.dischargeTemperatureK; r.powerW; r.polytropicHeadJPerMol; r.schultz?.headRelativeError;
 * ```
 * @throws InputError for an efficiency outside (0, 1], none or both given, a discharge pressure
 *   not above the suction; SolverError when a flash, the path or a balance fails.
 */
export function compressorStage(inlet: Stream, spec: CompressorSpec): CompressorStageResult {
  checkInlet(inlet);
  const { basis, eta } = oneEfficiency(spec);
  const P1 = inlet.state.pressurePa;
  const P2 = spec.outletPressurePa;
  if (!(typeof P2 === "number" && P2 > P1 && P2 < Infinity)) {
    throw new InputError({
      input: "outletPressurePa",
      unit: "Pa",
      validRange: `above the suction pressure ${P1} Pa (a compressor raises the pressure)`,
      received: P2,
    });
  }
  checkOptionalTemperature("dischargeTemperatureLimitK", spec.dischargeTemperatureLimitK);
  checkOptionalTemperature("minimumDesignMetalTemperatureK", spec.minimumDesignMetalTemperatureK);
  const { fluid, z } = inlet;
  const F = inlet.molarFlowMolPerS;
  const h1 = overallProperty(inlet.state, "h");
  const s1 = overallProperty(inlet.state, "s");
  const v1 = overallProperty(inlet.state, "v");
  let outEq: Equilibrium;
  let isentropicOutlet: Equilibrium;
  let work: number;
  let path: readonly Equilibrium[];
  let poly: PolytropicPath | undefined;
  let schultz: SchultzResult | undefined;
  let methodText: string;
  if (basis === "isentropic") {
    isentropicOutlet = fluid.flashPS(P2, s1, z, spec.flash);
    work = (overallProperty(isentropicOutlet, "h") - h1) / eta;
    outEq = fluid.flashPH(P2, h1 + work, z, spec.flash);
    path = [inlet.state, outEq];
    methodText =
      `Isentropic efficiency ${eta}: isentropic discharge by the (P, s) flash at ${P2} Pa and s1 = ${s1.toPrecision(8)} J/(mol K); ` +
      `w = (h2s - h1) / eta_s; discharge by the (P, h) flash at h1 + w. The path holds the two ends only (the real path between them is not known from an isentropic efficiency).`;
  } else {
    poly = integratePolytropicPath(fluid, z, inlet.state, P2, 1 / eta, {
      ...spec.polytropic,
      flash: spec.flash,
    });
    outEq = poly.outlet;
    path = poly.path;
    work = poly.enthalpyChangeJPerMol;
    isentropicOutlet = isentropicDischarge(
      inlet,
      P2,
      s1,
      poly.route === "single-phase",
      spec.flash,
    );
    if (poly.route === "single-phase" && inlet.state.phases.length === 1) {
      schultz = schultzCompression(fluid, z, inlet.state, isentropicOutlet, eta, {
        headJPerMol: eta * work,
        workJPerMol: work,
        dischargeTemperatureK: outEq.temperatureK,
      });
    }
    methodText =
      `Polytropic efficiency ${eta}: the exact polytropic path dh = v dP / eta_p on the real fluid, ${poly.method}. ` +
      `Polytropic head eta_p (h2 - h1) = ${(eta * work).toPrecision(8)} J/mol; the integral of v dP along the path agrees to ${poly.headConsistency.toExponential(2)} relative. ` +
      `Isentropic discharge: ${isentropicOutlet.check.method.startsWith("Newton") ? "Newton's method on T at the discharge pressure for s(T, P2) = s1 on the single-phase states, then the flash there" : "the (P, s) flash"}. ` +
      (schultz
        ? `Schultz (1962, J. Eng. Power 84, 69-82) correction factor f = ${schultz.correctionFactor.toPrecision(6)}: head ${schultz.polytropicHeadJPerMol.toPrecision(8)} J/mol, off the exact path by ${(schultz.headRelativeError * 100).toPrecision(3)} %; discharge ${schultz.dischargeTemperatureDifferenceK.toPrecision(3)} K off.`
        : "Schultz's method not applied (the path is not one phase).");
  }
  const outlet = streamFromEquilibrium(
    fluid,
    z,
    outEq,
    F,
    spec.outletName ?? (inlet.name ? `${inlet.name} compressed` : "compressor discharge"),
  );
  const powerW = F * work;
  const check = closeBalances("compressor stage", [inlet], [outlet], powerW, 0);
  const h2s = overallProperty(isentropicOutlet, "h");
  const v2 = overallProperty(outEq, "v");
  const warnings: ProcessWarning[] = [...suctionWarnings(inlet)];
  if (
    spec.dischargeTemperatureLimitK !== undefined &&
    outEq.temperatureK > spec.dischargeTemperatureLimitK
  ) {
    warnings.push(
      processWarning(
        "high-discharge-temperature",
        `the discharge temperature ${(outEq.temperatureK - 273.15).toFixed(1)} degC is above the limit ${(spec.dischargeTemperatureLimitK - 273.15).toFixed(1)} degC`,
        `the discharge temperature limit ${spec.dischargeTemperatureLimitK} K given by the caller (from the machine's, seals' or lubricant's limits)`,
      ),
    );
  }
  const coldest = inlet.state.temperatureK < outEq.temperatureK ? inlet.state : outEq;
  warnings.push(
    ...temperatureWarnings(
      coldest,
      coldest === outEq ? "the compressor discharge" : "the compressor suction",
      spec.minimumDesignMetalTemperatureK,
    ),
  );
  if (poly?.crossedTwoPhase && inlet.state.phases.length === 1) {
    warnings.push(
      processWarning(
        "two-phase-path",
        "the polytropic path crosses the two-phase region: liquid forms inside the machine",
        "a flash on the path found more than one phase; the path was then integrated with (P, h) flashes",
      ),
    );
  }
  if (outEq.phases.length > 1) {
    warnings.push(
      processWarning(
        "two-phase-outlet",
        `the compressor discharge is two-phase (${describePhases(outEq)})`,
        "the flash of the discharge found more than one phase",
      ),
    );
  }
  return {
    kind: "compressor",
    inlets: [inlet],
    outlet,
    outlets: [outlet],
    powerW,
    specificWorkJPerMol: work,
    path,
    warnings,
    caution: PROCESS_CAUTION,
    method: `Compressor stage from ${P1} Pa to ${P2} Pa on ${fluid.model.info.name}, adiabatic, steady flow, kinetic energy neglected. ${methodText} Power = molar flow x work, positive into the fluid; gas power only (mechanical and seal losses not included). Energy balance closed to ${check.energyBalanceRelativeError.toExponential(2)} relative.`,
    check,
    efficiencyBasis: basis,
    isentropicEfficiency: basis === "isentropic" ? eta : (h2s - h1) / work,
    polytropicEfficiency: basis === "polytropic" ? eta : undefined,
    pressureRatio: P2 / P1,
    dischargeTemperatureK: outEq.temperatureK,
    isentropicDischargeTemperatureK: isentropicOutlet.temperatureK,
    isentropicHeadJPerMol: h2s - h1,
    polytropicHeadJPerMol: basis === "polytropic" ? eta * work : undefined,
    polytropicExponent: Math.log(P2 / P1) / Math.log(v1 / v2),
    isentropicOutlet,
    polytropicPath: poly,
    schultz,
    gasPowerW: powerW,
  };
}
