"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import useSWR from "swr";
import { FormAlert } from "@/components/auth/form-alert";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { TextField } from "@/components/ui/field";
import { Spinner } from "@/components/ui/spinner";
import { useToast } from "@/components/ui/toast";
import { When } from "./when";
import { columnWords, rowWords } from "./words";
import {
  call,
  countsText,
  fetchJson,
  sendJson,
  SOURCE_LABEL,
  type CommitResponse,
  type TableKey,
  type TablesVersionDetail,
  type TablesVersionInfo,
} from "./api";

export type VersionHistoryProps = {
  versions: TablesVersionInfo[];
  /** table key → title, for naming the tables a version changed */
  titles: Record<TableKey, string>;
};

/** Most rows a version's change list shows per table before saying how many more there are. */
const SHOWN_PER_TABLE = 40;

function Changes({ id, titles }: { id: string; titles: Record<TableKey, string> }) {
  const { data, error } = useSWR<TablesVersionDetail>(`/api/admin/tables/versions/${id}`, fetchJson);
  if (error) return <p className="font-bold text-over-ink">Could not load the changes: {(error as Error).message}</p>;
  if (!data) return <Spinner size="sm" label="Loading the changes" />;
  const tables = Object.entries(data.summary.tables) as [TableKey, NonNullable<TablesVersionDetail["summary"]["tables"][TableKey]>][];
  if (tables.length === 0) return <p>No rows changed.</p>;
  return (
    <div className="flex flex-col gap-3" data-testid="version-changes">
      {tables.map(([key, change]) => {
        const items = [
          ...change.changed.map((c) => ({
            key: `c-${c.key}`,
            text: `${rowWords(key, c.key)}: ${(c.fields ?? []).map((f) => `${columnWords(key, f.column)} ${f.before || "(blank)"} → ${f.after || "(blank)"}`).join(", ")}`,
          })),
          ...change.added.map((c) => ({ key: `a-${c.key}`, text: `Added ${rowWords(key, c.key)}` })),
          ...change.removed.map((c) => ({ key: `r-${c.key}`, text: `Removed ${rowWords(key, c.key)}` })),
        ];
        return (
          <div key={key}>
            <h4 className="font-bold">
              {titles[key]}: {countsText({ added: change.added.length, changed: change.changed.length, removed: change.removed.length })}
            </h4>
            <ul className="figures mt-1 flex flex-col gap-1 text-sm break-words">
              {items.slice(0, SHOWN_PER_TABLE).map((item) => (
                <li key={item.key}>{item.text}</li>
              ))}
              {items.length > SHOWN_PER_TABLE ? <li className="text-graphite">…and {items.length - SHOWN_PER_TABLE} more</li> : null}
            </ul>
          </div>
        );
      })}
    </div>
  );
}

/** Every published version, newest first: who, when, why, what changed; restore an earlier one as a new version. */
export function VersionHistory({ versions, titles }: VersionHistoryProps) {
  const router = useRouter();
  const toast = useToast();
  const [open, setOpen] = useState<Set<string>>(new Set());
  const [restoring, setRestoring] = useState<TablesVersionInfo | null>(null);
  const [note, setNote] = useState("");
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const current = versions[0];

  function toggle(id: string) {
    setOpen((s) => {
      const next = new Set(s);
      if (next.has(id)) next.delete(id);
      else next.add(id);
      return next;
    });
  }

  async function restore() {
    if (!restoring) return;
    setBusy(true);
    setProblem(null);
    const answer = await call<CommitResponse>(
      `/api/admin/tables/versions/${restoring.id}/restore`,
      sendJson("POST", { note: note.trim() || undefined, baseVersionId: current?.id }),
    );
    setBusy(false);
    if (!answer.ok) return setProblem(answer.body.error);
    setRestoring(null);
    setNote("");
    toast.show({
      message:
        answer.body.created && answer.body.version
          ? `Version ${answer.body.version.number} published, a copy of version ${restoring.number}`
          : answer.body.message,
    });
    router.refresh();
  }

  return (
    <>
      <ol className="flex flex-col gap-3" data-testid="version-history">
        {versions.map((v) => (
          <li key={v.id} className="rounded-card border-2 border-rule bg-paper-raised p-4" data-testid={`version-${v.number}`}>
            <div className="flex flex-col gap-2 md:flex-row md:items-start md:justify-between">
              <div className="min-w-0">
                <h3 className="text-lg font-bold">
                  Version {v.number}
                  {v.id === current?.id ? (
                    <span className="ml-2 rounded-full border-2 border-spruce bg-spruce-light px-2 text-sm text-spruce-dark">Current</span>
                  ) : null}
                </h3>
                <p className="text-ink-soft">
                  {SOURCE_LABEL[v.source]}
                  {v.restoredFrom ? ` from version ${v.restoredFrom.number ?? "?"}` : ""} · <When iso={v.createdAt} /> ·{" "}
                  {v.createdBy ? v.createdBy.email : "Spanlark"}
                </p>
                <p className="mt-1 break-words">{v.note}</p>
                <p className="mt-1 text-sm text-graphite">{countsText(v.counts)}</p>
              </div>
              <div className="flex flex-wrap gap-2 md:justify-end">
                <Button variant="secondary" onClick={() => toggle(v.id)} aria-expanded={open.has(v.id)}>
                  {open.has(v.id) ? "Hide changes" : "What changed"}
                </Button>
                {v.id !== current?.id ? (
                  <Button variant="secondary" onClick={() => (setRestoring(v), setProblem(null))}>
                    Restore
                  </Button>
                ) : null}
              </div>
            </div>
            {open.has(v.id) ? (
              <div className="mt-3 border-t-2 border-rule pt-3">
                <Changes id={v.id} titles={titles} />
              </div>
            ) : null}
          </li>
        ))}
      </ol>

      <Dialog
        open={restoring !== null}
        onClose={() => setRestoring(null)}
        title={restoring ? `Restore version ${restoring.number}?` : "Restore"}
        description={
          restoring && current
            ? `This publishes version ${current.number + 1}, a copy of version ${restoring.number}. Version ${current.number} and everything before it stay in the history, and job sheets keep the numbers they were made with.`
            : undefined
        }
        actions={
          <>
            <Button variant="secondary" onClick={() => setRestoring(null)}>
              Cancel
            </Button>
            <Button onClick={restore} loading={busy}>
              Restore as a new version
            </Button>
          </>
        }
      >
        {problem ? (
          <FormAlert tone="error" className="mb-3">
            Not restored: {problem}
          </FormAlert>
        ) : null}
        <TextField label="Note for the history" hint="Why go back" value={note} onChange={(e) => setNote(e.target.value)} maxLength={500} />
      </Dialog>
    </>
  );
}
