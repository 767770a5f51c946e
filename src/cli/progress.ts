/**
 * A one-line progress bar on standard error: share of the input bytes read, rows done and rows per second,
 * redrawn at most ten times a second and erased at the end.
 */
export interface ProgressSink {
  write(text: string): unknown;
  columns?: number;
}

export class ProgressBar {
  private lastDraw = 0;
  private readonly started = Date.now();
  private drawn = false;

  constructor(
    private readonly sink: ProgressSink,
    private readonly totalBytes: number,
  ) {}

  update(bytes: number, rows: number, force = false): void {
    const now = Date.now();
    if (!force && now - this.lastDraw < 100) return;
    this.lastDraw = now;
    const share = this.totalBytes > 0 ? Math.min(1, bytes / this.totalBytes) : 0;
    const width = Math.max(10, Math.min(40, (this.sink.columns ?? 80) - 50));
    const filled = Math.round(share * width);
    const seconds = Math.max(1e-3, (now - this.started) / 1000);
    const rate = Math.round(rows / seconds);
    const line = `[${"#".repeat(filled)}${"-".repeat(width - filled)}] ${(share * 100).toFixed(0).padStart(3)}%  ${rows.toLocaleString("en-US")} rows  ${rate.toLocaleString("en-US")} rows/s`;
    this.sink.write(`\r${line}\u001b[K`);
    this.drawn = true;
  }

  /** Erases the bar so that the next message starts on a clean line. */
  clear(): void {
    if (this.drawn) this.sink.write("\r\u001b[K");
    this.drawn = false;
  }
}
