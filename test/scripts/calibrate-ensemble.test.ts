import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { calibrateEnsemble, calibratedSetText } from '../../scripts/calibrate-ensemble.js';
import { bundledPathwaysDir } from '../../src/io/bundled-pathways.js';

const root = dirname(bundledPathwaysDir());
const fixture = join(root, 'test', 'fixtures', 'calibrated-members-small.json');

describe('scripts/calibrate-ensemble.ts', () => {
  it('regenerates the small fixture byte for byte (3000 prior members, 300 kept, default seed); after a change to the data or the method, rebuild it with: node dist/scripts/calibrate-ensemble.js --members 3000 --keep 300 --no-validate --out test/fixtures/calibrated-members-small.json', () => {
    const { json } = calibrateEnsemble({ members: 3000, keep: 300 });
    expect(calibratedSetText(json)).toBe(readFileSync(fixture, 'utf8'));
  });

  it('gives the same set for the same seed and a different one for another seed', () => {
    const a = calibratedSetText(calibrateEnsemble({ members: 1000, keep: 100, seed: 5 }).json);
    const b = calibratedSetText(calibrateEnsemble({ members: 1000, keep: 100, seed: 5 }).json);
    const c = calibratedSetText(calibrateEnsemble({ members: 1000, keep: 100, seed: 6 }).json);
    expect(b).toBe(a);
    expect(c).not.toBe(a);
  });

  it('the bundled set was built from the data files as they are now (each SHA-256 in its provenance matches)', () => {
    const set = JSON.parse(readFileSync(join(root, 'pathways', 'calibrated-members.json'), 'utf8'));
    for (const { path, sha256 } of set.provenance.data as { path: string; sha256: string }[]) {
      const file = path.startsWith('shared/data/') ? join('/work', path) : join(root, path);
      expect(createHash('sha256').update(readFileSync(file)).digest('hex'), `${path} changed since the set was built: run npm run build && node dist/scripts/calibrate-ensemble.js`).toBe(sha256);
    }
  });
});
