/**
 * The path around the critical point: departures at a state below the critical temperature that
 * the isotherm route cannot reach (its isotherm crosses the two-phase region) are carried from a
 * supercritical isotherm down the isochore, where the fluid stays in one phase. At constant density
 * (du)_rho = cv dT and (ds)_rho = cv/T dT, and the ideal gas obeys the same relations with cv_ig, so
 *
 *   u_res(T, rho) = u_res(T_via, rho) - int_T^T_via cv_res dT'
 *   s_res(T, rho) = s_res(T_via, rho) - int_T^T_via cv_res / T' dT'
 *
 * with cv_res = cv - cv_ig measured (calorimeter, minus the ideal-gas cv of the idealgas module) or
 * modelled (e.g. from any ResidualModel, cv_res = -R (2 aT + aTT) in the reduced derivatives of
 * eos/types.ts). Then a_res = u_res - T s_res, and Z from the isochore fit's pressure at T gives h,
 * g and ln phi (departureSet.ts). (Relations: e.g. Span, Multiparameter Equations of State, 2000,
 * Table 3.1; the route is the one sketched in issue 6, item 4.)
 *
 * Quadrature: adaptive Gauss-Kronrod (numerics/gaussKronrod.ts) for a cv function; the irregular
 * cumulative rule (irregularQuadrature.ts) for tabulated cv. The standard uncertainty of tabulated
 * cv is propagated as fully correlated (a calorimeter's calibration error shifts every point the
 * same way), u_int = int u(cv_res) dT, which is conservative for independent errors.
 */
import { InputError, OutOfRangeError } from "../errors.js";
import { integrateAdaptive } from "../numerics/index.js";
import { departuresFromIntegrals } from "./departureSet.js";
import type { DepartureSet } from "./departureSet.js";
import type { PvtRouteResult } from "./departuresFromPvt.js";
import { cumulativeIrregular } from "../numerics/cumulativeIrregular.js";

/** Residual isochoric heat capacity along the isochore, J/(mol K). */
export type ResidualCvInput =
  | ((temperatureK: number) => number)
  | {
      /** Temperatures, K, ascending, spanning [T, T_via]. */
      temperatureK: readonly number[];
      /** cv - cv_ig at those temperatures, J/(mol K). */
      cvResidualJPerMolK: readonly number[];
      /** Standard uncertainties of cv_res, J/(mol K) (optional). */
      uCvResidualJPerMolK?: readonly number[];
    };

/** What departuresAroundCriticalPoint needs: the route result, the target state and a residual cv. */
export interface AroundCriticalPointRequest {
  /** Target temperature, K (below Tc, where the isotherm route stopped). */
  temperatureK: number;
  /** Density of an isochore of the route's fits, mol/m3 (matched within 1e-6 relative). */
  isochoreDensityMolPerM3: number;
  /** A reported (supercritical) isotherm of the result on which this isochore is a node, K. */
  viaIsothermK: number;
  cvResidual: ResidualCvInput;
}

/** Result of {@link departuresAroundCriticalPoint}: the departures at the target and their uncertainties. */
export interface AroundCriticalPointResult {
  temperatureK: number;
  densityMolPerM3: number;
  /** Smoothed pressure of the isochore fit at T, Pa. */
  pressurePa: number;
  residual: DepartureSet;
  /** Standard uncertainties: the start state's, the cv integral's and the isochore pressure's. */
  uncertainty: DepartureSet;
  /** What was done, in words, for records. */
  path: string;
}

