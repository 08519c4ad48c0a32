/**
 * Heat along an isobaric path across phase changes, step by step, and its inverse; specific
 * enthalpy and latent heats. Built on the phase map (core/phase, core/boundaries) and on each
 * substance's enthalpy model; energies follow from enthalpy differences, so the steps of a path
 * always add up to the difference of its end states.
 *
 * Endpoint convention: a path that starts or ends exactly on a coexistence temperature includes
 * the whole phase change there (ice at its melting point is taken as all ice when heated, all
 * liquid when cooled to it from above).
 */
import { boundariesOnIsobar, parseBoundary } from "./boundaries";
import { atLeast, atMost } from "./curves";
import { BadInputError, NoSuchStateError, OutOfRangeError, q } from "./errors";
import { solveBracketed } from "./numerics/roots";
import {
  criticalPoint,
  meltingPressure,
  phaseAt,
  saturationPressure,
  triplePoint,
  type PhaseState,
} from "./phase";
import type { Boundary, EnthalpyModel, PhaseSide, SubstanceDefinition } from "./substances/types";
import { checkPressure, checkTemperature } from "./validate";

/** One step of a path. */
export interface PathStep {
  /** What happens, in our words: "heat ice Ih", "melt", "cool liquid", "condense", … */
  readonly action: string;
  readonly kind: "sensible" | "latent";
  readonly fromK: number;
  readonly toK: number;
  /** Heat for the whole mass, J; negative when heat is removed. */
  readonly energyJ: number;
  /** Phase (or phases) during the step. */
  readonly phase: string;
}

function requireEnthalpy(substance: SubstanceDefinition): EnthalpyModel {
  if (!substance.enthalpy) {
    throw new NoSuchStateError([`no enthalpy model is available for ${substance.name} yet`]);
  }
  return substance.enthalpy;
}

/** Rejects masses that are not finite and above zero. */
export function checkMass(massKg: number): void {
  if (!Number.isFinite(massKg)) throw new BadInputError(["mass is not a finite number"]);
  if (massKg <= 0) {
    throw new BadInputError(["mass ", q.m(massKg), " is not above zero: enter the mass being heated or cooled"]);
  }
}

function sideOf(state: PhaseState): PhaseSide {
  if (state.phase === "solid") return "solid";
  if (state.phase === "liquid") return "liquid";
  return "vapor";
}

function solidOf(state: PhaseState): string {
  return state.branch?.solid ?? "solid";
}

function phaseWord(state: PhaseState): string {
  return state.phase === "solid" ? solidOf(state) : state.phase;
}

/** A temperature where the path changes phase or crosses the critical temperature. */
interface Mark {
  readonly temperatureK: number;
  readonly boundary: Boundary | "critical";
}

function marksOnIsobar(substance: SubstanceDefinition, pressurePa: number): Mark[] {
  const marks: Mark[] = boundariesOnIsobar(substance, pressurePa).map((b) => ({
    temperatureK: b.temperatureK,
    boundary: b.boundary,
  }));
  marks.push({ temperatureK: criticalPoint(substance).temperatureK, boundary: "critical" });
  return marks.sort((a, b) => a.temperatureK - b.temperatureK);
}

const LATENT_WORDS: Record<Boundary, readonly [heating: string, cooling: string]> = {
  melting: ["melt", "freeze"],
  boiling: ["boil", "condense"],
  sublimation: ["sublime", "deposit"],
};

function sensibleAction(heating: boolean, state: PhaseState, aboveCriticalPressure: boolean, fromCritical: boolean): string {
  const verb = heating ? "heat" : "cool";
  if (state.phase === "supercritical fluid" && fromCritical && heating) {
    return `${verb} supercritical fluid (passes the critical temperature above the critical pressure: no latent heat)`;
  }
  if (state.phase === "liquid" && aboveCriticalPressure && fromCritical && !heating) {
    return `${verb} liquid (passes the critical temperature above the critical pressure: no latent heat)`;
  }
  return `${verb} ${phaseWord(state)}`;
}

