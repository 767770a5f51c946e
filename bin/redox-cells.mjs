#!/usr/bin/env node
// The redox-cells command line. Runs the prebuilt file dist/cli/redox-cells.cjs (written by `npm run build`), which
// starts without a compiler. When it is missing (a fresh `npm ci` before any build), runs the TypeScript sources
// through tsx (a runtime dependency) instead: the same program, with a slower start.
// Usage: redox-cells --help
import { existsSync } from "node:fs";

const prebuilt = new URL("../dist/cli/redox-cells.cjs", import.meta.url);
if (existsSync(prebuilt)) {
  await import(prebuilt.href);
} else {
  // both of tsx's hooks: the sources are CommonJS to Node (no "type": "module") and load the pipeline lazily
  (await import("tsx/esm/api")).register();
  (await import("tsx/cjs/api")).register();
  await import(new URL("../src/cli/main.ts", import.meta.url).href);
}
