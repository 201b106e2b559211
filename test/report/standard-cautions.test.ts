import { describe, expect, it } from 'vitest';
import { standardCautions } from '../../src/report/standard-cautions.js';

describe('standardCautions', () => {
  it('standardCautions says what the estimate is, what uncertainty is shown, and to defer to the IPCC and local guidance', () => {
    const [what, uncertainty, defer] = standardCautions();
    expect(what).toMatch(/reduced-complexity, global-mean estimates/);
    expect(uncertainty).toMatch(/No uncertainty range is shown/);
    expect(defer).toMatch(/IPCC.*own jurisdiction/);
    expect(standardCautions('shown: 5-95 %')).toEqual([what, 'shown: 5-95 %', defer]);
  });
});
