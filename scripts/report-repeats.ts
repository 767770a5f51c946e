// `npm run report:repeats [-- --lines N] [-- --shape] [-- dir …]`: places in src/ (or the given folders) where N or
// more significant lines (default 6; blank lines, comments and imports skipped) repeat — the same code, or with
// --shape the same code with other names, strings and numbers. Read with the TypeScript scanner. A tool for
// reviews: it prints, it never fails. Files whose first line starts `// @generated` are written by a script from a
// table (e.g. src/functions/functions.ts from src/functions/declarations.ts): they are listed and skipped, since
// the table, not the output, is what people edit.
import { readdirSync, readFileSync, statSync } from "node:fs";
import { dirname, join, relative, resolve } from "node:path";
import ts from "typescript";

const ROOT = resolve(dirname(new URL(import.meta.url).pathname), "..");

/** A window must hold at least this many tokens, so runs of closing braces do not count as repeats. */
const MIN_TOKENS = 40;

interface Line {
  readonly file: string;
  readonly line: number;
  readonly text: string;
  readonly tokens: number;
}

/** A file written by a script (first line `// @generated …`). */
function isGenerated(path: string): boolean {
  return readFileSync(path, "utf8").startsWith("// @generated");
}

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((entry) => {
    const path = join(dir, entry);
    if (statSync(path).isDirectory()) return sourceFiles(path);
    return path.endsWith(".ts") && !path.endsWith(".d.ts") ? [path] : [];
  });
}

/** A token as compared: with `shape`, every name, string and number stands for any other. */
function tokenText(scanner: ts.Scanner, shape: boolean): string {
  const kind = scanner.getToken();
  if (!shape) return scanner.getTokenText();
  if (kind === ts.SyntaxKind.Identifier || kind === ts.SyntaxKind.PrivateIdentifier) return "$";
  if (kind === ts.SyntaxKind.StringLiteral || kind === ts.SyntaxKind.NoSubstitutionTemplateLiteral) return "'s'";
  if (kind === ts.SyntaxKind.NumericLiteral || kind === ts.SyntaxKind.BigIntLiteral) return "0";
  return scanner.getTokenText();
}

/** The significant lines of a file, each as its normalised tokens (comments and import/export-from lines dropped). */
function significantLines(path: string, shape: boolean): Line[] {
  const text = readFileSync(path, "utf8");
  const source = ts.createSourceFile(path, text, ts.ScriptTarget.Latest, false);
  const scanner = ts.createScanner(ts.ScriptTarget.Latest, true, ts.LanguageVariant.Standard, text);
  const byLine = new Map<number, string[]>();
  for (let kind = scanner.scan(); kind !== ts.SyntaxKind.EndOfFileToken; kind = scanner.scan()) {
    const line = source.getLineAndCharacterOfPosition(scanner.getTokenStart()).line;
    const tokens = byLine.get(line) ?? [];
    tokens.push(tokenText(scanner, shape));
    byLine.set(line, tokens);
  }
  const file = relative(ROOT, path);
  return [...byLine]
    .filter(([, tokens]) => tokens[0] !== "import" && !(tokens[0] === "export" && tokens.includes("from")))
    .map(([line, tokens]) => ({ file, line: line + 1, text: tokens.join(" "), tokens: tokens.length }));
}

interface Repeat {
  readonly first: Line;
  readonly second: Line;
  /** Same file and the second place starts inside the first run: a list matching itself shifted. */
  readonly sameFileAt?: readonly [number, number];
  lines: number;
}

/** Pairs of places where `size` or more consecutive significant lines are equal, each run reported once. */
function repeats(files: readonly string[], size: number, shape: boolean): Repeat[] {
  const perFile = files.map((f) => significantLines(f, shape));
  const seen = new Map<string, { fileIndex: number; at: number }[]>();
  for (const [fileIndex, lines] of perFile.entries()) {
    for (let at = 0; at + size <= lines.length; at++) {
      const window = lines.slice(at, at + size);
      if (window.reduce((n, l) => n + l.tokens, 0) < MIN_TOKENS) continue;
      if (window.every((l) => l.text === window[0].text)) continue; // a list of entries of one shape
      const key = window.map((l) => l.text).join("\n");
      const list = seen.get(key) ?? [];
      list.push({ fileIndex, at });
      seen.set(key, list);
    }
  }
  // a run of matching windows (both places advancing by one line) is one repeat
  const runs = new Map<string, Repeat>();
  for (const places of seen.values()) {
    for (let i = 0; i < places.length; i++) {
      for (let j = i + 1; j < places.length; j++) {
        const [p, q] = [places[i], places[j]];
        if (p.fileIndex === q.fileIndex && Math.abs(p.at - q.at) < size) continue; // overlapping self-match
        const previous = runs.get(`${p.fileIndex}:${p.at - 1}|${q.fileIndex}:${q.at - 1}`);
        const key = `${p.fileIndex}:${p.at}|${q.fileIndex}:${q.at}`;
        if (previous) {
          previous.lines += 1;
          runs.set(key, previous);
        } else {
          const sameFileAt = p.fileIndex === q.fileIndex ? ([p.at, q.at] as const) : undefined;
          const first = perFile[p.fileIndex][p.at];
          runs.set(key, { first, second: perFile[q.fileIndex][q.at], sameFileAt, lines: size });
        }
      }
    }
  }
  const shifted = (r: Repeat) => r.sameFileAt !== undefined && r.sameFileAt[1] < r.sameFileAt[0] + r.lines;
  return [...new Set(runs.values())].filter((r) => !shifted(r)).sort((a, b) => b.lines - a.lines);
}

function main(argv: readonly string[]): void {
  const linesAt = argv.indexOf("--lines");
  const size = linesAt >= 0 ? Number(argv[linesAt + 1]) : 6;
  const shape = argv.includes("--shape");
  const dirs = argv.filter((a, i) => !a.startsWith("--") && (linesAt < 0 || i !== linesAt + 1));
  const all = (dirs.length ? dirs : ["src"]).flatMap((d) => sourceFiles(resolve(ROOT, d)));
  const files = all.filter((f) => !isGenerated(f));
  const found = repeats(files, size, shape);
  for (const f of all.filter(isGenerated)) console.log(`skipped, generated: ${relative(ROOT, f)}`);
  const what = shape ? "the same shape (names, strings and numbers aside)" : "the same code";
  console.log(`${found.length} places where ${size} or more significant lines repeat (${what}):`);
  for (const r of found) {
    console.log(
      `${String(r.lines).padStart(4)}  ${r.first.file}:${r.first.line}  ≈  ${r.second.file}:${r.second.line}`,
    );
  }
}

main(process.argv.slice(2));
