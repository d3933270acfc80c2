/**
 * The heat-release (or heat-absorption) curve of a stream heated or cooled from one state to
 * another: temperature against the heat exchanged, sampled along the path by state-function
 * flashes at (P, h) (phase/flash/stateFunctionFlash.ts), with the bubble and dew points of the
 * stream inserted EXACTLY where the path crosses them.
 *
 * Path: the enthalpy changes linearly with the heat exchanged (Q = F (h - h_in), the steady-flow
 * energy balance without work, kinetic or potential energy), and the pressure is taken to fall
 * linearly with the heat exchanged from the inlet to the outlet pressure (the usual assumption
 * of a heat-curve calculation; with equal pressures the curve is isobaric).
 *
 * Saturation points: at a heat fraction f the state is (P(f), h(f)); it is at its bubble point
 * when h(f) equals the enthalpy of the saturated liquid of the feed composition at P(f), from the
 * saturation functions (phase/envelope/bubbleDew.ts for mixtures, Michelsen 1980; phase/
 * saturation.ts for one present component), never from interpolating between samples. With
 * equal pressures f follows directly; otherwise g(f) = h(f) - h_sat(P(f)) is solved by Brent's
 * method (numerics/brent.ts). A mixture can have two dew points at one pressure (retrograde
 * region); the one the saturation function finds from its start is used.
 */
import { PhaseUnavailableError, SolverError, type ResultWarning } from "../errors.js";
import { findRootBrent } from "../numerics/brent.js";
import type { Fluid } from "../fluid/defineFluid.js";
import type { Equilibrium } from "../phase/flash/types.js";
import { overallProperty } from "../phase/flash/stateFunctionFlash.js";
// one present component: the flash layer's own helper (the model restricted to that component)
import { componentSaturation } from "../phase/flash/pureComponent.js";
import { requireCount, requireFinite, requirePositive } from "../validate.js";

/** Which saturation point a heat-curve marker is. */
export type HeatCurveMarker = "bubble" | "dew";

/** One point of a heat curve (SI). */
export interface HeatCurvePoint {
  readonly temperatureK: number;
  readonly pressurePa: number;
  /** Overall molar enthalpy, J/mol. */
  readonly enthalpyJPerMol: number;
  /** Heat added to the stream from the inlet up to this point, W (negative when cooled). */
  readonly dutyW: number;
  /** Vapour mole fraction of the overall stream, mol/mol (0 or 1 in one phase). */
  readonly vaporFraction: number;
  /** "vapor", "liquid", "liquid-2" or a "+"-joined list of the phases present. */
  readonly phases: string;
  /** Set on the exact bubble and dew points. */
  readonly marker?: HeatCurveMarker;
}

/** A saturation point found on the path. */
export interface HeatCurveSaturationPoint {
  readonly kind: HeatCurveMarker;
  readonly temperatureK: number;
  readonly pressurePa: number;
  readonly enthalpyJPerMol: number;
  readonly dutyW: number;
  /** What found it (the saturation function's method). */
  readonly method: string;
}

/** A heat curve: points from the inlet to the outlet, with the exact saturation points. */
export interface HeatCurve {
  /** From the inlet (duty 0) to the outlet (the step's duty), the markers included in order. */
  readonly points: readonly HeatCurvePoint[];
  /** Bubble and dew points crossed by the path (at most one of each), in path order. */
  readonly saturationPoints: readonly HeatCurveSaturationPoint[];
  /** The flashes of the sampled points, inlet and outlet included (markers excluded). */
  readonly path: readonly Equilibrium[];
  /** Total heat added, W (negative for a cooler). */
  readonly dutyW: number;
  readonly warnings: readonly ResultWarning[];
}

/** Options of {@link heatCurve}. */
export interface HeatCurveOptions {
  /** Number of intervals between the inlet and the outlet (markers come on top). Default 24. */
  intervals?: number;
  /** Relative tolerance on the heat fraction of a saturation point when P varies. Default 1e-10. */
  markerTolerance?: number;
}

/** "vapor+liquid" style label of the phases of an equilibrium. */
export function phasesLabel(eq: Equilibrium): string {
  return eq.phases.map((p) => p.kind).join("+");
}

