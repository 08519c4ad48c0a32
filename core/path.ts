/**
 * Heat along an isobaric path across phase changes, step by step, and its inverse; specific
 * enthalpy and latent heats. Built on the phase map (core/phase, core/boundaries) and on each
 * substance's enthalpy model; energies follow from enthalpy differences, so the steps of a path
 * always add up to the difference of its end states.
 *
 * Endpoint convention: a state exactly on a phase-change temperature is taken as the warmer phase
 * (liquid at the melting point, vapour at the boiling or sublimation point), whichever way the
 * path runs, so paths split there add up and reversed paths change sign exactly.
 */
import { boundariesOnIsobar, changeName, parseBoundary } from "./boundaries";
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
    const prefix = "no enthalpy model: ";
    const why = substance.referenceState.startsWith(prefix) ? ` (${substance.referenceState.slice(prefix.length)})` : "";
    throw new NoSuchStateError([
      `no enthalpy model is available for ${substance.name}${why}, so its path energies, end ` +
        "states, enthalpies and latent heats cannot be computed; its phase, curves and constants can",
    ]);
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

function sensibleAction(heating: boolean, state: PhaseState, aboveCriticalPressure: boolean, fromCritical: boolean): string {
  const verb = heating ? "heat" : "cool";
  if (aboveCriticalPressure && fromCritical && (state.phase === "supercritical fluid" || state.phase === "liquid")) {
    return `${verb} ${state.phase} (passes the critical temperature above the critical pressure: no latent heat)`;
  }
  return `${verb} ${phaseWord(state)}`;
}

/** A temperature where the path changes phase or crosses the critical temperature. */
interface Mark {
  readonly temperatureK: number;
  readonly boundary: Boundary | "critical";
}

/**
 * Marks closer than this (relative) are one: at the triple-point pressure the melting and the
 * boiling temperatures coincide up to the rounding of their equations (2.4e-10 K apart for water).
 */
const MERGE_TOLERANCE = 1e-11;
/** How far, relative, a phase is read beside a mark when no neighbouring mark is nearer. */
const SIDE_OFFSET = 1e-6;

function marksOnIsobar(substance: SubstanceDefinition, pressurePa: number): Mark[] {
  const raw: Mark[] = boundariesOnIsobar(substance, pressurePa).map((b) => ({
    temperatureK: b.temperatureK,
    boundary: b.boundary,
  }));
  raw.push({ temperatureK: criticalPoint(substance).temperatureK, boundary: "critical" });
  raw.sort((a, b) => a.temperatureK - b.temperatureK);
  const marks: Mark[] = [];
  for (const mark of raw) {
    const last = marks[marks.length - 1];
    if (last && mark.temperatureK - last.temperatureK <= MERGE_TOLERANCE * last.temperatureK) {
      if (last.boundary === "critical") marks[marks.length - 1] = { temperatureK: last.temperatureK, boundary: mark.boundary };
      continue;
    }
    marks.push(mark);
  }
  return marks;
}

/** A sensible step (inside one phase) or a phase change, in the order the path meets them. */
type PlanItem =
  | { readonly kind: "sensible"; readonly fromK: number; readonly toK: number; readonly state: PhaseState }
  | { readonly kind: "latent"; readonly atK: number; readonly before: PhaseState; readonly after: PhaseState };

/** A path laid out before any enthalpy is evaluated. */
interface Plan {
  readonly items: readonly PlanItem[];
  readonly start: PhaseState;
  readonly end: PhaseState;
}

/**
 * Lays out the isobar from T1 to T2: sensible stretches between the phase-change temperatures,
 * and a change at each of them, each phase read at the middle of its stretch.
 *
 * A state exactly on a phase-change temperature is taken as the warmer phase (liquid at the
 * melting point, vapour at the boiling or sublimation point) whichever way the path runs, so a
 * path ending there includes the change when heating and a path starting there includes it when
 * cooling. That keeps both laws exact: A→B + B→C = A→C and B→A = −(A→B).
 *
 * Each stretch is checked against the temperature range its phase's enthalpy model covers, so
 * the path and its total are refused alike where a model stops.
 */
