/**
 * The generic enthalpy model of engineering-grade substances, checked against its own
 * construction and the signs thermodynamics requires; point values live in the substance tests.
 */
import { describe, expect, it } from "vitest";
import { constantOf } from "../../../core/constants";
import { NoSuchStateError, OutOfRangeError } from "../../../core/errors";
import { saturationPressure } from "../../../core/phase";
import { findSubstance } from "../../../core/substances/registry";
import { expectClose } from "../../helpers/expect-close";

function thrown(action: () => unknown): unknown {
  try {
    action();
  } catch (error) {
    return error;
  }
  return undefined;
}

describe("engineering enthalpy model", () => {
  const propane = findSubstance("propane");
  const model = propane.enthalpy!;
  const tt = constantOf(propane, "Tt").value;
  const pt = constantOf(propane, "Pt").value;

  it("compressing the liquid raises its enthalpy, by less than v Δp", () => {
    // v Δp with the saturated-liquid density of propane at 250 K, 558.3 kg/m³ (VDI Heat Atlas,
    // 2nd ed., 2010, D3.1 saturation table): 10 MPa gives at most 17.9 kJ/kg.
    const ps = saturationPressure(propane, 250);
    const rise = model.enthalpy("liquid", 250, ps + 10e6, "") - model.enthalpy("liquid", 250, ps, "");
    expect(rise).toBeGreaterThan(0);
    expect(rise).toBeLessThan(10e6 / 558.3);
  });

  it("the solid lies the enthalpy of fusion below the liquid at the triple point, and warms with the liquid's c_p", () => {
    const fusion = constantOf(propane, "Hfus").value;
    expectClose(model.enthalpy("liquid", tt, pt, "") - model.enthalpy("solid", tt, pt, "solid"), fusion, { rel: 1e-12 });
    const step = 0.01;
    const solidCp = (model.enthalpy("solid", tt, pt, "solid") - model.enthalpy("solid", tt - step, pt, "solid")) / step;
    const liquidCp = (model.enthalpy("liquid", tt + step, saturationPressure(propane, tt + step), "") - model.enthalpy("liquid", tt, pt, "")) / step;
    expectClose(solidCp, liquidCp, { rel: 1e-3 });
  });

  it("the vapour enthalpy falls as pressure rises at constant temperature (Joule–Thomson cooling)", () => {
    expect(model.enthalpy("vapor", 300, 5e5, "")).toBeLessThan(model.enthalpy("vapor", 300, 1e5, ""));
  });

  it("refuses the solid above the triple point when no melting curve is published", () => {
    const error = thrown(() => model.enthalpy("solid", tt + 1, 1e6, "solid"));
    expect(error).toBeInstanceOf(OutOfRangeError);
    expect((error as Error).message).toContain("without a published melting curve");
  });

  it("has no solid for a substance without a cited enthalpy of fusion", () => {
    const r134a = findSubstance("R-134a");
    expect(thrown(() => r134a.enthalpy!.enthalpy("solid", 160, 100, "solid"))).toBeInstanceOf(NoSuchStateError);
  });

  it("every isobar's temperature limits bracket a state the model can evaluate", () => {
    const [low, high] = model.temperatureLimits(1e5);
    expect(low).toBeLessThan(high);
    expect(Number.isFinite(model.enthalpy("vapor", high, 1e5, ""))).toBe(true);
  });
});
