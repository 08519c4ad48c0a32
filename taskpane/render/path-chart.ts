/**
 * The heating or cooling curve: temperature (y) against the heat added so far (x), one segment per
 * step, drawn with d3 (scales, axes, line and marker shapes). Sensible steps slope, phase changes
 * run flat. Every segment carries its step number beside a marker at its middle; colour, dash
 * pattern and marker shape all tell the styles apart, and an HTML legend names them. Colours and
 * dashes come from the stylesheet (classes only, no inline styles: the page's CSP allows none).
 *
 * The x axis runs from the start of the path (0) to its end (the total), so a cooling curve also
 * reads left to right, with negative values (heat removed).
 */
import { axisBottom, axisLeft } from "d3-axis";
import { scaleLinear } from "d3-scale";
import { select } from "d3-selection";
import { line, symbol, symbolCircle, symbolCross, symbolDiamond, symbolSquare, symbolTriangle, type SymbolType } from "d3-shape";
import { formatNumber } from "../../core/errors";
import { curveWordOf, legendEntries, totalEnergy, type PathChartData, type PathSegment, type SegmentStyle } from "../data/path-chart";
import { el } from "./dom";

const SVG_NS = "http://www.w3.org/2000/svg";

/** Drawing size in user units; the SVG scales to the pane's width. */
export const CHART_WIDTH = 320;
export const CHART_HEIGHT = 240;
const MARGIN = { top: 28, right: 18, bottom: 46, left: 48 } as const;
/** Gap between the axes and the drawing area, user units. */
const INSET = 6;
/** Distance of a step number from its segment's middle, user units. */
const LABEL_OFFSET = 11;

const MARKERS: Readonly<Record<SegmentStyle, SymbolType>> = {
  solid: symbolSquare,
  liquid: symbolCircle,
  vapor: symbolTriangle,
  supercritical: symbolCross,
  change: symbolDiamond,
};
const MARKER_AREA = 46;

type Point = readonly [number, number];

/** What the chart is called and how its element ids are prefixed. */
export interface PathChartOptions {
  readonly idPrefix: string;
  /** Short title, read first by screen readers ("Heating curve of water"). */
  readonly title: string;
}

function unitSuffix(unit: string): string {
  return unit ? `, ${unit}` : "";
}

/** The text alternative: every step with its temperatures and heat, in order. */
export function chartDescription(data: PathChartData): string {
  const t = data.temperatureUnit ? ` ${data.temperatureUnit}` : "";
  const e = data.energyUnit ? ` ${data.energyUnit}` : "";
  const steps = data.segments.map((s) =>
    s.kind === "latent"
      ? `${s.step}, ${s.action} at ${formatNumber(s.fromT)}${t}: ${formatNumber(s.energy)}${e}`
      : `${s.step}, ${s.action} from ${formatNumber(s.fromT)} to ${formatNumber(s.toT)}${t}: ${formatNumber(s.energy)}${e}`,
  );
  return `${data.segments.length} steps, ${formatNumber(totalEnergy(data))}${e} in all. ${steps.join("; ")}.`;
}

/**
 * Where a step number goes: off the segment's middle along its normal, on whichever side keeps
 * it inside the plot and farther from the other segments' middles.
 */
function labelPosition(middle: Point, a: Point, b: Point, plot: { x0: number; x1: number; y0: number; y1: number }, others: readonly Point[]): Point {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const length = Math.hypot(dx, dy) || 1;
  // Normal pointing up (negative y) for a flat segment, up-left for a rising one.
  const nx = dy / length;
  const ny = -dx / length;
  const sign = ny > 0 || (ny === 0 && nx > 0) ? -1 : 1;
  const candidates: Point[] = [
    [middle[0] + sign * nx * LABEL_OFFSET, middle[1] + sign * ny * LABEL_OFFSET],
    [middle[0] - sign * nx * LABEL_OFFSET, middle[1] - sign * ny * LABEL_OFFSET],
  ];
  const margin = 6;
  const inside = (p: Point) => p[0] >= plot.x0 + margin && p[0] <= plot.x1 - margin && p[1] >= plot.y0 - 14 && p[1] <= plot.y1 - margin;
  const clearance = (p: Point) => Math.min(Infinity, ...others.map((o) => Math.hypot(o[0] - p[0], o[1] - p[1])));
  const usable = candidates.filter(inside);
  if (usable.length === 0) return candidates[0]!;
  if (usable.length === 1) return usable[0]!;
  return clearance(usable[0]!) >= Math.min(clearance(usable[1]!), 14) ? usable[0]! : usable[1]!;
}

