/**
 * Adaptive explicit Runge-Kutta integration of y' = f(t, y) by the embedded pair RK5(4)7M of
 * J. R. Dormand and P. J. Prince, "A family of embedded Runge-Kutta formulae", J. Comput. Appl.
 * Math. 6 (1980) 19-26 (Table 2: the coefficients; fifth-order solution propagated, "local
 * extrapolation"; the last stage equals the first of the next step, FSAL).
 *
 * Error control and step-size choice as in E. Hairer, S. P. Norsett and G. Wanner, Solving
 * Ordinary Differential Equations I, 2nd ed., Springer 1993, section II.4 (eq. 4.11 the error
 * norm, the safety factor 0.9 and the step ratio bounded to [0.2, 10]; the starting step of
 * section II.4 "Starting step size"). Dense output: the continuous extension of order 4 of the
 * same pair (L. F. Shampine, "Some practical Runge-Kutta formulas", Math. Comp. 46 (1986)
 * 135-150; coefficients as in Hairer-Norsett-Wanner's DOPRI5, section II.6).
 *
 * Event location: after each accepted step every event function g(t, y) is evaluated; a sign
 * change in the step (in the requested direction) is located by Brent's method
 * (numerics/brent.ts) on g(t, dense(t)); a terminal event ends the integration there.
 */
import { InputError, SolverError } from "../errors.js";
import { findRootBrent } from "./brent.js";

/** An event: a scalar function of the solution whose zero is located. */
export interface OdeEvent {
  /** Name reported with the event. */
  readonly name: string;
  /** The event function; its zero is the event. */
  readonly g: (t: number, y: readonly number[]) => number;
  /** Which crossings count: +1 rising (g from < 0 to >= 0), -1 falling, 0 both. Default 0. */
  readonly direction?: -1 | 0 | 1;
  /** Stop the integration at this event. Default true. */
  readonly terminal?: boolean;
}

/** An event that was located. */
export interface OdeEventHit {
  readonly name: string;
  readonly t: number;
  readonly y: readonly number[];
}

/** Options of {@link integrateDormandPrince}. */
export interface DormandPrinceOptions {
  /** Relative tolerance of the local error, per component. Default 1e-8. */
  relativeTolerance?: number;
  /**
   * Absolute tolerance of the local error: one value for every component or one per component
   * (units of y). Default 1e-10.
   */
  absoluteTolerance?: number | readonly number[];
  /** First step size (units of t); default: the starting-step estimate of Hairer et al. */
  initialStep?: number;
  /** Largest step size. Default |tEnd - t0|. */
  maxStep?: number;
  /** Most accepted plus rejected steps before a SolverError. Default 100000. */
  maxSteps?: number;
  /** Events to locate. */
  events?: readonly OdeEvent[];
  /**
   * Called after every accepted step with the new point; return `false` to stop the integration
   * there (reported as stoppedBecause "callback").
   */
  onStep?: (t: number, y: readonly number[]) => boolean | void;
}

/** Result of {@link integrateDormandPrince}. */
export interface DormandPrinceResult {
  /** The accepted points (t0 first; the event point last if a terminal event stopped it). */
  readonly t: readonly number[];
  readonly y: readonly (readonly number[])[];
  /** Why it stopped. */
  readonly stoppedBecause: "end" | "event" | "callback";
  /** Every event located, in order. */
  readonly events: readonly OdeEventHit[];
  /** The dense output: y at any t between t0 and the last point (order-4 continuous extension). */
  readonly at: (t: number) => number[];
  readonly acceptedSteps: number;
  readonly rejectedSteps: number;
  readonly evaluations: number;
}

// Dormand and Prince (1980), Table 2 (RK5(4)7M)
const C2 = 1 / 5;
const C3 = 3 / 10;
const C4 = 4 / 5;
const C5 = 8 / 9;
const A21 = 1 / 5;
const A31 = 3 / 40;
const A32 = 9 / 40;
const A41 = 44 / 45;
const A42 = -56 / 15;
const A43 = 32 / 9;
const A51 = 19372 / 6561;
const A52 = -25360 / 2187;
const A53 = 64448 / 6561;
const A54 = -212 / 729;
const A61 = 9017 / 3168;
const A62 = -355 / 33;
const A63 = 46732 / 5247;
const A64 = 49 / 176;
const A65 = -5103 / 18656;
const A71 = 35 / 384;
const A73 = 500 / 1113;
const A74 = 125 / 192;
const A75 = -2187 / 6784;
const A76 = 11 / 84;
// error estimate: fifth-order minus fourth-order weights
const E1 = 71 / 57600;
const E3 = -71 / 16695;
const E4 = 71 / 1920;
const E5 = -17253 / 339200;
const E6 = 22 / 525;
const E7 = -1 / 40;
// dense output (Shampine 1986, as in DOPRI5)
const D1 = -12715105075 / 11282082432;
const D3 = 87487479700 / 32700410799;
const D4 = -10690763975 / 1880347072;
const D5 = 701980252875 / 199316789632;
const D6 = -1453857185 / 822651844;
const D7 = 69997945 / 29380423;

