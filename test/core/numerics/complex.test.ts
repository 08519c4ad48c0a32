/**
 * Minimal complex arithmetic, tested through the module's public exports against identities of
 * complex algebra (common practice) and the principal branch of the logarithm.
 */
import { describe, expect, it } from "vitest";
import { add, complex, div, log, mul, scale, sub, type Complex } from "../../../core/numerics/complex";
import { expectClose } from "../../helpers/expect-close";

function expectComplex(actual: Complex, re: number, im: number, abs = 1e-15): void {
  expectClose(actual.re, re, { abs });
  expectClose(actual.im, im, { abs });
}

describe("complex arithmetic", () => {
  it("adds, subtracts and scales component-wise", () => {
    expectComplex(add(complex(1, 2), complex(3, -5)), 4, -3);
    expectComplex(sub(complex(1, 2), complex(3, -5)), -2, 7);
    expectComplex(scale(complex(1.5, -2), 4), 6, -8);
    expectComplex(complex(2), 2, 0);
  });

  it("multiplies: i·i = −1, (1 + 2i)(3 + 4i) = −5 + 10i", () => {
    expectComplex(mul(complex(0, 1), complex(0, 1)), -1, 0);
    expectComplex(mul(complex(1, 2), complex(3, 4)), -5, 10);
  });

  it("divides: 1/i = −i, (1 + 2i)/(3 + 4i) = (11 + 2i)/25, and undoes multiplication", () => {
    expectComplex(div(complex(1), complex(0, 1)), 0, -1);
    expectComplex(div(complex(1, 2), complex(3, 4)), 11 / 25, 2 / 25);
    expectComplex(div(complex(1, 2), complex(4, 3)), 10 / 25, 5 / 25);
    const a = complex(0.368, 0.0511);
    const b = complex(-72.6, -78.1);
    const back = div(mul(a, b), b);
    expectComplex(back, a.re, a.im, 1e-16);
  });

  // Smith's algorithm scales by the larger part of the divisor, so parts near the overflow limit
  // (where |b|² overflows) still divide correctly.
  it("divides numbers whose squared modulus would overflow", () => {
    expectComplex(div(complex(1e300, 1e300), complex(1e300, 1e300)), 1, 0);
    expectComplex(div(complex(1e300, -1e300), complex(0, 1e300)), -1, -1);
  });
});

describe("complex logarithm (principal branch)", () => {
  it("gives log 1 = 0, log e = 1, log i = iπ/2, log(1 + i) = ln√2 + iπ/4, log(−1 + 0i) = iπ", () => {
    expectComplex(log(complex(1)), 0, 0);
    expectComplex(log(complex(Math.E)), 1, 0);
    expectComplex(log(complex(0, 1)), 0, Math.PI / 2);
    expectComplex(log(complex(1, 1)), Math.log(Math.SQRT2), Math.PI / 4);
    expectComplex(log(complex(-1, 0)), 0, Math.PI);
    expectComplex(log(complex(0, -2)), Math.log(2), -Math.PI / 2);
  });

  it("takes the side of the branch cut from the sign of a zero imaginary part", () => {
    expect(log(complex(-1, -0)).im).toBe(-Math.PI);
    expect(log(complex(-1, 0)).im).toBe(Math.PI);
  });

  it("inverts the exponential and turns products into sums within the principal strip", () => {
    for (const [re, im] of [
      [0.3, 0.2],
      [-2, 0.5],
      [1e-3, -4],
      [250, 30],
    ] as const) {
      const z = complex(re, im);
      const w = log(z);
      const modulus = Math.exp(w.re);
      expectClose(modulus * Math.cos(w.im), re, { rel: 1e-14, abs: 1e-15 });
      expectClose(modulus * Math.sin(w.im), im, { rel: 1e-14, abs: 1e-15 });
    }
    const a = complex(0.5, 0.7);
    const b = complex(2, 0.3);
    const sum = add(log(a), log(b));
    expectComplex(log(mul(a, b)), sum.re, sum.im, 1e-15);
  });
});
