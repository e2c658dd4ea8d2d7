// A member saved with an idempotency key (POST /api/members and the saveMember action) against PostgreSQL
// (TEST_DATABASE_URL): the same save sent twice — its first answer lost — makes one member and gets the same
// answer; sent at the same moment twice, still one; the key reused for another save is a 422 naming the header;
// a missing or malformed key a 400; another account's key is its own; a save queued under another account is a 409.
import { randomUUID } from "node:crypto";
import { Op } from "sequelize";
import { beforeAll, describe, expect, test, vi } from "vitest";
import type { SessionUser } from "@/lib/auth/roles";
import { defaultFlowState } from "@/lib/flow/defaults";
import { withMainSpan } from "@/lib/flow/state";
import { fromClient } from "../support/client-ip";
import { who } from "../support/session-mock";
import { subscriberAccount } from "../support/subscriber";

const TEST_DB = process.env.TEST_DATABASE_URL;
if (TEST_DB) process.env.DATABASE_URL = TEST_DB;
process.env.NEXTAUTH_SECRET ??= "test-secret-for-vitest-only-0123456789";

vi.mock("@/lib/auth/session", () => import("../support/session-mock"));
vi.mock("next/cache", () => ({ revalidatePath: vi.fn(), revalidateTag: vi.fn() }));

const account = (): Promise<SessionUser> => subscriberAccount("once");

const header8 = withMainSpan(defaultFlowState("header"), 8);

function saveBody(jobName: string, label = "H1 basement header"): Record<string, unknown> {
  return { newJob: { name: jobName, siteAddress: "", notes: "" }, label, flowState: header8, chosenMember: null };
}

async function post(key: string | null, body: unknown): Promise<Response> {
  const { POST } = await import("@/app/api/members/route");
  const headers: Record<string, string> = { "content-type": "application/json", ...fromClient("198.51.100.20") };
  if (key !== null) headers["idempotency-key"] = key;
  return POST(new Request("http://127.0.0.1/api/members", { method: "POST", headers, body: JSON.stringify(body) }), undefined);
}

async function membersIn(ownerId: string, jobName: string): Promise<number> {
  const { Job, Member } = await import("@/models");
  const jobs = await Job.findAll({ where: { ownerId, name: jobName } });
  return Member.count({ where: { jobId: { [Op.in]: jobs.map((j) => j.id) } } });
}

describe.skipIf(!TEST_DB)("a save made once per idempotency key (PostgreSQL)", () => {
  let owner: SessionUser;
  beforeAll(async () => {
    owner = await account();
  });

  test("sent twice with one key: one member, one job, the same answer (201 both times, the second marked replayed)", async () => {
    who.current = owner;
    const key = randomUUID();
    const job = `Lost answer ${randomUUID().slice(0, 6)}`;
    const first = await post(key, saveBody(job));
    const second = await post(key, saveBody(job));
    expect(first.status).toBe(201);
    expect(second.status).toBe(201);
    expect(first.headers.get("idempotent-replayed")).toBeNull();
    expect(second.headers.get("idempotent-replayed")).toBe("true");
    const a = await first.json();
    expect(await second.json()).toEqual(a);
    expect(a).toMatchObject({ jobName: job, label: "H1 basement header", tables: { id: expect.any(String) } });
    expect(a.answer.headline).toMatch(/jack stud/);
    expect(await membersIn(owner.id, job)).toBe(1);
    const { Job } = await import("@/models");
    expect(await Job.count({ where: { ownerId: owner.id, name: job } })).toBe(1);
  });

  test("two sends at the same moment with one key: still one member", async () => {
    who.current = owner;
    const key = randomUUID();
    const job = `Same moment ${randomUUID().slice(0, 6)}`;
    const [a, b] = await Promise.all([post(key, saveBody(job)), post(key, saveBody(job))]);
    expect([a.status, b.status]).toEqual([201, 201]);
    expect(await b.json()).toEqual(await a.json());
    expect(await membersIn(owner.id, job)).toBe(1);
  });

  test("the server action with a save key is the same single save", async () => {
    who.current = owner;
    const { saveMember } = await import("@/components/jobs/actions");
    const saveKey = randomUUID();
    const job = `From the dialog ${randomUUID().slice(0, 6)}`;
    const a = await saveMember({ ...saveBody(job), saveKey });
    const b = await saveMember({ ...saveBody(job), saveKey });
    expect(a).toEqual(b);
    // the queue sending it again later through the route with the same key
    const c = await post(saveKey, saveBody(job));
    expect(c.status).toBe(201);
    if (!a.ok) throw new Error(a.error);
    expect((await c.json()).memberId).toBe(a.memberId);
    expect(await membersIn(owner.id, job)).toBe(1);
  });

  test.each([
    ["no key", null, 400],
    ["a key that is not a UUID", "retry-1", 400],
  ])("%s: 400 naming Idempotency-Key, nothing saved", async (_label, key, status) => {
    who.current = owner;
    const job = `No key ${randomUUID().slice(0, 6)}`;
    const res = await post(key, saveBody(job));
    expect(res.status).toBe(status);
    expect((await res.json()).issues[0].path).toBe("Idempotency-Key");
    expect(await membersIn(owner.id, job)).toBe(0);
  });

  test("the key reused for a different save: 422 naming Idempotency-Key, the first save untouched", async () => {
    who.current = owner;
    const key = randomUUID();
    const job = `Reused key ${randomUUID().slice(0, 6)}`;
    expect((await post(key, saveBody(job))).status).toBe(201);
    const other = await post(key, saveBody(job, "H2 another header"));
    expect(other.status).toBe(422);
    expect((await other.json()).issues[0].path).toBe("Idempotency-Key");
    expect(await membersIn(owner.id, job)).toBe(1);
  });

  test("keys are per account: another account's save with the same key is its own save", async () => {
    const other = await account();
    const key = randomUUID();
    const job = `Shared key ${randomUUID().slice(0, 6)}`;
    who.current = owner;
    const mine = await (await post(key, saveBody(job))).json();
    who.current = other;
    const theirs = await post(key, saveBody(job));
    expect(theirs.status).toBe(201);
    expect((await theirs.json()).memberId).not.toBe(mine.memberId);
    expect(await membersIn(other.id, job)).toBe(1);
  });

  test("a save queued while another account was signed in: 409, nothing saved; bad input: 400 naming the field", async () => {
    who.current = owner;
    const job = `Other account ${randomUUID().slice(0, 6)}`;
    const res = await post(randomUUID(), { ...saveBody(job), accountId: randomUUID() });
    expect(res.status).toBe(409);
    expect(await membersIn(owner.id, job)).toBe(0);
    const bad = await post(randomUUID(), { ...saveBody(job), label: "" });
    expect(bad.status).toBe(400);
    expect((await bad.json()).issues[0].path).toBe("label");
  });

  test("signed out: 401, nothing saved", async () => {
    who.current = null;
    const res = await post(randomUUID(), saveBody("Signed out"));
    expect(res.status).toBe(401);
  });
});
