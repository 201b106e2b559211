import { describe, expect, it } from 'vitest';
import { kelvin, percent, signedKelvin } from '../../src/report/format-numbers.js';

describe('kelvin and signedKelvin', () => {
  it('kelvin prints fixed decimals, n/a for NaN, and never a negative zero', () => {
    expect([kelvin(1.23456), kelvin(1.5, 1), kelvin(NaN), kelvin(-0.001), kelvin(-0.006)]).toEqual(['1.23', '1.5', 'n/a', '0.00', '-0.01']);
  });

  it('signedKelvin marks positive differences with +, leaves zero and negatives as they print', () => {
    expect([signedKelvin(0.123), signedKelvin(-0.05), signedKelvin(0.001), signedKelvin(-0.001), signedKelvin(NaN)]).toEqual(['+0.12', '-0.05', '0.00', '0.00', 'n/a']);
  });
});

describe('percent', () => {
  it('percent rounds to whole percent, keeps shares that are neither none nor all off 0 % and 100 %, and says n/a for null', () => {
    expect([0, 0.004, 0.005, 0.624, 0.994, 0.995, 1, null, NaN].map(percent)).toEqual(['0 %', '<1 %', '1 %', '62 %', '99 %', '>99 %', '100 %', 'n/a', 'n/a']);
  });
});
