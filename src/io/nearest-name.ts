import damerauLevenshtein from 'damerau-levenshtein';

/**
 * Edit distance between two strings: the fewest single-character insertions, deletions,
 * substitutions or swaps of two adjacent characters that turn `a` into `b` (the "optimal string
 * alignment" variant of the Damerau-Levenshtein distance, as the `damerau-levenshtein` package
 * computes it; a swap counts 1 so `n2o_pbb` is 1 away from `n2o_ppb` and `swfit` 1 from `swift`).
 * Compares UTF-16 code units.
 *
 * @example
 * editDistance('kitten', 'sitting') // 3
 * editDistance('co2ppm', 'co2_ppm') // 1
 */
export function editDistance(a: string, b: string): number {
  return damerauLevenshtein(a, b).steps;
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
