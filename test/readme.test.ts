// The README's examples and option tables must be what the current code prints: the README is
// checked against a fresh rendering by scripts/readme-examples.ts (regenerate with `npm run readme`).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { optionsTable, parseExample, readmePath, renderReadme } from '../scripts/readme-examples.js';

describe('README examples', () => {
  it('README.md examples and option tables equal the current output (if this fails: npm run readme)', async () => {
    const text = readFileSync(readmePath(), 'utf8');
    const rendered = await renderReadme(text);
    expect(rendered, 'README.md is stale: run `npm run readme` and commit the result').toBe(text);
  }, 120_000);

  it('renderReadme replaces a stale example block with the real output (so the check above can fail)', async () => {
    const stale = '<!-- example: warmcast pathways | head 2 -->\n```text\nold output\n```\n<!-- /example -->\n';
    const rendered = await renderReadme(stale);
    expect(rendered).not.toContain('old output');
    expect(rendered).toMatch(/^<!-- example: warmcast pathways \| head 2 -->\n```text\n.+\n.+\n\.\.\.\n```\n<!-- \/example -->\n$/);
  });

  it('parseExample reads the command and its head, file and lines steps, and refuses anything else', () => {
    expect(parseExample('warmcast compare a b --out t.md | file t.md | lines 2-5 | head 3')).toEqual({
      argv: ['compare', 'a', 'b', '--out', 't.md'], file: 't.md', lines: [2, 5], head: 3,
    });
    expect(() => parseExample('ls -l')).toThrow('must start with "warmcast"');
    expect(() => parseExample('warmcast run | tail 3')).toThrow('must be head, file, lines or markdown');
    expect(parseExample('warmcast verify | markdown').markdown).toBe(true);
  });

  it('optionsTable(run) lists run\'s options from its --help with their defaults', async () => {
    const table = await optionsTable('run');
    expect(table.split('\n').slice(0, 2)).toEqual(['| option | what it does | default |', '|---|---|---|']);
    expect(table).toContain('| `--baseline <years>` | baseline period for warming and for the thresholds read against it | 1850-1900 |');
    expect(table).not.toContain('--help');
  });
});
