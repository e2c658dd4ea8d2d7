import "server-only";
import PDFDocument from "pdfkit";
import { CAUTION as CAUTION_TEXT, CAUTION_TITLE, NOT_CHECKED } from "@/lib/caution";
import { FONTS, MARGIN, PAPER_SIZE, PDF_COLORS, pdfText, SheetWriter, type Paper } from "@/lib/sheets/pdf";
import { formatSheetDateTime } from "@/lib/sheets/format";
import { formatDollars, formatStockLength } from "./order-list";
import type { JobOrder } from "./queries";

/** Draws into a new PDF document and resolves with its bytes. */
export function renderPdf(info: { title: string; subject: string; createdAt: Date }, paper: Paper, draw: (w: SheetWriter) => void): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const doc = new PDFDocument({
      size: PAPER_SIZE[paper],
      margins: { top: MARGIN, bottom: MARGIN, left: MARGIN, right: MARGIN },
      info: { Title: pdfText(info.title), Subject: pdfText(info.subject), Creator: "Spanlark", CreationDate: info.createdAt },
      displayTitle: true,
      lang: "en-US",
    });
    const chunks: Buffer[] = [];
    doc.on("data", (c: Buffer) => chunks.push(c));
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
    try {
      draw(new SheetWriter(doc, FONTS, paper));
      doc.end();
    } catch (err) {
      reject(err);
    }
  });
}

/** The order list as a PDF for the yard: one table per species and grade (or product), priced where the cost table has the item. */
export function renderOrderPdf(order: JobOrder, paper: Paper = "letter"): Promise<Buffer> {
  const { job, list } = order;
  return renderPdf({ title: `Order list: ${job.name}`, subject: `Lumber order for ${job.name}`, createdAt: new Date(order.computedAt) }, paper, (w) => {
    w.text("Spanlark order list", { size: 9, color: PDF_COLORS.spruce, bold: true });
    w.text(job.name, { size: 18, bold: true });
    if (job.siteAddress) w.text(job.siteAddress, { size: 11, color: PDF_COLORS.graphite });
    w.text(`Worked out ${formatSheetDateTime(order.computedAt)} from the members as they are now.`, { size: 9, color: PDF_COLORS.graphite, gap: 0.4 });
    for (const group of list.groups) {
      w.heading(group.name, 12);
      w.table(
        ["Item", "Length", "Qty", "For", "$/ft", "Price"],
        group.lines.map((l) => [
          l.item,
          formatStockLength(l.lengthFt),
          `${l.quantity} ${l.unit}`,
          [...l.uses, ...l.notes].join("; "),
          l.costPerFt === null ? "" : formatDollars(l.costPerFt),
          l.price === null ? "no price" : formatDollars(l.price),
        ]),
        [0.2, 0.09, 0.1, 0.39, 0.09, 0.13],
        [false, true, true, false, true, true],
      );
    }
    w.heading("Total", 12);
    w.text(
      `${formatDollars(list.total)} for the priced lines${list.unpriced > 0 ? `; ${list.unpriced} line${list.unpriced === 1 ? " has" : "s have"} no price in the cost table` : ""}.`,
      { size: 11, bold: true, gap: 0.3 },
    );
    if (list.missing.length > 0) {
      w.heading("Not counted yet", 12);
      for (const m of list.missing) w.text(`• ${m}`, { size: 9.5 });
    }
    w.text(" ", { size: 6 });
    w.caution({ caution: { title: CAUTION_TITLE, text: CAUTION_TEXT, notChecked: [...NOT_CHECKED] } });
  });
}
