import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { env } from "@/lib/env";
import { logger } from "@/lib/logger";

/** One message: plain text for every mail reader, HTML for those that show it. */
export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html: string;
  /** files sent with it (an order list's CSV and PDF) */
  attachments?: { filename: string; content: Buffer | string; contentType: string }[];
}

export interface SentMail {
  messageId: string;
}

const holder = globalThis as unknown as { spanlarkMailer?: Transporter };

/** The SMTP transport from SMTP_* (a local sink such as maildev in development and tests). */
function transporter(): Transporter {
  if (!holder.spanlarkMailer) {
    const { SMTP_HOST, SMTP_PORT, SMTP_SECURE, SMTP_USER, SMTP_PASS } = env();
    holder.spanlarkMailer = nodemailer.createTransport({
      host: SMTP_HOST,
      port: SMTP_PORT,
      secure: SMTP_SECURE,
      auth: SMTP_USER ? { user: SMTP_USER, pass: SMTP_PASS ?? "" } : undefined,
      // A local sink offers no TLS; a real relay on 587 upgrades with STARTTLS as usual.
      ignoreTLS: !SMTP_SECURE && !SMTP_USER,
      connectionTimeout: 10_000,
      greetingTimeout: 10_000,
      socketTimeout: 20_000,
    });
  }
  return holder.spanlarkMailer;
}

/** Sends one mail from MAIL_FROM. Throws when the SMTP server refuses it; callers decide what the user sees. */
export async function sendMail(message: MailMessage): Promise<SentMail> {
  const info = await transporter().sendMail({
    from: env().MAIL_FROM,
    to: message.to,
    subject: message.subject,
    text: message.text,
    html: message.html,
    attachments: message.attachments,
  });
  logger.info({ messageId: info.messageId, subject: message.subject }, "mail sent");
  return { messageId: info.messageId };
}

/** Forgets the cached transport (tests that point SMTP_* at a sink of their own). */
export function resetMailTransport(): void {
  holder.spanlarkMailer?.close();
  holder.spanlarkMailer = undefined;
}
