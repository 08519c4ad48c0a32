/**
 * The built shared page (dist/taskpane.html) in headless Chromium, outside Excel: office.js is
 * served from the npm fixture in place of Microsoft's CDN, every other request that would leave
 * 127.0.0.1 is aborted and recorded, and the pane must show core's constants, the cautions and the
 * outside-Excel notice, legibly at 350 px in light and dark schemes. A water path entered in the
 * pane is drawn as a heating curve with one segment per core step, ending at core's PATHENERGY.
 * Screenshots go to test-artifacts/ (not committed).
 *
 * Needs `npm run build` first and Debian's chromium (CHROMIUM_PATH, default /usr/bin/chromium).
 */
import { existsSync, mkdirSync, readFileSync, statSync } from "node:fs";
import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { constantOf } from "../../core/constants";
import { formatNumber } from "../../core/errors";
import { criticalPoint, phaseAt, triplePoint } from "../../core/phase";
import { isobaricPath, pathEnergy } from "../../core/path";
import { findSubstance, SUBSTANCES } from "../../core/substances/registry";
import { fromSI, toSI } from "../../core/units/units";
import { DISPLAY_UNITS, displayUnitsById } from "../../taskpane/data/display-units";
import { expectClose } from "../helpers/expect-close";

const REPO = fileURLToPath(new URL("../..", import.meta.url));
const DIST = path.join(REPO, "dist");
const ARTIFACTS = path.join(REPO, "test-artifacts");
const OFFICE_JS_DIST = path.join(REPO, "node_modules", "@microsoft", "office-js", "dist");
const CDN_HOST = "appsforoffice.microsoft.com";
const CDN_PREFIX = "/lib/1/hosted/";
const CHROMIUM = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
const HAVE_CHROMIUM = existsSync(CHROMIUM);

const CONTENT_TYPES: Readonly<Record<string, string>> = {
  ".html": "text/html; charset=utf-8",
  ".js": "text/javascript; charset=utf-8",
  ".css": "text/css; charset=utf-8",
  ".json": "application/json",
  ".map": "application/json",
  ".png": "image/png",
  ".xml": "application/xml",
};

/** Serves dist/ on 127.0.0.1 at a free port; nothing outside dist/ is reachable. */
function serveDist(): Promise<Server> {
  const server = createServer((request, response) => {
    const pathname = decodeURIComponent(new URL(request.url ?? "/", "http://127.0.0.1").pathname);
    const file = path.join(DIST, path.normalize(pathname === "/" ? "/taskpane.html" : pathname));
    if (!file.startsWith(DIST + path.sep) || !existsSync(file) || !statSync(file).isFile()) {
      response.writeHead(404, { "content-type": "text/plain" }).end("not found");
      return;
    }
    response
      .writeHead(200, { "content-type": CONTENT_TYPES[path.extname(file)] ?? "application/octet-stream" })
      .end(readFileSync(file));
  });
  return new Promise((resolve) => server.listen(0, "127.0.0.1", () => resolve(server)));
}

/** The file of the office.js package that stands in for a CDN address, or null. */
function officeFixtureFor(url: URL): string | null {
  if (!url.pathname.startsWith(CDN_PREFIX)) return null;
  const file = path.join(OFFICE_JS_DIST, path.normalize(url.pathname.slice(CDN_PREFIX.length)));
  return file.startsWith(OFFICE_JS_DIST + path.sep) && existsSync(file) ? file : null;
}

/** What the drawn heating curve shows, read from the page. */
interface DrawnChart {
  readonly steps: number;
  readonly segments: number;
  readonly total: string;
  /** data-end-total of each segment. */
  readonly ends: string[];
  /** End of the last segment, in the SVG's user units. */
  readonly lastEndX: number;
  /** Each x tick: its position (user units) and its label as a number. */
  readonly ticks: { x: number; value: number }[];
  readonly styles: string[];
}

function drawnChart(page: Page, selector: string): Promise<DrawnChart> {
  return page.evaluate((sel) => {
    const svg = document.querySelector<SVGSVGElement>(sel)!;
    const segments = Array.from(svg.querySelectorAll<SVGPathElement>("path.segment"));
    const last = segments.at(-1)!;
    const ticks = Array.from(svg.querySelectorAll<SVGGElement>("g.axis-x .tick")).map((tick) => ({
      x: Number(/translate\(([-\d.e]+)/.exec(tick.getAttribute("transform") ?? "")?.[1]),
      // d3's labels group thousands with commas and write minus as U+2212.
      value: Number((tick.textContent ?? "").replace(/,/g, "").replace(/\u2212/g, "-")),
    }));
    return {
      steps: Number(svg.dataset["steps"]),
      segments: segments.length,
      total: svg.dataset["total"] ?? "",
      ends: segments.map((p) => p.dataset["endTotal"] ?? ""),
      lastEndX: last.getPointAtLength(last.getTotalLength()).x,
      ticks,
      styles: segments.map((p) => p.getAttribute("class") ?? ""),
    };
  }, selector);
}

/** Contrast of every drawn segment's stroke against the page background. */
function strokeContrasts(page: Page): Promise<{ style: string; ratio: number }[]> {
  return page.evaluate(() => {
    const rgb = (color: string) => (/rgba?\(([^)]+)\)/.exec(color)?.[1] ?? "0,0,0").split(/[\s,/]+/).filter(Boolean).map(Number);
    const channel = (c: number) => {
      const v = c / 255;
      return v <= 0.04045 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4;
    };
    const luminance = (c: number[]) => 0.2126 * channel(c[0]!) + 0.7152 * channel(c[1]!) + 0.0722 * channel(c[2]!);
    const background = luminance(rgb(getComputedStyle(document.body).backgroundColor));
    return Array.from(document.querySelectorAll("path.segment, path.marker")).map((p) => {
      const style = getComputedStyle(p);
      const paint = p.classList.contains("marker") ? style.fill : style.stroke;
      const [hi, lo] = [luminance(rgb(paint)), background].sort((a, b) => b - a);
      return { style: p.getAttribute("class") ?? "", ratio: (hi! + 0.05) / (lo! + 0.05) };
    });
  });
}

