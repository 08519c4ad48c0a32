/**
 * Enthalpy of vaporization: the PPDS equation against the VDI saturation table, and Watson's
 * scaling.
 */
import { describe, expect, it } from "vitest";
import { ppdsEnthalpyOfVaporization } from "../../../../core/models/engineering/ppds-enthalpy-of-vaporization";
import { watsonEnthalpyOfVaporization } from "../../../../core/models/engineering/watson-enthalpy-of-vaporization";
import { expectClose } from "../../../helpers/expect-close";

// VDI Heat Atlas, 2nd ed. (2010), D3.1: PPDS enthalpy-of-vaporization coefficients of methane.
const METHANE = { Tc: 190.56, A: 4.99314, B: 5.01992, C: -2.261379, D: -2.477646, E: 4.425783 };

describe("PPDS enthalpy of vaporization", () => {
  // VDI Heat Atlas (2010) D3.1 saturation table of methane, Δh_v in J/mol (converted from
  // kJ/kg with M = 16.04246 g/mol, four significant digits printed): the Heat Atlas fits its
  // equation to the same data; 0.1 %.
  it.each([
    [120, 7934.6],
    [150, 6619.1],
    [180, 3960.9],
  ])("methane at %s K against the VDI table, %s J/mol", (temperatureK, expected) => {
    expectClose(ppdsEnthalpyOfVaporization(METHANE, temperatureK), expected, { rel: 1e-3 });
  });

  it("vanishes at T_c", () => {
    expect(ppdsEnthalpyOfVaporization(METHANE, 190.56)).toBe(0);
    expect(ppdsEnthalpyOfVaporization(METHANE, 190.7, 190.7)).toBe(0);
  });
});

describe("Watson scaling", () => {
  const anchor = { T1: 246.78, enthalpy1: 22157, Tc: 374.18 };
  it("returns the anchor at T1, zero at T_c, and falls monotonically between", () => {
    expect(watsonEnthalpyOfVaporization(anchor, 246.78)).toBe(22157);
    expect(watsonEnthalpyOfVaporization(anchor, 374.18)).toBe(0);
    let previous = Infinity;
    for (let temperatureK = 170; temperatureK <= 374; temperatureK += 4) {
      const value = watsonEnthalpyOfVaporization(anchor, temperatureK);
      expect(value).toBeLessThan(previous);
      previous = value;
    }
  });
});
