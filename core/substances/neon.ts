/**
 * Neon (Ne), engineering grade: VDI Heat Atlas (2010) PPDS vapour-pressure equation and
 * saturation-table latent heat with Watson's scaling, the ITS-90 triple point, CRC Handbook
 * (2014) enthalpy of fusion, the exact monatomic ideal-gas heat capacity. No published melting
 * equation is used: see the phase map.
 */
import { wagner25_5 } from "../models/engineering/wagner-vapor-pressure";
import { engineeringSubstance } from "./engineering-substance";

/** Neon at engineering grade. */
export const neon = engineeringSubstance({
  id: "neon",
  name: "neon",
  formula: "Ne",
  cas: "7440-01-9",
  refrigerant: "R-720",
  aliases: ["R720"],
  atoms: { Ne: 1 },
  tripleTemperature: {
    value: 24.5561,
    source: "its-90",
    note: "defining fixed point of ITS-90 (value from memory of its Table 1); Staveley et al. (1981): 24.5546 K",
  },
  criticalTemperature: {
    value: 44.49,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation (the table's critical row); ±0.1 K (older compilations: 44.4 K)",
  },
  criticalPressure: {
    value: 2.679e6,
    source: "vdi-heat-atlas-2010",
    note: "printed with the PPDS vapour-pressure equation; ±3 % (compilations spread from 2.65 to 2.76 MPa)",
  },
  normalBoilingPoint: {
    value: 27.104,
    source: "crc-handbook-95",
    note: "physical constants of inorganic compounds; ±0.01 K",
  },
  normalMeltingPoint: {
    value: 24.56,
    source: "crc-handbook-95",
    note: "physical constants of inorganic compounds",
  },
  enthalpyOfVaporization: {
    value: 1730.41,
    temperatureK: 27.11,
    source: "vdi-heat-atlas-2010",
    note: "saturation table row at 27.11 K (1.7304 kJ/mol); ±1.3 %: the CRC Handbook (2014) prints 1.71 kJ/mol",
  },
  enthalpyOfFusion: {
    value: 328,
    source: "crc-handbook-95",
    note: "enthalpy of fusion table, 0.328 kJ/mol at the normal melting point, used at the triple point; ±3 %",
  },
  vaporPressure: {
    coefficients: wagner25_5(44.49, 2.679e6, -5.74238, 1.0886, -0.05896, -1.19851),
    source: "vdi-heat-atlas-2010",
    name: "VDI Heat Atlas (2010) D3.1 PPDS vapour-pressure equation (Wagner 2.5-5 form)",
    tMin: 24.55,
    uncertainty:
      "no uncertainty printed; against the Heat Atlas saturation table within 0.3 % from 27.11 K to 43 K (checked in the tests)",
  },
  vaporization: {
    kind: "watson",
    uncertainty:
      "against the Heat Atlas saturation table within 5.1 % from 27.1 K to 43 K (measured in the tests)",
  },
  idealGas: {
    model: { kind: "monatomic" },
    source: "poling-2001",
    name: "monatomic ideal gas, c_p° = 5/2 R (Poling et al. 2001, Appendix A, lists a0 = 2.5)",
    uncertainty: "exact for the ideal gas (electronic excitation negligible below 1000 K)",
  },
  hazards: ["asphyxiant", "cryogenic liquid at 27 K: cold burns"],
  enthalpyChecks:
    "Measured against the VDI Heat Atlas (2010) saturation table from the triple point (or the table's first row) to 0.9 T_c: saturated-liquid heat capacity -1 % to +36 %; saturated-vapour heat capacity down to -23 % (the cubic underestimates the vapour's residual heat capacity near saturation; away from saturation the gas is close to ideal and the error shrinks)",
});
