/**
 * Laws every engineering-grade substance obeys, checked against itself: the curves meet at the
 * triple point, vapour pressure rises monotonically to the critical point, saturation look-ups
 * round-trip, latent heats are positive and equal the cited enthalpy of vaporization at the
 * normal boiling point, path energies add up and reverse, and the phase map never answers where
 * its curves do not reach. Point values against published sources live in
 * engineering-checks.test.ts.
 */
import { describe, expect, it } from "vitest";
import { constantOf } from "../../../core/constants";
import { NoSuchStateError, OutOfRangeError, PhaseError } from "../../../core/errors";
import { endState, isobaricPath, latentHeat, pathEnergy } from "../../../core/path";
import {
  meltingPressure,
  meltingTemperature,
  phaseAt,
  saturationPressure,
  saturationTemperature,
} from "../../../core/phase";
import { citation } from "../../../core/sources/bibliography";
import { provenanceRows } from "../../../core/sources/provenance";
import { ENGINEERING_SUBSTANCES } from "../../../core/substances/engineering-library";
import { findSubstance } from "../../../core/substances/registry";
import type { SubstanceDefinition } from "../../../core/substances/types";
import { expectClose } from "../../helpers/expect-close";

const ATM = 101325;
const every = ENGINEERING_SUBSTANCES.map((substance) => [substance.name, substance] as const);
/** Every substance with a triple point: all but helium-4, which has its own tests below. */
const each = every.filter(([, substance]) => substance.noTriplePoint === undefined);

function value(substance: SubstanceDefinition, symbol: string): number {
  return constantOf(substance, symbol).value;
}

function thrown(action: () => unknown): unknown {
  try {
    action();
  } catch (error) {
    return error;
  }
  return undefined;
}

/** A rising ladder of n + 1 temperatures from low to high. */
function ladder(low: number, high: number, n: number): number[] {
  return Array.from({ length: n + 1 }, (_, i) => low + ((high - low) * i) / n);
}

describe.each(every)("%s: identity and sources", (_name, substance) => {
  it("is found by name, formula, CAS number and refrigerant number", () => {
    for (const alias of [substance.name, substance.formula, substance.cas, substance.refrigerant ?? substance.name]) {
      expect(findSubstance(alias)).toBe(substance);
    }
  });

  it("is engineering grade throughout, and every model states validity, uncertainty and a known source", () => {
    expect(substance.grade).toBe("engineering");
    const models = [
      substance.stateModel,
      substance.curves.boiling.model,
      ...(substance.curves.sublimation ? [substance.curves.sublimation.model] : []),
      ...substance.curves.melting.map((branch) => branch.model),
      ...(substance.enthalpy?.models ?? []),
    ];
    for (const model of models) {
      expect(model.grade).toBe("engineering");
      expect(model.validity.length).toBeGreaterThan(10);
      expect(model.uncertainty.length).toBeGreaterThan(10);
      expect(citation(model.source).reference.length).toBeGreaterThan(10);
    }
    for (const row of provenanceRows(substance)) expect(row.quantity.length).toBeGreaterThan(0);
  });

  it("names its own hazards for the cautions (common practice)", () => {
    expect(substance.hazards?.length ?? 0).toBeGreaterThan(0);
  });

  it("carries its constants, each with a note and a citation", () => {
    const symbols = ["Tc", "Pc", "Tb", "M", "omega", "Hvap", ...(substance.noTriplePoint === undefined ? ["Tt", "Pt"] : [])];
    for (const symbol of symbols) {
      const constant = constantOf(substance, symbol);
      expect(Number.isFinite(constant.value)).toBe(true);
      expect(constant.note.length).toBeGreaterThan(5);
      expect(citation(constant.source).short.length).toBeGreaterThan(0);
    }
  });
});

