/**
 * Carbon dioxide (CO2), reference grade: the ancillary equations of Span and Wagner (1996) for
 * the boiling (vapour-pressure), sublimation and melting curves; their Helmholtz equation of
 * state for fluid enthalpy; the Gibbs-energy equation of Jäger and Span (2012) for dry ice.
 *
 * CO2 has no normal boiling point: its triple-point pressure (0.51795 MPa, 5.18 bar) is above
 * one atmosphere, so at 101.325 kPa the solid sublimes (at 194.686 K) and liquid CO2 exists only
 * under pressure.
 */
import { temperatureOnBranch } from "../curves";
import {
  SW96_CRITICAL_DENSITY,
  SW96_CRITICAL_PRESSURE,
  SW96_CRITICAL_TEMPERATURE,
  SW96_MOLAR_MASS,
  SW96_P_MAX,
  SW96_T_MAX,
  SW96_TRIPLE_PRESSURE,
  SW96_TRIPLE_TEMPERATURE,
} from "../models/span-wagner-1996/fixed-points";
import {
  MELTING_T_AT_800_MPA,
  MELTING_T_MIN,
  meltingPressure,
  meltingTemperature,
} from "../models/span-wagner-1996/melting-pressure";
import {
  SUBLIMATION_T_MAX,
  SUBLIMATION_T_MIN,
  sublimationPressure,
} from "../models/span-wagner-1996/sublimation-pressure";
import {
  VAPOR_PRESSURE_AT_T_MIN,
  VAPOR_PRESSURE_T_MAX,
  VAPOR_PRESSURE_T_MIN,
  vaporPressure,
  vaporPressureTemperature,
} from "../models/span-wagner-1996/vapor-pressure";
import { CO2_FUSION_ENTHALPY_AT_TRIPLE_POINT_MOLAR, CO2_SOLID, co2Enthalpy } from "./co2-enthalpy";
import type { ConstantValue, CurveBranch, SubstanceDefinition } from "./types";

const STANDARD_ATMOSPHERE = 101325;

const ANCILLARY_UNCERTAINTY =
  "stated in Span and Wagner (1996) for each ancillary equation (not transcribed here)";

/**
 * Boiling temperature at p: the inverse of Eq. (3.13) solved numerically. Eq. (3.13) gives
 * 0.5179618 MPa at the triple-point temperature, 11.8 Pa above the paper's triple-point pressure;
 * a pressure in that sliver boils at the triple-point temperature, which is exact to the
 * mismatch of the two published values (0.0023 %).
 */
function boilingTemperature(pressurePa: number): number {
  return pressurePa <= VAPOR_PRESSURE_AT_T_MIN ? VAPOR_PRESSURE_T_MIN : vaporPressureTemperature(pressurePa);
}

const boiling: CurveBranch = {
  boundary: "boiling",
  model: {
    id: "span-wagner-1996-vapor-pressure",
    name: "Span–Wagner (1996) ancillary vapour-pressure equation, Eq. (3.13), and its numerical inverse",
    source: "span-wagner-1996",
    grade: "reference",
    validity:
      "216.592 K (triple point) to 304.1282 K (critical point), 0.51795 MPa to 7.3773 MPa; Eq. (3.13) " +
      "gives 0.5179618 MPa at the triple-point temperature, and pressures between the paper's " +
      "triple-point pressure and that value boil at the triple-point temperature",
    uncertainty:
      `${ANCILLARY_UNCERTAINTY}. It differs from the pressures of the paper's saturation table by ` +
      "at most 146 Pa (0.0039 %) and from the phase equilibrium of the paper's equation of state by " +
      "−0.0042 % to +0.0025 % (at most 141 Pa) from the triple point to 304 K",
  },
  tMin: VAPOR_PRESSURE_T_MIN,
  tMax: VAPOR_PRESSURE_T_MAX,
  pressure: vaporPressure,
  temperature: boilingTemperature,
  // Eq. (3.13) is reduced by p_c, so it ends at 7.3773 MPa exactly; it starts from the triple-point
  // pressure of the paper so that no pressure between p_t and p_c falls outside every curve.
  pressureRange: [SW96_TRIPLE_PRESSURE, SW96_CRITICAL_PRESSURE],
};

