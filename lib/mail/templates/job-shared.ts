import { renderMail, type MailBlock, type RenderedMail } from "./layout";

export interface JobSharedMailInput {
  /** The crew link (read-only view of the job). */
  link: string;
  /** The job's name, e.g. "Marsh Lane addition". */
  jobName: string;
  /** Who shared it: the account's name. */
  senderName: string;
  senderCompany?: string | null;
  /** The job's site address, when the job has one. */
  siteAddress?: string | null;
  /** A short note from the sender, shown as they wrote it. */
  note?: string | null;
}

/** Sent by the jobs part when a builder sends a job's crew link to someone by e-mail. */
export function jobSharedMail({ link, jobName, senderName, senderCompany, siteAddress, note }: JobSharedMailInput): RenderedMail {
  const sender = senderCompany ? `${senderName} (${senderCompany})` : senderName;
  const blocks: MailBlock[] = [
    { kind: "para", text: "Hello," },
    { kind: "para", text: `${sender} shared the framing sizes for "${jobName}" with you on Spanlark.` },
  ];
  if (siteAddress)
    blocks.push({
      kind: "rows",
      rows: [
        ["Job", jobName],
        ["Site", siteAddress],
      ],
    });
  if (note?.trim()) blocks.push({ kind: "para", text: `Note from ${senderName}: ${note.trim()}` });
  blocks.push(
    { kind: "link", label: "Open the job", href: link },
    { kind: "para", text: "You can read the job without an account. Only the person who shared it can change it." },
    { kind: "caution" },
  );
  return renderMail(`${senderName} shared "${jobName}" with you`, blocks);
}
