/**
 * The Excel adapter against an Office.js stand-in (tests/browser/excel-fake.ts): header detection on realistic
 * spellings, the mapping override kept in the workbook, mV against V, blank rows, selection changes (debounced,
 * unchanged blocks not read again), selecting a sample's row, and the picture insertion call.
 */
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { ExcelAdapter } from "../../src/taskpane/excel-adapter";
import { SETTINGS_KEY } from "../../src/taskpane/host";
import { matchHeaders } from "../../src/tables";
import { readSamples, SampleTable } from "../../src/taskpane/sample-table";
import { FakeWorkbook } from "./excel-fake";

const LOG: unknown[][] = [
  ["Quarterly distribution samples (invented)", "", "", "", ""],
  ["", "", "", "", ""],
  ["Sample ID", "Temperature (°C)", "pH (field)", "ORP (mV) vs Ag/AgCl sat", "Dissolved iron (mg/L)"],
  ["A-1", 12.5, 7.4, 410, 0.12],
  ["A-2", 13.1, "", 395, 0.2],
  ["A-3", 12.9, 7.1, "n/a", ""],
  ["A-4", 14.0, 7.6, 380, 0.05],
];

async function started(workbook: FakeWorkbook) {
  const tables: SampleTable[] = [];
  const status: string[] = [];
  const adapter = new ExcelAdapter({ excel: workbook.excel as never, settings: workbook.settings, debounceMs: 300 });
  await adapter.start(
    (t) => tables.push(t),
    (s) => status.push(s),
  );
  return { adapter, tables, status };
}

