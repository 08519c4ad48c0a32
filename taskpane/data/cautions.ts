/**
 * The safety cautions the pane always shows, and the notice shown outside Excel. Plain text so
 * that tests can read it without a browser.
 */

/** One hazard: its name (the subject of the sentence) and what to keep in mind. */
export interface Caution {
  readonly hazard: string;
  readonly text: string;
}

/** Heading of the cautions box. */
export const CAUTIONS_TITLE = "Safety cautions";

/** The usual hazards of the work this add-in supports (common practice). */
export const CAUTIONS: readonly Caution[] = [
  { hazard: "High pressure", text: "stores energy that can burst vessels, hoses and fittings." },
  { hazard: "Cryogenic liquids", text: "cause cold burns and brittle failures; trapped liquid builds pressure as it warms." },
  { hazard: "Asphyxiant gases", text: "(CO2, N2, Ar) displace oxygen without warning: ventilate and monitor oxygen." },
  { hazard: "Dry ice", text: "sublimes to CO2 gas: never seal it in a closed container or a small unventilated space." },
  { hazard: "Steam and hot water", text: "scald; hot water let down to a lower pressure flashes to steam." },
];

/** What the numbers are (the lead, shown in bold) and what governs instead. */
export const CAUTIONS_LIMITS = {
  lead: "Results are engineering estimates,",
  text:
    "no substitute for pressure-equipment codes, relief sizing standards, site procedures or " +
    "review by a licensed engineer. Local codes and licensed practice govern.",
} as const;

/** Shown when the page runs in a browser rather than in Excel. */
export const OUTSIDE_EXCEL_NOTICE = {
  title: "Not running in Excel",
  text:
    "Open Phasecell from Excel to use the PHASE functions in your cells. Here this page shows " +
    "reference data only.",
} as const;
