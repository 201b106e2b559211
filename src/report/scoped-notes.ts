/** A note that applies to one pathway, or to that pathway's ensemble. */
export interface ScopedNote {
  /** The pathway's name. */
  pathway: string;
  /** True when the note is about the pathway's ensemble rather than its single run. */
  ensemble?: boolean;
  text: string;
}

/**
 * Notes of several pathways as lines, each distinct note once: a note that every pathway shares is
 * said once for "all pathways" (or "all ensembles"), one that some share names them. Lines keep the
 * order in which their notes first appear.
 *
 * @param notes the notes, in order
 * @param pathways the names of all pathways of the comparison
 * @returns one line per distinct note and kind, `scope: text`
 * @example
 * scopedNotes([{ pathway: 'a', text: 'x' }, { pathway: 'b', text: 'x' }, { pathway: 'b', text: 'y' }], ['a', 'b'])
 * // ['all pathways: x', 'b: y']
 */
export function scopedNotes(notes: readonly ScopedNote[], pathways: readonly string[]): string[] {
  const groups = new Map<string, { ensemble: boolean; text: string; names: string[] }>();
  for (const n of notes) {
    const key = `${n.ensemble ? 'E' : 'P'}${n.text}`;
    const g = groups.get(key) ?? { ensemble: n.ensemble === true, text: n.text, names: [] };
    if (!g.names.includes(n.pathway)) g.names.push(n.pathway);
    groups.set(key, g);
  }
  return [...groups.values()].map(({ ensemble, text, names }) => {
    const all = pathways.length > 1 && pathways.every((p) => names.includes(p));
    const scope = all
      ? ensemble ? 'all ensembles' : 'all pathways'
      : ensemble ? (names.length === 1 ? `${names[0]} ensemble` : `ensembles of ${names.join(', ')}`) : names.join(', ');
    return `${scope}: ${text}`;
  });
}
