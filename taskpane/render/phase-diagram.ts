/**
 * The phase diagram: temperature (x, linear) against absolute pressure (y, logarithmic), drawn
 * with d3. Each coexistence curve has its own colour and dash pattern, the triple and critical
 * points their own marker shapes with their values beside them, the supercritical region a
 * hatch, and state points a numbered square. Each curve names its source on hover (an SVG title)
 * and in the HTML legend. Colours and dashes come from the stylesheet (classes only: the page's
 * CSP allows no inline styles); everything outside the window is clipped.
 */
import { axisBottom, axisLeft } from "d3-axis";
import { scaleLinear, scaleLog } from "d3-scale";
import { select } from "d3-selection";
import { line, symbol, symbolCircle, symbolCross, symbolDiamond, symbolSquare, type SymbolType } from "d3-shape";
import type { Boundary } from "../../core/substances/types";
import { formatNumber } from "../../core/errors";
import type { DiagramCurve, DiagramPoint, PhaseDiagramData, StatePoint, ZoomId } from "../data/phase-diagram";
import { el } from "./dom";

const SVG_NS = "http://www.w3.org/2000/svg";

/** Drawing size in user units; the SVG scales to the pane's width. */
export const DIAGRAM_WIDTH = 320;
export const DIAGRAM_HEIGHT = 300;
const MARGIN = { top: 24, right: 10, bottom: 40, left: 50 } as const;
const MARKER_AREA = 70;
const STATE_AREA = 56;
/** Approximate width of a character of the 11 px labels, user units (for keeping labels inside). */
const CHAR_WIDTH = 5.9;

const MARKERS: Readonly<Record<"triple" | "critical", SymbolType>> = { triple: symbolDiamond, critical: symbolCircle };

type Point = [number, number];

function svgElement<K extends keyof SVGElementTagNameMap>(doc: Document, tag: K): SVGElementTagNameMap[K] {
  return doc.createElementNS(SVG_NS, tag);
}

/** Tick label of a pressure: plain for ordinary magnitudes, 1e-6 style otherwise. */
export function pressureTick(value: number): string {
  const exponent = Math.round(Math.log10(value));
  if (Math.abs(value - 10 ** exponent) < 1e-9 * value && (exponent < -3 || exponent > 5)) return `1e${exponent}`;
  return formatNumber(value);
}

/** Pressure ticks: powers of ten, every n-th so that at most six show; d3's own for a short span. */
function pressureTicks(low: number, high: number): number[] {
  const first = Math.ceil(Math.log10(low) - 1e-9);
  const last = Math.floor(Math.log10(high) + 1e-9);
  const decades = last - first + 1;
  if (decades < 3) {
    const all = scaleLog().domain([low, high]).ticks(10);
    const mantissa = (v: number) => Math.round(v / 10 ** Math.floor(Math.log10(v) + 1e-9));
    for (const keep of [[1, 2, 5], [1, 3], [1]]) {
      const picked = all.filter((v) => keep.includes(mantissa(v)));
      if (picked.length <= 6 && picked.length >= 2) return picked;
    }
    return scaleLog().domain([low, high]).ticks(3);
  }
  const step = Math.max(1, Math.ceil(decades / 6));
  const ticks: number[] = [];
  for (let e = first; e <= last; e += step) ticks.push(10 ** e);
  return ticks;
}

/** The text alternative of the diagram. */
export function diagramDescription(data: PhaseDiagramData, points: readonly StatePoint[]): string {
  const parts = [
    `Pressure (${data.pressureUnit}, logarithmic) against temperature (${data.temperatureUnit}).`,
    ...data.markers.map((m) => `${m.name}: ${m.values}.`),
    `Curves: ${data.curves.map((c) => `${c.label} (${c.source})`).join("; ")}.`,
    "Supercritical fluid above the critical temperature and pressure.",
    ...points.map((p) => `State point ${p.number}: ${p.values}, ${p.phase}.`),
  ];
  return parts.join(" ");
}

/** What the diagram is called, how its ids are prefixed, and which window it shows. */
export interface PhaseDiagramOptions {
  readonly idPrefix: string;
  readonly zoom: ZoomId;
  /** A selected PATH result: its isobar and phase changes, in display units. */
  readonly path?: { readonly from: DiagramPoint; readonly to: DiagramPoint; readonly crossings: readonly DiagramPoint[] };
}

