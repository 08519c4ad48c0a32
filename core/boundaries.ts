/**
 * Distances to and slopes of phase boundaries, and the phase changes met along a straight path in
 * the (T, p) plane. Built on the curve look-ups of core/phase; no enthalpy needed.
 */
import { atLeast, atMost, branchCoversTemperature, branchLabel } from "./curves";
import { BadInputError, NoSuchStateError, OutOfRangeError, q } from "./errors";
import { foldName } from "./names";
import {
  criticalPoint,
  meltingPressure,
  meltingTemperature,
  phaseAt,
  saturationTemperature,
  triplePoint,
  type PhaseState,
} from "./phase";
import { solveBracketed } from "./numerics/roots";
import type { Boundary, CurveBranch, SubstanceDefinition } from "./substances/types";
import { checkPressure, checkTemperature } from "./validate";

/** A boundary met on an isobar, with its temperature. */
export interface BoundaryOnIsobar {
  readonly boundary: Boundary;
  readonly temperatureK: number;
}

/** The coexistence temperatures on the isobar p: melting, boiling or sublimation, where they exist. */
export function boundariesOnIsobar(substance: SubstanceDefinition, pressurePa: number): BoundaryOnIsobar[] {
  checkPressure(pressurePa);
  const triple = triplePoint(substance);
  const critical = criticalPoint(substance);
  const found: BoundaryOnIsobar[] = [];
  if (pressurePa < triple.pressurePa) {
    if (substance.curves.sublimation) {
      found.push({ boundary: "sublimation", temperatureK: saturationTemperature(substance, pressurePa) });
    }
    return found;
  }
  // Substances without a published melting curve have no melting temperature to offer here; the
  // phase map and the enthalpy models refuse the states that would need one.
  if (substance.curves.melting.length > 0) {
    found.push({ boundary: "melting", temperatureK: meltingTemperature(substance, pressurePa) });
  }
  if (pressurePa < critical.pressurePa) {
    found.push({ boundary: "boiling", temperatureK: saturationTemperature(substance, pressurePa) });
  }
  return found;
}

/**
 * Signed distance in temperature from the state to the nearest phase boundary on its isobar,
 * T − T_boundary: positive on the warm side. Above the critical pressure only the melting curve
 * is a boundary.
 */
export function marginToBoundary(
  substance: SubstanceDefinition,
  temperatureK: number,
  pressurePa: number,
): { marginK: number; boundary: Boundary; boundaryK: number } {
  checkTemperature(temperatureK);
  const state = phaseAt(substance, temperatureK, pressurePa);
  const candidates = boundariesOnIsobar(substance, pressurePa);
  const meltingMissing = substance.curves.melting.length === 0 && pressurePa >= triplePoint(substance).pressurePa;
  if (candidates.length === 0 || (state.phase === "solid" && meltingMissing)) {
    throw new NoSuchStateError([
      `no phase boundary of ${substance.name} is known on the `,
      q.p(pressurePa),
      " isobar next to this state: no melting curve is published in Phasecell's sources " +
        "(PHASE.SOURCE with \"state\")",
    ]);
  }
  let best = candidates[0]!;
  for (const candidate of candidates) {
    if (Math.abs(temperatureK - candidate.temperatureK) < Math.abs(temperatureK - best.temperatureK)) best = candidate;
  }
  return { marginK: temperatureK - best.temperatureK, boundary: best.boundary, boundaryK: best.temperatureK };
}

/** Reads a boundary name: melting, boiling or sublimation (and common synonyms). */
export function parseBoundary(name: string): Boundary {
  const folded = foldName(name);
  if (["melting", "melt", "fusion", "freezing", "solidliquid"].includes(folded)) return "melting";
  if (["boiling", "boil", "vaporization", "vaporisation", "evaporation", "saturation", "liquidvapor", "liquidvapour"].includes(folded)) {
    return "boiling";
  }
  if (["sublimation", "sublime", "deposition", "solidvapor", "solidvapour"].includes(folded)) return "sublimation";
  throw new BadInputError([`unknown boundary "${name.trim()}": use melting, boiling or sublimation`]);
}

/** Central-difference step for slopes: relative 1e-5 keeps truncation and rounding near 1e-10. */
const SLOPE_STEP = 1e-5;

function branchSlope(branch: CurveBranch, temperatureK: number): number {
  const step = temperatureK * SLOPE_STEP;
  const low = Math.max(branch.tMin, temperatureK - step);
  const high = Math.min(branch.tMax, temperatureK + step);
  return (branch.pressure(high) - branch.pressure(low)) / (high - low);
}

/**
 * dp/dT of a boundary at T, Pa/K. For melting, the branch that meltingPressure picks (the
 * lowest-pressure one where several solids melt). The sign says which phase is denser
 * (Clapeyron: dp/dT = L / (T Δv)).
 */
