/**
 * Hyper-dual numbers: exact first and second derivatives by forward-mode arithmetic.
 *
 * Source: J. A. Fike & J. J. Alonso, "The development of hyper-dual numbers for exact
 * second-derivative calculations", AIAA paper 2011-886, 49th AIAA Aerospace Sciences Meeting
 * (2011). A hyper-dual number is x = re + e1 ε1 + e2 ε2 + e12 ε1ε2 with ε1² = ε2² = 0 and
 * ε1ε2 ≠ 0. A function of one argument extends as (their eq. 16)
 *
 *   f(x) = f(re) + f'(re) e1 ε1 + f'(re) e2 ε2 + (f'(re) e12 + f''(re) e1 e2) ε1ε2,
 *
 * so seeding x = a + ε1 + ε2 gives f(a), f'(a) (in e1 and e2) and f''(a) (in e12) with no
 * truncation error and no step size to choose; seeding x = a + ε1 and y = b + ε2 gives the mixed
 * derivative ∂²f/∂x∂y in e12.
 *
 * Every operation returns a new number (instances are immutable). Operations outside their
 * domain (log of a non-positive number, sqrt of a negative one, division by zero, a derivative
 * that is infinite, abs at 0 with a nonzero derivative part) throw InputError rather than
 * returning NaN.
 *
 * @example
 * A van der Waals pressure written the way a notebook cell would write it, differentiated
 * exactly in temperature and density (R in J/(mol K), a in Pa m6/mol2, b in m3/mol):
 * ```ts
 * import { HyperDual, partials2, R } from "isochor";
 * const a = 0.3640, b = 4.267e-5; // CO2 (illustrative constants)
 * const pressure = (T: HyperDual, rho: HyperDual) =>
 *   rho.mul(R).mul(T).div(rho.mul(-b).add(1)).sub(rho.mul(rho).mul(a));
 * const p = partials2(pressure, 300, 5000); // T = 300 K, rho = 5000 mol/m3
 * p.value;   // P in Pa
 * p.dfdx;    // (∂P/∂T)_rho in Pa/K
 * p.dfdy;    // (∂P/∂rho)_T in Pa m3/mol
 * p.d2fdxdy; // ∂²P/∂T∂rho
 * ```
 */
import { InputError } from "../errors.js";

/** Something a hyper-dual operation accepts: a hyper-dual number or a plain constant. */
export type HyperDualLike = HyperDual | number;

/** Multiplication that treats 0 times anything (even an infinite derivative) as 0. */
function times(scale: number, part: number): number {
  return part === 0 ? 0 : scale * part;
}

function requireFiniteNumber(input: string, value: number): void {
  if (!Number.isFinite(value)) {
    throw new InputError({ input, unit: "-", validRange: "a finite number", received: value });
  }
}

/** A hyper-dual number re + e1 ε1 + e2 ε2 + e12 ε1ε2 (immutable). */
export class HyperDual {
  /** Real part: the value. */
  readonly re: number;
  /** ε1 part: derivative with respect to the variable seeded in ε1. */
  readonly e1: number;
  /** ε2 part: derivative with respect to the variable seeded in ε2. */
  readonly e2: number;
  /** ε1ε2 part: second (or mixed) derivative. */
  readonly e12: number;

  constructor(re: number, e1 = 0, e2 = 0, e12 = 0) {
    this.re = re;
    this.e1 = e1;
    this.e2 = e2;
    this.e12 = e12;
  }

  /** A constant (all derivative parts zero). */
  static constant(x: number): HyperDual {
    requireFiniteNumber("HyperDual.constant(x)", x);
    return new HyperDual(x, 0, 0, 0);
  }

  /** The independent variable at x, seeded for d/dx (e1, e2) and d²/dx² (e12): x + ε1 + ε2. */
  static variable(x: number): HyperDual {
    requireFiniteNumber("HyperDual.variable(x)", x);
    return new HyperDual(x, 1, 1, 0);
  }

  /**
   * Two independent variables for partial derivatives of f(x, y): X = x + ε1, Y = y + ε2.
   * Then f(X, Y).e1 = ∂f/∂x, .e2 = ∂f/∂y and .e12 = ∂²f/∂x∂y.
   */
  static mixed(x: number, y: number): [HyperDual, HyperDual] {
    requireFiniteNumber("HyperDual.mixed(x, y): x", x);
    requireFiniteNumber("HyperDual.mixed(x, y): y", y);
    return [new HyperDual(x, 1, 0, 0), new HyperDual(y, 0, 1, 0)];
  }

