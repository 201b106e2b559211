import { describe, expect, it } from 'vitest';
import { comparisonUncertainty } from '../../src/report/comparison-uncertainty.js';
import { comparePathways } from '../../src/metrics/index.js';
import { fixtureComparison } from './comparison-fixture.js';

describe('comparisonUncertainty', () => {
  it('comparisonUncertainty names the pathways with ranges and those without, and is undefined when none has one', () => {
    const c = fixtureComparison();
    const text = comparisonUncertainty(c)!;
    expect(text).toMatch(/^Ranges are shown for delayed: the 5-95 % \(very likely\) range in brackets, shaded in the charts with the 17-83 % \(likely\) range darker/);
    expect(text).toMatch(/narrower than the IPCC AR6 assessed ranges/);
    expect(text).toMatch(/steady, swift: single central estimates, no range\.$/);
    expect(comparisonUncertainty({ ...c, pathways: c.pathways.filter((p) => !p.range) })).toBeUndefined();
  });

  it('comparisonUncertainty for the terminal speaks of brackets only (the tables show 5-95 %; the terminal chart has no shading)', () => {
    const text = comparisonUncertainty(fixtureComparison(), 'text')!;
    expect(text).toMatch(/^Ranges are shown for delayed: the 5-95 % \(very likely\) range in brackets, across/);
    expect(text).not.toMatch(/shaded/);
  });

  it('comparisonUncertainty says that the members of an emission-driven pathway run their own carbon cycle, only when one has a range', () => {
    const years = Float64Array.from({ length: 11 }, (_, i) => 2020 + i);
    const w = years.map(() => 1.2);
    const range = { p05: w, p17: w, p83: w, p95: w };
    const withCarbon = comparePathways([{ label: 'e', years, warmingK: w, range, co2Gtco2: w }], { milestoneYears: [] });
    expect(comparisonUncertainty(withCarbon)).toMatch(/Each member of an emission-driven pathway also runs its own CO2 cycle/);
    expect(comparisonUncertainty(fixtureComparison())).not.toMatch(/own CO2 cycle/);
  });
});