function planPath(
  substance: SubstanceDefinition,
  model: EnthalpyModel,
  t1: number,
  t2: number,
  pressurePa: number,
  isobarMarks: readonly Mark[] = marksOnIsobar(substance, pressurePa),
): Plan {
  const marks = isobarMarks.map((mark) => {
    // An end within the merge tolerance of a mark is on it: the mark moves to the end exactly.
    for (const end of [t1, t2]) {
      if (Math.abs(end - mark.temperatureK) <= MERGE_TOLERANCE * mark.temperatureK) return { ...mark, temperatureK: end };
    }
    return mark;
  });
  const warmSide = (index: number): PhaseState => {
    const mark = marks[index]!;
    const next = marks[index + 1];
    const beside = mark.temperatureK * (1 + SIDE_OFFSET);
    return phaseAt(substance, next ? Math.min(beside, (mark.temperatureK + next.temperatureK) / 2) : beside, pressurePa);
  };
  const low = Math.min(t1, t2);
  const high = Math.max(t1, t2);
  const heating = t2 > t1;
  const crossed = marks
    .map((mark, index) => ({ mark, index }))
    .filter(({ mark }) => mark.temperatureK > low && mark.temperatureK <= high);
  if (!heating) crossed.reverse();

  const items: PlanItem[] = [];
  let from = t1;
  let previous: PhaseState | undefined;
  const stretch = (to: number): PhaseState | undefined => {
    if (to === from) return undefined;
    const state = phaseAt(substance, (from + to) / 2, pressurePa);
    checkStretch(substance, model, state, Math.min(from, to), Math.max(from, to), pressurePa);
    items.push({ kind: "sensible", fromK: from, toK: to, state });
    return state;
  };
  for (const { mark, index } of crossed) {
    const before = stretch(mark.temperatureK) ?? previous ?? warmSide(index);
    from = mark.temperatureK;
    const after =
      mark.temperatureK === t2 ? warmSide(index) : phaseAt(substance, (mark.temperatureK + nextStop(crossed, mark, t2)) / 2, pressurePa);
    if (phaseWord(before) !== phaseWord(after) && mark.boundary !== "critical") {
      items.push({ kind: "latent", atK: mark.temperatureK, before, after });
    }
    previous = after;
  }
  const last = stretch(t2) ?? previous ?? phaseAt(substance, t2, pressurePa);
  const first = items[0];
  const start = first ? (first.kind === "sensible" ? first.state : first.before) : last;
  return { items, start, end: last };
}

/** The temperature after `mark` where the path next stops: the following crossed mark or T2. */
function nextStop(crossed: readonly { mark: Mark }[], mark: Mark, t2: number): number {
  const position = crossed.findIndex((entry) => entry.mark === mark);
  return crossed[position + 1]?.mark.temperatureK ?? t2;
}

function checkStretch(
  substance: SubstanceDefinition,
  model: EnthalpyModel,
  state: PhaseState,
  lowK: number,
  highK: number,
  pressurePa: number,
): void {
  const [lo, hi] = model.temperatureLimits(pressurePa, sideOf(state));
  if (atLeast(lowK, lo) && atMost(highK, hi)) return;
  throw new OutOfRangeError([
    `the path runs through ${phaseWord(state)} ${substance.name} from `,
    q.T(lowK),
    " to ",
    q.T(highK),
    ", beyond the range its enthalpy model covers on this isobar (",
    q.T(lo),
    " to ",
    q.T(hi),
    "; PHASE.SOURCE lists the models)",
  ]);
}

function latentOf(model: EnthalpyModel, item: { atK: number; before: PhaseState; after: PhaseState }, pressurePa: number): number {
  return (
    model.enthalpy(sideOf(item.after), item.atK, pressurePa, solidOf(item.after)) -
    model.enthalpy(sideOf(item.before), item.atK, pressurePa, solidOf(item.before))
  );
}

function checkPathInputs(massKg: number, t1: number, t2: number, pressurePa: number): void {
  checkMass(massKg);
  checkTemperature(t1, "start temperature");
  checkTemperature(t2, "end temperature");
  checkPressure(pressurePa);
}

/**
 * The steps of heating or cooling `massKg` from T1 to T2 at constant pressure.
 * @throws BadInputError, OutOfRangeError or NoSuchStateError as the inputs and models require.
 */
export function isobaricPath(
  substance: SubstanceDefinition,
  massKg: number,
  t1: number,
  t2: number,
  pressurePa: number,
): PathStep[] {
  checkPathInputs(massKg, t1, t2, pressurePa);
  const model = requireEnthalpy(substance);
  phaseAt(substance, t1, pressurePa);
  phaseAt(substance, t2, pressurePa);
  if (t1 === t2) return [];
  const heating = t2 > t1;
  const aboveCriticalPressure = pressurePa >= criticalPoint(substance).pressurePa;
  const plan = planPath(substance, model, t1, t2, pressurePa);
  const critical = criticalPoint(substance).temperatureK;
  return plan.items.map((item): PathStep => {
    if (item.kind === "latent") {
      return {
        action: changeName(item.before, item.after),
        kind: "latent",
        fromK: item.atK,
        toK: item.atK,
        energyJ: massKg * latentOf(model, item, pressurePa),
        phase: mixture(item.before, item.after, heating),
      };
    }
    const side = sideOf(item.state);
    const solid = solidOf(item.state);
    return {
      action: sensibleAction(heating, item.state, aboveCriticalPressure, item.fromK === critical),
      kind: "sensible",
      fromK: item.fromK,
      toK: item.toK,
      energyJ:
        massKg * (model.enthalpy(side, item.toK, pressurePa, solid) - model.enthalpy(side, item.fromK, pressurePa, solid)),
      phase: phaseWord(item.state),
    };
  });
}

