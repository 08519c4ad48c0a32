/**
 * Hydrogen sulfide (H2S), engineering grade: VDI Heat Atlas (2010) PPDS vapour-pressure and
 * enthalpy-of-vaporization equations, CRC Handbook (2014) melting point and latent heats, Poling
 * et al. (2001) ideal-gas heat capacity. No published melting equation is used: see the phase
 * map. Toxic gas: see the cautions.
 */
import { wagner25_5 } from "../models/engineering/wagner-vapor-pressure";
import { engineeringSubstance } from "./engineering-substance";

/** Hydrogen sulfide at engineering grade. */
export const hydrogenSulfide = engineeringSubstance({
  id: "hydrogen-sulfide",
  name: "hydrogen sulfide",
  formula: "H2S",
  cas: "7783-06-4",
  aliases: ["hydrogen sulphide", "sulfane"],
  atoms: { H: 2, S: 1 },
  tripleTemperature: {
    value: 187.65,
    source: "crc-handbook-95",
    note: "the normal melting point (physical constants of inorganic compounds), used as the triple-point temperature; they differ by about 0.01 K; ±0.02 K",
  },
  criticalTemperature: {
    value: 373.1,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.4 K (compilations give 373.1 to 373.5 K)",
  },
  criticalPressure: {
    value: 8.999e6,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±0.8 % (Mathews 1972: 8.937 MPa)",
  },
  criticalDensity: {
    value: 349,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS saturated-liquid density equation; ±1 %",
  },
  normalBoilingPoint: {
    value: 212.857,
    source: "vdi-heat-atlas-2010",
    note: "computed: the PPDS vapour-pressure equation at 101.325 kPa; ±0.07 K. The CRC Handbook's 213.6 K is 0.74 K higher and inconsistent with every other source, so it is not used",
  },
  normalMeltingPoint: {
    value: 187.65,
    source: "crc-handbook-95",
    note: "physical constants of inorganic compounds",
  },
  enthalpyOfVaporization: {
    value: 18670,
    temperatureK: 212.857,
    source: "crc-handbook-95",
    note: "enthalpy of vaporization table, 18.67 kJ/mol, printed at 213.6 K and used at T_b (the 0.74 K shift changes it by about 0.1 %); ±0.5 %",
  },
  enthalpyOfFusion: {
    value: 2380,
    source: "crc-handbook-95",
    note: "enthalpy of fusion table, 2.38 kJ/mol at the normal melting point, used at the triple point; ±3 %",
  },
  vaporPressure: {
    coefficients: wagner25_5(373.1, 8.999e6, -6.50342, 1.52011, -1.36969, -1.96704),
    source: "vdi-heat-atlas-2010",
    name: "VDI Heat Atlas (2010) D3.1 PPDS vapour-pressure equation (Wagner 2.5-5 form)",
    tMin: 187.65,
    uncertainty:
      "no uncertainty printed; against the Perry's Handbook (2008) Table 2-8 equation within 0.2 % from 260 K to 360 K and 1.5 % near the triple point (checked in the tests)",
  },
  vaporization: {
    kind: "ppds",
    coefficients: { Tc: 373.1, A: 4.03399, B: 11.42509, C: -8.776318, D: 1.195807, E: 0.952448 },
    uncertainty:
      "the PPDS equation reproduces the Heat Atlas tables to about 0.2 % below 0.95 T_c for the fluids checked; scaled to the CRC value (+0.2 %); ±0.5 %",
  },
  idealGas: {
    model: { kind: "poling", a: [4.266, -0.003438, 0.00001319, -1.331e-8, 4.88e-12], tMin: 50, tMax: 1000 },
    source: "poling-2001",
    name: "Poling et al. (2001) Appendix A ideal-gas heat-capacity polynomial",
    uncertainty: "against NIST-JANAF (1998): +1.0 % at 100 K, −0.3 % at 298.15 K, +1.5 % at 1000 K",
  },
  hazards: ["highly toxic; deadens the sense of smell at dangerous concentrations", "flammable gas, heavier than air"],
  enthalpyChecks:
    "Not measured for this substance (no saturation table in the sources); for the comparable fluids measured (ammonia, R-134a, propane) the saturated-liquid heat capacity is within 11 % and the saturated-vapour heat capacity down to 39 % low below 0.9 T_c",
});
