import { describe, expect, it } from 'vitest';
import { co2ImpulseResponse, integratedImpulseResponse, integratedImpulseResponseSlope, JOOS_2013 } from '../../src/carbon/index.js';
import { expectClose } from '../asserts.js';

describe('Joos et al. 2013 impulse response', () => {
  it('the four shares sum to 1 (Joos et al. 2013, Table 5: a0 = 1 - a1 - a2 - a3)', () => {
    expectClose(JOOS_2013.fractions.reduce((a, b) => a + b, 0), 1, 1e-12);
  });

  it('co2ImpulseResponse(0) is 1 and it decreases towards a0 = 0.2173', () => {
    expectClose(co2ImpulseResponse(0), 1, 1e-12);
    let previous = 1;
    for (let t = 1; t <= 5000; t += 7) {
      const f = co2ImpulseResponse(t);
      expect(f).toBeLessThan(previous);
      previous = f;
    }
    expectClose(co2ImpulseResponse(1e7), 0.2173, 1e-9);
  });

  it('integratedImpulseResponse(1, 20) and (1, 100) are 14.2 and 52.4 yr (AR5 WG1 Table 8.SM.11; secondary source)', () => {
    // Published to one decimal: +/-0.05.
    expectClose(integratedImpulseResponse(1, 20), 14.2, 0.05);
    expectClose(integratedImpulseResponse(1, 100), 52.4, 0.05);
  });

  it('integratedImpulseResponse is the time integral of co2ImpulseResponse (Simpson rule, analytic check)', () => {
    for (const alpha of [0.12, 1, 3.5]) {
      const h = 100;
      const steps = 20000;
      let sum = co2ImpulseResponse(0, alpha) + co2ImpulseResponse(h, alpha);
      for (let i = 1; i < steps; i++) sum += (i % 2 ? 4 : 2) * co2ImpulseResponse((i * h) / steps, alpha);
      expectClose(integratedImpulseResponse(alpha, h), (sum * h) / steps / 3, 1e-8);
    }
  });

  it('integratedImpulseResponseSlope is the derivative in alpha (central difference)', () => {
    for (const alpha of [0.05, 0.12, 1, 10]) {
      const d = 1e-6 * alpha;
      const numeric = (integratedImpulseResponse(alpha + d) - integratedImpulseResponse(alpha - d)) / (2 * d);
      expectClose(integratedImpulseResponseSlope(alpha), numeric, 1e-6 * Math.max(1, Math.abs(numeric)));
    }
  });
});
