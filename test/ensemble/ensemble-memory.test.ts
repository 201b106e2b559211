import { describe, expect, it } from 'vitest';
import { ensembleMemory, mergeMemory, shardFileBytes } from '../../src/ensemble/index.js';

describe('ensembleMemory', () => {
  it('ensembleMemory holds every member-year (8 bytes each) plus a few hundred bytes per member, whatever the kind of run', () => {
    for (const years of [401, 551]) {
      const e = ensembleMemory(1_000_000, years, {});
      expect(e.bytes).toBeGreaterThan(1_000_000 * years * 8);
      expect(e.bytes).toBeLessThan(1_000_000 * (years * 8 + 400));
      expect(e.largestArray).toBe(years * 1_000_000);
      expect(e.largestText).toBe(0);
    }
    expect(ensembleMemory(10_000, 401, { emissionDriven: true }).bytes).toBeGreaterThan(ensembleMemory(10_000, 401, {}).bytes);
  });

  it('ensembleMemory of a shard adds its file text, whose length is shardFileBytes', () => {
    const shard = ensembleMemory(10_000, 401, { shard: true });
    expect(shard.largestText).toBe(shardFileBytes(10_000, 401));
    expect(shard.bytes).toBeGreaterThan(10_000 * 401 * 8 + 4 * shard.largestText);
  });

  it('ensembleMemory grows in proportion to the members', () => {
    expect(ensembleMemory(2000, 401, {}).bytes).toBe(2 * ensembleMemory(1000, 401, {}).bytes);
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
