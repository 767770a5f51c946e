/**
 * What the pane needs from where it runs: tables of samples, and — inside the spreadsheet — selecting a row,
 * inserting a picture and remembering settings with the workbook. Two implementations: excel-adapter.ts and
 * standalone-adapter.ts.
 */
import { type ColumnRole } from "../tables";
import type { SampleTable } from "./sample-table";

/** Settings remembered per workbook (Excel) or per browser (standalone). Columns are kept by header text. */
export interface PaneSettings {
  columns?: Partial<Record<ColumnRole, string>>;
  electrode?: string;
  unit?: "V" | "mV";
  metal?: string;
  activity?: number;
  /**
   * Ligand totals as typed (text, blank = absent) and the header of a column chosen instead; `typed` records that
   * the user chose the typed total over a column found by its header.
   */
  water?: Partial<
    Record<"carbonate" | "chloride" | "sulfur" | "phosphate", { total?: string; column?: string; typed?: boolean }>
  >;
}

export interface PictureRequest {
  /** PNG, base64 without the data: prefix. */
  readonly pngBase64: string;
  readonly widthPx: number;
  readonly heightPx: number;
  readonly caption: string;
}

export interface HostAdapter {
  readonly kind: "excel" | "standalone";
  /** Starts delivering tables; `onTable` is called for each new or changed one. */
  start(onTable: (table: SampleTable) => void, onStatus: (text: string) => void): Promise<void>;
  /** Selects the sheet row the sample came from (Excel only). */
  selectRow?(row: number): Promise<void>;
  /** Places the picture beside the data with its caption (Excel only). */
  insertPicture?(picture: PictureRequest): Promise<void>;
  loadSettings(): PaneSettings | null;
  saveSettings(settings: PaneSettings): Promise<void>;
}

export const SETTINGS_KEY = "redoxCells.diagramPane";
