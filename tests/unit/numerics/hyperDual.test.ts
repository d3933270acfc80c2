import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  HyperDual,
  derivatives2,
  hd,
  partials2,
} from "../../../kernel-lib/src/numerics/hyperDual.js";
import { InputError } from "../../../kernel-lib/src/errors.js";

/** |a - b| <= tol * max(1, |b|): relative for large values, absolute near zero. */
function close(a: number, b: number, tol = 1e-12): void {
  expect(Math.abs(a - b)).toBeLessThanOrEqual(tol * Math.max(1, Math.abs(b)));
}

const real = (min: number, max: number) => fc.double({ min, max, noNaN: true });

/** Checks derivatives2(f, x) against closed-form f, f', f''. */
function checkAgainst(
  f: (x: HyperDual) => HyperDual,
  exact: (x: number) => [number, number, number],
  x: number,
  tol = 1e-12,
): void {
  const d = derivatives2(f, x);
  const [v, d1, d2] = exact(x);
  close(d.value, v, tol);
  close(d.first, d1, tol);
  close(d.second, d2, tol);
}

describe("HyperDual single-variable derivatives against closed forms (property)", () => {
  it("x^3 and x^-2.5: f' = n x^(n-1), f'' = n (n-1) x^(n-2)", () => {
    fc.assert(
      fc.property(real(-10, 10), (x) => {
        checkAgainst(
          (h) => h.pow(3),
          (t) => [t ** 3, 3 * t * t, 6 * t],
          x,
        );
      }),
    );
    fc.assert(
      fc.property(real(0.1, 10), (x) => {
        checkAgainst(
          (h) => h.pow(-2.5),
          (t) => [t ** -2.5, -2.5 * t ** -3.5, 8.75 * t ** -4.5],
          x,
        );
      }),
    );
  });

  it("exp(2x) sin x: f' = e^{2x}(2 sin x + cos x), f'' = e^{2x}(3 sin x + 4 cos x)", () => {
    fc.assert(
      fc.property(real(-5, 5), (x) => {
        checkAgainst(
          (h) => h.mul(2).exp().mul(h.sin()),
          (t) => {
            const e = Math.exp(2 * t);
            return [
              e * Math.sin(t),
              e * (2 * Math.sin(t) + Math.cos(t)),
              e * (3 * Math.sin(t) + 4 * Math.cos(t)),
            ];
          },
          x,
        );
      }),
    );
  });

  it("log(x)/x: f' = (1 - ln x)/x^2, f'' = (2 ln x - 3)/x^3", () => {
    fc.assert(
      fc.property(real(0.05, 50), (x) => {
        checkAgainst(
          (h) => h.log().div(h),
          (t) => [Math.log(t) / t, (1 - Math.log(t)) / t ** 2, (2 * Math.log(t) - 3) / t ** 3],
          x,
        );
      }),
    );
  });

  it("sqrt(1 + x^2): f' = x / sqrt(1 + x^2), f'' = (1 + x^2)^(-3/2)", () => {
    fc.assert(
      fc.property(real(-100, 100), (x) => {
        checkAgainst(
          (h) => h.sq().add(1).sqrt(),
          (t) => [Math.sqrt(1 + t * t), t / Math.sqrt(1 + t * t), (1 + t * t) ** -1.5],
          x,
        );
      }),
    );
  });

  it("tanh, cos, atan, sinh, cosh, cbrt, expm1, log1p, x^x (closed forms)", () => {
    fc.assert(
      fc.property(real(0.2, 3), (x) => {
        const t = Math.tanh(x);
        checkAgainst(
          (h) => h.tanh(),
          () => [t, 1 - t * t, -2 * t * (1 - t * t)],
          x,
        );
        checkAgainst(
          (h) => h.cos(),
          (u) => [Math.cos(u), -Math.sin(u), -Math.cos(u)],
          x,
        );
        checkAgainst(
          (h) => h.atan(),
          (u) => [Math.atan(u), 1 / (1 + u * u), (-2 * u) / (1 + u * u) ** 2],
          x,
        );
        checkAgainst(
          (h) => h.sinh(),
          (u) => [Math.sinh(u), Math.cosh(u), Math.sinh(u)],
          x,
        );
        checkAgainst(
          (h) => h.cosh(),
          (u) => [Math.cosh(u), Math.sinh(u), Math.cosh(u)],
          x,
        );
        checkAgainst(
          (h) => h.cbrt(),
          (u) => [Math.cbrt(u), u ** (-2 / 3) / 3, (-2 / 9) * u ** (-5 / 3)],
          x,
        );
        checkAgainst(
          (h) => h.expm1(),
          (u) => [Math.expm1(u), Math.exp(u), Math.exp(u)],
          x,
        );
        checkAgainst(
          (h) => h.log1p(),
          (u) => [Math.log1p(u), 1 / (1 + u), -1 / (1 + u) ** 2],
          x,
        );
        // x^x: f' = x^x (ln x + 1), f'' = x^x ((ln x + 1)^2 + 1/x)
        checkAgainst(
          (h) => h.pow(h),
          (u) => {
            const v = u ** u;
            const l = Math.log(u) + 1;
            return [v, v * l, v * (l * l + 1 / u)];
          },
          x,
        );
      }),
    );
  });

  it("1/(1 - b x): f' = b (1 - b x)^-2, f'' = 2 b^2 (1 - b x)^-3", () => {
    fc.assert(
      fc.property(real(0, 0.9), real(0.1, 1), (x, b) => {
        checkAgainst(
          (h) => hd.div(1, h.mul(-b).add(1)),
          (t) => [1 / (1 - b * t), b / (1 - b * t) ** 2, (2 * b * b) / (1 - b * t) ** 3],
          x,
          1e-11,
        );
      }),
    );
  });

  it("abs and inv away from zero, integer powers of negative numbers", () => {
    checkAgainst(
      (h) => h.abs(),
      () => [2, -1, 0],
      -2,
    );
    checkAgainst(
      (h) => h.inv(),
      (t) => [1 / t, -1 / t ** 2, 2 / t ** 3],
      -4,
    );
    checkAgainst(
      (h) => h.pow(-3),
      (t) => [t ** -3, -3 * t ** -4, 12 * t ** -5],
      -1.5,
    );
  });
});

