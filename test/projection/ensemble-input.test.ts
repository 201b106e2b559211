import { describe, expect, it } from 'vitest';
import { calibrate } from '../../src/index.js';
import type { Pathway } from '../../src/pathway.js';
import { ensembleInput } from '../../src/projection/index.js';

function pathway(first: number, length: number, co2Ppm: number): Pathway {
  return {
    name: 'test',
    years: Float64Array.from({ length }, (_, i) => first + i),
    series: { co2_ppm: new Float64Array(length).fill(co2Ppm) },
    metadata: {},
    provenance: { source: 'memory', notes: [] },
  };
}

describe('ensembleInput', () => {
  it('ensembleInput notes that each member starts from rest in a first year after 1750, and not for 1750', () => {
    const late = ensembleInput(pathway(2030, 20, 440), calibrate()).notes;
    expect(late.filter((n) => n.startsWith('each member starts from rest in 2030: zero warming'))).toHaveLength(1);
    const early = ensembleInput(pathway(1750, 20, 278.3), calibrate()).notes;
    expect(early.filter((n) => n.includes('starts from rest'))).toEqual([]);
  });
});
