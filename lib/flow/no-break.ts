/**
 * Trade fractions stay whole on a line: "1-1/2"" and "11-7/8" are one word to a builder, but a browser
 * breaks after their hyphen on a narrow phone ("1-" at the end of one line, "1/2"" on the next). The
 * screens draw these pieces in no-wrap spans (components/ui/trade-text.tsx); copied text keeps its
 * plain hyphen. Pure.
 */

/** A whole number, a hyphen and a fraction, with the inch mark when there is one ("1-1/2"", "11-7/8"); or a ply count ("3-ply"). */
const KEEP_WHOLE = /\d+-\d+\/\d+"?|\d+-ply\b/g;

export interface TextPiece {
  text: string;
  /** a piece that must not break across lines */
  whole: boolean;
}

/** The text in pieces, the trade fractions and ply counts marked whole. */
export function tradePieces(text: string): TextPiece[] {
  const out: TextPiece[] = [];
  let last = 0;
  for (const m of text.matchAll(KEEP_WHOLE)) {
    const at = m.index ?? 0;
    if (at > last) out.push({ text: text.slice(last, at), whole: false });
    out.push({ text: m[0], whole: true });
    last = at + m[0].length;
  }
  if (last < text.length) out.push({ text: text.slice(last), whole: false });
  return out;
}
