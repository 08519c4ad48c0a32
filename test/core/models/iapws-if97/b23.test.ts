/**
 * IAPWS-IF97 boundary between regions 2 and 3 (B23, Eqs. (5) and (6)), tested through the
 * module's public exports.
 */
import { describe, expect, it } from "vitest";
import { b23Pressure, b23Temperature } from "../../../../core/models/iapws-if97/b23";
import { expectClose } from "../../../helpers/expect-close";
import { printed } from "../../printed";

const MPA = 1e6;

// Check values: IAPWS R7-97(2012) (IF97), Sec. 4 — the one B23 check point, T = 0.623150000e3 K
// with p = 0.165291643e2 MPa, nine significant digits as printed, used in both directions.
// Tolerance: half a unit in the last printed digit (5e-8 MPa; 5e-7 K). Measured: 0.95 of it for
// Eq. (5) (16.52916425 MPa) and 0.92 for Eq. (6) (623.1500005 K from the nine-digit pressure).
const CHECK_POINT: readonly (readonly [string, string])[] = [["0.623150000e3", "0.165291643e2"]];

describe("IF97 B23 check point", () => {
  it.each(CHECK_POINT)("Eq. (5): p(%s K) = %s MPa", (temperatureText, pressureText) => {
    const check = printed(pressureText);
    expectClose(b23Pressure(printed(temperatureText).value) / MPA, check.value, { abs: check.halfUnit });
  });

  it.each(CHECK_POINT)("Eq. (6): T = %s K at %s MPa", (temperatureText, pressureText) => {
    const check = printed(temperatureText);
    expectClose(b23Temperature(printed(pressureText).value * MPA), check.value, { abs: check.halfUnit });
  });
});

describe("IF97 B23 laws", () => {
  // IF97 Sec. 4: the line runs from 623.15 K (16.5292 MPa) to 863.15 K (100 MPa). Eq. (5) gives
  // 100 MPa at 863.15 K to 3e-13 relative (measured).
  it("reaches 100 MPa at 863.15 K", () => {
    expectClose(b23Pressure(863.15), 100 * MPA, { rel: 1e-12 });
    expectClose(b23Temperature(100 * MPA), 863.15, { rel: 1e-12 });
  });

  // Eq. (6) is the exact inverse of the quadratic Eq. (5); measured round-trip error 2.6e-13
  // relative.
  it("Eq. (6) inverts Eq. (5) to 1e-12 relative from 623.15 K to 863.15 K", () => {
    for (let i = 0; i <= 2400; i++) {
      const temperatureK = 623.15 + (240 * i) / 2400;
      expectClose(b23Temperature(b23Pressure(temperatureK)), temperatureK, { rel: 1e-12 });
    }
  });

  it("rises with temperature over its whole range", () => {
    let previous = -Infinity;
    for (let i = 0; i <= 2400; i++) {
      const pressurePa = b23Pressure(623.15 + (240 * i) / 2400);
      expect(pressurePa).toBeGreaterThan(previous);
      previous = pressurePa;
    }
  });
});