/**
 * Heat to take `massKg` from T1 to T2 at constant pressure, J (negative when removed).
 *
 * Enthalpy is a function of state, so this is m·(h_end − h_start) with each end in the phase
 * {@link isobaricPath} gives it, which makes it equal to the sum of the path's steps while
 * evaluating two enthalpies instead of one per step. The same checks refuse it where the path is
 * refused.
 */
export function pathEnergy(
  substance: SubstanceDefinition,
  massKg: number,
  t1: number,
  t2: number,
  pressurePa: number,
): number {
  return pathEnergyOnIsobar(substance, pressurePa)(massKg, t1, t2);
}

/**
 * {@link pathEnergy} with the isobar's phase-change temperatures found once, for many paths on
 * one isobar (a column of start temperatures at one line pressure): the returned function gives
 * the heat for a mass and two temperatures.
 */
export function pathEnergyOnIsobar(
  substance: SubstanceDefinition,
  pressurePa: number,
): (massKg: number, t1: number, t2: number) => number {
  checkPressure(pressurePa);
  const model = requireEnthalpy(substance);
  let marks: readonly Mark[] | undefined;
  return (massKg, t1, t2) => {
    checkPathInputs(massKg, t1, t2, pressurePa);
    if (t1 === t2) {
      phaseAt(substance, t1, pressurePa);
      return 0;
    }
    marks ??= marksOnIsobar(substance, pressurePa);
    const plan = planPath(substance, model, t1, t2, pressurePa, marks);
    return (
      massKg *
      (model.enthalpy(sideOf(plan.end), t2, pressurePa, solidOf(plan.end)) -
        model.enthalpy(sideOf(plan.start), t1, pressurePa, solidOf(plan.start)))
    );
  };
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
 * pressure: the inverse of {@link pathEnergy}. It walks the same plan, as far as the heat goes.
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
  if (heating ? t1 >= limit : t1 <= limit) throw beyondModels(substance, heating, limit);
  // Lay the path out to the far limit, but check each stretch only as far as the heat reaches.
  const plan = planPath(substance, unlimited(model), t1, limit, pressurePa);
  let remaining = Math.abs(heatJ) / massKg;
  for (const item of plan.items) {
    if (item.kind === "latent") {
      const latent = Math.abs(latentOf(model, item, pressurePa));
      if (remaining < latent) {
        return {
          temperatureK: item.atK,
          state: mixture(item.before, item.after, heating),
          convertedFraction: remaining / latent,
        };
      }
      remaining -= latent;
      continue;
    }
    const side = sideOf(item.state);
    const solid = solidOf(item.state);
    const [lo, hi] = model.temperatureLimits(pressurePa, side);
    const reach = heating ? Math.min(item.toK, hi) : Math.max(item.toK, lo);
    const hFrom = model.enthalpy(side, item.fromK, pressurePa, solid);
    const span = Math.abs(model.enthalpy(side, reach, pressurePa, solid) - hFrom);
    if (remaining <= span) {
      const target = hFrom + (heating ? remaining : -remaining);
      const temperatureK = solveBracketed((t) => model.enthalpy(side, t, pressurePa, solid) - target, item.fromK, reach, {
        relTolerance: Number.EPSILON,
      });
      return { temperatureK, state: phaseWord(item.state) };
    }
    if (reach !== item.toK) throw beyondModels(substance, heating, reach);
    remaining -= span;
  }
  throw beyondModels(substance, heating, limit);
}

/** Two phases in coexistence, the colder one first ("ice Ih + liquid", "liquid + vapor"). */
function mixture(before: PhaseState, after: PhaseState, heating: boolean): string {
  const [cold, warm] = heating ? [before, after] : [after, before];
  return `${phaseWord(cold)} + ${phaseWord(warm)}`;
}

/** The same model without per-phase range checks, for laying out a path before walking it. */
function unlimited(model: EnthalpyModel): EnthalpyModel {
  return { ...model, temperatureLimits: () => [0, Number.POSITIVE_INFINITY] };
}

function beyondModels(substance: SubstanceDefinition, heating: boolean, limitK: number): OutOfRangeError {
  return new OutOfRangeError([
    `that much heat ${heating ? "added" : "removed"} takes ${substance.name} ${heating ? "above" : "below"} `,
    q.T(limitK),
    ", where its enthalpy models stop on this isobar (PHASE.SOURCE lists them)",
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
  let boundary: Boundary;
  try {
    boundary = parseBoundary(name);
  } catch {
    throw new BadInputError([`unknown transition "${name.trim()}": use fusion, vaporization or sublimation`]);
  }
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
