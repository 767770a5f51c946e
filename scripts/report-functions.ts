// `npm run report:functions [-- --limit N] [-- dir …]`: the longest functions in src/ (or the given folders), by
// lines from the declaration to its closing brace, read with the TypeScript compiler API; and the imports between
// the layers of src/ (which folder imports which). A tool for reviews: it prints, it never fails.
import { readdirSync, readFileSync, statSync } from "node:fs";
import { dirname, join, relative, resolve } from "node:path";
import ts from "typescript";

const ROOT = resolve(dirname(new URL(import.meta.url).pathname), "..");

/** House limit on a function's length, lines (DEVELOPERS.md). */
const FUNCTION_LINE_LIMIT = 80;

interface FunctionLength {
  readonly file: string;
  readonly name: string;
  readonly line: number;
  readonly lines: number;
}

/** Every .ts file under a folder, recursively. */
function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((entry) => {
    const path = join(dir, entry);
    if (statSync(path).isDirectory()) return sourceFiles(path);
    return path.endsWith(".ts") && !path.endsWith(".d.ts") ? [path] : [];
  });
}

/** A readable name for a function-like node: its own name, the variable or property it is assigned to, or its class. */
function functionName(node: ts.Node, source: ts.SourceFile): string {
  const named = node as ts.Node & { name?: ts.Node };
  const own = named.name ? named.name.getText(source) : undefined;
  const parent = node.parent;
  const holder =
    ts.isVariableDeclaration(parent) || ts.isPropertyAssignment(parent) || ts.isPropertyDeclaration(parent)
      ? parent.name.getText(source)
      : undefined;
  const base = own ?? holder ?? (ts.isConstructorDeclaration(node) ? "constructor" : "(anonymous)");
  const owner =
    ts.isClassDeclaration(parent) || ts.isClassExpression(parent) ? parent.name?.getText(source) : undefined;
  return owner ? `${owner}.${base}` : base;
}

function isFunctionLike(node: ts.Node): node is ts.FunctionLikeDeclaration {
  return (
    ts.isFunctionDeclaration(node) ||
    ts.isMethodDeclaration(node) ||
    ts.isConstructorDeclaration(node) ||
    ts.isGetAccessorDeclaration(node) ||
    ts.isSetAccessorDeclaration(node) ||
    ts.isArrowFunction(node) ||
    ts.isFunctionExpression(node)
  );
}

/** Lengths of every function with a body in one file (nested functions are counted on their own too). */
function functionLengths(path: string): FunctionLength[] {
  const source = ts.createSourceFile(path, readFileSync(path, "utf8"), ts.ScriptTarget.Latest, true);
  const found: FunctionLength[] = [];
  const visit = (node: ts.Node): void => {
    if (isFunctionLike(node) && node.body) {
      const start = source.getLineAndCharacterOfPosition(node.getStart(source)).line;
      const end = source.getLineAndCharacterOfPosition(node.getEnd()).line;
      found.push({
        file: relative(ROOT, path),
        name: functionName(node, source),
        line: start + 1,
        lines: end - start + 1,
      });
    }
    ts.forEachChild(node, visit);
  };
  visit(source);
  return found;
}

/** The layer of a file, or of a layer's folder (its index.ts): the first folder under src/ ("chemistry", …). */
function layerOf(path: string): string | undefined {
  const parts = relative(join(ROOT, "src"), path).split("/");
  if (parts[0] === ".." || parts[0] === "") return undefined;
  return parts.length > 1 || !parts[0].includes(".") ? parts[0] : undefined;
}

/** Import counts between layers of src/: "from → to" → number of import statements. */
function layerImports(files: readonly string[]): Map<string, number> {
  const edges = new Map<string, number>();
  for (const path of files) {
    const from = layerOf(path);
    if (!from) continue;
    const source = ts.createSourceFile(path, readFileSync(path, "utf8"), ts.ScriptTarget.Latest, false);
    for (const statement of source.statements) {
      if (!ts.isImportDeclaration(statement) && !ts.isExportDeclaration(statement)) continue;
      const specifier = statement.moduleSpecifier;
      if (!specifier || !ts.isStringLiteral(specifier) || !specifier.text.startsWith(".")) continue;
      const to = layerOf(resolve(dirname(path), specifier.text));
      if (!to || to === from) continue;
      const key = `${from} → ${to}`;
      edges.set(key, (edges.get(key) ?? 0) + 1);
    }
  }
  return edges;
}

function main(argv: readonly string[]): void {
  const limitAt = argv.indexOf("--limit");
  const limit = limitAt >= 0 ? Number(argv[limitAt + 1]) : 25;
  const dirs = argv.filter((a, i) => !a.startsWith("--") && (limitAt < 0 || i !== limitAt + 1));
  const files = (dirs.length ? dirs : ["src"]).flatMap((d) => sourceFiles(resolve(ROOT, d)));
  const all = files.flatMap(functionLengths).sort((a, b) => b.lines - a.lines);
  const over = all.filter((f) => f.lines > FUNCTION_LINE_LIMIT).length;
  console.log(`Longest functions (${all.length} in ${files.length} files; ${over} over ${FUNCTION_LINE_LIMIT} lines):`);
  for (const f of all.slice(0, limit)) console.log(`${String(f.lines).padStart(5)}  ${f.name}  ${f.file}:${f.line}`);
  console.log("\nImports between the layers of src/ (import statements):");
  const edges = [...layerImports(files)].sort(([a], [b]) => a.localeCompare(b));
  for (const [edge, count] of edges) console.log(`  ${edge}  ${count}`);
}

main(process.argv.slice(2));
