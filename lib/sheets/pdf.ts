import "server-only";
import PDFDocument from "pdfkit";
import { diagramChain, valueRange, type BezierChain } from "@/lib/diagrams/geometry";
import { INK } from "@/lib/diagrams/palette";
import { formatFeetInches, formatInches } from "@/lib/flow/length";
import { FROM_MEMORY } from "@/lib/tables/citations";
import { sheetSources, type SheetDiagram, type SheetMember, type SheetSnapshot } from "./snapshot";
import { checkWords } from "@/lib/solver/design/check-words";
import { byCaseWords, formatCheckValue, formatLb, formatSheetDate, ratioPercent, supportName } from "./format";

/**
 * The job sheet as a PDF (pdfkit), drawn only from the frozen snapshot. Diagrams are vector paths: each
 * exact polynomial piece of the solver becomes a cubic Bézier (components/diagrams/geometry), so the
 * printed curve is the computed one at any zoom.
 *
 * Fonts: pdfkit's built-in Helvetica and Helvetica-Bold (WinAnsi). The .woff2 files in fonts/ do not
 * load properly in pdfkit 0.20: fontkit subsets Atkinson Hyperlegible's WOFF2 into a font that PDF readers
 * draw as blank (the text is there for copy and search but nothing shows on paper; checked with poppler's
 * pdftoppm), and it crashes outright on IBM Plex Mono's composite glyphs (é, ½). Converting the fonts to
 * TTF would need a tool outside the project, so the sheet uses the standard fonts every PDF reader has.
 * Helvetica's figures are all one width, so columns of numbers still line up. Text goes through pdfText()
 * first: WinAnsi lacks ⊥, ′, Greek letters and arrows, which are written out in plain letters instead.
 */

export type Paper = "letter" | "a4";

export const PAPER_SIZE: Record<Paper, [number, number]> = { letter: [612, 792], a4: [595.28, 841.89] };
export const MARGIN = 48;

export const PDF_COLORS = {
  ink: "#15191E",
  graphite: "#434A56",
  rule: "#D8D4C8",
  spruce: "#1E5B4F",
  sound: "#1F7A3A",
  over: "#B3261E",
  caution: "#8A5A00",
  cautionBg: "#FFF4D6",
} as const;

const REPLACEMENTS: Record<string, string> = {
  "⊥": " perp",
  "′": "'",
  "″": '"',
  "≤": "<=",
  "≥": ">=",
  "→": "->",
  "←": "<-",
  "√": "sqrt",
  Ω: "Omega ",
  φ: "phi ",
  λ: "lambda ",
  Δ: "Delta ",
  δ: "delta ",
  ξ: "xi",
  "⁴": "^4",
  "−": "-",
  "✓": "",
  "✗": "",
};

/** Text Helvetica (WinAnsi) can draw: known symbols written out, anything else outside Latin-1 dropped to "?". */
export function pdfText(value: string): string {
  let out = "";
  for (const ch of value) {
    if (ch in REPLACEMENTS) out += REPLACEMENTS[ch];
    else if (/[\u0020-\u007e\u00a0-\u00ff\u2013\u2014\u2018\u2019\u201c\u201d\u2022\u2026]/.test(ch)) out += ch;
    else if (ch === "\n") out += ch;
    else out += "?";
  }
  return out;
}

export interface Fonts {
  regular: string;
  bold: string;
}

export const FONTS: Fonts = { regular: "Helvetica", bold: "Helvetica-Bold" };

/** A page writer shared by the job sheet, the order list and the crew's site-board PDF. */
export class SheetWriter {
  readonly doc: PDFKit.PDFDocument;
  readonly fonts: Fonts;
  readonly width: number;
  readonly height: number;

  constructor(doc: PDFKit.PDFDocument, fonts: Fonts, paper: Paper) {
    this.doc = doc;
    this.fonts = fonts;
    [this.width, this.height] = PAPER_SIZE[paper];
  }

