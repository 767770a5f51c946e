/**
 * Entry of the task pane page. Inside Excel the pane reads the workbook (excel-adapter.ts); opened as a plain page
 * (Office.onReady resolves with host null, or Office.js is absent) it takes pasted text, files and the demo data
 * (standalone-adapter.ts). Everything else is the same pane (pane-controller.ts).
 */
import { ExcelAdapter } from "./excel-adapter";
import type { HostAdapter } from "./host";
import { DiagramPane } from "./pane-controller";
import { StandaloneAdapter } from "./standalone-adapter";

function standalone(): HostAdapter {
  const source = document.getElementById("source-standalone");
  if (source) source.hidden = false;
  return new StandaloneAdapter({
    paste: document.getElementById("paste-input") as HTMLTextAreaElement,
    drawPasted: document.getElementById("draw-pasted") as HTMLButtonElement,
    file: document.getElementById("file-input") as HTMLInputElement,
    demo: document.getElementById("load-demo") as HTMLButtonElement,
  });
}

async function startPane(host: HostAdapter): Promise<void> {
  const pane = new DiagramPane(host);
  (globalThis as { redoxPane?: DiagramPane }).redoxPane = pane;
  try {
    await pane.start();
    document.body.dataset.paneReady = host.kind;
  } catch (error) {
    const status = document.getElementById("pane-status");
    if (status) status.textContent = `The pane could not start: ${(error as Error).message}`;
    document.body.dataset.paneReady = "error";
  }
}

if (typeof Office !== "undefined") {
  void Office.onReady((info) => startPane(info.host === Office.HostType.Excel ? new ExcelAdapter() : standalone()));
} else {
  void startPane(standalone());
}
