/**
 * Sample quantiles by linear interpolation between order statistics: with the n values sorted
 * ascending as x[0..n-1] and h = (n - 1) p, Q(p) = x[floor h] + (h - floor h)(x[floor h + 1] - x[floor h]).
 * This is definition 7 of Hyndman & Fan 1996 ("Sample quantiles in statistical packages", The
 * American Statistician 50, 361), the default of R, NumPy and d3-array.
 *
 * @param sorted values sorted ascending (not checked)
 * @param p probability in [0, 1]
 * @returns the p-quantile; NaN for an empty array
 * @example quantileSorted([1, 2, 3, 4], 0.5) // 2.5
 */
export function quantileSorted(sorted: ArrayLike<number>, p: number): number {
  const n = sorted.length;
  if (n === 0) return NaN;
  if (p <= 0 || n === 1) return sorted[0];
  if (p >= 1) return sorted[n - 1];
  const h = (n - 1) * p;
  const lo = Math.floor(h);
  const x0 = sorted[lo];
  return x0 + (sorted[lo + 1] - x0) * (h - lo);
}

/**
 * Several sample quantiles (Hyndman & Fan 1996, definition 7, as {@link quantileSorted}) of
 * `values[from..to)` without a full sort (see {@link QuantileSelector}).
 *
 * @param values the sample (only read: the name is older than the selector that made copying unneeded)
 * @param probabilities ascending probabilities in [0, 1]
 * @param out receives one quantile per probability
 * @param from first index of the sample (default 0)
 * @param to end of the sample, exclusive (default values.length)
 * @example
 * const out = new Float64Array(2);
 * quantilesInPlace(Float64Array.of(4, 1, 3, 2), [0.5, 1], out); // out = [2.5, 4]
 */
export function quantilesInPlace(
  values: Float64Array,
  probabilities: readonly number[],
  out: Float64Array,
  from = 0,
  to = values.length,
): void {
  new QuantileSelector(probabilities, to - from).quantilesInto(values, from, out);
}

/** Samples smaller than this go straight to SELECT. */
const BUCKET_SELECT_MIN = 1024;
/** Buckets of the counting pass (at most; at least two values per bucket on average). */
const MAX_BUCKETS = 2048;

/**
 * The same quantiles of many samples of one size, with all scratch memory allocated once (an
 * ensemble asks for five percentiles of every year's members). The order statistics each quantile
 * needs are found by bucket selection: one pass for the range, one pass counting values into
 * equal-width buckets (the bucket index is a monotone function of the value, so the counts locate
 * every wanted rank in one bucket), one pass copying out the few buckets that hold wanted ranks,
 * and exact selection within those (Floyd & Rivest's SELECT, 1975, Communications of the ACM 18,
 * 173, Algorithm 489). The results equal those of sorting, bit for bit: an order statistic does not
 * depend on how it was found. The sample is only read, except that small samples, and samples whose
 * range is not finite, are copied and go straight to SELECT.
 *
 * @example
 * const selector = new QuantileSelector([0.05, 0.5, 0.95], 10_000);
 * selector.quantilesInto(warming, k * 10_000, out); // out[0..2]: the quantiles of warming[k * 10000 ..]
 */
export class QuantileSelector {
  /** Distinct order statistics (0-based ranks) the quantiles read, ascending. */
  private readonly ranks: Int32Array;
  /** Per probability: index in `ranks` of its lower order statistic, and of its upper one (or -1). */
  private readonly lower: Int32Array;
  private readonly upper: Int32Array;
  /** Per probability: h - floor(h). */
  private readonly fraction: Float64Array;
  private readonly orderStatistics: Float64Array;
  private readonly buckets: number;
  private readonly counts: Int32Array;
  /** wanted[b]: slot of bucket b in the candidate buffer, or -1. */
  private readonly wanted: Int32Array;
  private readonly rankBucket: Int32Array;
  private readonly rankBase: Int32Array;
  private readonly slotStart: Int32Array;
  private readonly slotFill: Int32Array;
  private readonly candidates: Float64Array;

