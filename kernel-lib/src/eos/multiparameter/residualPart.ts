/**
 * Residual part phi_r(tau, delta) of a multiparameter Helmholtz equation of state, compiled from
 * coefficient tables into flat arrays and evaluated without allocation.
 *
 * Term forms (tau = T_red / T, delta = rho / rho_red):
 *   power / exponential:  n delta^d tau^t exp(-g delta^c)            (c = 0: no exponential)
 *   Gaussian bell-shaped: n delta^d tau^t exp(-alpha (delta - eps)^2 - beta (tau - gamma)^2)
 *   non-analytic:         n Delta^b delta psi,
 *       theta = (1 - tau) + A ((delta - 1)^2)^(1 / (2 beta)),
 *       Delta = theta^2 + B ((delta - 1)^2)^a,
 *       psi   = exp(-C (delta - 1)^2 - D (tau - 1)^2).
 * Sources: W. Wagner and A. Pruss, J. Phys. Chem. Ref. Data 31, 387 (2002), eq. (6.5) and Table 6.5
 * (derivatives); IAPWS R6-95(2018), Tables 4 and 5; R. Span and W. Wagner, J. Phys. Chem. Ref. Data
 * 25, 1509 (1996), eq. (6.44) (the same forms, used for carbon dioxide).
 *
 * Derivatives are returned "reduced" (multiplied by the variable): delta phi_d, delta^2 phi_dd,
 * delta^3 phi_ddd, tau phi_t, tau^2 phi_tt, delta tau phi_dt. For the power, exponential and
 * Gaussian terms all are analytic. For the non-analytic terms delta^3 phi_ddd is obtained, only
 * when asked for (`third`), by a central difference of their analytic phi_dd (step 1e-6 delta;
 * relative error about 1e-9 of those two or three terms); otherwise it is NaN, and the model
 * leaves aDDD out so that callers fall back on their own differences.
 *
 * Speed (this runs in the engine's tight loops): integer powers of delta and tau come from tables
 * of repeated products, exponents that are multiples of 1/8 from tau^(1/8) (three square roots),
 * terms with equal exp(-g delta^c) share one exp(), and non-analytic terms with equal
 * (a, beta, A, B) share theta and Delta.
 */

/** One polynomial term (c = 0) or exponential term (c > 0): n delta^d tau^t exp(-g delta^c), the papers' symbols. */
export interface PowerTermData {
  readonly n: number;
  readonly d: number;
  readonly t: number;
  readonly c: number;
  /** Coefficient of delta^c in the exponent; 1 in IAPWS-95 and Span-Wagner. */
  readonly g?: number;
}

/** One Gaussian bell-shaped term. */
export interface GaussianTermData {
  readonly n: number;
  readonly d: number;
  readonly t: number;
  readonly alpha: number;
  readonly beta: number;
  readonly gamma: number;
  readonly epsilon: number;
}

/** One non-analytic near-critical term (IAPWS-95 form). */
export interface NonAnalyticTermData {
  readonly n: number;
  readonly a: number;
  readonly b: number;
  readonly beta: number;
  readonly A: number;
  readonly B: number;
  readonly C: number;
  readonly D: number;
}

/** Coefficient tables of a residual part. */
export interface ResidualPartData {
  readonly polynomialExponential: readonly PowerTermData[];
  readonly gaussianBell: readonly GaussianTermData[];
  readonly nearCritical: readonly NonAnalyticTermData[];
}

/**
 * Reduced derivatives of phi_r at (tau, delta). Mutable on purpose: evaluation writes into a
 * caller-owned object so tight loops allocate nothing.
 */
export interface ReducedHelmholtz {
  /** phi */
  f: number;
  /** delta d(phi)/d(delta) */
  fD: number;
  /** delta^2 d2(phi)/d(delta)2 */
  fDD: number;
  /** delta^3 d3(phi)/d(delta)3 */
  fDDD: number;
  /** tau d(phi)/d(tau) */
  fT: number;
  /** tau^2 d2(phi)/d(tau)2 */
  fTT: number;
  /** delta tau d2(phi)/d(delta)d(tau) */
  fDT: number;
}

/** A fresh zeroed {@link ReducedHelmholtz}. */
export function emptyReducedHelmholtz(): ReducedHelmholtz {
  return { f: 0, fD: 0, fDD: 0, fDDD: 0, fT: 0, fTT: 0, fDT: 0 };
}

/** The compiled residual part; create with {@link compileResidualPart}. */
export interface ResidualPart {
  /**
   * Allocates nothing: overwrites `out` with phi_r and its reduced derivatives. The third delta
   * derivative of the non-analytic terms (a central difference, three times their cost) is
   * computed only when `third` is true; otherwise `out.fDDD` is NaN for an equation that has
   * non-analytic terms (and exact for one that has none).
   */
  evaluate(tau: number, delta: number, out: ReducedHelmholtz, third?: boolean): ReducedHelmholtz;
  /** True when the equation has non-analytic terms (fDDD then needs `third`). */
  readonly hasNonAnalytic: boolean;
  /** Number of terms (for reports). */
  readonly termCount: number;
}