interface DenseSegment {
  t0: number;
  h: number;
  r1: Float64Array;
  r2: Float64Array;
  r3: Float64Array;
  r4: Float64Array;
  r5: Float64Array;
}

function denseValue(seg: DenseSegment, t: number): number[] {
  const th = (t - seg.t0) / seg.h;
  const th1 = 1 - th;
  const n = seg.r1.length;
  const out = new Array<number>(n);
  for (let i = 0; i < n; i++) {
    out[i] = seg.r1[i] + th * (seg.r2[i] + th1 * (seg.r3[i] + th * (seg.r4[i] + th1 * seg.r5[i])));
  }
  return out;
}

function checkFiniteVector(f: readonly number[], t: number, what: string): void {
  for (let i = 0; i < f.length; i++) {
    if (!Number.isFinite(f[i])) {
      throw new SolverError(
        "Dormand-Prince RK5(4) integration",
        `${what} component ${i} is ${f[i]} at t = ${t}`,
      );
    }
  }
}

/**
 * Integrates y' = f(t, y) from t0 to tEnd (tEnd may be below t0) with error control.
 *
 * @example
 * ```ts
 * const r = integrateDormandPrince((t, y) => [-y[0]], 0, [1], 2);
 * r.y[r.y.length - 1][0]; // ≈ exp(-2) = 0.135335283 (to about the tolerance)
 * ```
 * @throws InputError for a bad t0, tEnd, y0 or option; SolverError when f returns a non-finite
 *   value, the step size underflows, or maxSteps is exceeded (the message says where).
 */
