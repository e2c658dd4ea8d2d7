import { formatDollars, formatStockLength, type OrderLine, type OrderList } from "@/lib/orders/order-list";
import { renderMail, type MailBlock, type RenderedMail } from "./layout";

export interface OrderListMailInput {
  jobName: string;
  siteAddress?: string | null;
  senderName: string;
  senderCompany?: string | null;
  note?: string | null;
  list: OrderList;
}

/** " — for J1 floor joists: 13 joists (note)": which members the pieces are for, so the yard can ask about one. */
function forWhat(line: OrderLine): string {
  const uses = line.uses.length > 0 ? ` — for ${line.uses.join("; ")}` : "";
  const notes = line.notes.length > 0 ? ` (${line.notes.join("; ")})` : "";
  return uses + notes;
}

/** Sent when a builder e-mails a job's order list to a yard: every line in the body, the CSV and PDF attached. */
export function orderListMail({ jobName, siteAddress, senderName, senderCompany, note, list }: OrderListMailInput): RenderedMail {
  const sender = senderCompany ? `${senderName} (${senderCompany})` : senderName;
  const blocks: MailBlock[] = [
    { kind: "para", text: "Hello," },
    { kind: "para", text: `${sender} sends this lumber order for "${jobName}". The same list is attached as a spreadsheet (CSV) and a PDF.` },
  ];
  if (siteAddress)
    blocks.push({
      kind: "rows",
      rows: [
        ["Job", jobName],
        ["Deliver to", siteAddress],
      ],
    });
  if (note?.trim()) blocks.push({ kind: "para", text: `Note from ${senderName}: ${note.trim()}` });
  for (const group of list.groups) {
    blocks.push({ kind: "para", text: group.name });
    blocks.push({
      kind: "rows",
      rows: group.lines.map((l) => [
        `${l.item}${l.lengthFt !== null ? ` × ${formatStockLength(l.lengthFt)}` : ""}`,
        `${l.quantity} ${l.unit}${l.price !== null ? ` — ${formatDollars(l.price)}` : " — no price on file"}${forWhat(l)}`,
      ]),
    });
  }
  blocks.push({
    kind: "para",
    text: `Priced lines: ${formatDollars(list.total)}${list.unpriced > 0 ? `; ${list.unpriced} line${list.unpriced === 1 ? "" : "s"} to price at the yard` : ""}. Please confirm prices and availability with ${senderName}.`,
  });
  blocks.push({ kind: "caution" });
  return renderMail(`Lumber order: ${jobName}`, blocks);
}
