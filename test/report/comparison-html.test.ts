import { describe, expect, it } from 'vitest';
import { comparisonHtml } from '../../src/report/comparison-html.js';
import { comparisonUncertainty } from '../../src/report/comparison-uncertainty.js';
import { escapeMarkup } from '../../src/report/escape-markup.js';
import { fixtureComparison, provenance } from './comparison-fixture.js';

describe('comparisonHtml', () => {
  const c = fixtureComparison();
  const page = comparisonHtml(c, { provenance, assumptions: { 'CO2 formula': 'ar6', 'history splice': 'bundled history before 2024' } });

  it('comparisonHtml holds both tables, both charts, the assumptions with the crossing rule, the provenance and the ensemble caution', () => {
    expect(page.match(/<table>/g)).toHaveLength(2);
    expect(page.match(/<figure><svg /g)).toHaveLength(2);
    expect(page).toContain('<dt>history splice</dt><dd>bundled history before 2024</dd>');
    expect(page).toContain('<dt>threshold crossing</dt><dd>middle year (the earlier of two) of the first 20-year period');
    expect(page).toContain(`<dd>${'0f'.repeat(32)}</dd>`);
    expect(page).toContain(`<li>${escapeMarkup(comparisonUncertainty(c)!)}</li>`);
    expect(page).not.toMatch(/<script|\bsrc=|href=/i);
  });
});
