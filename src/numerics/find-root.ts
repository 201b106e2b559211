import { NumericalError } from '../errors.js';

/**
 * Finds x in [lo, hi] with f(x) = 0 by Brent's method (Brent 1973, "Algorithms for Minimization
 * without Derivatives", ch. 4: bisection, secant and inverse quadratic interpolation).
 *
 * @param f continuous function with f(lo) and f(hi) of opposite sign
 * @param lo lower bracket
 * @param hi upper bracket
 * @param tolerance absolute tolerance on x
 * @param maxIterations bound on iterations
 * @throws NumericalError when the bracket does not change sign or iterations run out
 * @example findRoot((x) => x * x - 2, 0, 2, 1e-12) // ≈ 1.414213562373
 */
export function findRoot(f: (x: number) => number, lo: number, hi: number, tolerance = 1e-10, maxIterations = 200): number {
  let a = lo;
  let b = hi;
  let fa = f(a);
  let fb = f(b);
  if (fa === 0) return a;
  if (fb === 0) return b;
  if (!(fa * fb < 0)) throw new NumericalError(`root not bracketed: f(${lo}) = ${fa}, f(${hi}) = ${fb}`, 'numerical.no-bracket');
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let i = 0; i < maxIterations; i++) {
    if (fb * fc > 0) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * tolerance;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return b;
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      let p: number;
      let q: number;
      const s = fb / fa;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
  }
  throw new NumericalError(`root finding did not converge in ${maxIterations} iterations`, 'numerical.no-convergence');
}
