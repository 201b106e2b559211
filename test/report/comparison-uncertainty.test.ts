import { describe, expect, it } from 'vitest';
import { comparisonUncertainty } from '../../src/report/comparison-uncertainty.js';
import { fixtureComparison } from './comparison-fixture.js';

describe('comparisonUncertainty', () => {
  it('comparisonUncertainty names the pathways with ranges and those without, and is undefined when none has one', () => {
    const c = fixtureComparison();
    const text = comparisonUncertainty(c)!;
    expect(text).toMatch(/^Ranges are shown for delayed: the 17-83 % \(likely\) range in parentheses and the 5-95 % \(very likely\) range in brackets, shaded in the charts/);
    expect(text).toMatch(/steady, swift: single central estimates, no range\.$/);
    expect(comparisonUncertainty({ ...c, pathways: c.pathways.filter((p) => !p.range) })).toBeUndefined();
  });

  it('comparisonUncertainty for the terminal speaks of parentheses and brackets only, as the terminal chart has no shading', () => {
    const text = comparisonUncertainty(fixtureComparison(), 'terminal')!;
    expect(text).toMatch(/^Ranges are shown for delayed: the 17-83 % \(likely\) range in parentheses and the 5-95 % \(very likely\) range in brackets, across/);
    expect(text).not.toMatch(/shaded/);
  });
});
