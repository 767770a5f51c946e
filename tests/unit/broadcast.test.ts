// The shared coercion and broadcasting layer (src/functions/broadcast.ts): shapes, 1×1 / row / column broadcasting,
// blanks, error precedence and messages that name the argument (docs/method.md, Domain).
import { afterEach, describe, expect, it } from "vitest";
import { mapCells, numberArg, textArg } from "../../src/functions/broadcast";
import { CellError, CellOutput, valueError } from "../../src/functions/cell-values";

const x = numberArg("x");
const y = numberArg("y", { min: 0, max: 10 });
const opt = numberArg("scale", { optional: true, defaultValue: 2 });
const word = textArg("word", (t) =>
  t.toLowerCase() === "up" ? 1 : t.toLowerCase() === "down" ? -1 : valueError(`word: expected "up" or "down"`),
);

const add = (a: CellInput2, b: CellInput2) => mapCells([x, y], [a, b], (p, q) => p + q);
type CellInput2 = Parameters<typeof mapCells>[1][number];

const err = (v: CellOutput): CellError => {
  expect(v).toBeInstanceOf(CellError);
  return v as CellError;
};

describe("shapes and broadcasting", () => {
  it("single cells give a 1×1 result", () => {
    expect(add(1, 2)).toEqual([[3]]);
    expect(add([[1]], [[2]])).toEqual([[3]]);
  });

  it("ranges of the same shape combine cell by cell", () => {
    expect(
      add(
        [
          [1, 2],
          [3, 4],
        ],
        [
          [10, 2],
          [3, 0],
        ],
      ),
    ).toEqual([
      [11, 4],
      [6, 4],
    ]);
  });

  it("a 1×1 argument broadcasts over a range", () => {
    expect(add([[1], [2], [3]], 1)).toEqual([[2], [3], [4]]);
    expect(add(5, [[1, 2, 3]])).toEqual([[6, 7, 8]]);
  });

  it("a row and a column broadcast to a table", () => {
    expect(add([[1, 2, 3]], [[0], [10]])).toEqual([
      [1, 2, 3],
      [11, 12, 13],
    ]);
  });

  it("shapes that cannot broadcast give one #VALUE! naming every argument's shape", () => {
    const out = add([[1], [2]], [[1], [2], [3]]);
    expect(out.length).toBe(1);
    const e = err(out[0][0]);
    expect(e.code).toBe("#VALUE!");
    expect(e.message).toContain("x 2×1");
    expect(e.message).toContain("y 3×1");
  });

  it("an empty or ragged range is #VALUE! naming the argument", () => {
    expect(err(add([], 1)[0][0]).message).toMatch(/^x:/);
    expect(err(add(1, [[1, 2], [3]] as never)[0][0]).message).toMatch(/^y:/);
  });
});

describe("blanks and defaults", () => {
  it("a blank required cell gives a blank result in that position only", () => {
    expect(add([[1], [null], [""], [undefined]], 1)).toEqual([[2], [""], [""], [""]]);
  });

  it("a blank or omitted optional argument takes its default", () => {
    const scaled = (a: CellInput2, s?: CellInput2) => mapCells([x, opt], [a, s], (p, k) => p * k);
    expect(scaled(3)).toEqual([[6]]);
    expect(scaled(3, null)).toEqual([[6]]);
    expect(scaled([[3], [4]], [[""], [10]])).toEqual([[6], [40]]);
  });
});

describe("blank means missing for measurements", () => {
  const t = numberArg("temperature", { optional: true, measured: true, defaultValue: 25 });
  const withT = (a: CellInput2, b?: CellInput2) => mapCells([x, t], [a, b], (p, q) => p + q);

  it("an omitted measured argument takes its default", () => {
    expect(withT(1)).toEqual([[26]]);
    expect(withT(1, null)).toEqual([[26]]);
  });

  it("a blank cell given for a measured argument gives a blank result in that row only", () => {
    expect(withT(1, [[null]])).toEqual([[""]]);
    expect(withT([[1], [2], [3]], [[10], [""], [null]])).toEqual([[11], [""], [""]]);
  });
});

