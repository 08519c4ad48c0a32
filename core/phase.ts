/**
 * Where a substance's coexistence curves lie and which phase it is in at (T, p).
 *
 * Everything is decided from the published curves (boiling, sublimation, melting), never from
 * comparing Gibbs energies of separate formulations: the curves are what the standards fit and
 * check. SI in (K, Pa), SI out; errors are typed (see core/errors).
 */
import {
  atLeast,
  atMost,
  branchCoversPressure,
  branchCoversTemperature,
  branchLabel,
  branchPressureRange,
  pressureOnBranch,
  temperatureOnBranch,
} from "./curves";
import { NoSuchStateError, OutOfRangeError, BadInputError, q } from "./errors";
import { foldName } from "./names";
import { citation } from "./sources/bibliography";
import type { CurveBranch, MeltingBound, SubstanceDefinition } from "./substances/types";
import { checkPressure, checkTemperature, checkTemperatureCoverage } from "./validate";

/** Phase words of the design. */
export type PhaseName = "solid" | "liquid" | "vapor" | "gas" | "supercritical fluid";

/** The phase at a state, with the finer label and, for solids, which solid. */
export interface PhaseState {
  /** The phase, or two phases joined by " + " exactly on a coexistence curve. */
  readonly phase: PhaseName | "solid + liquid" | "liquid + vapor" | "solid + vapor";
  /** The finer label: "ice Ih" … "ice VII", "compressed liquid", "superheated vapor", … */
  readonly detail: string;
  /** The curve branch that decided a solid, melting or sublimation state. */
  readonly branch?: CurveBranch;
}

/** Triple point (T, p) of a substance, or undefined for one without (helium-4). */
function triplePointIfAny(substance: SubstanceDefinition): { temperatureK: number; pressurePa: number } | undefined {
  const tt = substance.constants.tripleTemperature;
  const pt = substance.constants.triplePressure;
  if (!tt || !pt) {
    if (substance.noTriplePoint === undefined) throw new Error(`${substance.id} lacks a triple point`);
    return undefined;
  }
  return { temperatureK: tt.value, pressurePa: pt.value };
}

/**
 * Triple point (T, p) of a substance.
 * @throws NoSuchStateError for a substance without one (helium-4), saying why.
 */
export function triplePoint(substance: SubstanceDefinition): { temperatureK: number; pressurePa: number } {
  const triple = triplePointIfAny(substance);
  if (!triple) {
    throw new NoSuchStateError([
      `${substance.name} has no solid–liquid–vapor triple point: ${substance.noTriplePoint ?? ""}`,
    ]);
  }
  return triple;
}

/** Critical point (T, p) of a substance. */
export function criticalPoint(substance: SubstanceDefinition): { temperatureK: number; pressurePa: number } {
  const tc = substance.constants.criticalTemperature;
  const pc = substance.constants.criticalPressure;
  if (!tc || !pc) throw new Error(`${substance.id} lacks a critical point`);
  return { temperatureK: tc.value, pressurePa: pc.value };
}

function requireSublimation(substance: SubstanceDefinition): CurveBranch {
  const branch = substance.curves.sublimation;
  if (!branch) {
    throw new NoSuchStateError([`no sublimation curve is available for ${substance.name}`]);
  }
  return branch;
}

/**
 * Pressure at which vapour coexists with the condensed phase stable at T: the boiling curve from
 * the triple to the critical temperature, the sublimation curve below the triple point.
 */
export function saturationPressure(substance: SubstanceDefinition, temperatureK: number): number {
  checkTemperature(temperatureK);
  const triple = triplePointIfAny(substance);
  const critical = criticalPoint(substance);
  if (!atMost(temperatureK, critical.temperatureK)) {
    throw new NoSuchStateError([
      "temperature ",
      q.T(temperatureK),
      ` is above the critical temperature of ${substance.name} (`,
      q.T(critical.temperatureK),
      "): liquid and vapor no longer coexist; the fluid is gas or supercritical fluid (PHASE.STATE)",
    ]);
  }
  if (!triple || temperatureK >= triple.temperatureK) {
    return pressureOnBranch(substance.curves.boiling, temperatureK, substance.name);
  }
  return pressureOnBranch(requireSublimation(substance), temperatureK, substance.name);
}

/**
 * The inverse of {@link saturationPressure}: boiling temperature between the triple and the
 * critical pressure, sublimation temperature below the triple-point pressure.
 */
