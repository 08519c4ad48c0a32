/**
 * The data of the phase diagram: a substance's sublimation, boiling and melting curves sampled
 * from core's own branch functions (in SI, then converted to the display units), the triple and
 * critical points, where each phase's name goes, the supercritical region's outline, and the
 * windows the diagram can zoom to. State points typed by the user are placed with core's
 * phaseAt. No DOM and no physics of its own, so it runs in Node tests.
 */
import { formatNumber, PhaseError } from "../../core/errors";
import { criticalPoint, meltingPressure, phaseAt, triplePoint } from "../../core/phase";
import type { Boundary, CurveBranch, SubstanceDefinition } from "../../core/substances/types";
import { fromSI, toSI, unitSymbol, type UnitSystem } from "../../core/units/units";
import { formatterFor } from "../../functions/excel-error";
import { parseTypedNumber } from "./path-input";

/** A point of the diagram in display units (temperature, absolute pressure). */
export interface DiagramPoint {
  readonly t: number;
  readonly p: number;
}

/** One branch of a coexistence curve as drawn. */
export interface DiagramCurve {
  /** Unique within the diagram, usable in element ids ("melting-ice-III"). */
  readonly id: string;
  readonly boundary: Boundary;
  /** The solid on a melting or sublimation branch, as core names it. */
  readonly solid?: string;
  /** "boiling curve", "melting curve, ice III", … */
  readonly label: string;
  /** The published correlation that gives this branch (its model name in core). */
  readonly source: string;
  /** Samples ordered by temperature, every one p = branch.pressure(T) of core, converted. */
  readonly points: readonly DiagramPoint[];
}

/** The triple or the critical point, with its label in display units. */
export interface DiagramMarker {
  readonly kind: "triple" | "critical";
  readonly name: string;
  readonly t: number;
  readonly p: number;
  /** Values with units, e.g. "273.16 K, 611.657 Pa". */
  readonly values: string;
}

/** A window of the diagram: temperature range (linear) and pressure range (logarithmic). */
export interface DiagramWindow {
  readonly t: readonly [number, number];
  readonly p: readonly [number, number];
}

/** The zoom choices. */
export type ZoomId = "full" | "triple" | "critical";

export const ZOOMS: readonly { readonly id: ZoomId; readonly label: string }[] = [
  { id: "full", label: "Full range" },
  { id: "triple", label: "Near the triple point" },
  { id: "critical", label: "Near the critical point" },
];

/** Where a phase's name is written in a window. */
export interface RegionLabel {
  readonly text: string;
  readonly t: number;
  readonly p: number;
}

/** Everything the renderer needs. */
export interface PhaseDiagramData {
  readonly substanceName: string;
  readonly temperatureUnit: string;
  readonly pressureUnit: string;
  readonly curves: readonly DiagramCurve[];
  readonly markers: readonly DiagramMarker[];
  /** Windows by zoom; a zoom without a window (no triple point) is not offered. */
  readonly windows: Readonly<Partial<Record<ZoomId, DiagramWindow>>>;
  /** Phase names per window, placed where core's phaseAt says that phase is. */
  readonly regions: Readonly<Partial<Record<ZoomId, readonly RegionLabel[]>>>;
  /** Outline of the supercritical region (T ≥ Tc, p ≥ Pc, below any melting curve), full window. */
  readonly supercritical: readonly DiagramPoint[];
  /** What is not drawn, and why. */
  readonly notes: readonly string[];
}

/** Samples per branch: evenly in temperature, and as many again evenly in log pressure. */
const SAMPLES = 64;
/** A branch is sampled in log pressure too when its pressure spans more than this ratio. */
const LOG_SAMPLING_RATIO = 10;
/** The full window shows at most this many decades below the lowest boiling pressure. */
const DECADES_BELOW_BOILING = 8;

/** A message as a sentence: capital first letter, full stop at the end. */
function sentence(message: string): string {
  const text = message.trim();
  const capital = `${text.charAt(0).toUpperCase()}${text.slice(1)}`;
  return /[.!?]$/.test(capital) ? capital : `${capital}.`;
}

function branchLabel(branch: CurveBranch): string {
  const base = `${branch.boundary} curve`;
  return branch.solid && branch.solid !== "solid" ? `${base}, ${branch.solid}` : base;
}

/** Temperature, K, at which a monotonic branch reaches `pressurePa` (bisection on core's p(T)). */
function temperatureAtPressure(branch: CurveBranch, pressurePa: number): number {
  let low = branch.tMin;
  let high = branch.tMax;
  const rising = branch.pressure(high) > branch.pressure(low);
  for (let i = 0; i < 80; i += 1) {
    const middle = (low + high) / 2;
    const below = branch.pressure(middle) < pressurePa;
    if (below === rising) low = middle;
    else high = middle;
  }
  return (low + high) / 2;
}

