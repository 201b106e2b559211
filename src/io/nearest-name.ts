/**
 * Edit distance between two strings: the fewest single-character insertions, deletions,
 * substitutions or swaps of two adjacent characters that turn `a` into `b` (the "optimal string
 * alignment" variant of the Damerau-Levenshtein distance; a swap counts 1 so `n2o_pbb` is 1 away
 * from `n2o_ppb`). Compares UTF-16 code units.
 *
 * @example
 * editDistance('kitten', 'sitting') // 3
 * editDistance('co2ppm', 'co2_ppm') // 1
 */
export function editDistance(a: string, b: string): number {
  const n = a.length;
  const m = b.length;
  // Three rolling rows of the (n+1) x (m+1) dynamic-programming table: two back (for swaps), one back, current.
  let twoBack = new Array<number>(m + 1).fill(0);
  let oneBack = Array.from({ length: m + 1 }, (_, j) => j);
  let current = new Array<number>(m + 1).fill(0);
  for (let i = 1; i <= n; i++) {
    current[0] = i;
    for (let j = 1; j <= m; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let d = Math.min(oneBack[j] + 1, current[j - 1] + 1, oneBack[j - 1] + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) d = Math.min(d, twoBack[j - 2] + 1);
      current[j] = d;
    }
    [twoBack, oneBack, current] = [oneBack, current, twoBack];
  }
  return oneBack[m];
}

/**
 * The candidate most like `word`, or undefined when none is close enough to be a plausible typo.
 * Both sides are compared case-insensitively with everything but letters and digits removed (so
 * `CO2 (ppm)` matches `co2_ppm`); a candidate qualifies when that distance is at most a third of
 * its length (at least 1). Ties go to the smaller distance on the plain lower-cased strings, then to
 * the earlier candidate.
 *
 * @example
 * nearestName('co2ppm', ['co2_ppm', 'ch4_ppb']) // 'co2_ppm'
 * nearestName('temperature', ['co2_ppm', 'ch4_ppb']) // undefined
 */
export function nearestName(word: string, candidates: readonly string[]): string | undefined {
  const squash = (s: string) => s.toLowerCase().replace(/[^a-z0-9]/g, '');
  const target = squash(word);
  let best: string | undefined;
  let bestScore = Infinity;
  let bestTie = Infinity;
  for (const candidate of candidates) {
    const squashed = squash(candidate);
    const score = editDistance(target, squashed);
    if (score > Math.max(1, Math.floor(squashed.length / 3))) continue;
    const tie = editDistance(word.toLowerCase(), candidate.toLowerCase());
    if (score < bestScore || (score === bestScore && tie < bestTie)) {
      best = candidate;
      bestScore = score;
      bestTie = tie;
    }
  }
  return best;
}
