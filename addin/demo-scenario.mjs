/**
 * Demo rows for `npm start` / `npm run demo`: an invented cold-storage and freeze-drying site
 * ("Harbour Road cold store and lyophilisation hall"). The numbers are made up for the
 * demonstration, typed the way plant engineers type them; they are not check values and no test
 * compares the answers with anything. One row is a deliberate typing mistake to show what a user
 * sees when an input cannot be used, one asks for a state that does not exist.
 *
 * Each row: where on the site, the function id (namespace left off), the cell arguments in order.
 */
export const DEMO_SITE = "Harbour Road cold store and lyophilisation hall (invented site)";

export const DEMO_ROWS = [
  {
    where: "Freeze-dryer shelf, primary drying: product at -40 °C, chamber at 0.1 mbar",
    id: "STATE",
    args: ["water", -40, 0.1, "C mbar"],
  },
  {
    where: "Same shelf, finer label",
    id: "STATE",
    args: ["water", -40, 0.1, "C mbar", true],
  },
  {
    where: "Ice temperature that sublimes at the 0.12 mbar chamber set point",
    id: "SATTEMP",
    args: ["H2O", 0.12, "C mbar"],
  },
  {
    where: "Vapour pressure over ice on the condenser coil at -62 °C",
    id: "SATPRESSURE",
    args: ["water", -62, "C mbar"],
  },
  {
    where: "Steam header for the CIP skid at 7.5 barg: condensing temperature",
    id: "SATTEMP",
    args: ["water", 7.5, "C barg"],
  },
  {
    where: "Autoclave hold at 121 °C: saturated steam gauge pressure",
    id: "SATPRESSURE",
    args: ["R-718", 121, "C barg"],
  },
  {
    where: "Blast-freezer tunnel at -31 °F, open to the hall (0 psig)",
    id: "STATE",
    args: ["water", -31, 0, "F psig"],
  },
  {
    where: "High-pressure press at 1500 bar: where the ice in the product melts",
    id: "MELTTEMP",
    args: ["water", 1500, "C bar"],
  },
  {
    where: "Pressure that melts ice at the -10 °C store temperature",
    id: "MELTPRESSURE",
    args: ["water", -10, "C bar"],
  },
  {
    where: "Heat to pull from a 12 kg tray of product water, 20 °C to -40 °C, before drying (kJ)",
    id: "PATHENERGY",
    args: ["water", 12, 20, -40, 1.01325, "C bar kJ kg"],
  },
  {
    where: "Ice bank: 50 kg at -10 °C after 10 MJ of load: temperature, state, fraction melted",
    id: "ENDSTATE",
    args: ["water", 50, -10, 10, 1.01325, "C bar MJ kg"],
  },
  {
    where: "Ice leaving the product during primary drying at -40 °C (kJ/kg)",
    id: "LATENTHEAT",
    args: ["water", "sublimation", -40, "C kJ kg"],
  },
  {
    where: "Pressure-shift thawing: where the press melts ice held at -10 °C",
    id: "CROSSINGS",
    args: ["water", -10, 1, -10, 3000, "C bar"],
  },
  {
    where: "Critical temperature of water, for the relief-valve datasheet",
    id: "CONSTANT",
    args: ["water", "Tc", "C"],
  },
  {
    where: "Boiling point asked at 250 bar (above the critical pressure)",
    id: "SATTEMP",
    args: ["water", 250, "C bar"],
  },
  {
    where: "Deliberate typing mistake in the units (mbr for mbar)",
    id: "SATPRESSURE",
    args: ["water", 20, "C mbr"],
  },
];

/** The cautions printed under the demo table. */
export const DEMO_CAUTIONS = [
  "Results are engineering estimates from published correlations, not a substitute for pressure-equipment",
  "codes, relief sizing standards, site procedures or a licensed engineer's review; local codes and",
  "licensed practice govern. Pressure vessels, steam, cryogens, asphyxiant gases and dry ice can hurt people.",
];
