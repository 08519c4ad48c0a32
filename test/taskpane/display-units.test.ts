/** The display-unit choices parse with core's units parser and name the expected units. */
import { describe, expect, it } from "vitest";
import { parseUnits, unitSymbol } from "../../core/units/units";
import { DISPLAY_UNITS, displayUnitsById } from "../../taskpane/data/display-units";

describe("display units", () => {
  it("offers SI, °C with bar, and °F with psi", () => {
    expect(DISPLAY_UNITS.map((u) => [unitSymbol(u.system, "temperature"), unitSymbol(u.system, "pressure")])).toEqual([
      ["K", "Pa"],
      ["°C", "bar"],
      ["°F", "psi"],
    ]);
  });

  it("uses texts a user can type as a units argument", () => {
    for (const units of DISPLAY_UNITS) {
      expect(parseUnits(units.unitsText)).toEqual(units.system);
    }
  });

  it("has unique ids and falls back to SI for an unknown id", () => {
    expect(new Set(DISPLAY_UNITS.map((u) => u.id)).size).toBe(DISPLAY_UNITS.length);
    expect(displayUnitsById("no-such").id).toBe("si");
    expect(displayUnitsById("f-psi").id).toBe("f-psi");
  });
});