const MAX_INT_POWER = 32;

/**
 * Compiles coefficient tables into a fast evaluator. Integer exponents of delta (and of tau, where
 * integer) are taken from tables of repeated products; non-integer tau exponents use
 * exp(t ln tau); terms with the same exponential delta^c share one exp().
 */
export function compileResidualPart(data: ResidualPartData): ResidualPart {
  const np = data.polynomialExponential.length;
  const pn = new Float64Array(np);
  const pd = new Int32Array(np);
  const pt = new Float64Array(np);
  const ptInt = new Int32Array(np); // integer tau exponent or -1 when non-integer/negative
  // Exponents that are multiples of 1/8 (all published ones here): tau^t = tau^floor(t) *
  // (tau^(1/8))^(8 frac(t)), with tau^(1/8) from three square roots, instead of exp(t ln tau).
  const ptFloor = new Int32Array(np);
  const ptEighths = new Int32Array(np); // 0..7, or -1 when t is not a multiple of 1/8
  const pl = new Int32Array(np);
  const pg = new Float64Array(np);
  let maxD = 1;
  let maxT = 1;
  let maxL = 1;
  for (let i = 0; i < np; i++) {
    const term = data.polynomialExponential[i];
    if (!Number.isInteger(term.d) || term.d < 0 || term.d > MAX_INT_POWER) {
      throw new RangeError(
        `power term ${i}: d must be an integer 0..${MAX_INT_POWER}, got ${term.d}`,
      );
    }
    if (!Number.isInteger(term.c) || term.c < 0 || term.c > MAX_INT_POWER) {
      throw new RangeError(
        `power term ${i}: c must be an integer 0..${MAX_INT_POWER}, got ${term.c}`,
      );
    }
    pn[i] = term.n;
    pd[i] = term.d;
    pt[i] = term.t;
    ptInt[i] = Number.isInteger(term.t) && term.t >= 0 && term.t <= MAX_INT_POWER ? term.t : -1;
    const eighths = term.t * 8;
    const fl = Math.floor(term.t);
    if (ptInt[i] < 0 && Number.isInteger(eighths) && Math.abs(fl) <= MAX_INT_POWER) {
      ptFloor[i] = fl;
      ptEighths[i] = eighths - 8 * fl;
      maxT = Math.max(maxT, Math.abs(fl));
    } else {
      ptEighths[i] = -1;
    }
    pl[i] = term.c;
    pg[i] = term.g ?? 1;
    maxD = Math.max(maxD, term.d);
    maxL = Math.max(maxL, term.c);
    if (ptInt[i] >= 0) maxT = Math.max(maxT, ptInt[i]);
  }
  const ng = data.gaussianBell.length;
  const gauss = data.gaussianBell.map((g) => ({
    ...g,
    tInt: Number.isInteger(g.t) && g.t >= 0 && g.t <= MAX_INT_POWER ? g.t : -1,
  }));
  for (const g of gauss) {
    if (!Number.isInteger(g.d) || g.d < 0 || g.d > MAX_INT_POWER) {
      throw new RangeError(`Gaussian term: d must be an integer 0..${MAX_INT_POWER}, got ${g.d}`);
    }
    maxD = Math.max(maxD, g.d);
    if (g.tInt >= 0) maxT = Math.max(maxT, g.tInt);
  }
  const nonAnalytic = data.nearCritical.map((x) => ({ ...x }));
  const dPow = new Float64Array(Math.max(maxD, maxL) + 1);
  const tPow = new Float64Array(maxT + 1);
  const q8 = new Float64Array(8);
  const expCache = new Float64Array(maxL + 1);
  const expG = new Float64Array(maxL + 1); // g of the cached exp, to share exp() only for equal g
  const scratch = emptyReducedHelmholtz();

  function evaluate(
    tau: number,
    delta: number,
    out: ReducedHelmholtz,
    third = false,
  ): ReducedHelmholtz {
    let f = 0;
    let fD = 0;
    let fDD = 0;
    let fDDD = 0;
    let fT = 0;
    let fTT = 0;
    let fDT = 0;
    dPow[0] = 1;
    for (let k = 1; k < dPow.length; k++) dPow[k] = dPow[k - 1] * delta;
    tPow[0] = 1;
    for (let k = 1; k < tPow.length; k++) tPow[k] = tPow[k - 1] * tau;
    for (let k = 0; k < expCache.length; k++) expG[k] = NaN;
    const lnTau = Math.log(tau);
    q8[0] = 1;
    q8[1] = Math.sqrt(Math.sqrt(Math.sqrt(tau)));
    for (let k = 2; k < 8; k++) q8[k] = q8[k - 1] * q8[1];

    for (let i = 0; i < np; i++) {
      const ti = pt[i];
      let tauT: number;
      if (ptInt[i] >= 0) tauT = tPow[ptInt[i]];
      else if (ptEighths[i] >= 0) {
        const fl = ptFloor[i];
        tauT = (fl >= 0 ? tPow[fl] : 1 / tPow[-fl]) * q8[ptEighths[i]];
      } else tauT = Math.exp(ti * lnTau);
      const l = pl[i];
      const di = pd[i];
      let base = pn[i] * dPow[di] * tauT;
      let x1: number;
      let x2: number;
      let x3: number;
      if (l === 0) {
        x1 = di;
        x2 = di * (di - 1);
        x3 = di * (di - 1) * (di - 2);
      } else {
        const g = pg[i];
        let e: number;
        if (expG[l] === g) {
          e = expCache[l];
        } else {
          e = Math.exp(-g * dPow[l]);
          expCache[l] = e;
          expG[l] = g;
        }
        base *= e;
        const k = g * l * dPow[l]; // delta d/d(delta) of g delta^l
        const fr = di - k;
        x1 = fr;
        x2 = fr * fr - fr - l * k;
        x3 = -l * l * k - 2 * fr * l * k + l * k + (fr - 2) * x2;
      }
      f += base;
      fD += base * x1;
      fDD += base * x2;
      fDDD += base * x3;
      fT += base * ti;
      fTT += base * ti * (ti - 1);
      fDT += base * x1 * ti;
    }

    for (let i = 0; i < ng; i++) {
      const g = gauss[i];
      const dd = delta - g.epsilon;
      const dt = tau - g.gamma;
      const tauT = g.tInt >= 0 ? tPow[g.tInt] : Math.exp(g.t * lnTau);
      const base = g.n * dPow[g.d] * tauT * Math.exp(-g.alpha * dd * dd - g.beta * dt * dt);
      const fr = g.d - 2 * g.alpha * delta * dd;
      const fr1 = -2 * g.alpha * delta * (2 * delta - g.epsilon);
      const fr11 = -2 * g.alpha * delta * (4 * delta - g.epsilon);
      const x2 = fr1 + fr * fr - fr;
      const x3 = fr11 + 2 * fr * fr1 - fr1 + (fr - 2) * x2;
      const h = g.t - 2 * g.beta * tau * dt;
      const h1 = -2 * g.beta * tau * (2 * tau - g.gamma);
      f += base;
      fD += base * fr;
      fDD += base * x2;
      fDDD += base * x3;
      fT += base * h;
      fTT += base * (h1 + h * h - h);
      fDT += base * fr * h;
    }

    for (let i = 0; i < nonAnalytic.length; i++) {
      nonAnalyticTerm(nonAnalytic[i], tau, delta, scratch);
      f += scratch.f;
      fD += scratch.fD;
      fDD += scratch.fDD;
      fT += scratch.fT;
      fTT += scratch.fTT;
      fDT += scratch.fDT;
      if (!third) {
        fDDD = NaN;
        continue;
      }
      // Third delta derivative by central difference of the analytic second derivative.
      const hStep = 1e-6 * delta;
      nonAnalyticTerm(nonAnalytic[i], tau, delta + hStep, scratch);
      const ddPlus = scratch.fDD / ((delta + hStep) * (delta + hStep));
      nonAnalyticTerm(nonAnalytic[i], tau, delta - hStep, scratch);
      const ddMinus = scratch.fDD / ((delta - hStep) * (delta - hStep));
      fDDD += ((ddPlus - ddMinus) / (2 * hStep)) * delta * delta * delta;
    }

    out.f = f;
    out.fD = fD;
    out.fDD = fDD;
    out.fDDD = fDDD;
    out.fT = fT;
    out.fTT = fTT;
    out.fDT = fDT;
    return out;
  }

  return {
    evaluate,
    termCount: np + ng + nonAnalytic.length,
    hasNonAnalytic: nonAnalytic.length > 0,
  };
}

