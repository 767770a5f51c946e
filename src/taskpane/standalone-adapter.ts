/**
 * The pane outside the spreadsheet (Office.onReady gives host null): tables come from pasted text (CSV or TSV from
 * the clipboard), an opened CSV file, or the bundled demo log (invented data, data/demo/). Settings are kept in the
 * browser's localStorage.
 */
import type { HostAdapter, PaneSettings } from "./host";
import { SETTINGS_KEY } from "./host";
import { parseDelimited, withDecimalCommas } from "../tables";
import { SampleTable, tableFromBlock } from "./sample-table";

/** The demo log, emitted by the bundler as a file next to the page. */
export const DEMO_URL = new URL("../../data/demo/sample-log.csv", import.meta.url);
export const DEMO_NAME = "demo: invented sample log (data/demo/sample-log.csv)";

/** A table from delimited text; row numbers are the text's line numbers; decimal commas read where the text uses them. */
export function tableFromText(text: string, source: string): SampleTable {
  const parsed = parseDelimited(text);
  // a European export (";" or tab, decimal commas): its numbers as numbers, as the spreadsheet would hold them
  return tableFromBlock(withDecimalCommas(parsed.rows, parsed.delimiter), parsed.lines, source);
}

export interface StandaloneElements {
  paste: HTMLTextAreaElement;
  drawPasted: HTMLButtonElement;
  file: HTMLInputElement;
  demo: HTMLButtonElement;
}

export class StandaloneAdapter implements HostAdapter {
  readonly kind = "standalone" as const;
  constructor(private readonly elements: StandaloneElements) {}

  async start(onTable: (table: SampleTable) => void, onStatus: (text: string) => void): Promise<void> {
    const { paste, drawPasted, file, demo } = this.elements;
    const fromPaste = () => {
      if (paste.value.trim() === "") return onStatus("Paste a table first: copy cells from a spreadsheet or CSV text.");
      onTable(tableFromText(paste.value, "pasted table"));
    };
    drawPasted.addEventListener("click", fromPaste);
    paste.addEventListener("paste", () => setTimeout(fromPaste, 0));
    file.addEventListener("change", async () => {
      const chosen = file.files?.[0];
      if (!chosen) return;
      onTable(tableFromText(await chosen.text(), chosen.name));
    });
    demo.addEventListener("click", async () => {
      try {
        const response = await fetch(DEMO_URL);
        if (!response.ok) throw new Error(`HTTP ${response.status}`);
        const text = await response.text();
        paste.value = text;
        onTable(tableFromText(text, DEMO_NAME));
      } catch (error) {
        onStatus(`Could not load the demo data: ${(error as Error).message}`);
      }
    });
    onStatus(
      "Paste a table (with a header row: pH, potential, optionally temperature and sample id), open a CSV file, or load the demo data.",
    );
  }

  loadSettings(): PaneSettings | null {
    try {
      const text = globalThis.localStorage?.getItem(SETTINGS_KEY);
      return text ? (JSON.parse(text) as PaneSettings) : null;
    } catch {
      return null;
    }
  }

  async saveSettings(settings: PaneSettings): Promise<void> {
    try {
      globalThis.localStorage?.setItem(SETTINGS_KEY, JSON.stringify(settings));
    } catch {
      // storage unavailable (private mode): settings last for the session only
    }
  }
}
