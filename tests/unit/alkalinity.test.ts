/**
 * REDOX.DIC outside its meaning: below the total-alkalinity end point (pH 4.5, common practice) an alkalinity does
 * not determine DIC, so the function answers #N/A (no answer exists) naming its arguments instead of a number that grows without bound.
 */
import { describe, expect, it } from "vitest";
import { ALKALINITY_END_POINT_PH } from "../../src/chemistry/alkalinity";
import { CellError } from "../../src/functions/cell-values";
import { dicAt } from "../../src/functions/carbonate-functions";

describe("REDOX.DIC near the alkalinity end point", () => {
  it("answers #N/A below pH 4.5 and a finite number just above it", () => {
    const below = dicAt(50, ALKALINITY_END_POINT_PH - 1)[0][0];
    expect(below).toBeInstanceOf(CellError);
    expect((below as CellError).code).toBe("#N/A");
    expect((below as CellError).message).toMatch(/^alkalinity, pH: pH 3.5 is below the alkalinity end point/);
    const above = dicAt(50, ALKALINITY_END_POINT_PH + 0.5)[0][0];
    expect(typeof above).toBe("number");
  });
});