describe("Excel adapter", () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  it("reads the region around a selected cell and finds the header row below a title", async () => {
    const workbook = new FakeWorkbook(
      "Log",
      LOG.map((r) => [...r]),
    );
    workbook.selection = { sheet: "Log", row: 4, col: 2, rows: 1, cols: 1 };
    const { tables } = await started(workbook);
    expect(tables).toHaveLength(1);
    const t = tables[0];
    expect(t.headers[3]).toBe("ORP (mV) vs Ag/AgCl sat");
    expect(t.rowNumbers).toEqual([4, 5, 6, 7]); // sheet rows, 1-based
    const match = matchHeaders(t.headers, "Fe", "iron");
    expect(match.mapping).toMatchObject({ id: 0, temperature: 1, pH: 2, potential: 3, dissolved: 4 });
    expect(match.hints).toMatchObject({ potentialUnit: "mV", electrode: "AgCl-sat", dissolvedUnit: "mg/L" });
  });

  it("takes the header from above when only data rows are selected", async () => {
    const workbook = new FakeWorkbook(
      "Log",
      LOG.map((r) => [...r]),
    );
    workbook.selection = { sheet: "Log", row: 3, col: 0, rows: 3, cols: 5 };
    const { tables } = await started(workbook);
    expect(tables[0].headers[2]).toBe("pH (field)");
    expect(tables[0].rows).toHaveLength(3);
    expect(tables[0].rowNumbers).toEqual([4, 5, 6]);
  });

  it("reads the whole Excel table the selection sits in", async () => {
    const cells = [
      ["Site", "pH", "Eh (V)", "T (C)"],
      ["Well 3", 6.9, 0.31, 11],
      ["Well 4", 7.3, 0.28, 12],
      ["Well 5", 8.0, -0.05, 10],
    ];
    const workbook = new FakeWorkbook("Wells", cells);
    workbook.tables.push({ name: "WellLog", sheet: "Wells", row: 0, col: 0, rows: 4, cols: 4 });
    workbook.selection = { sheet: "Wells", row: 2, col: 1, rows: 1, cols: 1 };
    const { tables } = await started(workbook);
    expect(tables[0].source).toBe("table WellLog, Wells!A1:D4");
    expect(tables[0].rows).toHaveLength(3);
    expect(matchHeaders(tables[0].headers).hints).toMatchObject({ potentialUnit: "V", electrode: "SHE" });
  });

  it("mV and V readings, blank and unreadable rows", async () => {
    const workbook = new FakeWorkbook(
      "Log",
      LOG.map((r) => [...r]),
    );
    workbook.selection = { sheet: "Log", row: 3, col: 0, rows: 1, cols: 1 };
    const { tables } = await started(workbook);
    const { mapping } = matchHeaders(tables[0].headers);
    const base = { mapping, electrode: "SHE", temperatureUnit: "C" as const, celsius: 25 };
    const inMV = readSamples(tables[0], { ...base, unit: "mV" });
    expect(inMV.samples.map((s) => s.row)).toEqual([4, 7]);
    expect(inMV.samples[0].eSHE).toBeCloseTo(0.41, 12);
    expect(inMV.skipped).toEqual([
      { row: 5, reason: "pH is blank" },
      { row: 6, reason: 'potential "n/a" is not a number' },
    ]);
    // the same cells read as volts are far outside −3…+3 V and are listed, not drawn
    const inV = readSamples(tables[0], { ...base, unit: "V" });
    expect(inV.samples).toHaveLength(0);
    expect(inV.skipped.filter((s) => /is the unit right/.test(s.reason)).map((s) => s.row)).toEqual([4, 7]);
  });

  it("follows selection changes once per burst, and does not re-read an unchanged block", async () => {
    const workbook = new FakeWorkbook(
      "Log",
      LOG.map((r) => [...r]),
    );
    workbook.selection = { sheet: "Log", row: 3, col: 0, rows: 1, cols: 1 };
    const { tables } = await started(workbook);
    expect(workbook.valueReads).toBeGreaterThan(0);
    const readsAfterStart = workbook.valueReads;

    // clicking around inside the same block: no new values read, no new table
    workbook.userSelects(4, 1);
    workbook.userSelects(5, 2);
    workbook.userSelects(6, 3);
    await vi.advanceTimersByTimeAsync(299);
    expect(workbook.valueReads).toBe(readsAfterStart);
    await vi.advanceTimersByTimeAsync(10);
    expect(workbook.valueReads).toBe(readsAfterStart);
    expect(tables).toHaveLength(1);

    // an edit makes the block dirty: read again, and the new table carries the new value
    workbook.userEdits(4, 2, 7.05);
    await vi.advanceTimersByTimeAsync(400);
    expect(tables).toHaveLength(2);
    expect(tables[1].rows[1][2]).toBe(7.05);

    // a different block (rows only): read once after the burst settles
    workbook.userSelects(3, 0, 2, 5);
    workbook.userSelects(3, 0, 3, 5);
    await vi.advanceTimersByTimeAsync(400);
    expect(tables).toHaveLength(3);
    expect(tables[2].rows).toHaveLength(3);
  });

  it("selects a sample's row without re-reading the pane's own selection", async () => {
    const workbook = new FakeWorkbook(
      "Log",
      LOG.map((r) => [...r]),
    );
    workbook.selection = { sheet: "Log", row: 3, col: 0, rows: 4, cols: 5 };
    const { adapter, tables } = await started(workbook);
    await adapter.selectRow(6);
    expect(workbook.selection).toEqual({ sheet: "Log", row: 5, col: 0, rows: 1, cols: 5 });
    await vi.advanceTimersByTimeAsync(400);
    expect(tables).toHaveLength(1);
  });

  it("remembers the column mapping and scale in the workbook's settings", async () => {
    const workbook = new FakeWorkbook(
      "Log",
      LOG.map((r) => [...r]),
    );
    const { adapter } = await started(workbook);
    expect(adapter.loadSettings()).toBeNull();
    await adapter.saveSettings({
      columns: { potential: "ORP (mV) vs Ag/AgCl sat", dissolved: "" },
      electrode: "AgCl-sat",
      unit: "mV",
    });
    expect(workbook.saves).toBe(1);
    expect(workbook.settingsStore.get(SETTINGS_KEY)).toEqual({
      columns: { potential: "ORP (mV) vs Ag/AgCl sat", dissolved: "" },
      electrode: "AgCl-sat",
      unit: "mV",
    });
    const again = new ExcelAdapter({ excel: workbook.excel as never, settings: workbook.settings });
    expect(again.loadSettings()?.columns?.potential).toBe("ORP (mV) vs Ag/AgCl sat");
  });

  it("inserts the picture beside the data with its caption", async () => {
    const workbook = new FakeWorkbook(
      "Log",
      LOG.map((r) => [...r]),
    );
    workbook.selection = { sheet: "Log", row: 3, col: 0, rows: 4, cols: 5 };
    const { adapter } = await started(workbook);
    await adapter.insertPicture({
      pngBase64: "iVBORw0KGgo=",
      widthPx: 800,
      heightPx: 600,
      caption: "Iron in water at 13 °C, activity 10⁻⁶, mV vs AgCl-sat. Samples: Log!A4:E7",
    });
    const [image, caption] = workbook.shapes;
    expect(image).toMatchObject({
      kind: "image",
      content: "iVBORw0KGgo=",
      left: 5 * 64 + 12,
      top: 3 * 15,
      width: 600,
      height: 450,
      lockAspectRatio: true,
    });
    expect(image.altTextDescription).toMatch(/Iron in water/);
    expect(caption).toMatchObject({ kind: "textbox", left: 5 * 64 + 12, top: 3 * 15 + 450 + 4, width: 600 });
    expect(caption.content).toMatch(/AgCl-sat/);
  });

  it("replaces the picture and caption it inserted before instead of adding more", async () => {
    const workbook = new FakeWorkbook(
      "Log",
      LOG.map((r) => [...r]),
    );
    workbook.selection = { sheet: "Log", row: 3, col: 0, rows: 4, cols: 5 };
    workbook.shapes.push({ kind: "image", content: "someone else's chart", name: "Chart 1" });
    const { adapter } = await started(workbook);
    for (const caption of ["first", "second", "third"])
      await adapter.insertPicture({ pngBase64: "iVBORw0KGgo=", widthPx: 800, heightPx: 600, caption });
    expect(workbook.shapes.map((x) => [x.kind, x.name])).toEqual([
      ["image", "Chart 1"],
      ["image", "Redox Cells diagram"],
      ["textbox", "Redox Cells diagram caption"],
    ]);
    expect(workbook.shapes[2].content).toBe("third");
    expect(workbook.shapes[2].height).toBeLessThan(48); // a one-line caption is one line tall
  });

  it("reads only the used part of a selection of whole columns", async () => {
    const workbook = new FakeWorkbook(
      "Log",
      LOG.map((r) => [...r]),
    );
    workbook.selection = { sheet: "Log", row: 0, col: 0, rows: 1_048_576, cols: 5 };
    const { tables } = await started(workbook);
    expect(workbook.largestRead).toBeLessThanOrEqual(LOG.length * 5);
    expect(tables[0].rows).toHaveLength(4);
    expect(tables[0].headers[2]).toBe("pH (field)");
  });

  it("re-reads once after a burst of edits", async () => {
    const workbook = new FakeWorkbook(
      "Log",
      LOG.map((r) => [...r]),
    );
    workbook.selection = { sheet: "Log", row: 3, col: 0, rows: 4, cols: 5 };
    const { tables } = await started(workbook);
    const reads = workbook.valueReads;
    for (const v of [7.0, 7.1, 7.15, 7.25]) workbook.userEdits(3, 2, v);
    await vi.advanceTimersByTimeAsync(350);
    expect(tables).toHaveLength(2);
    expect(tables[1].rows[0][2]).toBe(7.25);
    expect(workbook.valueReads - reads).toBeLessThanOrEqual(2); // the block and the rows above it, once
  });

  it("says clearly which API set is missing", async () => {
    const workbook = new FakeWorkbook(
      "Log",
      LOG.map((r) => [...r]),
    );
    const old = { isSetSupported: (_name: string, version?: string) => Number(version) < 1.4 };
    const status: string[] = [];
    const tables: SampleTable[] = [];
    await new ExcelAdapter({ excel: workbook.excel as never, settings: workbook.settings, requirements: old }).start(
      (t) => tables.push(t),
      (x) => status.push(x),
    );
    expect(tables).toHaveLength(0);
    expect(status.join(" ")).toMatch(/ExcelApi 1\.4/);
    const noShapes = new ExcelAdapter({
      excel: workbook.excel as never,
      settings: workbook.settings,
      requirements: { isSetSupported: (_n, v) => Number(v) < 1.9 },
    });
    await noShapes.start(
      () => {},
      () => {},
    );
    await expect(noShapes.insertPicture({ pngBase64: "x", widthPx: 10, heightPx: 10, caption: "" })).rejects.toThrow(
      /ExcelApi 1\.9.*Download PNG/,
    );
    expect(workbook.shapes).toHaveLength(0);
  });
});