  /**
   * @param probabilities ascending probabilities in [0, 1]
   * @param n size of every sample
   */
  constructor(
    private readonly probabilities: readonly number[],
    private readonly n: number,
  ) {
    const ranks: number[] = [];
    const lower: number[] = [];
    const upper: number[] = [];
    const fraction: number[] = [];
    for (const q of probabilities) {
      const p = Math.min(1, Math.max(0, q));
      const h = (n - 1) * p;
      const lo = Math.floor(h);
      if (ranks[ranks.length - 1] !== lo) ranks.push(lo);
      lower.push(ranks.length - 1);
      if (lo + 1 < n && h > lo) {
        if (ranks[ranks.length - 1] !== lo + 1) ranks.push(lo + 1);
        upper.push(ranks.length - 1);
      } else upper.push(-1);
      fraction.push(h - lo);
    }
    this.ranks = Int32Array.from(ranks);
    this.lower = Int32Array.from(lower);
    this.upper = Int32Array.from(upper);
    this.fraction = Float64Array.from(fraction);
    this.orderStatistics = new Float64Array(ranks.length);
    this.buckets = n >= BUCKET_SELECT_MIN ? Math.min(MAX_BUCKETS, n >> 1) : 0;
    this.counts = new Int32Array(this.buckets);
    this.wanted = new Int32Array(this.buckets).fill(-1);
    this.rankBucket = new Int32Array(ranks.length);
    this.rankBase = new Int32Array(ranks.length);
    this.slotStart = new Int32Array(ranks.length);
    this.slotFill = new Int32Array(ranks.length);
    this.candidates = new Float64Array(Math.max(1, n));
  }

  /**
   * The quantiles of values[from .. from + n), into out[0 .. probabilities.length); NaN when n is 0.
   * `values` is not changed.
   *
   * @param rangeLow with `rangeHigh`, an expected range of the bulk of the values (for example from
   *   a similar sample): the buckets then span it, values outside it fall into the end buckets, and
   *   the pass that finds the sample's own range is skipped. The result is the same with or without
   *   it (bucketing stays monotone); a poor guess only makes the final selections longer.
   * @param rangeHigh upper end of the expected range
   */
  quantilesInto(values: Float64Array, from: number, out: Float64Array, rangeLow?: number, rangeHigh?: number): void {
    const { n, ranks, orderStatistics } = this;
    if (n <= 0) {
      out.fill(NaN, 0, this.probabilities.length);
      return;
    }
    if (!(this.buckets > 0 && this.bucketSelect(values, from, rangeLow, rangeHigh))) {
      const copy = this.candidates;
      copy.set(values.subarray(from, from + n));
      selectRanks(copy, ranks, 0, ranks.length - 1, 0, n - 1, 0);
      for (let r = 0; r < ranks.length; r++) orderStatistics[r] = copy[ranks[r]];
    }
    for (let i = 0; i < this.probabilities.length; i++) {
      const x0 = orderStatistics[this.lower[i]];
      const hi = this.upper[i];
      out[i] = hi >= 0 ? x0 + (orderStatistics[hi] - x0) * this.fraction[i] : x0;
    }
  }

  /**
   * Runs a few small samples through every path of quantilesInto (buckets with and without a range
   * guide, values outside the guide, a sample without spread), so that the compiler optimises it
   * with all its type feedback before a long series of samples, rather than optimising early and
   * starting over at each path it had not seen. The results are thrown away.
   */
  static prime(): void {
    const n = 2 * BUCKET_SELECT_MIN;
    const selector = new QuantileSelector([0.05, 0.5, 0.95], n);
    const sample = Float64Array.from({ length: n }, (_, i) => ((i * 7919) % n) / n);
    const out = new Float64Array(3);
    for (let i = 0; i < 3; i++) {
      selector.quantilesInto(sample, 0, out);
      selector.quantilesInto(sample, 0, out, 0.2, 0.6);
      selector.quantilesInto(new Float64Array(n), 0, out);
    }
  }

