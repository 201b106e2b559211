/**
 * Escapes text for XML and HTML element content and double- or single-quoted attribute values:
 * `&`, `<`, `>`, `"` and `'` become entities, and characters XML 1.0 forbids (C0 controls other
 * than tab, LF, CR; lone surrogates; U+FFFE, U+FFFF) are dropped so the document stays well formed.
 *
 * @example
 * escapeMarkup('A & B <"1.5 K">') // 'A &amp; B &lt;&quot;1.5 K&quot;&gt;'
 */
export function escapeMarkup(text: string): string {
  return text
    .replace(/[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g, '')
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&#39;');
}
