import Link from "next/link";
import { Card } from "@/components/ui/card";
import { getSessionUser } from "@/lib/auth/session";
import { SHEET_LAPSED_WORDS, sheetAccess } from "@/lib/sheets/access";
import { formatSheetDateTime } from "@/lib/sheets/format";
import { listJobSheets } from "@/lib/sheets/sheets";
import { SaveSheetButton } from "./save-sheet-button";

export type SheetPanelProps = {
  jobId: string;
};

/** The job page's job sheet section (server): save a new sheet (subscribers) and the sheets saved before. */
export async function SheetPanel({ jobId }: SheetPanelProps) {
  const user = await getSessionUser();
  if (!user) return null;
  const [sheets, access] = await Promise.all([listJobSheets(user.id, jobId), sheetAccess(user)]);
  return (
    <Card title="Job sheets" aria-label="Job sheets">
      <div className="flex flex-col gap-3">
        <p className="text-ink-soft">
          A job sheet keeps every member as it is worked out today — inputs, loads, checks, reactions, diagrams and the tables used — to print
          or download for the inspector, the same every time.
        </p>
        {access.canCreate ? (
          <SaveSheetButton jobId={jobId} />
        ) : (
          <p className="rounded-card border-2 border-caution bg-caution-bg p-3" data-testid="sheet-locked">
            <strong>Saving job sheets needs a subscription.</strong> {SHEET_LAPSED_WORDS}{" "}
            <Link href="/pricing" className="font-bold">
              See plans
            </Link>
          </p>
        )}
        {sheets.length > 0 ? (
          <ul className="flex flex-col gap-1" aria-label="Saved sheets of this job">
            {sheets.map((s) => (
              <li key={s.id}>
                <Link href={`/sheets/${s.id}`} className="inline-flex min-h-touch items-center font-bold">
                  Sheet of {formatSheetDateTime(s.savedAt)} ({s.memberCount} member{s.memberCount === 1 ? "" : "s"})
                </Link>
              </li>
            ))}
          </ul>
        ) : null}
        <Link href="/sheets" className="inline-flex min-h-touch w-fit items-center">
          All your job sheets
        </Link>
      </div>
    </Card>
  );
}