  get left() {
    return MARGIN;
  }
  get right() {
    return this.width - MARGIN;
  }
  get contentWidth() {
    return this.width - 2 * MARGIN;
  }
  get bottom() {
    return this.height - MARGIN - 18;
  }

  ensure(space: number): void {
    if (this.doc.y + space > this.bottom) this.doc.addPage();
  }

  text(
    value: string,
    opts: { size?: number; bold?: boolean; color?: string; x?: number; width?: number; gap?: number; align?: "left" | "right" | "center" } = {},
  ): void {
    const { doc } = this;
    doc
      .font(opts.bold ? this.fonts.bold : this.fonts.regular)
      .fontSize(opts.size ?? 10)
      .fillColor(opts.color ?? PDF_COLORS.ink);
    doc.text(pdfText(value), opts.x ?? this.left, doc.y, { width: opts.width ?? this.contentWidth, align: opts.align ?? "left" });
    if (opts.gap) doc.moveDown(opts.gap);
  }

  heading(value: string, size = 13): void {
    this.ensure(size * 3);
    this.doc.moveDown(0.6);
    this.text(value, { size, bold: true });
    const y = this.doc.y + 2;
    this.doc.moveTo(this.left, y).lineTo(this.right, y).lineWidth(0.75).strokeColor(PDF_COLORS.rule).stroke();
    this.doc.y = y + 5;
  }

  /** A table: widths as fractions of the content width; figures right-aligned where `numeric` says. */
  table(
    headers: string[],
    rows: string[][],
    widths: number[],
    numeric: boolean[] = [],
    size = 9,
    decorate?: (row: number, cell: (col: number) => { x: number; w: number }, y: number, h: number) => void,
  ): void {
    const { doc } = this;
    const cols = widths.map((w) => w * this.contentWidth);
    const cell = (col: number) => ({ x: this.left + cols.slice(0, col).reduce((a, b) => a + b, 0), w: cols[col] });
    const drawRow = (cells: string[], bold: boolean, index: number) => {
      doc.font(bold ? this.fonts.bold : this.fonts.regular).fontSize(size);
      const heights = cells.map((c, i) => doc.heightOfString(pdfText(c), { width: cols[i] - 6 }));
      const h = Math.max(...heights, size) + 6;
      if (doc.y + h > this.bottom) {
        doc.addPage();
        if (!bold) drawRow(headers, true, -1);
      }
      const y = doc.y;
      let x = this.left;
      cells.forEach((c, i) => {
        doc.fillColor(bold ? PDF_COLORS.graphite : PDF_COLORS.ink).text(pdfText(c), x + 3, y + 3, { width: cols[i] - 6, align: numeric[i] ? "right" : "left" });
        x += cols[i];
      });
      doc
        .moveTo(this.left, y + h)
        .lineTo(this.right, y + h)
        .lineWidth(bold ? 0.9 : 0.4)
        .strokeColor(PDF_COLORS.rule)
        .stroke();
      if (!bold && decorate) decorate(index, cell, y, h);
      doc.x = this.left;
      doc.y = y + h;
    };
    drawRow(headers, true, -1);
    rows.forEach((r, i) => drawRow(r, false, i));
    doc.moveDown(0.3);
  }

  /** A ratio bar with a marked 100% line, a word and a percentage: never color alone. */
  ratioBar(x: number, y: number, w: number, ratio: number): void {
    const { doc } = this;
    const full = w / 1.5;
    const filled = Math.min(ratio, 1.5) * full;
    doc.rect(x, y, w, 7).lineWidth(0.5).strokeColor(PDF_COLORS.rule).stroke();
    doc
      .rect(x, y, filled, 7)
      .fillColor(ratio <= 1 ? PDF_COLORS.sound : PDF_COLORS.over)
      .fill();
    doc
      .moveTo(x + full, y - 2)
      .lineTo(x + full, y + 9)
      .lineWidth(1.2)
      .strokeColor(PDF_COLORS.ink)
      .stroke();
  }