const sublimation: CurveBranch = {
  boundary: "sublimation",
  solid: CO2_SOLID,
  model: {
    id: "span-wagner-1996-sublimation",
    name: "Span–Wagner (1996) ancillary sublimation-pressure equation, Eq. (3.12)",
    source: "span-wagner-1996",
    grade: "reference",
    validity:
      `${SUBLIMATION_T_MIN} K to 216.592 K (triple point); the paper's lower limit is not ` +
      `transcribed, and Phasecell starts at ${SUBLIMATION_T_MIN} K, the lowest temperature of the ` +
      "measurements of Giauque and Egan (1937) it was checked against",
    uncertainty:
      `${ANCILLARY_UNCERTAINTY}. It agrees with the vapour-pressure equation of Giauque and Egan ` +
      "(J. Chem. Phys. 5, 45, 1937) within 0.2 % from 160 K to 196 K (0.9 % at 154 K), and gives " +
      "the normal sublimation point as 194.6855 K against 194.6857 K of Bedford et al. (Metrologia " +
      "20, 1984)",
  },
  tMin: SUBLIMATION_T_MIN,
  tMax: SUBLIMATION_T_MAX,
  pressure: sublimationPressure,
  pressureRange: [sublimationPressure(SUBLIMATION_T_MIN), SW96_TRIPLE_PRESSURE],
};

const melting: readonly CurveBranch[] = [
  {
    boundary: "melting",
    solid: CO2_SOLID,
    model: {
      id: "span-wagner-1996-melting",
      name: "Span–Wagner (1996) ancillary melting-pressure equation, Eq. (3.10), and its algebraic inverse",
      source: "span-wagner-1996",
      grade: "reference",
      validity:
        `216.592 K (triple point) to ${MELTING_T_AT_800_MPA.toFixed(3)} K, where it reaches 800 MPa, ` +
        "the upper pressure limit of the paper's equation of state; the paper's own upper limit for " +
        "Eq. (3.10) is not transcribed",
      uncertainty:
        `${ANCILLARY_UNCERTAINTY}. It agrees with the melting pressures measured by Michels et al. ` +
        "(Physica 9, 1942) within 0.2 % at 217 K to 266 K. The melting temperature rises " +
        "with pressure (about 4.68 MPa/K at the triple point): dry ice is denser than the liquid",
    },
    tMin: MELTING_T_MIN,
    tMax: MELTING_T_AT_800_MPA,
    pressure: meltingPressure,
    temperature: meltingTemperature,
    pressureRange: [SW96_TRIPLE_PRESSURE, SW96_P_MAX],
  },
];

/**
 * The normal sublimation point, K: Eq. (3.12) solved at 101.325 kPa.
 */
export const CO2_NORMAL_SUBLIMATION_POINT: ConstantValue = {
  value: temperatureOnBranch(sublimation, STANDARD_ATMOSPHERE, "carbon dioxide"),
  dimension: "temperature",
  source: "span-wagner-1996",
  note: "computed: Eq. (3.12) solved at 101 325 Pa (194.6855 K); Bedford et al. (1984) give 194.6857 K",
};

