/** The cautions cover the hazards the design names and defer to codes and licensed practice. */
import { describe, expect, it } from "vitest";
import { CAUTIONS, CAUTIONS_LIMITS, OUTSIDE_EXCEL_NOTICE } from "../../taskpane/data/cautions";

describe("cautions", () => {
  const all = CAUTIONS.map((c) => `${c.hazard} ${c.text}`).join(" ").toLowerCase();

  it.each(["pressure", "cryogenic", "asphyxiant", "dry ice", "closed", "steam", "scald"])("mention %s", (word) => {
    expect(all).toContain(word);
  });

  it("say the results are estimates and that codes and licensed practice govern", () => {
    const limits = `${CAUTIONS_LIMITS.lead} ${CAUTIONS_LIMITS.text}`.toLowerCase();
    for (const phrase of ["engineering estimates", "pressure-equipment codes", "relief sizing", "site procedures", "licensed engineer", "local codes"]) {
      expect(limits).toContain(phrase);
    }
  });

  it("tell a browser user to open the add-in in Excel", () => {
    expect(OUTSIDE_EXCEL_NOTICE.text).toMatch(/Excel/);
    expect(OUTSIDE_EXCEL_NOTICE.text).toMatch(/reference data only/);
  });
});
