import { describe, expect, it } from 'vitest';
import { ExceedanceCounter, exceedanceCountsLength, runMembersInto, type MemberBlock } from '../../src/ensemble/index.js';
import { emptyMemberPeaks, memberPeaksInto } from '../../src/ensemble/member-peaks.js';
import { MemberStream, STREAM_BLOCK_YEARS, streamRows } from '../../src/ensemble/member-stream.js';
import { emptyParameters, MEMBER_PARAMETERS } from '../../src/ensemble/sample-members.js';
import { syntheticTask } from './synthetic-input.js';

// The synthetic pathway with a strong 60-year oscillation added to the other forcing, so that the
// members' 20-year means rise above and fall back below the thresholds several times.
const task = syntheticTask(19, (k) => 1.5 * Math.sin((2 * Math.PI * k) / 60));
const n = task.otherWm2.length;
const thresholds = [0.8, 0.3, 1.4];

/** Members [from, to) the one-member-at-a-time way: runMembersInto with an ExceedanceCounter. */
function byMember(from: number, to: number) {
  const count = to - from;
  const block: MemberBlock = { blockStart: from, memberCount: count, warmingK: new Float64Array(count * n), parameters: emptyParameters(count) };
  const counter = new ExceedanceCounter(thresholds, n);
  const redraws = runMembersInto(task, from, to, block, undefined, counter);
  const counts = new Float64Array(exceedanceCountsLength(thresholds.length, n));
  counter.addCountsTo(counts);
  return { block, counts, redraws };
}

/** The same members streamed through blocks of years into `rowCount` rows. */
function streamed(from: number, to: number, rowCount: number) {
  const count = to - from;
  const rows = new Float64Array(rowCount * count);
  const parameters = emptyParameters(count);
  const peaks = emptyMemberPeaks(count);
  const stream = new MemberStream(task, from, to, 0, count, rows, rowCount, parameters, thresholds, peaks);
  const redraws = stream.draw();
  const seen: Float64Array[] = [];
  for (let y0 = 0; y0 < n; y0 += STREAM_BLOCK_YEARS) {
    const y1 = Math.min(n, y0 + STREAM_BLOCK_YEARS);
    stream.advance(y0, y1);
    for (let k = y0; k < y1; k++) seen[k] = rows.slice((k % rowCount) * count, (k % rowCount + 1) * count);
  }
  const counts = new Float64Array(exceedanceCountsLength(thresholds.length, n));
  stream.addCountsTo(counts);
  return { seen, counts, parameters, redraws, peaks };
}

describe('MemberStream', () => {
  const from = 40;
  const to = 91; // 51 members: an odd one goes with itself
  const reference = byMember(from, to);

  it('MemberStream gives, bit for bit, the warming, parameters and exceedance counts of runMembersInto with an ExceedanceCounter (odd member count, thresholds crossed up and down)', () => {
    for (const rowCount of [n, streamRows(n, false)]) {
      const s = streamed(from, to, rowCount);
      const m = to - from;
      for (let k = 0; k < n; k++) expect(Array.from(s.seen[k]), `year ${k}, ${rowCount} rows`).toEqual(Array.from(reference.block.warmingK.subarray(k * m, (k + 1) * m)));
      expect(Array.from(s.counts)).toEqual(Array.from(reference.counts));
      for (const p of MEMBER_PARAMETERS) expect(Array.from(s.parameters[p])).toEqual(Array.from(reference.block.parameters[p]));
      expect(s.redraws).toBe(reference.redraws);
    }
  });

  it('MemberStream tracks each member\'s peak as it steps: bit for bit memberPeaksInto over the kept warming of runMembersInto, whether it holds every year or a ring of rows', () => {
    const m = to - from;
    const kept = emptyMemberPeaks(m);
    memberPeaksInto(reference.block.warmingK, m, n, 0, m, kept);
    for (const rowCount of [n, streamRows(n, false)]) {
      const s = streamed(from, to, rowCount);
      expect(Array.from(s.peaks.warmingK), `${rowCount} rows`).toEqual(Array.from(kept.warmingK));
      expect(Array.from(s.peaks.yearIndex), `${rowCount} rows`).toEqual(Array.from(kept.yearIndex));
    }
    // Every member's peak is one of its own values and no year exceeds it.
    for (let r = 0; r < m; r++) {
      const k = kept.yearIndex[r];
      expect(kept.warmingK[r]).toBe(reference.block.warmingK[k * m + r]);
      for (let j = 0; j < n; j++) expect(reference.block.warmingK[j * m + r]).toBeLessThanOrEqual(kept.warmingK[r]);
    }
  });

  it('the oscillating input really takes members back below the thresholds (the counts above fall as well as rise)', () => {
    let falls = 0;
    for (let j = 0; j < thresholds.length; j++) for (let k = 10; k + 10 < n; k++) if (reference.counts[j * n + k] < reference.counts[j * n + k - 1]) falls++;
    expect(falls).toBeGreaterThan(10);
  });

  it('streamRows keeps a block, the 20-year look-back and the block before (36 rows for 16-year blocks), or every year when members are kept', () => {
    expect(streamRows(551, false)).toBe(36);
    expect(streamRows(551, true)).toBe(551);
    expect(streamRows(30, false)).toBe(30);
  });
});
