/**
 * Two-stream counter-current heat exchanger: the hot stream gives the duty Q to the cold one,
 * Q = F_h (h_h,in - h_h,out) = F_c (h_c,out - h_c,in) (steady flow, no heat loss, no work).
 * The outlets follow from a duty, or from a minimum approach temperature.
 *
 * Minimum approach: along the exchanger, at the heat x transferred from the cold end (hot outlet,
 * cold inlet), dT(x) = T_hot(x) - T_cold(x). Both heat curves (heatCurve.ts, with the exact
 * bubble and dew points, where the curves have their corners) are evaluated on the union of
 * their points, the smallest difference is located on them, and then refined on the real curves
 * (flashes at the exact heat x of both streams) by golden-section search between the neighbouring
 * points (Kiefer 1953; Press et al., Numerical Recipes, 3rd ed., 2007, sect. 10.2). So a pinch
 * inside the exchanger (a condensing hot stream against a liquid: the cold stream's line crosses
 * the flat condensation segment) is found, not only the end differences.
 *
 * From an approach: dT_min(Q) falls as Q grows (more heat, closer curves); Q with
 * dT_min(Q) = dT_spec is found by Brent's method (numerics/brent.ts) between 0 and the largest
 * duty either stream could take (hot cooled to the cold inlet T, cold heated to the hot inlet T).
 *
 * A temperature cross (dT < 0 anywhere) is physically impossible in one counter-current pass:
 * refused by default, or returned with a warning when asked (`onTemperatureCross: "warn"`).
 */
import { InputError, SolverError, type ResultWarning } from "../errors.js";
import { findRootBrent } from "../numerics/brent.js";
import type { Equilibrium } from "../phase/flash/types.js";
import { overallProperty } from "../phase/flash/stateFunctionFlash.js";
import { requireChoice, requirePositive } from "../validate.js";
import { closeBalances } from "./balance.js";
import { heatCurve, type HeatCurve, type HeatCurveOptions } from "./heatCurve.js";
import {
  processWarning,
  requirePositiveFlow,
  requireSpecObject,
  temperatureWarnings,
} from "./warnings.js";
import { streamEnthalpyJPerMol, streamFromEquilibrium, type Stream } from "./stream.js";
import { PROCESS_CAUTION, type StepResult } from "./types.js";

/** Specification of {@link exchanger}: the duty OR a minimum approach. */
export interface ExchangerSpec {
  /** Heat transferred from the hot to the cold stream, W (> 0). */
  dutyW?: number;
  /** Minimum approach temperature along the exchanger, K (> 0). */
  minimumApproachK?: number;
  /** Hot outlet pressure, Pa. Default: the hot inlet's. */
  hotOutletPressurePa?: number;
  /** Cold outlet pressure, Pa. Default: the cold inlet's. */
  coldOutletPressurePa?: number;
  /** What to do with a temperature cross: "refuse" (default, an InputError) or "warn". */
  onTemperatureCross?: "refuse" | "warn";
  /** Minimum design metal temperature, K: outlets below it are warned. */
  minimumDesignMetalTemperatureK?: number;
  /** Heat-curve options of both streams. */
  heatCurve?: HeatCurveOptions;
  /** Absolute tolerance of the minimum approach, K. Default 1e-6. */
  approachToleranceK?: number;
}

/** Where the two curves come closest. */
export interface MinimumApproach {
  /** T_hot - T_cold there, K (negative: a temperature cross). */
  readonly temperatureDifferenceK: number;
  /** Heat transferred from the cold end up to that point, W. */
  readonly heatFromColdEndW: number;
  readonly hotTemperatureK: number;
  readonly coldTemperatureK: number;
  /** "hot end", "cold end" or "inside" (a pinch the end differences alone would miss). */
  readonly location: "hot end" | "cold end" | "inside";
}

/** One point of the exchanger's curves, by heat from the cold end. */
export interface ExchangerCurvePoint {
  readonly heatFromColdEndW: number;
  readonly temperatureK: number;
  readonly marker?: "bubble" | "dew";
}

/** Result of {@link exchanger}. */
export interface ExchangerResult extends StepResult {
  readonly kind: "exchanger";
  /** Heat transferred from the hot to the cold stream, W (> 0). */
  readonly dutyW: number;
  readonly hotOutlet: Stream;
  readonly coldOutlet: Stream;
  readonly hotCurve: HeatCurve;
  readonly coldCurve: HeatCurve;
  /** Both curves by heat from the cold end (for the chart). */
  readonly curves: {
    readonly hot: readonly ExchangerCurvePoint[];
    readonly cold: readonly ExchangerCurvePoint[];
  };
  readonly minimumApproach: MinimumApproach;
  /** T_hot,in - T_cold,out, K. */
  readonly hotEndDifferenceK: number;
  /** T_hot,out - T_cold,in, K. */
  readonly coldEndDifferenceK: number;
}

