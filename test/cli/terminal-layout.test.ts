// The terminal layout of issue 16: answers first, lines that fit the terminal, few lines. Widths are
// counted in characters (UTF-16 code units; the chart's box-drawing characters are one each).
import { describe, expect, it } from 'vitest';
import { captureIo } from '../../src/cli/cli-io.js';
import { main } from '../../src/cli/main.js';

async function terminal(argv: string[], columns: number): Promise<string[]> {
  const io = { ...captureIo(), stdoutColumns: columns };
  const out: string[] = [];
  io.stdout = (s: string) => void out.push(s);
  const code = await main(argv, io);
  expect(code, argv.join(' ')).toBe(0);
  return out.join('').replace(/\n$/, '').split('\n');
}

const widest = (lines: string[]) => Math.max(...lines.map((l) => l.length));

describe('terminal output at COLUMNS=120 (issue 16 checks)', () => {
  it('run: at most 45 lines, none over 120 characters, the headline block before the table and the chart', async () => {
    const lines = await terminal(['run'], 120);
    console.info(`run: ${lines.length} lines, widest ${widest(lines)}`);
    expect(lines.length).toBeLessThanOrEqual(45);
    expect(widest(lines)).toBeLessThanOrEqual(120);
    const at = (re: RegExp) => lines.findIndex((l) => re.test(l));
    expect(at(/^ {2}warming {3}2030: /)).toBeGreaterThan(0);
    expect(at(/^ {2}warming {3}2030: /)).toBeLessThan(at(/^ {2}year {2}warming K/));
    expect(at(/^ {2}year {2}warming K/)).toBeLessThan(at(/^Warming, K relative to/));
    // One caution line (wrapped at most once) that points to the full cautions.
    expect(lines.filter((l) => l.startsWith('  caution: '))).toHaveLength(1);
    expect(lines.join(' ')).toMatch(/warmcast run --help, or any output file/);
  });

  it('compare of three bundled pathways: at most 55 lines, none over 120 characters; with long names and members still within 120 characters and 60 lines', async () => {
    const lines = await terminal(['compare', 'steady', 'delayed', 'swift'], 120);
    console.info(`compare of three: ${lines.length} lines, widest ${widest(lines)}`);
    expect(lines.length).toBeLessThanOrEqual(55);
    expect(widest(lines)).toBeLessThanOrEqual(120);
    const ranged = await terminal(['compare', 'A policy option with a long name=steady', 'Another long option name=delayed', 'swift', '--members', '40'], 120);
    console.info(`compare of three with members and long names: ${ranged.length} lines, widest ${widest(ranged)}`);
    expect(widest(ranged)).toBeLessThanOrEqual(120);
    // Long names push the headline's crossing-year columns past 120 characters; they wrap into a
    // second block (6 lines) rather than hide, so this case has 5 lines more than the bundled one.
    expect(ranged.length).toBeLessThanOrEqual(60);
  });

  it('at 80 columns, and at the 100 used when piped, every command still fits', async () => {
    for (const columns of [80, 100]) {
      for (const argv of [['run', 'swift'], ['compare', 'steady', 'delayed', 'swift'], ['ensemble', 'swift', '--members', '40']]) {
        const lines = await terminal(argv, columns);
        expect(widest(lines), `${argv.join(' ')} at ${columns}`).toBeLessThanOrEqual(columns);
      }
    }
  });
});
