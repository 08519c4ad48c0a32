/**
 * Minimal complex arithmetic for equations with complex coefficients (the ice Ih Gibbs function of
 * IAPWS R10-06). Values are small immutable objects; every operation returns a new one.
 *
 * Division uses Smith's algorithm (R. L. Smith, Algorithm 116: Complex division, Commun. ACM 5,
 * 435 (1962); citation from memory), which avoids overflow and loss of accuracy when the divisor's
 * parts differ greatly in size. The logarithm is the principal branch, imaginary part in the
 * interval from −π to π; on the branch cut (negative real axis) the sign of a zero imaginary part
 * picks the side, as Math.atan2 does (log of −1 + 0i has imaginary part π, of −1 − 0i, −π).
 */

/** A complex number re + i·im. */
export interface Complex {
  readonly re: number;
  readonly im: number;
}

/** The complex number re + i·im. */
export function complex(re: number, im = 0): Complex {
  return { re, im };
}

/** Sum a + b. */
export function add(a: Complex, b: Complex): Complex {
  return { re: a.re + b.re, im: a.im + b.im };
}

/** Difference a − b. */
export function sub(a: Complex, b: Complex): Complex {
  return { re: a.re - b.re, im: a.im - b.im };
}

/** Product a·b. */
export function mul(a: Complex, b: Complex): Complex {
  return { re: a.re * b.re - a.im * b.im, im: a.re * b.im + a.im * b.re };
}

/** Product of a complex number and a real number, a·k. */
export function scale(a: Complex, k: number): Complex {
  return { re: a.re * k, im: a.im * k };
}

/** Quotient a / b (Smith's algorithm). Division by zero gives non-finite parts. */
export function div(a: Complex, b: Complex): Complex {
  if (Math.abs(b.re) >= Math.abs(b.im)) {
    const r = b.im / b.re;
    const d = b.re + b.im * r;
    return { re: (a.re + a.im * r) / d, im: (a.im - a.re * r) / d };
  }
  const r = b.re / b.im;
  const d = b.re * r + b.im;
  return { re: (a.re * r + a.im) / d, im: (a.im * r - a.re) / d };
}

/** Natural logarithm, principal branch: ln|z| + i·arg(z). log(0) has real part −Infinity. */
export function log(z: Complex): Complex {
  return { re: Math.log(Math.hypot(z.re, z.im)), im: Math.atan2(z.im, z.re) };
}