interface Side {
  stream: Stream;
  h0: number;
  P0: number;
  P1: number;
  F: number;
}

interface Evaluation {
  Q: number;
  hotEq: Equilibrium;
  coldEq: Equilibrium;
  hotCurve: HeatCurve;
  coldCurve: HeatCurve;
  hot: ExchangerCurvePoint[];
  cold: ExchangerCurvePoint[];
  minimum: MinimumApproach;
}

/**
 * A counter-current exchanger between a hot and a cold stream.
 * @example exchanger(effluent, feed, { minimumApproachK: 10 }).minimumApproach
 */
export function exchanger(hot: Stream, cold: Stream, spec: ExchangerSpec): ExchangerResult {
  requireSpecObject(spec, "{ dutyW } or { minimumApproachK }");
  if ((spec.dutyW === undefined) === (spec.minimumApproachK === undefined)) {
    throw new InputError({
      input: "spec",
      unit: "-",
      validRange: "exactly one of dutyW (W) and minimumApproachK (K)",
      received: spec,
    });
  }
  // the two streams may be of different fluids: each keeps its own, nothing mixes
  for (const [name, s] of [
    ["hot", hot],
    ["cold", cold],
  ] as const) {
    requirePositiveFlow(`${name}.molarFlowMolPerS`, s.molarFlowMolPerS);
  }
  const Th = hot.state.temperatureK;
  const Tc = cold.state.temperatureK;
  if (!(Th > Tc)) {
    throw new InputError({
      input: "hot",
      unit: "K",
      validRange: `a hot inlet above the cold inlet temperature ${Tc} K`,
      received: Th,
    });
  }
  const onCross = requireChoice("spec.onTemperatureCross", spec.onTemperatureCross ?? "refuse", [
    "refuse",
    "warn",
  ]);
  const tolK = requirePositive("spec.approachToleranceK", spec.approachToleranceK ?? 1e-6, "K");
  const side = (s: Stream, P1: number | undefined, input: string): Side => ({
    stream: s,
    h0: streamEnthalpyJPerMol(s),
    P0: s.state.pressurePa,
    P1: P1 === undefined ? s.state.pressurePa : requirePositive(input, P1, "Pa"),
    F: s.molarFlowMolPerS,
  });
  const hs = side(hot, spec.hotOutletPressurePa, "spec.hotOutletPressurePa");
  const cs = side(cold, spec.coldOutletPressurePa, "spec.coldOutletPressurePa");
  const mdmt =
    spec.minimumDesignMetalTemperatureK === undefined
      ? undefined
      : requirePositive(
          "spec.minimumDesignMetalTemperatureK",
          spec.minimumDesignMetalTemperatureK,
          "K",
        );

  let ev: Evaluation;
  let Qmax: number | undefined;
  if (spec.dutyW !== undefined) {
    const Q = requirePositive("spec.dutyW", spec.dutyW, "W");
    ev = evaluate(hs, cs, Q, spec.heatCurve);
  } else {
    const dTspec = requirePositive("spec.minimumApproachK", spec.minimumApproachK as number, "K");
    if (!(dTspec < Th - Tc)) {
      throw new InputError({
        input: "spec.minimumApproachK",
        unit: "K",
        validRange: `below the difference of the inlet temperatures, ${(Th - Tc).toPrecision(6)} K`,
        received: dTspec,
      });
    }
    // the largest duty: hot cooled to the cold inlet T, cold heated to the hot inlet T
    const hotLimit = hs.F * (hs.h0 - overallProperty(hot.fluid.flashTP(Tc, hs.P1, hot.z), "h"));
    const coldLimit = cs.F * (overallProperty(cold.fluid.flashTP(Th, cs.P1, cold.z), "h") - cs.h0);
    Qmax = Math.min(hotLimit, coldLimit);
    const cache = new Map<number, Evaluation>();
    const at = (Q: number): Evaluation => {
      let e = cache.get(Q);
      if (!e) {
        e = evaluate(hs, cs, Q, spec.heatCurve);
        cache.set(Q, e);
      }
      return e;
    };
    const root = findRootBrent(
      (Q) => at(Q).minimum.temperatureDifferenceK - dTspec,
      Qmax * 1e-9,
      Qmax,
      { tolerance: Qmax * 1e-10 },
    );
    ev = at(root.value);
    if (!(Math.abs(ev.minimum.temperatureDifferenceK - dTspec) <= Math.max(10 * tolK, 1e-6))) {
      throw new SolverError(
        "exchanger duty from the minimum approach",
        `Brent's method on dT_min(Q) - ${dTspec} K between 0 and ${Qmax} W ended at Q = ${root.value} W with dT_min = ${ev.minimum.temperatureDifferenceK} K`,
      );
    }
  }

  const warnings: ResultWarning[] = [];
  if (ev.minimum.temperatureDifferenceK < 0) {
    const text = `temperature cross: the hot stream is ${(-ev.minimum.temperatureDifferenceK).toFixed(3)} K colder than the cold stream at ${ev.minimum.location === "inside" ? `${(ev.minimum.heatFromColdEndW / 1e3).toPrecision(5)} kW from the cold end` : `the ${ev.minimum.location}`}; one counter-current pass cannot transfer ${ev.Q.toPrecision(6)} W`;
    if (onCross === "refuse") {
      throw new InputError({
        input: "spec.dutyW",
        unit: "W",
        validRange: `a duty without a temperature cross (${text})`,
        received: ev.Q,
      });
    }
    warnings.push(
      processWarning(
        "temperature-cross",
        text,
        "second law: heat flows from hot to cold only, so T_hot >= T_cold at every point of a counter-current exchanger",
      ),
    );
  }
  const hotOut = streamFromEquilibrium(
    hot.fluid,
    hot.z,
    ev.hotEq,
    hs.F,
    hot.name !== undefined ? `${hot.name} out` : "hot outlet",
  );
  const coldOut = streamFromEquilibrium(
    cold.fluid,
    cold.z,
    ev.coldEq,
    cs.F,
    cold.name !== undefined ? `${cold.name} out` : "cold outlet",
  );
  const check = closeBalances("exchanger", [hot, cold], [hotOut, coldOut], 0, 0);
  warnings.push(
    ...temperatureWarnings(ev.hotEq, "hot outlet", mdmt),
    ...temperatureWarnings(ev.coldEq, "cold outlet", mdmt),
    ...ev.hotCurve.warnings,
    ...ev.coldCurve.warnings,
  );
  const m = ev.minimum;
  const method =
    "Counter-current exchanger, steady flow, no heat loss: Q = F_h (h_h,in - h_h,out) = F_c (h_c,out - h_c,in). " +
    (spec.dutyW !== undefined
      ? "Duty given; each outlet from a flash at its outlet P and h. "
      : `Duty from the minimum approach ${spec.minimumApproachK} K by Brent's method on dT_min(Q) between 0 and ${(Qmax as number).toPrecision(6)} W (the hot stream cooled to the cold inlet T or the cold one heated to the hot inlet T). `) +
    "Heat curves of both streams from (P, h) flashes with the pressure linear in the duty, bubble and dew points found exactly with the saturation functions; " +
    "the minimum approach located on the union of both curves' points and refined by golden-section search on flashes of both streams at the same heat. " +
    `Minimum approach ${m.temperatureDifferenceK.toFixed(3)} K at the ${m.location === "inside" ? `inside point ${(m.heatFromColdEndW / 1e3).toPrecision(5)} kW from the cold end` : m.location}. ` +
    `Energy balance closed to ${check.energyBalanceRelativeError.toExponential(1)} relative.`;
  return {
    kind: "exchanger",
    inlets: [hot, cold],
    outlet: hotOut,
    outlets: [hotOut, coldOut],
    dutyW: ev.Q,
    path: [...ev.hotCurve.path, ...ev.coldCurve.path],
    warnings,
    caution: PROCESS_CAUTION,
    method,
    check,
    hotOutlet: hotOut,
    coldOutlet: coldOut,
    hotCurve: ev.hotCurve,
    coldCurve: ev.coldCurve,
    curves: { hot: ev.hot, cold: ev.cold },
    minimumApproach: m,
    hotEndDifferenceK: Th - ev.coldEq.temperatureK,
    coldEndDifferenceK: ev.hotEq.temperatureK - Tc,
  };
}