  caution(snapshot: Pick<SheetSnapshot, "caution">): void {
    const { doc } = this;
    const body = pdfText(snapshot.caution.text);
    const list = snapshot.caution.notChecked.map((s) => `• ${pdfText(s)}`).join("\n");
    doc.font(this.fonts.regular).fontSize(9.5);
    const inner = this.contentWidth - 28;
    const h = 22 + doc.heightOfString(body, { width: inner }) + 16 + doc.heightOfString(list, { width: inner }) + 12;
    this.ensure(h + 8);
    const top = doc.y;
    doc.rect(this.left, top, this.contentWidth, h).fillColor(PDF_COLORS.cautionBg).fill();
    doc.rect(this.left, top, 5, h).fillColor(PDF_COLORS.caution).fill();
    doc.rect(this.left, top, this.contentWidth, h).lineWidth(1).strokeColor(PDF_COLORS.caution).stroke();
    // warning triangle drawn as a path, with its mark
    const tx = this.left + 14;
    const ty = top + 8;
    doc
      .moveTo(tx + 6, ty)
      .lineTo(tx + 12, ty + 11)
      .lineTo(tx, ty + 11)
      .closePath()
      .lineWidth(1.2)
      .strokeColor(PDF_COLORS.caution)
      .stroke();
    doc
      .moveTo(tx + 6, ty + 3.5)
      .lineTo(tx + 6, ty + 7.5)
      .stroke();
    doc
      .circle(tx + 6, ty + 9.3, 0.6)
      .fillColor(PDF_COLORS.caution)
      .fill();
    doc
      .font(this.fonts.bold)
      .fontSize(11)
      .fillColor(PDF_COLORS.ink)
      .text(pdfText(snapshot.caution.title), tx + 18, top + 8, { width: inner });
    doc
      .font(this.fonts.regular)
      .fontSize(9.5)
      .text(body, this.left + 14, doc.y + 3, { width: inner });
    doc.font(this.fonts.bold).text("Spanlark does not check:", this.left + 14, doc.y + 5, { width: inner });
    doc.font(this.fonts.regular).text(list, this.left + 14, doc.y + 1, { width: inner });
    doc.x = this.left;
    doc.y = top + h + 8;
  }

  diagram(d: SheetDiagram, lengthFt: number, supports: SheetMember["supports"]): void {
    const { doc } = this;
    const h = 92;
    this.ensure(h + 40);
    const title = `${d.title} (${d.unit}), ${d.combination}`;
    this.text(title, { size: 9.5, bold: true });
    const top = doc.y + 12;
    const plotLeft = this.left + 10;
    const plotRight = this.right - 10;
    const xs = d.extremes.map((e) => e.x);
    const range = valueRange(d.segments, d.quantity, xs);
    // deflection is positive downward: draw it below the axis, as the member bends
    const flip = d.quantity === "deflection" ? -1 : 1;
    const lo = Math.min(range.min * flip, range.max * flip, 0);
    const hi = Math.max(range.min * flip, range.max * flip, 0);
    const span = hi - lo || 1;
    const sx = (x: number) => plotLeft + (x / lengthFt) * (plotRight - plotLeft);
    const sy = (v: number) => top + h - ((v * flip - lo) / span) * h;

    // squared-paper grid
    doc.lineWidth(0.3).strokeColor(INK.grid);
    for (let gx = plotLeft; gx <= plotRight + 0.1; gx += (plotRight - plotLeft) / 16)
      doc
        .moveTo(gx, top)
        .lineTo(gx, top + h)
        .stroke();
    for (let k = 0; k <= 4; k++)
      doc
        .moveTo(plotLeft, top + (h * k) / 4)
        .lineTo(plotRight, top + (h * k) / 4)
        .stroke();

    const chain: BezierChain = diagramChain(d.segments, d.quantity, xs);
    const tone =
      d.quantity === "V"
        ? { stroke: INK.spruce, fill: INK.spruceLight }
        : d.quantity === "M"
          ? { stroke: INK.amberDark, fill: INK.amberLight }
          : { stroke: INK.ink, fill: null };
    const trace = () => {
      doc.moveTo(sx(chain.start[0]), sy(chain.start[1]));
      for (const [c1, c2, p] of chain.pieces) doc.bezierCurveTo(sx(c1[0]), sy(c1[1]), sx(c2[0]), sy(c2[1]), sx(p[0]), sy(p[1]));
    };
    if (tone.fill) {
      trace();
      doc.closePath().fillColor(tone.fill).fill();
    }
    trace();
    doc.lineWidth(1.4).strokeColor(tone.stroke);
    if (d.quantity === "deflection") doc.dash(4, { space: 3 });
    doc.stroke();
    doc.undash();

    // the member's axis and its supports
    const axisY = sy(0);
    doc.moveTo(plotLeft, axisY).lineTo(plotRight, axisY).lineWidth(0.9).strokeColor(PDF_COLORS.ink).stroke();
    for (const s of supports) {
      const x = sx(s.x);
      doc
        .moveTo(x, top + h + 4)
        .lineTo(x + 5, top + h + 12)
        .lineTo(x - 5, top + h + 12)
        .closePath()
        .lineWidth(0.8)
        .strokeColor(PDF_COLORS.graphite)
        .stroke();
    }

    // extremes: value and position
    doc.font(this.fonts.regular).fontSize(8).fillColor(PDF_COLORS.ink);
    for (const e of d.extremes) {
      const x = sx(e.x);
      const y = sy(e.value);
      doc.circle(x, y, 1.8).fillColor(PDF_COLORS.ink).fill();
      const label = pdfText(`${formatCheckValue(e.value, d.unit)} at ${formatFeetInches(e.x)}`);
      const w = doc.widthOfString(label);
      const lx = Math.min(Math.max(x - w / 2, plotLeft), plotRight - w);
      const above = e.value * flip >= 0;
      doc.fillColor(PDF_COLORS.ink).text(label, lx, above ? y - 11 : y + 3, { lineBreak: false });
    }
    doc.x = this.left;
    doc.y = top + h + 18;
  }
}

