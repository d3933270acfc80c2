/**
 * Stage 4 of the P-V-T route: the departures along every isotherm. Isochore route: the nodes'
 * smoothed P and (dP/dT)_rho go through integrateIsotherm.ts (low-density bridge + irregular
 * quadrature); the nominal integration chooses the bridge degrees and weights, which are then
 * frozen, so that the uncertainty stage sees a fixed, nearly linear map from the pressures to the
 * departures. Surface route: the departures come from the fitted surface's closed-form residual
 * Helmholtz energy at the nodes.
 */
import { pressureFromResidual } from "../state/properties.js";
import { DEPARTURE_KEYS, departuresFromReduced } from "./departureSet.js";
import type { DepartureSet } from "./departureSet.js";
import { integrateIsotherm, isothermIntegrands } from "./integrateIsotherm.js";
import { freezeBridge } from "./lowDensityBridge.js";
import type { FrozenBridge } from "./lowDensityBridge.js";
import type { IsothermDepartures, IsothermNodes } from "./integrateIsotherm.js";
import type { IsochoreFit } from "./isochoreFit.js";
import type { RouteContext } from "./routeContext.js";
import type { IsothermPlan } from "./routeIsothermStage.js";
import { surfaceDerivatives, virialFromSurface } from "./virialSurface.js";
import type { VirialSurface } from "./virialSurface.js";

/** Values of one evaluation of the route: per isotherm, per node, the departures; plus B and C. */
export interface RouteValues {
  pressures: number[][];
  departures: DepartureSet[][];
  B: number[];
  C: (number | undefined)[];
}

/** The values in one list: per isotherm the six departures of every node (DEPARTURE_KEYS order), then B and C (0 if none). */
export function flattenValues(v: RouteValues): Float64Array {
  let length = 0;
  for (const iso of v.departures) length += iso.length * DEPARTURE_KEYS.length + 2;
  const out = new Float64Array(length);
  let at = 0;
  v.departures.forEach((iso, k) => {
    for (const d of iso) {
      out[at] = d.a;
      out[at + 1] = d.s;
      out[at + 2] = d.u;
      out[at + 3] = d.h;
      out[at + 4] = d.g;
      out[at + 5] = d.lnPhi;
      at += 6;
    }
    out[at] = v.B[k];
    out[at + 1] = v.C[k] ?? 0;
    at += 2;
  });
  return out;
}

/** One isotherm of the isochore route with the bridge's choices frozen at the nominal fits. */
export interface FrozenIsotherm {
  temperatureK: number;
  /** Isochore indices, ascending density. */
  nodes: readonly number[];
  densityMolPerM3: readonly number[];
  /** The bridges of the a and s integrands, frozen at the nominal fits. */
  bridges: { a: FrozenBridge; s: FrozenBridge };
}

/** Smoothed P and (dP/dT)_rho of isochore `k` at T. */
export type NodeValue = (
  k: number,
  temperatureK: number,
) => { pressurePa: number; slopePaPerK: number };

/** The nominal integration of the isochore route. */
export interface IsochoreRouteNominal {
  values: RouteValues;
  /** The nominal integrations (with the bridges' truncation estimates), per isotherm. */
  integrations: IsothermDepartures[];
  frozen: FrozenIsotherm[];
  /** Method error per isotherm and node: quadrature + bridge truncation. */
  method: DepartureSet[][];
}

function nodesOf(fits: readonly IsochoreFit[], idx: readonly number[], t: number): IsothermNodes {
  const ev = idx.map((k) => fits[k].evaluate(t));
  return {
    temperatureK: t,
    densityMolPerM3: idx.map((k) => fits[k].densityMolPerM3),
    pressurePa: ev.map((e) => e.pressurePa),
    slopePaPerK: ev.map((e) => e.slopePaPerK),
    ...(ev.every((e) => e.uPressurePa > 0 && e.uSlopePaPerK > 0)
      ? { uPressurePa: ev.map((e) => e.uPressurePa), uSlopePaPerK: ev.map((e) => e.uSlopePaPerK) }
      : {}),
  };
}

