/**
 * Normal hydrogen (H2, 3:1 ortho–para), engineering grade: the Leachman et al. (2009) normal-
 * hydrogen vapour-pressure ancillary equation with its triple and critical points, VDI Heat
 * Atlas (2010) saturation-table latent heat. No enthalpy model: no cited ideal-gas heat capacity
 * of normal hydrogen covers the liquid range. No published melting equation is used: see the
 * phase map.
 */
import { engineeringSubstance } from "./engineering-substance";

/** Hydrogen at engineering grade. */
export const hydrogen = engineeringSubstance({
  id: "hydrogen",
  name: "hydrogen",
  formula: "H2",
  cas: "1333-74-0",
  refrigerant: "R-702",
  aliases: ["R702", "normal hydrogen", "n-H2", "LH2", "dihydrogen"],
  atoms: { H: 2 },
  tripleTemperature: {
    value: 13.957,
    source: "leachman-2009-hydrogen",
    note: "triple point of the normal-hydrogen equation of state (value from memory, not transcribed); ±0.04 K (CRC Handbook melting point 13.99 K)",
  },
  criticalTemperature: {
    value: 33.145,
    source: "leachman-2009-hydrogen",
    note: "critical point of the normal-hydrogen equation of state; ±0.01 K (VDI Heat Atlas 2010 table's critical row: 33.15 K)",
  },
  criticalPressure: {
    value: 1.2964e6,
    source: "leachman-2009-hydrogen",
    note: "critical point of the normal-hydrogen equation of state; ±0.1 % (VDI Heat Atlas 2010 table's critical row: 1.2964 MPa)",
  },
  criticalDensity: {
    value: 31.26,
    source: "vdi-heat-atlas-2010",
    note: "critical row of the normal-hydrogen saturation table; ±0.5 %",
  },
  normalBoilingPoint: {
    value: 20.37,
    source: "vdi-heat-atlas-2010",
    note: "saturation table row at 101.33 kPa; ±0.01 K. The CRC Handbook's 20.271 K is the parahydrogen value",
  },
  normalMeltingPoint: {
    value: 13.99,
    source: "crc-handbook-95",
    note: "physical constants of inorganic compounds, as printed",
  },
  enthalpyOfVaporization: {
    value: 904.53,
    temperatureK: 20.37,
    source: "vdi-heat-atlas-2010",
    note: "saturation table row at 20.37 K (0.9045 kJ/mol); ±1 % (CRC Handbook 2014: 0.90 kJ/mol)",
  },
  enthalpyOfFusion: {
    value: 120,
    source: "crc-handbook-95",
    note: "enthalpy of fusion table, 0.12 kJ/mol; ±5 % (two digits printed)",
  },
  vaporPressure: {
    coefficients: { Tc: 33.145, pc: 1.2964e6, n: [-4.89789, 0.988588, 0.349689, 0.499356], t: [1, 1.5, 2, 2.85] },
    source: "leachman-2009-hydrogen",
    name: "Leachman et al. (2009) normal-hydrogen vapour-pressure ancillary equation (Wagner form, exponents 1, 1.5, 2, 2.85)",
    tMin: 13.957,
    uncertainty:
      "an ancillary fit to the normal-hydrogen equation of state; against the VDI Heat Atlas (2010) normal-hydrogen saturation table within 0.05 % from 20.37 K to 32 K (checked in the tests)",
  },
  vaporization: {
    kind: "watson",
    uncertainty:
      "against the VDI Heat Atlas (2010) saturation table within 3 % from 20 K to 30 K (measured in the tests)",
  },
  noEnthalpyReason:
    "no cited ideal-gas heat capacity covers normal hydrogen below 50 K (the Poling polynomial's range), and near 100 K that polynomial differs from the frozen 3:1 ortho–para gas by over 10 %",
  hazards: ["extremely flammable over a wide range of mixtures with air; nearly invisible flame", "cryogenic liquid at 20 K: cold burns, condenses air on cold surfaces", "asphyxiant"],
  enthalpyChecks:
    "not used: no enthalpy model",
});
