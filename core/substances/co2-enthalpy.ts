/**
 * Specific enthalpy of carbon dioxide's phases on the reference state of Span and Wagner (1996)
 * (h = 0 and s = 0 for the ideal gas at 298.15 K and 0.101325 MPa): their equation of state for
 * liquid, vapour, gas and supercritical fluid, and the Gibbs-energy equation of Jäger and Span
 * (2012) for the solid (dry ice), shifted onto the same zero with the enthalpy of melting at the
 * triple point. Enthalpies of solid and fluid therefore subtract directly, and latent heats are
 * differences.
 */
import { NoSuchStateError, OutOfRangeError, q } from "../errors";
import { solidCO2 } from "../models/jager-span-2012/solid-co2";
import { enthalpyOnSide } from "../models/span-wagner-1996/density";
import {
  SW96_MOLAR_MASS,
  SW96_P_MAX,
  SW96_T_MAX,
  SW96_TRIPLE_PRESSURE,
  SW96_TRIPLE_TEMPERATURE,
} from "../models/span-wagner-1996/fixed-points";
import { MELTING_T_AT_800_MPA } from "../models/span-wagner-1996/melting-pressure";
import { SUBLIMATION_T_MIN, sublimationPressure } from "../models/span-wagner-1996/sublimation-pressure";
import type { EnthalpyModel, ModelInfo, PhaseSide } from "./types";

/** The name of CO2's solid in the phase map and in path steps. */
export const CO2_SOLID = "dry ice";

/**
 * Enthalpy of melting of CO2 at the triple point, J/mol: the value with which Jäger and Span
 * (2012) tie their solid equation to the fluid equation of Span and Wagner (1996). In J/kg it is
 * 8875 / 0.0440098 = 201659.7 J/kg (molar mass of Span and Wagner).
 */
export const CO2_FUSION_ENTHALPY_AT_TRIPLE_POINT_MOLAR = 8875;

/**
 * Lowest temperature of the solid equation in Phasecell, K: the lowest state of the check values
 * of Jäger and Span (2012), Table 5 (100 K, 100 MPa).
 */
export const CO2_SOLID_T_MIN = 100;

/**
 * How far above the sublimation pressure a vapour below the triple-point temperature may be asked
 * for (relative): enough for the rounding of a sublimation temperature solved from a pressure,
 * not for supersaturated vapour, which Phasecell does not offer.
 */
const SUBLIMATION_PRESSURE_SLACK = 1e-6;

const fluidModel: ModelInfo = {
  id: "span-wagner-1996-eos",
  name:
    "Span–Wagner (1996) reference equation of state for CO2, explicit in the Helmholtz energy " +
    "(ideal part Table 27, residual part Table 31, 42 terms including the non-analytic terms), " +
    "density solved from p(rho, T) on the side of the phase map",
  source: "span-wagner-1996",
  grade: "reference",
  validity: "216.592 K (triple point) to 1100 K, up to 800 MPa",
  uncertainty:
    "paper's abstract, up to 30 MPa and 523 K: density ±0.03 % to ±0.05 %, speed of sound ±0.03 % " +
    "to ±1 %, isobaric heat capacity ±0.15 % to ±1.5 %; the figures for enthalpy and the rest of " +
    "the range are in the paper (not transcribed). Phasecell reproduces the paper's single-phase " +
    "property values to every printed digit. Within 0.2 mK of the critical temperature a liquid " +
    "on the ancillary boiling curve is taken at the end of the equation's liquid branch, at most " +
    "0.05 Pa from the pressure asked for",
};

const vaporBelowTripleModel: ModelInfo = {
  id: "span-wagner-1996-vapor-below-triple",
  name: "Span–Wagner (1996) equation of state for dilute vapour below the triple-point temperature",
  source: "span-wagner-1996",
  grade: "reference",
  validity: `vapour over dry ice from ${SUBLIMATION_T_MIN} K to 216.592 K, at or below the sublimation pressure`,
  uncertainty:
    "extrapolation below the paper's range, checked as follows: the vapour there is nearly " +
    "ideal (compression factor 0.91 to 1) " +
    "and the ideal-gas heat capacity of Table 27 matches NIST-JANAF (1998) within 0.01 % at " +
    "200 K. Checked through the sublimation enthalpy at 194.7 K against the calorimetry of " +
    "Giauque and Egan (1937): within 0.1 %",
};

const solidModel: ModelInfo = {
  id: "jager-span-2012-solid",
  name:
    "Jäger–Span (2012) Gibbs-energy equation of state for solid CO2, shifted onto the Span–Wagner " +
    "reference state with the enthalpy of melting at the triple point, 8875 J/mol",
  source: "jager-span-2012",
  grade: "reference",
  validity: `dry ice from ${CO2_SOLID_T_MIN} K up to the sublimation and melting curves, up to 800 MPa`,
  uncertainty:
    "as stated in the paper (not transcribed); reproduces its Table 5 check values to every " +
    "printed digit. Enthalpy of melting at the triple point 8875 J/mol (201.66 kJ/kg); the CRC " +
    "Handbook gives 9.02 kJ/mol (1.6 % higher), and the Clapeyron equation with the slope of the " +
    "melting curve gives 8.97 kJ/mol; the sublimation enthalpy at 194.7 K agrees with Giauque and " +
    "Egan (1937) within 0.1 %",
};

