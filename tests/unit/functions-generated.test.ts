/**
 * src/functions/functions.ts is written by scripts/generate-functions.ts from the table in
 * src/functions/declarations.ts (the metadata plugin reads only top-level JSDoc declarations). This fails while the
 * file is stale or edited by hand; `npm run generate:functions` rewrites it.
 */
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { FUNCTIONS_FILE, functionsSource } from "../../scripts/generate-functions";
import { WORKSHEET_FUNCTIONS } from "../../src/functions/declarations";
import * as declared from "../../src/functions/functions";

describe("generated worksheet declarations", () => {
  it("functions.ts is what the generator writes from the table", async () => {
    expect(readFileSync(FUNCTIONS_FILE, "utf8")).toBe(await functionsSource());
  });

  it("a change to the table changes the generated text (the check can fail)", async () => {
    const changed = WORKSHEET_FUNCTIONS.map((fn, i) => (i === 0 ? { ...fn, returns: `${fn.returns} (changed)` } : fn));
    expect(await functionsSource(changed)).not.toBe(await functionsSource());
  });

  it("every declared id is exported once, lower-cased, and ids are unique", () => {
    const ids = WORKSHEET_FUNCTIONS.map((fn) => fn.id);
    expect(new Set(ids).size).toBe(ids.length);
    expect(Object.keys(declared).sort()).toEqual(ids.map((id) => id.toLowerCase()).sort());
  });

  it("optional arguments come after the required ones", () => {
    for (const fn of WORKSHEET_FUNCTIONS) {
      const firstOptional = fn.parameters.findIndex((p) => p.optional);
      if (firstOptional >= 0)
        expect(
          fn.parameters.slice(firstOptional).every((p) => p.optional),
          fn.id,
        ).toBe(true);
    }
  });
});
