// Reading a PDF's text back in tests, two ways: a small parser of pdfkit's own content streams (always
// available), and poppler's pdftotext when it is installed (Debian's poppler-utils), as an outside reader.
import { execFileSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { inflateSync } from "node:zlib";

/** Is this a whole PDF file: the header, at least one page, a cross-reference table and the end marker. */
export function isPdf(buf: Buffer): boolean {
  const head = buf.subarray(0, 8).toString("latin1");
  const tail = buf.subarray(Math.max(0, buf.length - 64)).toString("latin1");
  const body = buf.toString("latin1");
  return /^%PDF-1\.\d/.test(head) && /%%EOF\s*$/.test(tail) && body.includes("/Type /Page") && /\nxref\n/.test(body) && /startxref\s+\d+/.test(tail);
}

/**
 * The text drawn by each TJ operator of every Flate content stream, one line per operator. pdfkit writes
 * the standard fonts' text as hex strings of WinAnsi bytes, split where it kerns: `[<4d6172> 15 <7368>] TJ`.
 */
export function pdfStreamText(buf: Buffer): string {
  const raw = buf.toString("latin1");
  const lines: string[] = [];
  const re = /\/Filter \/FlateDecode[^]*?stream\r?\n/g;
  let m: RegExpExecArray | null;
  while ((m = re.exec(raw))) {
    const start = m.index + m[0].length;
    const end = raw.indexOf("endstream", start);
    if (end < 0) break;
    let content: string;
    try {
      content = inflateSync(buf.subarray(start, end)).toString("latin1");
    } catch {
      continue;
    }
    for (const tj of content.matchAll(/\[([^\]]*)\]\s*TJ/g)) {
      const text = [...tj[1].matchAll(/<([0-9a-fA-F]*)>/g)].map((h) => Buffer.from(h[1], "hex").toString("latin1")).join("");
      lines.push(text);
    }
  }
  return lines.join("\n");
}

export function hasPdftotext(): boolean {
  try {
    execFileSync("pdftotext", ["-v"], { stdio: "ignore" });
    return true;
  } catch {
    return false;
  }
}

/** poppler's reading of the PDF, with the layout kept. */
export function pdftotext(buf: Buffer): string {
  const dir = mkdtempSync(path.join(tmpdir(), "sheet-pdf-"));
  try {
    const file = path.join(dir, "sheet.pdf");
    writeFileSync(file, buf);
    return execFileSync("pdftotext", ["-layout", file, "-"], { encoding: "utf8" });
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
