/**
 * Data of the phase diagram: the triple and critical markers sit exactly at core's points in the
 * display units (and those are the published values), every sampled curve point lies on core's own
 * branch function within the branch's range, steep branches are sampled evenly in log pressure,
 * water's ice branches are all there, helium-4 has no triple point and says so, and typed state
 * points get core's phase.
 */
import { describe, expect, it } from "vitest";
import { criticalPoint, phaseAt, triplePoint } from "../../core/phase";
import { findSubstance, SUBSTANCES } from "../../core/substances/registry";
import { fromSI, toSI } from "../../core/units/units";
import { DISPLAY_UNITS, displayUnitsById } from "../../taskpane/data/display-units";
import { phaseDiagramData, readStatePoint, sampleTemperatures, statePoints } from "../../taskpane/data/phase-diagram";
import { compressSources, pressureTick } from "../../taskpane/render/phase-diagram";
import { expectClose } from "../helpers/expect-close";

const water = findSubstance("water");
const co2 = findSubstance("co2");
const helium = findSubstance("helium");

// Published points the markers must show (in SI):
// water — IAPWS R7-97(2012) (IF97) Eq. (2)–(3), critical point 647.096 K, 22.064 MPa, and Eq. (9),
//   triple point 273.16 K, 611.657 Pa (the same values in IAPWS R14-08(2011)), as printed;
// carbon dioxide — Span & Wagner, J. Phys. Chem. Ref. Data 25 (1996) 1509: triple point 216.592 K,
//   0.51795 MPa, critical point 304.1282 K, 7.3773 MPa, as printed (values from memory of the
//   paper's text; the same four numbers are cited in the substance's own module).
const PUBLISHED = [
  { substance: water, triple: [273.16, 611.657], critical: [647.096, 22.064e6] },
  { substance: co2, triple: [216.592, 0.51795e6], critical: [304.1282, 7.3773e6] },
] as const;

describe("phase diagram markers", () => {
  for (const { substance, triple, critical } of PUBLISHED) {
    it(`core's ${substance.name} triple and critical points are the published ones`, () => {
      const t = triplePoint(substance);
      const c = criticalPoint(substance);
      // Printed to 5–7 significant digits: agreement to 1e-9 relative means transcribed as printed.
      expectClose(t.temperatureK, triple[0], { rel: 1e-9 });
      expectClose(t.pressurePa, triple[1], { rel: 1e-9 });
      expectClose(c.temperatureK, critical[0], { rel: 1e-9 });
      expectClose(c.pressurePa, critical[1], { rel: 1e-9 });
    });

    for (const units of DISPLAY_UNITS) {
      it(`${substance.name} markers sit exactly at core's points in ${units.label}`, () => {
        const data = phaseDiagramData(substance, units.system);
        const t = triplePoint(substance);
        const c = criticalPoint(substance);
        const tripleMarker = data.markers.find((m) => m.kind === "triple")!;
        const criticalMarker = data.markers.find((m) => m.kind === "critical")!;
        expect(tripleMarker.t).toBe(fromSI(units.system, "temperature", t.temperatureK));
        expect(tripleMarker.p).toBe(fromSI(units.system, "pressure", t.pressurePa));
        expect(criticalMarker.t).toBe(fromSI(units.system, "temperature", c.temperatureK));
        expect(criticalMarker.p).toBe(fromSI(units.system, "pressure", c.pressurePa));
        // Every window offered holds the point it is named for, and the full one holds both.
        for (const [zoom, marker] of [["full", tripleMarker], ["full", criticalMarker], ["triple", tripleMarker], ["critical", criticalMarker]] as const) {
          const w = data.windows[zoom]!;
          expect(marker.t).toBeGreaterThan(Math.min(...w.t));
          expect(marker.t).toBeLessThan(Math.max(...w.t));
          expect(marker.p).toBeGreaterThan(w.p[0]);
          expect(marker.p).toBeLessThan(w.p[1]);
        }
      });
    }
  }

  it("labels the markers with their values in the display units", () => {
    const data = phaseDiagramData(water, displayUnitsById("c-bar").system);
    expect(data.markers.map((m) => m.values)).toEqual(["0.01 °C, 0.00611657 bar", "373.946 °C, 220.64 bar"]);
    expect(data.temperatureUnit).toBe("°C");
    expect(data.pressureUnit).toBe("bar");
  });
});

