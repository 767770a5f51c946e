// Offline structural check of manifest.xml (the online validator is unreachable here): well-formed XML, the
// elements an Excel add-in with custom functions, a shared runtime and a ribbon button needs, every resource id it
// uses defined, every URL it names served by the build (a file in dist/), the namespace REDOX, and functions.json
// ids that match the @customfunction declarations of the sources. Reads dist/ (or REDOX_DIST).

import { readFileSync, existsSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { XMLParser, XMLValidator } from "fast-xml-parser";
import { REPO_ROOT, distDir, type Metadata } from "../../test-support/bundle-harness";

const DEV_ORIGIN = "https://localhost:3000";
const manifestText = readFileSync(join(REPO_ROOT, "manifest.xml"), "utf8");
const dist = distDir();

type Node = Record<string, unknown>;
const parser = new XMLParser({
  ignoreAttributes: false,
  attributeNamePrefix: "@",
  parseTagValue: false,
  trimValues: true,
  isArray: (name) =>
    ["bt:Image", "bt:Url", "bt:String", "Control", "Group", "Host", "Set", "ExtensionPoint", "Runtime"].includes(name),
});
const doc = parser.parse(manifestText) as Node;
const app = doc.OfficeApp as Node;

/** Child at a path of element names (first element of arrays), or undefined. */
function at(node: unknown, ...pathNames: string[]): any {
  let cur: any = node;
  for (const name of pathNames) {
    if (cur === undefined || cur === null) return undefined;
    if (Array.isArray(cur)) cur = cur[0];
    cur = cur[name];
  }
  return cur;
}

/** Every value of attribute `attr` anywhere under node. */
function allAttributes(node: unknown, attr: string, out: string[] = []): string[] {
  if (Array.isArray(node)) node.forEach((n) => allAttributes(n, attr, out));
  else if (node && typeof node === "object") {
    for (const [k, v] of Object.entries(node)) {
      if (k === attr && typeof v === "string") out.push(v);
      else allAttributes(v, attr, out);
    }
  }
  return out;
}

const overrides = at(app, "VersionOverrides");
const workbookHost = (at(overrides, "Hosts", "Host") as Node[] | undefined)?.find((h) => h["@xsi:type"] === "Workbook");
const resources = at(overrides, "Resources");
const resourceIds = (kind: string, list: string) =>
  new Map<string, string>(
    ((at(resources, kind, list) as Node[] | undefined) ?? []).map((n) => [
      n["@id"] as string,
      n["@DefaultValue"] as string,
    ]),
  );
const images = resourceIds("bt:Images", "bt:Image");
const urls = resourceIds("bt:Urls", "bt:Url");
const shortStrings = resourceIds("bt:ShortStrings", "bt:String");
const longStrings = resourceIds("bt:LongStrings", "bt:String");
const urlOf = (resid: string) => urls.get(resid);

describe("manifest.xml is well formed and complete", () => {
  it("is well-formed XML", () => {
    expect(XMLValidator.validate(manifestText)).toBe(true);
  });

  it("is a task pane add-in for Excel with an id, version and provider of our own", () => {
    expect(app["@xsi:type"]).toBe("TaskPaneApp");
    expect(app["@xmlns"]).toBe("http://schemas.microsoft.com/office/appforoffice/1.1");
    expect(String(app.Id)).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
    expect(String(app.Version)).toMatch(/^\d+\.\d+\.\d+\.\d+$/);
    expect(app.ProviderName).toBe("Redox Cells project");
    expect(at(app, "DisplayName", "@DefaultValue")).toBe("Redox Cells");
    expect(at(app, "Description", "@DefaultValue")).toBeTruthy();
    expect((at(app, "Hosts", "Host") as Node[]).map((h) => h["@Name"])).toEqual(["Workbook"]);
    expect(at(app, "DefaultSettings", "SourceLocation", "@DefaultValue")).toBe(`${DEV_ORIGIN}/taskpane.html`);
  });

  it("asks ReadWriteDocument: the least that lets the pane read ranges and insert a picture (Excel.run)", () => {
    expect(app.Permissions).toBe("ReadWriteDocument");
  });

  it("requires the shared runtime and declares it with lifetime long on the task pane page", () => {
    const sets = (at(app, "Requirements", "Sets", "Set") as Node[]).map((s) => s["@Name"]);
    expect(sets).toContain("SharedRuntime");
    const runtime = (at(workbookHost, "Runtimes", "Runtime") as Node[])[0];
    expect(runtime["@lifetime"]).toBe("long");
    expect(urlOf(runtime["@resid"] as string)).toBe(`${DEV_ORIGIN}/taskpane.html`);
  });

  it("declares custom functions (script, page, metadata) under the namespace REDOX", () => {
    const cf = (at(workbookHost, "AllFormFactors", "ExtensionPoint") as Node[]).find(
      (e) => e["@xsi:type"] === "CustomFunctions",
    );
    expect(cf).toBeDefined();
    expect(urlOf(at(cf, "Script", "SourceLocation", "@resid"))).toBe(`${DEV_ORIGIN}/functions.js`);
    expect(urlOf(at(cf, "Metadata", "SourceLocation", "@resid"))).toBe(`${DEV_ORIGIN}/functions.json`);
    // Shared runtime: the custom-functions page is the runtime's page.
    expect(at(cf, "Page", "SourceLocation", "@resid")).toBe(
      (at(workbookHost, "Runtimes", "Runtime") as Node[])[0]["@resid"],
    );
    expect(shortStrings.get(at(cf, "Namespace", "@resid"))).toBe("REDOX");
  });

  it("has a ribbon button that opens the task pane, with 16/32/80 px icons", () => {
    const surface = (at(workbookHost, "DesktopFormFactor", "ExtensionPoint") as Node[]).find(
      (e) => e["@xsi:type"] === "PrimaryCommandSurface",
    );
    const group = (at(surface, "OfficeTab", "Group") as Node[])[0];
    const button = (group.Control as Node[]).find((c) => c["@xsi:type"] === "Button");
    expect(button).toBeDefined();
    const action = at(button, "Action");
    expect(action["@xsi:type"]).toBe("ShowTaskpane");
    expect(urlOf(at(action, "SourceLocation", "@resid"))).toBe(`${DEV_ORIGIN}/taskpane.html`);
    for (const holder of [group, button]) {
      const sizes = (at(holder, "Icon", "bt:Image") as Node[]).map((i) => i["@size"]).sort();
      expect(sizes).toEqual(["16", "32", "80"]);
    }
    expect(shortStrings.get(at(button, "Label", "@resid"))).toBeTruthy();
    expect(longStrings.get(at(button, "Supertip", "Description", "@resid"))).toBeTruthy();
  });

  it("defines every resource id it uses", () => {
    const defined = new Set([...images.keys(), ...urls.keys(), ...shortStrings.keys(), ...longStrings.keys()]);
    const used = allAttributes(overrides, "@resid");
    expect(used.length).toBeGreaterThan(5);
    expect(used.filter((id) => !defined.has(id))).toEqual([]);
  });

  it("keeps short strings within 125 and long strings within 250 characters", () => {
    for (const s of shortStrings.values()) expect(s.length).toBeLessThanOrEqual(125);
    for (const s of longStrings.values()) expect(s.length).toBeLessThanOrEqual(250);
  });
});

describe("manifest.xml and the build agree", () => {
  // Every attribute value or element text that is a URL (comments are not parsed), namespace declarations aside.
  const named: string[] = [];
  (function collect(node: unknown, key = ""): void {
    if (Array.isArray(node)) node.forEach((n) => collect(n, key));
    else if (node && typeof node === "object") Object.entries(node).forEach(([k, v]) => collect(v, k));
    else if (typeof node === "string" && /^https?:\/\//i.test(node.trim()) && !key.startsWith("@xmlns"))
      named.push(node.trim());
  })(doc);

  it("names only URLs on the dev server", () => {
    expect(named.length).toBeGreaterThan(5);
    expect(named.filter((u) => !u.startsWith(`${DEV_ORIGIN}/`))).toEqual([]);
  });

  it.each([...new Set(named)].map((u) => [u]))("%s is a file the build writes", (url) => {
    const rel = new URL(url).pathname.replace(/^\//, "");
    expect(existsSync(join(dist, rel)), `${join(dist, rel)} missing`).toBe(true);
  });

  it("icons are PNGs of the sizes they are declared as", () => {
    const declaredSizes: Array<[string, number]> = [
      [at(app, "IconUrl", "@DefaultValue"), 32],
      [at(app, "HighResolutionIconUrl", "@DefaultValue"), 64],
      ...[...images.values()].map((u): [string, number] => [u, Number(/icon-(\d+)\.png$/.exec(u)?.[1])]),
    ];
    for (const [url, size] of declaredSizes) {
      // PNG: 8-byte signature, then the IHDR chunk whose data starts with width and height (big-endian uint32).
      const bytes = readFileSync(join(dist, new URL(url).pathname));
      expect(bytes.subarray(0, 8).toString("hex"), url).toBe("89504e470d0a1a0a");
      expect(bytes.subarray(12, 16).toString("latin1"), url).toBe("IHDR");
      expect([bytes.readUInt32BE(16), bytes.readUInt32BE(20)], url).toEqual([size, size]);
    }
  });

  it("the shared-runtime page loads the functions bundle", () => {
    const html = readFileSync(join(dist, "taskpane.html"), "utf8");
    expect(html).toMatch(/<script[^>]+src="?functions\.js/);
    expect(html).toMatch(/<script[^>]+src="?taskpane\.js/);
  });
});

describe("functions.json matches the declared functions", () => {
  const metadata = JSON.parse(readFileSync(join(dist, "functions.json"), "utf8")) as Metadata;
  const ids = metadata.functions.map((f) => f.id);

  it("ids and names are upper case, unique, and legal after the REDOX. prefix", () => {
    expect(ids.length).toBeGreaterThan(0);
    expect(new Set(ids).size).toBe(ids.length);
    for (const f of metadata.functions) {
      expect(f.id).toMatch(/^[A-Z][A-Z0-9._]*$/);
      expect(f.name).toBe(f.name.toUpperCase());
      expect(`REDOX.${f.name}`.length).toBeLessThanOrEqual(128);
    }
  });

  it("are exactly the @customfunction declarations of src/functions/functions.ts", () => {
    // id = the tag's first word, else the function's name, upper-cased (as the metadata generator does).
    const source = readFileSync(join(REPO_ROOT, "src/functions/functions.ts"), "utf8");
    const declaredIds = [
      ...source.matchAll(
        /\/\*\*((?:(?!\*\/)[\s\S])*?@customfunction\b[^\n]*)[\s\S]*?\*\/\s*(?:export\s+)?(?:async\s+)?function\s+([A-Za-z_$][\w$]*)/g,
      ),
    ].map((m) => {
      const tag = /@customfunction[ \t]+([^\s*]+)/.exec(m[1]);
      return (tag ? tag[1] : m[2]).toUpperCase();
    });
    expect(declaredIds.length).toBeGreaterThan(0);
    expect([...ids].sort()).toEqual([...declaredIds].sort());
  });
});