/**
 * The steps of heating or cooling `massKg` from T1 to T2 at constant pressure p.
 * @throws BadInputError, OutOfRangeError or NoSuchStateError as the inputs and models require.
 */
export function isobaricPath(
  substance: SubstanceDefinition,
  massKg: number,
  t1: number,
  t2: number,
  pressurePa: number,
): PathStep[] {
  checkMass(massKg);
  checkTemperature(t1, "start temperature");
  checkTemperature(t2, "end temperature");
  checkPressure(pressurePa);
  const model = requireEnthalpy(substance);
  phaseAt(substance, t1, pressurePa);
  phaseAt(substance, t2, pressurePa);
  if (t1 === t2) return [];
  const heating = t2 > t1;
  const low = Math.min(t1, t2);
  const high = Math.max(t1, t2);
  const aboveCriticalPressure = pressurePa >= criticalPoint(substance).pressurePa;
  const inside = marksOnIsobar(substance, pressurePa).filter((m) => m.temperatureK >= low && m.temperatureK <= high);
  const ordered = heating ? inside : inside.reverse();

  const steps: PathStep[] = [];
  let from = t1;
  let fromCritical = false;
  const sensible = (to: number): void => {
    if (to === from) return;
    const state = phaseAt(substance, (from + to) / 2, pressurePa);
    const side = sideOf(state);
    const solid = solidOf(state);
    const energy =
      massKg * (model.enthalpy(side, to, pressurePa, solid) - model.enthalpy(side, from, pressurePa, solid));
    steps.push({
      action: sensibleAction(heating, state, aboveCriticalPressure, fromCritical),
      kind: "sensible",
      fromK: from,
      toK: to,
      energyJ: energy,
      phase: phaseWord(state),
    });
  };
  for (const mark of ordered) {
    sensible(mark.temperatureK);
    from = mark.temperatureK;
    fromCritical = mark.boundary === "critical";
    if (mark.boundary === "critical") continue;
    const below = phaseAt(substance, nudge(mark.temperatureK, -1), pressurePa);
    const above = phaseAt(substance, nudge(mark.temperatureK, +1), pressurePa);
    const latent =
      model.enthalpy(sideOf(above), mark.temperatureK, pressurePa, solidOf(above)) -
      model.enthalpy(sideOf(below), mark.temperatureK, pressurePa, solidOf(below));
    const [heatWord, coolWord] = LATENT_WORDS[mark.boundary];
    steps.push({
      action: heating ? heatWord : coolWord,
      kind: "latent",
      fromK: mark.temperatureK,
      toK: mark.temperatureK,
      energyJ: (heating ? 1 : -1) * massKg * latent,
      phase: heating ? `${phaseWord(below)} + ${phaseWord(above)}` : `${phaseWord(above)} + ${phaseWord(below)}`,
    });
  }
  sensible(t2);
  return steps;
}

/** A temperature a relative 1e-9 to one side of T: off a coexistence curve, inside one phase. */
function nudge(temperatureK: number, direction: 1 | -1): number {
  return temperatureK * (1 + direction * 1e-9);
}

/**
 * Heat to take `massKg` from T1 to T2 at constant pressure, J (negative when removed).
 *
 * Enthalpy is a function of state, so this is m·(h_end − h_start) with each end taken in the phase
 * {@link isobaricPath} gives it — the phase of the first (last) step, or, when an end lies exactly
 * on a coexistence temperature, the phase on the far side of that change — which makes it equal
 * to the sum of the path's steps while evaluating two enthalpies instead of one per step.
 */
export function pathEnergy(
  substance: SubstanceDefinition,
  massKg: number,
  t1: number,
  t2: number,
  pressurePa: number,
): number {
  checkMass(massKg);
  checkTemperature(t1, "start temperature");
  checkTemperature(t2, "end temperature");
  checkPressure(pressurePa);
  const model = requireEnthalpy(substance);
  if (t1 === t2) {
    phaseAt(substance, t1, pressurePa);
    return 0;
  }
  // The ends' own ranges are checked by endpointState's phase look-ups and by the enthalpy models.
  const marks = marksOnIsobar(substance, pressurePa);
  const start = endpointState(substance, marks, t1, t2, pressurePa);
  const end = endpointState(substance, marks, t2, t1, pressurePa);
  return (
    massKg *
    (model.enthalpy(sideOf(end), t2, pressurePa, solidOf(end)) -
      model.enthalpy(sideOf(start), t1, pressurePa, solidOf(start)))
  );
}

