/**
 * Brent's method (Brent, "Algorithms for Minimization without Derivatives", 1973, ch. 4):
 * a bracketing root finder that never leaves [a, b] and converges superlinearly.
 */
export interface Root {
  x: number;
  iterations: number;
}

/**
 * Finds x in [a, b] with f(x) = 0, given f(a) and f(b) of opposite sign.
 * Returns undefined when the root is not bracketed or does not converge.
 * `valueTolerance` also accepts the latest x once |f(x)| is within it (for costly f).
 */
export function brentRoot(
  f: (x: number) => number,
  a: number,
  b: number,
  relTol = 1e-12,
  maxIterations = 200,
  valueTolerance = 0,
): Root | undefined {
  let fa = f(a);
  let fb = f(b);
  if (!Number.isFinite(fa) || !Number.isFinite(fb)) return undefined;
  if (fa === 0) return { x: a, iterations: 0 };
  if (fb === 0) return { x: b, iterations: 0 };
  if (fa * fb > 0) return undefined;
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
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * relTol * Math.abs(b);
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || Math.abs(fb) <= valueTolerance) return { x: b, iterations: i };
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      // Inverse quadratic interpolation, or the secant step when only two points differ.
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qq = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
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
    if (!Number.isFinite(fb)) return undefined;
  }
  return undefined;
}
