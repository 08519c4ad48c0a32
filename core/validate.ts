/**
 * Checks at the door of the core: every SI input is finite and physically possible before any
 * correlation sees it.
 */
import { BadInputError, OutOfRangeError, q } from "./errors";
import { citation } from "./sources/bibliography";
import type { SubstanceDefinition } from "./substances/types";

/** Rejects non-finite temperatures and those at or below absolute zero. */
export function checkTemperature(temperatureK: number, what = "temperature"): void {
  if (!Number.isFinite(temperatureK)) throw new BadInputError([`${what} is not a finite number`]);
  if (temperatureK <= 0) {
    throw new BadInputError([
      `${what} `,
      q.T(temperatureK),
      " is at or below absolute zero: enter a temperature above 0 K (-273.15 °C, -459.67 °F)",
    ]);
  }
}

/** Rejects non-finite and non-positive absolute pressures. */
export function checkPressure(pressurePa: number, what = "pressure"): void {
  if (!Number.isFinite(pressurePa)) throw new BadInputError([`${what} is not a finite number`]);
  if (pressurePa <= 0) {
    throw new BadInputError([
      `${what} `,
      q.p(pressurePa),
      " is not above zero (absolute): enter an absolute pressure above 0 (an empty cell reads as 0; " +
        "gauge units such as barg count from 101.325 kPa)",
    ]);
  }
}

/** Rejects temperatures above the highest any model of the substance covers. */
export function checkTemperatureCoverage(substance: SubstanceDefinition, temperatureK: number): void {
  if (temperatureK > substance.limits.tMax) {
    throw new OutOfRangeError([
      "temperature ",
      q.T(temperatureK),
      ` is above the highest temperature covered for ${substance.name} (`,
      q.T(substance.limits.tMax),
      `, ${citation(substance.limits.tMaxSource).short})`,
    ]);
  }
}
