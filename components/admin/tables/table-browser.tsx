"use client";

import { useMemo, useState } from "react";
import useSWR from "swr";
import { FormAlert } from "@/components/auth/form-alert";
import { Button } from "@/components/ui/button";
import { cx } from "@/components/ui/cx";
import { EmptyState } from "@/components/ui/empty-state";
import { SelectField, TextField } from "@/components/ui/field";
import { PlusIcon } from "@/components/ui/icons";
import { Skeleton } from "@/components/ui/spinner";
import { StatusBadge } from "@/components/ui/status-badge";
import { citationOf, FROM_MEMORY, isFromMemory } from "@/lib/tables/citations";
import { useToast } from "@/components/ui/toast";
import { fetchJson, type CommitResponse, type FieldSpec, type TableKey, type TableResponse } from "./api";
import { CsvImport } from "./csv-import";
import { RowForm } from "./row-form";
import { When } from "./when";

export type TableBrowserProps = { table: TableKey };

type Sort = { column: string; direction: "asc" | "desc" };

function compare(a: string, b: string, field: FieldSpec | undefined): number {
  if (field?.kind === "number") {
    const x = a === "" ? Number.NEGATIVE_INFINITY : Number(a);
    const y = b === "" ? Number.NEGATIVE_INFINITY : Number(b);
    return x - y;
  }
  return a.localeCompare(b, "en-US", { numeric: true });
}

/** The columns a phone card shows under the row's name (the table's own choice, else its first numbers). */
function summaryFields(fields: FieldSpec[], names: string[] | undefined): FieldSpec[] {
  if (names) return names.flatMap((name) => fields.filter((f) => f.name === name));
  return fields.filter((f) => f.kind === "number").slice(0, 4);
}

function cellText(value: string, field: FieldSpec): string {
  if (value === "") return "—";
  if (field.kind === "number" && Math.abs(Number(value)) >= 10_000) return Number(value).toLocaleString("en-US");
  return value;
}

/** How many rows cite a checked source and how many are flagged; or the table's own source. */
function SourcesNote({ hasSource, flagged, total, tableSource }: { hasSource: boolean; flagged: number; total: number; tableSource: string | null }) {
  if (!hasSource) {
    return tableSource ? (
      <p className="text-sm text-ink-soft" data-testid="table-source">
        Source: {tableSource}
      </p>
    ) : null;
  }
  if (flagged === 0) {
    return (
      <p className="text-sm text-ink-soft" data-testid="table-source">
        Every row names its table, edition and where its values were checked.
      </p>
    );
  }
  return (
    <div className="rounded-card border-2 border-l-8 border-caution bg-caution-bg p-3 text-ink" data-testid="table-source" role="note">
      <p className="font-bold text-caution-ink">
        {flagged} of {total} rows are {FROM_MEMORY}
      </p>
      <p className="text-sm">
        No readable copy of their table confirmed them. Check them against the printed table before relying on them; the job sheet lists them too.
      </p>
    </div>
  );
}

/** A row's source: the citation, and a flag when its values are from memory. */
function RowSource({ source, full = false }: { source: string; full?: boolean }) {
  const flagged = isFromMemory(source);
  return (
    <span className="flex flex-col items-start gap-1 text-sm">
      {flagged ? <StatusBadge status="caution" label={FROM_MEMORY} /> : null}
      <span className={cx("text-graphite", !full && "line-clamp-2")} title={full ? undefined : source}>
        {full ? source : citationOf(source)}
      </span>
    </span>
  );
}

