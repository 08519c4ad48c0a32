/**
 * Helium-4 (He), engineering grade: the ITS-90 helium-4 vapour-pressure equations for the
 * boiling curve, Mathews (1972) critical constants, CRC Handbook (2014) normal boiling point and
 * enthalpy of vaporization.
 *
 * Helium-4 has no solid–liquid–vapour triple point: its liquid does not freeze under its own
 * vapour pressure, however cold, and the solid exists only above about 2.5 MPa. Phasecell has no
 * published melting curve for it, so STATE answers only where helium is certainly fluid (below
 * 2.5 MPa, or warmer than a bound on the melting line) and says so elsewhere. Between 5.0 K (the
 * top of the ITS-90 equation) and the critical temperature the boiling curve is not covered. No
 * enthalpy model: path energies and latent heats need a triple point in Phasecell's path engine.
 */
import {
  ITS90_HE4_T_MAX,
  ITS90_HE4_T_MIN,
  its90HeliumPressure,
  its90HeliumTemperature,
} from "../models/engineering/its90-helium-vapor-pressure";
import { molarMassOf } from "./atomic-weights";
import { MELTING_SLOPE_BOUND } from "./engineering-substance";
import type { SubstanceDefinition } from "./types";

const CRITICAL_K = 5.1889;
const CRITICAL_PA = 226968;
const MOLAR_MASS = molarMassOf({ He: 1 });

/** Pitzer's ω = −log10(p_s(0.7 T_c) / p_c) − 1 with the ITS-90 equation and Mathews' p_c. */
const OMEGA = -Math.log10(its90HeliumPressure(0.7 * CRITICAL_K) / CRITICAL_PA) - 1;

const P_LOW = its90HeliumPressure(ITS90_HE4_T_MIN);
const P_HIGH = its90HeliumPressure(ITS90_HE4_T_MAX);

/** Helium-4 at engineering grade. */
export const helium: SubstanceDefinition = {
  id: "helium",
  name: "helium-4",
  formula: "He",
  cas: "7440-59-7",
  refrigerant: "R-704",
  aliases: ["helium-4", "He", "7440-59-7", "R-704", "helium", "He-4", "4He", "R704", "LHe"],
  grade: "engineering",
  constants: {
    criticalTemperature: {
      value: CRITICAL_K,
      dimension: "temperature",
      source: "mathews-1972",
      note: "±0.01 K (a reference-equation value is 5.1953 K, from memory)",
    },
    criticalPressure: {
      value: CRITICAL_PA,
      dimension: "pressure",
      source: "mathews-1972",
      note: "0.22697 MPa; ±0.3 % (a reference-equation value is 0.22746 MPa, from memory)",
    },
    criticalDensity: {
      value: 69.9,
      dimension: "density",
      source: "mathews-1972",
      note: "4.0026 g/mol over V_c = 57.3 cm³/mol; ±1 %",
    },
    normalBoilingPoint: {
      value: 4.222,
      dimension: "temperature",
      source: "crc-handbook-95",
      note: "physical constants of inorganic compounds; the ITS-90 equation gives 4.2221 K at 101.325 kPa",
    },
    molarMass: {
      value: MOLAR_MASS,
      dimension: "molarMass",
      source: "iupac-atomic-weights-2007",
      note: "standard atomic weight 2007 of helium (4.002602 g/mol)",
    },
    acentricFactor: {
      value: OMEGA,
      dimension: "dimensionless",
      source: "its-90",
      note:
        `computed: ω = −log10(p_s(0.7 T_c) / p_c) − 1 (Pitzer et al. 1955) with the ITS-90 equation and ` +
        `Mathews' p_c (${OMEGA.toFixed(4)})`,
    },
    enthalpyOfVaporization: {
      value: 80 / MOLAR_MASS,
      dimension: "specificEnergy",
      source: "crc-handbook-95",
      note: "80 J/mol at 4.222 K; enthalpy of vaporization table (0.08 kJ/mol printed, ±6 %)",
    },
  },
  curves: {
    boiling: {
      boundary: "boiling",
      model: {
        id: "helium-its90-vapor-pressure",
        name: "ITS-90 helium-4 vapour-pressure equations, Preston-Thomas (1990) Eq. (3) with Table 3 (two ranges meeting at the lambda point, 2.1768 K)",
        source: "its-90",
        grade: "engineering",
        validity:
          `${ITS90_HE4_T_MIN} K to ${ITS90_HE4_T_MAX} K (${Math.round(P_LOW)} Pa to ${Math.round(P_HIGH)} Pa); ` +
          `not from 5.0 K to the critical temperature ${CRITICAL_K} K, which no equation in Phasecell's sources covers`,
        uncertainty:
          "the equations define the ITS-90 temperature; against real helium-4 they hold to the " +
          "scale's realisation, about 0.1 mK (from memory); Perry's Handbook (2008) Table 2-8 " +
          "equation agrees within 1 % (checked in the tests)",
      },
      tMin: ITS90_HE4_T_MIN,
      tMax: ITS90_HE4_T_MAX,
      pressure: its90HeliumPressure,
      temperature: its90HeliumTemperature,
      pressureRange: [P_LOW, P_HIGH],
    },
    melting: [],
  },
  meltingBound: {
    anchorK: 1.762,
    anchorPa: 3.0119e6,
    maxSlope: MELTING_SLOPE_BOUND,
    solidBelowAnchor: false,
    fluidBelowPa: 2.5e6,
    basis:
      "from memory, common knowledge in cryogenics: solid helium-4 needs at least about 2.5 MPa, " +
      "and its melting line passes the upper lambda point, 1.762 K at 3.0119 MPa, then rises by " +
      "about 0.2 K/MPa; Phasecell assumes at most 1 K/MPa above that point",
  },
  noTriplePoint:
    "its liquid does not freeze under its own vapour pressure at any temperature; the solid " +
    "exists only above about 2.5 MPa (the two lambda points are triple points between the " +
    "liquids He I and He II, not with the solid and vapour together)",
  stateModel: {
    id: "helium-phase-map",
    name:
      "Phase map from the ITS-90 helium-4 boiling curve and the Mathews (1972) critical point; no " +
      "solid: below 2.5 MPa helium-4 is always fluid, and above it Phasecell calls it fluid only " +
      "warmer than 1.762 K + 1 K/MPa × (p − 3.0119 MPa)",
    source: "its-90",
    grade: "engineering",
    validity:
      "from 1.25 K up to 1000 K; liquid and vapour from 1.25 K to 5.0 K; gas and supercritical " +
      "fluid above the critical temperature; not between 5.0 K and the critical temperature near " +
      "the saturation pressure, and never in the solid (no melting curve)",
    uncertainty:
      "as the boiling curve; 'liquid' includes both helium I and the superfluid helium II (the " +
      "lambda line is not modelled)",
  },
  limits: { tMax: 1000, tMaxSource: "mathews-1972" },
  referenceState: "no enthalpy model: helium-4 has no triple point, which Phasecell's path engine needs",
  hazards: [
    "asphyxiant",
    "liquid at 4.2 K: cold burns, condenses and freezes air on cold surfaces; about 750 times its liquid volume as gas",
  ],
};