/** Both curves and the minimum approach at a duty Q. */
function evaluate(
  hs: Side,
  cs: Side,
  Q: number,
  curveOptions: HeatCurveOptions | undefined,
): Evaluation {
  const hotFluid = hs.stream.fluid;
  const coldFluid = cs.stream.fluid;
  const hotAt = (x: number): number => {
    // hot stream has given Q - x from its inlet
    const f = (Q - x) / Q;
    return hotFluid.flashPH(hs.P0 + f * (hs.P1 - hs.P0), hs.h0 - (Q - x) / hs.F, hs.stream.z)
      .temperatureK;
  };
  const coldAt = (x: number): number => {
    const f = x / Q;
    return coldFluid.flashPH(cs.P0 + f * (cs.P1 - cs.P0), cs.h0 + x / cs.F, cs.stream.z)
      .temperatureK;
  };
  const hotEq = hotFluid.flashPH(hs.P1, hs.h0 - Q / hs.F, hs.stream.z, {
    initialGuessK: hs.stream.state.temperatureK,
  });
  const coldEq = coldFluid.flashPH(cs.P1, cs.h0 + Q / cs.F, cs.stream.z, {
    initialGuessK: cs.stream.state.temperatureK,
  });
  const hotCurve = heatCurve(hotFluid, hs.stream.z, hs.stream.state, hotEq, hs.F, curveOptions);
  const coldCurve = heatCurve(coldFluid, cs.stream.z, cs.stream.state, coldEq, cs.F, curveOptions);
  // by heat from the cold end, increasing
  const hot = hotCurve.points
    .map((p) => ({ heatFromColdEndW: Q + p.dutyW, temperatureK: p.temperatureK, marker: p.marker }))
    .reverse();
  const cold = coldCurve.points.map((p) => ({
    heatFromColdEndW: p.dutyW,
    temperatureK: p.temperatureK,
    marker: p.marker,
  }));
  // the smallest difference on the union of points (linear between points of the other curve)
  const xs = [...hot.map((p) => p.heatFromColdEndW), ...cold.map((p) => p.heatFromColdEndW)]
    .map((x) => Math.min(Q, Math.max(0, x)))
    .sort((a, b) => a - b);
  let best = 0;
  let bestDT = Infinity;
  const dTs = xs.map((x) => interpolate(hot, x) - interpolate(cold, x));
  dTs.forEach((d, i) => {
    if (d < bestDT) {
      bestDT = d;
      best = i;
    }
  });
  let x = xs[best];
  let dT = bestDT;
  let hotT = interpolate(hot, x);
  let coldT = interpolate(cold, x);
  // refine on the real curves between the neighbouring points (unless at an end)
  const lo = xs[Math.max(0, best - 1)];
  const hi = xs[Math.min(xs.length - 1, best + 1)];
  if (hi > lo) {
    const g = (t: number): number => hotAt(t) - coldAt(t);
    const r = goldenMinimum(g, lo, hi, 1e-7 * Q);
    const gr = g(r.x);
    // the point itself (a marker is exact) against the refined one
    if (gr < dT) {
      x = r.x;
      dT = gr;
      hotT = hotAt(x);
      coldT = coldAt(x);
    }
  }
  const endTol = Math.max(1e-9 * Q, 0);
  const location: MinimumApproach["location"] =
    x <= endTol ? "cold end" : x >= Q - endTol ? "hot end" : "inside";
  return {
    Q,
    hotEq,
    coldEq,
    hotCurve,
    coldCurve,
    hot,
    cold,
    minimum: {
      temperatureDifferenceK: dT,
      heatFromColdEndW: x,
      hotTemperatureK: hotT,
      coldTemperatureK: coldT,
      location,
    },
  };
}

