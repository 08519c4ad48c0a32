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

/**
 * Relative slack at the ends of every range. Converting a user's value to SI rounds it
 * (0.01 °C becomes 273.159 999 999 999 97 K, not the triple point's 273.16 K); a value within
 * this slack of a range end is taken as that end, never as outside the range.
 */
export const EDGE_TOLERANCE = 1e-12;

/** x ≤ limit, allowing the rounding slack of {@link EDGE_TOLERANCE}. */
export function atMost(x: number, limit: number): boolean {
  return x <= limit + Math.abs(limit) * EDGE_TOLERANCE;
}

/** x ≥ limit, allowing the rounding slack of {@link EDGE_TOLERANCE}. */
export function atLeast(x: number, limit: number): boolean {
  return x >= limit - Math.abs(limit) * EDGE_TOLERANCE;
}

/** True when T lies inside the branch's temperature range. */
export function branchCoversTemperature(branch: CurveBranch, temperatureK: number): boolean {
  return atLeast(temperatureK, branch.tMin) && atMost(temperatureK, branch.tMax);
}

/** True when p lies inside the branch's pressure range. */
export function branchCoversPressure(branch: CurveBranch, pressurePa: number): boolean {
  const [low, high] = branchPressureRange(branch);
  return atLeast(pressurePa, low) && atMost(pressurePa, high);
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
  const atTMin = branchPressureAtTMin(branch);
  const atTMax = branchPressureAtTMax(branch);
  // At or past an end (within the rounding slack the range check allowed), the end itself: the
  // solver needs a sign change inside the bracket.
  const rising = atTMax > atTMin;
  if (pressurePa <= Math.min(atTMin, atTMax)) return rising ? branch.tMin : branch.tMax;
  if (pressurePa >= Math.max(atTMin, atTMax)) return rising ? branch.tMax : branch.tMin;
  // Vapour curves are solved in ln p: sublimation pressures span tens of decades and ln p is close
  // to linear in 1/T there. Melting curves are close to linear in p itself (ice Ih: ln p runs from
  // 6.4 to 19 over 22 K while p is nearly a straight line), which keeps the solver on its fast
  // interpolation steps.
  if (branch.boundary === "melting") {
    return solveBracketed((t) => branch.pressure(t) - pressurePa, branch.tMin, branch.tMax, {
      relTolerance: Number.EPSILON / 2,
    });
  }
  const target = Math.log(pressurePa);
  return solveBracketed((t) => Math.log(branch.pressure(t)) - target, branch.tMin, branch.tMax, {
    relTolerance: Number.EPSILON / 2,
  });
}

/** Error for a quantity that does not exist: used by several curve look-ups. */
export function noSuchState(parts: MessagePart[]): NoSuchStateError {
  return new NoSuchStateError(parts);
}