describe("error cells passed in by the spreadsheet", () => {
  class HostLikeError {
    constructor(
      readonly code: string,
      readonly message?: string,
    ) {}
  }

  it("an error cell in a range gives an error in that position only; #N/A stays #N/A", () => {
    const out = add([[1], [new HostLikeError("#DIV/0!") as never], [new HostLikeError("#N/A") as never], [4]], 1);
    expect(out[0][0]).toBe(2);
    expect(err(out[1][0]).code).toBe("#VALUE!");
    expect(err(out[1][0]).message).toBe("x: the cell holds the error #DIV/0!; correct that cell");
    expect(err(out[2][0]).code).toBe("#N/A");
    expect(err(out[2][0]).message).toMatch(/^x: the cell holds #N\/A/);
    expect(out[3][0]).toBe(5);
  });

  it("rich cell values are read by their plain value; rich errors keep their code", () => {
    expect(add([[{ type: "Double", basicValue: 3 } as never]], 1)).toEqual([[4]]);
    expect(err(add([[{ type: "Error", basicValue: "#REF!", errorType: "Ref" } as never]], 1)[0][0]).message).toContain(
      "#REF!",
    );
  });
});

describe("errors", () => {
  it("text for a number is #VALUE! naming the argument and quoting the text", () => {
    const e = err(add("abc", 1)[0][0]);
    expect(e.code).toBe("#VALUE!");
    expect(e.message).toBe('x: expected a number, got the text "abc"');
  });

  it("numeric text is read as a number; logical values are not numbers", () => {
    expect(add(" 7.5 ", "1e0")).toEqual([[8.5]]);
    expect(err(add(true, 1)[0][0]).message).toContain("logical value TRUE");
  });

  it("a number out of range is #VALUE! with the range in the message (Excel shows no message with #NUM!)", () => {
    const e = err(add(1, 11)[0][0]);
    expect(e.code).toBe("#VALUE!");
    expect(e.message).toBe("y: 11 is out of range (at least 0 and at most 10)");
  });

  it("the first error in argument order wins, and an error wins over a blank", () => {
    expect(err(add("a", "b")[0][0]).message).toMatch(/^x:/);
    expect(err(add(null, -1)[0][0]).message).toMatch(/^y:/);
    expect(err(add("a", null)[0][0]).message).toMatch(/^x:/);
  });

  it("errors stay in their cells; other cells still answer", () => {
    const out = add([[1], ["z"], [3]], [[1], [1], [99]]);
    expect(out[0][0]).toBe(2);
    expect(err(out[1][0]).code).toBe("#VALUE!");
    expect(err(out[2][0]).message).toMatch(/^y: 99 is out of range/);
  });

  it("text arguments resolve through their reader", () => {
    const f = (w: CellInput2, a: CellInput2) => mapCells([word, x], [w, a], (s, v) => s * v);
    expect(f([["UP", "down"]], 3)).toEqual([[3, -3]]);
    expect(err(f("sideways", 3)[0][0]).message).toMatch(/^word:/);
    expect(err(f(true, 3)[0][0]).message).toBe("word: expected text, got the logical value TRUE");
  });

  it("a cell holding something unreadable (an object) is #VALUE! naming the argument", () => {
    expect(err(add([[{}]] as never, 1)[0][0]).message).toMatch(/^x: the cell holds an unreadable value/);
  });

  it("a failure inside the computation becomes #VALUE!, never a throw", () => {
    const out = mapCells([x], [1], (v: number) => {
      throw new Error(`boom at ${v}`);
    });
    expect(err(out[0][0]).message).toContain("boom");
  });

  it("NaN and Infinity never reach a cell", () => {
    expect(err(mapCells([x], [0], (v) => 1 / v)[0][0]).code).toBe("#N/A");
    expect(err(mapCells([x], [-1], (v) => Math.sqrt(v))[0][0]).code).toBe("#N/A");
  });
});

describe("host error values", () => {
  const g = globalThis as { CustomFunctions?: unknown };
  afterEach(() => {
    delete g.CustomFunctions;
  });

  it("uses the host's CustomFunctions.Error with the mapped code when a registry exists", () => {
    class HostError {
      constructor(
        readonly code: string,
        readonly message?: string,
      ) {}
    }
    g.CustomFunctions = {
      Error: HostError,
      ErrorCode: { invalidValue: "#VALUE!", invalidNumber: "#NUM!", notAvailable: "#N/A" },
    };
    const out = add("q", 1)[0][0] as unknown as HostError;
    expect(out).toBeInstanceOf(HostError);
    expect(out.code).toBe("#VALUE!");
    expect(out.message).toMatch(/^x:/);
    const range = add(1, -5)[0][0] as unknown as HostError;
    expect(range.code).toBe("#VALUE!");
  });
});