describe.each(each)("%s: curves", (_name, substance) => {
  const tt = value(substance, "Tt");
  const pt = value(substance, "Pt");
  const tc = value(substance, "Tc");
  const pc = value(substance, "Pc");

  it("boiling, sublimation and melting curves meet at the triple point", () => {
    expect(substance.curves.boiling.tMin).toBe(tt);
    expect(substance.curves.boiling.pressure(tt)).toBe(pt);
    const sublimation = substance.curves.sublimation;
    if (sublimation) {
      expect(sublimation.tMax).toBe(tt);
      expectClose(sublimation.pressure(tt), pt, { rel: 1e-14 });
    }
    for (const branch of substance.curves.melting) {
      expect(branch.tMin).toBe(tt);
      expectClose(branch.pressure(tt), pt, { rel: 1e-14 });
    }
    expectClose(saturationPressure(substance, tt), pt, { rel: 1e-14 });
  });

  it("vapour pressure rises monotonically from the triple point to p_c at T_c", () => {
    let previous = 0;
    for (const temperatureK of ladder(tt, tc, 400)) {
      const pressurePa = saturationPressure(substance, temperatureK);
      expect(pressurePa).toBeGreaterThan(previous);
      previous = pressurePa;
    }
    expect(saturationPressure(substance, tc)).toBe(pc);
    if (substance.curves.sublimation) {
      let below = 0;
      for (const temperatureK of ladder(substance.curves.sublimation.tMin, tt, 100)) {
        const pressurePa = saturationPressure(substance, temperatureK);
        expect(pressurePa).toBeGreaterThan(below);
        below = pressurePa;
      }
    }
  });

  it("SATTEMP(SATPRESSURE(T)) returns T on the boiling and sublimation curves", () => {
    for (const temperatureK of ladder(tt, tc, 13).slice(1, -1)) {
      expectClose(saturationTemperature(substance, saturationPressure(substance, temperatureK)), temperatureK, { rel: 1e-10 });
    }
    const sublimation = substance.curves.sublimation;
    if (sublimation) {
      for (const temperatureK of ladder(sublimation.tMin, tt, 5).slice(0, -1)) {
        expectClose(saturationTemperature(substance, saturationPressure(substance, temperatureK)), temperatureK, { rel: 1e-10 });
      }
    }
  });

  it("the acentric factor follows from the boiling curve by its definition", () => {
    const omega = -Math.log10(saturationPressure(substance, 0.7 * tc) / pc) - 1;
    expectClose(value(substance, "omega"), omega, { rel: 1e-12 });
  });

  it("answers no saturation above T_c and no boiling above p_c", () => {
    expect(thrown(() => saturationPressure(substance, tc * 1.01))).toBeInstanceOf(NoSuchStateError);
    expect(thrown(() => saturationTemperature(substance, pc * 1.01))).toBeInstanceOf(NoSuchStateError);
  });

  it("melting: a published curve rises with temperature; without one, MELTTEMP says so", () => {
    if (substance.curves.melting.length > 0) {
      const branch = substance.curves.melting[0]!;
      let previous = 0;
      for (const temperatureK of ladder(branch.tMin, branch.tMax, 50)) {
        const pressurePa = meltingPressure(substance, temperatureK);
        expect(pressurePa).toBeGreaterThanOrEqual(previous);
        previous = pressurePa;
      }
      expectClose(meltingTemperature(substance, meltingPressure(substance, tt + 5)), tt + 5, { rel: 1e-10 });
      return;
    }
    for (const attempt of [() => meltingTemperature(substance, 10 * pt + ATM), () => meltingPressure(substance, tt + 1)]) {
      const error = thrown(attempt);
      expect(error).toBeInstanceOf(NoSuchStateError);
      expect((error as PhaseError).message).toContain("no melting curve is published");
      expect((error as PhaseError).message).toContain(`${substance.name}`);
    }
    expect(substance.meltingBound?.anchorK).toBe(tt);
    expect(substance.meltingBound?.anchorPa).toBe(pt);
  });
});

