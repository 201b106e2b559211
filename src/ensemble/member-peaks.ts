/**
 * Each member's own peak: the highest annual warming of its rebased series over the whole run and
 * the index of the year it occurs in (the first such year when the highest value repeats), one entry
 * per member. A peak in the last year means the member is still rising (or flat) at the end of the run.
 */
export interface MemberPeaks {
  /** Peak warming, K relative to the baseline. */
  warmingK: Float64Array;
  /** Index of the peak year within the run (0 = its first year); -1 before any year is seen. */
  yearIndex: Float64Array;
}

/**
 * Peak arrays for `count` members, set to "no year seen yet" (-Infinity K, index -1), so that the
 * first year's value always becomes the peak.
 * @param buffer allocates the memory (a SharedArrayBuffer for worker threads)
 * @example emptyMemberPeaks(2).yearIndex // Float64Array [-1, -1]
 */
export function emptyMemberPeaks(count: number, buffer: (bytes: number) => ArrayBufferLike = (bytes) => new ArrayBuffer(bytes)): MemberPeaks {
  const peaks = { warmingK: new Float64Array(buffer(count * 8)), yearIndex: new Float64Array(buffer(count * 8)) };
  peaks.warmingK.fill(-Infinity);
  peaks.yearIndex.fill(-1);
  return peaks;
}

/**
 * The peaks of members [memberFrom, memberTo) of year-major values (year k of member r at k * m + r),
 * into `out` at the members' own indices. A year replaces the peak only when its value is strictly
 * higher, so ties go to the first year, as in the streamed run (member-stream.ts), which applies the
 * same comparison to the same values and so gives the same peaks bit for bit.
 *
 * @param warmingK year-major member values, K
 * @param m members per year in the layout
 * @param n years
 * @param memberFrom first member
 * @param memberTo end member, exclusive
 * @param out receives the peaks (overwritten for these members)
 * @example
 * const out = emptyMemberPeaks(2);
 * memberPeaksInto(Float64Array.of(0.1, 0.5, 0.9, 0.2, 0.4, 0.2), 2, 3, 0, 2, out);
 * out.warmingK // [0.9, 0.5]; out.yearIndex // [1, 0]
 */
export function memberPeaksInto(warmingK: Float64Array, m: number, n: number, memberFrom: number, memberTo: number, out: MemberPeaks): void {
  const { warmingK: peak, yearIndex } = out;
  for (let r = memberFrom; r < memberTo; r++) {
    peak[r] = -Infinity;
    yearIndex[r] = -1;
  }
  // Year by year, reading each row in order (the layout is year-major).
  for (let k = 0; k < n; k++) {
    const base = k * m;
    for (let r = memberFrom; r < memberTo; r++) {
      const v = warmingK[base + r];
      if (v > peak[r]) {
        peak[r] = v;
        yearIndex[r] = k;
      }
    }
  }
}
