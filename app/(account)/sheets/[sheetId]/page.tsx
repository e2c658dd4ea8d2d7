import type { Metadata } from "next";
import { notFound, redirect } from "next/navigation";
import { PageHeader } from "@/components/ui/page-header";
import { SheetDocument } from "@/components/sheets/sheet-document";
import { SheetPrintStyles } from "@/components/sheets/print-styles";
import { SheetToolbar } from "@/components/sheets/sheet-toolbar";
import { getSessionUser } from "@/lib/auth/session";
import { HttpError } from "@/lib/http";
import { SHEET_LAPSED_WORDS, sheetAccess } from "@/lib/sheets/access";
import { getJobSheet, newerNumbers, type SheetRecord } from "@/lib/sheets/sheets";
import { liveCrewLinkUrl } from "@/lib/crew/links";
import { crewQrSvg } from "@/lib/crew/qr";

export const metadata: Metadata = { title: "Job sheet", robots: { index: false, follow: false } };
export const dynamic = "force-dynamic";

type SheetPageProps = { params: Promise<{ sheetId: string }> };

// GET /sheets/[sheetId] — one job sheet, printable, read from its frozen snapshot; owner only (404 for others)
export default async function SheetPage({ params }: SheetPageProps) {
  const { sheetId } = await params;
  const user = await getSessionUser();
  if (!user) redirect(`/sign-in?callbackUrl=${encodeURIComponent(`/sheets/${sheetId}`)}`);
  let sheet: SheetRecord;
  try {
    sheet = await getJobSheet(user.id, sheetId);
  } catch (err) {
    if (err instanceof HttpError && err.status === 404) notFound();
    throw err;
  }
  const access = await sheetAccess(user);
  const newer = await newerNumbers(user.id, sheet);
  const crewUrl = await liveCrewLinkUrl(user.id, sheet.jobId);
  const crewQr = crewUrl ? { url: crewUrl, svg: await crewQrSvg(crewUrl) } : null;
  return (
    <div className="flex flex-col gap-4 pb-10">
      <SheetPrintStyles />
      <div className="no-print">
        <PageHeader
          title="Job sheet"
          lead={sheet.title}
          back={sheet.jobId ? { href: `/jobs/${sheet.jobId}`, label: "Job" } : { href: "/sheets", label: "Job sheets" }}
        />
        <SheetToolbar sheetId={sheet.id} canReprint={access.canReprint} lapsedWords={SHEET_LAPSED_WORDS} />
      </div>
      {newer.length > 0 ? (
        <div className="rounded-lg border-2 border-caution-ink/40 bg-caution-bg p-3 text-ink" data-testid="sheet-newer" role="status">
          <p className="font-bold">⚠ Newer numbers exist for this job. This sheet stays as it was saved; save a new sheet for the current answers.</p>
          <ul className="list-disc pl-6">
            {newer.map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
        </div>
      ) : null}
      {access.canReprint ? null : (
        <p className="sheet-print-blocked hidden text-lg">
          Printing a job sheet needs a subscription. This sheet can be read on screen at Spanlark; subscribe to print or download it.
        </p>
      )}
      <SheetDocument snapshot={sheet.snapshot} crewQr={crewQr} />
    </div>
  );
}
