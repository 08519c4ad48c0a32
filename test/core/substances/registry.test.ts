/**
 * Substance look-up by any alias: common name, formula, CAS number, ASHRAE 34 refrigerant number.
 */
import { describe, expect, it } from "vitest";
import { PhaseError } from "../../../core/errors";
import { SUBSTANCES, findSubstance } from "../../../core/substances/registry";
import { water } from "../../../core/substances/water";

describe("findSubstance", () => {
  // CAS Registry Number of water 7732-18-5; ASHRAE 34 refrigerant number R-718 (from memory).
  it.each(["water", "Water", " WATER ", "H2O", "h2o", "7732-18-5", "R-718", "r718", "R 718", "steam", "ice"])(
    "%s finds water",
    (name) => {
      expect(findSubstance(name)).toBe(water);
    },
  );

  it("lists water among the substances, with its CAS and refrigerant numbers", () => {
    expect(SUBSTANCES).toContain(water);
    expect(water.cas).toBe("7732-18-5");
    expect(water.refrigerant).toBe("R-718");
    expect(water.formula).toBe("H2O");
  });

  it("an unknown name is bad input naming it, suggesting the nearest and listing the known ones", () => {
    let error: unknown;
    try {
      findSubstance("watr");
    } catch (caught) {
      error = caught;
    }
    expect(error).toBeInstanceOf(PhaseError);
    const phaseError = error as PhaseError;
    expect(phaseError.kind).toBe("bad-input");
    expect(phaseError.message).toContain('unknown substance "watr"');
    expect(phaseError.message).toContain('Did you mean "water"');
    expect(phaseError.message).toContain("Known substances: water");
  });

  it("a name far from every alias gets no suggestion but still the list", () => {
    let message = "";
    try {
      findSubstance("unobtainium");
    } catch (caught) {
      message = (caught as PhaseError).message;
    }
    expect(message).not.toContain("Did you mean");
    expect(message).toContain("Known substances:");
  });
});
