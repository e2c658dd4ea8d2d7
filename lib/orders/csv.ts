import Papa from "papaparse";
import { formatStockLength, type OrderList } from "./order-list";

export const ORDER_CSV_COLUMNS = ["group", "item", "length_ft", "quantity", "unit", "cost_per_ft_usd", "price_usd", "for", "notes"] as const;

/**
 * The order list as CSV, one line per order line. Cells a spreadsheet would run as a formula (starting
 * with = + - @, a tab or a carriage return) are written with a leading apostrophe (papaparse's
 * escapeFormulae), so a member named "=HYPERLINK(...)" stays text. Unpriced lines leave the price blank
 * and say so in the notes.
 */
export function orderCsv(list: OrderList): string {
  const rows: string[][] = [];
  for (const group of list.groups) {
    for (const line of group.lines) {
      rows.push([
        group.name,
        line.item,
        line.lengthFt === null ? "" : String(line.lengthFt),
        String(line.quantity),
        line.unit,
        line.costPerFt === null ? "" : line.costPerFt.toFixed(2),
        line.price === null ? "" : line.price.toFixed(2),
        line.uses.join("; "),
        [...line.notes, ...(line.price === null ? ["no price in the cost table"] : [])].join("; "),
      ]);
    }
  }
  rows.push(["Total of priced lines", "", "", "", "", "", list.total.toFixed(2), `${list.unpriced} line${list.unpriced === 1 ? "" : "s"} without a price`, ""]);
  const body = Papa.unparse({ fields: [...ORDER_CSV_COLUMNS], data: rows }, { newline: "\r\n", escapeFormulae: true });
  return `${body}\r\n`;
}

/** "16 ft x 13 pcs" — a line as one phrase, for mail and PDF. */
export function linePhrase(line: { lengthFt: number | null; quantity: number; unit: string }): string {
  return line.lengthFt === null ? `${line.quantity} ${line.unit}` : `${line.quantity} ${line.unit} @ ${formatStockLength(line.lengthFt)}`;
}