/**
 * The phase a path end is taken in: on a phase-change temperature (not the critical one), the
 * phase across the change from the rest of the path; otherwise the phase of the step that
 * touches the end, found at the middle of that step.
 */
function endpointState(
  substance: SubstanceDefinition,
  marks: readonly Mark[],
  endK: number,
  otherEndK: number,
  pressurePa: number,
): PhaseState {
  const towardOther = otherEndK > endK ? 1 : -1;
  let nearest = otherEndK;
  for (const mark of marks) {
    if (mark.temperatureK === endK && mark.boundary !== "critical") {
      return phaseAt(substance, nudge(endK, towardOther === 1 ? -1 : 1), pressurePa);
    }
    const ahead = (mark.temperatureK - endK) * towardOther;
    if (ahead > 0 && ahead < (nearest - endK) * towardOther) nearest = mark.temperatureK;
  }
  return phaseAt(substance, (endK + nearest) / 2, pressurePa);
}

/** Where a path ends after a given heat: temperature, state and converted fraction. */
export interface EndState {
  readonly temperatureK: number;
  /** A phase word, or "solid + liquid" etc. when it stops inside a phase change. */
  readonly state: string;
  /** Mass fraction converted by the phase change in progress (melted, boiled, frozen…); undefined outside one. */
  readonly convertedFraction?: number;
}

/**
 * The state reached from T1 after adding `heatJ` (removing, if negative) to `massKg` at constant
 * pressure: the inverse of {@link pathEnergy}.
 */
export function endState(
  substance: SubstanceDefinition,
  massKg: number,
  t1: number,
  heatJ: number,
  pressurePa: number,
): EndState {
  checkMass(massKg);
  checkTemperature(t1, "start temperature");
  checkPressure(pressurePa);
  if (!Number.isFinite(heatJ)) throw new BadInputError(["heat is not a finite number"]);
  const model = requireEnthalpy(substance);
  const start = phaseAt(substance, t1, pressurePa);
  if (heatJ === 0) return { temperatureK: t1, state: phaseWord(start) };
  const heating = heatJ > 0;
  const [lowLimit, highLimit] = model.temperatureLimits(pressurePa);
  const limit = heating ? highLimit : lowLimit;
  const marks = marksOnIsobar(substance, pressurePa).filter((m) =>
    heating ? m.temperatureK >= t1 && m.temperatureK < limit : m.temperatureK <= t1 && m.temperatureK > limit,
  );
  if (!heating) marks.reverse();
  let remaining = Math.abs(heatJ) / massKg;
  let from = t1;
  const throughSegment = (to: number): number | undefined => {
    if (to === from) return undefined;
    const state = phaseAt(substance, (from + to) / 2, pressurePa);
    const side = sideOf(state);
    const solid = solidOf(state);
    const hFrom = model.enthalpy(side, from, pressurePa, solid);
    const span = Math.abs(model.enthalpy(side, to, pressurePa, solid) - hFrom);
    if (remaining > span) {
      remaining -= span;
      return undefined;
    }
    const target = hFrom + (heating ? remaining : -remaining);
    return solveBracketed((t) => model.enthalpy(side, t, pressurePa, solid) - target, from, to, {
      relTolerance: Number.EPSILON,
    });
  };
  for (const mark of marks) {
    const stop = throughSegment(mark.temperatureK);
    if (stop !== undefined) return { temperatureK: stop, state: phaseWord(phaseAt(substance, stop, pressurePa)) };
    from = mark.temperatureK;
    if (mark.boundary === "critical") continue;
    const below = phaseAt(substance, nudge(mark.temperatureK, -1), pressurePa);
    const above = phaseAt(substance, nudge(mark.temperatureK, +1), pressurePa);
    const latent =
      model.enthalpy(sideOf(above), mark.temperatureK, pressurePa, solidOf(above)) -
      model.enthalpy(sideOf(below), mark.temperatureK, pressurePa, solidOf(below));
    if (remaining < latent) {
      return {
        temperatureK: mark.temperatureK,
        state: `${phaseWord(below)} + ${phaseWord(above)}`,
        convertedFraction: remaining / latent,
      };
    }
    remaining -= latent;
  }
  const stop = throughSegment(limit);
  if (stop !== undefined) return { temperatureK: stop, state: phaseWord(phaseAt(substance, stop, pressurePa)) };
  throw new OutOfRangeError([
    `that much heat ${heating ? "added" : "removed"} takes ${substance.name} ${heating ? "above" : "below"} `,
    q.T(limit),
    ", the limit of its enthalpy models on this isobar",
  ]);
}

