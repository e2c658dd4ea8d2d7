import PDFDocument from "pdfkit";
import { describe, expect, test } from "vitest";
import { formatInches } from "@/lib/flow/length";
import { tradePieces } from "@/lib/flow/no-break";
import { FONTS, SheetWriter } from "@/lib/sheets/pdf";
import { pdfStreamText } from "./pdf-text";

// Every sixteenth a builder measures to, as Spanlark writes it: 1/16" ... 11-15/16".
const FRACTIONS = Array.from({ length: 12 * 16 }, (_, i) => formatInches((i + 1) / 16)).filter((f) => f.includes("-"));

describe("trade fractions stay whole on a line", () => {
  test("the pieces mark every fraction and ply count whole, and join back to the same text", () => {
    const text = `2-ply 2x10 No.2 with 1/2" spacer — 1-1/2" bearing each end, 11-7/8 in PRI-40, 3-ply`;
    const pieces = tradePieces(text);
    expect(pieces.map((p) => p.text).join("")).toBe(text);
    expect(pieces.filter((p) => p.whole).map((p) => p.text)).toEqual(["2-ply", '1-1/2"', "11-7/8", "3-ply"]);
    for (const f of FRACTIONS)
      expect(
        tradePieces(`needs ${f} of bearing`)
          .filter((p) => p.whole)
          .map((p) => p.text),
      ).toEqual([f]);
  });

  test("the PDF (pdfkit's line breaking, Unicode UAX #14 LB25: no break between a hyphen and a digit) never splits a fraction", async () => {
    const doc = new PDFDocument({ size: "letter", margin: 36 });
    const chunks: Buffer[] = [];
    doc.on("data", (c: Buffer) => chunks.push(c));
    const done = new Promise<Buffer>((resolve) => doc.on("end", () => resolve(Buffer.concat(chunks))));
    const w = new SheetWriter(doc, FONTS, "letter");
    // narrow columns, each width a few points apart, so every fraction lands at a line's end somewhere
    for (let width = 40; width <= 160; width += 6) w.text(`W6x9 — ${FRACTIONS.slice(0, 60).join(" bearing ")}`, { width, size: 9 });
    doc.end();
    const lines = pdfStreamText(await done).split("\n");
    expect(lines.length).toBeGreaterThan(200);
    for (const line of lines) {
      expect(line, line).not.toMatch(/\d-\s*$/);
      expect(line, line).not.toMatch(/^\s*\d+\/\d+"/);
    }
  });
});
