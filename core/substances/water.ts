/**
 * Water (H2O), reference grade: IAPWS-IF97 for the boiling curve, IAPWS R14-08(2011) for the
 * sublimation curve of ice Ih and the melting curves of ices Ih, III, V, VI and VII.
 */
import {
  REGION4_P_MAX,
  REGION4_T_MAX,
  saturationPressureIF97,
  saturationTemperatureIF97,
} from "../models/iapws-if97/region4";
import {
  ICE_IH,
  ICE_III,
  ICE_V,
  ICE_VI,
  ICE_VII,
  meltingPressureIceIh,
  meltingPressureIceIII,
  meltingPressureIceV,
  meltingPressureIceVI,
  meltingPressureIceVII,
} from "../models/iapws-r14/melting-pressure";
import {
  SUBLIMATION_T_MAX,
  SUBLIMATION_T_MIN,
  sublimationPressureIceIh,
} from "../models/iapws-r14/sublimation-pressure";
import type { CurveBranch, ModelInfo, SubstanceDefinition } from "./types";
import { waterEnthalpy } from "./water-enthalpy";

/** Triple point, IF97 Eq. (9); the same values are the reducing constants of R14-08 and R10-06. */
const TRIPLE_T = 273.16;
const TRIPLE_P = 611.657;
const STANDARD_ATMOSPHERE = 101325;

const R14_UNCERTAINTY =
  "as stated for each equation in IAPWS R14-08(2011), Secs. 2 and 3 (consult the release for " +
  "the figures); Phasecell reproduces the release's verification values to every printed digit " +
  "and an independent open implementation of the release to 1e-14 relative";

function meltingModel(ice: string, range: string, note: string): ModelInfo {
  return {
    id: `iapws-r14-08-melting-${ice.toLowerCase().replace(/\s+/g, "-")}`,
    name: `IAPWS R14-08(2011) melting-pressure equation of ${ice}`,
    source: "iapws-r14-08",
    grade: "reference",
    validity: range,
    uncertainty: `${R14_UNCERTAINTY}. ${note}`,
  };
}

function meltingBranch(
  solid: string,
  bounds: { readonly tMin: number; readonly tMax: number },
  pressure: (t: number) => number,
  note: string,
): CurveBranch {
  return {
    boundary: "melting",
    solid,
    model: meltingModel(solid, `${bounds.tMin} K to ${bounds.tMax} K`, note),
    tMin: bounds.tMin,
    tMax: bounds.tMax,
    pressure,
    pressureRange: pressureSpan(pressure, bounds.tMin, bounds.tMax),
  };
}

/** Pressures at the two ends of a monotonic branch, low first, evaluated once. */
function pressureSpan(pressure: (t: number) => number, tMin: number, tMax: number): readonly [number, number] {
  const a = pressure(tMin);
  const b = pressure(tMax);
  return a < b ? [a, b] : [b, a];
}

const boiling: CurveBranch = {
  boundary: "boiling",
  model: {
    id: "iapws-if97-region4",
    name: "IAPWS-IF97 region 4: Eq. (30) p_s(T) and its backward Eq. (31) T_s(p)",
    source: "iapws-if97",
    grade: "reference",
    validity:
      "273.16 K (triple point) to 647.096 K (critical point), 611.657 Pa to 22.064 MPa; the " +
      "release allows down to 273.15 K, where liquid is metastable, so Phasecell starts at the " +
      "triple point",
    uncertainty:
      "inconsistency with the IF97 basic equations (IF97 Table 44): |Δp_s/p_s| ≤ 0.0069 % below " +
      "623.15 K and ≤ 0.0026 % up to the critical point; |ΔT_s/T_s| ≤ 0.0006 %. Eq. (31) is the " +
      "exact inverse of Eq. (30)",
  },
  tMin: TRIPLE_T,
  tMax: REGION4_T_MAX,
  pressure: saturationPressureIF97,
  temperature: saturationTemperatureIF97,
  // Eq. (30) at the critical temperature gives 22.064 000 000 32 MPa, a rounding hair above
  // p_c = 22.064 MPa; the range ends there so that SATTEMP(SATPRESSURE(Tc)) returns Tc.
  pressureRange: [TRIPLE_P, Math.max(REGION4_P_MAX, saturationPressureIF97(REGION4_T_MAX))],
};

const sublimation: CurveBranch = {
  boundary: "sublimation",
  solid: "ice Ih",
  model: {
    id: "iapws-r14-08-sublimation",
    name: "IAPWS R14-08(2011) sublimation-pressure equation of ice Ih",
    source: "iapws-r14-08",
    grade: "reference",
    validity: `${SUBLIMATION_T_MIN} K to ${SUBLIMATION_T_MAX} K (triple point)`,
    uncertainty: R14_UNCERTAINTY,
  },
  tMin: SUBLIMATION_T_MIN,
  tMax: SUBLIMATION_T_MAX,
  pressure: sublimationPressureIceIh,
  pressureRange: pressureSpan(sublimationPressureIceIh, SUBLIMATION_T_MIN, SUBLIMATION_T_MAX),
};