/**
 * Sample temperatures, K, of a branch: evenly spaced over its range and, where its pressure spans
 * decades, also at evenly log-spaced pressures, so that both the flat and the steep parts are
 * smooth on a log-pressure axis. Ends included, sorted, no repeats.
 */
export function sampleTemperatures(branch: CurveBranch): number[] {
  const temperatures = new Set<number>();
  for (let i = 0; i <= SAMPLES; i += 1) {
    temperatures.add(i === SAMPLES ? branch.tMax : branch.tMin + ((branch.tMax - branch.tMin) * i) / SAMPLES);
  }
  const pA = branch.pressure(branch.tMin);
  const pB = branch.pressure(branch.tMax);
  const [pLow, pHigh] = pA < pB ? [pA, pB] : [pB, pA];
  if (pLow > 0 && pHigh / pLow > LOG_SAMPLING_RATIO) {
    const span = Math.log10(pHigh / pLow);
    for (let i = 1; i < SAMPLES; i += 1) {
      temperatures.add(temperatureAtPressure(branch, pLow * 10 ** ((span * i) / SAMPLES)));
    }
  }
  return [...temperatures].sort((a, b) => a - b);
}

function curveOf(branch: CurveBranch, id: string, system: UnitSystem): DiagramCurve {
  const points = sampleTemperatures(branch)
    .map((temperatureK) => ({ temperatureK, pressurePa: branch.pressure(temperatureK) }))
    .filter((s) => s.pressurePa > 0 && Number.isFinite(s.pressurePa))
    .map((s) => ({ t: fromSI(system, "temperature", s.temperatureK), p: fromSI(system, "pressure", s.pressurePa) }));
  return {
    id,
    boundary: branch.boundary,
    ...(branch.solid === undefined ? {} : { solid: branch.solid }),
    label: branchLabel(branch),
    source: branch.model.name,
    points,
  };
}

function idOf(branch: CurveBranch): string {
  return branch.solid && branch.solid !== "solid"
    ? `${branch.boundary}-${branch.solid.replace(/[^A-Za-z0-9]+/g, "-")}`
    : branch.boundary;
}

function pointText(system: UnitSystem, temperatureK: number, pressurePa: number): string {
  return `${formatNumber(fromSI(system, "temperature", temperatureK))} ${unitSymbol(system, "temperature")}, ${formatNumber(
    fromSI(system, "pressure", pressurePa),
  )} ${unitSymbol(system, "pressure")}`;
}

/** A window given in SI, converted. */
function windowOf(system: UnitSystem, tK: readonly [number, number], pPa: readonly [number, number]): DiagramWindow {
  return {
    t: [fromSI(system, "temperature", tK[0]), fromSI(system, "temperature", tK[1])],
    p: [fromSI(system, "pressure", pPa[0]), fromSI(system, "pressure", pPa[1])],
  };
}

/** The phase name of a region label: the phase, except solids named by their form (ice Ih…). */
function regionName(substance: SubstanceDefinition, temperatureK: number, pressurePa: number): string | null {
  try {
    const state = phaseAt(substance, temperatureK, pressurePa);
    if (state.phase.includes("+")) return null;
    return state.phase;
  } catch {
    return null;
  }
}

/**
 * Where each phase's name goes in a window: on a grid over the window (linear in T, logarithmic
 * in p), the grid point of that phase farthest from any point of another phase or of no answer.
 */
function regionLabels(substance: SubstanceDefinition, system: UnitSystem, tK: readonly [number, number], pPa: readonly [number, number]): RegionLabel[] {
  const n = 11;
  const grid: { i: number; j: number; tK: number; pPa: number; name: string | null }[] = [];
  for (let i = 1; i < n; i += 1) {
    for (let j = 1; j < n; j += 1) {
      const temperatureK = tK[0] + ((tK[1] - tK[0]) * i) / n;
      const pressurePa = pPa[0] * (pPa[1] / pPa[0]) ** (j / n);
      grid.push({ i, j, tK: temperatureK, pPa: pressurePa, name: regionName(substance, temperatureK, pressurePa) });
    }
  }
  const names = [...new Set(grid.map((g) => g.name).filter((name): name is string => name !== null))];
  return names.map((name) => {
    const own = grid.filter((g) => g.name === name);
    const others = grid.filter((g) => g.name !== name);
    const score = (g: (typeof grid)[number]) => {
      const fromOthers = Math.min(n, ...others.map((o) => Math.hypot(o.i - g.i, o.j - g.j)));
      // Away from the window's edges too (labels there are cut off).
      const fromEdges = Math.min(g.i, n - g.i, g.j, n - g.j);
      return Math.min(fromOthers, fromEdges + 0.5);
    };
    const best = own.reduce((a, b) => (score(b) > score(a) ? b : a));
    return { text: name, t: fromSI(system, "temperature", best.tK), p: fromSI(system, "pressure", best.pPa) };
  });
}