/** Geometry shared by non-analytic terms with equal (a, beta, A, B) at one (tau, delta). */
interface NonAnalyticGeometry {
  a: number;
  beta: number;
  A: number;
  B: number;
  tau: number;
  delta: number;
  dm1: number;
  s: number;
  tm1: number;
  p1: number;
  theta: number;
  Delta: number;
  DeltaD: number;
  DeltaDD: number;
  inv2b: number;
}

const geometry: NonAnalyticGeometry = {
  a: NaN,
  beta: NaN,
  A: NaN,
  B: NaN,
  tau: NaN,
  delta: NaN,
  dm1: 0,
  s: 0,
  tm1: 0,
  p1: 0,
  theta: 0,
  Delta: 0,
  DeltaD: 0,
  DeltaDD: 0,
  inv2b: 0,
};

function updateGeometry(c: NonAnalyticTermData, tau: number, delta: number): NonAnalyticGeometry {
  const g = geometry;
  if (
    g.tau === tau &&
    g.delta === delta &&
    g.a === c.a &&
    g.beta === c.beta &&
    g.A === c.A &&
    g.B === c.B
  ) {
    return g;
  }
  const dm1 = delta - 1;
  const s = dm1 * dm1;
  const tm1 = tau - 1;
  const inv2b = 1 / (2 * c.beta);
  // s^(1/(2 beta) - 1) and s^(a - 1): both exponents positive for the published terms.
  const p1 = s === 0 ? 0 : Math.pow(s, inv2b - 1);
  const pa1 = s === 0 ? 0 : Math.pow(s, c.a - 1);
  const theta = -tm1 + c.A * s * p1;
  const E = ((c.A * theta * 2) / c.beta) * p1 + 2 * c.B * c.a * pa1; // Delta_d / (delta - 1)
  g.a = c.a;
  g.beta = c.beta;
  g.A = c.A;
  g.B = c.B;
  g.tau = tau;
  g.delta = delta;
  g.dm1 = dm1;
  g.s = s;
  g.tm1 = tm1;
  g.p1 = p1;
  g.inv2b = inv2b;
  g.theta = theta;
  g.Delta = theta * theta + c.B * s * pa1;
  g.DeltaD = dm1 * E;
  g.DeltaDD =
    E +
    4 * c.B * c.a * (c.a - 1) * pa1 +
    2 * (c.A / c.beta) * (c.A / c.beta) * s * p1 * p1 +
    ((c.A * theta * 4) / c.beta) * (inv2b - 1) * p1;
  return g;
}

