/**
 * Carbon dioxide through the generic path machinery (core/path): enthalpies on the Span–Wagner
 * reference state, latent heats at the triple point and at 1 atm, worked energy paths, and the
 * laws every path obeys.
 */
import { describe, expect, it } from "vitest";
import { PhaseError } from "../../core/errors";
import { saturationStateEOS } from "../../core/models/span-wagner-1996/phase-equilibrium";
import { endState, isobaricPath, latentHeat, pathEnergy, specificEnthalpy } from "../../core/path";
import { boundarySlope } from "../../core/boundaries";
import { saturationTemperature } from "../../core/phase";
import { co2 } from "../../core/substances/co2";
import { co2Enthalpy } from "../../core/substances/co2-enthalpy";
import { expectClose } from "../helpers/expect-close";

const ATM = 101325;
const TT = 216.592;
/** Molar mass of Span & Wagner (1996), kg/mol. */
const M = 0.0440098;

function thrown(action: () => unknown): PhaseError {
  try {
    action();
  } catch (error) {
    if (error instanceof PhaseError) return error;
    throw error;
  }
  throw new Error("expected an error");
}

describe("CO2 enthalpy: reference state and continuity", () => {
  // Span & Wagner (1996): h = 0 for the ideal gas at 298.15 K; the real gas at 1 atm lies 0.94 kJ/kg
  // below (its residual enthalpy), so |h| < 1 kJ/kg there.
  it("is close to zero for the gas at 298.15 K and 1 atm (reference state of the ideal gas)", () => {
    const h = specificEnthalpy(co2, 298.15, ATM);
    expect(h).toBeLessThan(0);
    expect(h).toBeGreaterThan(-1e3);
  });

  // The fluid equation is continuous through the critical temperature above p_c: no latent step.
  it("is continuous across T_c above the critical pressure", () => {
    const below = co2Enthalpy.enthalpy("liquid", 304.1282 - 1e-9, 10e6, "");
    const above = co2Enthalpy.enthalpy("vapor", 304.1282 + 1e-9, 10e6, "");
    expectClose(above, below, { abs: 1e-2 });
  });

  it("throws typed errors outside the models", () => {
    expect(thrown(() => co2Enthalpy.enthalpy("liquid", 210, 1e6, "")).kind).toBe("out-of-range");
    expect(thrown(() => co2Enthalpy.enthalpy("vapor", 150, 100, "")).kind).toBe("out-of-range");
    expect(thrown(() => co2Enthalpy.enthalpy("vapor", 190, 1e6, "")).kind).toBe("no-such-state");
    expect(thrown(() => co2Enthalpy.enthalpy("vapor", 250, 20e6, "")).kind).toBe("no-such-state");
    expect(thrown(() => co2Enthalpy.enthalpy("solid", 90, ATM, "dry ice")).kind).toBe("out-of-range");
    expect(thrown(() => co2Enthalpy.enthalpy("solid", 150, ATM, "ice Ih")).kind).toBe("no-such-state");
    expect(thrown(() => co2Enthalpy.enthalpy("vapor", 500, 900e6, "")).kind).toBe("out-of-range");
  });
});

