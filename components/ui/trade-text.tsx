import { tradePieces } from "@/lib/flow/no-break";

export type TradeTextProps = { text: string };

/** Text whose trade fractions ("1-1/2"", "11-7/8") and ply counts never break after their hyphen. */
export function TradeText({ text }: TradeTextProps) {
  return (
    <>
      {tradePieces(text).map((p, i) =>
        p.whole ? (
          <span key={i} className="whitespace-nowrap">
            {p.text}
          </span>
        ) : (
          p.text
        ),
      )}
    </>
  );
}