describe.each(each)("%s: phase map", (_name, substance) => {
  const tt = value(substance, "Tt");
  const pt = value(substance, "Pt");
  const tc = value(substance, "Tc");
  const pc = value(substance, "Pc");
  const tb = value(substance, "Tb");

  it("names the phases around the normal boiling point and the critical point", () => {
    if (tb - 1 > tt + 1) expect(phaseAt(substance, tb - 1, ATM).phase).toBe("liquid");
    expect(phaseAt(substance, tb + 1, ATM).phase).toBe("vapor");
    expect(phaseAt(substance, tc + 1, pc / 2).phase).toBe("gas");
    expect(phaseAt(substance, tc + 1, pc * 2).phase).toBe("supercritical fluid");
    expect(phaseAt(substance, tt - 1, Math.max(ATM, 2 * pt)).phase).toBe("solid");
  });

  it("below the triple-point pressure: solid under the sublimation curve, vapour above its temperature", () => {
    const sublimation = substance.curves.sublimation;
    const p = pt / 10;
    if (!sublimation) {
      expect(thrown(() => phaseAt(substance, tt - 1, p))).toBeInstanceOf(NoSuchStateError);
      return;
    }
    const ts = saturationTemperature(substance, p);
    expect(phaseAt(substance, ts - 0.5, p).phase).toBe("solid");
    expect(phaseAt(substance, ts + 0.5, p).phase).toBe("vapor");
  });

  it("without a melting curve, does not decide between the triple point and the slope bound", () => {
    if (substance.curves.melting.length > 0) return;
    const p = pt + 5e6;
    const error = thrown(() => phaseAt(substance, tt + 2, p));
    expect(error).toBeInstanceOf(OutOfRangeError);
    expect((error as PhaseError).message).toContain("may be solid or liquid");
    expect(phaseAt(substance, tt - 0.01, p).phase).toBe("solid");
    expect(phaseAt(substance, tt + 5.01, p).phase).not.toBe("solid");
  });
});

const withEnthalpy = each.filter(([, substance]) => substance.enthalpy !== undefined);

describe("enthalpy models", () => {
  it("every substance has one except normal hydrogen and helium-4, which say why", () => {
    expect(every.filter(([, substance]) => !substance.enthalpy).map(([name]) => name)).toEqual(["hydrogen", "helium-4"]);
    const hydrogen = findSubstance("hydrogen");
    expect(hydrogen.referenceState).toContain("no enthalpy model");
    expect(thrown(() => latentHeat(hydrogen, "vaporization", 20))).toBeInstanceOf(NoSuchStateError);
  });
});

