// Type declarations for damerau-levenshtein 1.0.8, which ships none (its index.js is the whole package).
declare module 'damerau-levenshtein' {
  /** Result of one comparison. */
  interface DamerauLevenshteinResult {
    /** Edit distance: insertions, deletions, substitutions and swaps of adjacent characters (optimal string alignment). */
    steps: number;
    /** steps / the longer string's length (0 for two empty strings). */
    relative: number;
    /** 1 - relative. */
    similarity: number;
  }
  /** Compares two strings by UTF-16 code units; `limit` sizes its matrix (default the longer length). */
  function damerauLevenshtein(a: string, b: string, limit?: number): DamerauLevenshteinResult;
  export = damerauLevenshtein;
}