function curveClass(boundary: Boundary): string {
  return `pd-curve pd-${boundary}`;
}

/** A small sample of a curve style or marker for the legend. */
function swatch(doc: Document, kind: Boundary | "triple" | "critical" | "supercritical" | "state"): SVGSVGElement {
  const svg = svgElement(doc, "svg");
  const root = select(svg)
    .attr("class", "pd-swatch")
    .attr("viewBox", "0 0 32 14")
    .attr("width", 32)
    .attr("height", 14)
    .attr("aria-hidden", "true")
    .attr("focusable", "false");
  if (kind === "triple" || kind === "critical") {
    root.append("path").attr("class", `pd-marker pd-${kind}`).attr("transform", "translate(16,7)").attr("d", symbol(MARKERS[kind], MARKER_AREA)());
  } else if (kind === "state") {
    root.append("path").attr("class", "pd-state").attr("transform", "translate(16,7)").attr("d", symbol(symbolSquare, STATE_AREA)());
  } else if (kind === "supercritical") {
    root.append("rect").attr("class", "pd-supercritical-swatch").attr("x", 2).attr("y", 1).attr("width", 28).attr("height", 12);
  } else {
    root.append("path").attr("class", curveClass(kind)).attr("d", line()([[1, 7], [31, 7]]));
  }
  return svg;
}

/** The legend: each curve with the source that gives it, the markers, the shaded region. */
export function renderDiagramLegend(doc: Document, data: PhaseDiagramData): HTMLElement {
  const kinds: Boundary[] = ["sublimation", "boiling", "melting"];
  const curveItems = kinds.flatMap((kind) => {
    const curves = data.curves.filter((c) => c.boundary === kind);
    if (curves.length === 0) return [];
    const sources = compressSources([...new Set(curves.map((c) => c.source))]);
    const solids = kind === "melting" && curves.length > 1 ? ` (${curves.map((c) => c.solid).join(", ")})` : "";
    return [
      el(doc, "li", { "data-curve": kind }, [
        swatch(doc, kind),
        el(doc, "span", {}, [el(doc, "strong", {}, [`${kind === "boiling" ? "Boiling" : kind === "melting" ? "Melting" : "Sublimation"}${solids}`]), `: ${sources.join("; ")}`]),
      ]),
    ];
  });
  return el(doc, "ul", { class: "pd-legend", "aria-label": "Legend and sources" }, [
    ...curveItems,
    ...data.markers.map((m) => el(doc, "li", { "data-marker": m.kind }, [swatch(doc, m.kind), el(doc, "span", {}, [el(doc, "strong", {}, [m.name]), `: ${m.values}`])])),
    el(doc, "li", {}, [swatch(doc, "supercritical"), el(doc, "span", {}, ["Supercritical fluid (T ≥ Tc and p ≥ Pc)"])]),
  ]);
}

/**
 * Sources that differ only in their last words ("… equation of ice Ih", "… of ice III") as one
 * text: the shared words once, then the differing ends.
 */
export function compressSources(sources: readonly string[]): string[] {
  if (sources.length < 2) return [...sources];
  const words = sources.map((s) => s.split(" "));
  let shared = 0;
  while (words.every((w) => shared < w.length - 1 && w[shared] === words[0]![shared])) shared += 1;
  if (shared < 2) return [...sources];
  return [`${words[0]!.slice(0, shared).join(" ")} ${words.map((w) => w.slice(shared).join(" ")).join(", ")}`];
}