describe.each(withEnthalpy)("%s: latent heats and enthalpy", (_name, substance) => {
  const tt = value(substance, "Tt");
  const tc = value(substance, "Tc");
  const pc = value(substance, "Pc");
  const m = value(substance, "M");
  const model = substance.enthalpy!;

  it("the enthalpy of vaporization equals the cited value at its temperature", () => {
    const cited = constantOf(substance, "Hvap");
    const anchorK = Number(/at ([0-9.]+) K/.exec(cited.note)![1]);
    expectClose(latentHeat(substance, "vaporization", anchorK), cited.value, { rel: 1e-9 });
  });

  /**
   * Lowest temperature of a ladder at which the vapour has an enthalpy (the ideal-gas heat
   * capacity of some substances starts at 200 K, above their triple points); below it the model
   * must refuse with an out-of-range error.
   */
  function vaporFloor(temperatures: readonly number[]): number {
    for (const temperatureK of temperatures) {
      const error = thrown(() => model.enthalpy("vapor", temperatureK, 1, ""));
      if (error === undefined) return temperatureK;
      expect(error).toBeInstanceOf(OutOfRangeError);
    }
    return Infinity;
  }

  it("latent heats of vaporization are positive from the triple point to T_c and fall towards it", () => {
    let previous = Infinity;
    const temperatures = ladder(tt, 0.999 * tc, 60);
    const floor = vaporFloor(temperatures);
    for (const temperatureK of temperatures.filter((t) => t >= floor)) {
      const latent = latentHeat(substance, "vaporization", temperatureK);
      expect(latent).toBeGreaterThan(0);
      expect(latent).toBeLessThan(previous);
      previous = latent;
    }
  });

  it("latent heats of sublimation are positive and exceed vaporization by fusion at the triple point", () => {
    const sublimation = substance.curves.sublimation;
    if (!sublimation || !substance.constants.enthalpyOfFusion) return;
    const temperatures = ladder(Math.max(sublimation.tMin, tt * 0.8), tt, 6);
    const floor = vaporFloor(temperatures);
    for (const temperatureK of temperatures.filter((t) => t >= floor)) {
      expect(latentHeat(substance, "sublimation", temperatureK)).toBeGreaterThan(0);
    }
    if (floor > tt) return;
    const fusion = value(substance, "Hfus");
    expectClose(latentHeat(substance, "sublimation", tt) - latentHeat(substance, "vaporization", tt), fusion, { rel: 1e-9 });
    expect(fusion * m).toBeGreaterThan(0);
  });

  it("liquid and supercritical fluid meet at T_c above p_c", () => {
    const p = 1.5 * pc;
    expectClose(model.enthalpy("liquid", tc, p, ""), model.enthalpy("vapor", tc, p, ""), { abs: 1e-6 * Math.abs(value(substance, "Hvap")) });
  });

  it("the saturated liquid at the normal boiling point is the zero of enthalpy", () => {
    const cited = constantOf(substance, "Hvap");
    const anchorK = Number(/at ([0-9.]+) K/.exec(cited.note)![1]);
    expectClose(model.enthalpy("liquid", anchorK, saturationPressure(substance, anchorK), ""), 0, { abs: 1e-9 * cited.value });
  });

  it("refuses the liquid below the triple point and every phase above its pressure limit", () => {
    expect(thrown(() => model.enthalpy("liquid", tt - 1, ATM, ""))).toBeInstanceOf(OutOfRangeError);
    expect(thrown(() => model.enthalpy("vapor", 300, 6 * pc, ""))).toBeInstanceOf(OutOfRangeError);
  });
});

/**
 * Isobars on which core/path can run a whole path today: below the triple-point pressure
 * (solid, sublimation, vapour) where the substance has a solid and its vapour enthalpy reaches
 * down to the sublimation temperature, and at 1 atm where a melting curve is published. (Above
 * the triple-point pressure, core/boundaries asks for the melting temperature on every isobar,
 * which a substance without a published melting curve cannot give.)
 */
function pathCases(substance: SubstanceDefinition): { p: number; t1: number; t2: number; t3: number }[] {
  const tt = value(substance, "Tt");
  const cases: { p: number; t1: number; t2: number; t3: number }[] = [];
  const sublimation = substance.curves.sublimation;
  if (sublimation && substance.constants.enthalpyOfFusion) {
    // Sublime halfway between the triple point and the lowest temperature at which both the
    // sublimation curve and the vapour enthalpy reach.
    const vaporLow = ladder(sublimation.tMin, tt, 200).find(
      (t) => thrown(() => substance.enthalpy!.enthalpy("vapor", t, 1, "")) === undefined,
    );
    if (vaporLow !== undefined && vaporLow < tt) {
      const ts = (vaporLow + tt) / 2;
      const p = sublimation.pressure(ts);
      const [low] = substance.enthalpy!.temperatureLimits(p);
      cases.push({ p, t1: Math.max(low, (vaporLow + ts) / 2), t2: tt + 10, t3: 400 });
    }
  }
  if (substance.curves.melting.length > 0) cases.push({ p: ATM, t1: 0.81 * tt, t2: value(substance, "Tb") - 1, t3: 400 });
  return cases;
}

const pathEach = ENGINEERING_SUBSTANCES.filter((substance) => substance.enthalpy).flatMap((substance) =>
  pathCases(substance).map((c) => [substance.name, c.p, substance, c] as const),
);

