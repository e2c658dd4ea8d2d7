import type { ReactNode } from "react";
import { TradeText } from "@/components/ui/trade-text";
import { BeamDiagram } from "@/components/diagrams/beam-diagram";
import { RatioBar } from "@/components/ui/ratio-bar";
import { StatusBadge } from "@/components/ui/status-badge";
import { WarningIcon } from "@/components/ui/icons";
import { formatFeetInches, formatInches } from "@/lib/flow/length";
import { checkWords } from "@/lib/solver/design/check-words";
import { byCaseWords, formatCheckValue, formatLb, formatSheetDate, ratioPercent, supportName } from "@/lib/sheets/format";
import { sheetSources, type SheetMember, type SheetSnapshot } from "@/lib/sheets/snapshot";
import { FROM_MEMORY } from "@/lib/tables/citations";

export type SheetDocumentProps = {
  snapshot: SheetSnapshot;
  /** the QR code of the job's live crew link, printed under the heading; none when the job has no live link */
  crewQr?: { svg: string; url: string } | null;
};

function fmtDiagram(unit: string) {
  return (v: number) => (unit === "in" ? v.toFixed(3) : Math.round(v).toLocaleString("en-US"));
}

function TableShell({ caption, head, children }: { caption: string; head: string[]; children: ReactNode }) {
  return (
    // a wide table scrolls sideways on a phone: the scrolling box takes the keyboard's focus and is named by the
    // table's caption, so the columns past the edge can be reached without a pointer
    <div className="overflow-x-auto" tabIndex={0} role="region" aria-label={caption}>
      <table className="sheet-table w-full border-collapse text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead>
          <tr className="border-b-2 border-rule text-graphite">
            {head.map((h, i) => (
              <th key={`${h}-${i}`} scope="col" className="px-1.5 py-1 font-bold">
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>{children}</tbody>
      </table>
    </div>
  );
}

function MemberSection({ m, index }: { m: SheetMember; index: number }) {
  return (
    <section className="sheet-member flex flex-col gap-4 border-t-4 border-ink pt-4" aria-labelledby={`member-${m.id}`} data-testid="sheet-member">
      <header>
        <p className="text-sm font-bold tracking-wide text-spruce uppercase">
          Member {index + 1}: {m.kindLabel}
        </p>
        <h2 id={`member-${m.id}`} className="text-2xl font-bold">
          {m.label}
        </h2>
        <p className="mt-1 text-xl font-bold">
          <TradeText text={m.headline} />
        </p>
        <p className="text-ink-soft">
          <TradeText text={m.memberLabel} />
        </p>
        <p className="mt-2">
          <StatusBadge status={m.pass ? "pass" : "fail"} label={`${m.pass ? "OK" : "Over"} ${ratioPercent(m.ratio)}, ${checkWords(m.governing)} governs`} />
        </p>
        {m.facts && m.facts.length > 0 ? (
          <ul className="mt-2 flex flex-col gap-0.5" data-testid="sheet-facts">
            {m.facts.map((f) => (
              <li key={f}>
                <TradeText text={f} />
              </li>
            ))}
          </ul>
        ) : null}
        {m.note ? <p className="mt-2 text-sm text-ink-soft">{m.note}</p> : null}
      </header>

      <div>
        <h3 className="mb-1 text-lg font-bold">Inputs</h3>
        <dl className="grid grid-cols-[minmax(8rem,auto)_1fr] gap-x-4 gap-y-0.5 text-sm">
          {m.inputs.map(([k, v], i) => (
            <div key={`${k}-${i}`} className="contents">
              <dt className="font-bold">{k}</dt>
              <dd>{v}</dd>
            </div>
          ))}
        </dl>
      </div>

      <div>
        <h3 className="mb-1 text-lg font-bold">Loads on the member</h3>
        <TableShell caption={`Loads on ${m.label}`} head={["Case", "Line load", "How it was found"]}>
          {m.loads.map((l, i) => (
            <tr key={i} className="border-b border-rule align-top">
              <td className="px-1.5 py-1">{l.case}</td>
              <td className="px-1.5 py-1 text-right font-mono whitespace-nowrap tabular-nums">{l.w === null ? "—" : `${l.w.toLocaleString("en-US")} plf`}</td>
              <td className="px-1.5 py-1">{l.note}</td>
            </tr>
          ))}
        </TableShell>
      </div>

      <div className="sheet-keep">
        <h3 className="mb-1 text-lg font-bold">Checks</h3>
        <div className="flex flex-col gap-3">
          {m.checks.map((c, i) => (
            <RatioBar
              key={`${c.name}-${i}`}
              ratio={c.ratio}
              label={checkWords(c.name)}
              governing={c.name === m.governing}
              showScale={i === 0}
              detail={`${formatCheckValue(c.demand, c.unit)} of ${formatCheckValue(c.capacity, c.unit)}${c.combination ? `, ${c.combination}` : ""}${c.x === null ? "" : ` at ${formatFeetInches(c.x)}`}. ${c.note}`}
            />
          ))}
        </div>
      </div>

      <div className="sheet-keep">
        <h3 className="mb-1 text-lg font-bold">Reactions and bearing</h3>
        <TableShell caption={`Reactions of ${m.label}`} head={["Support", "Largest down", "By load case", "Uplift", "Bearing given / needed", "Jack studs"]}>
          {m.reactions.map((r, i) => (
            <tr key={i} className="border-b border-rule align-top">
              <th scope="row" className="px-1.5 py-1 font-bold">
                {supportName(i, m.reactions.length, r.x)}
              </th>
              <td className="px-1.5 py-1 font-mono tabular-nums">
                {formatLb(r.maxDown)}
                <br />
                <span className="font-sans text-graphite">{r.maxDownCombination}</span>
              </td>
              <td className="px-1.5 py-1">{byCaseWords(r.byCase)}</td>
              <td className="px-1.5 py-1 font-mono tabular-nums">{r.uplift > 0 ? `${formatLb(r.uplift)} (${r.upliftCombination ?? ""})` : "none"}</td>
              <td className="px-1.5 py-1 font-mono tabular-nums">
                <TradeText text={`${formatInches(r.bearing)} / ${formatInches(r.requiredBearing)}`} />
              </td>
              <td className="px-1.5 py-1 font-mono tabular-nums">{r.jackStuds === null ? "—" : r.jackStuds}</td>
            </tr>
          ))}
        </TableShell>
      </div>

      <div className="flex flex-col gap-2">
        <h3 className="text-lg font-bold">Diagrams</h3>
        {m.diagrams.map((d) => (
          <div key={d.quantity} className="sheet-keep">
            <BeamDiagram
              title={d.title}
              subtitle={d.combination}
              quantity={d.quantity}
              segments={d.segments}
              extremes={d.extremes}
              unit={d.unit}
              supports={m.supports}
              format={fmtDiagram(d.unit)}
            />
          </div>
        ))}
      </div>

      <div className="sheet-keep">
        <h3 className="mb-1 text-lg font-bold">Factors and design values</h3>
        <dl className="grid grid-cols-2 gap-x-4 gap-y-0.5 text-sm sm:grid-cols-4">
          {m.factors.map(([k, v], i) => (
            <div key={`${k}-${i}`} className="contents">
              <dt className="font-bold">{k}</dt>
              <dd className="font-mono tabular-nums">{v}</dd>
            </div>
          ))}
        </dl>
        <p className="mt-1 text-sm">
          Deflection limits: {m.limits.live === null ? "—" : `L/${m.limits.live}`} live, {m.limits.total === null ? "—" : `L/${m.limits.total}`} total (
          {m.limits.source}).
        </p>
      </div>

      {m.assumptions.length > 0 ? (
        <div>
          <h3 className="mb-1 text-lg font-bold">Assumptions</h3>
          <ul className="list-disc pl-6 text-sm">
            {m.assumptions.map((a) => (
              <li key={a}>{a}</li>
            ))}
          </ul>
        </div>
      ) : null}
    </section>
  );
}

/** Appendix: where the design values on this sheet come from, values no readable copy confirmed flagged. */
function SourcesAppendix({ snapshot }: { snapshot: SheetSnapshot }) {
  const sources = sheetSources(snapshot);
  if (sources.length === 0) return null;
  const flagged = sources.filter((x) => x.fromMemory).length;
  return (
    <section aria-labelledby="sheet-sources" className="sheet-keep">
      <h2 id="sheet-sources" className="mb-2 text-2xl font-bold">
        Appendix: where the design values come from
      </h2>
      {flagged > 0 ? (
        <p className="mb-2 text-sm">
          Marked <span className="font-bold text-caution-ink">{FROM_MEMORY}</span>: no readable copy of that table confirmed these values. Check them against
          the printed table.
        </p>
      ) : null}
      <ul className="list-disc space-y-1 pl-6 text-sm">
        {sources.map(({ source, fromMemory }) => (
          <li key={source}>
            {fromMemory ? <span className="font-bold text-caution-ink">{FROM_MEMORY}: </span> : null}
            {source}
          </li>
        ))}
      </ul>
    </section>
  );
}

/** The job sheet from its frozen snapshot: the same content as the PDF, for the screen and the printer. */
export function SheetDocument({ snapshot: s, crewQr }: SheetDocumentProps) {
  const by = s.preparedBy.company ? `${s.preparedBy.name}, ${s.preparedBy.company}` : s.preparedBy.name;
  return (
    <article className="sheet-document flex flex-col gap-6" aria-labelledby="sheet-title">
      <header className="flex flex-col gap-2">
        <p className="text-sm font-bold tracking-wide text-spruce uppercase">Job sheet</p>
        <h1 id="sheet-title" className="text-3xl leading-tight font-bold">
          {s.job.name}
        </h1>
        {s.job.siteAddress ? <p className="text-lg text-ink-soft">{s.job.siteAddress}</p> : null}
        <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-4 gap-y-0.5 sm:grid-cols-[auto_1fr_auto_1fr]">
          <dt className="font-bold">Prepared by</dt>
          <dd>{by}</dd>
          <dt className="font-bold">Saved</dt>
          <dd>{formatSheetDate(s.savedAt)}</dd>
          <dt className="font-bold">Material tables</dt>
          <dd className="min-w-0">
            {s.tablesLabel}
            <span className="block font-mono text-xs break-all text-graphite">id {s.tablesVersion}</span>
          </dd>
          <dt className="font-bold">Method</dt>
          <dd>ASD (service loads)</dd>
        </dl>
        {s.job.notes.trim() ? <p className="mt-1 whitespace-pre-line">Job notes: {s.job.notes}</p> : null}
        {crewQr ? (
          <figure className="sheet-keep mt-2 flex items-center gap-3" data-testid="sheet-crew-qr">
            {/* the SVG is drawn by the qrcode package from our own crew link */}
            <div
              className="h-28 w-28 shrink-0 [&>svg]:h-full [&>svg]:w-full"
              dangerouslySetInnerHTML={{ __html: crewQr.svg }}
              role="img"
              aria-label="QR code of the crew link"
            />
            <figcaption className="min-w-0 text-sm">
              <strong className="block text-base">Crew link</strong>
              Scan for the live member schedule, read only.
              <span className="block font-mono text-xs break-all text-graphite">{crewQr.url}</span>
            </figcaption>
          </figure>
        ) : null}
      </header>

      <aside aria-label="Safety caution" className="rounded-card border-2 border-l-8 border-caution bg-caution-bg p-4 text-ink">
        <p className="flex items-center gap-2 font-bold text-caution-ink">
          <WarningIcon className="h-6 w-6 shrink-0" />
          <span>{s.caution.title}</span>
        </p>
        <p className="mt-2">{s.caution.text}</p>
        <p className="mt-3 font-bold">Spanlark does not check:</p>
        <ul className="mt-1 list-disc space-y-0.5 pl-6">
          {s.caution.notChecked.map((item) => (
            <li key={item}>{item}</li>
          ))}
        </ul>
      </aside>

      <section aria-labelledby="sheet-schedule" className="sheet-keep">
        <h2 id="sheet-schedule" className="mb-2 text-2xl font-bold">
          Member schedule
        </h2>
        <ul className="flex flex-col gap-2 sm:hidden print:hidden" aria-label="Member schedule">
          {s.members.map((m) => (
            <li key={m.id} className="rounded-card border-2 border-rule bg-paper-raised p-3">
              <p className="font-bold">
                {m.label} <span className="font-normal text-graphite">· {m.kindLabel}</span>
              </p>
              <p className="text-lg font-bold">{m.headline}</p>
              <p>
                Span <span className="font-mono tabular-nums">{formatFeetInches(m.spanFt)}</span> · {m.pass ? "OK" : "Over"} {ratioPercent(m.ratio)} (
                {checkWords(m.governing)})
              </p>
            </li>
          ))}
        </ul>
        <div className="hidden sm:block print:block">
          <TableShell caption="Member schedule" head={["Member", "Build", "Span", "Result"]}>
            {s.members.map((m) => (
              <tr key={m.id} className="border-b border-rule align-top">
                <th scope="row" className="px-1.5 py-1 font-bold">
                  {m.label}
                  <br />
                  <span className="font-normal text-graphite">{m.kindLabel}</span>
                </th>
                <td className="px-1.5 py-1 font-bold">{m.headline}</td>
                <td className="px-1.5 py-1 font-mono whitespace-nowrap tabular-nums">{formatFeetInches(m.spanFt)}</td>
                <td className="px-1.5 py-1 whitespace-nowrap">
                  {m.pass ? "OK" : "Over"} {ratioPercent(m.ratio)} ({checkWords(m.governing)})
                </td>
              </tr>
            ))}
          </TableShell>
        </div>
        {s.loadPath && s.loadPath.length > 0 ? (
          <div className="mt-3" data-testid="sheet-load-path">
            <h3 className="font-bold">Posts and footings</h3>
            <ul className="flex flex-col gap-2">
              {s.loadPath.map((r) => (
                <li key={r.id}>
                  <p className="font-bold">
                    {r.label} ({r.kindLabel}): {r.headline}
                  </p>
                  <ul className="list-disc pl-6 text-sm">
                    {[...r.problems.map((p) => `✕ ${p}`), ...r.facts].map((f) => (
                      <li key={f}>{f}</li>
                    ))}
                  </ul>
                </li>
              ))}
            </ul>
          </div>
        ) : null}
        {s.skipped.length > 0 ? (
          <div className="mt-2 text-sm">
            <p className="font-bold">Not on this sheet:</p>
            <ul className="list-disc pl-6">
              {s.skipped.map((k) => (
                <li key={k.id}>
                  {k.label}: {k.reason}
                </li>
              ))}
            </ul>
          </div>
        ) : null}
      </section>

      {s.members.map((m, i) => (
        <MemberSection key={m.id} m={m} index={i} />
      ))}

      <SourcesAppendix snapshot={s} />

      <footer className="border-t-2 border-rule pt-2 text-sm text-graphite">
        Spanlark job sheet · {s.job.name} · saved {formatSheetDate(s.savedAt)} · tables {s.tablesLabel}. The numbers on this sheet were worked out when it was
        saved and are kept as they were.
      </footer>
    </article>
  );
}
