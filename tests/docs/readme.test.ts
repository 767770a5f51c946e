/**
 * README.md against the built add-in: the function reference lists every function of dist/functions.json with its
 * arguments in order (optional ones in brackets) and names no function that does not exist; the literal formula
 * examples of the README and docs/ give the answers they state when evaluated through the built bundle; the set-up
 * commands, the cautions and the screenshot are there.
 */
import { existsSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { loadBundle, LoadedBundle, REPO_ROOT, StandInError } from "../../test-support/bundle-harness";
import { demoFigures, figureBlocks, FIGURE_DOCUMENTS } from "../../scripts/demo-figures";

const readme = readFileSync(join(REPO_ROOT, "README.md"), "utf8");
let bundle: LoadedBundle;
beforeAll(() => {
  bundle = loadBundle();
});

function signature(f: { id: string; parameters: { name: string; optional?: boolean }[] }): string {
  return `REDOX.${f.id}(${f.parameters.map((p) => (p.optional ? `[${p.name}]` : p.name)).join(", ")})`;
}

/** Splits a formula's argument list on top-level commas; an empty piece is an omitted argument. */
function splitArguments(text: string): string[] {
  const parts: string[] = [];
  let depth = 0;
  let current = "";
  let quoted = false;
  for (const ch of text) {
    if (ch === '"') quoted = !quoted;
    if (!quoted && ch === "(") depth++;
    if (!quoted && ch === ")") depth--;
    if (!quoted && depth === 0 && ch === ",") {
      parts.push(current.trim());
      current = "";
    } else current += ch;
  }
  parts.push(current.trim());
  return parts;
}

/** A number or a product/quotient of numbers, as typed in an example ("595/1000"). */
function arithmetic(text: string): number {
  const [first, ...rest] = text.split(/([*/])/).map((t) => t.trim());
  let value = Number(first);
  for (let i = 0; i < rest.length; i += 2)
    value = rest[i] === "*" ? value * Number(rest[i + 1]) : value / Number(rest[i + 1]);
  if (!Number.isFinite(value)) throw new Error(`unreadable number ${text}`);
  return value;
}

/** Evaluates a literal formula (numbers, "text", omitted arguments, nested REDOX calls) through the bundle. */
function evaluate(formula: string): unknown {
  const match = /^REDOX\.([A-Z]+)\((.*)\)$/.exec(formula.trim());
  if (!match) throw new Error(`not a REDOX formula: ${formula}`);
  const fn = bundle.functions.get(match[1]);
  if (!fn) throw new Error(`no function ${match[1]}`);
  const args = splitArguments(match[2]).map((a) => {
    if (a === "") return null;
    if (a.startsWith('"')) return [[a.slice(1, -1)]];
    if (a.startsWith("REDOX.")) return [[evaluate(a)]];
    if (/^[\d.eE+\-*/ ]+$/.test(a)) return [[arithmetic(a)]];
    throw new Error(`unreadable argument ${a}`);
  });
  const out = fn(...args) as unknown[][];
  return out[0][0];
}

describe("README function reference", () => {
  it("lists every function of functions.json with its arguments in order", () => {
    for (const f of bundle.metadata.functions) expect(readme).toContain(`\`${signature(f)}`);
  });

  it("gives every function of functions.json a heading, and no heading to a function it lacks", () => {
    const ids = new Set(bundle.metadata.functions.map((f) => f.id));
    // a heading may name several functions: "#### `REDOX.PE(…)` and `REDOX.EH(…)`"
    const headings = [...readme.matchAll(/^#### .*$/gm)].flatMap((m) =>
      [...m[0].matchAll(/`REDOX\.([A-Z]+)\(/g)].map((n) => n[1]),
    );
    expect(new Set(headings)).toEqual(ids);
  });

  it("says which error codes the functions answer with and why (Excel shows messages only for #VALUE! and #N/A)", () => {
    expect(readme).toMatch(/custom message only with `#VALUE!` and `#N\/A`/);
    expect(readme).toContain("allowErrorForDataTypeAny");
    const reference = readme.split("## Function reference")[1].split("## Worked examples")[0];
    expect(reference.replace(/`#NUM!` and the other codes appear bare/, "")).not.toContain("#NUM!");
  });
});

/** Lines "=REDOX.F(args) → answer" in the README and the docs, evaluated through the built bundle. */
const DOCUMENTS = ["README.md", "docs/worked-examples.md", "docs/ligands.md", "docs/cli.md", "docs/lead-and-copper.md"];

describe("formula examples in the README and docs, evaluated through the built bundle", () => {
  for (const document of DOCUMENTS) {
    const text = readFileSync(join(REPO_ROOT, document), "utf8");
    const examples = [...text.matchAll(/^=(REDOX\.[A-Z]+\(.*\))\s+→\s+(.+)$/gm)].map((m) => ({
      formula: m[1],
      stated: m[2].trim(),
    }));
    if (document !== "docs/cli.md") {
      it(`${document} has literal examples`, () => expect(examples.length).toBeGreaterThanOrEqual(4));
    }
    for (const { formula, stated } of examples) {
      it(`${document}: ${formula} → ${stated}`, () => {
        const value = evaluate(formula);
        if (stated.startsWith("#")) {
          expect(value).toBeInstanceOf(StandInError);
          expect((value as StandInError).code).toBe(stated.split(/\s+/)[0]);
          return;
        }
        expect(value).not.toBeInstanceOf(StandInError);
        const numeric = /^(about\s+)?([-−]?\d[\d.]*(?:E-?\d+)?)/i.exec(stated);
        if (numeric) {
          const figure = numeric[2].replace("−", "-");
          const expected = Number(figure);
          const decimals = figure.includes(".") && !/E/i.test(figure) ? figure.split(".")[1].length : 0;
          // "about" allows 10 %; a plain figure must round to what is printed (half a unit of its last digit)
          const tolerance = numeric[1]
            ? 0.1 * Math.abs(expected)
            : /E/i.test(figure)
              ? 0.005 * Math.abs(expected)
              : 0.5 * 10 ** -decimals + 1e-12;
          expect(typeof value).toBe("number");
          expect(Math.abs((value as number) - expected)).toBeLessThanOrEqual(tolerance);
        } else {
          expect(value).toBe(stated.split(/\s+/)[0]);
        }
      });
    }
  }
});

describe("figures quoted about the demo data are the ones the code computes (scripts/demo-figures.ts)", () => {
  let figures: Record<string, string>;
  beforeAll(async () => {
    figures = await demoFigures();
  }, 120_000);

  for (const document of FIGURE_DOCUMENTS) {
    it(`${document}: every figure block matches; regenerate with npx tsx scripts/demo-figures.ts --write`, () => {
      const blocks = figureBlocks(readFileSync(join(REPO_ROOT, document), "utf8"));
      expect(blocks.size).toBeGreaterThan(0);
      for (const [name, text] of blocks) expect(text, name).toBe(figures[name]);
    });
  }

  it("the README's worked example uses a real row of the workbook (data start in row 3) and the docs the demo's counts", () => {
    expect(figures["worked-row"]).toMatch(/is row 3 of the workbook/);
    expect(readme).not.toMatch(/\b[A-Z]2\/1000|\(C2, F2/);
    const blocks = [...FIGURE_DOCUMENTS]
      .map((d) => [...figureBlocks(readFileSync(join(REPO_ROOT, d), "utf8")).keys()])
      .flat();
    expect(blocks.sort()).toEqual(["mill-lane", "regimes-per-site", "worked-row"]);
  });
});

describe("README essentials", () => {
  it("shows the two set-up commands", () => {
    expect(readme).toContain("npm ci && npm run demo");
    expect(readme).toContain("npm ci && npm test");
  });

  it("has the cautions section the pane links to", () => {
    expect(readme).toMatch(/^## Cautions$/m);
    for (const phrase of ["not how fast", "laboratory", "regulators", "licensed corrosion professionals"])
      expect(readme).toContain(phrase);
  });

  it("the pane's caution link leads to a built page carrying README's cautions", () => {
    const pane = readFileSync(join(bundle.dist, "taskpane.html"), "utf8");
    const target = /id="?caution-link"?[^>]*href="?([^"#\s>]+)/.exec(pane)?.[1];
    expect(target).toBe("cautions.html");
    const page = readFileSync(join(bundle.dist, target!), "utf8");
    for (const phrase of ["not how fast", "laboratory analysis", "licensed corrosion professionals"])
      expect(page).toContain(phrase);
  });

  it("shows a screenshot that exists in the repository", () => {
    const image = /!\[[^\]]*\]\(([^)]+\.png)\)/.exec(readme)?.[1];
    expect(image).toBeDefined();
    expect(existsSync(join(REPO_ROOT, image!))).toBe(true);
  });
});
