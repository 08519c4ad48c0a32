/**
 * The rules a Phasecell manifest must keep, as assertions: used on the repository's manifest.xml,
 * on its rewritten dev and release flavours and on the built dist/manifest.xml.
 *
 * Sources of the rules:
 * - shared runtime: Microsoft's "Configure your Office Add-in to use a shared runtime" — one
 *   Runtime with lifetime="long" whose resid is used by the custom functions Page, the
 *   FunctionFile and every ShowTaskpane action; no TaskpaneId on those actions;
 * - resource ids at most 32 characters and defined under Resources; https for every URL: the
 *   add-in-only manifest reference (Resources, bt:Url, SourceLocation);
 * - requirement sets SharedRuntime 1.1 and CustomFunctionsRuntime 1.2 (1.2 introduces
 *   CustomFunctions.Error, which carries our messages): the requirement-set pages;
 * - custom functions namespace: a letter first, then letters, digits, "." or "_", at most
 *   32 characters (project platform guide, §3);
 * - element order of OfficeApp's children: the TaskPaneApp schema's sequence (from memory of the
 *   published schema; the online validator is the authority, see `npm run validate`).
 */
import { parseStringPromise } from "xml2js";
import { expect } from "vitest";

/** One element as xml2js gives it with explicitChildren + preserveChildrenOrder. */
export interface XmlElement {
  readonly "#name": string;
  readonly $?: Readonly<Record<string, string>>;
  readonly $$?: readonly XmlElement[];
  readonly _?: string;
}

export async function parseManifest(xml: string): Promise<XmlElement> {
  const parsed = (await parseStringPromise(xml, {
    explicitChildren: true,
    preserveChildrenOrder: true,
    explicitRoot: true,
  })) as Record<string, XmlElement>;
  const root = parsed["OfficeApp"];
  expect(root, "the root element is OfficeApp").toBeDefined();
  return { ...root!, "#name": "OfficeApp" };
}

export function childrenNamed(element: XmlElement, name: string): XmlElement[] {
  return (element.$$ ?? []).filter((child) => child["#name"] === name);
}

export function onlyChild(element: XmlElement, name: string): XmlElement {
  const found = childrenNamed(element, name);
  expect(found, `<${element["#name"]}> has exactly one <${name}>`).toHaveLength(1);
  return found[0]!;
}

export function descendants(element: XmlElement): XmlElement[] {
  const out: XmlElement[] = [];
  const walk = (node: XmlElement): void => {
    for (const child of node.$$ ?? []) {
      out.push(child);
      walk(child);
    }
  };
  walk(element);
  return out;
}

export function textOf(element: XmlElement): string {
  return (element._ ?? "").trim();
}

/** TaskPaneApp's children in schema order (optional ones included). */
export const OFFICE_APP_ORDER = [
  "Id",
  "AlternateId",
  "Version",
  "ProviderName",
  "DefaultLocale",
  "DisplayName",
  "Description",
  "IconUrl",
  "HighResolutionIconUrl",
  "SupportUrl",
  "AppDomains",
  "Hosts",
  "Requirements",
  "DefaultSettings",
  "Permissions",
  "AllowSnapshot",
  "VersionOverrides",
] as const;

export const NAMESPACE_RULE = /^[A-Za-z][A-Za-z0-9._]{0,31}$/;

/** Compares dotted version numbers: negative, zero or positive. */
export function compareVersions(a: string, b: string): number {
  const pa = a.split(".").map(Number);
  const pb = b.split(".").map(Number);
  for (let i = 0; i < Math.max(pa.length, pb.length); i++) {
    const d = (pa[i] ?? 0) - (pb[i] ?? 0);
    if (d !== 0) return d;
  }
  return 0;
}

export interface ManifestFacts {
  readonly id: string;
  readonly displayName: string;
  readonly namespace: string;
  readonly permissions: string;
  readonly version: string;
  /** resid → value of every resource. */
  readonly resources: ReadonlyMap<string, string>;
  /** Every URL in the manifest (resources and DefaultValue attributes). */
  readonly urls: readonly string[];
  readonly sharedUrl: string;
  readonly functionsScriptUrl: string;
  readonly functionsMetadataUrl: string;
  readonly iconUrls: readonly string[];
}