/** WCAG 2.x contrast of every visible text against its effective background, in the page. */
function lowContrastTexts(page: Page, minimum: number): Promise<string[]> {
  return page.evaluate((min) => {
    const parse = (color: string): [number, number, number, number] => {
      const m = /rgba?\(([^)]+)\)/.exec(color);
      if (!m) return [0, 0, 0, 0];
      const parts = m[1]!.split(/[\s,/]+/).filter(Boolean).map(Number);
      return [parts[0]!, parts[1]!, parts[2]!, parts[3] ?? 1];
    };
    const channel = (c: number) => {
      const s = c / 255;
      return s <= 0.04045 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4;
    };
    const luminance = ([r, g, b]: number[]) => 0.2126 * channel(r!) + 0.7152 * channel(g!) + 0.0722 * channel(b!);
    const background = (element: Element | null): number[] => {
      for (let e = element; e; e = e.parentElement) {
        const c = parse(getComputedStyle(e).backgroundColor);
        if (c[3] > 0.99) return c;
      }
      return parse(getComputedStyle(document.documentElement).backgroundColor)[3] > 0.99
        ? parse(getComputedStyle(document.documentElement).backgroundColor)
        : [255, 255, 255, 1];
    };
    const failures: string[] = [];
    for (const element of Array.from(document.body.querySelectorAll("*"))) {
      const ownText = Array.from(element.childNodes)
        .filter((n) => n.nodeType === Node.TEXT_NODE)
        .map((n) => n.textContent ?? "")
        .join("")
        .trim();
      if (!ownText || !element.checkVisibility()) continue;
      const style = getComputedStyle(element);
      const fg = parse(style.color);
      const bg = background(element);
      const blended = [0, 1, 2].map((i) => fg[i]! * fg[3] + bg[i]! * (1 - fg[3]));
      const [l1, l2] = [luminance(blended), luminance(bg)].sort((a, b) => b - a);
      const ratio = (l1! + 0.05) / (l2! + 0.05);
      if (ratio < min) failures.push(`${element.tagName.toLowerCase()} "${ownText.slice(0, 40)}" ${ratio.toFixed(2)}:1`);
    }
    return failures;
  }, minimum);
}

