/**
 * Resultants with one free variable, computed by evaluation at integer points and interpolation:
 * the polynomials whose roots are sums and products of roots of two given polynomials (the
 * classical route to arithmetic on algebraic numbers; H. Cohen, A Course in Computational
 * Algebraic Number Theory, §3.6.2). Degrees are small (products of two minimal polynomial
 * degrees), so univariate resultants at deg + 1 points are simpler than bivariate arithmetic.
 */
import { Rational } from './rational';
import { Poly, resultant } from './poly';
import type { Budget } from './errors';
import { interpolatePoints } from './interpolate';

/** Res_y(f(y), x + a(y)) at the rational point x. */
export function resultantInY(f: Poly, a: Poly, x: Rational): Rational {
  return resultant(f, a.add(Poly.constant(x)));
}

/** A polynomial of degree mn whose roots are all α + β (f(α) = 0, g(β) = 0): Res_y(f(y), g(x − y)). */
export function sumRootsPoly(f: Poly, g: Poly, budget?: Budget): Poly {
  const d = f.degree() * g.degree();
  const xs: Rational[] = [];
  const ys: Rational[] = [];
  for (let k = 0; k <= d; k++) {
    budget?.tick(d * d);
    const x = Rational.fromInt(k);
    xs.push(x);
    // g(x − y) as a polynomial in y.
    ys.push(resultant(f, g.compose(Poly.fromRationals([x, Rational.MINUS_ONE]))));
  }
  return interpolatePoints(xs, ys);
}

/** A polynomial of degree mn whose roots are all α·β: Res_y(f(y), y^n g(x / y)) for n = deg g. */
export function productRootsPoly(f: Poly, g: Poly, budget?: Budget): Poly {
  const n = g.degree();
  const d = f.degree() * n;
  const xs: Rational[] = [];
  const ys: Rational[] = [];
  for (let k = 1; k <= d + 1; k++) {
    budget?.tick(d * d);
    const x = Rational.fromInt(k);
    xs.push(x);
    // y^n g(x/y) = Σ g_k x^k y^(n−k).
    const coeffs: Rational[] = new Array<Rational>(n + 1).fill(Rational.ZERO);
    for (let j = 0; j <= n; j++) coeffs[n - j] = g.coeff(j).mul(x.pow(j));
    ys.push(resultant(f, Poly.fromRationals(coeffs)));
  }
  return interpolatePoints(xs, ys);
}
