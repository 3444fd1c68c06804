/** Polynomial interpolation over Q. */
import { Rational } from './rational';
import { Poly } from './poly';

/** The polynomial of degree < n through n points with distinct abscissae (Newton's divided differences). */
export function interpolatePoints(xs: readonly Rational[], ys: readonly Rational[]): Poly {
  const n = xs.length;
  const coef = ys.slice();
  for (let j = 1; j < n; j++) {
    for (let i = n - 1; i >= j; i--) coef[i] = coef[i].sub(coef[i - 1]).div(xs[i].sub(xs[i - j]));
  }
  let p = Poly.constant(coef[n - 1]);
  for (let i = n - 2; i >= 0; i--) p = p.mul(Poly.fromRationals([xs[i].neg(), Rational.ONE])).add(Poly.constant(coef[i]));
  return p;
}
