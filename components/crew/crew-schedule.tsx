import type { ScheduleRow } from "@/lib/crew/schedule";
import { TradeText } from "@/components/ui/trade-text";
import { StatusBadge } from "@/components/ui/status-badge";

export type CrewScheduleProps = {
  rows: readonly ScheduleRow[];
};

/**
 * The member schedule as the crew reads it on a phone: one card per member, what to build first and big,
 * then span, what each support needs and the load it takes. Read-only: no links into the owner's pages.
 */
export function CrewSchedule({ rows }: CrewScheduleProps) {
  if (rows.length === 0) {
    return <p className="rounded-card border-2 border-dashed border-rule-strong p-4 text-lg">No members on this job yet. Ask the builder to add them.</p>;
  }
  return (
    <ol className="flex flex-col gap-4" aria-label="Member schedule">
      {rows.map((row) => (
        <li key={row.id} className="rounded-card border-2 border-rule bg-paper-raised p-4" data-testid="crew-member">
          <p className="text-sm font-bold tracking-wide text-graphite uppercase">{row.kindLabel}</p>
          <h2 className="text-xl font-bold text-ink">{row.label}</h2>
          {row.headline ? (
            <p className="mt-2 text-2xl leading-snug font-bold text-ink" data-testid="crew-headline">
              <TradeText text={row.headline} />
            </p>
          ) : (
            <p className="mt-2 text-lg font-bold text-caution-ink">Not sized yet: do not cut this one.</p>
          )}
          {row.memberLabel ? (
            <p className="text-ink-soft">
              <TradeText text={row.memberLabel} />
            </p>
          ) : null}
          {row.change ? (
            <p className="mt-2 rounded-lg border-2 border-caution-ink/40 bg-caution-bg p-2 font-bold text-ink" data-testid="crew-change">
              ⚠ {row.change}
            </p>
          ) : null}
          {row.problems.length > 0 ? (
            <ul className="mt-2 list-disc rounded-lg border-2 border-over bg-over-bg p-2 pl-6 font-bold text-over-ink" data-testid="crew-problems">
              {row.problems.map((p) => (
                <li key={p}>✕ {p}</li>
              ))}
            </ul>
          ) : null}
          {row.carried.length > 0 ? (
            <div className="mt-2 text-ink" data-testid="crew-carried">
              <p className="font-bold">Loads on it:</p>
              <ul className="list-disc pl-6">
                {row.carried.map((c) => (
                  <li key={c}>{c}</li>
                ))}
              </ul>
            </div>
          ) : null}
          {row.verdict ? (
            <p className="mt-2">
              <StatusBadge status={row.verdict.pass ? "pass" : "fail"} label={row.verdict.words} />
            </p>
          ) : null}
          {row.facts.length > 0 ? (
            <ul className="mt-2 flex flex-col gap-1 text-ink" data-testid="crew-facts">
              {row.facts.map((f) => (
                <li key={f}>
                  <TradeText text={f} />
                </li>
              ))}
            </ul>
          ) : null}
          {row.headline ? (
            <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-lg">
              <dt className="font-bold">{row.kindLabel === "Posts" ? "Height" : "Span"}</dt>
              <dd className="font-mono tabular-nums">{row.span}</dd>
            </dl>
          ) : null}
          {row.supports.length > 0 ? (
            <table className="mt-3 w-full border-collapse text-left text-base">
              <caption className="sr-only">Supports of {row.label}</caption>
              <thead>
                <tr className="border-b-2 border-rule text-graphite">
                  <th scope="col" className="py-1 pr-2 font-bold">
                    Support
                  </th>
                  <th scope="col" className="py-1 pr-2 font-bold">
                    Needs
                  </th>
                  <th scope="col" className="py-1 text-right font-bold">
                    Load
                  </th>
                </tr>
              </thead>
              <tbody>
                {row.supports.map((s) => (
                  <tr key={s.name} className="border-b border-rule align-top">
                    <th scope="row" className="py-2 pr-2 font-bold">
                      {s.name}
                    </th>
                    <td className="py-2 pr-2">
                      <TradeText text={s.bearing} />
                    </td>
                    <td className="py-2 text-right font-mono whitespace-nowrap tabular-nums">{s.reaction}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          ) : null}
        </li>
      ))}
    </ol>
  );
}
