/**
 * Sulfur dioxide (SO2), engineering grade: VDI Heat Atlas (2010) PPDS vapour-pressure and
 * enthalpy-of-vaporization equations, Staveley et al. (1981) triple point, CRC Handbook (2014)
 * enthalpy of vaporization, NIST-JANAF (1998) ideal-gas heat capacity. No enthalpy of fusion or
 * melting equation from an allowed source: no solid enthalpy and no sublimation curve. Toxic
 * gas: see the cautions.
 */
import { wagner25_5 } from "../models/engineering/wagner-vapor-pressure";
import { engineeringSubstance } from "./engineering-substance";

/** Sulfur dioxide at engineering grade. */
export const sulfurDioxide = engineeringSubstance({
  id: "sulfur-dioxide",
  name: "sulfur dioxide",
  formula: "SO2",
  cas: "7446-09-5",
  refrigerant: "R-764",
  aliases: ["R764", "sulphur dioxide"],
  atoms: { S: 1, O: 2 },
  tripleTemperature: {
    value: 197.711,
    source: "staveley-1981",
    note: "triple-point temperature (ITS-90); ±0.01 K (CRC Handbook melting point 197.65 K)",
  },
  criticalTemperature: {
    value: 430.64,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.2 K (Mathews 1972: 430.8 K)",
  },
  criticalPressure: {
    value: 7.876e6,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.15 % (Mathews 1972: 7.884 MPa)",
  },
  criticalDensity: {
    value: 525,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS saturated-liquid density equation; ±1 %",
  },
  normalBoilingPoint: {
    value: 263.1,
    source: "crc-handbook-95",
    note: "physical constants of inorganic compounds; ±0.05 K",
  },
  enthalpyOfVaporization: {
    value: 24940,
    temperatureK: 263.1,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table, 24.94 kJ/mol; ±0.5 %",
  },
  vaporPressure: {
    coefficients: wagner25_5(430.64, 7.876e6, -7.27858, 1.72871, -2.37473, -2.70464),
    source: "vdi-heat-atlas-2010",
    name: "VDI Heat Atlas (2010) D3.1 PPDS vapour-pressure equation (Wagner 2.5-5 form)",
    tMin: 199.95,
    uncertainty:
      "no uncertainty printed; the Perry's Handbook (2008) Table 2-8 equation differs by up to 2.4 % from 200 K to 420 K, a spread these sources do not resolve (checked in the tests); extended 2.24 K below its stated limit to the triple point, where it is 0.7 % below the measured triple-point pressure",
  },
  vaporization: {
    kind: "ppds",
    coefficients: { Tc: 430.64, A: 6.43046, B: 6.41093, C: -2.662978, D: -0.98606, E: 6.489831 },
    uncertainty:
      "the PPDS equation reproduces the Heat Atlas tables to about 0.2 % below 0.95 T_c for the fluids checked; scaled to the CRC value (+0.3 %); ±0.5 %",
  },
  idealGas: {
    model: { kind: "table", T: [100, 200, 298.15, 300, 400, 500, 600, 700, 800, 900, 1000], cp: [33.526, 36.372, 39.878, 39.945, 43.493, 46.576, 49.049, 50.961, 52.434, 53.58, 54.484] },
    source: "nist-janaf-1998",
    name: "NIST-JANAF (1998) tabulated c_p° of sulfur dioxide, joined linearly between the printed temperatures (the Poling polynomial as transcribed is 6 % off JANAF and is not used)",
    uncertainty: "the table's own values; straight lines between rows 100 K apart differ from the curve by under 0.2 % (against the Shomate fit at 350 K)",
  },
  hazards: ["toxic and corrosive to eyes and airways"],
  enthalpyChecks:
    "Not measured for this substance (no saturation table in the sources); for the comparable fluids measured (ammonia, R-134a, propane) the saturated-liquid heat capacity is within 11 % and the saturated-vapour heat capacity down to 39 % low below 0.9 T_c",
});