describe("CO2 latent heats", () => {
  // Jäger & Span (2012) join dry ice to the Span–Wagner fluid with Δh_melt(T_t) = 8875 J/mol; the
  // enthalpy models reproduce it by construction (the check is on the wiring).
  it("fusion at the triple point is 8875 J/mol (201.66 kJ/kg)", () => {
    expectClose(latentHeat(co2, "fusion", TT) * M, 8875, { rel: 1e-12 });
  });

  // Vaporization at the triple point: the jump of h across the ancillary boiling curve equals the
  // jump between the two phases of the equation of state's own equilibrium (which the paper
  // tabulates) within the 0.002 % mismatch of the curve, and the Clapeyron equation with the slope
  // of Eq. (3.13) and the equation of state's densities within 0.1 % (measured 0.03 %).
  it("vaporization at the triple point is the equation of state's h'' − h' (350.38 kJ/kg)", () => {
    const latent = latentHeat(co2, "vaporization", TT);
    const equilibrium = saturationStateEOS(TT);
    expectClose(latent, equilibrium.vapor.enthalpy - equilibrium.liquid.enthalpy, { rel: 2e-5 });
    const deltaVolume = 1 / equilibrium.vapor.density - 1 / equilibrium.liquid.density;
    expectClose(latent, TT * deltaVolume * boundarySlope(co2, "boiling", TT), { rel: 1e-3 });
  });

  // Each latent heat is taken at the pressure of its own curve at T_t: sublimation and fusion at
  // 0.51795 MPa, vaporization at Eq. (3.13)'s 0.5179618 MPa, where the vapour enthalpy is 3 mJ/kg
  // different; tolerance 1e-8 relative.
  it("sublimation at the triple point is fusion plus vaporization (552.04 kJ/kg)", () => {
    expectClose(
      latentHeat(co2, "sublimation", TT),
      latentHeat(co2, "fusion", TT) + latentHeat(co2, "vaporization", TT),
      { rel: 1e-8 },
    );
  });

  // Check value: W. F. Giauque, C. J. Egan, J. Chem. Phys. 5, 45 (1937), calorimetric heat of
  // sublimation at the normal sublimation point, 6030 cal/mol (thermochemical calorie, 4.184 J):
  // 25 229.5 J/mol. Measured 0.063 % apart; tolerance 0.2 %.
  it("sublimation at 1 atm agrees with the calorimetry of Giauque and Egan (1937), 6030 cal/mol", () => {
    const temperatureK = saturationTemperature(co2, ATM);
    expectClose(latentHeat(co2, "sublimation", temperatureK) * M, 6030 * 4.184, { rel: 2e-3 });
  });

  it("are positive along every curve and vaporization vanishes towards T_c", () => {
    for (let temperatureK = 154; temperatureK <= TT; temperatureK += 3) {
      expect(latentHeat(co2, "sublimation", temperatureK)).toBeGreaterThan(0);
    }
    for (let temperatureK = TT; temperatureK < 304.1282; temperatureK += 2) {
      expect(latentHeat(co2, "vaporization", temperatureK)).toBeGreaterThan(0);
    }
    for (let temperatureK = TT; temperatureK <= 327.6; temperatureK += 5) {
      expect(latentHeat(co2, "fusion", temperatureK)).toBeGreaterThan(0);
    }
    expect(latentHeat(co2, "vaporization", 304.1)).toBeLessThan(20e3);
  });
  // The latent heat of vaporization vanishes at the critical point; through the ancillary boiling
  // curve it falls steadily down to 1 µK below T_c (closer in, the mismatch of the ancillary
  // curve and the equation of state is larger than what is left of it).
  it("vaporization falls steadily to zero towards the critical point", () => {
    let previous = Infinity;
    for (const below of [10, 1, 0.1, 1e-2, 1e-3, 4e-4, 2e-4, 1e-4, 1e-5, 1e-6]) {
      const latent = latentHeat(co2, "vaporization", 304.1282 - below);
      expect(latent).toBeGreaterThan(0);
      expect(latent).toBeLessThan(previous);
      previous = latent;
    }
    expect(previous).toBeLessThan(1e3);
  });
});

