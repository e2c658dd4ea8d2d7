import { levelsOf } from "@/lib/jobs/load-path-levels";

export type LoadPathPictureMember = {
  id: string;
  label: string;
  kindLabel: string;
  carriedById: string | null;
  pass: boolean | null;
};

/**
 * The job's load path as a simple picture: one row per level, from what the load starts on (joists)
 * down to the ground (footings), each member a box with its verdict in words, an arrow to what carries it.
 */
export function LoadPathPicture({ members }: { members: LoadPathPictureMember[] }) {
  const linked = members.filter((m) => m.carriedById !== null || members.some((o) => o.carriedById === m.id));
  if (linked.length === 0) return null;
  const levels = levelsOf(linked);
  const byId = new Map(linked.map((m) => [m.id, m]));
  return (
    <figure className="flex flex-col gap-1 rounded-card border-2 border-rule bg-paper-raised p-4" aria-labelledby="load-path-title" data-testid="load-path">
      <figcaption id="load-path-title" className="text-lg font-bold">
        Load path
      </figcaption>
      <p className="text-sm text-graphite">Each member hands its loads, case by case, to the one under it.</p>
      <ol className="flex flex-col items-start gap-1">
        {levels.map((row, i) => (
          <li key={i} className="flex flex-col items-start gap-1">
            {i > 0 ? (
              <span aria-hidden className="pl-4 text-2xl leading-none text-graphite">
                ↓
              </span>
            ) : null}
            <ul className="flex flex-wrap gap-2">
              {row.map((id) => {
                const m = byId.get(id);
                if (!m) return null;
                const carrier = m.carriedById ? byId.get(m.carriedById) : undefined;
                const state = m.pass === null ? "Not sized" : m.pass ? "OK" : "Over";
                return (
                  <li
                    key={id}
                    className={`min-h-touch rounded-lg border-2 px-3 py-2 ${m.pass === false ? "border-over bg-over-bg text-over-ink" : "border-rule bg-paper text-ink"}`}
                  >
                    <span className="font-bold">{m.label}</span> <span className="text-sm">{m.kindLabel}</span>{" "}
                    <span className="font-bold">
                      {m.pass === false ? "✕ " : m.pass ? "✓ " : ""}
                      {state}
                    </span>
                    {carrier ? <span className="block text-sm">on {carrier.label}</span> : null}
                  </li>
                );
              })}
            </ul>
          </li>
        ))}
      </ol>
    </figure>
  );
}