/** The job's live crew link on a sheet: the address and its QR code (PNG). */
export interface SheetCrewLink {
  url: string;
  qrPng: Buffer;
}

function drawCrewLink(w: SheetWriter, crew: SheetCrewLink): void {
  const { doc } = w;
  const size = 72;
  w.ensure(size + 10);
  const top = doc.y + 4;
  doc.image(crew.qrPng, w.left, top, { width: size, height: size });
  doc.y = top + 10;
  w.text("Crew link", { size: 11, bold: true, x: w.left + size + 10, width: w.contentWidth - size - 10 });
  w.text("Scan for the live member schedule, read only.", { size: 9.5, x: w.left + size + 10, width: w.contentWidth - size - 10 });
  w.text(crew.url, { size: 8, color: PDF_COLORS.graphite, x: w.left + size + 10, width: w.contentWidth - size - 10 });
  doc.x = w.left;
  doc.y = top + size + 6;
}

function drawHeader(w: SheetWriter, s: SheetSnapshot): void {
  const { doc } = w;
  w.text("Job sheet", { size: 10, bold: true, color: PDF_COLORS.spruce });
  w.text(s.job.name, { size: 20, bold: true });
  if (s.job.siteAddress) w.text(s.job.siteAddress, { size: 11, color: PDF_COLORS.graphite });
  doc.moveDown(0.4);
  const by = s.preparedBy.company ? `${s.preparedBy.name}, ${s.preparedBy.company}` : s.preparedBy.name;
  w.table(
    ["Prepared by", "Saved", "Material tables", "Method"],
    [[by, formatSheetDate(s.savedAt), `${s.tablesLabel}\nid ${s.tablesVersion}`, "ASD (service loads)"]],
    [0.34, 0.22, 0.26, 0.18],
  );
  if (s.job.notes.trim()) {
    w.text(`Job notes: ${s.job.notes.trim()}`, { size: 9.5, gap: 0.4 });
  }
}

