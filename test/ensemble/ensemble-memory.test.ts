import { describe, expect, it } from 'vitest';
import { ensembleMemory, mergeMemory, shardFileBytes } from '../../src/ensemble/index.js';

describe('ensembleMemory', () => {
  it('ensembleMemory of a streamed concentration run is about 480 bytes per member whatever the years (measured: 0.46 GB per million members for swift)', () => {
    for (const years of [401, 551]) {
      const e = ensembleMemory(1_000_000, years, {});
      expect(e.bytes / 1e6).toBeGreaterThan(440);
      expect(e.bytes / 1e6).toBeLessThan(520);
      expect(e.largestArray).toBe(36 * 1_000_000);
      expect(e.largestText).toBe(0);
    }
  });

  it('ensembleMemory of an emission run keeps 8 bytes per member-year; a shard adds its file text, whose length is shardFileBytes', () => {
    const emission = ensembleMemory(10_000, 401, { emissionDriven: true });
    expect(emission.bytes).toBeGreaterThan(10_000 * 401 * 8);
    expect(emission.largestArray).toBe(10_000 * 401);
    const shard = ensembleMemory(10_000, 401, { shard: true });
    expect(shard.largestText).toBe(shardFileBytes(10_000, 401));
    expect(shard.bytes).toBeGreaterThan(10_000 * 401 * 8 + 4 * shard.largestText);
    // A run that keeps its members needs more than a streamed one of the same size.
    expect(shard.bytes).toBeGreaterThan(ensembleMemory(10_000, 401, {}).bytes);
  });

  it('ensembleMemory grows with members and with threads', () => {
    expect(ensembleMemory(2000, 401, {}).bytes).toBe(2 * ensembleMemory(1000, 401, {}).bytes);
    expect(ensembleMemory(1000, 401, { threads: 4 }).bytes).toBeGreaterThan(ensembleMemory(1000, 401, { threads: 1 }).bytes);
  });
});

describe('mergeMemory', () => {
  it('mergeMemory holds every member-year of the whole ensemble (4.4 GB for a million over 1750-2300) plus the shard being read', () => {
    const e = mergeMemory(1_000_000, 551, 10_000);
    expect(e.bytes).toBeGreaterThan(1_000_000 * 551 * 8);
    expect(e.bytes).toBeLessThan(1.2 * 1_000_000 * 551 * 8);
    expect(e.largestArray).toBe(551_000_000);
    expect(e.largestText).toBe(shardFileBytes(10_000, 551));
  });
});
