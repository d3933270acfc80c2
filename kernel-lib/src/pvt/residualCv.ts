/**
 * Residual isochoric heat capacity from P-V-T data, and the calorimetric consistency check of
 * issue 6 item 6. Differentiating s_res along the isochore (integrateIsotherm.ts) gives
 *
 *   cv_res(T, rho) = -T int_0^rho (d2P/dT2)_rho' / rho'^2 drho'
 *
 * (e.g. Smith, Van Ness & Abbott, 7th ed., §6.2 with (dcv/dv)_T = T (d2P/dT2)_v), evaluated with
 * the isochore fits' curvature at the route's nodes, the low-density bridge (with
 * P = rho R T (1 + B rho + ...) the integrand tends to -R T (2 dB/dT + T d2B/dT2), finite) and the
 * irregular cumulative quadrature. Each node's
 * curvature comes from a different isochore fit, so the node errors are independent and the
 * standard uncertainty is propagated linearly through the (linear) bridge + quadrature map.
 * Needs isochore orders >= 2 (a straight line has no curvature).
 *
 * Fit-order (model) error: a curvature is a second derivative of a polynomial whose order AICc chose
 * for P, not for d2P/dT2; near the critical point, where (d2P/dT2)_rho grows fast towards low T, a
 * too-low order misses it at the cold end of the range, far outside the propagated uncertainty
 * (demo campaign, CO2 at 310 K: -18.6 u). As in departuresFromPvt (PvtState.method), every isochore
 * is refitted with its order raised by one and by two (where admissible; lowered by one, not below 2,
 * at the highest admissible order) and the larger change of cv_res is added in quadrature as a
 * method error (one order up alone left -3.3 u at 310 K on the demo campaign). This is an estimate,
 * not a bound: on synthetic Span-Wagner campaigns 6 K above Tc the cold-end isotherm can still be
 * 3-4.5 u off. So a warning names every isotherm within one temperature step of either end of any
 * node's isochore, where the curvature rests on the end of the polynomial.
 */
import { InputError } from "../errors.js";
import type { PvtRouteResult } from "./departuresFromPvt.js";
import type { PvtDiagnostic } from "./pvtDiagnostic.js";
import { cumulativeIrregular } from "../numerics/cumulativeIrregular.js";
import { lowDensityBridge } from "./lowDensityBridge.js";

/** Residual isochoric heat capacity along an isochore from the P-V-T data, with uncertainties. */
export interface ResidualCvProfile {
  temperatureK: number;
  densityMolPerM3: number[];
  /** cv - cv_ig at each node, J/(mol K). */
  cvResidualJPerMolK: number[];
  /** Combined standard uncertainty (propagated and method, in quadrature), J/(mol K). */
  uCvResidualJPerMolK: number[];
  /** Propagated part (curvature uncertainties of the isochore fits), J/(mol K). */
  uPropagatedJPerMolK: number[];
  /** Fit-order (method) part: change of cv_res when the isochore orders change by one, J/(mol K). */
  methodJPerMolK: number[];
  /** Warnings (curvature at the end of an isochore's temperature range, no order estimate). */
  diagnostics: PvtDiagnostic[];
}

