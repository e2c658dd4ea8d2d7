import { beforeEach, describe, expect, test, vi } from "vitest";
import { TEST_DB, makeUser, sendMailMock } from "./support";

vi.mock("@/lib/mail", () => ({ sendMail: sendMailMock }));

type FakeSession = { user: { id: string }; authAt: number } | null;
const current: { session: FakeSession } = { session: null };
vi.mock("next-auth", () => ({ getServerSession: vi.fn(async () => current.session) }));
// React's request cache is per request in Next.js; here every call is its own request.
vi.mock("react", async (importOriginal) => ({ ...(await importOriginal<typeof import("react")>()), cache: <T>(fn: T) => fn }));

const { getSessionUser, requireRole, requireUser } = await import("@/lib/auth/session");
const { changeRole } = await import("@/lib/auth/accounts");
const { HttpError } = await import("@/lib/http");

beforeEach(() => {
  current.session = null;
});

async function statusOf(work: () => Promise<unknown>): Promise<number | "ok"> {
  try {
    await work();
    return "ok";
  } catch (err) {
    if (err instanceof HttpError) return err.status;
    throw err;
  }
}

describe.skipIf(!TEST_DB)("session user, roles read fresh", () => {
  test("signed out: null, requireUser 401, requireRole 401", async () => {
    expect(await getSessionUser()).toBeNull();
    expect(await statusOf(requireUser)).toBe(401);
    expect(await statusOf(() => requireRole("admin"))).toBe(401);
  });

  test("a role change applies on the very next request", async () => {
    const user = await makeUser({ role: "builder" });
    current.session = { user: { id: user.id }, authAt: Date.now() };
    expect(await getSessionUser()).toEqual({ id: user.id, email: user.email, name: user.name, company: user.company, role: "builder" });
    expect(await statusOf(() => requireRole("subscriber"))).toBe(403);
    // As the payment flow does when a subscription starts, then lapses.
    await user.update({ role: "subscriber" });
    expect((await requireRole("subscriber")).role).toBe("subscriber");
    await user.update({ role: "builder" });
    expect(await statusOf(() => requireRole("subscriber"))).toBe(403);
  });

  test("a session signed in before the password changed no longer counts", async () => {
    const user = await makeUser();
    current.session = { user: { id: user.id }, authAt: Date.now() - 60_000 };
    expect(await getSessionUser()).not.toBeNull();
    await user.update({ passwordChangedAt: new Date() });
    expect(await getSessionUser()).toBeNull();
    current.session = { user: { id: user.id }, authAt: Date.now() + 1 };
    expect(await getSessionUser()).not.toBeNull();
  });

  test("a session for an account that no longer exists is signed out", async () => {
    const user = await makeUser();
    current.session = { user: { id: user.id }, authAt: Date.now() };
    await user.destroy();
    expect(await getSessionUser()).toBeNull();
  });
});

describe.skipIf(!TEST_DB)("role changes by an admin", () => {
  test.each([
    { label: "builder made admin", from: "builder" as const, to: "admin" as const, expected: "admin" },
    { label: "admin made builder by another admin", from: "admin" as const, to: "builder" as const, expected: "builder" },
    { label: "subscriber's role belongs to payments", from: "subscriber" as const, to: "admin" as const, expected: 409 },
  ])("$label", async ({ from, to, expected }) => {
    const admin = await makeUser({ role: "admin" });
    const target = await makeUser({ role: from });
    const actor = { id: admin.id, email: admin.email, name: admin.name, company: null, role: "admin" as const };
    const result = await changeRole(actor, target.id, to).then(
      (u) => u.role,
      (err: unknown) => (err instanceof HttpError ? err.status : err),
    );
    expect(result).toBe(expected);
  });

  test("an admin cannot remove their own admin role", async () => {
    const admin = await makeUser({ role: "admin" });
    const actor = { id: admin.id, email: admin.email, name: admin.name, company: null, role: "admin" as const };
    expect(await statusOf(() => changeRole(actor, admin.id, "builder"))).toBe(409);
    await admin.reload();
    expect(admin.role).toBe("admin");
  });

  test("a builder cannot change anyone's role", async () => {
    const builder = await makeUser({ role: "builder" });
    const target = await makeUser({ role: "builder" });
    const actor = { id: builder.id, email: builder.email, name: builder.name, company: null, role: "builder" as const };
    expect(await statusOf(() => changeRole(actor, target.id, "admin"))).toBe(403);
  });
});

describe.skipIf(!TEST_DB)("next-auth's session callback (what GET /api/auth/session answers)", () => {
  test("answers no session once the password changed after sign-in, and the user for a later sign-in", async () => {
    const { authOptions } = await import("@/lib/auth/options");
    const callback = authOptions().callbacks!.session!;
    const user = await makeUser();
    const answer = async (authAt: number) =>
      (await callback({
        session: { expires: new Date(Date.now() + 60_000).toISOString() },
        token: { sub: user.id, email: user.email, name: user.name, authAt },
      } as never)) as unknown as Record<string, unknown>;
    const signedIn = Date.now() - 60_000;
    expect(((await answer(signedIn)).user as { id: string }).id).toBe(user.id);
    await user.update({ passwordChangedAt: new Date() });
    expect(await answer(signedIn)).toEqual({});
    expect(((await answer(Date.now() + 1)).user as { id: string }).id).toBe(user.id);
    await user.destroy();
    expect(await answer(Date.now() + 1)).toEqual({});
  });
});
