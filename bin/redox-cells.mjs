#!/usr/bin/env node
// Runs the redox-cells command line from its TypeScript sources through tsx (a runtime dependency), so no build
// step is needed. Usage: redox-cells --help
import { tsImport } from "tsx/esm/api";

await tsImport("../src/cli/main.ts", import.meta.url);
