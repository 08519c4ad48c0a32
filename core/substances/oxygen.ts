/**
 * Oxygen (O2), engineering grade: VDI Heat Atlas (2010) PPDS vapour-pressure and enthalpy-of-
 * vaporization equations, the ITS-90 triple point, CRC Handbook (2014) latent heats, Poling et
 * al. (2001) ideal-gas heat capacity. No published melting equation is used: see the phase map.
 */
import { wagner25_5 } from "../models/engineering/wagner-vapor-pressure";
import { engineeringSubstance } from "./engineering-substance";

/** Oxygen at engineering grade. */
export const oxygen = engineeringSubstance({
  id: "oxygen",
  name: "oxygen",
  formula: "O2",
  cas: "7782-44-7",
  refrigerant: "R-732",
  aliases: ["R732", "LOX", "dioxygen"],
  atoms: { O: 2 },
  tripleTemperature: {
    value: 54.3584,
    source: "its-90",
    note: "defining fixed point of ITS-90 (value from memory of its Table 1); the CRC Handbook (2014) melting point is 54.36 K",
  },
  criticalTemperature: {
    value: 154.6,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.03 K (Mathews 1972: 154.58 K)",
  },
  criticalPressure: {
    value: 5.046e6,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.1 % (Mathews 1972: 5.043 MPa)",
  },
  criticalDensity: {
    value: 436.0,
    source: "mathews-1972",
    note: "31.999 g/mol over V_c = 73.4 cm³/mol; ±1 % (the VDI density equation's 427 kg/m³ is a fit parameter)",
  },
  normalBoilingPoint: {
    value: 90.188,
    source: "crc-handbook-95",
    note: "physical constants of inorganic compounds; ±0.005 K",
  },
  normalMeltingPoint: {
    value: 54.36,
    source: "crc-handbook-95",
    note: "physical constants of inorganic compounds",
  },
  enthalpyOfVaporization: {
    value: 6820,
    temperatureK: 90.188,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table, 6.82 kJ/mol at 90.2 K; ±0.5 %",
  },
  enthalpyOfFusion: {
    value: 440,
    source: "crc-handbook-95",
    note: "enthalpy of fusion table, 0.44 kJ/mol at the normal melting point, used at the triple point; ±3 %",
  },
  vaporPressure: {
    coefficients: wagner25_5(154.6, 5.046e6, -6.05148, 1.23506, -0.62883, -1.61288),
    source: "vdi-heat-atlas-2010",
    name: "VDI Heat Atlas (2010) D3.1 PPDS vapour-pressure equation (Wagner 2.5-5 form)",
    tMin: 54.35,
    uncertainty:
      "no uncertainty printed; against the Perry's Handbook (2008) Table 2-8 equation within 0.4 % from 80 K to 150 K and 0.9 % at 60 K (checked in the tests)",
  },
  vaporization: {
    kind: "ppds",
    coefficients: { Tc: 154.6, A: 4.97014, B: 5.30204, C: -2.421192, D: -2.154911, E: 3.47227 },
    uncertainty:
      "the PPDS equation reproduces the Heat Atlas tables to about 0.2 % below 0.95 T_c for the fluids checked; the CRC value and the equation agree to 0.02 % at T_b; ±0.5 %",
  },
  idealGas: {
    model: { kind: "poling", a: [3.63, -0.001794, 0.00000658, -0.000000006, 1.79e-12], tMin: 50, tMax: 1000 },
    source: "poling-2001",
    name: "Poling et al. (2001) Appendix A ideal-gas heat-capacity polynomial",
    uncertainty: "reproduces Poling's tabulated c_p°(298.15 K) = 29.38 J/(mol K) to 0.03 %; about ±1 % over the range",
  },
  hazards: ["strong oxidizer: oxygen-enriched air makes clothing, oils and greases burn violently", "cryogenic liquid at 90 K: cold burns"],
  enthalpyChecks:
    "Not measured for this substance (no saturation table in the sources); for the comparable fluids measured (argon, methane, carbon monoxide) the saturated-liquid heat capacity is within 5 % and the saturated-vapour heat capacity down to 20 % low below 0.9 T_c",
});
