/**
 * The low-density bridge: the departure integrals start at zero density, where there are no data.
 * Along an isotherm each integrand is, by the virial expansion (Mason & Spurling, The Virial
 * Equation of State, 1969, ch. 1),
 *     (P - rho R T)/rho^2          = R T (B + C rho + ...)
 *     (rho R - (dP/dT)_rho)/rho^2  = -R (B + T dB/dT) - R (C + T dC/dT) rho - ...
 * so a weighted polynomial fitted to the integrand at the lowest-density nodes gives its value at
 * zero density (hence B, and C from the slope where the data allow) and, integrated analytically,
 * the part of the integral from zero to the first node. The polynomial degree (0, 1 or 2) is chosen
 * by AICc among those the number of nodes allows (0 to 3); the bridge's standard uncertainty from
 * the fit covariance is reported apart from its truncation estimate, the change of the integral
 * when the degree is raised by one (or lowered, when the nodes do not allow more).
 */
import { powerRow } from "../numerics/powerRow.js";
import { SolverError } from "../errors.js";
import { aicc } from "../numerics/aicc.js";
import { weightedLeastSquares } from "../numerics/weightedLeastSquares.js";

/** Options of {@link lowDensityBridge}. */
export interface BridgeOptions {
  /** Number of lowest-density nodes used. Default 5 (or all, if fewer). */
  nodes?: number;
  /** Fixed polynomial degree (0 to 3). Default: chosen by AICc. */
  degree?: number;
  /** Compute the truncation estimates (two more small fits). Default true. */
  estimateTruncation?: boolean;
}

/** Result of {@link lowDensityBridge}. */
export interface BridgeResult {
  /** Polynomial coefficients c0 + c1 rho + c2 rho^2 of the integrand (units of the integrand per rho^k). */
  coefficients: number[];
  /** Standard uncertainties of the coefficients. */
  coefficientUncertainties: number[];
  /** Integral from 0 to `toDensity`. */
  integral: number;
  /** Its standard uncertainty (fit covariance). */
  uIntegral: number;
  /** Truncation estimate: |integral(degree) - integral(degree +/- 1)|. */
  truncation: number;
  /** Truncation estimate of the zero-density value c0 (hence of B): |c0(degree) - c0(degree +/- 1)|. */
  truncationAtZero: number;
  /** Upper end of the bridge: the lowest data density, mol/m3. */
  toDensity: number;
  degree: number;
  nodesUsed: number;
}

/**
 * @param density node densities, ascending, mol/m3
 * @param integrand integrand values at the nodes
 * @param sigma standard deviation of each integrand value (undefined: unit weights, scale from scatter)
 */
