import type { CliIo } from './cli-io.js';

/**
 * A progress callback that draws a bar on stderr, only when stderr is a terminal and the run is
 * long enough to be worth it (at least `minTotal` units). Returns undefined otherwise.
 */
export function progressBar(io: CliIo, label: string, minTotal: number): ((done: number, total: number) => void) | undefined {
  if (!io.stderrIsTTY) return undefined;
  let last = -1;
  return (done, total) => {
    if (total < minTotal) return;
    const pct = Math.floor((100 * done) / total);
    if (pct === last) return;
    last = pct;
    const width = 30;
    const filled = Math.round((width * done) / total);
    io.stderr(`\r${label} [${'#'.repeat(filled)}${' '.repeat(width - filled)}] ${String(pct).padStart(3)}%${done >= total ? '\n' : ''}`);
  };
}