export function integrateDormandPrince(
  f: (t: number, y: readonly number[]) => readonly number[],
  t0: number,
  y0: readonly number[],
  tEnd: number,
  options: DormandPrinceOptions = {},
): DormandPrinceResult {
  const method = "Dormand-Prince RK5(4) integration";
  if (!Number.isFinite(t0)) {
    throw new InputError({ input: "t0", unit: "units of t", validRange: "finite", received: t0 });
  }
  if (!(Number.isFinite(tEnd) && tEnd !== t0)) {
    throw new InputError({
      input: "tEnd",
      unit: "units of t",
      validRange: "finite and different from t0",
      received: tEnd,
    });
  }
  const n = y0.length;
  if (!(n > 0) || !y0.every((v) => Number.isFinite(v))) {
    throw new InputError({
      input: "y0",
      unit: "units of y",
      validRange: "a non-empty list of finite numbers",
      received: y0,
    });
  }
  const rtol = options.relativeTolerance ?? 1e-8;
  if (!(rtol > 0)) {
    throw new InputError({
      input: "options.relativeTolerance",
      unit: "-",
      validRange: "> 0",
      received: rtol,
    });
  }
  const atolOpt = options.absoluteTolerance ?? 1e-10;
  const atol = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const a = typeof atolOpt === "number" ? atolOpt : atolOpt[i];
    if (!(a > 0)) {
      throw new InputError({
        input: "options.absoluteTolerance",
        unit: "units of y",
        validRange: `> 0 (one value, or ${n} values)`,
        received: atolOpt,
      });
    }
    atol[i] = a;
  }
  const dir = tEnd > t0 ? 1 : -1;
  const span = Math.abs(tEnd - t0);
  const hMax = options.maxStep ?? span;
  if (!(hMax > 0)) {
    throw new InputError({
      input: "options.maxStep",
      unit: "units of t",
      validRange: "> 0",
      received: hMax,
    });
  }
  const maxSteps = options.maxSteps ?? 100000;
  if (!(Number.isInteger(maxSteps) && maxSteps > 0)) {
    throw new InputError({
      input: "options.maxSteps",
      unit: "-",
      validRange: "a positive integer",
      received: maxSteps,
    });
  }
  const events = options.events ?? [];
  let evaluations = 0;
  const rhs = (t: number, y: ArrayLike<number>): Float64Array => {
    evaluations++;
    const v = f(t, Array.from(y));
    if (v.length !== n) {
      throw new SolverError(method, `f returned ${v.length} values at t = ${t}, expected ${n}`);
    }
    checkFiniteVector(v, t, "f");
    return Float64Array.from(v);
  };
  const scaleOf = (a: ArrayLike<number>, b: ArrayLike<number>, i: number): number =>
    atol[i] + rtol * Math.max(Math.abs(a[i]), Math.abs(b[i]));

  let t = t0;
  let y = Float64Array.from(y0);
  let k1 = rhs(t, y);

  // starting step (Hairer, Norsett, Wanner 1993, II.4)
  let h: number;
  if (options.initialStep !== undefined) {
    if (!(options.initialStep > 0)) {
      throw new InputError({
        input: "options.initialStep",
        unit: "units of t",
        validRange: "> 0",
        received: options.initialStep,
      });
    }
    h = Math.min(options.initialStep, hMax, span);
  } else {
    let d0 = 0;
    let d1 = 0;
    for (let i = 0; i < n; i++) {
      const sc = atol[i] + rtol * Math.abs(y[i]);
      d0 += (y[i] / sc) ** 2;
      d1 += (k1[i] / sc) ** 2;
    }
    d0 = Math.sqrt(d0 / n);
    d1 = Math.sqrt(d1 / n);
    let h0 = d0 < 1e-5 || d1 < 1e-5 ? 1e-6 : (0.01 * d0) / d1;
    h0 = Math.min(h0, hMax, span);
    const yt = new Float64Array(n);
    for (let i = 0; i < n; i++) yt[i] = y[i] + dir * h0 * k1[i];
    const k2 = rhs(t + dir * h0, yt);
    let d2 = 0;
    for (let i = 0; i < n; i++) {
      const sc = atol[i] + rtol * Math.abs(y[i]);
      d2 += ((k2[i] - k1[i]) / sc) ** 2;
    }
    d2 = Math.sqrt(d2 / n) / h0;
    const h1 =
      Math.max(d1, d2) <= 1e-15 ? Math.max(1e-6, h0 * 1e-3) : (0.01 / Math.max(d1, d2)) ** 0.2;
    h = Math.min(100 * h0, h1, hMax, span);
  }

  const ts: number[] = [t];
  const ys: number[][] = [Array.from(y)];
  const segments: DenseSegment[] = [];
  const hits: OdeEventHit[] = [];
  let gPrev = events.map((e) => e.g(t, ys[0]));
  let accepted = 0;
  let rejected = 0;
  let stoppedBecause: DormandPrinceResult["stoppedBecause"] = "end";
  let lastRejected = false;
  const yt = new Float64Array(n);
  const y1 = new Float64Array(n);

  while (dir * (tEnd - t) > 0) {
    if (accepted + rejected >= maxSteps) {
      throw new SolverError(
        method,
        `${maxSteps} steps (options.maxSteps) used before reaching t = ${tEnd}; reached t = ${t} with step ${h}`,
      );
    }
    if (h < 1e-14 * Math.max(Math.abs(t), span)) {
      throw new SolverError(
        method,
        `the step size fell to ${h} at t = ${t} (the solution or f is not smooth there, or the tolerances ${rtol} / ${Array.from(atol).join(",")} are too tight)`,
      );
    }
    let last = false;
    if (h >= dir * (tEnd - t)) {
      h = dir * (tEnd - t);
      last = true;
    }
    const hs = dir * h;
    for (let i = 0; i < n; i++) yt[i] = y[i] + hs * A21 * k1[i];
    const k2 = rhs(t + C2 * hs, yt);
    for (let i = 0; i < n; i++) yt[i] = y[i] + hs * (A31 * k1[i] + A32 * k2[i]);
    const k3 = rhs(t + C3 * hs, yt);
    for (let i = 0; i < n; i++) yt[i] = y[i] + hs * (A41 * k1[i] + A42 * k2[i] + A43 * k3[i]);
    const k4 = rhs(t + C4 * hs, yt);
    for (let i = 0; i < n; i++) {
      yt[i] = y[i] + hs * (A51 * k1[i] + A52 * k2[i] + A53 * k3[i] + A54 * k4[i]);
    }
    const k5 = rhs(t + C5 * hs, yt);
    for (let i = 0; i < n; i++) {
      yt[i] = y[i] + hs * (A61 * k1[i] + A62 * k2[i] + A63 * k3[i] + A64 * k4[i] + A65 * k5[i]);
    }
    const tNew = last ? tEnd : t + hs;
    const k6 = rhs(tNew, yt);
    for (let i = 0; i < n; i++) {
      y1[i] = y[i] + hs * (A71 * k1[i] + A73 * k3[i] + A74 * k4[i] + A75 * k5[i] + A76 * k6[i]);
    }
    const k7 = rhs(tNew, y1);
    let err = 0;
    for (let i = 0; i < n; i++) {
      const e = hs * (E1 * k1[i] + E3 * k3[i] + E4 * k4[i] + E5 * k5[i] + E6 * k6[i] + E7 * k7[i]);
      err += (e / scaleOf(y, y1, i)) ** 2;
    }
    err = Math.sqrt(err / n);
    if (!(err <= 1)) {
      rejected++;
      const fac = Number.isFinite(err) ? Math.max(0.2, 0.9 * err ** -0.2) : 0.2;
      h *= Math.min(1, fac);
      lastRejected = true;
      continue;
    }
    // accepted: dense output of the step
    const seg: DenseSegment = {
      t0: t,
      h: hs,
      r1: Float64Array.from(y),
      r2: new Float64Array(n),
      r3: new Float64Array(n),
      r4: new Float64Array(n),
      r5: new Float64Array(n),
    };
    for (let i = 0; i < n; i++) {
      const d = y1[i] - y[i];
      seg.r2[i] = d;
      seg.r3[i] = hs * k1[i] - d;
      seg.r4[i] = d - hs * k7[i] - seg.r3[i];
      seg.r5[i] =
        hs * (D1 * k1[i] + D3 * k3[i] + D4 * k4[i] + D5 * k5[i] + D6 * k6[i] + D7 * k7[i]);
    }
    segments.push(seg);
    accepted++;
    t = tNew;
    y = Float64Array.from(y1);
    k1 = k7;
    const yArr = Array.from(y);
    // events
    let stopAt: OdeEventHit | undefined;
    const gNow = events.map((e) => e.g(t, yArr));
    const found: { k: number; hit: OdeEventHit }[] = [];
    events.forEach((e, k) => {
      const a = gPrev[k];
      const b = gNow[k];
      const wanted = e.direction ?? 0;
      const rising = a < 0 && b >= 0;
      const falling = a > 0 && b <= 0;
      if (!((rising && wanted >= 0) || (falling && wanted <= 0))) return;
      const g = (tau: number) => e.g(tau, denseValue(seg, tau));
      const lo = Math.min(seg.t0, t);
      const hi = Math.max(seg.t0, t);
      const root = findRootBrent(g, lo, hi, { tolerance: 1e-12 * Math.max(hi - lo, 1e-300) });
      found.push({ k, hit: { name: e.name, t: root.value, y: denseValue(seg, root.value) } });
    });
    found.sort((a, b) => dir * (a.hit.t - b.hit.t));
    for (const { k, hit } of found) {
      hits.push(hit);
      if (events[k].terminal ?? true) {
        stopAt = hit;
        break;
      }
    }
    gPrev = gNow;
    if (stopAt !== undefined) {
      ts.push(stopAt.t);
      ys.push(Array.from(stopAt.y));
      stoppedBecause = "event";
      break;
    }
    ts.push(t);
    ys.push(yArr);
    if (options.onStep && options.onStep(t, yArr) === false) {
      stoppedBecause = "callback";
      break;
    }
    // next step size
    const fac = Math.min(10, Math.max(0.2, 0.9 * Math.max(err, 1e-10) ** -0.2));
    h = Math.min(hMax, h * (lastRejected ? Math.min(1, fac) : fac));
    lastRejected = false;
  }

  const tFirst = t0;
  const tLast = ts[ts.length - 1];
  const at = (tq: number): number[] => {
    if (!(dir * (tq - tFirst) >= 0 && dir * (tLast - tq) >= 0)) {
      throw new InputError({
        input: "t",
        unit: "units of t",
        validRange: `between ${tFirst} and ${tLast} (the integrated span)`,
        received: tq,
      });
    }
    if (segments.length === 0) return ys[0].slice();
    // binary search for the segment containing tq
    let lo = 0;
    let hi = segments.length - 1;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      const s = segments[mid];
      if (dir * (tq - (s.t0 + s.h)) > 0) lo = mid + 1;
      else hi = mid;
    }
    return denseValue(segments[lo], tq);
  };
  return {
    t: ts,
    y: ys,
    stoppedBecause,
    events: hits,
    at,
    acceptedSteps: accepted,
    rejectedSteps: rejected,
    evaluations,
  };
}