  /**
   * Finds the wanted order statistics of values[from .. from + n) by bucketing into
   * `orderStatistics`. Returns false, having found nothing, when the range is not finite and positive.
   */
  private bucketSelect(values: Float64Array, from: number, rangeLow?: number, rangeHigh?: number): boolean {
    const { n, ranks, counts, wanted, rankBucket, rankBase, slotStart, slotFill, candidates } = this;
    const to = from + n;
    let min = rangeLow ?? NaN;
    let max = rangeHigh ?? NaN;
    if (!(max > min && max - min < Infinity)) {
      min = Infinity;
      max = -Infinity;
      for (let i = from; i < to; i++) {
        const v = values[i];
        if (v < min) min = v;
        if (v > max) max = v;
      }
      if (!(max > min && max - min < Infinity)) return false;
    }
    const buckets = this.buckets;
    const scale = buckets / (max - min);
    const last = buckets - 1;
    counts.fill(0);
    // Monotone in v: subtracting, scaling by a positive number, clamping to [0, last] and truncating
    // never reorder values (the clamp comes first, so values far outside a guessed range cannot
    // overflow the integer conversion).
    for (let i = from; i < to; i++) {
      const x = (values[i] - min) * scale;
      counts[x >= last ? last : x > 0 ? x | 0 : 0]++;
    }
    // The bucket of each wanted rank (ranks ascend, so one walk finds them all), and its slot.
    let below = 0;
    let b = 0;
    let slots = 0;
    let size = 0;
    for (let r = 0; r < ranks.length; ) {
      if (ranks[r] < below + counts[b]) {
        rankBucket[r] = b;
        rankBase[r] = below;
        if (wanted[b] < 0) {
          wanted[b] = slots;
          slotStart[slots] = size;
          slotFill[slots] = size;
          size += counts[b];
          slots++;
        }
        r++;
      } else {
        below += counts[b];
        b++;
      }
    }
    for (let i = from; i < to; i++) {
      const v = values[i];
      const x = (v - min) * scale;
      const slot = wanted[x >= last ? last : x > 0 ? x | 0 : 0];
      if (slot >= 0) candidates[slotFill[slot]++] = v;
    }
    for (let r = 0; r < ranks.length; r++) {
      const bucket = rankBucket[r];
      const start = slotStart[wanted[bucket]];
      const k = start + (ranks[r] - rankBase[r]);
      selectInPlace(candidates, k, start, start + counts[bucket] - 1);
      this.orderStatistics[r] = candidates[k];
    }
    for (let r = 0; r < ranks.length; r++) wanted[rankBucket[r]] = -1;
    return true;
  }
}

/** Places each order statistic ranks[rFrom..rTo] (offset by `base`) within a[left..right]. */
function selectRanks(a: Float64Array, ranks: ArrayLike<number>, rFrom: number, rTo: number, left: number, right: number, base: number): void {
  if (rFrom > rTo) return;
  // Middle rank first, so each side is searched only within its own part of the array.
  const mid = (rFrom + rTo) >> 1;
  const k = base + ranks[mid];
  selectInPlace(a, k, left, right);
  selectRanks(a, ranks, rFrom, mid - 1, left, k - 1, base);
  selectRanks(a, ranks, mid + 1, rTo, k + 1, right, base);
}

/**
 * Rearranges a[left..right] so that a[k] holds the value it would have if sorted, with smaller or
 * equal values before it and larger or equal after (Floyd & Rivest 1975, Algorithm 489, in the
 * formulation of Kiwiel 2005, "On Floyd and Rivest's SELECT algorithm", TCS 347, 214).
 */
function selectInPlace(a: Float64Array, k: number, left: number, right: number): void {
  while (right > left) {
    if (k === left || k === right) {
      // Minimum or maximum: one scan is cheaper than partitioning.
      let best = k;
      for (let i = left; i <= right; i++) if (k === left ? a[i] < a[best] : a[i] > a[best]) best = i;
      swap(a, k, best);
      return;
    }
    if (right - left > 600) {
      // Recurse on a sample around k so that the pivot lands close to rank k.
      const n = right - left + 1;
      const m = k - left + 1;
      const z = Math.log(n);
      const s = 0.5 * Math.exp((2 * z) / 3);
      const sd = 0.5 * Math.sqrt((z * s * (n - s)) / n) * (m - n / 2 < 0 ? -1 : 1);
      const newLeft = Math.max(left, Math.floor(k - (m * s) / n + sd));
      const newRight = Math.min(right, Math.floor(k + ((n - m) * s) / n + sd));
      selectInPlace(a, k, newLeft, newRight);
    }
    const t = a[k];
    let i = left;
    let j = right;
    swap(a, left, k);
    if (a[right] > t) swap(a, left, right);
    while (i < j) {
      swap(a, i, j);
      i++;
      j--;
      while (a[i] < t) i++;
      while (a[j] > t) j--;
    }
    if (a[left] === t) swap(a, left, j);
    else {
      j++;
      swap(a, j, right);
    }
    if (j <= k) left = j + 1;
    if (k <= j) right = j - 1;
  }
}

function swap(a: Float64Array, i: number, j: number): void {
  const t = a[i];
  a[i] = a[j];
  a[j] = t;
}