/** Browse, sort, filter and edit one table of the current version; upload or download it as CSV. */
export function TableBrowser({ table }: TableBrowserProps) {
  const url = `/api/admin/tables/${table}`;
  const { data, error, isLoading, mutate } = useSWR<TableResponse>(url, fetchJson, { revalidateOnFocus: true });
  const toast = useToast();
  const [filter, setFilter] = useState("");
  const [sort, setSort] = useState<Sort | null>(null);
  const [editing, setEditing] = useState<{ key: string; values: Record<string, string> } | "new" | null>(null);

  const fields = useMemo(() => data?.table.fields ?? [], [data]);
  const rows = useMemo(() => {
    if (!data) return [];
    const words = filter.toLowerCase().split(/\s+/).filter(Boolean);
    const matching = data.rows.filter((r) => {
      const text = `${r.key} ${Object.values(r.values).join(" ")}`.toLowerCase();
      return words.every((w) => text.includes(w));
    });
    if (!sort) return matching;
    const field = fields.find((f) => f.name === sort.column);
    const sign = sort.direction === "asc" ? 1 : -1;
    return [...matching].sort((a, b) => sign * compare(a.values[sort.column] ?? "", b.values[sort.column] ?? "", field));
  }, [data, filter, sort, fields]);

  function saved(answer: CommitResponse) {
    setEditing(null);
    toast.show({ message: answer.created && answer.version ? `Saved: version ${answer.version.number} published` : "Nothing changed; no new version" });
    void mutate();
  }

  function toggleSort(column: string) {
    setSort((s) => (s?.column === column ? (s.direction === "asc" ? { column, direction: "desc" } : null) : { column, direction: "asc" }));
  }

  if (error) return <FormAlert tone="error">Could not load the table: {String((error as Error).message)}. Reload to try again.</FormAlert>;
  if (isLoading || !data) {
    return (
      <div className="flex flex-col gap-3" aria-busy="true">
        <Skeleton width="100%" height="44px" />
        <Skeleton width="100%" height="120px" />
        <Skeleton width="100%" height="120px" />
      </div>
    );
  }

  const version = data.version;
  const sortOptions = fields.flatMap((f) => [
    { value: `${f.name}:asc`, label: `${f.label}${f.unit ? ` (${f.unit})` : ""}, low to high` },
    { value: `${f.name}:desc`, label: `${f.label}${f.unit ? ` (${f.unit})` : ""}, high to low` },
  ]);
  const summary = summaryFields(fields, data.table.summary);
  const hasSource = fields.some((f) => f.name === "source");
  const flagged = hasSource ? data.rows.filter((r) => isFromMemory(r.values.source ?? "")).length : 0;

  return (
    <div className="flex flex-col gap-5">
      <p className="text-ink-soft" data-testid="table-version">
        {version ? (
          <>
            Showing version {version.number} (published <When iso={version.createdAt} />
            ). {data.rows.length} rows.
          </>
        ) : (
          <>The database holds no version yet: showing the starter tables. Run the seeders to publish them.</>
        )}
      </p>

      <SourcesNote hasSource={hasSource} flagged={flagged} total={data.rows.length} tableSource={data.table.tableSource} />

      <div className="flex flex-col gap-3 md:flex-row md:items-end">
        <TextField
          label="Filter"
          type="search"
          placeholder="e.g. Hem-Fir No.2"
          value={filter}
          onChange={(e) => setFilter(e.target.value)}
          containerClassName="md:flex-1"
          autoComplete="off"
        />
        <SelectField
          label="Sort by"
          options={sortOptions}
          placeholder="Table order"
          value={sort ? `${sort.column}:${sort.direction}` : ""}
          onChange={(e) => {
            const [column, direction] = e.target.value.split(":");
            setSort(column ? { column, direction: direction === "desc" ? "desc" : "asc" } : null);
          }}
          containerClassName="md:w-80"
        />
        {version ? (
          <Button icon={<PlusIcon className="h-5 w-5" />} onClick={() => setEditing("new")}>
            Add a row
          </Button>
        ) : null}
      </div>

      <p className="text-sm text-graphite" aria-live="polite">
        {rows.length === data.rows.length ? `${rows.length} rows` : `${rows.length} of ${data.rows.length} rows match`}
      </p>

      {rows.length === 0 ? (
        <EmptyState title="No row matches" body="Try fewer words, or clear the filter." />
      ) : (
        <>
          {/* Phones: one card per row, tap to edit. */}
          <ul className="flex flex-col gap-2 md:hidden" data-testid="table-cards">
            {rows.map((r) => (
              <li key={r.key}>
                <button
                  type="button"
                  disabled={!version}
                  onClick={() => setEditing(r)}
                  className="flex w-full flex-col items-start gap-1 rounded-card border-2 border-rule bg-paper-raised p-3 text-left hover:border-spruce active:bg-spruce-light"
                >
                  <span className="font-bold break-words">{r.key.replaceAll("|", " · ")}</span>
                  {hasSource ? <RowSource source={r.values.source ?? ""} /> : null}
                  <span className="figures flex flex-wrap gap-x-4 gap-y-1 text-sm text-ink-soft">
                    {summary.map((f) => (
                      <span key={f.name}>
                        {f.label} {cellText(r.values[f.name] ?? "", f)}
                        {f.unit && r.values[f.name] ? ` ${f.unit}` : ""}
                      </span>
                    ))}
                  </span>
                </button>
              </li>
            ))}
          </ul>

          {/* Wider screens: the whole table, sortable by its headers, scrolling sideways. */}
          <div
            className="hidden overflow-x-auto rounded-card border-2 border-rule bg-paper-raised md:block"
            tabIndex={0}
            role="region"
            aria-label={`${data.table.title}, scrolls sideways`}
          >
            <table className="figures w-full border-collapse text-sm" data-testid="table-grid">
              <caption className="sr-only">
                {data.table.title}, version {version?.number ?? "starter"}
              </caption>
              <thead>
                <tr className="border-b-2 border-rule bg-paper-sunk">
                  <th scope="col" className="sticky left-0 bg-paper-sunk px-2 py-1 text-left">
                    <span className="sr-only">Edit</span>
                  </th>
                  {fields.map((f) => (
                    <th
                      key={f.name}
                      scope="col"
                      className="px-2 py-1 text-left align-bottom whitespace-nowrap"
                      aria-sort={sort?.column === f.name ? (sort.direction === "asc" ? "ascending" : "descending") : "none"}
                    >
                      <button type="button" onClick={() => toggleSort(f.name)} className="inline-flex min-h-touch items-center gap-1 font-bold text-ink">
                        {f.label}
                        {f.unit ? <span className="font-normal text-graphite">{f.unit}</span> : null}
                        <span aria-hidden="true">{sort?.column === f.name ? (sort.direction === "asc" ? "▲" : "▼") : ""}</span>
                      </button>
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {rows.map((r) => (
                  <tr key={r.key} className="border-b border-rule last:border-b-0 hover:bg-spruce-light">
                    <td className="sticky left-0 bg-paper-raised px-2">
                      <Button variant="ghost" disabled={!version} onClick={() => setEditing(r)} aria-label={`Edit ${r.key.replaceAll("|", " ")}`}>
                        Edit
                      </Button>
                    </td>
                    {fields.map((f) =>
                      f.name === "source" ? (
                        <td key={f.name} className="min-w-72 px-2 py-1">
                          <RowSource source={r.values.source ?? ""} />
                        </td>
                      ) : (
                        <td key={f.name} className={cx("px-2 py-1 whitespace-nowrap", f.kind === "number" && "text-right")}>
                          {cellText(r.values[f.name] ?? "", f)}
                        </td>
                      ),
                    )}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </>
      )}

      <section aria-labelledby="csv-heading" className="flex flex-col gap-3 rounded-card border-2 border-rule bg-paper-raised p-4">
        <h2 id="csv-heading" className="text-xl font-bold">
          CSV file
        </h2>
        <p className="text-ink-soft">
          Download this table, change it in a spreadsheet, and upload it back. The upload is checked line by line and shown before anything changes.
        </p>
        <a
          href={`/api/admin/tables/${table}/csv${version ? `?version=${version.id}` : ""}`}
          download
          className="inline-flex min-h-touch w-fit items-center rounded-lg border-2 border-spruce px-4 font-bold text-spruce no-underline hover:bg-spruce-light"
        >
          Download {data.table.title} (CSV)
        </a>
        <CsvImport table={table} title={data.table.title} fields={fields} onApplied={saved} />
      </section>

      {editing && version ? (
        <RowForm
          table={table}
          title={data.table.title}
          fields={fields}
          baseVersionId={version.id}
          row={editing === "new" ? null : editing}
          onClose={() => setEditing(null)}
          onSaved={saved}
        />
      ) : null}
    </div>
  );
}
