// Number formats shared by the comparison writers. Fixed decimals keep outputs deterministic.

/** Text for a missing value. */
export const MISSING = 'n/a';

/** A temperature in K to `digits` decimals (default 2); `n/a` for NaN; never `-0.00`. */
export function kelvin(v: number, digits = 2): string {
  if (!Number.isFinite(v)) return MISSING;
  const s = v.toFixed(digits);
  return /^-0(\.0*)?$/.test(s) ? s.slice(1) : s;
}

/** A difference in K with its sign (`+0.12`, `-0.05`, `0.00`); `n/a` for NaN. */
export function signedKelvin(v: number, digits = 2): string {
  const s = kelvin(v, digits);
  return s === MISSING || s.startsWith('-') || Number(s) === 0 ? s : `+${s}`;
}

/**
 * A share (0-1) as a whole percentage (`62 %`); `<1 %` and `>99 %` for shares that are neither none
 * nor all but would round to them; `n/a` for null or NaN.
 *
 * @example percent(0.624) // '62 %'
 * @example percent(0.997) // '>99 %'
 */
export function percent(v: number | null): string {
  if (v === null || !Number.isFinite(v)) return MISSING;
  if (v > 0 && v < 0.005) return '<1 %';
  if (v < 1 && v >= 0.995) return '>99 %';
  return `${Math.round(100 * v)} %`;
}
