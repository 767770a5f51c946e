/**
 * Structured cell errors: a #VALUE! names the argument at fault in `argument` as well as in its message, so callers
 * (the command line) need not read it back out of the text. Check values: the argument names of the function help
 * (src/functions/functions.ts).
 */
import { describe, expect, it } from "vitest";
import { CellError, notAvailable, valueError } from "../../src/functions/cell-values";
import { elementArg, pHArg, potentialArg } from "../../src/functions/common-args";
import { speciesAt } from "../../src/functions/stability-functions";

describe("CellError.argument", () => {
  it("is set by the element reader for an unknown metal, beside the message naming it", () => {
    const error = elementArg.parse("unobtainium");
    expect(error).toBeInstanceOf(CellError);
    expect((error as CellError).code).toBe("#VALUE!");
    expect((error as CellError).argument).toBe("element");
    expect((error as CellError).message.startsWith("element:")).toBe(true);
  });

  it("is absent (not an own property) when no argument is at fault", () => {
    expect(Object.keys(notAvailable("no boundary within ±3 V"))).not.toContain("argument");
    expect(Object.keys(valueError("ranges of different shapes cannot be combined"))).not.toContain("argument");
    expect(valueError("pH: 17 is out of range", "pH").argument).toBe("pH");
  });

  it("is set by the number readers, for a wrong kind and for a value out of range", () => {
    expect((pHArg.parse("seven") as CellError).argument).toBe("pH");
    expect((pHArg.parse(17) as CellError).argument).toBe("pH");
    // a reading in mV typed where volts are expected (595 outside ±3 V)
    expect((potentialArg().parse(595) as CellError).argument).toBe("potential");
  });

  it("reaches the caller through a worksheet function, so the command line ties it to the column", () => {
    const [[cell]] = speciesAt("Fe", "seven", 0.1);
    expect(cell).toBeInstanceOf(CellError);
    expect((cell as CellError).argument).toBe("pH");
  });
});