/** J/mol to J/kg with the molar mass of Span and Wagner (1996). */
function perKilogram(molar: number): number {
  return molar / SW96_MOLAR_MASS;
}

/**
 * Shift from the solid equation's own zero to the reference state of Span and Wagner, J/kg:
 * h_solid(T_t, p_t) = h_liquid(T_t, p_t) − Δh_melt(T_t), with the liquid from the fluid equation
 * at the paper's triple point (0.51795 MPa, 14 Pa below the equation's own saturation pressure
 * there, which changes the liquid enthalpy by less than 0.02 J/kg).
 */
const SOLID_OFFSET =
  enthalpyOnSide(SW96_TRIPLE_TEMPERATURE, SW96_TRIPLE_PRESSURE, "liquid") -
  perKilogram(CO2_FUSION_ENTHALPY_AT_TRIPLE_POINT_MOLAR) -
  perKilogram(solidCO2(SW96_TRIPLE_TEMPERATURE, SW96_TRIPLE_PRESSURE).enthalpy);

function outOfRange(what: string, temperatureK: number, pressurePa: number, why: string): OutOfRangeError {
  return new OutOfRangeError([`${what} at `, q.T(temperatureK), " and ", q.p(pressurePa), ` is outside ${why}`]);
}

function checkFluidLimits(temperatureK: number, pressurePa: number): void {
  if (pressurePa > SW96_P_MAX) {
    throw outOfRange("carbon dioxide", temperatureK, pressurePa, "the range of Span and Wagner (1996): up to 800 MPa");
  }
  if (temperatureK > SW96_T_MAX) {
    throw outOfRange("carbon dioxide", temperatureK, pressurePa, "the range of Span and Wagner (1996): up to 1100 K");
  }
}

function solidEnthalpy(temperatureK: number, pressurePa: number, solid: string): number {
  if (solid !== CO2_SOLID && solid !== "solid") {
    throw new NoSuchStateError([`no enthalpy model for ${solid}: the only solid form of carbon dioxide covered is dry ice`]);
  }
  if (temperatureK < CO2_SOLID_T_MIN || temperatureK > MELTING_T_AT_800_MPA) {
    throw outOfRange(
      "dry ice",
      temperatureK,
      pressurePa,
      `the range Phasecell uses for the solid equation of Jäger and Span (2012): ${CO2_SOLID_T_MIN} K up to the melting curve`,
    );
  }
  return perKilogram(solidCO2(temperatureK, pressurePa).enthalpy) + SOLID_OFFSET;
}

function liquidEnthalpy(temperatureK: number, pressurePa: number): number {
  if (temperatureK < SW96_TRIPLE_TEMPERATURE) {
    throw outOfRange(
      "liquid carbon dioxide",
      temperatureK,
      pressurePa,
      "the range of Span and Wagner (1996), which starts at the triple point (216.592 K); " +
        "the liquid is not stable below it",
    );
  }
  return enthalpyOnSide(temperatureK, pressurePa, "liquid");
}

function vaporEnthalpy(temperatureK: number, pressurePa: number): number {
  if (temperatureK < SW96_TRIPLE_TEMPERATURE) {
    if (temperatureK < SUBLIMATION_T_MIN) {
      throw outOfRange(
        "carbon dioxide vapour",
        temperatureK,
        pressurePa,
        `the range Phasecell uses below the triple point (down to ${SUBLIMATION_T_MIN} K, ` +
          "the lowest temperature of its sublimation curve)",
      );
    }
    const sublimationPa = sublimationPressure(temperatureK);
    if (pressurePa > sublimationPa * (1 + SUBLIMATION_PRESSURE_SLACK)) {
      throw new NoSuchStateError([
        "no carbon dioxide vapour at ",
        q.T(temperatureK),
        " and ",
        q.p(pressurePa),
        ": above the sublimation pressure (",
        q.p(sublimationPa),
        ") the stable phase is dry ice",
      ]);
    }
  }
  return enthalpyOnSide(temperatureK, pressurePa, "vapor");
}

/** Carbon dioxide's enthalpy model. */
export const co2Enthalpy: EnthalpyModel = {
  models: [fluidModel, vaporBelowTripleModel, solidModel],
  temperatureLimits(pressurePa: number): readonly [number, number] {
    // Below the sublimation pressure at the curve's lowest temperature only vapour is covered,
    // and only from that temperature up; above it the solid reaches down to its own limit.
    return [pressurePa < sublimationPressure(SUBLIMATION_T_MIN) ? SUBLIMATION_T_MIN : CO2_SOLID_T_MIN, SW96_T_MAX];
  },
  enthalpy(side: PhaseSide, temperatureK: number, pressurePa: number, solid: string): number {
    checkFluidLimits(temperatureK, pressurePa);
    if (side === "solid") return solidEnthalpy(temperatureK, pressurePa, solid);
    if (side === "liquid") return liquidEnthalpy(temperatureK, pressurePa);
    return vaporEnthalpy(temperatureK, pressurePa);
  },
};
