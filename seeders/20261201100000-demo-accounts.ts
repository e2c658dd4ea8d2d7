import { randomUUID } from "node:crypto";
import bcrypt from "bcryptjs";
import { QueryTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

// The three demo accounts of the invented scenario (Hollis & Rowe Framing, Larkfield), confirmed and ready
// to sign in. Passwords are hashed here at cost 12, as the app does; nothing secret is stored in the file.
const DEMO_ACCOUNTS = [
  { email: "admin@spanlark.test", password: "admin-demo-pass", name: "Spanlark Admin", company: null, role: "admin" },
  { email: "sam@hollisrowe.test", password: "subscriber-demo-pass", name: "Sam Hollis", company: "Hollis & Rowe Framing", role: "subscriber" },
  { email: "dee@hollisrowe.test", password: "builder-demo-pass", name: "Dee Rowe", company: "Hollis & Rowe Framing", role: "builder" },
] as const;

export async function up({ context: { sequelize } }: { context: MigrationContext }): Promise<void> {
  const now = new Date();
  for (const account of DEMO_ACCOUNTS) {
    const passwordHash = await bcrypt.hash(account.password, 12);
    await sequelize.query(
      `INSERT INTO users (id, email, password_hash, name, company, role, email_verified_at, created_at, updated_at)
       VALUES (:id, :email, :passwordHash, :name, :company, :role, :now, :now, :now)
       ON CONFLICT (email) DO NOTHING`,
      {
        replacements: { id: randomUUID(), email: account.email, passwordHash, name: account.name, company: account.company, role: account.role, now },
        type: QueryTypes.INSERT,
      },
    );
  }
}

export async function down({ context: { sequelize } }: { context: MigrationContext }): Promise<void> {
  await sequelize.query("DELETE FROM users WHERE email IN (:emails)", {
    replacements: { emails: DEMO_ACCOUNTS.map((a) => a.email) },
    type: QueryTypes.DELETE,
  });
}