export function saturationTemperature(substance: SubstanceDefinition, pressurePa: number): number {
  checkPressure(pressurePa);
  const triple = triplePointIfAny(substance);
  const critical = criticalPoint(substance);
  // The boiling equation may end a rounding hair above p_c (see its pressure range).
  if (pressurePa > Math.max(critical.pressurePa, branchPressureRange(substance.curves.boiling)[1])) {
    throw new NoSuchStateError([
      "pressure ",
      q.p(pressurePa),
      ` is above the critical pressure of ${substance.name} (`,
      q.p(critical.pressurePa),
      "): there is no boiling; liquid turns into supercritical fluid without a phase change",
    ]);
  }
  if (!triple || pressurePa > triple.pressurePa) {
    return temperatureOnBranch(substance.curves.boiling, pressurePa, substance.name);
  }
  return temperatureOnBranch(requireSublimation(substance), pressurePa, substance.name);
}

/** Highest pressure any melting branch reaches, Pa. */
function meltingPressureCeiling(substance: SubstanceDefinition): number {
  return Math.max(...substance.curves.melting.map((branch) => branchPressureRange(branch)[1]));
}

/**
 * The error for a melting temperature or pressure asked of a substance without a published
 * melting curve: the triple point is the only known point of its melting line.
 */
function noMeltingCurve(substance: SubstanceDefinition): NoSuchStateError {
  const triple = triplePointIfAny(substance);
  if (!triple) {
    return new NoSuchStateError([
      `no melting curve is published for ${substance.name} in Phasecell's sources (it has no ` +
        `triple point: ${substance.noTriplePoint ?? ""}); PHASE.SOURCE with "state" explains what ` +
        "the phase map assumes",
    ]);
  }
  return new NoSuchStateError([
    `no melting curve is published for ${substance.name} in Phasecell's sources: the only known ` +
      "point of its melting line is the triple point (",
    q.T(triple.temperatureK),
    ", ",
    q.p(triple.pressurePa),
    "); at higher pressures it melts at a somewhat higher temperature that Phasecell cannot give " +
      "(PHASE.SOURCE with \"state\" explains the bound it uses)",
  ]);
}

/**
 * The bound that stands in for an unpublished melting line (see MeltingBound).
 * @throws Error when a substance without melting curves lacks it (a definition fault).
 */
function meltingBoundOf(substance: SubstanceDefinition): MeltingBound {
  if (!substance.meltingBound) throw new Error(`${substance.id} has no melting curve and no melting bound`);
  return substance.meltingBound;
}

/**
 * The phase at a pressure at or above the triple-point pressure of a substance without a
 * published melting curve. Its melting temperature rises with pressure from the triple point
 * no faster than the bound, so colder than the triple point is solid, warmer than the bound's
 * line is fluid, and between the two the phase is not decided.
 */
function phaseWithoutMeltingCurve(substance: SubstanceDefinition, temperatureK: number, pressurePa: number): PhaseState {
  const bound = meltingBoundOf(substance);
  if (bound.fluidBelowPa !== undefined && pressurePa < bound.fluidBelowPa) {
    return fluidState(substance, temperatureK, pressurePa);
  }
  const solidBelowAnchor = bound.solidBelowAnchor ?? true;
  if (solidBelowAnchor && temperatureK === bound.anchorK && pressurePa === bound.anchorPa) {
    return { phase: "solid + liquid", detail: "solid + liquid" };
  }
  if (solidBelowAnchor && temperatureK <= bound.anchorK) return { phase: "solid", detail: "solid" };
  const warmestSolidK = bound.anchorK + bound.maxSlope * Math.max(0, pressurePa - bound.anchorPa);
  if (temperatureK <= warmestSolidK) {
    throw new OutOfRangeError([
      "temperature ",
      q.T(temperatureK),
      " at ",
      q.p(pressurePa),
      ` may lie on either side of the melting line of ${substance.name}: no melting curve is ` +
        `published in Phasecell's sources, and ${solidBelowAnchor ? "between the triple-point temperature (" : "below "}`,
      ...(solidBelowAnchor ? [q.T(bound.anchorK), ") and "] : []),
      q.T(warmestSolidK),
      ` at this pressure ${substance.name} may be solid or liquid (${bound.basis}); ` +
        (solidBelowAnchor ? "states colder than the triple point are solid, warmer than the upper limit fluid" : "warmer states are fluid"),
    ]);
  }
  return fluidState(substance, temperatureK, pressurePa);
}

/** The melting branch whose pressure band holds p; `seamK` set inside a seam (see below). */
interface MeltingBand {
  readonly branch: CurveBranch;
  readonly seamK?: number;
}

/**
 * The melting branch whose pressure band holds p.
 * Neighbouring published equations meet at solid–solid–liquid triple points only to their
 * printed digits (for water the ice V equation ends at 632.3993 MPa, the ice VI equation starts
 * at 632.4 MPa); a pressure inside such a seam melts at the triple-point temperature the two
 * equations share, which is exact to the equations' own mismatch.
 */
