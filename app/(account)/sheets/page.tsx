import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { SheetList } from "@/components/sheets/sheet-list";
import { PageHeader } from "@/components/ui/page-header";
import { getSessionUser } from "@/lib/auth/session";
import { SHEET_LAPSED_WORDS, sheetAccess } from "@/lib/sheets/access";
import { listJobSheets } from "@/lib/sheets/sheets";

export const metadata: Metadata = { title: "Job sheets" };
export const dynamic = "force-dynamic";

// GET /sheets — every job sheet the signed-in account saved, newest first
export default async function SheetsPage() {
  const user = await getSessionUser();
  if (!user) redirect("/sign-in?callbackUrl=%2Fsheets");
  const [sheets, access] = await Promise.all([listJobSheets(user.id), sheetAccess(user)]);
  return (
    <div className="flex flex-col gap-4 pb-10">
      <PageHeader title="Job sheets" lead="Sheets keep each job's members exactly as they were worked out on the day you saved them." />
      {access.canCreate ? null : (
        <p className="rounded-card border-2 border-caution bg-caution-bg p-4" data-testid="sheets-lapsed">
          {SHEET_LAPSED_WORDS}
        </p>
      )}
      <SheetList sheets={sheets} emptyHint="Open a job and press “Save job sheet” to make one." />
    </div>
  );
}
