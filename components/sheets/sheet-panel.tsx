import { Link } from "@/components/ui/link";
import { Card } from "@/components/ui/card";
import { getSessionUser } from "@/lib/auth/session";
import { SHEET_LAPSED_WORDS, sheetAccess } from "@/lib/sheets/access";
import { formatSheetDateTime } from "@/lib/sheets/format";
import { listJobSheets } from "@/lib/sheets/sheets";
import { SaveSheetButton, SaveSheetOnArrival } from "./save-sheet-button";
import { ButtonLink } from "@/components/ui/button";

export type SheetPanelProps = {
  jobId: string;
  /** back from checkout that started on "Save job sheet": save it now */
  saveOnArrival?: boolean;
  /** the sheet just saved on arrival, to announce */
  savedSheetId?: string;
};

/** The job page's job sheet section (server): save a new sheet (subscribers) and the sheets saved before. */
export async function SheetPanel({ jobId, saveOnArrival = false, savedSheetId }: SheetPanelProps) {
  const user = await getSessionUser();
  if (!user) return null;
  const [sheets, access] = await Promise.all([listJobSheets(user.id, jobId), sheetAccess(user)]);
  return (
    <Card title="Job sheets" aria-label="Job sheets">
      <div className="flex flex-col gap-3">
        <p className="text-ink-soft">
          A job sheet keeps every member as it is worked out today — inputs, loads, checks, reactions, diagrams and the tables used — to print or download for
          the inspector, the same every time.
        </p>
        {savedSheetId && sheets.some((s) => s.id === savedSheetId) ? (
          <p role="status" className="rounded-card border-2 border-sound bg-sound-bg p-3 font-bold text-sound-ink" data-testid="sheet-saved-after-checkout">
            Subscribed, and your job sheet is saved.{" "}
            <Link href={`/sheets/${savedSheetId}`} className="text-sound-ink">
              Open it
            </Link>
          </p>
        ) : null}
        {access.canCreate && saveOnArrival ? <SaveSheetOnArrival jobId={jobId} /> : null}
        {access.canCreate ? (
          <SaveSheetButton jobId={jobId} />
        ) : (
          <div className="flex flex-col gap-2" data-testid="sheet-locked">
            <ButtonLink href={`/pricing?job=${jobId}`} className="w-full sm:w-fit" data-testid="sheet-save-subscribe">
              Save job sheet
            </ButtonLink>
            <p className="text-ink-soft">
              Saving job sheets needs a subscription. Choose a plan and you come back here with the sheet saved. {SHEET_LAPSED_WORDS}
            </p>
          </div>
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
