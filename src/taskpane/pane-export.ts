/**
 * The pane's exports: the drawing as SVG or PNG of the chosen size, a picture inserted in the sheet (Excel), and
 * text copied to the clipboard.
 */
import type { HostAdapter } from "./host";
import { input, select } from "./pane-dom";
import { blobToBase64, download, svgToPngBlob } from "./png-export";

/** What was last drawn, for export: the caption and the drawing with title, legend and caption inside. */
export interface Drawn {
  caption: string[];
  render(width: number, height: number, titles?: boolean): string;
}

/** The export size typed in the pane, or 1200 × 900 when out of range. */
function exportSize(): { width: number; height: number } {
  const width = Math.round(Number(input("png-width").value));
  const height = Math.round(Number(input("png-height").value));
  return {
    width: width >= 200 && width <= 4000 ? width : 1200,
    height: height >= 150 && height <= 3000 ? height : 900,
  };
}

/** The file name of an export: metal and diagram temperature. */
export function exportFileName(ext: string): string {
  return `redox-cells-${select("metal").value}-${input("temperature").value}C.${ext}`;
}

export function exportSvg(drawn: Drawn | null): void {
  if (!drawn) return;
  const { width, height } = exportSize();
  download(new Blob([drawn.render(width, height, true)], { type: "image/svg+xml" }), exportFileName("svg"));
}

export async function exportPng(drawn: Drawn | null): Promise<void> {
  if (!drawn) return;
  const { width, height } = exportSize();
  download(await svgToPngBlob(drawn.render(width, height), width, height), exportFileName("png"));
}

/** The drawing as a PNG placed beside the data with its caption (Excel only). */
export async function insertPicture(
  drawn: Drawn | null,
  host: HostAdapter,
  status: (text: string) => void,
): Promise<void> {
  if (!drawn || !host.insertPicture) return;
  const { width, height } = exportSize();
  try {
    const png = await svgToPngBlob(drawn.render(width, height), width, height);
    await host.insertPicture({
      pngBase64: await blobToBase64(png),
      widthPx: width,
      heightPx: height,
      caption: drawn.caption.join(" "),
    });
    status("Diagram inserted beside the data.");
  } catch (error) {
    status(`Could not insert the picture: ${(error as Error).message}`);
  }
}

/** Text to the clipboard, with a status line either way. */
export async function copyText(text: string, done: string, status: (text: string) => void): Promise<void> {
  try {
    await navigator.clipboard.writeText(text);
    status(done);
  } catch (error) {
    status(`Could not copy (${(error as Error).message}); use Download CSV instead.`);
  }
}
