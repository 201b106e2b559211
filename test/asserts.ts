import { expect } from 'vitest';

/**
 * Asserts |actual - expected| <= tolerance. The caller states where the tolerance comes from
 * (a published uncertainty, the rounding of a table, a solver tolerance).
 */
export function expectClose(actual: number, expected: number, tolerance: number, what = ''): void {
  const ok = Number.isFinite(actual) && Math.abs(actual - expected) <= tolerance;
  if (!ok) {
    expect.fail(`${what ? what + ': ' : ''}expected ${expected} +/- ${tolerance}, got ${actual} (off by ${actual - expected})`);
  }
}

/** Asserts every element of two arrays agrees within `tolerance`; reports the worst index. */
export function expectAllClose(
  actual: ArrayLike<number>,
  expected: ArrayLike<number>,
  tolerance: number,
  what = '',
): void {
  expect(actual.length, `${what} length`).toBe(expected.length);
  let worst = -1;
  let worstErr = 0;
  for (let i = 0; i < actual.length; i++) {
    const err = Math.abs(actual[i] - expected[i]);
    if (!(err <= tolerance) && (worst < 0 || !(err <= worstErr))) {
      worst = i;
      worstErr = err;
    }
  }
  if (worst >= 0) {
    expect.fail(`${what ? what + ': ' : ''}index ${worst}: expected ${expected[worst]} +/- ${tolerance}, got ${actual[worst]}`);
  }
}

/** Asserts lo <= actual <= hi (a published range). */
export function expectWithin(actual: number, lo: number, hi: number, what = ''): void {
  if (!(actual >= lo && actual <= hi)) {
    expect.fail(`${what ? what + ': ' : ''}expected within [${lo}, ${hi}], got ${actual}`);
  }
}