function meltingBandAt(substance: SubstanceDefinition, pressurePa: number): MeltingBand {
  const triple = triplePointIfAny(substance);
  if (!triple) throw noMeltingCurve(substance);
  if (pressurePa < triple.pressurePa) {
    throw new NoSuchStateError([
      "pressure ",
      q.p(pressurePa),
      ` is below the triple-point pressure of ${substance.name} (`,
      q.p(triple.pressurePa),
      "): no liquid exists, so nothing melts; the solid sublimes at PHASE.SATTEMP",
    ]);
  }
  const branches = substance.curves.melting;
  if (branches.length === 0) throw noMeltingCurve(substance);
  for (const branch of branches) {
    if (branchCoversPressure(branch, pressurePa)) return { branch };
  }
  for (let i = 0; i + 1 < branches.length; i++) {
    const lower = branches[i]!;
    const upper = branches[i + 1]!;
    if (pressurePa > branchPressureRange(lower)[1] && pressurePa < branchPressureRange(upper)[0]) {
      return { branch: upper, seamK: upper.tMin === lower.tMax || upper.tMin === lower.tMin ? upper.tMin : upper.tMax };
    }
  }
  const last = branches[branches.length - 1]!;
  throw new OutOfRangeError([
    "pressure ",
    q.p(pressurePa),
    ` is above the highest melting pressure covered for ${substance.name} (`,
    q.p(meltingPressureCeiling(substance)),
    `, ${branchLabel(last)} at `,
    q.T(last.tMax),
    `, ${citation(last.model.source).short})`,
  ]);
}

/**
 * Where T lies against the melting temperature of the band: negative below (solid), zero on the
 * curve, positive above (fluid). Compares pressures on the monotonic branch instead of solving
 * for the melting temperature, which gives the same answer at a fraction of the cost.
 */
function sideOfMeltingCurve(band: MeltingBand, temperatureK: number, pressurePa: number): number {
  if (band.seamK !== undefined) return Math.sign(temperatureK - band.seamK);
  const branch = band.branch;
  if (temperatureK < branch.tMin) return -1;
  if (temperatureK > branch.tMax) return 1;
  const rising = branch.pressure(branch.tMax) > branch.pressure(branch.tMin);
  const curvePa = branch.pressure(temperatureK);
  return rising ? Math.sign(curvePa - pressurePa) : Math.sign(pressurePa - curvePa);
}

/** Melting temperature at pressure p, through whichever solid is stable at p. */
export function meltingTemperature(substance: SubstanceDefinition, pressurePa: number): number {
  checkPressure(pressurePa);
  const band = meltingBandAt(substance, pressurePa);
  return band.seamK ?? temperatureOnBranch(band.branch, pressurePa, substance.name);
}

/** The solid forms with a melting curve, e.g. ["ice Ih", "ice III", …] or ["solid"]. */
export function meltingForms(substance: SubstanceDefinition): string[] {
  return substance.curves.melting.map((branch) => branch.solid ?? "solid");
}

function findForm(substance: SubstanceDefinition, form: string): CurveBranch {
  const folded = foldName(form);
  const found = substance.curves.melting.find((branch) => {
    const name = foldName(branch.solid ?? "solid");
    return name === folded || name === `ice${folded}`;
  });
  if (!found) {
    throw new BadInputError([
      `"${form}" is not a solid form with a melting curve for ${substance.name}; use one of: ` +
        meltingForms(substance).join(", "),
    ]);
  }
  return found;
}

/**
 * Melting pressure at T. Where several solids melt at one temperature (water between 251.165 K
 * and 273.31 K), the lowest-pressure branch unless `form` names another.
 */
export function meltingPressure(substance: SubstanceDefinition, temperatureK: number, form?: string): number {
  checkTemperature(temperatureK);
  if (substance.curves.melting.length === 0) throw noMeltingCurve(substance);
  if (form !== undefined && form.trim() !== "") {
    const branch = findForm(substance, form);
    if (!branchCoversTemperature(branch, temperatureK)) {
      throw new NoSuchStateError([
        "temperature ",
        q.T(temperatureK),
        ` is outside the ${substance.name} ${branchLabel(branch)} (`,
        q.T(branch.tMin),
        " to ",
        q.T(branch.tMax),
        `, ${citation(branch.model.source).short}): ${branch.solid ?? "the solid"} does not melt ` +
          "at this temperature; omit the form for the stable one",
      ]);
    }
    return branch.pressure(temperatureK);
  }
  const covering = substance.curves.melting.filter((branch) => branchCoversTemperature(branch, temperatureK));
  if (covering.length === 0) {
    const lowest = Math.min(...substance.curves.melting.map((branch) => branch.tMin));
    const highest = Math.max(...substance.curves.melting.map((branch) => branch.tMax));
    if (temperatureK < lowest) {
      throw new NoSuchStateError([
        "temperature ",
        q.T(temperatureK),
        ` is below the lowest melting temperature of ${substance.name} (`,
        q.T(lowest),
        `, ${citation(substance.curves.melting[0]!.model.source).short}): the liquid is not ` +
          "stable at any pressure there, so nothing melts",
      ]);
    }
    throw new OutOfRangeError([
      "temperature ",
      q.T(temperatureK),
      ` is above the highest temperature of the published ${substance.name} melting curves (`,
      q.T(highest),
      `, ${citation(substance.curves.melting[substance.curves.melting.length - 1]!.model.source).short})`,
    ]);
  }
  return Math.min(...covering.map((branch) => branch.pressure(temperatureK)));
}

