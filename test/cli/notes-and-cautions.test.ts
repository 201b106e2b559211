import { describe, expect, it } from 'vitest';
import { captureIo } from '../../src/cli/cli-io.js';
import { main } from '../../src/cli/main.js';
import { notesAndCautions, wrapLabelled } from '../../src/cli/notes-and-cautions.js';

describe('notesAndCautions and wrapLabelled', () => {
  it('wrapLabelled wraps at spaces within the width, indents continuation lines under the text, and keeps every word', () => {
    const text = 'These are reduced-complexity, global-mean estimates: one global surface temperature from a two-box energy balance model.';
    const out = wrapLabelled('  caution: ', text, 60);
    const lines = out.split('\n');
    expect(lines.length).toBeGreaterThan(1);
    for (const line of lines) expect(line.length).toBeLessThanOrEqual(60);
    for (const line of lines.slice(1)) expect(line.startsWith(' '.repeat(11)) && line[11] !== ' ').toBe(true);
    expect(out.replace(/\n +/g, ' ').slice(11)).toBe(text);
    expect(wrapLabelled('  note: ', text)).toBe(`  note: ${text}`);
  });

  it('notesAndCautions without a width writes one line per note and caution', () => {
    expect(notesAndCautions(['CH4 held at its 1750 value'], ['Global mean only.'])).toBe('\n  note: CH4 held at its 1750 value\n\n  caution: Global mean only.\n\n');
  });

  it('run on an 80-column terminal keeps its notes and cautions within 80 columns', async () => {
    const io = Object.assign(captureIo(), { stdoutColumns: 80 });
    expect(await main(['run', 'swift', '--no-chart'], io)).toBe(0);
    expect(io.out).toMatch(/^  caution: /m);
    const tail = io.out.slice(io.out.indexOf('  note: '));
    expect(tail.split('\n').length).toBeGreaterThan(8);
    for (const line of tail.split('\n')) expect(line.length, line).toBeLessThanOrEqual(80);
  });
});
