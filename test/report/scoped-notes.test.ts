import { describe, expect, it } from 'vitest';
import { scopedNotes } from '../../src/report/scoped-notes.js';

describe('scopedNotes', () => {
  it('scopedNotes says a note every pathway shares once, names the pathways of a note some share, and keeps first-appearance order', () => {
    const lines = scopedNotes(
      [
        { pathway: 'a', text: 'spliced' },
        { pathway: 'a', text: 'CH4 held' },
        { pathway: 'b', text: 'spliced' },
        { pathway: 'c', text: 'spliced' },
        { pathway: 'c', text: 'CH4 held' },
        { pathway: 'a', ensemble: true, text: '9 redrawn' },
        { pathway: 'b', ensemble: true, text: '9 redrawn' },
        { pathway: 'c', ensemble: true, text: '9 redrawn' },
        { pathway: 'b', ensemble: true, text: '4 redrawn' },
        { pathway: 'a', ensemble: true, text: 'spliced' },
        { pathway: 'c', ensemble: true, text: 'spliced' },
      ],
      ['a', 'b', 'c'],
    );
    expect(lines).toEqual(['all pathways: spliced', 'a, c: CH4 held', 'all ensembles: 9 redrawn', 'b ensemble: 4 redrawn', 'ensembles of a, c: spliced']);
  });

  it('scopedNotes names the pathway when there is only one', () => {
    expect(scopedNotes([{ pathway: 'a', text: 'x' }], ['a'])).toEqual(['a: x']);
  });
});
