/**
 * Across the dome with measured saturation data (the Clapeyron crossing of issue 6 item 4).
 * On a subcritical isotherm the route integrates the vapour branch from zero density; the
 * saturated vapour and liquid at T are then joined by the phase-equilibrium conditions
 * (equal T, P and Gibbs energy) and the Clapeyron equation dPsat/dT = Delta s / Delta v
 * (e.g. Smith, Van Ness & Abbott, 7th ed., §6.5):
 *
 *   a_res,L = a_res,V + Psat (1/rho_V - 1/rho_L) - R T ln(rho_L/rho_V)
 *   s_res,L = s_res,V - (dPsat/dT) (1/rho_V - 1/rho_L) + R ln(rho_L/rho_V)
 *
 * (the logarithms are the ideal-gas parts at the two densities), and the liquid branch is
 * integrated on from rho_L with the liquid isochores. The integrand of a_res is known exactly at
 * both saturated densities from Psat; the isochoric slope at a saturated density is extrapolated
 * from the three nearest nodes of its branch by a parabola, with the change against a straight
 * line as its uncertainty. Standard uncertainties of Psat, dPsat/dT, rho_V, rho_L and of the node
 * pressures and slopes are propagated linearly (one-sigma steps, JCGM 100:2008 eq. 10); the
 * vapour-branch start carries the route's own uncertainty.
 */
import { InputError } from "../errors.js";
import { departuresFromIntegrals } from "./departureSet.js";
import type { DepartureSet } from "./departureSet.js";
import type { PvtRouteResult } from "./departuresFromPvt.js";
import type { IsochoreFit } from "./isochoreFit.js";
import { cumulativeIrregular } from "../numerics/cumulativeIrregular.js";

/** Measured saturation data at one temperature (Psat, its slope, the saturated densities), with uncertainties. */
export interface SaturationData {
  /** Saturation pressure at T, Pa, and its standard uncertainty. */
  pressurePa: number;
  uPressurePa?: number;
  /** dPsat/dT at T, Pa/K (from a vapour-pressure fit), and its standard uncertainty. */
  slopePaPerK: number;
  uSlopePaPerK?: number;
  /** Saturated vapour and liquid densities, mol/m3, with standard uncertainties. */
  vaporDensityMolPerM3: number;
  uVaporDensityMolPerM3?: number;
  liquidDensityMolPerM3: number;
  uLiquidDensityMolPerM3?: number;
}

/** A saturated state reached across the dome, with its departures and their uncertainties. */
export interface DomeState {
  densityMolPerM3: number;
  pressurePa: number;
  residual: DepartureSet;
  uncertainty: DepartureSet;
}

/** Result of {@link departuresAcrossDome}: the saturated vapour and liquid states. */
export interface AcrossDomeResult {
  temperatureK: number;
  saturatedVapor: DomeState;
  saturatedLiquid: DomeState;
  /** One state per liquid isochore covering T, ascending density. */
  liquid: DomeState[];
}

/** Parabola through the last three points, evaluated at x; and the straight line through the last two. */
function extrapolate(
  xs: readonly number[],
  ys: readonly number[],
  x: number,
): { value: number; spread: number } {
  const n = xs.length;
  const [x0, x1, x2] = [xs[n - 3], xs[n - 2], xs[n - 1]] as number[];
  const [y0, y1, y2] = [ys[n - 3], ys[n - 2], ys[n - 1]] as number[];
  const l0 = ((x - x1) * (x - x2)) / ((x0 - x1) * (x0 - x2));
  const l1 = ((x - x0) * (x - x2)) / ((x1 - x0) * (x1 - x2));
  const l2 = ((x - x0) * (x - x1)) / ((x2 - x0) * (x2 - x1));
  const quad = l0 * y0 + l1 * y1 + l2 * y2;
  const line = y1 + ((y2 - y1) * (x - x1)) / (x2 - x1);
  return { value: quad, spread: Math.abs(quad - line) };
}

