"use client";

import { useRef, useState } from "react";
import { FormAlert } from "@/components/auth/form-alert";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { call, countsText, rejectedText, type CommitResponse, type FieldSpec, type PreviewResponse, type TableKey } from "./api";

export type CsvImportProps = {
  table: TableKey;
  title: string;
  fields: FieldSpec[];
  onApplied: (answer: CommitResponse) => void;
};

const MAX_BYTES = 1024 * 1024;

function form(file: File, fields: Record<string, string>): FormData {
  const data = new FormData();
  data.set("file", file);
  for (const [k, v] of Object.entries(fields)) data.set(k, v);
  return data;
}

/** Upload a CSV: checked and shown first (every rejected line with its reason), then applied all or nothing. */
export function CsvImport({ table, title, fields, onApplied }: CsvImportProps) {
  const input = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [mode, setMode] = useState<"merge" | "replace">("merge");
  const [note, setNote] = useState("");
  const [preview, setPreview] = useState<PreviewResponse | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState<"check" | "apply" | null>(null);

  function reset() {
    setPreview(null);
    setProblem(null);
  }

  async function check() {
    reset();
    if (!file) return setProblem("Choose a CSV file first.");
    if (file.size > MAX_BYTES) return setProblem(`The file is ${Math.ceil(file.size / 1024)} KB; the largest accepted is 1,024 KB.`);
    setBusy("check");
    const answer = await call<PreviewResponse>(`/api/admin/tables/${table}/import/preview`, { method: "POST", body: form(file, { mode }) });
    setBusy(null);
    if (answer.ok) setPreview(answer.body);
    else setProblem(`Not checked: ${answer.body.error}`);
  }

  async function apply() {
    if (!file || !preview?.ok) return;
    setBusy("apply");
    const fieldsSent: Record<string, string> = { mode, note: note.trim() };
    if (preview.baseVersion) fieldsSent.baseVersionId = preview.baseVersion.id;
    const answer = await call<CommitResponse>(`/api/admin/tables/${table}/import`, { method: "POST", body: form(file, fieldsSent) });
    setBusy(null);
    if (!answer.ok) {
      setProblem(`Nothing was applied: ${answer.body.error}`);
      return;
    }
    setFile(null);
    setNote("");
    setPreview(null);
    if (input.current) input.current.value = "";
    onApplied(answer.body);
  }

  const changes = preview?.changes;
  return (
    <div className="flex flex-col gap-3" data-testid="csv-import">
      <div className="flex flex-col gap-1">
        <label htmlFor={`csv-file-${table}`} className="font-bold">
          Upload a CSV file
        </label>
        <p className="text-sm break-all text-graphite" id={`csv-hint-${table}`}>
          At most 1 MB, UTF-8, with the header{" "}
          {fields.length > 6
            ? `${fields
                .slice(0, 6)
                .map((f) => f.name)
                .join(",")},…`
            : fields.map((f) => f.name).join(",")}
        </p>
        <input
          ref={input}
          id={`csv-file-${table}`}
          type="file"
          accept=".csv,text/csv"
          aria-describedby={`csv-hint-${table}`}
          onChange={(e) => {
            setFile(e.target.files?.[0] ?? null);
            reset();
          }}
          className="block min-h-touch w-full rounded-lg border-2 border-rule-strong bg-paper p-2 text-base file:mr-3 file:min-h-10 file:rounded-md file:border-0 file:bg-spruce file:px-3 file:font-bold file:text-white"
        />
      </div>
      <fieldset className="flex flex-col gap-2">
        <legend className="font-bold">The file’s rows</legend>
        <label className="flex min-h-touch items-start gap-2">
          <input type="radio" name={`mode-${table}`} className="mt-1 h-5 w-5" checked={mode === "merge"} onChange={() => (setMode("merge"), reset())} />
          <span>Add new rows and replace rows with the same key; keep the others</span>
        </label>
        <label className="flex min-h-touch items-start gap-2">
          <input type="radio" name={`mode-${table}`} className="mt-1 h-5 w-5" checked={mode === "replace"} onChange={() => (setMode("replace"), reset())} />
          <span>Replace the whole table with the file (rows not in it are removed)</span>
        </label>
      </fieldset>
      <Button variant="secondary" onClick={check} loading={busy === "check"} disabled={!file} className="w-fit">
        Check the file
      </Button>

      {problem ? <FormAlert tone="error">{problem}</FormAlert> : null}

      {preview ? (
        <div className="flex flex-col gap-3" data-testid="csv-preview">
          {preview.fileError ? (
            <FormAlert tone="error">
              {preview.fileName} cannot be used: {preview.fileError}. Nothing will change.
            </FormAlert>
          ) : null}
          {preview.rejected.length > 0 ? (
            <FormAlert tone="error">
              <p>
                {preview.rejected.length} of {preview.lineCount} lines in {preview.fileName} have problems, so nothing in the file will be applied. Fix these
                lines and check the file again:
              </p>
              <ul className="mt-2 flex flex-col gap-1 font-normal" data-testid="csv-rejected">
                {preview.rejected.map((line) => (
                  <li key={line.line}>
                    <strong>Line {line.line}</strong> — {rejectedText(line).join("; ")}
                  </li>
                ))}
              </ul>
            </FormAlert>
          ) : null}
          {preview.ok && changes ? (
            <FormAlert tone="info">
              <p data-testid="csv-ok">
                All {preview.acceptedRows} rows of {preview.fileName} passed. Applying it to {title}:{" "}
                {countsText({ added: changes.added.length, changed: changes.changed.length, removed: changes.removed.length })}.
              </p>
              {changes.changed.length + changes.added.length + changes.removed.length > 0 ? (
                <ul className="mt-2 flex max-h-60 flex-col gap-1 overflow-y-auto font-normal">
                  {changes.added.map((c) => (
                    <li key={`a-${c.key}`}>Add {c.key.replaceAll("|", " · ")}</li>
                  ))}
                  {changes.changed.map((c) => (
                    <li key={`c-${c.key}`}>
                      Change {c.key.replaceAll("|", " · ")}:{" "}
                      {(c.fields ?? []).map((f) => `${f.column} ${f.before || "(blank)"} → ${f.after || "(blank)"}`).join(", ")}
                    </li>
                  ))}
                  {changes.removed.map((c) => (
                    <li key={`r-${c.key}`}>Remove {c.key.replaceAll("|", " · ")}</li>
                  ))}
                </ul>
              ) : (
                <p className="mt-1 font-normal">The tables already hold exactly these rows: applying it publishes nothing.</p>
              )}
            </FormAlert>
          ) : null}
          {preview.ok && changes && changes.changed.length + changes.added.length + changes.removed.length > 0 ? (
            <>
              <TextField
                label="Note for the history"
                hint="e.g. the yard's prices for March"
                value={note}
                onChange={(e) => setNote(e.target.value)}
                maxLength={500}
              />
              <Button onClick={apply} loading={busy === "apply"} className="w-fit">
                Apply as a new version
              </Button>
            </>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}