/** The phase of a substance at (T, p). */
export function phaseAt(substance: SubstanceDefinition, temperatureK: number, pressurePa: number): PhaseState {
  checkTemperature(temperatureK);
  checkPressure(pressurePa);
  checkTemperatureCoverage(substance, temperatureK);
  const triple = triplePointIfAny(substance);
  if (!triple) return phaseWithoutTriplePoint(substance, temperatureK, pressurePa);
  const critical = criticalPoint(substance);

  if (pressurePa < triple.pressurePa) {
    if (temperatureK >= triple.temperatureK) return fluidState(substance, temperatureK, pressurePa);
    const branch = requireSublimation(substance);
    const solid = branch.solid ?? "solid";
    if (temperatureK < branch.tMin) {
      // Sublimation pressure rises with temperature, so a pressure above its value at the
      // equation's lowest temperature lies above the curve at every lower temperature too.
      if (pressurePa > branch.pressure(branch.tMin)) return { phase: "solid", detail: solid, branch };
      throw new OutOfRangeError([
        "temperature ",
        q.T(temperatureK),
        ` is below the ${substance.name} sublimation curve's range (`,
        q.T(branch.tMin),
        " to ",
        q.T(branch.tMax),
        `, ${citation(branch.model.source).short}) and the pressure is too low to decide the phase`,
      ]);
    }
    const sublimationPa = branch.pressure(temperatureK);
    if (pressurePa > sublimationPa) return { phase: "solid", detail: solid, branch };
    if (pressurePa === sublimationPa) return { phase: "solid + vapor", detail: `${solid} + vapor`, branch };
    return { phase: "vapor", detail: "superheated vapor" };
  }

  if (substance.curves.melting.length === 0) return phaseWithoutMeltingCurve(substance, temperatureK, pressurePa);
  const band = meltingBandAt(substance, pressurePa);
  const solid = band.branch.solid ?? "solid";
  const side = sideOfMeltingCurve(band, temperatureK, pressurePa);
  if (side < 0) return { phase: "solid", detail: solid, branch: band.branch };
  if (side === 0) return { phase: "solid + liquid", detail: `${solid} + liquid`, branch: band.branch };
  if (temperatureK >= critical.temperatureK) return fluidState(substance, temperatureK, pressurePa);
  if (temperatureK < triple.temperatureK) return { phase: "liquid", detail: "compressed liquid" };
  return fluidState(substance, temperatureK, pressurePa);
}

/**
 * The phase of a substance without a triple point (helium-4): fluid wherever the melting bound
 * allows, decided by its boiling curve and critical point; nothing below the boiling curve's
 * lowest temperature.
 */
function phaseWithoutTriplePoint(substance: SubstanceDefinition, temperatureK: number, pressurePa: number): PhaseState {
  const boiling = substance.curves.boiling;
  if (!atLeast(temperatureK, boiling.tMin)) {
    throw new OutOfRangeError([
      "temperature ",
      q.T(temperatureK),
      ` is below the lowest temperature Phasecell covers for ${substance.name} (`,
      q.T(boiling.tMin),
      `, the ${branchLabel(boiling)}'s range, ${citation(boiling.model.source).short})`,
    ]);
  }
  if (substance.curves.melting.length === 0) return phaseWithoutMeltingCurve(substance, temperatureK, pressurePa);
  return fluidState(substance, temperatureK, pressurePa);
}

function fluidState(substance: SubstanceDefinition, temperatureK: number, pressurePa: number): PhaseState {
  const critical = criticalPoint(substance);
  if (temperatureK >= critical.temperatureK) {
    return pressurePa >= critical.pressurePa
      ? { phase: "supercritical fluid", detail: "supercritical fluid" }
      : { phase: "gas", detail: "gas" };
  }
  const boilingPa = pressureOnBranch(substance.curves.boiling, temperatureK, substance.name);
  if (pressurePa > boilingPa) return { phase: "liquid", detail: "compressed liquid" };
  if (pressurePa === boilingPa) return { phase: "liquid + vapor", detail: "saturated liquid + vapor" };
  return { phase: "vapor", detail: "superheated vapor" };
}
