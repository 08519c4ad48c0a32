/**
 * Bracketed root finding for monotonic or at least sign-changing functions.
 *
 * Brent's method (R. P. Brent, Algorithms for Minimization without Derivatives, Prentice-Hall,
 * 1973, ch. 4): inverse quadratic interpolation and secant steps guarded by bisection, so it keeps
 * the bracket and converges at least as surely as bisection. An iteration cap turns a fault into a
 * {@link ConvergenceError} instead of a silent wrong number.
 */
import { ConvergenceError } from "../errors";

/** Options of {@link solveBracketed}. */
export interface RootOptions {
  /** Absolute tolerance on x. */
  readonly xTolerance?: number;
  /** Relative tolerance on x. */
  readonly relTolerance?: number;
  /** Iteration cap. */
  readonly maxIterations?: number;
}

/**
 * Finds x in [a, b] with f(x) = 0, given f(a) and f(b) of opposite sign (or one of them zero).
 * @throws ConvergenceError when the bracket does not hold a sign change or the cap is reached.
 */
export function solveBracketed(
  f: (x: number) => number,
  a: number,
  b: number,
  options: RootOptions = {},
): number {
  const xTolerance = options.xTolerance ?? 0;
  const relTolerance = options.relTolerance ?? 4 * Number.EPSILON;
  const maxIterations = options.maxIterations ?? 200;

  let fa = f(a);
  let fb = f(b);
  if (fa === 0) return a;
  if (fb === 0) return b;
  if (!(Number.isFinite(fa) && Number.isFinite(fb)) || Math.sign(fa) === Math.sign(fb)) {
    throw new ConvergenceError(`no sign change in [${a}, ${b}] (f = ${fa}, ${fb})`);
  }
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iteration = 0; iteration < maxIterations; iteration++) {
    if (Math.sign(fb) === Math.sign(fc)) {
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
    const tolerance = 2 * relTolerance * Math.abs(b) + 0.5 * xTolerance;
    const half = 0.5 * (c - b);
    if (Math.abs(half) <= tolerance || fb === 0) return b;
    if (Math.abs(e) >= tolerance && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let qq: number;
      if (a === c) {
        p = 2 * half * s;
        qq = 1 - s;
      } else {
        const r = fb / fc;
        const t = fa / fc;
        p = s * (2 * half * t * (t - r) - (b - a) * (r - 1));
        qq = (t - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) qq = -qq;
      else p = -p;
      if (2 * p < Math.min(3 * half * qq - Math.abs(tolerance * qq), Math.abs(e * qq))) {
        e = d;
        d = p / qq;
      } else {
        d = half;
        e = d;
      }
    } else {
      d = half;
      e = d;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tolerance ? d : half > 0 ? tolerance : -tolerance;
    fb = f(b);
    if (!Number.isFinite(fb)) throw new ConvergenceError(`function not finite at ${b}`);
  }
  throw new ConvergenceError(`no convergence in ${maxIterations} iterations in [${a}, ${c}]`);
}