/**
 * One non-analytic term and its derivatives, written as in IAPWS R6-95(2018) Table 5, with the
 * factor (delta - 1) cancelled analytically so that delta = 1 is not a 0/0. At exactly
 * tau = delta = 1 (Delta = 0) the derivatives are singular; delta is then moved by 1e-12.
 * Terms that share (a, beta, A, B) share theta and Delta (computed once per state).
 * Writes reduced derivatives (fDDD left 0).
 */
function nonAnalyticTerm(
  c: NonAnalyticTermData,
  tau: number,
  deltaIn: number,
  out: ReducedHelmholtz,
): void {
  let delta = deltaIn;
  if (delta === 1 && tau === 1) delta = 1 + 1e-12;
  const g = updateGeometry(c, tau, delta);
  const { dm1, s, tm1, p1, theta, Delta, DeltaD, DeltaDD } = g;
  const psi = Math.exp(-c.C * s - c.D * tm1 * tm1);
  const psiD = -2 * c.C * dm1 * psi;
  const psiDD = (2 * c.C * s - 1) * 2 * c.C * psi;
  const psiT = -2 * c.D * tm1 * psi;
  const psiTT = (2 * c.D * tm1 * tm1 - 1) * 2 * c.D * psi;
  const psiDT = 4 * c.C * c.D * dm1 * tm1 * psi;
  const Db = Math.pow(Delta, c.b);
  const Db1 = Db / Delta; // Delta^(b-1)
  const Db2 = Db1 / Delta; // Delta^(b-2)
  const DbD = c.b * Db1 * DeltaD;
  const DbDD = c.b * (Db1 * DeltaDD + (c.b - 1) * Db2 * DeltaD * DeltaD);
  const DbT = -2 * theta * c.b * Db1;
  const DbTT = 2 * c.b * Db1 + 4 * theta * theta * c.b * (c.b - 1) * Db2;
  const DbDT =
    ((-c.A * c.b * 2) / c.beta) * Db1 * dm1 * p1 - 2 * theta * c.b * (c.b - 1) * Db2 * DeltaD;
  const n = c.n;
  const phi = n * Db * delta * psi;
  const phiD = n * (Db * (psi + delta * psiD) + DbD * delta * psi);
  const phiDD =
    n * (Db * (2 * psiD + delta * psiDD) + 2 * DbD * (psi + delta * psiD) + DbDD * delta * psi);
  const phiT = n * delta * (DbT * psi + Db * psiT);
  const phiTT = n * delta * (DbTT * psi + 2 * DbT * psiT + Db * psiTT);
  const phiDT =
    n *
    (Db * (psiT + delta * psiDT) +
      delta * DbD * psiT +
      DbT * (psi + delta * psiD) +
      DbDT * delta * psi);
  out.f = phi;
  out.fD = delta * phiD;
  out.fDD = delta * delta * phiDD;
  out.fDDD = 0;
  out.fT = tau * phiT;
  out.fTT = tau * tau * phiTT;
  out.fDT = delta * tau * phiDT;
}
