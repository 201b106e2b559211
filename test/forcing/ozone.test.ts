import { describe, expect, it } from 'vitest';
import { ozoneErfChangeWm2 } from '../../src/forcing/ozone.js';
import { expectClose } from '../asserts.js';

const none = { ch4Ppb: 0, n2oPpb: 0, eescPpt: 0, coMt: 0, nmvocMt: 0, noxMt: 0 };

describe('ozone ERF (AR6 linear form, Thornhill et al. 2021 coefficients; from memory)', () => {
  it('each precursor adds its own coefficient: NOx 1.797e-3, CO 1.55e-4, NMVOC 3.29e-4 W m-2 per Mt yr-1; CH4 1.75e-4 per ppb', () => {
    expectClose(ozoneErfChangeWm2({ ...none, noxMt: 1 }), 1.797e-3, 1e-15);
    expectClose(ozoneErfChangeWm2({ ...none, coMt: 1 }), 1.55e-4, 1e-15);
    expectClose(ozoneErfChangeWm2({ ...none, nmvocMt: 1 }), 3.29e-4, 1e-15);
    expectClose(ozoneErfChangeWm2({ ...none, ch4Ppb: 1 }), 1.75e-4, 1e-15);
  });

  it('more stratospheric chlorine means less ozone (negative EESC term)', () => {
    expect(ozoneErfChangeWm2({ ...none, eescPpt: 100 })).toBeLessThan(0);
  });
});
