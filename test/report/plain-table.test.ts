import { describe, expect, it } from 'vitest';
import { plainTable } from '../../src/report/plain-table.js';

describe('plainTable', () => {
  it('plainTable pads columns to their widest cell, right-aligning numbers, with a rule under the heading', () => {
    const text = plainTable({ caption: 'T', columns: ['Pathway', 'Peak (K)'], rows: [['swift', '1.52'], ['delayed', '12.00']], numeric: [false, true], notes: ['n'] }, '');
    expect(text).toBe('T\nPathway  Peak (K)\n-------  --------\nswift        1.52\ndelayed     12.00\nn\n');
  });

  it('plainTable keeps every row one line: line breaks in cells become spaces', () => {
    const text = plainTable({ columns: ['a'], rows: [['x\ny']] });
    expect(text.split('\n')).toEqual(['  a', '  ---', '  x y', '']);
  });
});