/** cv_res along the isotherm T (a reported isotherm of the isochore route), at its nodes. */
export function residualCvFromPvt(result: PvtRouteResult, temperatureK: number): ResidualCvProfile {
  const iso = result.isotherms.find(
    (i) => Math.abs(i.temperatureK - temperatureK) <= 1e-6 * temperatureK,
  );
  if (result.route !== "isochores" || !iso) {
    throw new InputError({
      input: "temperatureK",
      unit: "K",
      validRange: `a reported isotherm of the isochore route (${result.isotherms.map((i) => i.temperatureK.toFixed(2)).join(", ")})`,
      received: temperatureK,
    });
  }
  const T = iso.temperatureK;
  const rho = iso.states.map((s) => s.densityMolPerM3);
  const fits = rho.map((r) => result.isochoreFits.find((f) => f.densityMolPerM3 === r));
  const integrandFrom = (c: readonly { curvaturePaPerK2: number }[]) =>
    rho.map((r, k) => (-T * (c[k] as { curvaturePaPerK2: number }).curvaturePaPerK2) / (r * r));
  const curv = fits.map((f) =>
    f ? f.curvature(T) : { curvaturePaPerK2: Number.NaN, uCurvaturePaPerK2: 0 },
  );
  const f = integrandFrom(curv);
  const u = rho.map(
    (r, k) => (T * (curv[k] as { uCurvaturePaPerK2: number }).uCurvaturePaPerK2) / (r * r),
  );
  const degree = lowDensityBridge(rho, f, u.every((x) => x > 0) ? u : undefined).degree;
  const integrate = (values: readonly number[]) => {
    const b = lowDensityBridge(rho, values, undefined, { degree, estimateTruncation: false });
    const q = cumulativeIrregular(rho, values);
    return q.values.map((v) => v + b.integral);
  };
  const nominal = integrate(f);
  const variance = nominal.map(() => 0);
  for (let k = 0; k < rho.length; k++) {
    const bumped = f.slice();
    bumped[k] = bumped[k] + u[k];
    integrate(bumped).forEach((v, j) => (variance[j] = variance[j] + (v - nominal[j]) ** 2));
  }
  const diagnostics: PvtDiagnostic[] = [];
  // Fit-order part: every isochore refitted one and two orders up (where admissible; one down at the
  // highest admissible order), the larger change of cv_res at each node kept.
  let orderChanged = true;
  const method = nominal.map(() => 0);
  for (const step of [1, 2]) {
    let any = false;
    const altCurv = fits.map((fit, k) => {
      if (!fit) return curv[k] as { curvaturePaPerK2: number };
      const up = fit.order + step <= fit.distinctTemperatures - 1;
      const other = up ? fit.order + step : fit.order - 1;
      if (!up && (other < 2 || step > 1)) {
        if (step === 1) orderChanged = false;
        return curv[k] as { curvaturePaPerK2: number };
      }
      any = true;
      return fit.refit({ order: other }).curvature(T);
    });
    if (!any) continue;
    integrate(integrandFrom(altCurv)).forEach(
      (v, j) => (method[j] = Math.max(method[j], Math.abs(v - nominal[j]))),
    );
  }
  if (!orderChanged) {
    diagnostics.push({
      code: "fit-order-estimate",
      severity: "info",
      message: `cv_res at ${T.toFixed(2)} K: some isochores have too few temperatures to change their order, so the fit-order error of cv_res is only partly estimated`,
    });
  }
  // Within one temperature step (range / (distinct temperatures - 1), +1 % for rounding) of either
  // end of an isochore's measured range, its curvature comes from the end of the polynomial.
  const edge = fits.filter((fit) => {
    if (!fit) return false;
    const step =
      (1.01 * (fit.maxTemperatureK - fit.minTemperatureK)) /
      Math.max(fit.distinctTemperatures - 1, 1);
    return T <= fit.minTemperatureK + step || T >= fit.maxTemperatureK - step;
  });
  if (edge.length > 0) {
    diagnostics.push({
      code: "curvature-at-range-end",
      severity: "warning",
      message: `cv_res at ${T.toFixed(2)} K: ${edge.length} of ${fits.length} isochores end within one temperature step of ${T.toFixed(2)} K, where (d2P/dT2)_rho comes from the end of a polynomial and is poorly determined, more so near the critical point; the uncertainty includes a fit-order estimate, but read these values with caution, or measure further beyond ${T.toFixed(2)} K`,
    });
  }
  const uProp = variance.map(Math.sqrt);
  return {
    temperatureK: T,
    densityMolPerM3: rho,
    cvResidualJPerMolK: nominal,
    uCvResidualJPerMolK: uProp.map((v, j) => Math.hypot(v, method[j])),
    uPropagatedJPerMolK: uProp,
    methodJPerMolK: method,
    diagnostics,
  };
}

/** A calorimetric measurement on one of the isochores, reduced to its residual part. */
export interface ResidualCvMeasurement {
  temperatureK: number;
  /** Must be the density of an isochore of the route (same cell), mol/m3, within 1e-3 relative. */
  densityMolPerM3: number;
  /** Measured cv minus the ideal-gas cv at T (idealgas module), J/(mol K). */
  cvResidualJPerMolK: number;
  /** Standard uncertainty of the measured value, J/(mol K). */
  uCvResidualJPerMolK: number;
}

/**
 * Compares measured residual cv with the one derived from the P-V-T data; flags every
 * measurement that differs by more than 3 combined standard uncertainties.
 */
export function checkCalorimetry(
  result: PvtRouteResult,
  measurements: readonly ResidualCvMeasurement[],
): {
  points: { measurement: ResidualCvMeasurement; fromPvt: number; uFromPvt: number; z: number }[];
  diagnostics: PvtDiagnostic[];
} {
  const points = measurements.map((m, i) => {
    const profile = residualCvFromPvt(result, m.temperatureK);
    const k = profile.densityMolPerM3.findIndex((r) => Math.abs(r / m.densityMolPerM3 - 1) <= 1e-3);
    if (k < 0) {
      throw new InputError({
        input: `measurements[${i}].densityMolPerM3`,
        unit: "mol/m3",
        validRange: `an isochore density of the route at ${m.temperatureK} K (${profile.densityMolPerM3.map((r) => r.toPrecision(6)).join(", ")})`,
        received: m.densityMolPerM3,
      });
    }
    const fromPvt = profile.cvResidualJPerMolK[k];
    const uFromPvt = profile.uCvResidualJPerMolK[k];
    const z = (m.cvResidualJPerMolK - fromPvt) / Math.hypot(m.uCvResidualJPerMolK, uFromPvt);
    return { measurement: m, fromPvt, uFromPvt, z };
  });
  const bad = points.filter((p) => !(Math.abs(p.z) <= 3));
  const diagnostics: PvtDiagnostic[] = [
    bad.length === 0
      ? {
          code: "calorimetric-consistency",
          severity: "info",
          message: `all ${points.length} calorimetric cv values agree with the P-V-T data within 3 u`,
        }
      : {
          code: "calorimetric-consistency",
          severity: "warning",
          message:
            `${bad.length} of ${points.length} calorimetric cv values contradict the P-V-T data (> 3 u): ` +
            bad
              .map(
                (p) =>
                  `${p.measurement.temperatureK} K, ${p.measurement.densityMolPerM3.toPrecision(5)} mol/m3 (${p.z.toFixed(1)} u)`,
              )
              .join("; "),
        },
  ];
  return { points, diagnostics };
}
