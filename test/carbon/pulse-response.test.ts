import { describe, expect, it } from 'vitest';
import { co2PulseResponse, JOOS_2013 } from '../../src/carbon/index.js';
import { calibrate } from '../../src/climate/index.js';
import type { Pathway } from '../../src/pathway.js';
import { expectAllClose } from '../asserts.js';

const params = calibrate();
const forcing = { co2Formula: 'ar6' as const };

function constantBackground(ppm: number, length: number): Pathway {
  const years = Float64Array.from({ length }, (_, i) => 1750 + i);
  return { name: 'flat', years, series: { co2_ppm: new Float64Array(length).fill(ppm) }, metadata: {}, provenance: { source: 'flat', notes: [] } };
}

describe('co2PulseResponse', () => {
  it('without the feedback equals the Joos et al. 2013 response to a year-long pulse, in annual means (analytic)', () => {
    // The pulse is emitted evenly over its calendar year and the response read as annual means: two
    // unit boxes convolved, a unit triangle on [-1, 1], which with exp(-t/tau) gives
    // exp(-t/tau) 2 tau^2 (cosh(1/tau) - 1) for t >= 1; the permanent share stays a0.
    const r = co2PulseResponse(constantBackground(278.3, 301), 1760, params, { forcing, feedback: false });
    const t = r.yearsSincePulse.slice(1);
    const expected = t.map((time) => {
      let f = JOOS_2013.fractions[0];
      for (let i = 1; i < 4; i++) {
        const tau = JOOS_2013.timescalesYr[i];
        f += JOOS_2013.fractions[i] * Math.exp(-time / tau) * 2 * tau * tau * (Math.cosh(1 / tau) - 1);
      }
      return f;
    });
    // Closed-form annual steps: rounding only (1e-7 is ample).
    expectAllClose(r.airborneFraction.slice(1), expected, 1e-7, 'airborne fraction');
  });

  it('a larger pulse is less efficiently absorbed with the feedback (saturating sinks)', () => {
    const small = co2PulseResponse(constantBackground(278.3, 201), 1760, params, { forcing, pulseGtc: 10 });
    const large = co2PulseResponse(constantBackground(278.3, 201), 1760, params, { forcing, pulseGtc: 1000 });
    expect(large.airborneFraction[100]).toBeGreaterThan(small.airborneFraction[100]);
  });

  it('rejects a pulse year outside the pathway', () => {
    expect(() => co2PulseResponse(constantBackground(278.3, 10), 1750, params, { forcing })).toThrow(/pulse year must be/);
    expect(() => co2PulseResponse(constantBackground(278.3, 10), 1760, params, { forcing })).toThrow(/pulse year must be/);
  });
});