describe.each(pathEach)("%s: path energy on the %s Pa isobar", (_name, _p, substance, c) => {
  it("heating is positive, steps add up, paths compose and reverse", () => {
    const steps = isobaricPath(substance, 2, c.t1, c.t3, c.p);
    const total = steps.reduce((s, step) => s + step.energyJ, 0);
    expect(total).toBeGreaterThan(0);
    for (const step of steps) expect(step.energyJ).toBeGreaterThan(0);
    expect(steps.some((step) => step.kind === "latent")).toBe(true);
    expectClose(pathEnergy(substance, 2, c.t1, c.t3, c.p), total, { rel: 1e-12 });
    const composed = pathEnergy(substance, 2, c.t1, c.t2, c.p) + pathEnergy(substance, 2, c.t2, c.t3, c.p);
    expectClose(composed, total, { rel: 1e-9 });
    expectClose(pathEnergy(substance, 2, c.t3, c.t1, c.p), -total, { rel: 1e-12 });
    expectClose(pathEnergy(substance, 1, c.t1, c.t3, c.p), total / 2, { rel: 1e-12 });
  });

  it("ENDSTATE inverts PATHENERGY", () => {
    const heat = pathEnergy(substance, 1, c.t1, c.t2, c.p);
    expectClose(endState(substance, 1, c.t1, heat, c.p).temperatureK, c.t2, { rel: 1e-8 });
  });
});

describe("helium-4: no triple point", () => {
  const helium = findSubstance("He-4");
  const tc = value(helium, "Tc");

  it("has no triple-point constants and says why when asked", () => {
    expect(helium.constants.tripleTemperature).toBeUndefined();
    const error = thrown(() => constantOf(helium, "Tt"));
    expect(error).toBeInstanceOf(NoSuchStateError);
    expect(thrown(() => meltingTemperature(helium, 5e6))).toBeInstanceOf(NoSuchStateError);
    expect((thrown(() => meltingTemperature(helium, 5e6)) as PhaseError).message).toContain("no triple point");
  });

  it("its boiling curve rises monotonically and round-trips on both sides of the lambda point", () => {
    let previous = 0;
    for (const temperatureK of ladder(1.25, 5.0, 113)) {
      const pressurePa = saturationPressure(helium, temperatureK);
      expect(pressurePa).toBeGreaterThan(previous);
      previous = pressurePa;
      expectClose(saturationTemperature(helium, pressurePa), temperatureK, { rel: 1e-10 });
    }
  });

  it("is fluid below 2.5 MPa at every covered temperature, and liquid or vapour by its boiling curve", () => {
    expect(phaseAt(helium, 4.0, ATM).phase).toBe("liquid");
    expect(phaseAt(helium, 4.5, ATM).phase).toBe("vapor");
    expect(phaseAt(helium, 1.3, 2e6).phase).toBe("liquid");
    expect(phaseAt(helium, 300, 20e6).phase).toBe("supercritical fluid");
    expect(phaseAt(helium, 10, ATM).phase).toBe("gas");
  });

  it("does not decide where the solid may exist, and does not answer outside its curves", () => {
    expect(thrown(() => phaseAt(helium, 1.5, 2.8e6))).toBeInstanceOf(OutOfRangeError);
    expect(thrown(() => phaseAt(helium, 4, 14e6))).toBeInstanceOf(OutOfRangeError);
    expect(phaseAt(helium, 20, 14e6).phase).toBe("supercritical fluid");
    expect(thrown(() => phaseAt(helium, 1.0, 1000))).toBeInstanceOf(OutOfRangeError);
    // Between the top of the ITS-90 equation (5.0 K) and T_c no boiling curve is covered.
    expect(thrown(() => phaseAt(helium, (5.0 + tc) / 2, 2e5))).toBeInstanceOf(OutOfRangeError);
    expect(thrown(() => saturationPressure(helium, (5.0 + tc) / 2))).toBeInstanceOf(OutOfRangeError);
  });
});
