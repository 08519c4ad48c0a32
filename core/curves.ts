/**
 * Checked evaluation of coexistence curves: range checks with messages that name the range and
 * the source, and inversion T(p) where no published inverse exists.
 */
import { NoSuchStateError, OutOfRangeError, q, type MessagePart } from "./errors";
import { solveBracketed } from "./numerics/roots";
import { citation } from "./sources/bibliography";
import type { CurveBranch } from "./substances/types";

/** Human name of a branch: "boiling curve", "ice Ih melting curve", "sublimation curve". */
export function branchLabel(branch: CurveBranch): string {
  const solid = branch.solid && branch.solid !== "solid" ? `${branch.solid} ` : "";
  return branch.boundary === "boiling" ? "boiling curve" : `${solid}${branch.boundary} curve`;
}

/** Pressure at the low-temperature end of a branch, Pa. */
export function branchPressureAtTMin(branch: CurveBranch): number {
  return branch.pressure(branch.tMin);
}

/** Pressure at the high-temperature end of a branch, Pa. */
export function branchPressureAtTMax(branch: CurveBranch): number {
  return branch.pressure(branch.tMax);
}

/** Lowest and highest pressure along a branch, Pa (branches are monotonic). */
export function branchPressureRange(branch: CurveBranch): readonly [number, number] {
  if (branch.pressureRange) return branch.pressureRange;
  const a = branchPressureAtTMin(branch);
  const b = branchPressureAtTMax(branch);
  return a < b ? [a, b] : [b, a];
}

/** True when T lies inside the branch's temperature range. */
export function branchCoversTemperature(branch: CurveBranch, temperatureK: number): boolean {
  return temperatureK >= branch.tMin && temperatureK <= branch.tMax;
}

/** True when p lies inside the branch's pressure range. */
export function branchCoversPressure(branch: CurveBranch, pressurePa: number): boolean {
  const [low, high] = branchPressureRange(branch);
  return pressurePa >= low && pressurePa <= high;
}

function sourceTag(branch: CurveBranch): string {
  return citation(branch.model.source).short;
}

/** The range part of a message: "(251.165–273.16 K, IAPWS R14-08(2011))". */
export function temperatureRangeParts(branch: CurveBranch): MessagePart[] {
  return ["(", q.T(branch.tMin), " to ", q.T(branch.tMax), `, ${sourceTag(branch)})`];
}

/** The pressure range part of a message. */
export function pressureRangeParts(branch: CurveBranch): MessagePart[] {
  const [low, high] = branchPressureRange(branch);
  return ["(", q.p(low), " to ", q.p(high), `, ${sourceTag(branch)})`];
}

/**
 * Pressure on a branch at temperature T.
 * @throws OutOfRangeError outside the branch's temperature range.
 */
export function pressureOnBranch(branch: CurveBranch, temperatureK: number, substanceName: string): number {
  if (!branchCoversTemperature(branch, temperatureK)) {
    throw new OutOfRangeError([
      "temperature ",
      q.T(temperatureK),
      ` is outside the ${substanceName} ${branchLabel(branch)} `,
      ...temperatureRangeParts(branch),
    ]);
  }
  return branch.pressure(temperatureK);
}

/**
 * Temperature on a branch at pressure p, by the published inverse or by solving p(T) = p.
 * @throws OutOfRangeError outside the branch's pressure range.
 */
export function temperatureOnBranch(branch: CurveBranch, pressurePa: number, substanceName: string): number {
  if (!branchCoversPressure(branch, pressurePa)) {
    throw new OutOfRangeError([
      "pressure ",
      q.p(pressurePa),
      ` is outside the ${substanceName} ${branchLabel(branch)} `,
      ...pressureRangeParts(branch),
    ]);
  }
  if (branch.temperature) return branch.temperature(pressurePa);
  if (pressurePa === branchPressureAtTMin(branch)) return branch.tMin;
  if (pressurePa === branchPressureAtTMax(branch)) return branch.tMax;
  // Solve in ln p: sublimation pressures span tens of decades, and ln p is close to linear in 1/T
  // on every vapour curve, which keeps the bracketed solver on its fast interpolation steps.
  const target = Math.log(pressurePa);
  return solveBracketed((t) => Math.log(branch.pressure(t)) - target, branch.tMin, branch.tMax, {
    relTolerance: Number.EPSILON / 2,
  });
}

/** Error for a quantity that does not exist: used by several curve look-ups. */
export function noSuchState(parts: MessagePart[]): NoSuchStateError {
  return new NoSuchStateError(parts);
}
