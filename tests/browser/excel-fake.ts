/**
 * A small stand-in for the parts of Office.js the Excel adapter uses: Excel.run with a request context, the
 * selected range, tables, surrounding region, used range and intersections, worksheets with named shapes,
 * selection and change events, and document settings. Values are available after sync as in Office.js; reads of `values` are counted.
 */

export interface FakeTable {
  name: string;
  sheet: string;
  row: number;
  col: number;
  rows: number;
  cols: number;
}

export interface FakeShape {
  kind: "image" | "textbox";
  content: string;
  name?: string;
  altTextTitle?: string;
  altTextDescription?: string;
  lockAspectRatio?: boolean;
  left?: number;
  top?: number;
  width?: number;
  height?: number;
}

const COLUMN_WIDTH = 64; // points
const ROW_HEIGHT = 15; // points

function columnName(index: number): string {
  let name = "";
  for (let i = index + 1; i > 0; i = Math.floor((i - 1) / 26)) name = String.fromCharCode(65 + ((i - 1) % 26)) + name;
  return name;
}

export class FakeWorkbook {
  sheets = new Map<string, unknown[][]>();
  tables: FakeTable[] = [];
  selection = { sheet: "Log", row: 0, col: 0, rows: 1, cols: 1 };
  shapes: FakeShape[] = [];
  valueReads = 0;
  selectHandlers: (() => Promise<void> | void)[] = [];
  changeHandlers: (() => Promise<void> | void)[] = [];
  settingsStore = new Map<string, unknown>();
  saves = 0;

  constructor(sheet: string, cells: unknown[][]) {
    this.sheets.set(sheet, cells);
    this.selection.sheet = sheet;
  }

  /** The user selects a block: events fire as in Excel. */
  userSelects(row: number, col: number, rows = 1, cols = 1, sheet = this.selection.sheet): void {
    this.selection = { sheet, row, col, rows, cols };
    for (const h of this.selectHandlers) void h();
  }

  /** The user edits a cell. */
  userEdits(row: number, col: number, value: unknown): void {
    this.sheets.get(this.selection.sheet)![row][col] = value;
    for (const h of this.changeHandlers) void h();
  }

  private range(sheet: string, row: number, col: number, rows: number, cols: number): Record<string, unknown> {
    const workbook = this;
    const cells = this.sheets.get(sheet)!;
    const address = `${sheet}!${columnName(col)}${row + 1}:${columnName(col + cols - 1)}${row + rows}`;
    return {
      load() {},
      address,
      rowIndex: row,
      columnIndex: col,
      rowCount: rows,
      columnCount: cols,
      left: col * COLUMN_WIDTH,
      top: row * ROW_HEIGHT,
      width: cols * COLUMN_WIDTH,
      get values() {
        workbook.valueReads++;
        workbook.largestRead = Math.max(workbook.largestRead, rows * cols);
        return Array.from({ length: rows }, (_, r) =>
          Array.from({ length: cols }, (_, c) => cells[row + r]?.[col + c] ?? ""),
        );
      },
      worksheet: workbook.worksheet(sheet),
      getTables() {
        const items = workbook.tables
          .filter(
            (t) => t.sheet === sheet && row >= t.row && row < t.row + t.rows && col >= t.col && col < t.col + t.cols,
          )
          .map((t) => ({ name: t.name, getRange: () => workbook.range(sheet, t.row, t.col, t.rows, t.cols) }));
        return { load() {}, items };
      },
      getSurroundingRegion() {
        // the contiguous block of non-blank rows around the cell, over the sheet's used columns
        const blank = (r: number) => !cells[r] || cells[r].every((v) => v === "" || v === null || v === undefined);
        let top = row;
        while (top > 0 && !blank(top - 1)) top--;
        let bottom = row;
        while (bottom + 1 < cells.length && !blank(bottom + 1)) bottom++;
        const width = Math.max(...cells.slice(top, bottom + 1).map((r) => r.length));
        return workbook.range(sheet, top, 0, bottom - top + 1, width);
      },
      select() {
        workbook.userSelects(row, col, rows, cols, sheet);
      },
      getIntersectionOrNullObject(other: {
        rowIndex: number;
        columnIndex: number;
        rowCount: number;
        columnCount: number;
        isNullObject?: boolean;
      }) {
        const top = Math.max(row, other.rowIndex);
        const left = Math.max(col, other.columnIndex);
        const bottom = Math.min(row + rows, other.rowIndex + other.rowCount);
        const right = Math.min(col + cols, other.columnIndex + other.columnCount);
        if (other.isNullObject || bottom <= top || right <= left) return { load() {}, isNullObject: true };
        return workbook.range(sheet, top, left, bottom - top, right - left);
      },
      isNullObject: false,
    };
  }

