// A change to a saved member made on a phone with no signal (PATCH /api/members/[memberId]) against PostgreSQL
// (TEST_DATABASE_URL): sent twice with one key (its first answer lost), it is applied once and answers the same;
// the key reused for a different change is a 422 naming the header; a change made on a version the member no
// longer has is a 409 carrying the member as it is now, and changes nothing; sent again on that version, it applies.
import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, test, vi } from "vitest";
import type { SessionUser } from "@/lib/auth/roles";
import { defaultFlowState } from "@/lib/flow/defaults";
import { withMainSpan, type FlowState } from "@/lib/flow/state";
import { fromClient } from "../support/client-ip";
import { who } from "../support/session-mock";
import { subscriberAccount } from "../support/subscriber";

const TEST_DB = process.env.TEST_DATABASE_URL;
if (TEST_DB) process.env.DATABASE_URL = TEST_DB;
process.env.NEXTAUTH_SECRET ??= "test-secret-for-vitest-only-0123456789";

vi.mock("@/lib/auth/session", () => import("../support/session-mock"));
vi.mock("next/cache", () => ({ revalidatePath: vi.fn(), revalidateTag: vi.fn() }));

const account = (): Promise<SessionUser> => subscriberAccount("edit");

const header = (spanFt: number): FlowState => withMainSpan(defaultFlowState("header"), spanFt);

/** A header saved to a new job of `owner`; answers its id and version. */
async function savedHeader(owner: SessionUser, label = "H1 basement header"): Promise<{ memberId: string; version: string }> {
  const { POST } = await import("@/app/api/members/route");
  const body = { newJob: { name: `Edit job ${randomUUID().slice(0, 6)}`, siteAddress: "", notes: "" }, label, flowState: header(6), chosenMember: null };
  who.current = owner;
  const res = await POST(
    new Request("http://127.0.0.1/api/members", {
      method: "POST",
      headers: { "content-type": "application/json", "idempotency-key": randomUUID(), ...fromClient("198.51.100.21") },
      body: JSON.stringify(body),
    }),
    undefined,
  );
  expect(res.status).toBe(201);
  const { memberId } = (await res.json()) as { memberId: string };
  return { memberId, version: await versionOf(memberId) };
}

async function versionOf(memberId: string): Promise<string> {
  const { Member } = await import("@/models/member");
  const { memberVersion } = await import("@/lib/jobs/edit-once");
  return memberVersion((await Member.findByPk(memberId))!);
}

async function patch(memberId: string, key: string | null, body: unknown): Promise<Response> {
  const { PATCH } = await import("@/app/api/members/[memberId]/route");
  const headers: Record<string, string> = { "content-type": "application/json", ...fromClient("198.51.100.21") };
  if (key !== null) headers["idempotency-key"] = key;
  return PATCH(new Request(`http://127.0.0.1/api/members/${memberId}`, { method: "PATCH", headers, body: JSON.stringify(body) }), {
    params: Promise.resolve({ memberId }),
  });
}

async function memberRow(memberId: string) {
  const { Member } = await import("@/models/member");
  return (await Member.findByPk(memberId))!;
}

async function savesUnder(ownerId: string, key: string): Promise<number> {
  const { MemberSave } = await import("@/models/member-save");
  return MemberSave.count({ where: { ownerId, idempotencyKey: key } });
}