/** Overall vapour mole fraction of an equilibrium, mol/mol. */
export function vaporFractionOf(eq: Equilibrium): number {
  let beta = 0;
  for (const p of eq.phases) if (p.kind === "vapor") beta += p.amount;
  // one phase: the flash labels it "vapor" or "liquid" (phase/flash/types.ts), counted as such
  return beta;
}

/**
 * Heat curve of a stream of composition z and molar flow F (mol/s) from the equilibrium `inlet`
 * to the equilibrium `outlet` (both from flashes of this fluid).
 * @example heatCurve(gas, z, inletEq, outletEq, 12.5).saturationPoints
 */
export function heatCurve(
  fluid: Fluid,
  z: readonly number[],
  inlet: Equilibrium,
  outlet: Equilibrium,
  molarFlowMolPerS: number,
  options: HeatCurveOptions = {},
): HeatCurve {
  const F = requirePositive("molarFlowMolPerS", molarFlowMolPerS, "mol/s");
  const n = requireCount("options.intervals", options.intervals ?? 24);
  const markerTol = requirePositive(
    "options.markerTolerance",
    options.markerTolerance ?? 1e-10,
    "-",
  );
  const h1 = requireFinite("inlet enthalpy", overallProperty(inlet, "h"), "J/mol");
  const h2 = requireFinite("outlet enthalpy", overallProperty(outlet, "h"), "J/mol");
  const P1 = inlet.pressurePa;
  const P2 = outlet.pressurePa;
  const warnings: ResultWarning[] = [];
  const pressureAt = (f: number): number => P1 + f * (P2 - P1);
  const dh = h2 - h1;

  // the exact saturation points on the path
  const markers: { f: number; point: HeatCurveSaturationPoint }[] = [];
  if (dh !== 0) {
    for (const kind of ["bubble", "dew"] as const) {
      const found = saturationOnPath(fluid, z, kind, h1, dh, pressureAt, markerTol, warnings);
      if (found) {
        markers.push({
          f: found.f,
          point: {
            kind,
            temperatureK: found.temperatureK,
            pressurePa: found.pressurePa,
            enthalpyJPerMol: found.enthalpyJPerMol,
            dutyW: F * (found.enthalpyJPerMol - h1),
            method: found.method,
          },
        });
      }
    }
  }
  markers.sort((a, b) => a.f - b.f);

  // sample the path: each segment between breakpoints gets intervals by its share, at least 2
  const breaks = [0, ...markers.map((m) => m.f), 1];
  const fractions: number[] = [0];
  for (let k = 1; k < breaks.length; k++) {
    const a = breaks[k - 1];
    const b = breaks[k];
    const m = Math.max(2, Math.round(n * (b - a)));
    for (let j = 1; j < m; j++) fractions.push(a + ((b - a) * j) / m);
    if (k < breaks.length - 1) fractions.push(NaN); // marker slot
  }
  fractions.push(1);

  const points: HeatCurvePoint[] = [];
  const path: Equilibrium[] = [inlet];
  let markerIndex = 0;
  let previousT = inlet.temperatureK;
  for (let i = 0; i < fractions.length; i++) {
    const f = fractions[i];
    if (Number.isNaN(f)) {
      const m = markers[markerIndex++].point;
      points.push({
        temperatureK: m.temperatureK,
        pressurePa: m.pressurePa,
        enthalpyJPerMol: m.enthalpyJPerMol,
        dutyW: m.dutyW,
        vaporFraction: m.kind === "bubble" ? 0 : 1,
        phases: m.kind === "bubble" ? "liquid (bubble point)" : "vapour (dew point)",
        marker: m.kind,
      });
      previousT = m.temperatureK;
      continue;
    }
    let eq: Equilibrium;
    if (i === 0) eq = inlet;
    else if (i === fractions.length - 1) eq = outlet;
    else {
      eq = fluid.flashPH(pressureAt(f), h1 + f * dh, z, { initialGuessK: previousT });
      path.push(eq);
    }
    previousT = eq.temperatureK;
    points.push({
      temperatureK: eq.temperatureK,
      pressurePa: eq.pressurePa,
      enthalpyJPerMol: overallProperty(eq, "h"),
      dutyW: F * (overallProperty(eq, "h") - h1),
      vaporFraction: vaporFractionOf(eq),
      phases: phasesLabel(eq),
    });
  }
  path.push(outlet);
  return {
    points,
    saturationPoints: markers.map((m) => m.point),
    path,
    dutyW: F * dh,
    warnings,
  };
}

