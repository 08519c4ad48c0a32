/**
 * manifest.xml, offline: the shared-runtime and resource rules (see manifest-rules.ts for their
 * sources), our own ribbon wording, the icons it points at, and the build-time rewrite into the
 * dev and release flavours. Microsoft's online validator is tried last and only reported on.
 */
import { spawnSync } from "node:child_process";
import { readFileSync, existsSync } from "node:fs";
import { join, basename } from "node:path";
import { describe, expect, it } from "vitest";
import { DEV, DEV_ORIGIN, RELEASE, flavourManifest } from "../../addin/manifest-flavour.cjs";
import { checkManifest, childrenNamed, descendants, onlyChild, parseManifest } from "./manifest-rules";

const ROOT = join(__dirname, "..", "..");
const SOURCE = readFileSync(join(ROOT, "manifest.xml"), "utf8");

/** Width and height from a PNG's IHDR chunk (PNG specification, ISO/IEC 15948, §11.2.2). */
function pngSize(file: string): { width: number; height: number } {
  const bytes = readFileSync(file);
  expect(bytes.subarray(0, 8).toString("hex"), `${basename(file)} has the PNG signature`).toBe("89504e470d0a1a0a");
  expect(bytes.subarray(12, 16).toString("ascii")).toBe("IHDR");
  return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
}

describe("manifest.xml (development source)", () => {
  it("keeps the shared-runtime, resource and URL rules", async () => {
    const facts = await checkManifest(SOURCE);
    expect(facts.namespace).toBe("PHASE");
    expect(facts.id).toBe(RELEASE.id);
    expect(facts.displayName).toBe("Phasecell");
    for (const url of facts.urls) expect(url.startsWith(`${DEV_ORIGIN}/`), `${url} is served by the local server`).toBe(true);
    expect(facts.sharedUrl).toBe(`${DEV_ORIGIN}/taskpane.html`);
    expect(facts.functionsScriptUrl).toBe(`${DEV_ORIGIN}/functions.js`);
    expect(facts.functionsMetadataUrl).toBe(`${DEV_ORIGIN}/functions.json`);
  });

  it("asks for the least permission the add-in uses", async () => {
    // Decision: the cell functions need no document access, but the pane reads the workbook's
    // selection (a selected PHASE.PATH result is drawn from its values, taskpane/office-selection.ts)
    // and follows selection changes. Reading needs ReadDocument (Microsoft's permission levels for
    // task pane add-ins); the pane never writes, so nothing above it.
    const facts = await checkManifest(SOURCE);
    expect(facts.permissions).toBe("ReadDocument");
  });

  it("has the package version", async () => {
    const pkg = JSON.parse(readFileSync(join(ROOT, "package.json"), "utf8")) as { version: string };
    const facts = await checkManifest(SOURCE);
    expect(facts.version).toBe(`${pkg.version}.0`);
  });

  it("puts one button that opens the pane in a Phasecell group on the Home tab", async () => {
    const root = await parseManifest(SOURCE);
    const facts = await checkManifest(SOURCE);
    const groups = descendants(root).filter((element) => element["#name"] === "Group");
    expect(groups).toHaveLength(1);
    const group = groups[0]!;
    expect(facts.resources.get(onlyChild(group, "Label").$?.["resid"] ?? "")).toBe("Phasecell");
    const buttons = childrenNamed(group, "Control");
    expect(buttons).toHaveLength(1);
    expect(buttons[0]!.$?.["xsi:type"]).toBe("Button");
    expect(facts.resources.get(onlyChild(buttons[0]!, "Label").$?.["resid"] ?? "")).toBe("Phase pane");
    expect(onlyChild(buttons[0]!, "Action").$?.["xsi:type"]).toBe("ShowTaskpane");
  });

  it("points at icons that exist in addin/assets with the sizes declared", async () => {
    const root = await parseManifest(SOURCE);
    const facts = await checkManifest(SOURCE);
    const declared = new Map<string, number>();
    declared.set(onlyChild(root, "IconUrl").$?.["DefaultValue"] ?? "", 32);
    declared.set(onlyChild(root, "HighResolutionIconUrl").$?.["DefaultValue"] ?? "", 64);
    for (const image of descendants(root).filter((element) => element["#name"] === "bt:Image" && element.$?.["size"])) {
      declared.set(facts.resources.get(image.$?.["resid"] ?? "") ?? "", Number(image.$?.["size"]));
    }
    expect(new Set(facts.iconUrls)).toEqual(new Set(declared.keys()));
    for (const [url, size] of declared) {
      const file = join(ROOT, "addin", url.replace(`${DEV_ORIGIN}/`, ""));
      expect(existsSync(file), `${url} → addin/${url.replace(`${DEV_ORIGIN}/`, "")}`).toBe(true);
      expect(pngSize(file)).toEqual({ width: size, height: size });
    }
  });
});

