/**
 * The rows of the load path picture: a member's row is one below the lowest row of the members bearing
 * on it, so joists come first, then the beam, posts and footings. Pure; cycles (refused when links are
 * made) end the walk.
 */
export function levelsOf(members: readonly { id: string; carriedById: string | null }[]): string[][] {
  const ids = new Set(members.map((m) => m.id));
  const level = new Map<string, number>();
  const depth = (id: string, seen: Set<string>): number => {
    const known = level.get(id);
    if (known !== undefined) return known;
    if (seen.has(id)) return 0;
    seen.add(id);
    const above = members.filter((m) => m.carriedById === id);
    const d = above.length === 0 ? 0 : Math.max(...above.map((m) => depth(m.id, seen) + 1));
    level.set(id, d);
    return d;
  };
  for (const m of members) if (ids.has(m.id)) depth(m.id, new Set());
  const rows: string[][] = [];
  for (const m of members) {
    const d = level.get(m.id) ?? 0;
    (rows[d] ??= []).push(m.id);
  }
  return rows.filter((r) => r && r.length > 0);
}
