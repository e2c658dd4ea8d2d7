import { randomUUID } from "node:crypto";
import type { SessionUser } from "@/lib/auth/roles";

/**
 * A verified subscriber made in the test database (its e-mail `<prefix>-<8 hex>@<prefix>.test`), as the session
 * the routes see. The models are imported inside, after the test file has pointed DATABASE_URL at the test database.
 */
export async function subscriberAccount(prefix: string): Promise<SessionUser> {
  const { getSequelize } = await import("@/lib/db");
  const { User } = await import("@/models/user");
  getSequelize();
  const user = await User.create({
    email: `${prefix}-${randomUUID().slice(0, 8)}@${prefix}.test`,
    passwordHash: "not-a-hash",
    name: "Robin Ashdown",
    company: "Ashdown Decks",
    role: "subscriber",
    emailVerifiedAt: new Date(),
  });
  return { id: user.id, email: user.email, name: user.name, company: user.company, role: user.role };
}