  /** Lifts a number to a constant; returns a HyperDual unchanged. */
  static from(v: HyperDualLike): HyperDual {
    return typeof v === "number" ? new HyperDual(v, 0, 0, 0) : v;
  }

  /** Applies a scalar function given its value f0 and derivatives f1, f2 at re (eq. 16). */
  private chain(name: string, f0: number, f1: number, f2: number): HyperDual {
    const out = new HyperDual(
      f0,
      times(f1, this.e1),
      times(f1, this.e2),
      times(f1, this.e12) + times(f2, this.e1 * this.e2),
    );
    if (!(
      Number.isFinite(out.re) &&
      Number.isFinite(out.e1) &&
      Number.isFinite(out.e2) &&
      Number.isFinite(out.e12)
    )) {
      throw new InputError({
        input: `${name} argument`,
        unit: "-",
        validRange: `a value where ${name} and the derivatives requested are finite`,
        received: this.re,
      });
    }
    return out;
  }

  /** True when all derivative parts are zero. */
  isConstant(): boolean {
    return this.e1 === 0 && this.e2 === 0 && this.e12 === 0;
  }

  /** this + other */
  add(other: HyperDualLike): HyperDual {
    if (typeof other === "number")
      return new HyperDual(this.re + other, this.e1, this.e2, this.e12);
    return new HyperDual(
      this.re + other.re,
      this.e1 + other.e1,
      this.e2 + other.e2,
      this.e12 + other.e12,
    );
  }

  /** this - other */
  sub(other: HyperDualLike): HyperDual {
    if (typeof other === "number")
      return new HyperDual(this.re - other, this.e1, this.e2, this.e12);
    return new HyperDual(
      this.re - other.re,
      this.e1 - other.e1,
      this.e2 - other.e2,
      this.e12 - other.e12,
    );
  }

  /** -this */
  neg(): HyperDual {
    return new HyperDual(-this.re, -this.e1, -this.e2, -this.e12);
  }

  /** this * other */
  mul(other: HyperDualLike): HyperDual {
    if (typeof other === "number") {
      return new HyperDual(this.re * other, this.e1 * other, this.e2 * other, this.e12 * other);
    }
    return new HyperDual(
      this.re * other.re,
      this.re * other.e1 + this.e1 * other.re,
      this.re * other.e2 + this.e2 * other.re,
      this.re * other.e12 + this.e1 * other.e2 + this.e2 * other.e1 + this.e12 * other.re,
    );
  }

  /** this / other. Throws InputError when other is zero. */
  div(other: HyperDualLike): HyperDual {
    const d = typeof other === "number" ? other : other.re;
    if (d === 0 || !Number.isFinite(d)) {
      throw new InputError({
        input: "divisor",
        unit: "-",
        validRange: "a finite nonzero number",
        received: d,
      });
    }
    if (typeof other === "number") {
      return new HyperDual(this.re / d, this.e1 / d, this.e2 / d, this.e12 / d);
    }
    // q = this / other solved from this = q * other, part by part.
    const q0 = this.re / d;
    const q1 = (this.e1 - q0 * other.e1) / d;
    const q2 = (this.e2 - q0 * other.e2) / d;
    const q12 = (this.e12 - q0 * other.e12 - q1 * other.e2 - q2 * other.e1) / d;
    return new HyperDual(q0, q1, q2, q12);
  }

  /** 1 / this */
  inv(): HyperDual {
    return HyperDual.from(1).div(this);
  }

  /** this * this */
  sq(): HyperDual {
    return this.mul(this);
  }

  /**
   * this ** exponent. A number exponent uses d/dx x^n = n x^(n-1) (integer exponents accept a
   * negative base); a HyperDual exponent uses exp(exponent log this) and needs this > 0.
   */
  pow(exponent: HyperDualLike): HyperDual {
    if (typeof exponent !== "number") {
      if (exponent.isConstant()) return this.pow(exponent.re);
      return exponent.mul(this.log()).exp();
    }
    requireFiniteNumber("pow exponent", exponent);
    if (exponent === 0) return new HyperDual(1, 0, 0, 0);
    if (exponent === 1) return this;
    if (exponent === 2) return this.mul(this);
    const x = this.re;
    if (x < 0 && !Number.isInteger(exponent)) {
      throw new InputError({
        input: `pow base (exponent ${exponent})`,
        unit: "-",
        validRange: ">= 0 for a non-integer exponent",
        received: x,
      });
    }
    return this.chain(
      "pow",
      Math.pow(x, exponent),
      exponent * Math.pow(x, exponent - 1),
      exponent * (exponent - 1) * Math.pow(x, exponent - 2),
    );
  }

