/**
 * The closing lines of a command's terminal output: one `note:` line per note on how the inputs
 * were read and run, then one `caution:` line per caution, indented like the summary above them.
 *
 * @param notes notes, each one sentence or a few
 * @param cautions the cautions to show (see standardCautions)
 * @returns text starting with a blank line and ending with one
 * @example
 * notesAndCautions(['CH4 held at its 1750 value'], ['Global mean only.'])
 * // '\n  note: CH4 held at its 1750 value\n\n  caution: Global mean only.\n\n'
 */
export function notesAndCautions(notes: readonly string[], cautions: readonly string[]): string {
  const block = (label: string, lines: readonly string[]) => (lines.length > 0 ? '\n' + lines.map((l) => `  ${label}: ${l}`).join('\n') + '\n' : '');
  return block('note', notes) + block('caution', cautions) + '\n';
}