export function boundarySlope(substance: SubstanceDefinition, boundary: Boundary, temperatureK: number): number {
  checkTemperature(temperatureK);
  const triple = triplePoint(substance);
  const critical = criticalPoint(substance);
  if (boundary === "boiling") {
    const branch = substance.curves.boiling;
    if (!atMost(temperatureK, critical.temperatureK) || !atLeast(temperatureK, triple.temperatureK)) {
      throw new NoSuchStateError([
        "temperature ",
        q.T(temperatureK),
        ` is outside the ${substance.name} boiling curve, which runs from the triple point (`,
        q.T(triple.temperatureK),
        ") to the critical point (",
        q.T(critical.temperatureK),
        ")",
      ]);
    }
    return branchSlope(branch, temperatureK);
  }
  if (boundary === "sublimation") {
    const branch = substance.curves.sublimation;
    if (!branch) throw new NoSuchStateError([`no sublimation curve is available for ${substance.name}`]);
    if (!atMost(temperatureK, triple.temperatureK)) {
      throw new NoSuchStateError([
        "temperature ",
        q.T(temperatureK),
        ` is above the triple point of ${substance.name} (`,
        q.T(triple.temperatureK),
        "): the solid melts before it sublimes there",
      ]);
    }
    if (!branchCoversTemperature(branch, temperatureK)) {
      throw new OutOfRangeError([
        "temperature ",
        q.T(temperatureK),
        ` is below the ${substance.name} ${branchLabel(branch)} range (`,
        q.T(branch.tMin),
        " to ",
        q.T(branch.tMax),
        ")",
      ]);
    }
    return branchSlope(branch, temperatureK);
  }
  const pressure = meltingPressure(substance, temperatureK);
  const branch = substance.curves.melting.find(
    (candidate) => branchCoversTemperature(candidate, temperatureK) && candidate.pressure(temperatureK) === pressure,
  )!;
  return branchSlope(branch, temperatureK);
}

/** One phase change met along a path. */
export interface Crossing {
  /** Fraction of the way from the first to the second state, 0…1. */
  readonly fraction: number;
  readonly temperatureK: number;
  readonly pressurePa: number;
  readonly from: PhaseState;
  readonly to: PhaseState;
  /** What happens, in our words: melt, freeze, boil, condense, sublime, deposit, … */
  readonly change: string;
}

/** Samples along a path; a boundary crossed twice between two samples would be missed. */
const PATH_SAMPLES = 4096;

/** What a change from one phase to another is called: melt, freeze, boil, condense, sublime, deposit, … */
export function changeName(from: PhaseState, to: PhaseState): string {
  const a = from.phase;
  const b = to.phase;
  if (a === "solid" && b === "solid") return `solid form changes (${from.detail} to ${to.detail}; approximate boundary)`;
  if (a === "solid" && b === "liquid") return "melt";
  if (a === "liquid" && b === "solid") return "freeze";
  if (a === "liquid" && b === "vapor") return "boil";
  if (a === "vapor" && b === "liquid") return "condense";
  if (a === "solid" && (b === "vapor" || b === "gas")) return "sublime";
  if ((a === "vapor" || a === "gas") && b === "solid") return "deposit";
  if (a === "solid" && b === "supercritical fluid") return "melt into supercritical fluid";
  if (a === "supercritical fluid" && b === "solid") return "freeze from supercritical fluid";
  const across = (a === "gas" && b === "supercritical fluid") || (a === "supercritical fluid" && b === "gas") ? "pressure" : "temperature";
  return `${a} becomes ${b} (no phase change: crosses the critical ${across})`;
}

function labelOf(state: PhaseState): string {
  return state.phase === "solid" ? state.detail : state.phase;
}

/**
 * Phase changes met along the straight path from (T1, p1) to (T2, p2), in order. The path is
 * sampled at 4096 points and each change of phase located by bisection to 1e-12 of the path.
 */
export function crossingsAlongPath(
  substance: SubstanceDefinition,
  t1: number,
  p1: number,
  t2: number,
  p2: number,
): Crossing[] {
  const at = (fraction: number): PhaseState =>
    phaseAt(substance, t1 + (t2 - t1) * fraction, p1 + (p2 - p1) * fraction);
  let previous = at(0);
  if (previous.phase.includes("+")) previous = at(1e-12);
  const crossings: Crossing[] = [];
  let previousFraction = 0;
  for (let i = 1; i <= PATH_SAMPLES; i++) {
    const fraction = i / PATH_SAMPLES;
    let current = at(fraction);
    if (current.phase.includes("+")) current = at(Math.max(previousFraction, fraction - 1e-12));
    if (labelOf(current) !== labelOf(previous)) {
      const before = labelOf(previous);
      const where = solveBracketed(
        (x) => (labelOf(at(x)) === before ? -1 : 1),
        previousFraction,
        fraction,
        { xTolerance: 1e-12, maxIterations: 400 },
      );
      crossings.push({
        fraction: where,
        temperatureK: t1 + (t2 - t1) * where,
        pressurePa: p1 + (p2 - p1) * where,
        from: previous,
        to: current,
        change: changeName(previous, current),
      });
    }
    previous = current;
    previousFraction = fraction;
  }
  return crossings;
}