function drawSchedule(w: SheetWriter, s: SheetSnapshot): void {
  w.heading("Member schedule");
  w.table(
    ["Member", "Build", "Span", "Result"],
    s.members.map((m) => [
      `${m.label}\n${m.kindLabel}`,
      m.headline,
      formatFeetInches(m.spanFt),
      `${m.pass ? "OK" : "Over"} ${ratioPercent(m.ratio)} (${checkWords(m.governing)})`,
    ]),
    [0.24, 0.44, 0.12, 0.2],
  );
  if (s.loadPath && s.loadPath.length > 0) {
    w.heading("Posts and footings", 11);
    w.table(
      ["Member", "Build", "Result"],
      s.loadPath.map((r) => [
        `${r.label}\n${r.kindLabel}`,
        [r.headline, ...r.facts].join("\n"),
        `${r.pass ? "OK" : "Over"} ${ratioPercent(r.ratio)}${r.problems.length ? `\n${r.problems.join("\n")}` : ""}`,
      ]),
      [0.2, 0.56, 0.24],
    );
  }
  if (s.skipped.length > 0) {
    w.text("Not on this sheet:", { size: 9.5, bold: true });
    for (const k of s.skipped) w.text(`• ${k.label}: ${k.reason}`, { size: 9.5 });
  }
}

function drawMember(w: SheetWriter, m: SheetMember, index: number): void {
  const { doc } = w;
  doc.addPage();
  doc.outline.addItem(pdfText(m.label));
  w.text(`Member ${index + 1}: ${m.kindLabel}`, { size: 10, bold: true, color: PDF_COLORS.spruce });
  w.text(m.label, { size: 16, bold: true });
  w.text(m.headline, { size: 13, bold: true, gap: 0.2 });
  w.text(`${m.memberLabel}. ${m.pass ? "OK" : "Over"} ${ratioPercent(m.ratio)}, governed by ${checkWords(m.governing)}.`, {
    size: 10,
    color: m.pass ? PDF_COLORS.sound : PDF_COLORS.over,
    bold: true,
  });
  for (const f of m.facts ?? []) w.text(f, { size: 10 });
  if (m.note) w.text(m.note, { size: 9, color: PDF_COLORS.graphite });

  w.heading("Inputs", 11);
  w.table(["What", "Value"], m.inputs, [0.3, 0.7]);

  w.heading("Loads on the member", 11);
  w.table(
    ["Case", "Line load", "How it was found"],
    m.loads.map((l) => [l.case, l.w === null ? "—" : `${l.w.toLocaleString("en-US")} plf`, l.note]),
    [0.1, 0.18, 0.72],
    [false, true, false],
  );

  w.heading("Checks", 11);
  w.table(
    ["Check", "Demand", "Capacity", "Ratio", "", "Combination", "Where"],
    m.checks.map((c) => [
      checkWords(c.name),
      formatCheckValue(c.demand, c.unit),
      formatCheckValue(c.capacity, c.unit),
      `${c.ratio <= 1 ? "OK" : "Over"} ${ratioPercent(c.ratio)}`,
      "",
      c.combination ?? "—",
      c.x === null ? "—" : formatFeetInches(c.x),
    ]),
    [0.17, 0.15, 0.15, 0.13, 0.14, 0.14, 0.12],
    [false, true, true, true, false, false, true],
    9,
    (row, cell, y, h) => {
      const bar = cell(4);
      w.ratioBar(bar.x + 4, y + h / 2 - 3.5, bar.w - 10, m.checks[row].ratio);
    },
  );
  w.text("How each check was worked:", { size: 9, bold: true });
  for (const c of m.checks) w.text(`• ${checkWords(c.name)}: ${c.note}`, { size: 8.5 });

  w.heading("Reactions and bearing", 11);
  w.table(
    ["Support", "Largest down", "By load case", "Uplift", "Bearing given / needed", "Jack studs"],
    m.reactions.map((r, i) => [
      supportName(i, m.reactions.length, r.x),
      `${formatLb(r.maxDown)}\n${r.maxDownCombination}`,
      byCaseWords(r.byCase),
      r.uplift > 0 ? `${formatLb(r.uplift)} (${r.upliftCombination ?? ""})` : "none",
      `${formatInches(r.bearing)} / ${formatInches(r.requiredBearing)}`,
      r.jackStuds === null ? "—" : String(r.jackStuds),
    ]),
    [0.2, 0.15, 0.15, 0.15, 0.2, 0.15],
    [false, true, false, true, true, true],
  );

  w.heading("Diagrams", 11);
  for (const d of m.diagrams) w.diagram(d, m.lengthFt, m.supports);

  w.heading("Factors and design values", 11);
  const half = Math.ceil(m.factors.length / 2);
  const rows = m.factors.slice(0, half).map((f, i) => [f[0], f[1], m.factors[half + i]?.[0] ?? "", m.factors[half + i]?.[1] ?? ""]);
  w.table(["Factor", "Value", "Factor", "Value"], rows, [0.3, 0.2, 0.3, 0.2], [false, true, false, true], 8.5);
  w.text(
    `Deflection limits: ${m.limits.live === null ? "—" : `L/${m.limits.live}`} live, ${m.limits.total === null ? "—" : `L/${m.limits.total}`} total (${m.limits.source}).`,
    { size: 9 },
  );

  if (m.assumptions.length > 0) {
    w.heading("Assumptions", 11);
    for (const a of m.assumptions) w.text(`• ${a}`, { size: 9 });
  }
}

