/**
 * The data of a heating or cooling curve: one segment per step of a path, temperature against
 * the heat added so far, in display units. Built either from core's steps (the pane's own path)
 * or from a PHASE.PATH table read from the workbook (path-table.ts); both give the same shape, so
 * one renderer draws them. No DOM, so it runs in Node tests.
 */
import type { PathStep } from "../../core/path";
import { fromSI, unitSymbol, type UnitSystem } from "../../core/units/units";

/**
 * How a segment is drawn: by the phase it heats or cools, or as a phase change. Each has its own
 * colour, dash pattern and marker shape, so that none relies on colour alone.
 */
export type SegmentStyle = "solid" | "liquid" | "vapor" | "supercritical" | "change";

/** Legend order and wording of the styles. */
export const SEGMENT_STYLES: readonly { readonly style: SegmentStyle; readonly label: string }[] = [
  { style: "solid", label: "solid" },
  { style: "liquid", label: "liquid" },
  { style: "vapor", label: "vapor or gas" },
  { style: "supercritical", label: "supercritical fluid" },
  { style: "change", label: "phase change (constant temperature)" },
];

/** One step of the path as drawn. Temperatures and energies are in the data's units. */
export interface PathSegment {
  /** Step number, from 1, as in the "step" column of PHASE.PATH. */
  readonly step: number;
  /** What happens, in core's words ("heat ice Ih", "melt", …). */
  readonly action: string;
  readonly kind: "sensible" | "latent";
  /** The phase heated or cooled ("ice Ih", "liquid", …); "phase change" for a latent step. */
  readonly phase: string;
  readonly style: SegmentStyle;
  readonly fromT: number;
  readonly toT: number;
  /** Heat of this step (negative when removed). */
  readonly energy: number;
  /** Heat added before this step, and after it (the step's running total). */
  readonly startTotal: number;
  readonly endTotal: number;
}

/** A path ready to draw. */
export interface PathChartData {
  readonly segments: readonly PathSegment[];
  /** Unit symbols of the axes; empty when the units are not known (a table whose formula is unreadable). */
  readonly temperatureUnit: string;
  readonly energyUnit: string;
  /** Said instead of a chart when there is nothing to draw (T1 equals T2). */
  readonly note?: string;
}

/** Phase word that a segment heats or cools → its style. Core names solids by their form (ice Ih…). */
export function styleOfPhase(phase: string): Exclude<SegmentStyle, "change"> {
  switch (phase) {
    case "liquid":
      return "liquid";
    case "vapor":
    case "gas":
      return "vapor";
    case "supercritical fluid":
      return "supercritical";
    default:
      return "solid";
  }
}

/** Wording of a step that does nothing, as PHASE.PATH prints it. */
export const NO_CHANGE_NOTE = "no change (T1 equals T2)";

/**
 * Chart data of core's steps in the given units. The running totals are summed in SI and then
 * converted, exactly as PHASE.PATH computes its "running total" column.
 */
export function chartFromSteps(steps: readonly PathStep[], system: UnitSystem): PathChartData {
  let totalJ = 0;
  let startTotal = 0;
  const segments = steps.map((step, index): PathSegment => {
    totalJ += step.energyJ;
    const endTotal = fromSI(system, "energy", totalJ);
    const segment: PathSegment = {
      step: index + 1,
      action: step.action,
      kind: step.kind,
      phase: step.kind === "latent" ? "phase change" : step.phase,
      style: step.kind === "latent" ? "change" : styleOfPhase(step.phase),
      fromT: fromSI(system, "temperature", step.fromK),
      toT: fromSI(system, "temperature", step.toK),
      energy: fromSI(system, "energy", step.energyJ),
      startTotal,
      endTotal,
    };
    startTotal = endTotal;
    return segment;
  });
  const base = {
    segments,
    temperatureUnit: unitSymbol(system, "temperature"),
    energyUnit: unitSymbol(system, "energy"),
  };
  return segments.length === 0 ? { ...base, note: NO_CHANGE_NOTE } : base;
}

/** The heat added over the whole path (the last running total; 0 for no steps). */
export function totalEnergy(data: PathChartData): number {
  return data.segments.at(-1)?.endTotal ?? 0;
}

/** "heating" when heat is added over the path, "cooling" when it is removed. */
export function curveWordOf(data: PathChartData): "heating" | "cooling" {
  return totalEnergy(data) < 0 ? "cooling" : "heating";
}

/** The styles a path uses, in legend order, each with the phases drawn in it. */
export function legendEntries(data: PathChartData): { style: SegmentStyle; label: string; phases: string[] }[] {
  return SEGMENT_STYLES.flatMap(({ style, label }) => {
    const phases = [...new Set(data.segments.filter((s) => s.style === style).map((s) => s.phase))];
    return phases.length === 0 ? [] : [{ style, label, phases }];
  });
}
