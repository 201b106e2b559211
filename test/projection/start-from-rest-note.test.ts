import { describe, expect, it } from 'vitest';
import type { Pathway } from '../../src/pathway.js';
import { startFromRestNote } from '../../src/projection/start-from-rest-note.js';

function pathway(first: number, series: Record<string, number[]>): Pathway {
  const length = Object.values(series)[0].length;
  return {
    name: 'test',
    years: Float64Array.from({ length }, (_, i) => first + i),
    series: Object.fromEntries(Object.entries(series).map(([k, v]) => [k, Float64Array.from(v)])),
    metadata: {},
    provenance: { source: 'memory', notes: [] },
  };
}

describe('startFromRestNote', () => {
  it('startFromRestNote is undefined for a run that starts in 1750 (the pre-industrial state it starts from)', () => {
    expect(startFromRestNote(pathway(1750, { co2_ppm: [278.3, 279] }), { subject: 'the run' })).toBeUndefined();
  });

  it('startFromRestNote of a concentration pathway from 2030 says zero warming in 2030 whatever its forcing, and nothing of gases', () => {
    const note = startFromRestNote(pathway(2030, { co2_ppm: [440, 441] }), { subject: 'the run', forcingWm2: 2.512 });
    expect(note).toBe(
      "the run starts from rest in 2030: zero warming at the surface and in the deep ocean, as in 1750, whatever that year's forcing (2.51 W m-2), "
      + 'so any warming reached before 2030 is missing; spliced onto the history, the run would start from the record in 1750 instead',
    );
  });

  it('startFromRestNote names the gases given as emissions and the 1750 concentrations they start from', () => {
    const note = startFromRestNote(pathway(2030, { co2_gtco2: [35, 30], ch4_ppb: [1900, 1890], n2o_mt: [10, 10] }), { subject: 'the run' });
    expect(note).toContain('CO2 and N2O, given as emissions, start from 1750 concentrations (CO2 278.3 ppm, N2O 270.1 ppb), as if nothing had been emitted before 2030');
    expect(note).not.toContain('CH4 729.2');
    const one = startFromRestNote(pathway(2030, { ch4_mt: [300, 290] }), { subject: 'each member' });
    expect(one).toMatch(/^each member starts from rest in 2030: .*; CH4, given as emissions, starts from 1750 concentrations \(CH4 729\.2 ppb\)/);
  });

  it('startFromRestNote says a CO2 concentration in a run with emissions starts with the carbon cycle at rest', () => {
    const note = startFromRestNote(pathway(2030, { co2_ppm: [440, 441], ch4_mt: [300, 290] }), { subject: 'the run' });
    expect(note).toContain("CO2 starts at the file's 2030 concentration with the carbon cycle at rest, taking up nothing emitted before 2030");
    const concentrationsOnly = startFromRestNote(pathway(2030, { co2_ppm: [440, 441] }), { subject: 'the run' });
    expect(concentrationsOnly).not.toContain('carbon cycle');
  });
});