  /** Square root; needs this >= 0 (and > 0 when derivatives are carried). */
  sqrt(): HyperDual {
    const x = this.re;
    if (!(x >= 0)) {
      throw new InputError({ input: "sqrt argument", unit: "-", validRange: ">= 0", received: x });
    }
    const s = Math.sqrt(x);
    return this.chain("sqrt", s, 0.5 / s, -0.25 / (s * x));
  }

  /** Cube root (any sign; derivative infinite at 0). */
  cbrt(): HyperDual {
    const c = Math.cbrt(this.re);
    return this.chain("cbrt", c, 1 / (3 * c * c), -2 / (9 * c * c * c * c * c));
  }

  /** e^this */
  exp(): HyperDual {
    const e = Math.exp(this.re);
    return this.chain("exp", e, e, e);
  }

  /** e^this - 1, accurate for small arguments. */
  expm1(): HyperDual {
    const e = Math.exp(this.re);
    return this.chain("expm1", Math.expm1(this.re), e, e);
  }

  /** Natural logarithm; needs this > 0. */
  log(): HyperDual {
    const x = this.re;
    if (!(x > 0)) {
      throw new InputError({ input: "log argument", unit: "-", validRange: "> 0", received: x });
    }
    return this.chain("log", Math.log(x), 1 / x, -1 / (x * x));
  }

  /** log(1 + this), accurate for small arguments (e.g. log(1 - b rho)); needs this > -1. */
  log1p(): HyperDual {
    const x = this.re;
    if (!(x > -1)) {
      throw new InputError({ input: "log1p argument", unit: "-", validRange: "> -1", received: x });
    }
    const u = 1 + x;
    return this.chain("log1p", Math.log1p(x), 1 / u, -1 / (u * u));
  }

  /** sin(this), radians. */
  sin(): HyperDual {
    const s = Math.sin(this.re);
    return this.chain("sin", s, Math.cos(this.re), -s);
  }

  /** cos(this), radians. */
  cos(): HyperDual {
    const c = Math.cos(this.re);
    return this.chain("cos", c, -Math.sin(this.re), -c);
  }

  /** atan(this), radians. */
  atan(): HyperDual {
    const x = this.re;
    const u = 1 + x * x;
    return this.chain("atan", Math.atan(x), 1 / u, (-2 * x) / (u * u));
  }

  /** sinh(this) */
  sinh(): HyperDual {
    const s = Math.sinh(this.re);
    return this.chain("sinh", s, Math.cosh(this.re), s);
  }

  /** cosh(this) */
  cosh(): HyperDual {
    const c = Math.cosh(this.re);
    return this.chain("cosh", c, Math.sinh(this.re), c);
  }

  /** tanh(this) */
  tanh(): HyperDual {
    const t = Math.tanh(this.re);
    const d = 1 - t * t;
    return this.chain("tanh", t, d, -2 * t * d);
  }

  /**
   * |this|. Not differentiable at 0: throws InputError there unless all derivative parts are
   * zero (a constant 0).
   */
  abs(): HyperDual {
    if (this.re > 0) return this;
    if (this.re < 0) return this.neg();
    if (this.isConstant() && this.re === 0) return new HyperDual(0, 0, 0, 0);
    throw new InputError({
      input: "abs argument",
      unit: "-",
      validRange: "nonzero (|x| has no derivative at 0)",
      received: this.re,
    });
  }

  /** Readable form, e.g. "2 + 3ε1 + 3ε2 + 1ε1ε2". */
  toString(): string {
    return `${this.re} + ${this.e1}ε1 + ${this.e2}ε2 + ${this.e12}ε1ε2`;
  }
}

/** The number type of functions written for differentiation (a hyper-dual number). */
export type Num = HyperDual;

/**
 * Free-function forms, for formulas that read better as `hd.exp(x)` than `x.exp()`. Each accepts
 * a HyperDual or a plain number.
 */