/** Appendix: where the design values come from; values no readable copy confirmed are flagged. */
function drawSources(w: SheetWriter, s: SheetSnapshot): void {
  const sources = sheetSources(s);
  if (sources.length === 0) return;
  w.heading("Appendix: where the design values come from", 13);
  if (sources.some((x) => x.fromMemory)) {
    w.text(`Marked "${FROM_MEMORY}": no readable copy of that table confirmed these values. Check them against the printed table.`, { size: 9 });
  }
  for (const { source, fromMemory } of sources) w.text(`• ${fromMemory ? `${FROM_MEMORY.toUpperCase()}: ` : ""}${source}`, { size: 9 });
}

function drawFooters(w: SheetWriter, s: SheetSnapshot): void {
  const { doc } = w;
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const y = w.height - MARGIN + 4;
    doc.font(w.fonts.regular).fontSize(8).fillColor(PDF_COLORS.graphite);
    const left = pdfText(`Spanlark job sheet · ${s.job.name} · saved ${formatSheetDate(s.savedAt)} · tables ${s.tablesLabel}`);
    doc.text(left, w.left, y, { width: w.contentWidth - 70, lineBreak: false, height: 10 });
    doc.text(`Page ${i - range.start + 1} of ${range.count}`, w.right - 70, y, { width: 70, align: "right", lineBreak: false, height: 10 });
  }
}

/** The sheet's PDF. The same snapshot gives the same pages (only the file's own id differs). */
export function renderSheetPdf(snapshot: SheetSnapshot, paper: Paper = "letter", crew: SheetCrewLink | null = null): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const doc = new PDFDocument({
      size: PAPER_SIZE[paper],
      margins: { top: MARGIN, bottom: MARGIN, left: MARGIN, right: MARGIN },
      bufferPages: true,
      info: {
        Title: pdfText(`Job sheet: ${snapshot.job.name}`),
        Author: pdfText(snapshot.preparedBy.company ?? snapshot.preparedBy.name),
        Subject: pdfText(`Members: ${snapshot.members.map((m) => m.label).join(", ")}`),
        Creator: "Spanlark",
        CreationDate: new Date(snapshot.savedAt),
      },
      displayTitle: true,
      lang: "en-US",
    });
    const chunks: Buffer[] = [];
    doc.on("data", (c: Buffer) => chunks.push(c));
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
    try {
      const w = new SheetWriter(doc, FONTS, paper);
      drawHeader(w, snapshot);
      if (crew) drawCrewLink(w, crew);
      w.caution(snapshot);
      drawSchedule(w, snapshot);
      snapshot.members.forEach((m, i) => drawMember(w, m, i));
      drawSources(w, snapshot);
      drawFooters(w, snapshot);
      doc.end();
    } catch (err) {
      reject(err);
    }
  });
}
