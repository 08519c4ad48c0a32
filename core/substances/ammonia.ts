/**
 * Ammonia (NH3), engineering grade: VDI Heat Atlas (2010) PPDS vapour-pressure and
 * enthalpy-of-vaporization equations, Staveley et al. (1981) triple point, CRC Handbook (2014)
 * latent heats, Poling et al. (2001) ideal-gas heat capacity. No published melting equation is
 * used: see the phase map.
 */
import { wagner25_5 } from "../models/engineering/wagner-vapor-pressure";
import { engineeringSubstance } from "./engineering-substance";

/** Ammonia at engineering grade. */
export const ammonia = engineeringSubstance({
  id: "ammonia",
  name: "ammonia",
  formula: "NH3",
  cas: "7664-41-7",
  refrigerant: "R-717",
  aliases: ["R717", "H3N"],
  atoms: { N: 1, H: 3 },
  tripleTemperature: {
    value: 195.49,
    source: "staveley-1981",
    note: "195.4915 K (ITS-90); ±0.01 K (CRC Handbook normal melting point 195.42 K)",
  },
  criticalTemperature: {
    value: 405.5,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.15 K (compilations give 405.4 to 405.65 K)",
  },
  criticalPressure: {
    value: 11.359e6,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.8 % (Mathews 1972 gives 11.28 MPa)",
  },
  criticalDensity: {
    value: 225,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS saturated-liquid density equation; ±4 % (Mathews 1972 gives 235 kg/m³)",
  },
  normalBoilingPoint: {
    value: 239.82,
    source: "crc-handbook-95",
    note: "physical constants of inorganic compounds; ±0.02 K",
  },
  normalMeltingPoint: {
    value: 195.42,
    source: "crc-handbook-95",
    note: "physical constants of inorganic compounds, as printed (0.07 K below the triple point)",
  },
  enthalpyOfVaporization: {
    value: 23330,
    temperatureK: 239.82,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table, 23.33 kJ/mol; ±0.5 %",
  },
  enthalpyOfFusion: {
    value: 5660,
    source: "crc-handbook-95",
    note: "enthalpy of fusion table, 5.66 kJ/mol at the normal melting point, used at the triple point; ±3 %",
  },
  vaporPressure: {
    coefficients: wagner25_5(405.5, 11.359e6, -7.30274, 1.64638, -2.01606, -1.96884),
    source: "vdi-heat-atlas-2010",
    name: "VDI Heat Atlas (2010) D3.1 PPDS vapour-pressure equation (Wagner 2.5-5 form)",
    tMin: 195.35,
    uncertainty:
      "no uncertainty printed; against the Heat Atlas saturation table within 0.15 % from 239.75 K " +
      "to 400 K (checked in the tests)",
  },
  vaporization: {
    kind: "ppds",
    coefficients: { Tc: 405.5, A: 5.74477, B: 7.28288, C: -2.428744, D: -2.261942, E: 2.909378 },
    uncertainty:
      "as used (scaled to the cited value at T_b), within 0.16 % of the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c and 0.16 % to 0.95 T_c (measured in the tests); ±0.5 % overall below 0.9 T_c, more near T_c" +
      "to 390 K; ±0.5 %",
  },
  idealGas: {
    model: { kind: "poling", a: [4.238, -0.004215, 0.00002041, -2.126e-8, 7.61e-12], tMin: 50, tMax: 1000 },
    source: "poling-2001",
    name: "Poling et al. (2001) Appendix A ideal-gas heat-capacity polynomial",
    uncertainty: "against NIST-JANAF (1998): −0.1 % at 100 K, +0.1 % at 298.15 K, −0.2 % at 1000 K",
  },
  hazards: ["toxic and corrosive to eyes, skin and lungs", "flammable at high concentration in air"],
  enthalpyChecks:
    "Measured against the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c: saturated-liquid heat capacity +3 % to +11 %; saturated-vapour heat capacity down to -39 % (the cubic underestimates the vapour's residual heat capacity near saturation; away from saturation the gas is close to ideal and the error shrinks)",
});
