/**
 * Where a table row's numbers come from. Every row carries one `source` string of the form
 *
 *   "<table and edition>; <where it was checked>"
 *
 * e.g. "NDS Supplement 2018, Table 4A; checked against …". A row that no readable source confirmed
 * says so with FROM_MEMORY in the second part: "NDS Supplement 2018, Table 4D; from memory — verify
 * against the printed table". The admin table screens and the job sheet's appendix show the whole
 * string and flag those rows; an answer on the screen shows only the citation (the first part).
 */

/** The words that mark a value no readable source confirmed. */
export const FROM_MEMORY = "from memory — verify";

/** True when the source says its values were not confirmed against a readable copy of the table. */
export function isFromMemory(source: string): boolean {
  return /from memory/i.test(source);
}

/** The citation alone ("NDS Supplement 2018, Table 4A"), without where or whether it was checked. */
export function citationOf(source: string): string {
  const cut = source.search(/;|\(from memory/i);
  return (cut < 0 ? source : source.slice(0, cut)).trim();
}

/** The distinct sources behind a set of rows, flagged ones last, each once. */
export function distinctSources(sources: Iterable<string>): { source: string; fromMemory: boolean }[] {
  const seen = new Set<string>();
  const out: { source: string; fromMemory: boolean }[] = [];
  for (const s of sources) {
    if (seen.has(s)) continue;
    seen.add(s);
    out.push({ source: s, fromMemory: isFromMemory(s) });
  }
  return out.sort((a, b) => Number(a.fromMemory) - Number(b.fromMemory));
}
