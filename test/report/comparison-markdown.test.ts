import { describe, expect, it } from 'vitest';
import { comparisonMarkdown } from '../../src/report/comparison-markdown.js';
import { comparisonUncertainty } from '../../src/report/comparison-uncertainty.js';
import { fixtureComparison, provenance } from './comparison-fixture.js';
import { readGfmTables } from './gfm-table.js';

describe('comparisonMarkdown', () => {
  const c = fixtureComparison();
  const md = comparisonMarkdown(c, { provenance });

  it('comparisonMarkdown holds both tables, the cautions with the ensemble sentence, and the provenance with each input hash', () => {
    expect(md.startsWith('# Pathway comparison\n')).toBe(true);
    expect(readGfmTables(md).map((t) => t.rows.length)).toEqual([c.milestoneYears.length, c.pathways.length]);
    expect(md).toContain(`- ${comparisonUncertainty(c, 'text')}`);
    expect(md).toContain('defer to the official assessments');
    expect(md).toContain(`- inputs: path /data/steady.csv, sha256 ${'0f'.repeat(32)}`);
    expect(md).toContain('- seed: 42');
    expect(md).toContain('- created_utc: 2025-01-01T00:00:00.000Z');
  });
});