/** The diagram of a substance in a unit system. */
export function phaseDiagramData(substance: SubstanceDefinition, system: UnitSystem): PhaseDiagramData {
  const notes: string[] = [];
  const { sublimation, boiling, melting } = substance.curves;
  const branches = [...(sublimation ? [sublimation] : []), boiling, ...melting];
  const curves = branches.map((branch) => curveOf(branch, idOf(branch), system));

  const critical = criticalPoint(substance);
  let triple: { temperatureK: number; pressurePa: number } | undefined;
  try {
    triple = triplePoint(substance);
  } catch (error) {
    if (!(error instanceof PhaseError)) throw error;
    notes.push(sentence(`No triple point is marked: ${error.format(formatterFor(system))}`));
  }
  const markers: DiagramMarker[] = [];
  if (triple) {
    markers.push({
      kind: "triple",
      name: "Triple point",
      t: fromSI(system, "temperature", triple.temperatureK),
      p: fromSI(system, "pressure", triple.pressurePa),
      values: pointText(system, triple.temperatureK, triple.pressurePa),
    });
  }
  markers.push({
    kind: "critical",
    name: "Critical point",
    t: fromSI(system, "temperature", critical.temperatureK),
    p: fromSI(system, "pressure", critical.pressurePa),
    values: pointText(system, critical.temperatureK, critical.pressurePa),
  });
  if (!sublimation && triple) notes.push(`No sublimation curve is drawn: Phasecell has no published sublimation equation for ${substance.name}.`);
  if (melting.length === 0) {
    notes.push(
      `No melting curve is drawn: Phasecell has no published melting equation for ${substance.name}, so the solid–liquid boundary is not shown.`,
    );
  }

  // Full window in SI: every sampled point, but no more than a few decades below the boiling
  // curve's lowest pressure (a sublimation equation can reach 1e-40 Pa).
  const samplesSI = branches.flatMap((branch) =>
    sampleTemperatures(branch).map((temperatureK) => ({ temperatureK, pressurePa: branch.pressure(temperatureK) })),
  );
  const floorPa = boiling.pressure(boiling.tMin) / 10 ** DECADES_BELOW_BOILING;
  const shown = samplesSI.filter((s) => s.pressurePa >= floorPa);
  const lowPa = Math.max(floorPa, Math.min(...shown.map((s) => s.pressurePa)));
  const highPa = Math.max(critical.pressurePa * 10, ...shown.map((s) => s.pressurePa));
  const lowK = Math.min(...shown.map((s) => s.temperatureK));
  const highK = Math.max(critical.temperatureK * 1.2, ...shown.map((s) => s.temperatureK));
  const padK = (highK - lowK) * 0.04;
  const fullT: [number, number] = [Math.max(0.5 * lowK, lowK - padK), highK + padK];
  const fullP: [number, number] = [lowPa / 3, highPa * 3];
  if (sublimation && samplesSI.some((s) => s.pressurePa < floorPa)) {
    notes.push(
      `The sublimation curve continues below the diagram, down to ${pointText(system, sublimation.tMin, sublimation.pressure(sublimation.tMin))}.`,
    );
  }
  const windowsSI: Partial<Record<ZoomId, { t: [number, number]; p: [number, number] }>> = { full: { t: fullT, p: fullP } };
  if (triple) {
    windowsSI.triple = {
      t: [triple.temperatureK * 0.92, triple.temperatureK * 1.08],
      p: [triple.pressurePa / 30, triple.pressurePa * 30],
    };
  }
  windowsSI.critical = {
    t: [critical.temperatureK * 0.88, critical.temperatureK * 1.12],
    p: [critical.pressurePa / 10, critical.pressurePa * 10],
  };
  const windows: Partial<Record<ZoomId, DiagramWindow>> = {};
  const regions: Partial<Record<ZoomId, RegionLabel[]>> = {};
  for (const zoom of ZOOMS) {
    const w = windowsSI[zoom.id];
    if (!w) continue;
    windows[zoom.id] = windowOf(system, w.t, w.p);
    regions[zoom.id] = regionLabels(substance, system, w.t, w.p);
  }

  // Supercritical region: from the critical point to the right and upwards, capped by any
  // melting curve that reaches above the critical temperature (core's meltingPressure).
  const topPa = fullP[1];
  const rightK = Math.max(fullT[1], windowsSI.critical.t[1]);
  const upper: { temperatureK: number; pressurePa: number }[] = [];
  const steps = 48;
  for (let i = steps; i >= 0; i -= 1) {
    const temperatureK = critical.temperatureK + ((rightK - critical.temperatureK) * i) / steps;
    let pressurePa = topPa;
    try {
      pressurePa = Math.min(topPa, meltingPressure(substance, temperatureK));
    } catch {
      // No melting curve at this temperature: the region reaches the top of the diagram.
    }
    upper.push({ temperatureK, pressurePa: Math.max(pressurePa, critical.pressurePa) });
  }
  const outlineSI = [
    { temperatureK: critical.temperatureK, pressurePa: critical.pressurePa },
    { temperatureK: rightK, pressurePa: critical.pressurePa },
    ...upper,
  ];
  const supercritical = outlineSI.map((s) => ({ t: fromSI(system, "temperature", s.temperatureK), p: fromSI(system, "pressure", s.pressurePa) }));

  return {
    substanceName: substance.name,
    temperatureUnit: unitSymbol(system, "temperature"),
    pressureUnit: unitSymbol(system, "pressure"),
    curves,
    markers,
    windows,
    regions,
    supercritical,
    notes,
  };
}

