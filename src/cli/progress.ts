/**
 * Progress on a terminal: one line on stderr, rewritten in place at most ten times a second ("read and fitted
 * 120 of 1000 · 14 s"), cleared when the work is done. When stderr is not a terminal (CI, a pipe, a test) nothing
 * is written: the command's own summary line is all such a reader gets.
 */
export interface Progress {
  /** Show this status (the elapsed time is appended). */
  update(status: string): void;
  /** Clear the line; later output starts on a clean line. */
  done(): void;
  /** Seconds since the progress was created, one decimal. */
  elapsed(): string;
}

/** @example const progress = createProgress(); progress.update('read and fitted 3 of 13'); progress.done(); */
export function createProgress(stream: NodeJS.WriteStream = process.stderr, now: () => number = () => performance.now()): Progress {
  const started = now();
  const elapsed = (): string => ((now() - started) / 1000).toFixed(1);
  const live = stream.isTTY === true;
  let last = 0;
  let shown = false;
  return {
    update(status) {
      if (!live) return;
      const time = now();
      if (shown && time - last < 100) return;
      last = time;
      shown = true;
      const line = `${status} · ${elapsed()} s`;
      const width = Math.max(20, (stream.columns || 80) - 1);
      stream.write(`\r\x1b[2K${line.length > width ? line.slice(0, width) : line}`);
    },
    done() {
      if (live && shown) stream.write('\r\x1b[2K');
      shown = false;
    },
    elapsed,
  };
}