describe("phase diagram curves", () => {
  for (const substance of SUBSTANCES) {
    it(`samples every ${substance.name} branch on core's own curve, within its range`, () => {
      const units = displayUnitsById("f-psi");
      const data = phaseDiagramData(substance, units.system);
      const { sublimation, boiling, melting } = substance.curves;
      const branches = [...(sublimation ? [sublimation] : []), boiling, ...melting];
      expect(data.curves).toHaveLength(branches.length);
      data.curves.forEach((curve, i) => {
        const branch = branches[i]!;
        expect(curve.boundary).toBe(branch.boundary);
        expect(curve.source).toBe(branch.model.name);
        expect(curve.points.length).toBeGreaterThan(60);
        // Back to SI: p(T) of core's branch, to the round-off of two unit conversions.
        for (const point of curve.points) {
          const temperatureK = toSI(units.system, "temperature", point.t);
          expect(temperatureK).toBeGreaterThanOrEqual(branch.tMin - 1e-9 * branch.tMin);
          expect(temperatureK).toBeLessThanOrEqual(branch.tMax + 1e-9 * branch.tMax);
          expectClose(toSI(units.system, "pressure", point.p), branch.pressure(temperatureK), { rel: 1e-9 });
        }
        // The range's ends are drawn.
        expectClose(toSI(units.system, "temperature", curve.points[0]!.t), branch.tMin, { rel: 1e-12 });
        expectClose(toSI(units.system, "temperature", curve.points.at(-1)!.t), branch.tMax, { rel: 1e-12 });
      });
    });
  }

  it("samples a branch spanning decades evenly in log pressure too (water's sublimation, 43 decades)", () => {
    const branch = water.curves.sublimation!;
    const pressures = sampleTemperatures(branch).map((t) => branch.pressure(t));
    const steps = pressures.slice(1).map((p, i) => Math.log10(p / pressures[i]!));
    expect(Math.min(...steps)).toBeGreaterThan(0);
    // 64 log-spaced samples over about 43.5 decades: no gap wider than one such step.
    expect(Math.max(...steps)).toBeLessThan(43.6 / 64 + 1e-6);
  });

  it("names each of water's ice branches and their source", () => {
    const data = phaseDiagramData(water, displayUnitsById("si").system);
    const melting = data.curves.filter((c) => c.boundary === "melting");
    expect(melting.map((c) => c.solid)).toEqual(["ice Ih", "ice III", "ice V", "ice VI", "ice VII"]);
    expect(melting.map((c) => c.label)).toContain("melting curve, ice VII");
    expect(new Set(data.curves.map((c) => c.id)).size).toBe(data.curves.length);
    expect(compressSources(melting.map((c) => c.source))).toHaveLength(1);
  });

  it("shades the supercritical region from the critical point, never above a melting curve", () => {
    for (const substance of [water, co2]) {
      const data = phaseDiagramData(substance, displayUnitsById("si").system);
      const c = criticalPoint(substance);
      expect(data.supercritical[0]).toEqual({ t: c.temperatureK, p: c.pressurePa });
      for (const point of data.supercritical) {
        expect(point.t).toBeGreaterThanOrEqual(c.temperatureK);
        expect(point.p).toBeGreaterThanOrEqual(c.pressurePa);
      }
    }
  });

  it("places each phase name where core's phaseAt gives that phase", () => {
    for (const substance of [water, co2, helium]) {
      const units = displayUnitsById("c-bar");
      const data = phaseDiagramData(substance, units.system);
      for (const labels of Object.values(data.regions)) {
        for (const label of labels) {
          const state = phaseAt(substance, toSI(units.system, "temperature", label.t), toSI(units.system, "pressure", label.p));
          expect(state.phase).toBe(label.text);
        }
      }
      expect(data.regions.full!.map((r) => r.text)).toContain("supercritical fluid");
    }
  });

  it("copes with helium-4: no triple point marked or offered, and a note says why", () => {
    const data = phaseDiagramData(helium, displayUnitsById("si").system);
    expect(data.markers.map((m) => m.kind)).toEqual(["critical"]);
    expect(data.windows.triple).toBeUndefined();
    expect(data.notes.join(" ")).toMatch(/no solid–liquid–vapor triple point/);
    expect(data.notes.join(" ")).toMatch(/No melting curve is drawn/);
  });

  it("writes pressure ticks plainly, far decades as powers of ten", () => {
    expect(pressureTick(100)).toBe("100");
    expect(pressureTick(0.001)).toBe("0.001");
    expect(pressureTick(1e-10)).toBe("1e-10");
    expect(pressureTick(1e9)).toBe("1e9");
  });
});

describe("state points", () => {
  const cBar = displayUnitsById("c-bar").system;

  it("reads a typed point in the display units and gives it core's phase", () => {
    // A freeze-drying condenser at −50 °C and 0.0005 bar: below the sublimation curve (demo scenario).
    const condenser = readStatePoint(water, cBar, "-50", "0.0005");
    // A chilled-water loop at 6 °C and 3 bar (demo scenario).
    const loop = readStatePoint(water, cBar, "6", "3");
    expect(condenser.ok && loop.ok).toBe(true);
    if (!condenser.ok || !loop.ok) return;
    expectClose(condenser.point.temperatureK, 223.15, { rel: 1e-15 });
    expectClose(condenser.point.pressurePa, 50, { rel: 1e-12 });
    const points = statePoints(water, cBar, [condenser.point, loop.point]);
    expect(points.map((p) => p.number)).toEqual([1, 2]);
    expect(points[0]!.phase).toBe(`${phaseAt(water, 223.15, 50).phase} (${phaseAt(water, 223.15, 50).detail})`);
    expect(points[1]!.phase).toMatch(/^liquid/);
    expect(points[1]!.values).toBe("6 °C, 3 bar");
  });

  it("says what to change for text that is not a number or a state core cannot place", () => {
    const text = readStatePoint(water, cBar, "warm", "1");
    expect(text).toMatchObject({ ok: false, field: "t" });
    expect(!text.ok && text.message).toMatch(/enter a number in °C/);
    const empty = readStatePoint(water, cBar, "20", " ");
    expect(empty).toMatchObject({ ok: false, field: "p" });
    const negative = readStatePoint(water, cBar, "20", "-1");
    expect(negative.ok).toBe(false);
    expect(!negative.ok && negative.message).toMatch(/bar/);
    const cold = readStatePoint(water, cBar, "-300", "1");
    expect(cold.ok).toBe(false);
  });
});