// the first change works the member's answer out with the tables loaded cold: slow on a busy machine
describe.skipIf(!TEST_DB)("a change made on a phone, applied once and only to the version it was made on (PostgreSQL)", { timeout: 60_000 }, () => {
  let owner: SessionUser;
  beforeAll(async () => {
    owner = await account();
  });

  test("sent twice with one key: applied once, the same answer both times (the second marked replayed)", async () => {
    const { memberId, version } = await savedHeader(owner);
    const before = await memberRow(memberId);
    const key = randomUUID();
    const body = { baseVersion: version, label: "H1 basement header, 8 ft", flowState: header(8), chosenMember: null };
    who.current = owner;
    const first = await patch(memberId, key, body);
    expect(first.status).toBe(200);
    const afterFirst = await memberRow(memberId);
    const second = await patch(memberId, key, body);
    expect(second.status).toBe(200);
    expect(second.headers.get("idempotent-replayed")).toBe("true");
    expect(await second.json()).toEqual(await first.json());
    const after = await memberRow(memberId);
    expect(after.label).toBe("H1 basement header, 8 ft");
    expect(after.flowState?.lengthFt).toBe(8);
    // the second send changed nothing: no newer write than the first's
    expect(after.updatedAt.getTime()).toBe(afterFirst.updatedAt.getTime());
    expect(after.updatedAt.getTime()).toBeGreaterThan(before.updatedAt.getTime());
    expect(await savesUnder(owner.id, key)).toBe(1);
  });

  test("two sends at the same moment with one key: applied once, both 200 with one answer", async () => {
    const { memberId, version } = await savedHeader(owner);
    const key = randomUUID();
    const body = { baseVersion: version, label: "H1 at once", flowState: header(7), chosenMember: null };
    who.current = owner;
    const [a, b] = await Promise.all([patch(memberId, key, body), patch(memberId, key, body)]);
    expect([a.status, b.status]).toEqual([200, 200]);
    expect(await b.json()).toEqual(await a.json());
    expect(await savesUnder(owner.id, key)).toBe(1);
    expect((await memberRow(memberId)).label).toBe("H1 at once");
  });

  test("the key reused with a different change: 422 naming Idempotency-Key, the first change kept", async () => {
    const { memberId, version } = await savedHeader(owner);
    const key = randomUUID();
    who.current = owner;
    expect((await patch(memberId, key, { baseVersion: version, label: "H1 first", flowState: header(8), chosenMember: null })).status).toBe(200);
    const other = await patch(memberId, key, { baseVersion: version, label: "H1 second", flowState: header(9), chosenMember: null });
    expect(other.status).toBe(422);
    expect((await other.json()).issues[0].path).toBe("Idempotency-Key");
    const row = await memberRow(memberId);
    expect(row.label).toBe("H1 first");
    expect(row.flowState?.lengthFt).toBe(8);
  });

  test("the member changed since the phone opened it: 409 with the member as it is now, nothing applied; on the new version it applies", async () => {
    const { memberId, version } = await savedHeader(owner, "H2 stair header");
    // someone changes it on another screen (the job page's dialog, online)
    who.current = owner;
    const { updateMember } = await import("@/components/jobs/actions");
    const online = await updateMember({ memberId, label: "H2 stair header (office)", flowState: header(10) });
    expect(online.ok).toBe(true);
    const phone = { baseVersion: version, label: "H2 stair header", flowState: header(7), chosenMember: null };
    const res = await patch(memberId, randomUUID(), phone);
    expect(res.status).toBe(409);
    const data = (await res.json()) as { error: string; conflict: import("@/lib/offline/answers").MemberConflict };
    expect(data.error).toContain("H2 stair header (office) was changed on another screen");
    expect(data.conflict.memberId).toBe(memberId);
    expect(data.conflict.deleted).toBe(false);
    expect(data.conflict.current.label).toBe("H2 stair header (office)");
    expect(data.conflict.current.flowState?.lengthFt).toBe(10);
    expect(data.conflict.version).toBe(await versionOf(memberId));
    expect(data.conflict.version).not.toBe(version);
    const row = await memberRow(memberId);
    expect(row.label).toBe("H2 stair header (office)");
    expect(row.flowState?.lengthFt).toBe(10);
    // the builder keeps theirs: sent again on the version the member has now, under a new key
    const again = await patch(memberId, randomUUID(), { ...phone, baseVersion: data.conflict.version });
    expect(again.status).toBe(200);
    expect((await memberRow(memberId)).flowState?.lengthFt).toBe(7);
  });

  test("deleted since: 409 saying so, nothing brought back", async () => {
    const { memberId, version } = await savedHeader(owner, "H3 porch header");
    who.current = owner;
    const { deleteMember } = await import("@/components/jobs/actions");
    expect((await deleteMember({ memberId })).ok).toBe(true);
    const res = await patch(memberId, randomUUID(), { baseVersion: version, label: "H3 porch header", flowState: header(5), chosenMember: null });
    expect(res.status).toBe(409);
    const data = (await res.json()) as { error: string; conflict: { deleted: boolean } };
    expect(data.conflict.deleted).toBe(true);
    expect(data.error).toContain("was deleted");
    expect((await memberRow(memberId)).deletedAt).not.toBeNull();
  });

  test.each([
    ["no key", null, "Idempotency-Key"],
    ["a key that is not a UUID", "retry-1", "Idempotency-Key"],
  ])("%s: 400 naming %s, nothing changed", async (_label, key, path) => {
    const { memberId, version } = await savedHeader(owner);
    who.current = owner;
    const res = await patch(memberId, key, { baseVersion: version, label: "H1 changed", flowState: header(8), chosenMember: null });
    expect(res.status).toBe(400);
    expect((await res.json()).issues[0].path).toBe(path);
    expect((await memberRow(memberId)).label).toBe("H1 basement header");
  });

  test("a bad body: 400 naming each field, nothing changed", async () => {
    const { memberId } = await savedHeader(owner);
    who.current = owner;
    const res = await patch(memberId, randomUUID(), { baseVersion: "v1", label: "", flowState: { ...header(8), lengthFt: -2 } });
    expect(res.status).toBe(400);
    const paths = ((await res.json()).issues as { path: string }[]).map((i) => i.path);
    expect(paths).toEqual(expect.arrayContaining(["baseVersion", "label", "flowState.lengthFt"]));
    expect((await memberRow(memberId)).label).toBe("H1 basement header");
  });

  test("another account's member is a 404, and a change queued under another account a 409", async () => {
    const { memberId, version } = await savedHeader(owner);
    const stranger = await account();
    who.current = stranger;
    const body = { baseVersion: version, label: "Taken over", flowState: header(8), chosenMember: null };
    expect((await patch(memberId, randomUUID(), body)).status).toBe(404);
    who.current = owner;
    expect((await patch(memberId, randomUUID(), { ...body, accountId: stranger.id })).status).toBe(409);
    expect((await memberRow(memberId)).label).toBe("H1 basement header");
  });
});
