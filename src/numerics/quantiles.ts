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
 * Several sample quantiles (definition 7, as {@link quantileSorted} and d3-array's `quantile`) of
 * `values`, found without a full sort: the order statistic floor(h) each quantile needs is placed
 * by quickselect ({@link selectInPlace}), the middle one first so that each further selection
 * searches only the part between two already placed; the next order statistic, floor(h) + 1, is
 * then the smallest value between floor(h) and the next placed one. `values` is reordered.
 *
 * @param values the sample (reordered in place; no NaN)
 * @param probabilities ascending probabilities in [0, 1]
 * @param out receives one quantile per probability (NaN for an empty sample)
 * @example
 * const out = new Float64Array(2);
 * quantilesInPlace(Float64Array.of(4, 1, 3, 2), [0.5, 1], out); // out = [2.5, 4]
 */
export function quantilesInPlace(values: Float64Array, probabilities: readonly number[], out: Float64Array): void {
  const n = values.length;
  if (n === 0) {
    out.fill(NaN, 0, probabilities.length);
    return;
  }
  const positions = probabilities.map((p) => (n - 1) * Math.min(1, Math.max(0, p)));
  const ranks = [...new Set(positions.map(Math.floor))].sort((a, b) => a - b);
  placeRanks(values, ranks, 0, ranks.length - 1, 0, n - 1);
  positions.forEach((h, j) => {
    const lo = Math.floor(h);
    const x0 = values[lo];
    if (h === lo) {
      out[j] = x0;
      return;
    }
    // Everything from lo + 1 up to the next placed rank lies between the two placed values.
    const next = ranks.find((r) => r > lo) ?? n - 1;
    let x1 = values[lo + 1];
    for (let i = lo + 2; i <= next; i++) if (values[i] < x1) x1 = values[i];
    out[j] = x0 + (x1 - x0) * (h - lo);
  });
}

/** Places the order statistics ranks[from..to] (ascending) within values[left..right]. */
function placeRanks(values: Float64Array, ranks: number[], from: number, to: number, left: number, right: number): void {
  if (from > to) return;
  const mid = (from + to) >> 1;
  const k = ranks[mid];
  selectInPlace(values, k, left, right);
  placeRanks(values, ranks, from, mid - 1, left, k - 1);
  placeRanks(values, ranks, mid + 1, to, k + 1, right);
}

/**
 * Rearranges a[left..right] so that a[k] holds the value it would have if that part were sorted,
 * with no larger value before it and no smaller one after: Floyd & Rivest's SELECT (1975, CACM 18,
 * 173, Algorithm 489) as d3-array's `quickselect` codes it, on a Float64Array with `<` in place of
 * d3's comparator (which handles NaN and undefined, and costs about seven times as much here).
 *
 * @param a values (no NaN), reordered
 * @param k the rank to place, left <= k <= right
 * @example selectInPlace(Float64Array.of(3, 1, 2), 1, 0, 2) // a[1] === 2
 */
export function selectInPlace(a: Float64Array, k: number, left: number, right: number): void {
  while (right > left) {
    if (right - left > 600) {
      // Select within a sample around k first, so that the pivot lands close to rank k.
      const n = right - left + 1;
      const m = k - left + 1;
      const z = Math.log(n);
      const s = 0.5 * Math.exp((2 * z) / 3);
      const sd = 0.5 * Math.sqrt((z * s * (n - s)) / n) * (m - n / 2 < 0 ? -1 : 1);
      selectInPlace(a, k, Math.max(left, Math.floor(k - (m * s) / n + sd)), Math.min(right, Math.floor(k + ((n - m) * s) / n + sd)));
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