export function lowDensityBridge(
  density: readonly number[],
  integrand: readonly number[],
  sigma: readonly number[] | undefined,
  options: BridgeOptions = {},
): BridgeResult {
  const m = Math.min(options.nodes ?? 5, density.length);
  const x = density.slice(0, m);
  const y = integrand.slice(0, m);
  const scaleKnown = sigma !== undefined && sigma.slice(0, m).every((s) => s > 0);
  const s = scaleKnown ? sigma.slice(0, m) : x.map(() => 1);
  const toDensity = x[0];
  const scale = x[m - 1];
  const degrees = options.degree !== undefined ? [options.degree] : [0, 1, 2, 3];
  let best: { score: number; degree: number; coef: number[]; cov: number[][] } | undefined;
  const integralOf = (degree: number): { integral: number; c0: number } | undefined => {
    if (!(degree >= 0 && degree + 1 <= m)) return undefined;
    const design = x.map((r) => powerRow(r / scale, degree + 1));
    const c = weightedLeastSquares(design, y, s).coefficients;
    return {
      integral: c.reduce(
        (acc, cj, j) => acc + (cj / scale ** j) * (toDensity ** (j + 1) / (j + 1)),
        0,
      ),
      c0: c[0],
    };
  };
  for (const degree of degrees) {
    if (degree + 1 > m) continue;
    const design = x.map((r) => powerRow(r / scale, degree + 1));
    const fit = weightedLeastSquares(design, y, s);
    const dof = fit.degreesOfFreedom;
    const red = dof > 0 ? fit.chiSquare / dof : Number.NaN;
    const factor = scaleKnown ? (dof > 0 ? Math.max(1, red) : 1) : dof > 0 ? red : 0;
    const raw = options.degree !== undefined ? 0 : aicc(fit.chiSquare, m, degree + 1, scaleKnown);
    const score = Number.isFinite(raw) ? raw : 1e300 + degree;
    if (!best || score < best.score) {
      best = {
        score,
        degree,
        coef: fit.coefficients.map((c, j) => c / scale ** j),
        cov: fit.covariance.map((row, i) =>
          row.map((v, j) => (v * factor) / (scale ** i * scale ** j)),
        ),
      };
    }
  }
  if (!best) {
    throw new SolverError(
      "low-density bridge fit",
      `no admissible degree among ${degrees.join(", ")} with ${m} nodes`,
    );
  }
  const g = best.coef.map((_, j) => toDensity ** (j + 1) / (j + 1));
  let integral = 0;
  let v = 0;
  for (let i = 0; i < g.length; i++) {
    integral += g[i] * best.coef[i];
    for (let j = 0; j < g.length; j++) v += g[i] * best.cov[i][j] * g[j];
  }
  const other =
    options.estimateTruncation === false
      ? undefined
      : (integralOf(best.degree + 1) ?? integralOf(best.degree - 1));
  return {
    truncation: other === undefined ? 0 : Math.abs(other.integral - integral),
    truncationAtZero: other === undefined ? 0 : Math.abs(other.c0 - best.coef[0]),
    coefficients: best.coef,
    coefficientUncertainties: best.cov.map((row, i) => Math.sqrt(Math.max(row[i], 0))),
    integral,
    uIntegral: Math.sqrt(Math.max(v, 0)),
    toDensity,
    degree: best.degree,
    nodesUsed: m,
  };
}

/**
 * A bridge with its degree and weights fixed: a linear map from the integrand values at the
 * bridge's nodes to its coefficients and integral (weighted least squares with fixed weights is
 * linear in the data), used when the route is re-evaluated for other pressures (uncertainty
 * propagation) without fitting again.
 */
export interface FrozenBridge {
  /** The nominal fit; its uncertainty and truncation fields are kept by `apply`. */
  readonly nominal: BridgeResult;
  /** Weight of node j in coefficient c: coefficientWeights[c][j]. */
  readonly coefficientWeights: readonly Float64Array[];
  /** Weight of node j in the integral from 0 to the first node. */
  readonly integralWeights: Float64Array;
  /** The bridge of other integrand values (coefficients and integral; the rest from `nominal`). */
  apply(integrand: readonly number[]): BridgeResult;
}

/**
 * Freezes a fitted bridge: its weights from unit integrands through {@link lowDensityBridge} at the
 * nominal degree with the same sigma.
 * @param density node densities, ascending, mol/m3 (as given to the nominal fit)
 * @param sigma the nominal fit's standard deviations of the integrand (undefined: unit weights)
 * @param nominal the nominal fit
 * @param options the nominal fit's options (`nodes`)
 */
export function freezeBridge(
  density: readonly number[],
  sigma: readonly number[] | undefined,
  nominal: BridgeResult,
  options: BridgeOptions = {},
): FrozenBridge {
  const m = nominal.nodesUsed;
  const k = nominal.coefficients.length;
  const coefficientWeights = Array.from({ length: k }, () => new Float64Array(m));
  const integralWeights = new Float64Array(m);
  for (let j = 0; j < m; j++) {
    const unit = new Array<number>(m).fill(0);
    unit[j] = 1;
    const b = lowDensityBridge(density, unit, sigma, {
      ...options,
      degree: nominal.degree,
      estimateTruncation: false,
    });
    for (let c = 0; c < k; c++) coefficientWeights[c][j] = b.coefficients[c];
    integralWeights[j] = b.integral;
  }
  return {
    nominal,
    coefficientWeights,
    integralWeights,
    apply(integrand: readonly number[]): BridgeResult {
      const coefficients = coefficientWeights.map((w) => {
        let v = 0;
        for (let j = 0; j < m; j++) v += w[j] * integrand[j];
        return v;
      });
      let integral = 0;
      for (let j = 0; j < m; j++) integral += integralWeights[j] * integrand[j];
      return { ...nominal, coefficients, integral };
    },
  };
}
