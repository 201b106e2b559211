/**
 * The closing lines of a command's terminal output: one `note:` line per note on how the inputs
 * were read and run, then one `caution:` line per caution, indented like the summary above them.
 * Given a terminal `width`, each is wrapped at spaces to fit it, its continuation lines indented
 * under its text, so a long caution reads as a paragraph instead of running past the screen.
 *
 * @param notes notes, each one sentence or a few
 * @param cautions the cautions to show (see standardCautions)
 * @param width columns to wrap at (a terminal's width); no wrapping when undefined
 * @returns text starting with a blank line and ending with one
 * @example
 * notesAndCautions(['CH4 held at its 1750 value'], ['Global mean only.'])
 * // '\n  note: CH4 held at its 1750 value\n\n  caution: Global mean only.\n\n'
 */
export function notesAndCautions(notes: readonly string[], cautions: readonly string[], width?: number): string {
  const block = (label: string, lines: readonly string[]) =>
    lines.length > 0 ? '\n' + lines.map((l) => wrapLabelled(`  ${label}: `, l, width)).join('\n') + '\n' : '';
  return block('note', notes) + block('caution', cautions) + '\n';
}

/**
 * `lead` then `text`, wrapped at spaces to `width` columns with continuation lines indented by the
 * width of `lead`; a word longer than a line stays whole. Unwrapped when `width` is undefined or
 * leaves fewer than 30 columns for the text.
 *
 * @example wrapLabelled('  note: ', 'aaa bbb ccc', 16) // '  note: aaa bbb\n        ccc'
 */
export function wrapLabelled(lead: string, text: string, width?: number): string {
  const room = width === undefined ? Infinity : width - lead.length;
  if (!(room >= 30)) return lead + text;
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(' ')) {
    if (line !== '' && line.length + 1 + word.length > room) {
      lines.push(line);
      line = word;
    } else {
      line = line === '' ? word : `${line} ${word}`;
    }
  }
  lines.push(line);
  return lead + lines.join('\n' + ' '.repeat(lead.length));
}
