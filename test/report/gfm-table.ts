/**
 * Reads GitHub Flavored Markdown pipe tables back (GFM spec 0.29, section 4.10 "Tables"): a header
 * row, a delimiter row of `---` cells with optional `:` marks, then body rows. Cells are split on
 * pipes not escaped by a backslash, then trimmed; `\|` is a literal pipe and, as in CommonMark
 * (section 2.4), `\\` a literal backslash. Lines that are not table rows end a table.
 */
export function readGfmTables(markdown: string): { header: string[]; align: ('left' | 'right' | 'center' | 'none')[]; rows: string[][] }[] {
  const lines = markdown.split('\n');
  const tables = [];
  for (let i = 0; i + 1 < lines.length; i++) {
    if (!lines[i].trim().startsWith('|') || !/^\|?\s*:?-+:?\s*(\|\s*:?-+:?\s*)*\|?\s*$/.test(lines[i + 1].trim())) continue;
    const header = cells(lines[i]);
    const align = cells(lines[i + 1]).map((c) => (c.startsWith(':') && c.endsWith(':') ? 'center' : c.endsWith(':') ? 'right' : c.startsWith(':') ? 'left' : 'none'));
    const rows: string[][] = [];
    let j = i + 2;
    for (; j < lines.length && lines[j].trim().startsWith('|'); j++) rows.push(cells(lines[j]));
    tables.push({ header, align, rows });
    i = j;
  }
  return tables;
}

function cells(line: string): string[] {
  let s = line.trim();
  if (s.startsWith('|')) s = s.slice(1);
  if (s.endsWith('|') && !s.endsWith('\\|')) s = s.slice(0, -1);
  const out: string[] = [];
  let cell = '';
  for (let k = 0; k < s.length; k++) {
    if (s[k] === '\\' && (s[k + 1] === '|' || s[k + 1] === '\\')) {
      cell += s[k + 1];
      k++;
    } else if (s[k] === '|') {
      out.push(cell.trim());
      cell = '';
    } else cell += s[k];
  }
  out.push(cell.trim());
  return out;
}
