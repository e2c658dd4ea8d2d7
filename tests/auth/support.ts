import { randomUUID } from "node:crypto";
import { vi } from "vitest";
import { hashPassword } from "@/lib/auth/password";
import { getSequelize } from "@/lib/db";
import type { MailMessage } from "@/lib/mail";
import { User, type Role } from "@/models/user";

/**
 * Integration tests run against TEST_DATABASE_URL (scripts/test.sh makes a fresh, migrated database;
 * locally: `bash scripts/pg.sh recreate-db spanlark_h_auth`, migrate it, and export its URL).
 */
export const TEST_DB = process.env.TEST_DATABASE_URL;
if (TEST_DB) process.env.DATABASE_URL = TEST_DB;
process.env.NEXTAUTH_SECRET ??= "test-secret-for-vitest-only-0123456789";
process.env.APP_URL ??= "http://127.0.0.1:3100";

/** Every mail "sent" in this test file, in order (lib/mail is mocked by the files that import this). */
export const outbox: MailMessage[] = [];

export const sendMailMock = vi.fn(async (message: MailMessage) => {
  outbox.push(message);
  return { messageId: `<${randomUUID()}@test>` };
});

/** A fresh address no other test uses. */
export function uniqueEmail(tag: string): string {
  return `${tag}-${randomUUID().slice(0, 8)}@auth-tests.test`;
}

/** A client address of its own, so one test's per-client counters never block another's. */
export function uniqueIp(): string {
  const b = () => Math.floor(Math.random() * 254) + 1;
  return `10.${b()}.${b()}.${b()}`;
}

export async function makeUser(options: { role?: Role; verified?: boolean; password?: string; email?: string } = {}): Promise<User> {
  getSequelize();
  return User.create({
    email: options.email ?? uniqueEmail("user"),
    passwordHash: await hashPassword(options.password ?? "correct horse battery"),
    name: "Test Builder",
    company: "Test Framing",
    role: options.role ?? "builder",
    emailVerifiedAt: options.verified === false ? null : new Date(),
  });
}

/** The token in the first link of a mail (…?token=XYZ). */
export function tokenFrom(message: MailMessage): string {
  const match = /[?&]token=([A-Za-z0-9_-]+)/.exec(message.text);
  if (!match) throw new Error(`no token link in mail "${message.subject}"`);
  return match[1];
}

export function lastMailTo(address: string): MailMessage | undefined {
  return [...outbox].reverse().find((m) => m.to === address.toLowerCase());
}
