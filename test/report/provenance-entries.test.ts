import { describe, expect, it } from 'vitest';
import { provenanceEntries } from '../../src/report/provenance-entries.js';

describe('provenanceEntries', () => {
  it('provenanceEntries flattens nested records into one text per top-level key, in order', () => {
    expect(
      provenanceEntries({ version: '0.1.0', inputs: [{ path: 'a.csv', sha256: 'ab' }, { path: 'b.csv', sha256: 'cd' }], parameters: { ecs_k: 3 }, seed: undefined, notes: [] }),
    ).toEqual([
      ['version', '0.1.0'],
      ['inputs', 'path a.csv, sha256 ab; path b.csv, sha256 cd'],
      ['parameters', 'ecs_k 3'],
      ['notes', 'none'],
    ]);
  });
});