/** Departures below the critical temperature reached down an isochore with a residual cv (see the header). */
export function departuresAroundCriticalPoint(
  result: PvtRouteResult,
  request: AroundCriticalPointRequest,
): AroundCriticalPointResult {
  const R = result.gasConstant;
  const { temperatureK: T, isochoreDensityMolPerM3: rho, viaIsothermK } = request;
  if (!(T > 0 && T < Infinity)) {
    throw new InputError({
      input: "temperatureK",
      unit: "K",
      validRange: "a finite number > 0",
      received: T,
    });
  }
  const iso = result.isotherms.find(
    (i) => Math.abs(i.temperatureK - viaIsothermK) <= 1e-6 * viaIsothermK,
  );
  if (!iso) {
    throw new InputError({
      input: "viaIsothermK",
      unit: "K",
      validRange: `one of the reported isotherms (${result.isotherms.map((i) => i.temperatureK.toFixed(2)).join(", ")})`,
      received: viaIsothermK,
    });
  }
  const start = iso.states.find((s) => Math.abs(s.densityMolPerM3 - rho) <= 1e-6 * rho);
  const fit = result.isochoreFits.find((f) => Math.abs(f.densityMolPerM3 - rho) <= 1e-6 * rho);
  if (!start || !fit) {
    throw new InputError({
      input: "isochoreDensityMolPerM3",
      unit: "mol/m3",
      validRange: `the density of an isochore that is a node of the ${viaIsothermK} K isotherm (${iso.states.map((s) => s.densityMolPerM3.toPrecision(6)).join(", ")})`,
      received: rho,
    });
  }
  if (!(T >= fit.minTemperatureK - 1e-9 && T <= fit.maxTemperatureK + 1e-9)) {
    throw new OutOfRangeError({
      input: "temperatureK",
      unit: "K",
      validRange: `within the isochore's measured range ${fit.minTemperatureK} to ${fit.maxTemperatureK} K (its pressure is needed at T)`,
      received: T,
    });
  }
  const Tv = iso.temperatureK;
  let intCv: number;
  let intCvOverT: number;
  let uIntCv = 0;
  let uIntCvOverT = 0;
  let quadErr: number;
  const cv = request.cvResidual;
  if (typeof cv === "function") {
    const a = integrateAdaptive(cv, T, Tv, { relTolerance: 1e-10 });
    const b = integrateAdaptive((t) => cv(t) / t, T, Tv, { relTolerance: 1e-10 });
    intCv = a.value;
    intCvOverT = b.value;
    quadErr = a.errorEstimate;
  } else {
    const ts = cv.temperatureK;
    const lo = ts[0];
    const hi = ts[ts.length - 1];
    if (!(ts.length >= 3 && lo <= Math.min(T, Tv) + 1e-9 && hi >= Math.max(T, Tv) - 1e-9)) {
      throw new InputError({
        input: "cvResidual.temperatureK",
        unit: "K",
        validRange: `at least 3 ascending temperatures spanning ${Math.min(T, Tv)} to ${Math.max(T, Tv)} K`,
        received: `${ts.length} values from ${lo} to ${hi} K`,
      });
    }
    const at = (values: readonly number[]) => {
      const c = cumulativeIrregular(ts, values);
      const interp = (x: number) => {
        // cumulative value at x by the trapezoid on the bracketing interval (x is usually a node)
        let k = 0;
        while (k < ts.length - 2 && ts[k + 1] < x) k++;
        const x0 = ts[k];
        const x1 = ts[k + 1];
        const f0 = values[k];
        const f1 = values[k + 1];
        const fx = f0 + ((f1 - f0) * (x - x0)) / (x1 - x0);
        return c.values[k] + 0.5 * (x - x0) * (f0 + fx);
      };
      return { integral: interp(Tv) - interp(T), error: c.errorEstimates[ts.length - 1] };
    };
    const f = cv.cvResidualJPerMolK;
    const r1 = at(f);
    const r2 = at(f.map((v, k) => v / ts[k]));
    intCv = r1.integral;
    intCvOverT = r2.integral;
    quadErr = r1.error;
    if (cv.uCvResidualJPerMolK) {
      const u = cv.uCvResidualJPerMolK;
      uIntCv = Math.abs(at(u).integral);
      uIntCvOverT = Math.abs(at(u.map((v, k) => v / ts[k])).integral);
    }
  }
  const u = start.residual.u - intCv;
  const s = start.residual.s - intCvOverT;
  const a = u - T * s;
  const ev = fit.evaluate(T);
  const Z = ev.pressurePa / (rho * R * T);
  const residual = departuresFromIntegrals(T, Z, a, s, R);
  const uU = Math.hypot(start.uncertainty.u, uIntCv, quadErr);
  const uS = Math.hypot(start.uncertainty.s, uIntCvOverT);
  const uA = Math.hypot(
    start.uncertainty.a,
    uIntCv,
    T * uIntCvOverT,
    start.uncertainty.s * Math.abs(Tv - T),
  );
  const uPV = ev.uPressurePa / rho;
  return {
    temperatureK: T,
    densityMolPerM3: rho,
    pressurePa: ev.pressurePa,
    residual,
    uncertainty: {
      a: uA,
      s: uS,
      u: uU,
      h: Math.hypot(uU, uPV),
      g: Math.hypot(uA, uPV),
      lnPhi: Math.hypot(uA, uPV) / (R * T),
    },
    path: `isotherm ${Tv.toFixed(2)} K from zero density to ${rho.toPrecision(6)} mol/m3, then the isochore down to ${T.toFixed(2)} K with the residual cv (${typeof cv === "function" ? "function, adaptive Gauss-Kronrod" : "tabulated, irregular quadrature"})`,
  };
}
