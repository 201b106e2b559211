import { describe, expect, it } from 'vitest';
import { calibratedMemberSource, calibratedSetFromJson, calibratedSetInOrder, priorMemberSource, representativeParams } from '../../src/ensemble/calibrated-set.js';
import { readCalibratedSet } from '../../src/io/read-calibrated-set.js';
import { ConfigError } from '../../src/errors.js';
import { TWO_BOX_KEYS } from '../../src/ensemble/member-parameters.js';

const set = readCalibratedSet();

describe('calibratedMemberSource', () => {
  it('gives the same members for the same seed, the same members in a slice as in the whole, others for another seed', () => {
    const source = calibratedMemberSource(set);
    const whole = source.draw(7, 0, 500).parameters;
    const again = source.draw(7, 0, 500).parameters;
    const slice = source.draw(7, 200, 500).parameters;
    const other = source.draw(8, 0, 500).parameters;
    for (const key of Object.keys(set.members)) {
      expect(Array.from(again.values[key]!)).toEqual(Array.from(whole.values[key]!));
      expect(Array.from(slice.values[key]!)).toEqual(Array.from(whole.values[key]!.subarray(200)));
    }
    expect(Array.from(other.values.feedback_wm2k)).not.toEqual(Array.from(whole.values.feedback_wm2k));
  });

  it('draws every member whole from the set (all keys of one set member together)', () => {
    const { parameters } = calibratedMemberSource(set).draw(3, 0, 50);
    for (let r = 0; r < 50; r++) {
      const j = set.members.feedback_wm2k.indexOf(parameters.values.feedback_wm2k[r]);
      expect(j).toBeGreaterThanOrEqual(0);
      const matches = Array.from({ length: set.count }, (_, k) => k).filter((k) => Object.keys(set.members).every((key) => set.members[key]![k] === parameters.values[key]![r]));
      expect(matches.length).toBeGreaterThan(0);
    }
  });
});

describe('calibratedSetInOrder', () => {
  it('gives set member i as member i, the same for every seed, and refuses to go past the set', () => {
    const source = calibratedSetInOrder(set);
    const all = source.draw(1, 0, set.count).parameters;
    const other = source.draw(99, 0, set.count).parameters;
    expect(all.count).toBe(set.count);
    for (const key of Object.keys(set.members)) {
      expect(Array.from(all.values[key]!)).toEqual(Array.from(set.members[key]!));
      expect(Array.from(other.values[key]!)).toEqual(Array.from(set.members[key]!));
    }
    expect(Array.from(source.draw(1, 10, 20).parameters.values.feedback_wm2k)).toEqual(Array.from(set.members.feedback_wm2k.subarray(10, 20)));
    expect(() => source.draw(1, 0, set.count + 1)).toThrow(ConfigError);
  });
});

describe('priorMemberSource', () => {
  it('spreads wider than the calibrated set: the feedback 5-95 % range is wider for the prior (the record narrows it)', () => {
    const spread = (v: Float64Array) => {
      const s = Float64Array.from(v).sort();
      return s[Math.floor(0.95 * s.length)] - s[Math.floor(0.05 * s.length)];
    };
    const prior = priorMemberSource(set).draw(7, 0, 4000).parameters.values.feedback_wm2k;
    const posterior = calibratedMemberSource(set).draw(7, 0, 4000).parameters.values.feedback_wm2k;
    expect(spread(prior)).toBeGreaterThan(spread(posterior));
  });
});

describe('representativeParams', () => {
  it('takes the posterior medians of the two-box parameters', () => {
    const { targets } = representativeParams(set);
    expect(targets.feedbackWm2K).toBe(set.representative.feedback_wm2k);
    expect(targets.deepEfficacy).toBe(set.representative.deep_efficacy);
  });
});

describe('calibratedSetFromJson', () => {
  it('refuses a set without a two-box parameter, naming the file and the key', () => {
    const members = Object.fromEntries(TWO_BOX_KEYS.filter((k) => k !== 'deep_efficacy').map((k) => [k, [1]]));
    expect(() => calibratedSetFromJson({ format: 'warmcast calibrated member set, version 1', members }, 'x.json', '')).toThrow(/x\.json: members\.deep_efficacy is missing/);
    expect(() => calibratedSetFromJson({ format: 'other' }, 'x.json', '')).toThrow(ConfigError);
  });
});