export const hd = Object.freeze({
  constant: (x: number): HyperDual => HyperDual.constant(x),
  variable: (x: number): HyperDual => HyperDual.variable(x),
  add: (a: HyperDualLike, b: HyperDualLike): HyperDual => HyperDual.from(a).add(b),
  sub: (a: HyperDualLike, b: HyperDualLike): HyperDual => HyperDual.from(a).sub(b),
  mul: (a: HyperDualLike, b: HyperDualLike): HyperDual => HyperDual.from(a).mul(b),
  div: (a: HyperDualLike, b: HyperDualLike): HyperDual => HyperDual.from(a).div(b),
  neg: (a: HyperDualLike): HyperDual => HyperDual.from(a).neg(),
  pow: (a: HyperDualLike, b: HyperDualLike): HyperDual => HyperDual.from(a).pow(b),
  sqrt: (a: HyperDualLike): HyperDual => HyperDual.from(a).sqrt(),
  cbrt: (a: HyperDualLike): HyperDual => HyperDual.from(a).cbrt(),
  exp: (a: HyperDualLike): HyperDual => HyperDual.from(a).exp(),
  expm1: (a: HyperDualLike): HyperDual => HyperDual.from(a).expm1(),
  log: (a: HyperDualLike): HyperDual => HyperDual.from(a).log(),
  log1p: (a: HyperDualLike): HyperDual => HyperDual.from(a).log1p(),
  sin: (a: HyperDualLike): HyperDual => HyperDual.from(a).sin(),
  cos: (a: HyperDualLike): HyperDual => HyperDual.from(a).cos(),
  atan: (a: HyperDualLike): HyperDual => HyperDual.from(a).atan(),
  sinh: (a: HyperDualLike): HyperDual => HyperDual.from(a).sinh(),
  cosh: (a: HyperDualLike): HyperDual => HyperDual.from(a).cosh(),
  tanh: (a: HyperDualLike): HyperDual => HyperDual.from(a).tanh(),
  abs: (a: HyperDualLike): HyperDual => HyperDual.from(a).abs(),
});

function requireHyperDualResult(f: unknown, where: string): HyperDual {
  if (f instanceof HyperDual) return f;
  if (typeof f === "number" && Number.isFinite(f)) return HyperDual.constant(f);
  throw new InputError({
    input: where,
    unit: "-",
    validRange: "a HyperDual (build it with the methods of the argument) or a finite number",
    received: f,
  });
}

/** Value, first and second derivative of a function of one variable. */
export interface Derivatives2 {
  /** f(x) */
  value: number;
  /** f'(x) */
  first: number;
  /** f''(x) */
  second: number;
}

/**
 * f(x), f'(x) and f''(x), exact to rounding, from one evaluation of f on hyper-dual numbers.
 *
 * @example
 * ```ts
 * derivatives2((x) => x.mul(x).mul(x), 2); // { value: 8, first: 12, second: 12 }
 * ```
 * @throws InputError if x is not finite or f does not return a HyperDual (or number).
 */
export function derivatives2(f: (x: HyperDual) => HyperDual, x: number): Derivatives2 {
  const out = requireHyperDualResult(f(HyperDual.variable(x)), "derivatives2: f(x)");
  return { value: out.re, first: out.e1, second: out.e12 };
}

/** Value, gradient and Hessian of a function of two variables. */
export interface Partials2 {
  /** f(x, y) */
  value: number;
  /** ∂f/∂x */
  dfdx: number;
  /** ∂f/∂y */
  dfdy: number;
  /** ∂²f/∂x² */
  d2fdx2: number;
  /** ∂²f/∂y² */
  d2fdy2: number;
  /** ∂²f/∂x∂y */
  d2fdxdy: number;
}

/**
 * f(x, y) with its first and second partial derivatives, exact to rounding, from three
 * hyper-dual evaluations of f (one per second derivative).
 *
 * @example
 * ```ts
 * partials2((x, y) => x.mul(x).mul(y), 3, 2);
 * // { value: 18, dfdx: 12, dfdy: 9, d2fdx2: 4, d2fdy2: 0, d2fdxdy: 6 }
 * ```
 * @throws InputError if x or y is not finite or f does not return a HyperDual (or number).
 */
export function partials2(
  f: (x: HyperDual, y: HyperDual) => HyperDual,
  x: number,
  y: number,
): Partials2 {
  requireFiniteNumber("partials2: x", x);
  requireFiniteNumber("partials2: y", y);
  const where = "partials2: f(x, y)";
  const [X, Y] = HyperDual.mixed(x, y);
  const mixed = requireHyperDualResult(f(X, Y), where);
  const xx = requireHyperDualResult(f(HyperDual.variable(x), HyperDual.constant(y)), where);
  const yy = requireHyperDualResult(f(HyperDual.constant(x), HyperDual.variable(y)), where);
  return {
    value: mixed.re,
    dfdx: mixed.e1,
    dfdy: mixed.e2,
    d2fdx2: xx.e12,
    d2fdy2: yy.e12,
    d2fdxdy: mixed.e12,
  };
}