/** T of a curve (increasing heat) at heat x by linear interpolation; exact at its points. */
function interpolate(curve: readonly ExchangerCurvePoint[], x: number): number {
  if (x <= curve[0].heatFromColdEndW) return curve[0].temperatureK;
  for (let k = 1; k < curve.length; k++) {
    const b = curve[k];
    if (x <= b.heatFromColdEndW) {
      const a = curve[k - 1];
      const w = b.heatFromColdEndW - a.heatFromColdEndW;
      if (!(w > 0)) return b.temperatureK;
      return a.temperatureK + ((x - a.heatFromColdEndW) / w) * (b.temperatureK - a.temperatureK);
    }
  }
  return curve[curve.length - 1].temperatureK;
}

/** Golden-section search for a minimum of g on [a, b] (Kiefer 1953), to an interval width tol. */
function goldenMinimum(
  g: (x: number) => number,
  a: number,
  b: number,
  tol: number,
  maxIterations = 80,
): { x: number; iterations: number } {
  const r = (Math.sqrt(5) - 1) / 2;
  let c = b - r * (b - a);
  let d = a + r * (b - a);
  let gc = g(c);
  let gd = g(d);
  let k = 0;
  while (b - a > tol && k < maxIterations) {
    if (gc < gd) {
      b = d;
      d = c;
      gd = gc;
      c = b - r * (b - a);
      gc = g(c);
    } else {
      a = c;
      c = d;
      gc = gd;
      d = a + r * (b - a);
      gd = g(d);
    }
    k++;
  }
  return { x: gc < gd ? c : d, iterations: k };
}
