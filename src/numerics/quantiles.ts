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
 * `values[from..to)` without a full sort. The order statistics each quantile needs are found by
 * bucket selection: one pass for the range, one pass counting values into equal-width buckets
 * (the bucket index is a monotone function of the value, so the counts locate every wanted rank in
 * one bucket), one pass copying out the few buckets that hold wanted ranks, and exact selection
 * within those (Floyd & Rivest's SELECT, 1975, Communications of the ACM 18, 173, Algorithm 489).
 * The results equal those of sorting, bit for bit: an order statistic does not depend on how it was
 * found. Small samples, and samples whose range is not finite, go straight to SELECT.
 *
 * @param values the sample; may be reordered within [from, to)
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
  const n = to - from;
  if (n <= 0) {
    out.fill(NaN, 0, probabilities.length);
    return;
  }
  // The ranks (relative to `from`) that definition 7 reads, ascending and distinct.
  const ranks: number[] = [];
  for (const p of probabilities) {
    const h = (n - 1) * Math.min(1, Math.max(0, p));
    const lo = Math.floor(h);
    if (ranks[ranks.length - 1] !== lo) ranks.push(lo);
    if (lo + 1 < n && h > lo && ranks[ranks.length - 1] !== lo + 1) ranks.push(lo + 1);
  }
  const orderStatistics = new Map<number, number>();
  if (n < BUCKET_SELECT_MIN || !bucketSelect(values, from, to, ranks, orderStatistics)) {
    selectRanks(values, ranks, 0, ranks.length - 1, from, to - 1, from);
    for (const r of ranks) orderStatistics.set(r, values[from + r]);
  }
  for (let i = 0; i < probabilities.length; i++) {
    const p = Math.min(1, Math.max(0, probabilities[i]));
    const h = (n - 1) * p;
    const lo = Math.floor(h);
    const x0 = orderStatistics.get(lo)!;
    out[i] = h > lo && lo + 1 < n ? x0 + (orderStatistics.get(lo + 1)! - x0) * (h - lo) : x0;
  }
}

/** Samples smaller than this go straight to SELECT. */
const BUCKET_SELECT_MIN = 1024;

/**
 * Finds the order statistics `ranks` of values[from..to) by bucketing (see quantilesInPlace) into
 * `found`. Returns false, having changed nothing, when the range is not finite and positive.
 */
function bucketSelect(values: Float64Array, from: number, to: number, ranks: number[], found: Map<number, number>): boolean {
  let min = Infinity;
  let max = -Infinity;
  for (let i = from; i < to; i++) {
    const v = values[i];
    if (v < min) min = v;
    if (v > max) max = v;
  }
  if (!(max > min && max - min < Infinity)) return false;
  const n = to - from;
  const buckets = Math.min(4096, n >> 1);
  const scale = buckets / (max - min);
  const counts = new Int32Array(buckets + 1);
  // Monotone in v: subtracting, scaling by a positive number and flooring never reorder values.
  // (v - min) * scale is >= 0, so truncation (`| 0`) is the floor; only v = max can reach `buckets`.
  const last = buckets - 1;
  for (let i = from; i < to; i++) {
    const b = ((values[i] - min) * scale) | 0;
    counts[(b > last ? last : b) + 1]++;
  }
  for (let b = 1; b <= buckets; b++) counts[b] += counts[b - 1]; // counts[b]: values in buckets below b
  // The bucket of each wanted rank, and where its values go in the candidate buffer.
  const wanted = new Int32Array(buckets).fill(-1);
  const starts: number[] = [];
  let size = 0;
  const bucketOf = ranks.map((r) => {
    let lo = 0;
    let hi = buckets - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (counts[mid] <= r) lo = mid;
      else hi = mid - 1;
    }
    if (wanted[lo] < 0) {
      wanted[lo] = starts.length;
      starts.push(size);
      size += counts[lo + 1] - counts[lo];
    }
    return lo;
  });
  const candidates = new Float64Array(size);
  const fill = starts.slice();
  for (let i = from; i < to; i++) {
    const v = values[i];
    const b = ((v - min) * scale) | 0;
    const slot = wanted[b > last ? last : b];
    if (slot >= 0) candidates[fill[slot]++] = v;
  }
  ranks.forEach((r, j) => {
    const b = bucketOf[j];
    const start = starts[wanted[b]];
    const k = start + (r - counts[b]);
    selectInPlace(candidates, k, start, start + counts[b + 1] - counts[b] - 1);
    found.set(r, candidates[k]);
  });
  return true;
}

/** Places each order statistic ranks[rFrom..rTo] (offset by `base`) within a[left..right]. */
function selectRanks(a: Float64Array, ranks: number[], rFrom: number, rTo: number, left: number, right: number, base: number): void {
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
