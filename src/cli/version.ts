/** The program's version: written into the prebuilt file at build time, else read from package.json. */
import { readFileSync } from "node:fs";

declare const __REDOX_CELLS_VERSION__: string | undefined;

export function version(): string {
  if (typeof __REDOX_CELLS_VERSION__ === "string") return __REDOX_CELLS_VERSION__;
  try {
    const pkg = JSON.parse(readFileSync(new URL("../../package.json", import.meta.url), "utf8")) as {
      version?: string;
    };
    return pkg.version ?? "unknown";
  } catch {
    return "unknown";
  }
}