/** Integrates every planned isotherm through the isochore fits and freezes the bridges. */
export function integrateIsochoreRoute(
  context: RouteContext,
  fits: readonly IsochoreFit[],
  plan: IsothermPlan,
): IsochoreRouteNominal {
  const R = context.gasConstant;
  const integrations: IsothermDepartures[] = [];
  const frozen: FrozenIsotherm[] = [];
  plan.temperaturesK.forEach((t, k) => {
    const nodes = nodesOf(fits, plan.nodeSets[k], t);
    const raw = integrateIsotherm(nodes, { gasConstant: R, bridge: context.options.bridge });
    integrations.push(raw);
    const { sA, sS } = isothermIntegrands(nodes, R);
    const bridge = context.options.bridge;
    frozen.push({
      temperatureK: t,
      nodes: plan.nodeSets[k],
      densityMolPerM3: nodes.densityMolPerM3,
      bridges: {
        a: freezeBridge(nodes.densityMolPerM3, sA, raw.bridgeA, bridge),
        s: freezeBridge(nodes.densityMolPerM3, sS, raw.bridgeS, bridge),
      },
    });
  });
  // Method error: quadrature + bridge truncation (systematic, added in quadrature to the propagated part).
  const method = integrations.map((r) =>
    r.quadratureError.map((q) => {
      const t = r.temperatureK;
      const ea = q.a + r.bridgeA.truncation;
      const es = q.s + r.bridgeS.truncation;
      return { a: ea, s: es, u: ea + t * es, h: ea + t * es, g: ea, lnPhi: ea / (R * t) };
    }),
  );
  const values = evaluateFrozen(context, frozen, (k, t) => fits[k].evaluate(t));
  return { values, integrations, frozen, method };
}

/** Integrates the frozen isotherms with node values from `nodeValue` (other pressures, other fits). */
export function evaluateFrozen(
  context: RouteContext,
  frozen: readonly FrozenIsotherm[],
  nodeValue: NodeValue,
): RouteValues {
  const values: RouteValues = { pressures: [], departures: [], B: [], C: [] };
  for (const f of frozen) {
    const ev = f.nodes.map((k) => nodeValue(k, f.temperatureK));
    const r = integrateIsotherm(
      {
        temperatureK: f.temperatureK,
        densityMolPerM3: f.densityMolPerM3,
        pressurePa: ev.map((e) => e.pressurePa),
        slopePaPerK: ev.map((e) => e.slopePaPerK),
      },
      { gasConstant: context.gasConstant, frozenBridges: f.bridges },
    );
    values.pressures.push(ev.map((e) => e.pressurePa));
    values.departures.push(r.departures);
    values.B.push(r.B);
    values.C.push(r.C);
  }
  return values;
}

/** Surface route: departures, pressures, B and C of the surface at the planned nodes. */
export function surfaceRouteValues(
  context: RouteContext,
  surface: VirialSurface,
  plan: IsothermPlan,
): RouteValues {
  const { densityMolPerM3: rho, gasConstant: R } = context;
  const pressures: number[][] = [];
  const departures: DepartureSet[][] = [];
  plan.temperaturesK.forEach((t, k) => {
    const ds = plan.nodeSets[k].map((i) => surfaceDerivatives(surface, t, rho[i]));
    pressures.push(plan.nodeSets[k].map((i, j) => pressureFromResidual(t, rho[i], ds[j].aD, R)));
    departures.push(ds.map((d) => departuresFromReduced(t, d, R)));
  });
  return {
    pressures,
    departures,
    B: plan.temperaturesK.map((t) => virialFromSurface(surface, t, 1)),
    C: plan.temperaturesK.map((t) =>
      surface.densityTerms >= 2 ? virialFromSurface(surface, t, 2) : undefined,
    ),
  };
}
