/**
 * Who may import whom (DEVELOPERS.md, "Layers" and "Test helpers"): the layers of src/ point one way, and tests and
 * bench share their helpers through test-support/ instead of reaching into each other's folders. Every relative
 * import of every .ts file is resolved to the top folder it lands in.
 */
import { describe, expect, it } from "vitest";
import { readdirSync, readFileSync, statSync } from "node:fs";
import { dirname, join, relative, resolve } from "node:path";
import { REPO_ROOT } from "../../test-support/bundle-harness";

function tsFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((entry) => {
    const path = join(dir, entry);
    if (statSync(path).isDirectory()) return tsFiles(path);
    return path.endsWith(".ts") ? [path] : [];
  });
}

/** The area of a path: "src/<layer>" inside src, else its top folder. */
function area(path: string): string {
  const parts = relative(REPO_ROOT, path).split(/[\\/]/);
  return parts[0] === "src" ? `src/${parts[1]}` : parts[0];
}

/** Every (importing area → imported area) pair with the importing file and the imported path, relative imports only. */
function importsOf(top: string): { file: string; from: string; to: string; target: string }[] {
  return tsFiles(join(REPO_ROOT, top)).flatMap((file) => {
    const text = readFileSync(file, "utf8");
    const specifiers = [...text.matchAll(/(?:from|import)\s*\(?\s*"(\.{1,2}\/[^"]+)"/g)].map((m) => m[1]);
    return specifiers.map((s) => ({
      file: relative(REPO_ROOT, file),
      from: area(file),
      to: area(resolve(dirname(file), s)),
      target: relative(REPO_ROOT, resolve(dirname(file), s)),
    }));
  });
}

const all = ["src", "tests", "test-support", "bench", "scripts"].flatMap(importsOf);
const offending = (rule: (from: string, to: string) => boolean) =>
  all.filter((i) => rule(i.from, i.to)).map((i) => `${i.file} → ${i.to}`);

describe("imports between the folders", () => {
  it("finds the imports it checks (the scan itself works)", () => {
    expect(all.some((i) => i.from === "bench" && i.to === "test-support")).toBe(true);
    expect(all.some((i) => i.from === "src/functions" && i.to === "src/chemistry")).toBe(true);
  });

  it("no test imports bench, no bench file imports a test file", () => {
    expect(offending((from, to) => from === "tests" && to === "bench")).toEqual([]);
    expect(offending((from, to) => from === "bench" && to === "tests")).toEqual([]);
  });

  it("test-support imports neither tests nor bench", () => {
    expect(offending((from, to) => from === "test-support" && (to === "tests" || to === "bench"))).toEqual([]);
  });

  it("src imports nothing outside src (but data/ and package.json for the version)", () => {
    expect(
      offending(
        (from, to) => from.startsWith("src/") && !to.startsWith("src/") && !["data", "package.json"].includes(to),
      ),
    ).toEqual([]);
  });

  it("src/chemistry imports no other layer; the middle layers only src/chemistry; src/cli never src/taskpane", () => {
    const middle = ["src/functions", "src/diagram", "src/tables"];
    const hosts = ["src/taskpane", "src/cli", "src/commands"];
    expect(offending((from, to) => from === "src/chemistry" && to.startsWith("src/") && to !== from)).toEqual([]);
    expect(
      offending((from, to) => middle.includes(from) && to.startsWith("src/") && ![from, "src/chemistry"].includes(to)),
    ).toEqual([]);
    expect(offending((from, to) => hosts.includes(from) && hosts.includes(to) && to !== from)).toEqual([]);
  });

  it("other layers of src reach src/chemistry, src/functions, src/diagram and src/tables through their index.ts", () => {
    const throughIndex = ["src/chemistry", "src/functions", "src/diagram", "src/tables"];
    const around = all.filter(
      (i) => i.from.startsWith("src/") && i.from !== i.to && throughIndex.includes(i.to) && i.target !== i.to,
    );
    expect(around.map((i) => `${i.file} → ${i.target}`)).toEqual([]);
    expect(all.some((i) => i.from === "src/cli" && i.target === "src/chemistry")).toBe(true);
  });
});
