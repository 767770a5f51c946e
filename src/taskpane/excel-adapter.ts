/**
 * The pane inside Excel, through Office.js: reads the used part of the selection or of the table it sits in, follows
 * selection changes and edits (debounced; an unchanged block is not read again), selects a sample's row on request,
 * inserts the diagram as a named picture beside the data (replacing the one it inserted before), checks the API
 * sets it needs (isSetSupported), and keeps the pane's settings in the workbook (Office.context.document.settings).
 *
 * Office.js objects are passed in (defaults: the globals), so tests can drive the adapter with a stand-in.
 */
import type { HostAdapter, PaneSettings, PictureRequest } from "./host";
import { SETTINGS_KEY } from "./host";
import { SampleTable, tableFromBlock } from "./sample-table";

/** The part of the Excel namespace the adapter uses. */
export interface ExcelApi {
  run<T>(batch: (context: Excel.RequestContext) => Promise<T>): Promise<T>;
}

/** The part of Office.context.document.settings the adapter uses. */
export interface SettingsStore {
  get(name: string): unknown;
  set(name: string, value: unknown): void;
  saveAsync(callback?: (result: { status: unknown }) => void): void;
}

/** Office.context.requirements: which API sets this Excel offers. */
export interface Requirements {
  isSetSupported(name: string, minVersion?: string): boolean;
}

/** Reading needs ranges' intersections and used ranges (ExcelApi 1.4); inserting the picture needs shapes (1.9). */
export const READ_SET = "1.4";
export const SHAPES_SET = "1.9";

export interface ExcelAdapterOptions {
  excel?: ExcelApi;
  requirements?: Requirements;
  settings?: SettingsStore;
  /** Quiet time after the last selection change before reading, ms. */
  debounceMs?: number;
  /** Rows above a headerless selection searched for the header row. */
  headerSearchRows?: number;
}

interface Block {
  sheet: string;
  address: string;
  rowIndex: number;
  columnIndex: number;
  rowCount: number;
  columnCount: number;
  signature: string;
}

/** Points per CSS pixel (Excel places shapes in points: 72 per inch, 96 px per inch). */
const POINTS_PER_PIXEL = 0.75;
const PICTURE_NAME = "Redox Cells diagram";
const CAPTION_NAME = `${PICTURE_NAME} caption`;

export class ExcelAdapter implements HostAdapter {
  readonly kind = "excel" as const;
  private readonly excel: ExcelApi;
  private readonly requirements: Requirements | null;
  private readonly settings: SettingsStore;
  private readonly debounceMs: number;
  private readonly headerSearchRows: number;
  private timer: ReturnType<typeof setTimeout> | undefined;
  private last: Block | undefined;
  private dirty = false;
  private ignoreNextSelection = false;
  private onTable: (table: SampleTable) => void = () => {};
  private onStatus: (text: string) => void = () => {};
  /** Number of times cell values were read (for tests and diagnostics). */
  valueReads = 0;

  constructor(options: ExcelAdapterOptions = {}) {
    this.excel = options.excel ?? (Excel as unknown as ExcelApi);
    this.requirements =
      options.requirements ?? (typeof Office !== "undefined" ? (Office.context.requirements as Requirements) : null);
    this.settings = options.settings ?? (Office.context.document.settings as unknown as SettingsStore);
    this.debounceMs = options.debounceMs ?? 300;
    this.headerSearchRows = options.headerSearchRows ?? 20;
  }

  /** Whether this Excel offers ExcelApi `version` (true when it cannot be asked). */
  supports(version: string): boolean {
    return this.requirements ? this.requirements.isSetSupported("ExcelApi", version) : true;
  }

  async start(onTable: (table: SampleTable) => void, onStatus: (text: string) => void): Promise<void> {
    this.onTable = onTable;
    this.onStatus = onStatus;
    if (!this.supports(READ_SET)) {
      onStatus(
        `This Excel does not offer ExcelApi ${READ_SET}, which the pane needs to read the selected rows. Update Excel, or open the pane's page in a browser and paste the rows.`,
      );
      return;
    }
    await this.excel.run(async (context) => {
      context.workbook.onSelectionChanged.add(async () => this.selectionChanged());
      context.workbook.worksheets.onChanged.add(async () => {
        this.dirty = true;
        this.selectionChanged();
      });
      await context.sync();
    });
    await this.read();
  }

  /** Debounced: many selection events in a burst lead to one read. */
  selectionChanged(): void {
    if (this.ignoreNextSelection) {
      this.ignoreNextSelection = false;
      return;
    }
    if (this.timer !== undefined) clearTimeout(this.timer);
    this.timer = setTimeout(() => {
      this.timer = undefined;
      void this.read().catch((error: unknown) =>
        this.onStatus(`Could not read the selection: ${(error as Error).message}`),
      );
    }, this.debounceMs);
  }

