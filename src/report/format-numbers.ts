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