describe("CO2 worked energy paths", () => {
  // Worked paths computed from Span & Wagner (1996) and Jäger & Span (2012), joined with
  // Δh_melt(T_t) = 8875 J/mol, by an independent implementation (not published values; printed
  // to 0.01 kJ/kg, tolerance half of that). The sublimation step is the Giauque–Egan check above.
  it("1 kg dry ice at 180 K to gas at 300 K at 1 atm takes 675.74 kJ (18.01 + 572.91 + 84.82)", () => {
    const steps = isobaricPath(co2, 1, 180, 300, ATM);
    expect(steps.map((step) => step.action)).toEqual(["heat dry ice", "sublime", "heat vapor"]);
    // 194.686 K as printed with the worked path; Eq. (3.12) gives 194.68546 K.
    expectClose(steps[0]!.toK, 194.686, { abs: 1e-3 });
    expectClose(steps[0]!.energyJ / 1e3, 18.01, { abs: 0.005 });
    expectClose(steps[1]!.energyJ / 1e3, 572.91, { abs: 0.005 });
    expectClose(steps[2]!.energyJ / 1e3, 84.82, { abs: 0.005 });
    expectClose(pathEnergy(co2, 1, 180, 300, ATM) / 1e3, 675.74, { abs: 0.005 });
  });

  it("1 kg liquid at 250 K to vapour at 300 K at 2.0 MPa takes 340.68 kJ (boils at 253.648 K, 281.33 kJ)", () => {
    const steps = isobaricPath(co2, 1, 250, 300, 2e6);
    expect(steps.map((step) => step.action)).toEqual(["heat liquid", "boil", "heat vapor"]);
    expectClose(steps[1]!.fromK, 253.648, { abs: 5e-4 });
    expectClose(steps[1]!.energyJ / 1e3, 281.33, { abs: 0.005 });
    expectClose(pathEnergy(co2, 1, 250, 300, 2e6) / 1e3, 340.68, { abs: 0.005 });
  });

  // Demo scenario (ours): a freeze-drying site warms 25 kg of dry ice pellets from 185 K to 20 °C at
  // 1 atm; the path sublimes them all. Energy is m times the one-kilogram path.
  it("scales with mass", () => {
    expectClose(pathEnergy(co2, 25, 185, 293.15, ATM), 25 * pathEnergy(co2, 1, 185, 293.15, ATM), { rel: 1e-14 });
  });
});

describe("CO2 path laws", () => {
  const PATHS = [
    [150, 300, ATM],
    [180, 400, 0.3e6],
    [200, 300, 2e6],
    [200, 600, 5e6],
    [210, 350, 7.3e6],
    [210, 350, 7.377e6],
    [200, 500, 10e6],
    [200, 600, 100e6],
    [250, 700, 700e6],
    [220, 240, 0.517955e6],
  ] as const;

  it.each(PATHS)("heating %s → %s K at %s Pa and cooling back sums to zero", (t1, t2, pressurePa) => {
    const up = pathEnergy(co2, 1, t1, t2, pressurePa);
    const down = pathEnergy(co2, 1, t2, t1, pressurePa);
    expect(up).toBeGreaterThan(0);
    expectClose(up + down, 0, { abs: 1e-9 * Math.abs(up) });
  });

  it.each(PATHS)("the steps %s → %s K at %s Pa add up to the difference of the end enthalpies", (t1, t2, pressurePa) => {
    const total = pathEnergy(co2, 1, t1, t2, pressurePa);
    expectClose(total, specificEnthalpy(co2, t2, pressurePa) - specificEnthalpy(co2, t1, pressurePa), { rel: 1e-9 });
  });

  it.each(PATHS)("end state after the path's heat from %s K is %s K at %s Pa", (t1, t2, pressurePa) => {
    const heat = pathEnergy(co2, 2, t1, t2, pressurePa);
    expectClose(endState(co2, 2, t1, heat, pressurePa).temperatureK, t2, { rel: 1e-9 });
  });

  it("stops halfway through sublimation with half the latent heat added", () => {
    const sublimationK = saturationTemperature(co2, ATM);
    // A path ending on the curve includes the whole phase change, so the heat up to the curve is
    // taken from the solid's enthalpy there.
    const toCurve = co2Enthalpy.enthalpy("solid", sublimationK, ATM, "dry ice") - specificEnthalpy(co2, 180, ATM);
    const half = 0.5 * latentHeat(co2, "sublimation", sublimationK);
    const end = endState(co2, 1, 180, toCurve + half, ATM);
    expect(end.state).toBe("dry ice + vapor");
    expectClose(end.convertedFraction!, 0.5, { rel: 1e-9 });
  });

  it("crosses the critical temperature above p_c without a latent step", () => {
    const steps = isobaricPath(co2, 1, 250, 350, 10e6);
    expect(steps.filter((step) => step.kind === "latent")).toHaveLength(0);
    expect(steps.every((step) => step.energyJ > 0)).toBe(true);
  });

  it("melts at high pressure: 300 MPa from 230 K to 300 K", () => {
    const steps = isobaricPath(co2, 1, 230, 300, 300e6);
    expect(steps.map((step) => step.action)).toEqual(["heat dry ice", "melt", "heat liquid"]);
    expect(steps[1]!.energyJ).toBeGreaterThan(0);
  });
});