  /** Reads the block around the selection; emits a table when the block or its values changed. */
  async read(): Promise<void> {
    const result = await this.excel.run(async (context) => {
      const selection = context.workbook.getSelectedRange();
      selection.load("address,rowIndex,columnIndex,rowCount,columnCount");
      const sheet = selection.worksheet;
      sheet.load("name");
      const tables = selection.getTables(false);
      tables.load("items/name");
      await context.sync();
      const table = tables.items[0];
      let block: Excel.Range;
      if (table) block = table.getRange();
      else if (selection.rowCount === 1 && selection.columnCount === 1) block = selection.getSurroundingRegion();
      else block = selection;
      // only the used part: a selection of whole columns reads the rows that hold data, not 1 048 576
      const used = block.getIntersectionOrNullObject(sheet.getUsedRange(true));
      used.load("isNullObject,address,rowIndex,columnIndex,rowCount,columnCount");
      await context.sync();
      if (used.isNullObject) return { empty: true as const };
      block = used;
      const where = {
        sheet: sheet.name,
        address: block.address,
        rowIndex: block.rowIndex,
        columnIndex: block.columnIndex,
        rowCount: block.rowCount,
        columnCount: block.columnCount,
      };
      if (this.last && !this.dirty && this.last.sheet === where.sheet && this.last.address === where.address)
        return null; // same block, nothing edited
      block.load("values");
      let above: Excel.Range | undefined;
      if (where.rowIndex > 0) {
        const first = Math.max(0, where.rowIndex - this.headerSearchRows);
        above = sheet.getRangeByIndexes(first, where.columnIndex, where.rowIndex - first, where.columnCount);
        above.load("values");
      }
      await context.sync();
      this.valueReads++;
      return {
        where,
        values: block.values as unknown[][],
        above: above ? (above.values as unknown[][]) : undefined,
        tableName: table ? table.name : "",
      };
    });
    if (!result) return;
    if ("empty" in result) {
      this.onStatus(
        "The selection holds no data: select the rows of the log (with their header row) or one cell inside them.",
      );
      return;
    }
    this.dirty = false;
    const signature = JSON.stringify(result.values);
    if (
      this.last &&
      this.last.address === result.where.address &&
      this.last.sheet === result.where.sheet &&
      this.last.signature === signature
    )
      return;
    this.last = { ...result.where, signature };
    const rowNumbers = result.values.map((_, i) => result.where.rowIndex + i + 1);
    const source = `${result.tableName ? `table ${result.tableName}, ` : ""}${result.where.address}`;
    this.onTable(tableFromBlock(result.values, rowNumbers, source, result.above));
  }

  async selectRow(row: number): Promise<void> {
    const block = this.last;
    if (!block) return;
    this.ignoreNextSelection = true;
    try {
      await this.excel.run(async (context) => {
        const sheet = context.workbook.worksheets.getItem(block.sheet);
        sheet.getRangeByIndexes(row - 1, block.columnIndex, 1, block.columnCount).select();
        await context.sync();
      });
    } catch (error) {
      this.ignoreNextSelection = false;
      throw error;
    }
  }

  async insertPicture(picture: PictureRequest): Promise<void> {
    if (!this.supports(SHAPES_SET)) {
      throw new Error(
        `inserting pictures needs ExcelApi ${SHAPES_SET} (shapes), which this Excel does not offer; use Download PNG and insert it by hand`,
      );
    }
    const block = this.last;
    await this.excel.run(async (context) => {
      const sheet = block
        ? context.workbook.worksheets.getItem(block.sheet)
        : context.workbook.worksheets.getActiveWorksheet();
      // the picture and caption inserted before on this sheet are replaced, not piled up
      const previous = [PICTURE_NAME, CAPTION_NAME].map((name) => sheet.shapes.getItemOrNullObject(name));
      for (const shape of previous) shape.load("isNullObject");
      await context.sync();
      for (const shape of previous) if (!shape.isNullObject) shape.delete();
      const anchor = block
        ? sheet.getRangeByIndexes(
            block.rowIndex,
            block.columnIndex,
            Math.max(1, block.rowCount),
            Math.max(1, block.columnCount),
          )
        : context.workbook.getSelectedRange();
      anchor.load("left,top,width");
      await context.sync();
      const width = picture.widthPx * POINTS_PER_PIXEL;
      const height = picture.heightPx * POINTS_PER_PIXEL;
      const image = sheet.shapes.addImage(picture.pngBase64);
      image.name = PICTURE_NAME;
      image.altTextTitle = PICTURE_NAME;
      image.altTextDescription = picture.caption;
      image.lockAspectRatio = true;
      image.left = anchor.left + anchor.width + 12;
      image.top = anchor.top;
      image.width = width;
      image.height = height;
      const caption = sheet.shapes.addTextBox(picture.caption);
      caption.name = CAPTION_NAME;
      caption.left = anchor.left + anchor.width + 12;
      caption.top = anchor.top + height + 4;
      caption.width = width;
      // about 6 pt per character of 11 pt text, 15 pt per line
      caption.height = 15 * Math.max(1, Math.ceil((picture.caption.length * 6) / Math.max(60, width)));
      await context.sync();
    });
  }

  loadSettings(): PaneSettings | null {
    const value = this.settings.get(SETTINGS_KEY);
    return value && typeof value === "object" ? (value as PaneSettings) : null;
  }

  async saveSettings(settings: PaneSettings): Promise<void> {
    this.settings.set(SETTINGS_KEY, settings);
    await new Promise<void>((resolve) => this.settings.saveAsync(() => resolve()));
  }
}