interface SaturationOnPath {
  f: number;
  temperatureK: number;
  pressurePa: number;
  enthalpyJPerMol: number;
  method: string;
}

interface SaturationAtP {
  temperatureK: number;
  enthalpyJPerMol: number;
  method: string;
}

/**
 * The bubble (saturated liquid) or dew (saturated vapour) point of the composition z at P:
 * its temperature and the enthalpy of the phase of composition z there. Undefined where there
 * is none (above the cricondenbar, or above the critical pressure of a pure fluid).
 */
export function saturationOfFeed(
  fluid: Fluid,
  z: readonly number[],
  pressurePa: number,
  kind: HeatCurveMarker,
): SaturationAtP | undefined {
  const present = z.map((v, i) => (v > 0 ? i : -1)).filter((i) => i >= 0);
  try {
    if (present.length === 1) {
      const sat = componentSaturation(fluid, present[0], { pressurePa });
      const rho = kind === "bubble" ? sat.liquidDensityMolPerM3 : sat.vaporDensityMolPerM3;
      const state = fluid.stateAtTRho(sat.temperatureK, rho, z);
      return {
        temperatureK: sat.temperatureK,
        enthalpyJPerMol: state.molar.h,
        method: "pure-fluid saturation at P (phase/saturation.ts: equal P and g of both phases)",
      };
    }
    const point =
      kind === "bubble"
        ? fluid.bubblePointAtPressure(pressurePa, z)
        : fluid.dewPointAtPressure(pressurePa, z);
    const phase = kind === "bubble" ? point.liquid : point.vapor;
    return {
      temperatureK: point.temperatureK,
      enthalpyJPerMol: phase.molar.h,
      method: point.method,
    };
  } catch (e) {
    if (e instanceof PhaseUnavailableError) return undefined;
    throw e;
  }
}

function saturationOnPath(
  fluid: Fluid,
  z: readonly number[],
  kind: HeatCurveMarker,
  h1: number,
  dh: number,
  pressureAt: (f: number) => number,
  tol: number,
  warnings: ResultWarning[],
): SaturationOnPath | undefined {
  const at = (f: number): SaturationAtP | undefined => {
    try {
      return saturationOfFeed(fluid, z, pressureAt(f), kind);
    } catch (e) {
      if (e instanceof SolverError) {
        warnings.push({
          code: "accuracy",
          message: `the ${kind} point at P = ${pressureAt(f).toPrecision(6)} Pa was not found (${e.message}); the heat curve shows no ${kind} point there (basis: saturation function failed, so the curve's corners may be missed)`,
        });
        return undefined;
      }
      throw e;
    }
  };
  const g = (f: number, s: SaturationAtP): number => h1 + f * dh - s.enthalpyJPerMol;
  const s0 = at(0);
  if (pressureAt(0) === pressureAt(1)) {
    if (!s0) return undefined;
    const f = (s0.enthalpyJPerMol - h1) / dh;
    if (!(f > 0 && f < 1)) return undefined;
    return {
      f,
      temperatureK: s0.temperatureK,
      pressurePa: pressureAt(0),
      enthalpyJPerMol: s0.enthalpyJPerMol,
      method: s0.method,
    };
  }
  const s1 = at(1);
  if (!s0 || !s1) return undefined;
  const g0 = g(0, s0);
  const g1 = g(1, s1);
  if (!(g0 * g1 < 0)) return undefined;
  let last: SaturationAtP = s0;
  const root = findRootBrent(
    (f) => {
      const s = at(f);
      if (!s) throw new SolverError("heat curve", `the ${kind} point vanished inside the path`);
      last = s;
      return g(f, s);
    },
    0,
    1,
    { tolerance: tol },
  );
  const f = root.value;
  const s = at(f) ?? last;
  return {
    f,
    temperatureK: s.temperatureK,
    pressurePa: pressureAt(f),
    enthalpyJPerMol: s.enthalpyJPerMol,
    method: `${s.method}; heat fraction by Brent's method on h(f) - h_sat(P(f))`,
  };
}