function svgElement<K extends keyof SVGElementTagNameMap>(doc: Document, tag: K): SVGElementTagNameMap[K] {
  return doc.createElementNS(SVG_NS, tag);
}

/** A small sample of a style (line, dash and marker) for the legend. */
function swatch(doc: Document, style: SegmentStyle): SVGSVGElement {
  const svg = svgElement(doc, "svg");
  const root = select(svg)
    .attr("class", "swatch")
    .attr("viewBox", "0 0 40 16")
    .attr("width", 40)
    .attr("height", 16)
    .attr("aria-hidden", "true")
    .attr("focusable", "false");
  root.append("path").attr("class", `segment style-${style}`).attr("d", line()([[2, 8], [38, 8]]));
  root
    .append("path")
    .attr("class", `marker style-${style}`)
    .attr("transform", "translate(20,8)")
    .attr("d", symbol(MARKERS[style], MARKER_AREA)());
  return svg;
}

/** The legend: one entry per style the path uses. */
export function renderPathLegend(doc: Document, data: PathChartData): HTMLElement {
  return el(
    doc,
    "ul",
    { class: "path-legend", "aria-label": "Legend" },
    legendEntries(data).map((entry) =>
      el(doc, "li", { "data-style": entry.style }, [
        swatch(doc, entry.style),
        entry.style === "solid"
          ? `solid (${entry.phases.join(", ")})`
          : entry.style === "change"
            ? entry.label
            : entry.phases.join(", "),
      ]),
    ),
  );
}