describe("HyperDual mixed partial derivatives", () => {
  it("x^2 y^3 + sin(x y) against closed forms (property)", () => {
    fc.assert(
      fc.property(real(-3, 3), real(-3, 3), (x, y) => {
        const p = partials2((X, Y) => X.sq().mul(Y.pow(3)).add(X.mul(Y).sin()), x, y);
        const s = Math.sin(x * y);
        const c = Math.cos(x * y);
        close(p.value, x * x * y ** 3 + s);
        close(p.dfdx, 2 * x * y ** 3 + y * c);
        close(p.dfdy, 3 * x * x * y * y + x * c);
        close(p.d2fdx2, 2 * y ** 3 - y * y * s);
        close(p.d2fdy2, 6 * x * x * y - x * x * s);
        close(p.d2fdxdy, 6 * x * y * y + c - x * y * s);
      }),
    );
  });

  it("van der Waals pressure P(T, rho): exact partials (closed forms by hand)", () => {
    // P = rho R T / (1 - b rho) - a rho^2; (∂P/∂T) = rho R / (1 - b rho);
    // (∂P/∂rho) = R T / (1 - b rho)^2 - 2 a rho; ∂²P/∂rho² = 2 b R T / (1 - b rho)^3 - 2 a;
    // ∂²P/∂T∂rho = R / (1 - b rho)^2; ∂²P/∂T² = 0. Constants are illustrative (CO2-like).
    const R = 8.314462618;
    const a = 0.364;
    const b = 4.267e-5;
    fc.assert(
      fc.property(real(200, 1000), real(1, 20000), (T, rho) => {
        const p = partials2(
          (Tv, r) => r.mul(R).mul(Tv).div(r.mul(-b).add(1)).sub(r.mul(r).mul(a)),
          T,
          rho,
        );
        const u = 1 - b * rho;
        close(p.value, (rho * R * T) / u - a * rho * rho, 1e-12);
        close(p.dfdx, (rho * R) / u, 1e-12);
        close(p.dfdy, (R * T) / (u * u) - 2 * a * rho, 1e-11);
        close(p.d2fdy2, (2 * b * R * T) / u ** 3 - 2 * a, 1e-10);
        close(p.d2fdxdy, R / (u * u), 1e-12);
        expect(p.d2fdx2).toBe(0);
      }),
    );
  });

  it("HyperDual.mixed seeds e1 for x and e2 for y", () => {
    const [X, Y] = HyperDual.mixed(2, 5);
    const f = X.mul(Y);
    expect([f.re, f.e1, f.e2, f.e12]).toEqual([10, 5, 2, 1]);
  });
});

describe("HyperDual arithmetic and domain errors", () => {
  it("mixes numbers and hyper-duals, and constants carry no derivative", () => {
    const x = HyperDual.variable(3);
    expect(derivatives2((h) => h.add(2).sub(1).mul(4), 3)).toEqual({
      value: 16,
      first: 4,
      second: 0,
    });
    expect(derivatives2(() => HyperDual.constant(7), 1)).toEqual({ value: 7, first: 0, second: 0 });
    expect(x.pow(0).re).toBe(1);
    expect(x.pow(1)).toBe(x);
    expect(hd.neg(x).re).toBe(-3);
    expect(String(HyperDual.variable(2).sq())).toBe("4 + 4ε1 + 4ε2 + 2ε1ε2");
  });

  it("sqrt(0) of a constant is 0; of a variable its derivative is infinite and refused", () => {
    expect(HyperDual.constant(0).sqrt().re).toBe(0);
    expect(() => HyperDual.variable(0).sqrt()).toThrow(InputError);
  });

  it("refuses values outside each function's domain instead of returning NaN", () => {
    expect(() => HyperDual.variable(-1).log()).toThrow(InputError);
    expect(() => HyperDual.variable(0).log()).toThrow(/log argument/);
    expect(() => HyperDual.variable(-1).sqrt()).toThrow(InputError);
    expect(() => HyperDual.variable(-2).log1p()).toThrow(InputError);
    expect(() => HyperDual.variable(-8).pow(1 / 3)).toThrow(InputError);
    expect(() => HyperDual.variable(1).div(0)).toThrow(InputError);
    expect(() => HyperDual.variable(1).div(HyperDual.variable(0))).toThrow(InputError);
    expect(() => HyperDual.variable(0).abs()).toThrow(/no derivative at 0/);
    expect(HyperDual.constant(0).abs().re).toBe(0);
    expect(() => HyperDual.variable(0).pow(-1)).toThrow(InputError);
    expect(() => HyperDual.variable(1000).exp()).toThrow(InputError);
    expect(() => HyperDual.variable(NaN)).toThrow(InputError);
    expect(() => HyperDual.constant(Infinity)).toThrow(InputError);
    expect(() => partials2((x) => x, NaN, 1)).toThrow(InputError);
    expect(() => derivatives2(() => "x" as unknown as HyperDual, 1)).toThrow(InputError);
  });
});