const constants: SubstanceDefinition["constants"] = {
  normalSublimationPoint: CO2_NORMAL_SUBLIMATION_POINT,
  tripleTemperature: {
    value: SW96_TRIPLE_TEMPERATURE,
    dimension: "temperature",
    source: "span-wagner-1996",
    note: "Span & Wagner (1996): 216.592 K; Staveley et al. (1981) give 216.589 K",
  },
  triplePressure: {
    value: SW96_TRIPLE_PRESSURE,
    dimension: "pressure",
    source: "span-wagner-1996",
    note: "Span & Wagner (1996): 0.51795 MPa (5.18 bar, above 1 atm, so CO2 sublimes at atmospheric pressure)",
  },
  criticalTemperature: {
    value: SW96_CRITICAL_TEMPERATURE,
    dimension: "temperature",
    source: "span-wagner-1996",
    note: "Span & Wagner (1996): 304.1282 K",
  },
  criticalPressure: {
    value: SW96_CRITICAL_PRESSURE,
    dimension: "pressure",
    source: "span-wagner-1996",
    note: "Span & Wagner (1996): 7.3773 MPa",
  },
  criticalDensity: {
    value: SW96_CRITICAL_DENSITY,
    dimension: "density",
    source: "span-wagner-1996",
    note: "Span & Wagner (1996): 467.6 kg/m³, the reducing density of the equation of state",
  },
  molarMass: {
    value: SW96_MOLAR_MASS,
    dimension: "molarMass",
    source: "span-wagner-1996",
    note: "44.0098 g/mol as used by Span & Wagner (1996); IUPAC 2007 atomic weights give 44.0095 g/mol",
  },
  enthalpyOfFusion: {
    value: CO2_FUSION_ENTHALPY_AT_TRIPLE_POINT_MOLAR / SW96_MOLAR_MASS,
    dimension: "specificEnergy",
    source: "jager-span-2012",
    note:
      "8875 J/mol at the triple point, the value Jäger & Span (2012) use to join dry ice to the " +
      "Span–Wagner fluid (201.66 kJ/kg with M = 44.0098 g/mol); the CRC Handbook gives 9.02 kJ/mol",
  },
  acentricFactor: {
    // Pitzer's definition ω = −log10(p_s(0.7 T_c)/p_c) − 1 with Eq. (3.13); 0.7 T_c = 212.89 K is
    // 3.7 K below the triple point, where the liquid is metastable.
    value: -Math.log10(vaporPressure(0.7 * SW96_CRITICAL_TEMPERATURE) / SW96_CRITICAL_PRESSURE) - 1,
    dimension: "dimensionless",
    source: "span-wagner-1996",
    note:
      "computed: −log10(p_s(0.7 T_c)/p_c) − 1 (Pitzer et al. 1955) with Eq. (3.13) evaluated 3.7 K " +
      "below its range, at 212.89 K (0.2249)",
  },
};

/** Carbon dioxide at reference grade. */
export const co2: SubstanceDefinition = {
  id: "co2",
  name: "carbon dioxide",
  formula: "CO2",
  cas: "124-38-9",
  refrigerant: "R-744",
  aliases: ["carbon dioxide", "CO2", "124-38-9", "R-744", "R744", "dry ice", "carbonic anhydride"],
  grade: "reference",
  constants,
  curves: { boiling, sublimation, melting },
  stateModel: {
    id: "co2-phase-map",
    name:
      "Phase map from the Span–Wagner (1996) ancillary vapour-pressure, sublimation-pressure and " +
      "melting-pressure equations, Eqs. (3.13), (3.12) and (3.10)",
    source: "span-wagner-1996",
    grade: "reference",
    validity:
      `Temperatures above 0 K up to 1100 K (the limit of the equation of state); pressures above 0 ` +
      `up to 800 MPa; states below ${SUBLIMATION_T_MIN} K are covered only above the sublimation ` +
      `pressure there (1.46 kPa), where they are solid`,
    uncertainty:
      "Exact to the published ancillary curves. No boiling at 1 atm: the triple-point pressure is " +
      "0.51795 MPa (5.18 bar), so below it the solid sublimes (at 194.686 K at 101.325 kPa) and " +
      "liquid exists only between the triple-point and melting pressures. One solid form, dry " +
      "ice, is assumed up to 800 MPa (no other solid borders the fluid there, from memory). The " +
      "ancillary boiling curve lies within 0.0042 % of the equation of state's own phase " +
      "equilibrium, so a state within that sliver of the curve may be named by the other fluid " +
      "phase; its enthalpy is then that of the slightly metastable phase named",
  },
  limits: { tMax: SW96_T_MAX, tMaxSource: "span-wagner-1996" },
  referenceState:
    "Span & Wagner (1996): specific enthalpy h = 0 and entropy s = 0 for the ideal gas at " +
    "298.15 K and 0.101325 MPa; dry ice (Jäger & Span 2012) is placed on the same zero through " +
    "the enthalpy of melting at the triple point, 8875 J/mol",
  enthalpy: co2Enthalpy,
  hazards: [
    "asphyxiant, heavier than air: collects in pits, cellars and low rooms",
    "dry ice sublimes to about 500 times its volume of gas: never seal it in a closed container or a small unventilated space",
    "dry ice at -78.5 °C and liquid released from pressure cause cold burns; liquid let down below 5.18 bar turns to solid and gas",
  ],
};
