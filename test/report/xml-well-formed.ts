/**
 * A small strict check of XML 1.0 well-formedness (W3C XML 1.0, 5th ed., section 2), enough for the
 * SVG warmcast writes: one root element, every start tag closed in order, attribute names unique
 * and values quoted without `<`, `&` only in the five predefined entities or character references,
 * no `<` in text, comments and processing instructions closed. No DTDs (warmcast writes none).
 * Returns the problems found; an empty list means well formed.
 */
export function xmlProblems(text: string): string[] {
  const problems: string[] = [];
  const stack: string[] = [];
  let roots = 0;
  const name = /^[A-Za-z_:][-A-Za-z0-9._:]*/;
  const entity = /&(?:amp|lt|gt|quot|apos|#[0-9]+|#x[0-9A-Fa-f]+);/y;
  const checkAmpersands = (s: string, where: string) => {
    for (let i = s.indexOf('&'); i >= 0; i = s.indexOf('&', i + 1)) {
      entity.lastIndex = i;
      if (!entity.test(s)) problems.push(`bare & in ${where} near "${s.slice(i, i + 12)}"`);
    }
  };
  let i = 0;
  while (i < text.length) {
    const lt = text.indexOf('<', i);
    const chunk = lt < 0 ? text.slice(i) : text.slice(i, lt);
    if (chunk.includes('>') && /\]\]>/.test(chunk)) problems.push('"]]>" in text');
    checkAmpersands(chunk, 'text');
    if (stack.length === 0 && chunk.trim() !== '') problems.push(`text outside the root element: "${chunk.trim().slice(0, 20)}"`);
    if (lt < 0) break;
    if (text.startsWith('<!--', lt)) {
      const end = text.indexOf('-->', lt + 4);
      if (end < 0) return [...problems, 'unclosed comment'];
      i = end + 3;
      continue;
    }
    if (text.startsWith('<?', lt)) {
      const end = text.indexOf('?>', lt + 2);
      if (end < 0) return [...problems, 'unclosed processing instruction'];
      i = end + 2;
      continue;
    }
    if (text.startsWith('<![CDATA[', lt)) {
      const end = text.indexOf(']]>', lt);
      if (end < 0) return [...problems, 'unclosed CDATA section'];
      i = end + 3;
      continue;
    }
    if (text.startsWith('<!', lt)) return [...problems, 'declarations are not expected'];
    const closing = text[lt + 1] === '/';
    let j = lt + (closing ? 2 : 1);
    const m = name.exec(text.slice(j));
    if (!m) return [...problems, `bad tag name at ${lt}`];
    const tag = m[0];
    j += tag.length;
    if (closing) {
      const end = /^\s*>/.exec(text.slice(j));
      if (!end) return [...problems, `bad end tag </${tag}`];
      const open = stack.pop();
      if (open !== tag) problems.push(`</${tag}> closes <${open ?? 'nothing'}>`);
      i = j + end[0].length;
      continue;
    }
    const seen = new Set<string>();
    for (;;) {
      const ws = /^\s*/.exec(text.slice(j))![0].length;
      j += ws;
      if (text.startsWith('/>', j) || text[j] === '>') break;
      if (ws === 0) return [...problems, `no space before attribute in <${tag}>`];
      const attr = name.exec(text.slice(j));
      if (!attr) return [...problems, `bad attribute in <${tag}> at "${text.slice(j, j + 15)}"`];
      j += attr[0].length;
      const eq = /^\s*=\s*/.exec(text.slice(j));
      if (!eq) return [...problems, `attribute ${attr[0]} in <${tag}> has no value`];
      j += eq[0].length;
      const quote = text[j];
      if (quote !== '"' && quote !== "'") return [...problems, `attribute ${attr[0]} in <${tag}> is not quoted`];
      const close = text.indexOf(quote, j + 1);
      if (close < 0) return [...problems, `attribute ${attr[0]} in <${tag}> is not closed`];
      const value = text.slice(j + 1, close);
      if (value.includes('<')) problems.push(`< in attribute ${attr[0]} of <${tag}>`);
      checkAmpersands(value, `attribute ${attr[0]}`);
      if (seen.has(attr[0])) problems.push(`attribute ${attr[0]} repeated in <${tag}>`);
      seen.add(attr[0]);
      j = close + 1;
    }
    const selfClosing = text.startsWith('/>', j);
    if (stack.length === 0) roots++;
    if (!selfClosing) stack.push(tag);
    i = j + (selfClosing ? 2 : 1);
  }
  if (stack.length > 0) problems.push(`unclosed <${stack.join('>, <')}>`);
  if (roots !== 1) problems.push(`${roots} root elements`);
  return problems;
}
