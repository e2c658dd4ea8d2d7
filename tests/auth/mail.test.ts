import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { SMTPServer } from "smtp-server";
import type { AddressInfo } from "node:net";
import { CAUTION as CAUTION_TEXT } from "@/lib/caution";
import { accountExistsMail } from "@/lib/mail/templates/account-exists";
import { jobSharedMail } from "@/lib/mail/templates/job-shared";
import { paymentReceiptMail } from "@/lib/mail/templates/payment-receipt";
import { resetNoAccountMail } from "@/lib/mail/templates/reset-no-account";
import { resetPasswordMail } from "@/lib/mail/templates/reset-password";
import { verifyEmailMail } from "@/lib/mail/templates/verify-email";

process.env.DATABASE_URL ??= "postgres://unused@127.0.0.1:1/unused";
process.env.NEXTAUTH_SECRET ??= "test-secret-for-vitest-only-0123456789";

const received: string[] = [];
const server = new SMTPServer({
  disabledCommands: ["STARTTLS", "AUTH"],
  onData(stream, _session, callback) {
    let data = "";
    stream.on("data", (chunk: Buffer) => (data += chunk.toString("utf8")));
    stream.on("end", () => {
      received.push(data);
      callback();
    });
  },
});

beforeAll(async () => {
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  process.env.SMTP_HOST = "127.0.0.1";
  process.env.SMTP_PORT = String((server.server.address() as AddressInfo).port);
});

afterAll(async () => {
  await new Promise<void>((resolve) => server.close(() => resolve()));
});

describe("sendMail over SMTP", () => {
  test("delivers a plain-text and an HTML part to the configured server", async () => {
    const { sendMail } = await import("@/lib/mail");
    const sent = await sendMail({ to: "dee@hollisrowe.test", subject: "A test from Spanlark", text: "Plain words", html: "<p>Plain words</p>" });
    expect(sent.messageId).toMatch(/@/);
    expect(received).toHaveLength(1);
    expect(received[0]).toContain("Subject: A test from Spanlark");
    expect(received[0]).toContain("To: dee@hollisrowe.test");
    expect(received[0]).toContain("text/plain");
    expect(received[0]).toContain("text/html");
  });
});

const link = "https://spanlark.example/x?token=abc_DEF-123";

describe("templates", () => {
  test.each([
    { name: "verify-email", mail: verifyEmailMail({ name: "Dee Rowe", link, validHours: 48 }), sizing: false },
    { name: "reset-password", mail: resetPasswordMail({ name: "Dee Rowe", link, validMinutes: 60 }), sizing: false },
    { name: "reset-no-account", mail: resetNoAccountMail({ signUpLink: link }), sizing: false },
    { name: "account-exists", mail: accountExistsMail({ name: "Dee Rowe", signInLink: link, resetLink: link }), sizing: false },
    {
      name: "job-shared",
      mail: jobSharedMail({
        link,
        jobName: "Marsh Lane addition",
        senderName: "Sam Hollis",
        senderCompany: "Hollis & Rowe Framing",
        siteAddress: "14 Marsh Lane, Larkfield",
      }),
      sizing: true,
    },
    {
      name: "payment-receipt",
      mail: paymentReceiptMail({
        name: "Sam Hollis",
        description: "Spanlark subscription, monthly",
        amountCents: 1900,
        currency: "usd",
        paidAt: new Date("2026-12-01T12:00:00Z"),
        periodEnd: new Date("2027-01-01T12:00:00Z"),
        reference: "in_123",
        billingLink: link,
      }),
      sizing: true,
    },
  ])("$name: subject, link in both bodies, caution only where it concerns sizing", ({ mail, sizing }) => {
    expect(mail.subject.length).toBeGreaterThan(5);
    expect(mail.text).toContain(link);
    expect(mail.html).toContain(link.replace(/&/g, "&amp;"));
    expect(mail.html.startsWith("<!doctype html>")).toBe(true);
    expect(mail.text.includes(CAUTION_TEXT)).toBe(sizing);
  });

  test("names from users are escaped in HTML and kept as written in text", () => {
    const mail = jobSharedMail({ link, jobName: "<script>alert(1)</script> deck", senderName: "Sam & Co" });
    expect(mail.html).not.toContain("<script>");
    expect(mail.html).toContain("&lt;script&gt;alert(1)&lt;/script&gt; deck");
    expect(mail.html).toContain("Sam &amp; Co");
    expect(mail.text).toContain('"<script>alert(1)</script> deck"');
  });

  test("the receipt shows the amount with its currency and the dates", () => {
    const mail = paymentReceiptMail({
      name: "Sam Hollis",
      description: "Spanlark subscription, yearly",
      amountCents: 19000,
      currency: "usd",
      paidAt: new Date("2026-12-01T12:00:00Z"),
      periodEnd: null,
      reference: "in_456",
      billingLink: link,
    });
    expect(mail.text).toContain("Amount: $190.00");
    expect(mail.text).toContain("Paid on: December 1, 2026");
    expect(mail.text).not.toContain("Paid through");
  });
});