const melting: readonly CurveBranch[] = [
  meltingBranch(
    "ice Ih",
    ICE_IH,
    meltingPressureIceIh,
    "The 2011 equation follows from the R10-06 ice Ih and IAPWS-95 equilibrium; the melting " +
      "temperature falls as pressure rises (ice Ih is less dense than the liquid)",
  ),
  meltingBranch("ice III", ICE_III, meltingPressureIceIII, "Adjusted in 2011 to meet the ice Ih curve at 251.165 K"),
  meltingBranch("ice V", ICE_V, meltingPressureIceV, "The 1993 equation, unchanged"),
  meltingBranch("ice VI", ICE_VI, meltingPressureIceVI, "The 1993 equation, unchanged"),
  meltingBranch("ice VII", ICE_VII, meltingPressureIceVII, "The 1993 equation, unchanged"),
];

/** Water at reference grade. */
export const water: SubstanceDefinition = {
  id: "water",
  name: "water",
  formula: "H2O",
  cas: "7732-18-5",
  refrigerant: "R-718",
  aliases: ["water", "H2O", "7732-18-5", "R-718", "R718", "steam", "ice"],
  grade: "reference",
  constants: {
    tripleTemperature: { value: TRIPLE_T, dimension: "temperature", source: "iapws-if97", note: "IF97 Eq. (9)" },
    triplePressure: { value: TRIPLE_P, dimension: "pressure", source: "iapws-if97", note: "IF97 Eq. (9)" },
    criticalTemperature: { value: 647.096, dimension: "temperature", source: "iapws-if97", note: "IF97 Eq. (2)" },
    criticalPressure: { value: 22.064e6, dimension: "pressure", source: "iapws-if97", note: "IF97 Eq. (3)" },
    criticalDensity: { value: 322, dimension: "density", source: "iapws-if97", note: "IF97 Eq. (4)" },
    molarMass: {
      value: 0.018015268,
      dimension: "molarMass",
      source: "iapws-95",
      note: "18.015268 g/mol, IAPWS-95 release",
    },
    normalBoilingPoint: {
      value: saturationTemperatureIF97(STANDARD_ATMOSPHERE),
      dimension: "temperature",
      source: "iapws-if97",
      note: "IF97 Eq. (31) at 101 325 Pa (373.1243 K)",
    },
    normalMeltingPoint: {
      value: 273.152519,
      dimension: "temperature",
      source: "iapws-r10-06",
      note: "R10-06(2009) Table 6, state at 101 325 Pa on the ice Ih melting curve of R14-08",
    },
    acentricFactor: {
      // Pitzer's definition ω = −log10(p_s(0.7 T_c) / p_c) − 1 evaluated with IF97 Eq. (30).
      value: -Math.log10(saturationPressureIF97(0.7 * 647.096) / 22.064e6) - 1,
      dimension: "dimensionless",
      source: "iapws-if97",
      note: "computed: −log10(p_s(0.7 T_c) / p_c) − 1 (Pitzer et al. 1955) with IF97 Eq. (30) (0.3443)",
    },
    enthalpyOfFusion: {
      value:
        waterEnthalpy.enthalpy("liquid", TRIPLE_T, TRIPLE_P, "") -
        waterEnthalpy.enthalpy("solid", TRIPLE_T, TRIPLE_P, "ice Ih"),
      dimension: "specificEnergy",
      source: "iapws-r10-06",
      note: "computed at the triple point: IF97 region 1 liquid minus R10-06(2009) ice Ih, on their shared zero",
    },
    enthalpyOfVaporization: {
      value:
        waterEnthalpy.enthalpy("vapor", saturationTemperatureIF97(STANDARD_ATMOSPHERE), STANDARD_ATMOSPHERE, "") -
        waterEnthalpy.enthalpy("liquid", saturationTemperatureIF97(STANDARD_ATMOSPHERE), STANDARD_ATMOSPHERE, ""),
      dimension: "specificEnergy",
      source: "iapws-if97",
      note: "computed at 101 325 Pa on the IF97 boiling curve: region 2 vapour minus region 1 liquid",
    },
  },
  curves: { boiling, sublimation, melting },
  stateModel: {
    id: "water-phase-map",
    name:
      "Phase map from the IAPWS-IF97 boiling curve and the IAPWS R14-08(2011) melting and " +
      "sublimation curves",
    source: "iapws-r14-08",
    grade: "reference",
    validity:
      "Temperatures above 0 K up to 2273.15 K (the IF97 limit); pressures above 0 Pa up to the " +
      "ice VII melting pressure at 715 K (20.6 GPa); states below 50 K at pressures under the " +
      "ice Ih sublimation pressure at 50 K (1.9e-40 Pa) are not covered",
    uncertainty:
      "Exact to the published curves. Which ice is present far below the melting curve is an " +
      "approximation: no IAPWS equation gives the solid–solid boundaries, so each ice is named " +
      "by the pressure band between the liquid triple points (Ih up to 208.566 MPa, III to " +
      "350.1 MPa, V to 632.4 MPa, VI to 2216 MPa, VII above), extended at constant pressure to " +
      "low temperature. This is exact at the melting curve and does not resolve ice II, VIII, " +
      "XI or other forms bounded only by solids. 'solid' without detail is exact",
  },
  limits: { tMax: 2273.15, tMaxSource: "iapws-if97" },
  referenceState:
    "IAPWS: internal energy and entropy of the saturated liquid at the triple point are zero",
  enthalpy: waterEnthalpy,
  hazards: [
    "steam and hot water scald; hot water let down to a lower pressure flashes to steam",
    "liquid trapped between closed valves and heated builds pressure fast",
  ],
};
