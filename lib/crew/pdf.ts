import "server-only";
import { CAUTION as CAUTION_TEXT, CAUTION_TITLE } from "@/lib/caution";
import { renderPdf } from "@/lib/orders/pdf";
import { formatSheetDate } from "@/lib/sheets/format";
import { PDF_COLORS, type Paper } from "@/lib/sheets/pdf";
import type { CrewJobView } from "./links";

/**
 * The one-page crew sheet for the site board: the job, what to build where (each member's answer line and
 * what each support needs), the caution in full, and the QR code of the crew link so a phone opens the
 * live schedule. Drawn from the same schedule rows as the crew page.
 */
export function renderCrewPdf(view: CrewJobView, link: { url: string; qrPng: Buffer }, paper: Paper = "letter", now: Date = new Date()): Promise<Buffer> {
  return renderPdf({ title: `Site board: ${view.job.name}`, subject: `Member schedule of ${view.job.name}`, createdAt: now }, paper, (w) => {
    const { doc } = w;
    const top = doc.y;
    const qrSize = 96;
    doc.image(link.qrPng, w.right - qrSize, top, { width: qrSize, height: qrSize });
    const textWidth = w.contentWidth - qrSize - 12;
    w.text("Spanlark crew sheet · read only", { size: 9, bold: true, color: PDF_COLORS.spruce, width: textWidth });
    w.text(view.job.name, { size: 20, bold: true, width: textWidth });
    if (view.job.siteAddress) w.text(view.job.siteAddress, { size: 12, color: PDF_COLORS.graphite, width: textWidth });
    w.text(`Printed ${formatSheetDate(now.toISOString())}. Scan the code for the live schedule: sizes change when the builder changes them.`, {
      size: 9,
      color: PDF_COLORS.graphite,
      width: textWidth,
    });
    doc.y = Math.max(doc.y, top + qrSize) + 6;
    if (view.job.notes.trim()) {
      w.heading("Notes from the builder", 12);
      w.text(view.job.notes, { size: 10 });
    }
    w.heading("What to build, and where", 13);
    w.table(
      ["Member", "Build", "Span", "At each support"],
      view.rows.map((r) => [
        `${r.label}\n${r.kindLabel}`,
        r.headline
          ? [r.headline, r.verdict && !r.verdict.pass ? r.verdict.words : "", ...r.problems, r.change ?? "", ...r.carried.map((c) => `Loads on it: ${c}`)]
              .filter(Boolean)
              .join("\n")
          : "No size chosen yet: ask the builder",
        r.span,
        r.supports.map((s) => (s.bearing ? `${s.name}: ${s.bearing}; ${s.reaction}` : `${s.name}: ${s.reaction}`)).join("\n"),
      ]),
      [0.2, 0.34, 0.14, 0.32],
      [false, false, false, false],
      9.5,
    );
    w.caution({ caution: { title: CAUTION_TITLE, text: CAUTION_TEXT, notChecked: [...view.notChecked] } });
    w.text("Jack studs are 1-1/2 in studs under each end of a header. Ask the builder before changing any size.", { size: 9, color: PDF_COLORS.graphite });
  });
}