/** The diagram as an SVG element. */
export function renderDiagramSvg(doc: Document, data: PhaseDiagramData, points: readonly StatePoint[], options: PhaseDiagramOptions): SVGSVGElement {
  const window = data.windows[options.zoom] ?? data.windows.full!;
  const svgNode = svgElement(doc, "svg");
  const titleId = `${options.idPrefix}-title`;
  const descId = `${options.idPrefix}-desc`;
  const clipId = `${options.idPrefix}-clip`;
  const hatchId = `${options.idPrefix}-hatch`;
  const svg = select(svgNode)
    .attr("class", "phase-diagram")
    .attr("viewBox", `0 0 ${DIAGRAM_WIDTH} ${DIAGRAM_HEIGHT}`)
    .attr("role", "img")
    .attr("aria-labelledby", `${titleId} ${descId}`)
    .attr("data-zoom", options.zoom);
  svg.append("title").attr("id", titleId).text(`Phase diagram of ${data.substanceName}`);
  svg.append("desc").attr("id", descId).text(diagramDescription(data, points));

  const plot = { x0: MARGIN.left, x1: DIAGRAM_WIDTH - MARGIN.right, y0: MARGIN.top, y1: DIAGRAM_HEIGHT - MARGIN.bottom };
  const x = scaleLinear().domain([window.t[0], window.t[1]]).range([plot.x0, plot.x1]);
  const y = scaleLog().domain([window.p[0], window.p[1]]).range([plot.y1, plot.y0]);
  const at = (t: number, p: number): Point => [x(t), y(p)];
  const inside = ([px, py]: Point) => px >= plot.x0 - 0.5 && px <= plot.x1 + 0.5 && py >= plot.y0 - 0.5 && py <= plot.y1 + 0.5;

  const defs = svg.append("defs");
  defs
    .append("clipPath")
    .attr("id", clipId)
    .append("rect")
    .attr("x", plot.x0)
    .attr("y", plot.y0)
    .attr("width", plot.x1 - plot.x0)
    .attr("height", plot.y1 - plot.y0);
  const hatch = defs
    .append("pattern")
    .attr("id", hatchId)
    .attr("patternUnits", "userSpaceOnUse")
    .attr("width", 7)
    .attr("height", 7)
    .attr("patternTransform", "rotate(45)");
  hatch.append("rect").attr("class", "pd-hatch-back").attr("width", 7).attr("height", 7);
  hatch.append("line").attr("class", "pd-hatch-line").attr("x1", 0).attr("y1", 0).attr("x2", 0).attr("y2", 7);

  const xTicks = x.ticks(5);
  const yTicks = pressureTicks(window.p[0], window.p[1]);
  svg
    .append("g")
    .attr("class", "pd-grid")
    .attr("aria-hidden", "true")
    .attr("transform", `translate(${plot.x0},0)`)
    .call(axisLeft(y).tickValues(yTicks).tickSize(-(plot.x1 - plot.x0)).tickFormat(() => ""));
  svg
    .append("g")
    .attr("class", "pd-grid")
    .attr("aria-hidden", "true")
    .attr("transform", `translate(0,${plot.y1})`)
    .call(axisBottom(x).tickValues(xTicks).tickSize(-(plot.y1 - plot.y0)).tickFormat(() => ""));

  const body = svg.append("g").attr("class", "pd-body").attr("clip-path", `url(#${clipId})`);
  body
    .append("path")
    .attr("class", "pd-supercritical")
    .attr("fill", `url(#${hatchId})`)
    .attr("d", line()(data.supercritical.map((s) => at(s.t, s.p))) + "Z");

  const curves = body.append("g").attr("class", "pd-curves");
  data.curves.forEach((curve: DiagramCurve) => {
    const path = curves
      .append("path")
      .attr("class", curveClass(curve.boundary))
      .attr("data-curve", curve.id)
      .attr("d", line()(curve.points.map((s) => at(s.t, s.p))));
    path.append("title").text(`${curve.label[0]!.toUpperCase()}${curve.label.slice(1)} — ${curve.source}`);
  });

  svg
    .append("g")
    .attr("class", "pd-axis pd-axis-y")
    .attr("aria-hidden", "true")
    .attr("transform", `translate(${plot.x0},0)`)
    .call(axisLeft(y).tickValues(yTicks).tickFormat((v) => pressureTick(Number(v))).tickSizeOuter(0));
  svg
    .append("g")
    .attr("class", "pd-axis pd-axis-x")
    .attr("aria-hidden", "true")
    .attr("transform", `translate(0,${plot.y1})`)
    .call(axisBottom(x).tickValues(xTicks).tickFormat((v) => formatNumber(Number(v))).tickSizeOuter(0));
  svg
    .append("text")
    .attr("class", "pd-axis-label")
    .attr("aria-hidden", "true")
    .attr("x", 4)
    .attr("y", 14)
    .text(`Pressure, ${data.pressureUnit} (log scale)`);
  svg
    .append("text")
    .attr("class", "pd-axis-label")
    .attr("aria-hidden", "true")
    .attr("x", (plot.x0 + plot.x1) / 2)
    .attr("y", DIAGRAM_HEIGHT - 6)
    .attr("text-anchor", "middle")
    .text(`Temperature, ${data.temperatureUnit}`);

  if (options.path) {
    const overlay = svg.append("g").attr("class", "pd-path-overlay").attr("clip-path", `url(#${clipId})`);
    overlay
      .append("path")
      .attr("class", "pd-path-line")
      .attr("d", line()([at(options.path.from.t, options.path.from.p), at(options.path.to.t, options.path.to.p)]))
      .append("title")
      .text("Selected PHASE.PATH: its isobar");
    for (const crossing of options.path.crossings) {
      const [cx, cy] = at(crossing.t, crossing.p);
      overlay
        .append("path")
        .attr("class", "pd-path-crossing")
        .attr("transform", `translate(${cx},${cy})`)
        .attr("d", symbol(symbolCross, STATE_AREA)())
        .append("title")
        .text("phase change on the selected path");
    }
  }

  const labels = svg.append("g").attr("class", "pd-labels").attr("aria-hidden", "true");
  /** Boxes already taken by labels and markers: [x0, y0, x1, y1]. */
  const taken: [number, number, number, number][] = [];
  const curvePixels: Point[] = data.curves.flatMap((c) => c.points.map((s) => at(s.t, s.p))).filter(inside);
  const overlaps = (a: readonly number[], b: readonly number[]) => a[0]! < b[2]! && a[2]! > b[0]! && a[1]! < b[3]! && a[3]! > b[1]!;
  /** How bad a label box is: outside the plot, on another label, over curves. */
  const badness = (box: [number, number, number, number]) =>
    (box[0] < plot.x0 + 1 || box[2] > plot.x1 - 1 || box[1] < plot.y0 || box[3] > plot.y1 - 1 ? 1000 : 0) +
    taken.filter((t) => overlaps(t, box)).length * 100 +
    curvePixels.filter(([px, py]) => px >= box[0] && px <= box[2] && py >= box[1] && py <= box[3]).length;

  // State points, numbered; their places are taken before any label is placed.
  const states = svg.append("g").attr("class", "pd-states").attr("aria-hidden", "true");
  for (const point of points) {
    const position = at(point.t, point.p);
    if (!inside(position)) continue;
    states
      .append("path")
      .attr("class", "pd-state")
      .attr("data-point", point.number)
      .attr("transform", `translate(${position[0]},${position[1]})`)
      .attr("d", symbol(symbolSquare, STATE_AREA)());
    states
      .append("text")
      .attr("class", "pd-state-label")
      .attr("x", position[0] + 7)
      .attr("y", position[1] - 7)
      .text(String(point.number));
    taken.push([position[0] - 6, position[1] - 17, position[0] + 7 + String(point.number).length * 7, position[1] + 6]);
  }

  // Water's ice forms (any named solid, where several melt) beside their melting branches.
  const meltingCurves = data.curves.filter((c) => c.boundary === "melting");
  const solids = meltingCurves.length > 1 ? meltingCurves.filter((c) => c.solid && c.solid !== "solid") : [];
  const iceSpots = solids.flatMap((curve) => {
    const visible = curve.points.map((s) => at(s.t, s.p)).filter(inside);
    if (visible.length === 0) return [];
    const middle = visible[Math.floor(visible.length / 2)]!;
    return [{ curve, middle }];
  });
  for (const spot of iceSpots) {
    const name = spot.curve.solid!;
    const width = name.length * CHAR_WIDTH;
    const [mx, my] = spot.middle;
    const candidates: { anchor: "start" | "end"; x: number; y: number }[] = [
      { anchor: "end", x: mx - 6, y: my + 4 },
      { anchor: "start", x: mx + 6, y: my + 4 },
      { anchor: "end", x: mx - 4, y: my - 6 },
      { anchor: "start", x: mx + 4, y: my + 14 },
      { anchor: "end", x: mx - 4, y: my + 14 },
      { anchor: "start", x: mx + 4, y: my - 6 },
      { anchor: "end", x: mx - 6, y: my + 16 },
      { anchor: "end", x: mx - 6, y: my - 8 },
    ];
    const boxOf = (c: (typeof candidates)[number]): [number, number, number, number] =>
      c.anchor === "end" ? [c.x - width, c.y - 9, c.x, c.y + 2] : [c.x, c.y - 9, c.x + width, c.y + 2];
    const best = candidates.reduce((a, b) => (badness(boxOf(b)) < badness(boxOf(a)) ? b : a));
    labels
      .append("text")
      .attr("class", "pd-ice-label")
      .attr("data-solid", name)
      .attr("x", best.x)
      .attr("y", best.y)
      .attr("text-anchor", best.anchor)
      .text(name);
    taken.push(boxOf(best));
  }

  // Markers with their names and values, each label where it covers the least.
  const markers = svg.append("g").attr("class", "pd-markers").attr("aria-hidden", "true");
  const shown = data.markers.map((marker) => ({ marker, position: at(marker.t, marker.p) })).filter((m) => inside(m.position));
  shown.forEach(({ position }) => taken.push([position[0] - 6, position[1] - 6, position[0] + 6, position[1] + 6]));
  for (const { marker, position } of shown) {
    markers
      .append("path")
      .attr("class", `pd-marker pd-${marker.kind}`)
      .attr("data-marker", marker.kind)
      .attr("data-t", String(marker.t))
      .attr("data-p", String(marker.p))
      .attr("transform", `translate(${position[0]},${position[1]})`)
      .attr("d", symbol(MARKERS[marker.kind], MARKER_AREA)());
    const width = Math.max(marker.name.length, marker.values.length) * CHAR_WIDTH;
    const height = 24;
    const candidates: { anchor: "start" | "end" | "middle"; x: number; y: number }[] = [];
    for (const dy of [8, -8 - height, 12, -12 - height, 22, -22 - height]) {
      candidates.push({ anchor: "start", x: position[0] + 8, y: position[1] + dy });
      candidates.push({ anchor: "end", x: position[0] - 8, y: position[1] + dy });
      const centre = Math.min(Math.max(position[0], plot.x0 + 2 + width / 2), plot.x1 - 2 - width / 2);
      candidates.push({ anchor: "middle", x: centre, y: position[1] + dy });
    }
    const boxOf = (c: (typeof candidates)[number]): [number, number, number, number] => {
      const x0 = c.anchor === "start" ? c.x : c.anchor === "end" ? c.x - width : c.x - width / 2;
      return [x0, c.y, x0 + width, c.y + height];
    };
    const best = candidates.reduce((a, b) => (badness(boxOf(b)) < badness(boxOf(a)) ? b : a));
    const text = labels.append("text").attr("class", "pd-marker-label").attr("data-label", marker.kind).attr("text-anchor", best.anchor);
    text.append("tspan").attr("x", best.x).attr("y", best.y + 10).attr("class", "pd-marker-name").text(marker.name);
    text.append("tspan").attr("x", best.x).attr("y", best.y + 22).text(marker.values);
    taken.push(boxOf(best));
  }

  // Phase names, skipped where they would sit on another label.
  for (const region of data.regions[options.zoom] ?? []) {
    const position = at(region.t, region.p);
    if (!inside(position)) continue;
    const halfWidth = (region.text.length * CHAR_WIDTH) / 2 + 2;
    const lx = Math.min(Math.max(position[0], plot.x0 + halfWidth + 2), plot.x1 - halfWidth - 2);
    const box: [number, number, number, number] = [lx - halfWidth, position[1] - 8, lx + halfWidth, position[1] + 8];
    if (taken.some((t) => overlaps(t, box))) continue;
    labels
      .append("text")
      .attr("class", `pd-region${region.text === "supercritical fluid" ? " pd-region-supercritical" : ""}`)
      .attr("x", lx)
      .attr("y", position[1])
      .attr("text-anchor", "middle")
      .attr("dominant-baseline", "central")
      .text(region.text);
    taken.push(box);
  }

  return svgNode;
}

/** Whether a state point lies inside the window of a zoom. */
export function inWindow(data: PhaseDiagramData, zoom: ZoomId, point: StatePoint): boolean {
  const w = data.windows[zoom] ?? data.windows.full!;
  return point.t >= w.t[0] && point.t <= w.t[1] && point.p >= w.p[0] && point.p <= w.p[1];
}