/**
 * Asserts every shared-runtime and resource rule on one manifest text and returns what the
 * callers check further (namespace, URLs, identity).
 */
export async function checkManifest(xml: string): Promise<ManifestFacts> {
  const root = await parseManifest(xml);
  expect(root.$?.["xsi:type"], "OfficeApp xsi:type").toBe("TaskPaneApp");

  // Element order of OfficeApp's children follows the schema sequence.
  const order = (root.$$ ?? []).map((child) => child["#name"]);
  const positions = order.map((name) => OFFICE_APP_ORDER.indexOf(name as (typeof OFFICE_APP_ORDER)[number]));
  expect(positions.every((p) => p >= 0), `unknown OfficeApp children in ${order.join(", ")}`).toBe(true);
  expect([...positions].sort((a, b) => a - b), `OfficeApp children out of schema order: ${order.join(", ")}`).toEqual(positions);

  const id = textOf(onlyChild(root, "Id"));
  expect(id).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i);
  const version = textOf(onlyChild(root, "Version"));
  expect(version).toMatch(/^\d+\.\d+\.\d+\.\d+$/);
  const displayName = onlyChild(root, "DisplayName").$?.["DefaultValue"] ?? "";
  const permissions = textOf(onlyChild(root, "Permissions"));
  expect(["Restricted", "ReadDocument", "ReadAllDocument", "WriteDocument", "ReadWriteDocument"]).toContain(permissions);

  // Host: Excel workbooks only.
  const hosts = childrenNamed(onlyChild(root, "Hosts"), "Host").map((host) => host.$?.["Name"]);
  expect(hosts).toEqual(["Workbook"]);

  // Requirement sets.
  const sets = onlyChild(onlyChild(root, "Requirements"), "Sets");
  const setVersions = new Map(
    childrenNamed(sets, "Set").map((set) => [set.$?.["Name"] ?? "", set.$?.["MinVersion"] ?? sets.$?.["DefaultMinVersion"] ?? "1.1"]),
  );
  expect(setVersions.get("SharedRuntime"), "SharedRuntime requirement").toBe("1.1");
  const customFunctionsRuntime = setVersions.get("CustomFunctionsRuntime");
  expect(customFunctionsRuntime, "CustomFunctionsRuntime requirement").toBeDefined();
  expect(compareVersions(customFunctionsRuntime!, "1.2"), "CustomFunctionsRuntime ≥ 1.2").toBeGreaterThanOrEqual(0);

  // Resources: ids ≤ 32 characters, unique, values present.
  const overrides = onlyChild(root, "VersionOverrides");
  expect(overrides.$?.["xsi:type"]).toBe("VersionOverridesV1_0");
  const resourcesElement = onlyChild(overrides, "Resources");
  const resources = new Map<string, string>();
  for (const group of resourcesElement.$$ ?? []) {
    for (const entry of group.$$ ?? []) {
      const resid = entry.$?.["id"] ?? "";
      const value = entry.$?.["DefaultValue"] ?? "";
      expect(resid.length, `resource id "${resid}" is 1–32 characters`).toBeGreaterThan(0);
      expect(resid.length, `resource id "${resid}" is at most 32 characters`).toBeLessThanOrEqual(32);
      expect(resources.has(resid), `resource id "${resid}" defined once`).toBe(false);
      expect(value, `resource "${resid}" has a DefaultValue`).not.toBe("");
      resources.set(resid, value);
    }
  }

  // Every resid used anywhere is ≤ 32 characters and defined.
  const all = descendants(root);
  for (const element of all) {
    const resid = element.$?.["resid"];
    if (resid === undefined) continue;
    expect(resid.length, `resid "${resid}" is at most 32 characters`).toBeLessThanOrEqual(32);
    expect(resources.has(resid), `resid "${resid}" (on <${element["#name"]}>) is defined under <Resources>`).toBe(true);
  }

  // The shared runtime.
  const host = onlyChild(onlyChild(overrides, "Hosts"), "Host");
  expect(host.$?.["xsi:type"]).toBe("Workbook");
  expect(host.$$?.[0]?.["#name"], "<Runtimes> is the first child of <Host>").toBe("Runtimes");
  const runtime = onlyChild(onlyChild(host, "Runtimes"), "Runtime");
  expect(runtime.$?.["lifetime"], 'Runtime lifetime="long"').toBe("long");
  const sharedResid = runtime.$?.["resid"] ?? "";

  const customFunctions = childrenNamed(onlyChild(host, "AllFormFactors"), "ExtensionPoint").filter(
    (point) => point.$?.["xsi:type"] === "CustomFunctions",
  );
  expect(customFunctions, "one CustomFunctions extension point").toHaveLength(1);
  const cf = customFunctions[0]!;
  const pageResid = onlyChild(onlyChild(cf, "Page"), "SourceLocation").$?.["resid"];
  expect(pageResid, "custom functions Page uses the runtime's resid").toBe(sharedResid);
  const scriptResid = onlyChild(onlyChild(cf, "Script"), "SourceLocation").$?.["resid"] ?? "";
  const metadataResid = onlyChild(onlyChild(cf, "Metadata"), "SourceLocation").$?.["resid"] ?? "";
  const namespaceResid = onlyChild(cf, "Namespace").$?.["resid"] ?? "";
  const namespace = resources.get(namespaceResid) ?? "";
  expect(namespace, `namespace "${namespace}": letter first, then letters, digits, . or _, ≤ 32`).toMatch(NAMESPACE_RULE);

  const desktop = onlyChild(host, "DesktopFormFactor");
  const functionFile = onlyChild(desktop, "FunctionFile");
  expect(functionFile.$?.["resid"], "FunctionFile uses the runtime's resid").toBe(sharedResid);

  const actions = all.filter((element) => element["#name"] === "Action");
  const showTaskpane = actions.filter((action) => action.$?.["xsi:type"] === "ShowTaskpane");
  expect(showTaskpane.length, "at least one ShowTaskpane action (the ribbon button)").toBeGreaterThan(0);
  for (const action of showTaskpane) {
    expect(onlyChild(action, "SourceLocation").$?.["resid"], "ShowTaskpane uses the runtime's resid").toBe(sharedResid);
    expect(childrenNamed(action, "TaskpaneId"), "no TaskpaneId in a shared-runtime ShowTaskpane action").toHaveLength(0);
  }

  // URLs: all https; the page, the script and the metadata point at the built files.
  const urls = [
    ...[...resources.values()].filter((value) => /^[a-z]+:\/\//i.test(value)),
    ...all.map((element) => element.$?.["DefaultValue"] ?? "").filter((value) => /^[a-z]+:\/\//i.test(value)),
  ];
  for (const url of urls) expect(url, "every URL uses https").toMatch(/^https:\/\//);
  const sharedUrl = resources.get(sharedResid) ?? "";
  expect(sharedUrl).toMatch(/\/taskpane\.html$/);
  expect(onlyChild(onlyChild(root, "DefaultSettings"), "SourceLocation").$?.["DefaultValue"], "DefaultSettings opens the shared page").toBe(sharedUrl);
  const functionsScriptUrl = resources.get(scriptResid) ?? "";
  const functionsMetadataUrl = resources.get(metadataResid) ?? "";
  expect(functionsScriptUrl).toMatch(/\/functions\.js$/);
  expect(functionsMetadataUrl).toMatch(/\/functions\.json$/);

  const iconUrls = [
    onlyChild(root, "IconUrl").$?.["DefaultValue"] ?? "",
    onlyChild(root, "HighResolutionIconUrl").$?.["DefaultValue"] ?? "",
    ...childrenNamed(onlyChild(resourcesElement, "bt:Images"), "bt:Image").map((image) => image.$?.["DefaultValue"] ?? ""),
  ];

  return {
    id,
    displayName,
    namespace,
    permissions,
    version,
    resources,
    urls,
    sharedUrl,
    functionsScriptUrl,
    functionsMetadataUrl,
    iconUrls,
  };
}