/** Departures of the saturated liquid from the vapour side through measured saturation data (see the header). */
export function departuresAcrossDome(
  result: PvtRouteResult,
  request: { temperatureK: number; saturation: SaturationData },
): AcrossDomeResult {
  const R = result.gasConstant;
  const T = request.temperatureK;
  const sat = request.saturation;
  const iso = result.isotherms.find((i) => Math.abs(i.temperatureK - T) <= 1e-6 * T);
  if (result.route !== "isochores" || !iso) {
    throw new InputError({
      input: "temperatureK",
      unit: "K",
      validRange: `a reported isotherm of the isochore route (${result.isotherms.map((i) => i.temperatureK.toFixed(2)).join(", ")})`,
      received: T,
    });
  }
  const check = (name: string, v: number | undefined, unit: string, optional: boolean) => {
    if (optional && v === undefined) return;
    if (!(typeof v === "number" && v > 0 && v < Infinity)) {
      throw new InputError({
        input: `saturation.${name}`,
        unit,
        validRange: "a finite number > 0",
        received: v,
      });
    }
  };
  check("pressurePa", sat.pressurePa, "Pa", false);
  check("slopePaPerK", sat.slopePaPerK, "Pa/K", false);
  check("vaporDensityMolPerM3", sat.vaporDensityMolPerM3, "mol/m3", false);
  check("liquidDensityMolPerM3", sat.liquidDensityMolPerM3, "mol/m3", false);
  for (const k of [
    "uPressurePa",
    "uSlopePaPerK",
    "uVaporDensityMolPerM3",
    "uLiquidDensityMolPerM3",
  ] as const)
    check(k, sat[k], "-", true);
  const vap = iso.states;
  const last = vap[vap.length - 1];
  if (!(
    vap.length >= 3 &&
    last &&
    last.densityMolPerM3 < sat.vaporDensityMolPerM3 &&
    sat.vaporDensityMolPerM3 < sat.liquidDensityMolPerM3
  )) {
    throw new InputError({
      input: "saturation.vaporDensityMolPerM3",
      unit: "mol/m3",
      validRange: `above the isotherm's last vapour node (${last?.densityMolPerM3.toPrecision(6)} mol/m3, at least 3 nodes) and below the liquid density`,
      received: sat.vaporDensityMolPerM3,
    });
  }
  const fitAt = (rho: number) =>
    result.isochoreFits.find((f) => f.densityMolPerM3 === rho) as IsochoreFit;
  const vNodes = vap
    .slice(-3)
    .map((s) => ({ rho: s.densityMolPerM3, ev: fitAt(s.densityMolPerM3).evaluate(T) }));
  const liquidFits = result.isochoreFits
    .filter(
      (f) =>
        f.densityMolPerM3 > sat.liquidDensityMolPerM3 &&
        T >= f.minTemperatureK - 0.05 &&
        T <= f.maxTemperatureK + 0.05,
    )
    .sort((a, b) => a.densityMolPerM3 - b.densityMolPerM3);
  if (liquidFits.length < 3) {
    throw new InputError({
      input: "isochoreFits",
      unit: "-",
      validRange: `at least 3 liquid isochores (density > ${sat.liquidDensityMolPerM3} mol/m3) measured at ${T} K`,
      received: liquidFits.length,
    });
  }
  const lNodes = liquidFits.map((f) => ({ rho: f.densityMolPerM3, ev: f.evaluate(T) }));

  // Inputs as one vector, so every uncertainty is propagated by the same one-sigma steps.
  const x0 = [
    sat.pressurePa,
    sat.slopePaPerK,
    sat.vaporDensityMolPerM3,
    sat.liquidDensityMolPerM3,
    ...vNodes.flatMap((n) => [n.ev.pressurePa, n.ev.slopePaPerK]),
    ...lNodes.flatMap((n) => [n.ev.pressurePa, n.ev.slopePaPerK]),
  ];
  const u0 = [
    sat.uPressurePa ?? 0,
    sat.uSlopePaPerK ?? 0,
    sat.uVaporDensityMolPerM3 ?? 0,
    sat.uLiquidDensityMolPerM3 ?? 0,
    ...vNodes.flatMap((n) => [n.ev.uPressurePa, n.ev.uSlopePaPerK]),
    ...lNodes.flatMap((n) => [n.ev.uPressurePa, n.ev.uSlopePaPerK]),
  ];
  const nV = vNodes.length;
  const compute = (x: readonly number[]) => {
    const [Ps, dPs, rV, rL] = x as [number, number, number, number];
    const vRho = vNodes.map((n) => n.rho);
    const vP = vNodes.map((_, k) => x[4 + 2 * k]);
    const vS = vNodes.map((_, k) => x[5 + 2 * k]);
    const lRho = lNodes.map((n) => n.rho);
    const lP = lNodes.map((_, k) => x[4 + 2 * nV + 2 * k]);
    const lS = lNodes.map((_, k) => x[5 + 2 * nV + 2 * k]);
    const fA = (rho: number, P: number) => (P - rho * R * T) / (rho * rho);
    const fS = (rho: number, S: number) => (rho * R - S) / (rho * rho);
    // Vapour: last node -> rho_V.
    const fSv = vRho.map((r, k) => fS(r, vS[k]));
    const exV = extrapolate(vRho, fSv, rV);
    const qAv = cumulativeIrregular(
      [...vRho, rV],
      [...vRho.map((r, k) => fA(r, vP[k])), fA(rV, Ps)],
    );
    const qSv = cumulativeIrregular([...vRho, rV], [...fSv, exV.value]);
    const aV = last.residual.a + qAv.values[nV] - qAv.values[nV - 1];
    const sV = last.residual.s + qSv.values[nV] - qSv.values[nV - 1];
    // Across the dome.
    const dv = 1 / rV - 1 / rL;
    const aL = aV + Ps * dv - R * T * Math.log(rL / rV);
    const sL = sV - dPs * dv + R * Math.log(rL / rV);
    // Liquid: rho_L -> nodes.
    const fSl = lRho.map((r, k) => fS(r, lS[k]));
    const exL = extrapolate(lRho.slice(0, 3).reverse(), fSl.slice(0, 3).reverse(), rL);
    const qAl = cumulativeIrregular(
      [rL, ...lRho],
      [fA(rL, Ps), ...lRho.map((r, k) => fA(r, lP[k]))],
    );
    const qSl = cumulativeIrregular([rL, ...lRho], [exL.value, ...fSl]);
    const states = [
      { rho: rV, P: Ps, a: aV, s: sV },
      { rho: rL, P: Ps, a: aL, s: sL },
      ...lRho.map((r, k) => ({
        rho: r,
        P: lP[k],
        a: aL + qAl.values[k + 1],
        s: sL + qSl.values[k + 1],
      })),
    ];
    return {
      states,
      extrapolationS: { vapor: exV.spread, liquid: exL.spread },
      quad: { a: qAl.errorEstimates, s: qSl.errorEstimates },
    };
  };
  const nominal = compute(x0);
  const sets = (x: readonly number[]) =>
    compute(x).states.map((st) =>
      departuresFromIntegrals(T, st.P / (st.rho * R * T), st.a, st.s, R),
    );
  const base = sets(x0);
  const variance = base.map(() => ({ a: 0, s: 0, u: 0, h: 0, g: 0, lnPhi: 0 }) as DepartureSet);
  for (let i = 0; i < x0.length; i++) {
    if (!(u0[i] > 0)) continue;
    const x = x0.slice();
    x[i] = x[i] + u0[i];
    sets(x).forEach((d, k) => {
      const v = variance[k];
      const b = base[k];
      for (const key of ["a", "s", "u", "h", "g", "lnPhi"] as const)
        v[key] += (d[key] - b[key]) ** 2;
    });
  }
  // Systematic parts: the vapour start's own uncertainty, the slope extrapolations (entropy; for
  // a through nothing, for u = a + T s through T), the liquid quadrature.
  const startA = last.uncertainty.a;
  const startS = last.uncertainty.s;
  const widthV = sat.vaporDensityMolPerM3 - last.densityMolPerM3;
  const exSv = (nominal.extrapolationS.vapor * widthV) / 2;
  const states: DomeState[] = nominal.states.map((st, k) => {
    const v = variance[k];
    const isLiquidNode = k >= 2;
    const widthL = isLiquidNode ? st.rho - sat.liquidDensityMolPerM3 : 0;
    const exSl =
      k >= 1
        ? (nominal.extrapolationS.liquid *
            Math.min(widthL, lNodes[0] ? lNodes[0].rho - sat.liquidDensityMolPerM3 : 0)) /
          2
        : 0;
    const qa = isLiquidNode ? nominal.quad.a[k - 1] : 0;
    const qs = isLiquidNode ? nominal.quad.s[k - 1] : 0;
    const sysU = Math.hypot(startA, T * startS, T * exSv, T * exSl, qa + T * qs);
    const sysG = Math.hypot(startA, qa);
    return {
      densityMolPerM3: st.rho,
      pressurePa: st.P,
      residual: base[k],
      uncertainty: {
        a: Math.hypot(Math.sqrt(v.a), startA, qa),
        s: Math.hypot(Math.sqrt(v.s), startS, exSv, exSl, qs),
        u: Math.hypot(Math.sqrt(v.u), sysU),
        h: Math.hypot(Math.sqrt(v.h), sysU),
        g: Math.hypot(Math.sqrt(v.g), sysG),
        lnPhi: Math.hypot(Math.sqrt(v.lnPhi), sysG / (R * T)),
      },
    };
  });
  return {
    temperatureK: T,
    saturatedVapor: states[0],
    saturatedLiquid: states[1],
    liquid: states.slice(2),
  };
}