/** A state point the user added, kept in SI so that it survives a change of display units. */
export interface StatePointSI {
  readonly temperatureK: number;
  readonly pressurePa: number;
}

/** A state point as drawn and listed. */
export interface StatePoint extends DiagramPoint {
  readonly number: number;
  /** Core's phase word and finer label, e.g. "liquid (compressed liquid)". */
  readonly phase: string;
  readonly values: string;
}

/** Outcome of reading a typed state point. */
export type StatePointOutcome =
  | { readonly ok: true; readonly point: StatePointSI }
  | { readonly ok: false; readonly field?: "t" | "p"; readonly message: string };

/** Reads a typed temperature and absolute pressure (display units) and checks core can place it. */
export function readStatePoint(substance: SubstanceDefinition, system: UnitSystem, tText: string, pText: string): StatePointOutcome {
  const fields = [
    { field: "t" as const, text: tText, label: "Temperature", dimension: "temperature" as const },
    { field: "p" as const, text: pText, label: "Pressure", dimension: "pressure" as const },
  ];
  const numbers: number[] = [];
  for (const spec of fields) {
    const value = parseTypedNumber(spec.text);
    if (value === null) {
      const typed = spec.text.trim();
      const what = typed === "" ? "is empty" : `"${typed}" is not a number`;
      return {
        ok: false,
        field: spec.field,
        message: `${spec.label} ${what}: enter a number in ${unitSymbol(system, spec.dimension)} (decimal point, e.g. 1.5).`,
      };
    }
    numbers.push(value);
  }
  const point = { temperatureK: toSI(system, "temperature", numbers[0]!), pressurePa: toSI(system, "pressure", numbers[1]!) };
  try {
    phaseAt(substance, point.temperatureK, point.pressurePa);
    return { ok: true, point };
  } catch (error) {
    if (error instanceof PhaseError) {
      const message = sentence(error.format(formatterFor(system, substance.constants.molarMass?.value)));
      const field = /pressure/i.test(message.split(/[:(]/)[0] ?? "") ? "p" : /temperature/i.test(message) ? "t" : undefined;
      return field === undefined ? { ok: false, message } : { ok: false, field, message };
    }
    const detail = error instanceof Error ? error.message : String(error);
    return { ok: false, message: `Phasecell could not place this state (internal: ${detail}). Please report the inputs.` };
  }
}

/** The state points in display units, numbered, each with core's phase; none that core cannot place. */
export function statePoints(substance: SubstanceDefinition, system: UnitSystem, points: readonly StatePointSI[]): StatePoint[] {
  return points.flatMap((point, index): StatePoint[] => {
    try {
      const state = phaseAt(substance, point.temperatureK, point.pressurePa);
      const phase = state.detail && state.detail !== state.phase ? `${state.phase} (${state.detail})` : state.phase;
      return [
        {
          number: index + 1,
          t: fromSI(system, "temperature", point.temperatureK),
          p: fromSI(system, "pressure", point.pressurePa),
          phase,
          values: pointText(system, point.temperatureK, point.pressurePa),
        },
      ];
    } catch {
      return [];
    }
  });
}