describe("the rules catch a broken manifest", () => {
  const mutations: ReadonlyArray<readonly [string, string, string]> = [
    ["short runtime lifetime", 'lifetime="long"', 'lifetime="short"'],
    ["FunctionFile on another page", '<FunctionFile resid="Shared.Url"/>', '<FunctionFile resid="Functions.Script.Url"/>'],
    [
      "TaskpaneId in the ShowTaskpane action",
      '<Action xsi:type="ShowTaskpane">',
      '<Action xsi:type="ShowTaskpane">\n<TaskpaneId>PhasecellPane</TaskpaneId>',
    ],
    ["namespace starting with a digit", 'DefaultValue="PHASE"/>', 'DefaultValue="1PHASE"/>'],
    ["CustomFunctionsRuntime 1.1", '<Set Name="CustomFunctionsRuntime" MinVersion="1.2"/>', '<Set Name="CustomFunctionsRuntime" MinVersion="1.1"/>'],
    ["an http URL", 'DefaultValue="https://localhost:3000/functions.json"', 'DefaultValue="http://localhost:3000/functions.json"'],
    ["a resid over 32 characters", 'resid="Group.Label"', 'resid="Group.Label.For.The.Phasecell.Ribbon"'],
    ["an undefined resid", 'resid="PaneButton.Tip"', 'resid="PaneButton.Tooltip"'],
    ["elements out of schema order", "<Version>0.1.0.0</Version>\n  <ProviderName>Phasecell</ProviderName>", "<ProviderName>Phasecell</ProviderName>\n  <Version>0.1.0.0</Version>"],
  ];
  it.each(mutations)("rejects %s", async (_what, from, to) => {
    expect(SOURCE.includes(from), `the test's anchor text is still in manifest.xml: ${from}`).toBe(true);
    await expect(checkManifest(SOURCE.replace(from, to))).rejects.toThrow();
  });
});

describe("build-time manifest flavours (addin/manifest-flavour.cjs)", () => {
  it("dev flavour: own Id, DisplayName and namespace PHASEDEV; same URLs; rules kept", async () => {
    const dev = flavourManifest(SOURCE, { flavour: "dev" });
    const facts = await checkManifest(dev);
    expect(facts.namespace).toBe(DEV.namespace);
    expect(facts.namespace).not.toBe(RELEASE.namespace);
    expect(facts.id).toBe(DEV.id);
    expect(facts.id).not.toBe(RELEASE.id);
    expect(facts.displayName).toBe(DEV.displayName);
    expect(facts.urls).toEqual((await checkManifest(SOURCE)).urls);
  });

  it("release flavour without an origin is the file as written, under a generated-copy note", () => {
    const leadingComment = /^(<\?xml[^>]*\?>\s*)<!--[\s\S]*?-->/;
    const built = flavourManifest(SOURCE, { flavour: "release" });
    expect(built).toMatch(/Generated by the build from manifest\.xml/);
    expect(built.replace(leadingComment, "$1")).toBe(SOURCE.replace(leadingComment, "$1"));
  });

  it("release flavour rewrites every URL to the given origin and keeps the rules", async () => {
    const origin = "https://addin.example.org/phasecell/";
    const built = flavourManifest(SOURCE, { flavour: "release", origin });
    const facts = await checkManifest(built);
    expect(facts.namespace).toBe("PHASE");
    expect(facts.urls.length).toBeGreaterThan(0);
    for (const url of facts.urls) expect(url.startsWith("https://addin.example.org/phasecell/")).toBe(true);
    expect(facts.sharedUrl).toBe("https://addin.example.org/phasecell/taskpane.html");
    expect(built.includes(DEV_ORIGIN), "no trace of the development origin, comments included").toBe(false);
  });

  it("refuses an origin Office would not load", () => {
    expect(() => flavourManifest(SOURCE, { flavour: "release", origin: "http://addin.example.org" })).toThrow(/https/);
    expect(() => flavourManifest(SOURCE, { flavour: "release", origin: "addin.example.org" })).toThrow(/not a URL/);
    expect(() => flavourManifest(SOURCE, { flavour: "release", origin: "https://addin.example.org/?v=2" })).toThrow(/query/);
  });

  it("fails loudly when the manifest no longer matches what the rewrite expects", () => {
    const edited = SOURCE.replace('id="Functions.Namespace" DefaultValue="PHASE"', 'id="Functions.Namespace" DefaultValue="PHASEX"');
    expect(() => flavourManifest(edited, { flavour: "dev" })).toThrow(/namespace/);
  });
});

describe("Microsoft's online manifest validator (needs the internet; reported, never failing offline)", () => {
  it("validates manifest.xml when the service is reachable", () => {
    const cli = join(ROOT, "node_modules", "office-addin-manifest", "cli.js");
    const run = spawnSync(process.execPath, [cli, "validate", join(ROOT, "manifest.xml")], {
      encoding: "utf8",
      timeout: 20_000,
      env: { ...process.env, FORCE_COLOR: "0" },
    });
    const output = `${run.stdout ?? ""}${run.stderr ?? ""}`;
    if (run.error || run.signal || /Unable to contact the manifest validation service/i.test(output)) {
      console.info(
        "office-addin-manifest validate: could not reach Microsoft's validation service " +
          `(${run.signal ? "no answer within 20 s" : (output.split("\n").find((line) => /reason:/.test(line)) ?? "offline").trim()}); ` +
          "manifest.xml was checked offline only. Run `npm run validate` where the internet is reachable.",
      );
      return;
    }
    if (/Unable to validate the manifest/i.test(output)) {
      console.info(`office-addin-manifest validate: the service answered with an error, not a verdict:\n${output}`);
      return;
    }
    expect(output, "the validation service's verdict").toMatch(/The manifest is valid/i);
    expect(run.status).toBe(0);
  });
});
