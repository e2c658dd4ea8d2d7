import { CAUTION } from "@/lib/caution";

/** What every template returns: a subject and the same words as plain text and as simple HTML. */
export interface RenderedMail {
  subject: string;
  text: string;
  html: string;
}

const HTML_ESCAPES: Record<string, string> = { "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" };

/** Escapes text for HTML; every value that came from a user (names, job names) goes through it. */
export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => HTML_ESCAPES[c]);
}

/** A block of the mail: paragraphs of plain words, a button-like link, or the sizing caution. */
export type MailBlock =
  | { kind: "para"; text: string }
  | { kind: "link"; label: string; href: string }
  | { kind: "caution" }
  | { kind: "rows"; rows: ReadonlyArray<readonly [string, string]> };

export const MAIL_CAUTION = CAUTION;

const FOOTER = "Spanlark — sizing joists, headers and beams for house framing.";

/** Renders blocks to plain text and to HTML with inline styles (mail readers ignore style sheets). */
export function renderMail(subject: string, blocks: readonly MailBlock[]): RenderedMail {
  const text = blocks
    .map((b) => {
      switch (b.kind) {
        case "para":
          return b.text;
        case "link":
          return `${b.label}:\n${b.href}`;
        case "caution":
          return `Check before you build: ${MAIL_CAUTION}`;
        case "rows":
          return b.rows.map(([k, v]) => `${k}: ${v}`).join("\n");
      }
    })
    .concat(["--", FOOTER])
    .join("\n\n");

  const body = blocks
    .map((b) => {
      switch (b.kind) {
        case "para":
          return `<p style="margin:0 0 16px;font-size:17px;line-height:1.5;color:#15191E">${escapeHtml(b.text)}</p>`;
        case "link":
          return (
            `<p style="margin:0 0 16px"><a href="${escapeHtml(b.href)}" style="display:inline-block;padding:12px 20px;` +
            `background:#1A5247;color:#FFFFFF;font-weight:bold;font-size:17px;text-decoration:none;border-radius:8px">` +
            `${escapeHtml(b.label)}</a></p>` +
            `<p style="margin:0 0 16px;font-size:15px;color:#434A56">Or paste this address into your browser: ` +
            `<span style="word-break:break-all">${escapeHtml(b.href)}</span></p>`
          );
        case "caution":
          return (
            `<div style="margin:0 0 16px;padding:12px;border:2px solid #8A5A00;border-left-width:8px;background:#FFF4D6;` +
            `color:#15191E;font-size:15px;line-height:1.5"><strong style="color:#6B4600">&#9888; Check before you build.</strong> ` +
            `${escapeHtml(MAIL_CAUTION)}</div>`
          );
        case "rows":
          return (
            `<table style="margin:0 0 16px;border-collapse:collapse;font-size:17px;color:#15191E">` +
            b.rows
              .map(
                ([k, v]) =>
                  `<tr><td style="padding:4px 16px 4px 0;color:#434A56">${escapeHtml(k)}</td>` +
                  `<td style="padding:4px 0;font-weight:bold">${escapeHtml(v)}</td></tr>`,
              )
              .join("") +
            `</table>`
          );
      }
    })
    .join("\n");

  const html =
    `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>${escapeHtml(subject)}</title></head>` +
    `<body style="margin:0;padding:0;background:#F7F5EF;font-family:Arial,Helvetica,sans-serif">` +
    `<div style="max-width:560px;margin:0 auto;padding:24px 16px">` +
    `<p style="margin:0 0 24px;font-size:20px;font-weight:bold;color:#1A5247">Spanlark</p>\n${body}\n` +
    `<p style="margin:24px 0 0;padding-top:12px;border-top:1px solid #D8D4C8;font-size:14px;color:#434A56">${escapeHtml(FOOTER)}</p>` +
    `</div></body></html>`;

  return { subject, text, html };
}

/** "Dee" from "Dee Rowe"; a plain greeting when the name is blank. */
export function greeting(name: string | null | undefined): string {
  const first = (name ?? "").trim().split(/\s+/)[0];
  return first ? `Hello ${first},` : "Hello,";
}
