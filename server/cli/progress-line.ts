/** Where a progress line goes: standard error, a terminal or not. */
export interface ProgressStream {
  isTTY?: boolean;
  columns?: number;
  write(text: string): unknown;
}

/**
 * A progress line for long work. On a terminal it is one line rewritten in place (`\r`), cut to the
 * terminal's width; into a file or a pipe it is a line at each tenth of the way, so logs stay short.
 */
export function progressLine(stream: ProgressStream = process.stderr): { update(done: number, total: number, label: string): void; end(): void } {
  let lastTenth = -1;
  let shown = false;
  return {
    update(done, total, label) {
      const percent = Math.floor((100 * done) / Math.max(total, 1));
      const line = `${String(percent).padStart(3)} % ${done}/${total} ${label}`;
      if (stream.isTTY) {
        const width = Math.max(20, (stream.columns ?? 80) - 1);
        stream.write(`\r${line.slice(0, width).padEnd(width)}`);
        shown = true;
        return;
      }
      const tenth = Math.floor(percent / 10);
      if (tenth > lastTenth || done === total) {
        lastTenth = tenth;
        stream.write(`${line}\n`);
      }
    },
    end() {
      if (shown) stream.write('\n');
      shown = false;
    },
  };
}
