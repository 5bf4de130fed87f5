/**
 * Bracketed root finding: Brent's method (Brent 1973, "Algorithms for Minimization without
 * Derivatives", Prentice-Hall, ch. 4), combining bisection, secant and inverse quadratic
 * interpolation. Guaranteed to converge when f(a) and f(b) differ in sign.
 */
export interface RootResult {
  root: number;
  iterations: number;
  converged: boolean;
}

/**
 * Find x in [a, b] with f(x) = 0. Throws a RangeError when the bracket does not change sign or
 * f returns a non-finite value (callers turn that into a user-facing message).
 * @param tol absolute tolerance on x
 */
export function brentRoot(
  f: (x: number) => number,
  a: number,
  b: number,
  tol = 1e-12,
  maxIterations = 200,
): RootResult {
  return brentRootFrom(f, a, b, f(a), f(b), tol, maxIterations);
}

/**
 * brentRoot with f(a) and f(b) already known (a caller that bracketed the root by evaluating f at
 * both ends passes those values instead of having them computed again). Given the values f returns
 * there, the iterations and the root are brentRoot's exactly.
 */
export function brentRootFrom(
  f: (x: number) => number,
  a: number,
  b: number,
  fAtA: number,
  fAtB: number,
  tol = 1e-12,
  maxIterations = 200,
): RootResult {
  let fa = fAtA;
  let fb = fAtB;
  if (!Number.isFinite(fa) || !Number.isFinite(fb))
    throw new RangeError('brentRoot: f is not finite at the bracket');
  if (fa === 0) return { root: a, iterations: 0, converged: true };
  if (fb === 0) return { root: b, iterations: 0, converged: true };
  if (fa * fb > 0) throw new RangeError('brentRoot: the bracket does not change sign');
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let i = 1; i <= maxIterations; i++) {
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
    const tol1 = 2 * Number.EPSILON * Math.abs(b) + 0.5 * tol;
    const xm = 0.5 * (c - b);
    if (Math.abs(xm) <= tol1 || fb === 0) return { root: b, iterations: i, converged: true };
    if (Math.abs(e) >= tol1 && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * xm * s;
        q = 1 - s;
      } else {
        const qq = fa / fc;
        const r = fb / fc;
        p = s * (2 * xm * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      p = Math.abs(p);
      const min1 = 3 * xm * q - Math.abs(tol1 * q);
      const min2 = Math.abs(e * q);
      if (2 * p < Math.min(min1, min2)) {
        e = d;
        d = p / q;
      } else {
        d = xm;
        e = d;
      }
    } else {
      d = xm;
      e = d;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol1 ? d : xm >= 0 ? tol1 : -tol1;
    fb = f(b);
    if (!Number.isFinite(fb)) throw new RangeError('brentRoot: f is not finite inside the bracket');
  }
  return { root: b, iterations: maxIterations, converged: false };
}