/** The chart as an SVG element (no legend). */
export function renderPathSvg(doc: Document, data: PathChartData, options: PathChartOptions): SVGSVGElement {
  const svgNode = svgElement(doc, "svg");
  const titleId = `${options.idPrefix}-title`;
  const descId = `${options.idPrefix}-desc`;
  const total = totalEnergy(data);
  const svg = select(svgNode)
    .attr("class", `path-chart ${curveWordOf(data)}`)
    .attr("viewBox", `0 0 ${CHART_WIDTH} ${CHART_HEIGHT}`)
    .attr("role", "img")
    .attr("aria-labelledby", `${titleId} ${descId}`)
    .attr("data-steps", data.segments.length)
    .attr("data-total", String(total));
  svg.append("title").attr("id", titleId).text(options.title);
  svg.append("desc").attr("id", descId).text(chartDescription(data));

  const plot = { x0: MARGIN.left, x1: CHART_WIDTH - MARGIN.right, y0: MARGIN.top, y1: CHART_HEIGHT - MARGIN.bottom };
  const totals = [0, ...data.segments.flatMap((s) => [s.startTotal, s.endTotal])];
  const low = Math.min(...totals);
  const high = Math.max(...totals);
  // Left to right along the path: a cooling path (negative totals) gets a reversed domain.
  // The curve keeps a few units off the axes so that a steep first step is not hidden by the y
  // axis, nor a first or last point by the x axis.
  const x = scaleLinear()
    .domain(total < 0 ? [high, low] : [low, high === low ? low + 1 : high])
    .range([plot.x0 + INSET, plot.x1 - INSET]);
  const temperatures = data.segments.flatMap((s) => [s.fromT, s.toT]);
  const tLow = Math.min(...temperatures);
  const tHigh = Math.max(...temperatures);
  const y = scaleLinear()
    .domain(tLow === tHigh ? [tLow - 1, tHigh + 1] : [tLow, tHigh])
    .nice(6)
    .range([plot.y1 - INSET, plot.y0]);

  const xTicks = 4;
  const yTicks = 6;
  svg
    .append("g")
    .attr("class", "grid")
    .attr("aria-hidden", "true")
    .attr("transform", `translate(${plot.x0},0)`)
    .call(axisLeft(y).ticks(yTicks).tickSize(-(plot.x1 - plot.x0)).tickFormat(() => ""));
  svg
    .append("g")
    .attr("class", "axis axis-y")
    .attr("aria-hidden", "true")
    .attr("transform", `translate(${plot.x0},0)`)
    .call(axisLeft(y).ticks(yTicks).tickSizeOuter(0));
  svg
    .append("g")
    .attr("class", "axis axis-x")
    .attr("aria-hidden", "true")
    .attr("transform", `translate(0,${plot.y1})`)
    .call(axisBottom(x).ticks(xTicks).tickSizeOuter(0));
  svg
    .append("text")
    .attr("class", "axis-label axis-label-y")
    .attr("aria-hidden", "true")
    .attr("x", 4)
    .attr("y", 14)
    .text(`Temperature${unitSuffix(data.temperatureUnit)}`);
  svg
    .append("text")
    .attr("class", "axis-label axis-label-x")
    .attr("aria-hidden", "true")
    .attr("x", (plot.x0 + plot.x1) / 2)
    .attr("y", CHART_HEIGHT - 8)
    .attr("text-anchor", "middle")
    .text(`Heat ${total < 0 ? "removed (negative)" : "added"}${unitSuffix(data.energyUnit)}`);

  const ends = (s: PathSegment): [Point, Point] => [
    [x(s.startTotal), y(s.fromT)],
    [x(s.endTotal), y(s.toT)],
  ];
  const middles: Point[] = data.segments.map((s) => {
    const [a, b] = ends(s);
    return [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
  });
  const toLine = line();
  const segments = svg.append("g").attr("class", "segments").attr("aria-hidden", "true");
  const markers = svg.append("g").attr("class", "markers").attr("aria-hidden", "true");
  const labels = svg.append("g").attr("class", "step-labels").attr("aria-hidden", "true");
  data.segments.forEach((s, i) => {
    const [a, b] = ends(s);
    const middle = middles[i]!;
    segments
      .append("path")
      .attr("class", `segment style-${s.style}`)
      .attr("data-step", s.step)
      .attr("data-kind", s.kind)
      .attr("data-start-total", String(s.startTotal))
      .attr("data-end-total", String(s.endTotal))
      .attr("data-from", String(s.fromT))
      .attr("data-to", String(s.toT))
      .attr("d", toLine([a as [number, number], b as [number, number]]));
    markers
      .append("path")
      .attr("class", `marker style-${s.style}`)
      .attr("transform", `translate(${middle[0]},${middle[1]})`)
      .attr("d", symbol(MARKERS[s.style], MARKER_AREA)());
    const others = middles.filter((_, j) => j !== i);
    const at = labelPosition(middle, a, b, plot, others);
    labels
      .append("text")
      .attr("class", "step-label")
      .attr("x", at[0])
      .attr("y", at[1])
      .attr("text-anchor", "middle")
      .attr("dominant-baseline", "central")
      .text(String(s.step));
  });
  return svgNode;
}

/** Chart and legend in a figure; a note instead when there is nothing to draw. */
export function renderPathChart(doc: Document, data: PathChartData, options: PathChartOptions): HTMLElement {
  if (data.segments.length === 0) {
    return el(doc, "p", { class: "path-note" }, [`Nothing to draw: ${data.note ?? "the path has no steps"}.`]);
  }
  return el(doc, "figure", { class: "path-figure" }, [renderPathSvg(doc, data, options), renderPathLegend(doc, data)]);
}