  /** Ranges asked for, by size: the largest range whose values were read (whole-column selections). */
  largestRead = 0;

  private worksheet(name: string): Record<string, unknown> {
    const workbook = this;
    return {
      name,
      load() {},
      getRangeByIndexes: (row: number, col: number, rows: number, cols: number) =>
        workbook.range(name, row, col, rows, cols),
      getUsedRange: () => {
        // the block from A1 to the last non-blank cell (Excel's used range, values only)
        const cells = workbook.sheets.get(name)!;
        const filled = (v: unknown) => v !== "" && v !== null && v !== undefined;
        const lastRow = cells.reduce<number>((last, r, i) => (r.some(filled) ? i : last), -1);
        const lastCol = cells.reduce<number>(
          (last, r) =>
            Math.max(
              last,
              r.reduce<number>((c, v, j) => (filled(v) ? j : c), -1),
            ),
          -1,
        );
        if (lastRow < 0)
          return { load() {}, isNullObject: true, rowIndex: 0, columnIndex: 0, rowCount: 0, columnCount: 0 };
        return workbook.range(name, 0, 0, lastRow + 1, lastCol + 1);
      },
      shapes: {
        getItemOrNullObject(shapeName: string) {
          const shape = workbook.shapes.find((x) => x.name === shapeName);
          return {
            load() {},
            isNullObject: !shape,
            delete: () => void (workbook.shapes = workbook.shapes.filter((x) => x !== shape)),
          };
        },
        addImage(base64: string) {
          const shape: FakeShape = { kind: "image", content: base64 };
          workbook.shapes.push(shape);
          return shape;
        },
        addTextBox(text: string) {
          const shape: FakeShape = { kind: "textbox", content: text };
          workbook.shapes.push(shape);
          return shape;
        },
      },
    };
  }

  /** The object passed as `excel` to the adapter (Excel.run). */
  get excel() {
    const workbook = this;
    const context = {
      workbook: {
        getSelectedRange: () => {
          const s = workbook.selection;
          return workbook.range(s.sheet, s.row, s.col, s.rows, s.cols);
        },
        onSelectionChanged: { add: (h: () => Promise<void>) => workbook.selectHandlers.push(h) },
        worksheets: {
          onChanged: { add: (h: () => Promise<void>) => workbook.changeHandlers.push(h) },
          getItem: (name: string) => workbook.worksheet(name),
          getActiveWorksheet: () => workbook.worksheet(workbook.selection.sheet),
        },
      },
      sync: async () => {},
    };
    return { run: async <T>(batch: (c: never) => Promise<T>) => batch(context as never) };
  }

  /** The object passed as `settings` (Office.context.document.settings). */
  get settings() {
    const workbook = this;
    return {
      get: (name: string) => workbook.settingsStore.get(name) ?? null,
      set: (name: string, value: unknown) => void workbook.settingsStore.set(name, JSON.parse(JSON.stringify(value))),
      saveAsync: (callback?: (r: { status: string }) => void) => {
        workbook.saves++;
        callback?.({ status: "succeeded" });
      },
    };
  }
}
