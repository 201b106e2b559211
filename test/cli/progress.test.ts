import { describe, expect, it } from 'vitest';
import { captureIo } from '../../src/cli/cli-io.js';
import { progressBar } from '../../src/cli/progress.js';

describe('progressBar', () => {
  it('is off when stderr is not a terminal', () => {
    expect(progressBar(captureIo(), 'members', 10)).toBeUndefined();
  });

  it('draws a bar on a terminal for long runs only, ending with a newline at 100 %', () => {
    const io = captureIo();
    io.stderrIsTTY = true;
    const bar = progressBar(io, 'members', 100)!;
    bar(5, 50);
    expect(io.err).toBe('');
    bar(50, 100);
    bar(100, 100);
    expect(io.err).toMatch(/members \[#{15} {15}\]  50%/);
    expect(io.err.endsWith('100%\n')).toBe(true);
  });
});
