import { describe, expect, it } from 'vitest';
import { comparisonText } from '../../src/report/comparison-text.js';
import { fixtureComparison } from './comparison-fixture.js';

describe('comparisonText', () => {
  const c = fixtureComparison();

  it('comparisonText prints the headlines, both tables and a chart whose legend names every pathway, without colour by default', () => {
    const text = comparisonText(c, { fromYear: 1950 });
    expect(text).not.toMatch(/\x1b\[/);
    expect(text).toContain('  steady: peak 3.50 K in 2100 (still rising)');
    expect(text).toContain('  Warming at milestone years (K relative to 1850-1900)');
    expect(text).toContain('  Per pathway');
    expect(text).toContain('o─ steady   +─ delayed   x─ swift   ┄┄ 1.5 K, 2 K');
    expect(text.endsWith('\n')).toBe(true);
  });

  it('comparisonText adds colour only when asked, and can leave the chart out', () => {
    expect(comparisonText(c, { color: true })).toMatch(/\x1b\[/);
    expect(comparisonText(c, { noChart: true })).not.toContain('┄┄');
  });
});
