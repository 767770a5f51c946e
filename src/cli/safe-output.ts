/**
 * Writing the results without ever losing the previous ones: the rows go to a temporary file beside the target
 * (same directory, so the final rename stays on one file system and is atomic) and are renamed into place only
 * when every row is written and the file is closed. A failure, an interrupt or a full disk removes the temporary
 * file and leaves any previous results as they were. Special files (a terminal, /dev/null, a pipe) cannot be
 * renamed over and are written directly.
 */
import { once } from "node:events";
import {
  closeSync,
  createWriteStream,
  fsyncSync,
  mkdirSync,
  openSync,
  realpathSync,
  renameSync,
  statSync,
  unlinkSync,
  type WriteStream,
} from "node:fs";
import { basename, dirname, join, resolve } from "node:path";

/** Temporary files being written right now, removed by abortAllOutputs on an interrupt. */
const active = new Set<SafeOutput>();

/** Whether two paths name the same file: the same device and inode, or the same real path. */
export function sameFile(a: string, b: string): boolean {
  try {
    const sa = statSync(a);
    const sb = statSync(b);
    if (sa.dev === sb.dev && sa.ino === sb.ino) return true;
  } catch {
    // one of them does not exist (yet): compare where they would be
  }
  return realTarget(a) === realTarget(b);
}

/** The real path a file has or would have: its directory's real path joined with its name. */
function realTarget(path: string): string {
  try {
    return realpathSync(path);
  } catch {
    try {
      return join(realpathSync(dirname(resolve(path))), basename(path));
    } catch {
      return resolve(path);
    }
  }
}

function isSpecialFile(path: string): boolean {
  try {
    const stat = statSync(path);
    return !stat.isFile() && !stat.isDirectory();
  } catch {
    return false;
  }
}

/** Opens a stream, resolving once it is open (or rejecting with the reason it cannot be). */
export type StreamOpener = (path: string) => WriteStream;

export class SafeOutput {
  readonly stream: WriteStream;
  private readonly temporary: string | null;
  private finished = false;

  private constructor(
    readonly target: string,
    stream: WriteStream,
    temporary: string | null,
  ) {
    this.stream = stream;
    this.temporary = temporary;
  }

  /** Creates the temporary file beside `target` (or opens a special file directly). */
  static async open(
    target: string,
    opener: StreamOpener = (p) => createWriteStream(p, { flags: "wx" }),
  ): Promise<SafeOutput> {
    if (isSpecialFile(target)) {
      const stream = createWriteStream(target, { flags: "a" });
      await once(stream, "open");
      return new SafeOutput(target, stream, null);
    }
    mkdirSync(dirname(target), { recursive: true });
    const temporary = join(dirname(target), `.${basename(target)}.${process.pid}-${Date.now().toString(36)}.partial`);
    const stream = opener(temporary);
    const output = new SafeOutput(target, stream, temporary);
    active.add(output);
    try {
      await once(stream, "open");
    } catch (error) {
      output.abort();
      throw error;
    }
    return output;
  }

  /** Closes the file, flushes it to disk and renames it into place. Throws (and cleans up) on any failure. */
  async commit(): Promise<void> {
    try {
      this.stream.end();
      await once(this.stream, "finish");
      if (this.temporary !== null) {
        const fd = openSync(this.temporary, "r+");
        try {
          fsyncSync(fd);
        } finally {
          closeSync(fd);
        }
        renameSync(this.temporary, this.target);
      }
      this.finished = true;
      active.delete(this);
    } catch (error) {
      this.abort();
      throw error;
    }
  }

  /** Drops the temporary file; the target keeps whatever it held before. Safe to call twice. Synchronous. */
  abort(): void {
    active.delete(this);
    if (this.finished) return;
    this.finished = true;
    this.stream.destroy();
    if (this.temporary !== null) {
      try {
        unlinkSync(this.temporary);
      } catch {
        // never created, or already gone
      }
    }
  }
}

/** Removes every temporary file being written (for an interrupt: the process exits right after). */
export function abortAllOutputs(): void {
  for (const output of [...active]) output.abort();
}