if (!HAVE_CHROMIUM) {
  const reason = `no Chromium at ${CHROMIUM} (install Debian's chromium or set CHROMIUM_PATH)`;
  console.warn(`task pane browser tests skipped: ${reason}`);
  describe("task pane in Chromium", () => {
    it.skip(`skipped: ${reason}`, () => {});
  });
} else {
  describe("task pane in Chromium", () => {
    let server: Server;
    let browser: Browser;
    let context: BrowserContext;
    let page: Page;
    let base = "";
    const intercepted: string[] = [];
    const blocked: string[] = [];
    const websockets: string[] = [];
    const pageErrors: string[] = [];
    const consoleErrors: string[] = [];
    /** Console errors whose source is not office.js (the intercepted CDN files). */
    const ownConsoleErrors: string[] = [];
    const water = findSubstance("water");

    beforeAll(async () => {
      if (!existsSync(path.join(DIST, "taskpane.html"))) {
        throw new Error("dist/taskpane.html not found: run `npm run build` before the browser tests");
      }
      mkdirSync(ARTIFACTS, { recursive: true });
      server = await serveDist();
      base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
      browser = await chromium.launch({
        executablePath: CHROMIUM,
        headless: true,
        args: [
          "--no-sandbox",
          "--disable-gpu",
          "--disable-background-networking",
          "--disable-component-update",
          "--disable-sync",
          "--no-first-run",
        ],
      });
      context = await browser.newContext({ viewport: { width: 350, height: 700 }, colorScheme: "light" });
      await context.route("**/*", (route) => {
        const url = new URL(route.request().url());
        if (url.hostname === CDN_HOST) {
          intercepted.push(url.href);
          const file = officeFixtureFor(url);
          return file
            ? route.fulfill({ path: file, contentType: "text/javascript; charset=utf-8" })
            : route.fulfill({ status: 404, body: "not in the office.js fixture" });
        }
        if (url.hostname === "127.0.0.1") return route.continue();
        blocked.push(url.href);
        return route.abort();
      });
      await context.addInitScript(() => {
        class CellError extends Error {
          constructor(
            readonly code: string,
            message = "",
          ) {
            super(message);
          }
        }
        (window as any).CustomFunctions = {
          Error: CellError,
          ErrorCode: {
            invalidValue: "#VALUE!",
            notAvailable: "#N/A",
            divisionByZero: "#DIV/0!",
            invalidNumber: "#NUM!",
            nullReference: "#NULL!",
            invalidName: "#NAME?",
            invalidReference: "#REF!",
          },
        };
      });
      page = await context.newPage();
      page.on("websocket", (ws) => websockets.push(ws.url()));
      page.on("pageerror", (error) => pageErrors.push(error.message));
      page.on("console", (message) => {
        if (message.type() !== "error") return;
        consoleErrors.push(message.text());
        const source = message.location().url;
        if (!source.startsWith(`https://${CDN_HOST}/`)) ownConsoleErrors.push(`${message.text()} (${source})`);
      });
      await page.goto(`${base}/taskpane.html`);
      await page.locator("table.constants tr.constant").first().waitFor();
    });

    afterAll(async () => {
      await browser?.close();
      await new Promise<void>((resolve) => (server ? server.close(() => resolve()) : resolve()));
    });

    it("loads office.js from the intercepted CDN address and makes no other outside request", async () => {
      await page.locator("#outside-excel").waitFor();
      expect(intercepted.some((u) => u.endsWith("/office.js")), intercepted.join(", ")).toBe(true);
      expect(intercepted.every((u) => new URL(u).pathname.startsWith(CDN_PREFIX))).toBe(true);
      expect(blocked, `requests that would have left the machine: ${blocked.join(", ")}`).toEqual([]);
      expect(websockets).toEqual([]);
    });

    it("runs without script errors or Content-Security-Policy violations", () => {
      expect(pageErrors).toEqual([]);
      expect(consoleErrors.filter((m) => /Content Security Policy|Refused to/i.test(m))).toEqual([]);
      expect(consoleErrors).toEqual([]);
    });

    it("shows the outside-Excel notice and the cautions", async () => {
      const notice = page.locator("#outside-excel");
      await expect.poll(() => notice.isVisible()).toBe(true);
      expect(await notice.textContent()).toMatch(/reference data only/);
      const cautions = page.locator("aside.cautions");
      expect(await cautions.isVisible()).toBe(true);
      const text = (await cautions.textContent()) ?? "";
      for (const word of ["High pressure", "Cryogenic", "Asphyxiant", "Dry ice", "Steam", "licensed"]) {
        expect(text).toContain(word);
      }
    });

    it("offers every substance of the registry", async () => {
      const options = await page.locator("#substance-select option").evaluateAll((os) =>
        os.map((o) => (o as HTMLOptionElement).value),
      );
      expect(options).toEqual(SUBSTANCES.map((s) => s.id));
    });

    it("finds a second substance by its refrigerant number and shows its constants as core gives them", async () => {
      await page.selectOption("#units-select", "si");
      await page.locator('.reference-data[data-units="si"]').waitFor();
      try {
        await page.fill("#substance-search", "R-744");
        await page.press("#substance-search", "Enter");
        const co2 = findSubstance("R-744");
        expect(await page.locator("#substance-select").inputValue()).toBe(co2.id);
        // Span & Wagner (1996): Tc = 304.1282 K, pc = 7.3773 MPa, Tt = 216.592 K, pt = 0.51795 MPa.
        const published: Record<string, number> = { Tc: 304.1282, Pc: 7.3773e6, Tt: 216.592, Pt: 0.51795e6 };
        for (const symbol of ["Tc", "Pc", "Tt", "Pt"]) {
          const row = page.locator(`tr.constant[data-symbol="${symbol}"]`);
          await row.waitFor();
          const constant = constantOf(co2, symbol);
          expect(constant.value, symbol).toBe(published[symbol]);
          expect(await row.locator(".value").textContent(), symbol).toBe(formatNumber(constant.value));
        }
        await page.fill("#substance-search", "nitrogn");
        await page.press("#substance-search", "Enter");
        expect(await page.locator("#substance-search-message").textContent()).toMatch(/unknown substance "nitrogn".*"nitrogen"/);
      } finally {
        await page.fill("#substance-search", "7732-18-5");
        await page.press("#substance-search", "Enter");
        await page.fill("#substance-search", "");
      }
      expect(await page.locator("#substance-select").inputValue()).toBe("water");
    });

    it("copies a constant with its citation, or selects the text to copy where the clipboard is refused", async () => {
      await page.locator('tr.constant[data-symbol="Tc"] button[aria-controls]').click();
      const detail = page.locator("#constant-detail-criticalTemperature");
      await detail.locator("button.copy").click();
      await page.waitForFunction(() => (document.querySelector("#constant-detail-criticalTemperature .copy-status")?.textContent ?? "") !== "");
      expect(await detail.locator(".copy-status").textContent()).toMatch(/^(Copied\.|Selected: press Ctrl\+C)/);
      const copied = await detail.locator("textarea.copy-text").inputValue();
      // IAPWS-IF97 Eq. (2): Tc = 647.096 K.
      expect(copied).toMatch(/^water, critical temperature \(Tc\) = 647\.096 K\. Source: IAPWS.*doi:10\.1115\/1\.483186/);
      await page.locator('tr.constant[data-symbol="Tc"] button[aria-controls]').click();
    });

    for (const units of DISPLAY_UNITS) {
      it(`shows Tc, Pc, Tt and Pt as core gives them in ${units.label}`, async () => {
        await page.selectOption("#units-select", units.id);
        await page.locator(`.reference-data[data-units="${units.id}"]`).waitFor();
        for (const symbol of ["Tc", "Pc", "Tt", "Pt"]) {
          const constant = constantOf(water, symbol);
          const expected = formatNumber(fromSI(units.system, constant.dimension, constant.value));
          const row = page.locator(`tr.constant[data-symbol="${symbol}"]`);
          expect(await row.locator(".value").textContent(), symbol).toBe(expected);
        }
      });
    }

    it("shows the published values in SI", async () => {
      // IAPWS R7-97(2012) (IF97): Tc Eq. (2), pc Eq. (3), Tt and pt Eq. (9), as printed.
      await page.selectOption("#units-select", "si");
      await page.locator('.reference-data[data-units="si"]').waitFor();
      const shown = async (symbol: string) =>
        `${await page.locator(`tr.constant[data-symbol="${symbol}"] .value`).textContent()} ` +
        `${await page.locator(`tr.constant[data-symbol="${symbol}"] .unit`).textContent()}`;
      expect(await shown("Tc")).toBe("647.096 K");
      expect(await shown("Pc")).toBe("22064000 Pa");
      expect(await shown("Tt")).toBe("273.16 K");
      expect(await shown("Pt")).toBe("611.657 Pa");
    });

    it("draws the demo path when it opens, one segment per core step", async () => {
      // The pane opens in SI with its demo path (2.5 kg from 248.15 K to 423.15 K at 3e5 Pa).
      await page.selectOption("#units-select", "si");
      await page.locator('.reference-data[data-units="si"]').waitFor();
      const chart = await drawnChart(page, "#path-result svg.path-chart");
      const steps = isobaricPath(water, 2.5, 248.15, 423.15, 3e5);
      expect(chart.segments).toBe(steps.length);
      expect(chart.steps).toBe(steps.length);
      expect(await page.locator("#path-result table.path-steps tbody.step").count()).toBe(steps.length);
      expect(await page.locator("#path-selection").textContent()).toMatch(/In Excel, select any cell of a PHASE.PATH result/);
    });

    it("draws a water path entered in °C and bar: a segment per step, ending at PATHENERGY", async () => {
      const units = displayUnitsById("c-bar");
      await page.selectOption("#units-select", units.id);
      await page.locator('.reference-data[data-units="c-bar"]').waitFor();
      expect(await page.locator('label[for="path-start"]').textContent()).toBe("Start T1, °C");
      expect(await page.locator('label[for="path-pressure"]').textContent()).toBe("Pressure, bar");
      // 1 kg of water from -20 °C to 120 °C at 1.01325 bar, typed and sent with Enter.
      await page.fill("#path-mass", "1");
      await page.fill("#path-start", "-20");
      await page.fill("#path-end", "120");
      await page.fill("#path-pressure", "1.01325");
      await page.locator("#path-pressure").press("Enter");
      await expect.poll(() => page.locator(".path-status").textContent()).toMatch(/^Heating path drawn: 5 steps/);

      const system = units.pathSystem;
      const [t1, t2, p] = [toSI(system, "temperature", -20), toSI(system, "temperature", 120), toSI(system, "pressure", 1.01325)];
      const steps = isobaricPath(water, 1, t1, t2, p);
      const totalKJ = fromSI(system, "energy", pathEnergy(water, 1, t1, t2, p));
      const chart = await drawnChart(page, "#path-result svg.path-chart");
      expect(chart.segments).toBe(steps.length);
      expect(chart.styles.map((c) => c.replace("segment ", ""))).toEqual([
        "style-solid",
        "style-change",
        "style-liquid",
        "style-change",
        "style-vapor",
      ]);
      // The endpoint is core's PATHENERGY in kJ (the browser's Math functions may differ from
      // Node's in the last bit, so to 1e-12) ...
      expectClose(Number(chart.total), totalKJ, { rel: 1e-12 });
      expect(chart.ends.at(-1)).toBe(chart.total);
      // ... and where it is drawn, read back through the axis ticks, is the same heat within half
      // a drawing unit (d3 shifts ticks by half a unit for crisp lines).
      const [a, b] = [chart.ticks[0]!, chart.ticks.at(-1)!];
      const perUnit = (b.value - a.value) / (b.x - a.x);
      expect(chart.ticks.length).toBeGreaterThanOrEqual(3);
      expectClose(a.value + (chart.lastEndX - a.x) * perUnit, totalKJ, { abs: 0.6 * Math.abs(perUnit) });
      expect(chart.ticks.at(-1)!.value).toBeLessThanOrEqual(totalKJ);
      // The table's last running total is the same number as printed by core's formatNumber.
      expect(await page.locator("#path-result tbody.step").last().locator("td.total").textContent()).toBe(formatNumber(totalKJ));
      expect(await page.locator("#path-result .formula code").textContent()).toBe(
        '=PHASE.PATH("water", 1, -20, 120, 1.01325, "C bar kJ kg")',
      );
      expect(await page.locator("#path-result svg.path-chart").getAttribute("aria-labelledby")).toBe("path-chart-title path-chart-desc");
      expect(await page.locator("#path-chart-desc").textContent()).toMatch(/^5 steps, 3090\.29 kJ in all\. 1, heat ice Ih from -20 to/);
    });

    it("keeps the entered path when the display units change", async () => {
      await page.selectOption("#units-select", "f-psi");
      await page.locator('.reference-data[data-units="f-psi"]').waitFor();
      // 1 kg = 2.20462 lb; -20 °C = -4 °F; 120 °C = 248 °F; 1.01325 bar = 14.6959 psi
      // (NIST SP 811 App. B conversion factors, exact by definition).
      expect(await page.inputValue("#path-mass")).toBe("2.20462");
      expect(await page.inputValue("#path-start")).toBe("-4");
      expect(await page.inputValue("#path-end")).toBe("248");
      expect(await page.inputValue("#path-pressure")).toBe("14.6959");
      const system = displayUnitsById("f-psi").pathSystem;
      const mass = toSI(system, "mass", 2.20462);
      const [t1, t2, p] = [toSI(system, "temperature", -4), toSI(system, "temperature", 248), toSI(system, "pressure", 14.6959)];
      const chart = await drawnChart(page, "#path-result svg.path-chart");
      expectClose(Number(chart.total), fromSI(system, "energy", pathEnergy(water, mass, t1, t2, p)), { rel: 1e-12 });
      await page.selectOption("#units-select", "c-bar");
      await page.locator('.reference-data[data-units="c-bar"]').waitFor();
      await page.fill("#path-mass", "1");
      await page.fill("#path-start", "-20");
      await page.fill("#path-end", "120");
      await page.fill("#path-pressure", "1.01325");
      await page.click(".path-form button");
    });

    it("says what to change, in the display units, and draws nothing for a bad input", async () => {
      await page.fill("#path-mass", "one");
      await page.click(".path-form button");
      const alert = page.locator("#path-error[role='alert']");
      expect(await alert.textContent()).toBe('Mass "one" is not a number: enter a number in kg (decimal point, e.g. 1.5).');
      expect(await page.getAttribute("#path-mass", "aria-invalid")).toBe("true");
      expect(await page.getAttribute("#path-mass", "aria-describedby")).toBe("path-error");
      expect(await page.locator("#path-result svg").count()).toBe(0);
      await page.fill("#path-mass", "1");
      await page.fill("#path-start", "-300");
      await page.click(".path-form button");
      expect(await alert.textContent()).toMatch(/^Start temperature -300 °C is at or below absolute zero/);
      await page.evaluate(() => window.scrollTo(0, document.querySelector(".path-section")!.getBoundingClientRect().top + window.scrollY));
      await page.locator(".path-section").screenshot({ path: path.join(ARTIFACTS, "path-error-350-light.png") });
      await page.fill("#path-start", "-20");
      await page.click(".path-form button");
      expect(await alert.count()).toBe(0);
      expect(await page.getAttribute("#path-start", "aria-invalid")).toBeNull();
      expect(await page.locator("#path-result svg.path-chart").count()).toBe(1);
    });

    it("draws the path legibly at 350 and 320 px, light and dark: 4.5:1 lines and text, no sideways scrolling", async () => {
      for (const scheme of ["light", "dark"] as const) {
        await page.emulateMedia({ colorScheme: scheme });
        for (const width of [350, 320]) {
          await page.setViewportSize({ width, height: 700 });
          expect(await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth)).toBeLessThanOrEqual(0);
          const tooFaint = (await strokeContrasts(page)).filter((c) => c.ratio < 4.5);
          expect(tooFaint, `${scheme} lines and markers`).toEqual([]);
          expect(await lowContrastTexts(page, 4.5), `${scheme} at ${width} px`).toEqual([]);
          // Nothing in the path section sticks out of it.
          const overflow = await page.evaluate(() => {
            const section = document.querySelector(".path-section")!.getBoundingClientRect();
            return Array.from(document.querySelectorAll(".path-section *"))
              .filter((e) => e.getBoundingClientRect().right > section.right + 0.5)
              .map((e) => e.tagName);
          });
          expect(overflow, `${scheme} at ${width} px`).toEqual([]);
          await page.locator(".path-section").screenshot({ path: path.join(ARTIFACTS, `path-${width}-${scheme}.png`) });
        }
      }
      await page.emulateMedia({ colorScheme: "light" });
      await page.setViewportSize({ width: 350, height: 700 });
    });

    it("is keyboard operable: search and selectors first, then the path inputs, then a source opens its full reference", async () => {
      await page.locator("body").click({ position: { x: 1, y: 1 } });
      await page.evaluate(() => (document.activeElement as HTMLElement | null)?.blur());
      await page.keyboard.press("Tab");
      expect(await page.evaluate(() => document.activeElement?.id)).toBe("substance-search");
      await page.keyboard.press("Tab");
      expect(await page.evaluate(() => document.activeElement?.id)).toBe("substance-select");
      await page.keyboard.press("Tab");
      expect(await page.evaluate(() => document.activeElement?.id)).toBe("units-select");
      for (const id of ["path-mass", "path-start", "path-end", "path-pressure"]) {
        await page.keyboard.press("Tab");
        expect(await page.evaluate(() => document.activeElement?.id)).toBe(id);
        // Each input is named by its label.
        expect(await page.evaluate(() => (document.activeElement as HTMLInputElement).labels?.[0]?.textContent ?? "")).not.toBe("");
      }
      await page.keyboard.press("Tab");
      expect(await page.evaluate(() => document.activeElement?.textContent)).toBe("Draw path");
      await page.keyboard.press("Tab");
      const controls = await page.evaluate(() => document.activeElement?.getAttribute("aria-controls"));
      expect(controls).toBe("constant-detail-tripleTemperature");
      const detail = page.locator(`#${controls}`);
      expect(await detail.isVisible()).toBe(false);
      await page.keyboard.press("Enter");
      expect(await detail.isVisible()).toBe(true);
      expect(await detail.textContent()).toContain("doi:");
      await page.keyboard.press("Enter");
      expect(await detail.isVisible()).toBe(false);
    });

    it("fits 350 px and 320 px without sideways scrolling, in light and dark, with 4.5:1 text contrast", async () => {
      // Open every expandable part so that their text is laid out and measured too.
      const openAll = () =>
        page.evaluate(() => {
          document.querySelectorAll("details").forEach((d) => (d.open = true));
          document.querySelectorAll<HTMLElement>("[id^='constant-detail-'], [id^='curve-source-']").forEach((e) => (e.hidden = false));
          document.querySelectorAll("button.cite").forEach((b) => b.setAttribute("aria-expanded", "true"));
        });
      const closeAll = () =>
        page.evaluate(() => {
          document.querySelectorAll("details").forEach((d) => (d.open = false));
          document.querySelectorAll<HTMLElement>("[id^='constant-detail-'], [id^='curve-source-']").forEach((e) => (e.hidden = true));
          document.querySelectorAll("button.cite").forEach((b) => b.setAttribute("aria-expanded", "false"));
        });
      const overflow = () => page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
      await page.selectOption("#units-select", "c-bar");
      await page.locator('.reference-data[data-units="c-bar"]').waitFor();
      for (const scheme of ["light", "dark"] as const) {
        await page.emulateMedia({ colorScheme: scheme });
        await page.setViewportSize({ width: 350, height: 700 });
        const background = await page.evaluate(() => getComputedStyle(document.body).backgroundColor);
        expect(background, `${scheme} page background`).toBe(scheme === "dark" ? "rgb(31, 31, 31)" : "rgb(255, 255, 255)");
        await closeAll();
        await page.evaluate(() => window.scrollTo(0, 0));
        await page.screenshot({ path: path.join(ARTIFACTS, `pane-350-${scheme}.png`) });
        await page.screenshot({ path: path.join(ARTIFACTS, `pane-350-${scheme}-full.png`), fullPage: true });
        expect(await lowContrastTexts(page, 4.5), `${scheme}, closed`).toEqual([]);
        await openAll();
        expect(await overflow(), `${scheme} at 350 px, all open`).toBeLessThanOrEqual(0);
        expect(await lowContrastTexts(page, 4.5), `${scheme}, all open`).toEqual([]);
        await page.screenshot({ path: path.join(ARTIFACTS, `pane-350-${scheme}-open-full.png`), fullPage: true });
        await page.setViewportSize({ width: 320, height: 700 });
        expect(await overflow(), `${scheme} at 320 px, all open`).toBeLessThanOrEqual(0);
        await closeAll();
        expect(await overflow(), `${scheme} at 320 px`).toBeLessThanOrEqual(0);
        await page.evaluate(() => window.scrollTo(0, 0));
        await page.screenshot({ path: path.join(ARTIFACTS, `pane-320-${scheme}.png`) });
      }
      await page.emulateMedia({ colorScheme: "light" });
      await page.setViewportSize({ width: 350, height: 700 });
    });

    /** Marker, state-point and tick positions of the drawn phase diagram, in its user units. */
    const drawnDiagram = () =>
      page.evaluate(() => {
        const svg = document.querySelector<SVGSVGElement>("svg.phase-diagram")!;
        const translate = (e: Element) => {
          const m = /translate\(([-\d.e]+)[ ,]+([-\d.e]+)\)/.exec(e.getAttribute("transform") ?? "");
          return m ? [Number(m[1]), Number(m[2])] : [Number.NaN, Number.NaN];
        };
        // d3 writes minus as U+2212 and groups thousands with commas.
        const value = (e: Element) => Number((e.textContent ?? "").replace(/,/g, "").replace(/\u2212/g, "-"));
        return {
          zoom: svg.dataset["zoom"] ?? "",
          markers: Object.fromEntries(
            Array.from(svg.querySelectorAll("path.pd-marker")).map((m) => [m.getAttribute("data-marker"), translate(m)]),
          ) as Record<string, [number, number]>,
          states: Array.from(svg.querySelectorAll("path.pd-state")).map(translate),
          xTicks: Array.from(svg.querySelectorAll(".pd-axis-x .tick")).map((t) => ({ at: translate(t)[0]!, value: value(t) })),
          yTicks: Array.from(svg.querySelectorAll(".pd-axis-y .tick")).map((t) => ({ at: translate(t)[1]!, value: value(t) })),
        };
      });
    type Drawn = Awaited<ReturnType<typeof drawnDiagram>>;
    /** Where the axes' own ticks put (T, p): linear in T, logarithmic in p, from the outermost ticks. */
    const pixelOf = (drawn: Drawn, t: number, p: number): [number, number] => {
      const [x0, x1] = [drawn.xTicks[0]!, drawn.xTicks.at(-1)!];
      const [y0, y1] = [drawn.yTicks[0]!, drawn.yTicks.at(-1)!];
      return [
        x0.at + ((t - x0.value) * (x1.at - x0.at)) / (x1.value - x0.value),
        y0.at + ((Math.log10(p) - Math.log10(y0.value)) * (y1.at - y0.at)) / (Math.log10(y1.value) - Math.log10(y0.value)),
      ];
    };

    for (const id of ["water", "co2"]) {
      it(`puts the ${id} triple and critical markers where the axes put core's values, within a pixel, in every window`, async () => {
        const substance = findSubstance(id);
        const triple = triplePoint(substance);
        const critical = criticalPoint(substance);
        for (const unitsId of ["c-bar", "si", "f-psi"]) {
          const units = displayUnitsById(unitsId);
          await page.selectOption("#substance-select", substance.id);
          await page.selectOption("#units-select", unitsId);
          await page.locator(`.reference-data[data-substance="${substance.id}"][data-units="${unitsId}"]`).waitFor();
          for (const zoom of ["full", "triple", "critical"]) {
            await page.check(`#pd-zoom-${zoom}`);
            const drawn = await drawnDiagram();
            expect(drawn.zoom).toBe(zoom);
            expect(drawn.xTicks.length).toBeGreaterThanOrEqual(2);
            expect(drawn.yTicks.length).toBeGreaterThanOrEqual(2);
            const expected = {
              triple: pixelOf(drawn, fromSI(units.system, "temperature", triple.temperatureK), fromSI(units.system, "pressure", triple.pressurePa)),
              critical: pixelOf(drawn, fromSI(units.system, "temperature", critical.temperatureK), fromSI(units.system, "pressure", critical.pressurePa)),
            };
            const shown = zoom === "full" ? ["triple", "critical"] : [zoom];
            for (const kind of shown) {
              const at = drawn.markers[kind]!;
              expect(at, `${id} ${kind} marker in ${unitsId}, ${zoom} window`).toBeDefined();
              expect(Math.abs(at[0] - expected[kind as "triple" | "critical"][0]), `${id} ${kind} x, ${unitsId}, ${zoom}`).toBeLessThanOrEqual(1);
              expect(Math.abs(at[1] - expected[kind as "triple" | "critical"][1]), `${id} ${kind} y, ${unitsId}, ${zoom}`).toBeLessThanOrEqual(1);
            }
            // The label beside each marker gives the values as core has them, in the display units.
            if (shown.includes("critical")) {
              const label = await page.locator('svg.phase-diagram text[data-label="critical"]').textContent();
              expect(label).toContain(formatNumber(fromSI(units.system, "pressure", critical.pressurePa)));
            }
          }
        }
        await page.check("#pd-zoom-full");
      });
    }

    it("plots a typed state point with core's phase, and the window choices work from the keyboard", async () => {
      await page.selectOption("#substance-select", "co2");
      await page.selectOption("#units-select", "c-bar");
      await page.locator('.reference-data[data-substance="co2"][data-units="c-bar"]').waitFor();
      await page.check("#pd-zoom-full");
      const co2 = findSubstance("co2");
      // A dry-ice store at −78 °C and 1.01325 bar, and a CO2 line at 40 °C and 100 bar (demo scenario).
      const typed = [
        [-78, 1.01325],
        [40, 100],
      ] as const;
      for (const [t, p] of typed) {
        await page.fill("#pd-point-t", String(t));
        await page.fill("#pd-point-p", String(p));
        await page.locator(".pd-form button[type=submit]").click();
      }
      const items = await page.locator(".pd-points li").allTextContents();
      expect(items).toHaveLength(2);
      typed.forEach(([t, p], i) => {
        const state = phaseAt(co2, toSI(displayUnitsById("c-bar").system, "temperature", t), p * 1e5);
        expect(items[i]).toContain(state.phase);
      });
      const drawn = await drawnDiagram();
      expect(drawn.states).toHaveLength(2);
      typed.forEach(([t, p], i) => {
        const expected = pixelOf(drawn, t, p);
        expect(Math.abs(drawn.states[i]![0]! - expected[0])).toBeLessThanOrEqual(1);
        expect(Math.abs(drawn.states[i]![1]! - expected[1])).toBeLessThanOrEqual(1);
      });
      // Text that is not a number is refused with a message on the field.
      await page.fill("#pd-point-t", "cold");
      await page.locator(".pd-form button[type=submit]").click();
      expect(await page.getAttribute("#pd-point-t", "aria-invalid")).toBe("true");
      expect(await page.locator("#pd-point-error").textContent()).toContain("°C");
      // The window choices are labelled radio buttons: arrow keys move between them.
      await page.focus("#pd-zoom-full");
      expect(await page.evaluate(() => (document.activeElement as HTMLInputElement).labels?.[0]?.textContent)).toBe("Full range");
      await page.keyboard.press("ArrowDown");
      expect((await drawnDiagram()).zoom).toBe("triple");
      await page.keyboard.press("ArrowDown");
      expect((await drawnDiagram()).zoom).toBe("critical");
      await page.check("#pd-zoom-full");
    });

    it("draws the phase diagram legibly at 350 and 320 px, light and dark, and notes what helium-4 lacks", async () => {
      for (const id of ["water", "co2"]) {
        await page.selectOption("#substance-select", id);
        await page.selectOption("#units-select", "c-bar");
        await page.locator(`.reference-data[data-substance="${id}"][data-units="c-bar"]`).waitFor();
        for (const scheme of ["light", "dark"] as const) {
          await page.emulateMedia({ colorScheme: scheme });
          for (const width of [350, 320]) {
            await page.setViewportSize({ width, height: 700 });
            expect(await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth)).toBeLessThanOrEqual(0);
            expect(await lowContrastTexts(page, 4.5), `${id} ${scheme} at ${width} px`).toEqual([]);
            const overflow = await page.evaluate(() => {
              const section = document.querySelector(".pd-section")!.getBoundingClientRect();
              // Inside the diagram, curves reach beyond the plot and are clipped: the SVG itself is measured.
              return Array.from(document.querySelectorAll(".pd-section *"))
                .filter((e) => !e.closest("svg.phase-diagram") || e.matches("svg.phase-diagram"))
                .filter((e) => e.getBoundingClientRect().right > section.right + 0.5)
                .map((e) => e.tagName);
            });
            expect(overflow, `${id} ${scheme} at ${width} px`).toEqual([]);
            await page.locator(".pd-section").screenshot({ path: path.join(ARTIFACTS, `phase-diagram-${id}-${width}-${scheme}.png`) });
          }
        }
      }
      await page.emulateMedia({ colorScheme: "light" });
      await page.setViewportSize({ width: 350, height: 700 });
      await page.selectOption("#substance-select", "helium");
      await page.locator('.reference-data[data-substance="helium"]').waitFor();
      expect(await page.locator("#pd-zoom-triple").count()).toBe(0);
      expect(await page.locator("svg.phase-diagram path.pd-marker").count()).toBe(1);
      expect(await page.locator(".pd-notes").textContent()).toContain("no solid–liquid–vapor triple point");
      await page.locator(".pd-section").screenshot({ path: path.join(ARTIFACTS, "phase-diagram-helium-350-light.png") });
      await page.selectOption("#substance-select", "water");
      await page.selectOption("#units-select", "si");
      await page.locator('.reference-data[data-substance="water"][data-units="si"]').waitFor();
    });

    it("still made no outside request and broke no policy after drawing paths", () => {
      expect(blocked).toEqual([]);
      expect(websockets).toEqual([]);
      expect(pageErrors).toEqual([]);
      // Some seconds after loading outside Office, office.js itself tries to frame its telemetry
      // page and to set an inline style; the page's policy blocks both and the console says so
      // from office.js's own files. Nothing of ours may appear there.
      expect(ownConsoleErrors).toEqual([]);
    });

    const functionsBundle = existsSync(path.join(DIST, "functions.js"));
    it.skipIf(!functionsBundle)("runs PHASE.SATPRESSURE through the page's associated functions", async () => {
      const names = await page.evaluate(() => Object.keys((window as any).CustomFunctions?._association?.mappings ?? {}));
      expect(names).toContain("SATPRESSURE");
      const call = (kelvins: number[][]) =>
        page.evaluate(
          (t) => (window as any).CustomFunctions._association.mappings["SATPRESSURE"]([["water"]], t) as unknown,
          kelvins,
        ) as Promise<number[][]>;
      // IF97 Eq. (31) at 101 325 Pa gives 373.1243 K (IAPWS SR1-86 check value; IF97 Eq. (31)),
      // printed to 0.1 mK; dp/dT there is about 3.6 kPa/K, so Eq. (30) must return 101 325 Pa
      // within 3.6e3 × 5e-5 ≈ 0.2 Pa.
      const [[atmosphere]] = (await call([[373.1243]])) as [[number]];
      expectClose(atmosphere, 101325, { abs: 0.2 });
      // IAPWS R7-97(2012) (IF97), Table 35, Eq. (30) check values, 9 significant digits printed
      // (in MPa); tolerance: half a unit of the last printed digit.
      const table35 = await call([[300], [500], [600]]);
      expectClose(table35[0]![0]!, 0.353658941e-2 * 1e6, { abs: 0.5e-11 * 1e6 });
      expectClose(table35[1]![0]!, 0.263889776e1 * 1e6, { abs: 0.5e-8 * 1e6 });
      expectClose(table35[2]![0]!, 0.123443146e2 * 1e6, { abs: 0.5e-7 * 1e6 });
    });
  });
}
