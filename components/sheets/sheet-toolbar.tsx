"use client";

import { Button, ButtonLink, buttonClasses } from "@/components/ui/button";

export type SheetToolbarProps = {
  sheetId: string;
  canReprint: boolean;
  lapsedWords: string;
};

/** Print and PDF for a subscriber; for anyone else, plain words on what they can and cannot do. */
export function SheetToolbar({ sheetId, canReprint, lapsedWords }: SheetToolbarProps) {
  if (!canReprint) {
    return (
      <div className="no-print flex flex-col gap-3 rounded-card border-2 border-caution bg-caution-bg p-4" data-testid="sheet-reprint-locked">
        <p className="font-bold text-caution-ink">Reading only</p>
        <p>{lapsedWords}</p>
        <ButtonLink href="/pricing" variant="secondary" className="w-full sm:w-fit">
          See plans
        </ButtonLink>
      </div>
    );
  }
  return (
    <div className="no-print flex flex-col gap-2 sm:flex-row">
      {/* plain links: the browser downloads the file; the app's router must not try to render it */}
      <a href={`/api/sheets/${sheetId}/pdf`} download className={`${buttonClasses()} w-full sm:w-auto`} data-testid="sheet-pdf-letter">
        Download PDF (Letter)
      </a>
      <a href={`/api/sheets/${sheetId}/pdf?paper=a4`} download className={`${buttonClasses({ variant: "secondary" })} w-full sm:w-auto`}>
        PDF on A4
      </a>
      <Button variant="secondary" onClick={() => window.print()} className="w-full sm:w-auto">
        Print
      </Button>
    </div>
  );
}
