import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { escapeMarkup } from '../../src/report/escape-markup.js';
import { xmlProblems } from './xml-well-formed.js';

describe('escapeMarkup', () => {
  it('escapeMarkup turns the five XML special characters into entities (XML 1.0 section 2.4)', () => {
    expect(escapeMarkup(`a & b < c > d " e ' f`)).toBe('a &amp; b &lt; c &gt; d &quot; e &#39; f');
  });

  it('escapeMarkup output is well-formed XML as text and as an attribute value, for any string (property)', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary' }), (s) => {
        const e = escapeMarkup(s);
        expect(xmlProblems(`<t a="${e}" b='${e}'>${e}</t>`)).toEqual([]);
      }),
    );
  });

  it('escapeMarkup drops characters XML 1.0 forbids (C0 controls, lone surrogates) and keeps tab, LF, CR and astral characters', () => {
    expect(escapeMarkup('a\u0000b\u0007c\td\ne\rf\uD800g\uDC00h😀')).toBe('abc\td\ne\rfgh😀');
  });
});

describe('xmlProblems (the test helper itself)', () => {
  it('xmlProblems finds unbalanced tags, bare ampersands, unquoted and repeated attributes, and several roots', () => {
    expect(xmlProblems('<a><b></a></b>').length).toBeGreaterThan(0);
    expect(xmlProblems('<a>x & y</a>')).toEqual([expect.stringContaining('bare &')]);
    expect(xmlProblems('<a x=1/>').length).toBeGreaterThan(0);
    expect(xmlProblems('<a x="1" x="2"/>')).toEqual([expect.stringContaining('repeated')]);
    expect(xmlProblems('<a/><b/>')).toEqual(['2 root elements']);
    expect(xmlProblems('<a x="&lt;&#39;&#x41;"><!-- c --><b/>t</a>')).toEqual([]);
  });
});
