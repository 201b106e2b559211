import { RUNNING_MEAN_WINDOW } from './running-mean.js';

/**
 * Counts, member by member, how many members' 20-year mean warming exceeds each threshold in each
 * year, and in which year each member's 20-year mean first exceeds it (IPCC AR6 WG1 convention for
 * reaching a warming level: the mean of years y-9 .. y+10 stands for year y).
 *
 * One pass over a member's rebased warming row: the 20-year sum slides along the row (the same
 * additions, in the same order, as runningMeanInto), and with the thresholds sorted the member's
 * state in each year is one number, the level L of thresholds its mean exceeds (mean > t_j exactly
 * for j < L). Only changes of L are recorded: +1 at the year a member rises above a threshold and -1
 * where it falls back, so a year costs two comparisons whatever the number of thresholds, and the
 * per-year counts are the running totals of those changes. Counts are whole numbers, so partial
 * counts from threads or shards add up exactly in any order.
 */
export class ExceedanceCounter {
  /**
   * -Infinity, the thresholds ascending, +Infinity: a member at level L has bounds[L] < mean and
   * !(mean > bounds[L + 1]) (it exceeds exactly the L lowest thresholds).
   */
  readonly bounds: Float64Array;
  /**
   * The same bounds on the 20-year sum: sumBounds[L] is the largest double s whose mean s / 20 (as
   * the counters compute it, correctly rounded) is not above bounds[L], so that s / 20 > bounds[L]
   * exactly when s > sumBounds[L]. Stream runs compare sums with these and divide only when a level
   * changes.
   */
  readonly sumBounds: Float64Array;
  /** order[s] = index in the caller's threshold list of the s-th smallest threshold. */
  private readonly order: Int32Array;
  /** Changes of the count above each sorted threshold, per year: [s * n + c]. */
  private readonly changes: Int32Array;
  /** Members whose 20-year mean first exceeds each sorted threshold in year c: [s * n + c]. */
  private readonly firsts: Int32Array;

  /**
   * @param thresholds warming levels, K (any order, no repeats)
   * @param n years of every row
   */
  constructor(
    thresholds: readonly number[],
    private readonly n: number,
  ) {
    const order = thresholds.map((_, j) => j).sort((a, b) => thresholds[a] - thresholds[b]);
    this.order = Int32Array.from(order);
    this.bounds = Float64Array.from([-Infinity, ...order.map((j) => thresholds[j]), Infinity]);
    const width = RUNNING_MEAN_WINDOW.before + RUNNING_MEAN_WINDOW.after + 1;
    this.sumBounds = this.bounds.map((t) => largestSumNotAbove(t, width));
    this.changes = new Int32Array(thresholds.length * n);
    this.firsts = new Int32Array(thresholds.length * n);
  }

  /**
   * Adds one member: its warming relative to the baseline at years 0..n-1 in `row` from `offset`.
   * @param row the member's values (read only)
   * @param offset index of its year 0
   */
  addMember(row: Float64Array, offset: number): void {
    const { before, after } = RUNNING_MEAN_WINDOW;
    const width = before + after + 1;
    const n = this.n;
    if (n < width || this.order.length === 0) return;
    const bounds = this.bounds;
    let sum = 0;
    for (let k = 0; k < width; k++) sum += row[offset + k];
    let level = 0;
    let reached = 0;
    for (let c = before; c + after < n; c++) {
      const mean = sum / width;
      if (!(mean > bounds[level]) || mean > bounds[level + 1]) {
        level = this.move(mean, level, reached, c);
        if (level > reached) reached = level;
      }
      if (c + after + 1 < n) sum += row[offset + c + after + 1] - row[offset + c - before];
    }
  }

  /**
   * Moves a member whose 20-year mean around year c is `mean` from `level` to the level of that
   * mean, recording the change (and first crossings of levels above `reached`, the highest level the
   * member has had). Callers check first that the level changes, which it rarely does.
   * @returns the new level
   */
  move(mean: number, level: number, reached: number, c: number): number {
    const { bounds, changes, firsts, n } = this;
    if (mean > bounds[level + 1]) {
      let up = level + 1;
      while (mean > bounds[up + 1]) up++;
      for (let s = level; s < up; s++) changes[s * n + c]++;
      for (let s = reached; s < up; s++) firsts[s * n + c]++;
      return up;
    }
    let down = level;
    while (down > 0 && !(mean > bounds[down])) down--;
    for (let s = down; s < level; s++) changes[s * n + c]--;
    return down;
  }

  /**
   * Adds the counts so far to `counts` in the layout of exceedanceCountsInto: counts[j * n + c] the
   * members whose 20-year mean around year c exceeds threshold j, counts[(T + j) * n + c] the members
   * whose mean first exceeds it at c (j in the caller's threshold order, T thresholds). Years whose
   * window leaves the run get nothing.
   */
  addCountsTo(counts: Float64Array): void {
    const { before, after } = RUNNING_MEAN_WINDOW;
    const n = this.n;
    const t = this.order.length;
    for (let s = 0; s < t; s++) {
      const j = this.order[s];
      let above = 0;
      for (let c = before; c + after < n; c++) {
        above += this.changes[s * n + c];
        counts[j * n + c] += above;
        counts[(t + j) * n + c] += this.firsts[s * n + c];
      }
    }
  }
}

/**
 * The largest double s with s / width (correctly rounded, as IEEE 754 division is) not above t;
 * -Infinity and +Infinity map to themselves. Rounded division is monotone in s, so the doubles whose
 * quotient exceeds t are exactly those above the result.
 * @example largestSumNotAbove(1.5, 20) // 30, or within a few ulps of it
 */
export function largestSumNotAbove(t: number, width: number): number {
  if (!Number.isFinite(t)) return t;
  let s = t * width;
  while (s / width > t) s = nextDouble(s, -1);
  for (let up = nextDouble(s, 1); up / width <= t; up = nextDouble(s, 1)) s = up;
  return s;
}

/** The neighbouring double of finite x towards +Infinity (direction 1) or -Infinity (-1). */
function nextDouble(x: number, direction: 1 | -1): number {
  if (x === 0) return direction * Number.MIN_VALUE;
  const bits = new DataView(new ArrayBuffer(8));
  bits.setFloat64(0, x);
  const away = (x > 0) === (direction > 0);
  bits.setBigInt64(0, bits.getBigInt64(0) + (away ? 1n : -1n));
  return bits.getFloat64(0);
}