/**
 * Specific enthalpy at (T, p), J/kg, on the substance's reference state.
 * @throws NoSuchStateError exactly on a coexistence curve (the split between phases is unknown).
 */
export function specificEnthalpy(substance: SubstanceDefinition, temperatureK: number, pressurePa: number): number {
  const model = requireEnthalpy(substance);
  const state = phaseAt(substance, temperatureK, pressurePa);
  if (state.phase.includes("+")) {
    throw new NoSuchStateError([
      "the state ",
      q.T(temperatureK),
      ", ",
      q.p(pressurePa),
      ` lies exactly on a coexistence curve (${state.phase}): its enthalpy depends on how much of ` +
        "each phase is present; use PHASE.ENDSTATE or move off the curve",
    ]);
  }
  return model.enthalpy(sideOf(state), temperatureK, pressurePa, solidOf(state));
}

/** A transition whose latent heat is asked for. */
export type Transition = "fusion" | "vaporization" | "sublimation";

/** Reads fusion, vaporization or sublimation (and the boundary names). */
export function parseTransition(name: string): Transition {
  const boundary = parseBoundary(name);
  return boundary === "melting" ? "fusion" : boundary === "boiling" ? "vaporization" : "sublimation";
}

/** Specific latent heat, J/kg, of a transition at its coexistence point at temperature T. */
export function latentHeat(substance: SubstanceDefinition, transition: Transition, temperatureK: number): number {
  checkTemperature(temperatureK);
  const model = requireEnthalpy(substance);
  const triple = triplePoint(substance);
  if (transition === "fusion") {
    const pressurePa = meltingPressure(substance, temperatureK);
    const solid = substance.curves.melting.find(
      (b) => temperatureK >= b.tMin && temperatureK <= b.tMax && b.pressure(temperatureK) === pressurePa,
    )?.solid ?? "solid";
    return model.enthalpy("liquid", temperatureK, pressurePa, solid) - model.enthalpy("solid", temperatureK, pressurePa, solid);
  }
  if (transition === "vaporization") {
    if (!atLeast(temperatureK, triple.temperatureK)) {
      throw new NoSuchStateError([
        "temperature ",
        q.T(temperatureK),
        ` is below the triple point of ${substance.name} (`,
        q.T(triple.temperatureK),
        "): the liquid is not stable there; ask for sublimation",
      ]);
    }
    const pressurePa = saturationPressure(substance, temperatureK);
    return model.enthalpy("vapor", temperatureK, pressurePa, "") - model.enthalpy("liquid", temperatureK, pressurePa, "");
  }
  if (!atMost(temperatureK, triple.temperatureK)) {
    throw new NoSuchStateError([
      "temperature ",
      q.T(temperatureK),
      ` is above the triple point of ${substance.name} (`,
      q.T(triple.temperatureK),
      "): the solid melts there; ask for fusion or vaporization",
    ]);
  }
  const pressurePa = saturationPressure(substance, temperatureK);
  const solid = substance.curves.sublimation?.solid ?? "solid";
  return model.enthalpy("vapor", temperatureK, pressurePa, "") - model.enthalpy("solid", temperatureK, pressurePa, solid);
}
