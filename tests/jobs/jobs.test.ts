// Jobs and members against PostgreSQL (TEST_DATABASE_URL): only the owner reads or changes a job, whatever
// the caller's role; delete is soft and Undo brings everything back; the free plan's saved-jobs limit holds.
import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, test, vi } from "vitest";
import type { SessionUser } from "@/lib/auth/roles";
import { defaultFlowState } from "@/lib/flow/defaults";
import { withMainSpan, type FlowState } from "@/lib/flow/state";
import { FREE_LIMITS } from "@/lib/payments/plans";
import { who } from "../support/session-mock";

const TEST_DB = process.env.TEST_DATABASE_URL;
if (TEST_DB) process.env.DATABASE_URL = TEST_DB;
process.env.NEXTAUTH_SECRET ??= "test-secret-for-vitest-only-0123456789";

vi.mock("@/lib/auth/session", () => import("../support/session-mock"));
vi.mock("next/cache", () => ({ revalidatePath: vi.fn(), revalidateTag: vi.fn() }));

type Actions = typeof import("@/components/jobs/actions");
type Queries = typeof import("@/lib/jobs/queries");
let actions: Actions;
let queries: Queries;

async function account(role: SessionUser["role"]): Promise<SessionUser> {
  const { getSequelize } = await import("@/lib/db");
  const { User } = await import("@/models/user");
  getSequelize();
  const user = await User.create({
    email: `jobs-${randomUUID().slice(0, 8)}@jobs-tests.test`,
    passwordHash: "not-a-hash",
    name: "Dee Rowe",
    company: "Hollis & Rowe Framing",
    role,
    emailVerifiedAt: new Date(),
  });
  return { id: user.id, email: user.email, name: user.name, company: user.company, role: user.role };
}

function as<T>(user: SessionUser | null, work: () => Promise<T>): Promise<T> {
  who.current = user;
  return work();
}

// a 10 ft header under the default roof and full snow needs three plies: a 2x6 wall takes them (a 2x4 wall only two)
const header10: FlowState = withMainSpan({ ...defaultFlowState("header"), wallFraming: "2x6" }, 10);
const joist13: FlowState = withMainSpan(defaultFlowState("floor-joist"), 13);

function okJob(result: Awaited<ReturnType<Actions["createJob"]>>): string {
  if (!result.ok) throw new Error(`expected ok, got ${result.error}`);
  return result.jobId;
}

describe.skipIf(!TEST_DB)("jobs and members (PostgreSQL)", () => {
  let owner: SessionUser;
  let jobId: string;
  let memberId: string;

  beforeAll(async () => {
    actions = await import("@/components/jobs/actions");
    queries = await import("@/lib/jobs/queries");
    owner = await account("subscriber");
    jobId = okJob(await as(owner, () => actions.createJob({ name: "Marsh Lane addition", siteAddress: "14 Marsh Lane, Larkfield", notes: "" })));
    const saved = await as(owner, () => actions.saveMember({ jobId, label: "H1 kitchen header", flowState: header10, chosenMember: null }));
    if (!saved.ok) throw new Error(saved.error);
    memberId = saved.memberId;
  });

  test("saving works the answer out on the server: a header gets its jack studs", async () => {
    const member = await queries.getMember(owner.id, memberId);
    expect(member?.resultSummary?.pass).toBe(true);
    expect(member?.resultSummary?.headline).toMatch(/^\d-ply 2x\d+ No\.2( with (two )?1\/2" spacers?)? — \d jack studs? each end$/);
    expect(member?.chosenMember?.material).toBe("sawn");
    expect(member?.resultSummary?.spanFt).toBe(10);
  });

  test.each([
    ["signed out", null],
    ["another builder", "builder"],
    ["another subscriber", "subscriber"],
    ["an admin", "admin"],
  ] as const)("%s cannot read or change the job: 404 (or 401 signed out)", async (_who, role) => {
    const other = role ? await account(role) : null;
    const expected = other ? 404 : 401;
    const calls = [
      () => actions.updateJob({ jobId, name: "Taken", siteAddress: "", notes: "" }),
      () => actions.deleteJob({ jobId }),
      () => actions.restoreJob({ jobId }),
      () => actions.duplicateJob({ jobId }),
      () => actions.saveMember({ jobId, label: "Sneaky", flowState: joist13, chosenMember: null }),
      () => actions.updateMember({ memberId, label: "Taken" }),
      () => actions.deleteMember({ memberId }),
      () => actions.restoreMember({ memberId }),
      () => actions.duplicateMember({ memberId }),
    ];
    for (const call of calls) {
      const result = await as(other, call);
      expect(result.ok).toBe(false);
      if (!result.ok) expect(result.status).toBe(expected);
    }
    if (other) {
      expect(await queries.getJob(other.id, jobId)).toBeNull();
      expect(await queries.getMember(other.id, memberId)).toBeNull();
      expect((await queries.listJobs(other.id)).map((j) => j.id)).not.toContain(jobId);
    }
    const mine = await queries.getJob(owner.id, jobId);
    expect(mine?.name).toBe("Marsh Lane addition");
    expect(mine?.members.map((m) => m.label)).toEqual(["H1 kitchen header"]);
  });

  test("delete a member, then Undo brings it back as it was", async () => {
    const before = await queries.getMember(owner.id, memberId);
    const deleted = await as(owner, () => actions.deleteMember({ memberId }));
    expect(deleted.ok).toBe(true);
    expect((await queries.getJob(owner.id, jobId))?.members).toHaveLength(0);
    expect(await queries.getMember(owner.id, memberId)).toBeNull();
    // deleting twice is a 404, not a second change
    const again = await as(owner, () => actions.deleteMember({ memberId }));
    expect(again.ok ? 0 : again.status).toBe(404);
    const back = await as(owner, () => actions.restoreMember({ memberId }));
    expect(back.ok).toBe(true);
    const after = await queries.getMember(owner.id, memberId);
    expect(after?.resultSummary).toEqual(before?.resultSummary);
    expect(after?.flowState).toEqual(before?.flowState);
  });

  test("delete a job, then Undo brings it back with its members", async () => {
    const deleted = await as(owner, () => actions.deleteJob({ jobId }));
    expect(deleted.ok).toBe(true);
    expect(await queries.getJob(owner.id, jobId)).toBeNull();
    expect((await queries.listJobs(owner.id)).map((j) => j.id)).not.toContain(jobId);
    // a member of a deleted job cannot be reached either
    expect(await queries.getMember(owner.id, memberId)).toBeNull();
    const back = await as(owner, () => actions.restoreJob({ jobId }));
    expect(back.ok).toBe(true);
    expect((await queries.getJob(owner.id, jobId))?.members.map((m) => m.id)).toEqual([memberId]);
  });

  test("duplicate a member: the copy follows it, with the same inputs and answer", async () => {
    const second = await as(owner, () => actions.saveMember({ jobId, label: "J1 floor joists", flowState: joist13, chosenMember: null }));
    expect(second.ok).toBe(true);
    const copy = await as(owner, () => actions.duplicateMember({ memberId }));
    if (!copy.ok) throw new Error(copy.error);
    const job = await queries.getJob(owner.id, jobId);
    expect(job?.members.map((m) => m.label)).toEqual(["H1 kitchen header", "H1 kitchen header (copy)", "J1 floor joists"]);
    const [original, dup] = job?.members ?? [];
    expect(dup.flowState).toEqual(original.flowState);
    expect(dup.resultSummary).toEqual(original.resultSummary);
    await as(owner, () => actions.deleteMember({ memberId: copy.memberId }));
  });

  test("edit a member: new inputs are sized again on the server", async () => {
    const longer = withMainSpan(header10, 11);
    const result = await as(owner, () => actions.updateMember({ memberId, label: "H1 kitchen header", flowState: longer, chosenMember: null }));
    expect(result.ok).toBe(true);
    const member = await queries.getMember(owner.id, memberId);
    expect(member?.resultSummary?.spanFt).toBe(11);
    expect(member?.flowState?.lengthFt).toBe(11);
    await as(owner, () => actions.updateMember({ memberId, flowState: header10, chosenMember: null }));
  });

  test("a member saved on ASCE 7-22 keeps its numbers; one tap re-checks it on ASCE 7-16 (snow counted in full)", async () => {
    const old = { ...header10, loadStandard: "ASCE 7-22" as const };
    await as(owner, () => actions.updateMember({ memberId, flowState: old, chosenMember: null }));
    const before = await queries.getMember(owner.id, memberId);
    expect(before?.resultSummary?.loadStandard).toBe("ASCE 7-22");
    const chosen = before?.chosenMember ?? null;
    const result = await as(owner, () => actions.updateMember({ memberId, loadStandard: "ASCE 7-16" }));
    expect(result.ok).toBe(true);
    const after = await queries.getMember(owner.id, memberId);
    expect(after?.flowState?.loadStandard).toBe("ASCE 7-16");
    expect(after?.resultSummary?.loadStandard).toBe("ASCE 7-16");
    expect(after?.chosenMember).toEqual(chosen);
    // the same member under the full snow load works harder
    expect(after?.resultSummary?.ratio ?? 0).toBeGreaterThan(before?.resultSummary?.ratio ?? 0);
    expect(after?.resultSummary?.facts?.[0]).toMatch(/ASCE 7-16.*D \+ S/);
    const bad = await as(owner, () => actions.updateMember({ memberId, loadStandard: "ASCE 7-05" }));
    expect(bad.ok ? 0 : bad.status).toBe(400);
    await as(owner, () => actions.updateMember({ memberId, flowState: header10, chosenMember: null }));
  });

  test("a member can name the member that carries it, in the same job only", async () => {
    const joist = (await queries.getJob(owner.id, jobId))?.members.find((m) => m.label === "J1 floor joists");
    if (!joist) throw new Error("joist missing");
    const ok = await as(owner, () => actions.updateMember({ memberId: joist.id, carriedByMemberId: memberId }));
    expect(ok.ok).toBe(true);
    expect((await queries.getMember(owner.id, joist.id))?.carriedByMemberId).toBe(memberId);
    const self = await as(owner, () => actions.updateMember({ memberId: joist.id, carriedByMemberId: joist.id }));
    expect(self.ok ? 0 : self.status).toBe(400);
    const otherJob = okJob(await as(owner, () => actions.createJob({ name: "Orchard Row deck", siteAddress: "7 Orchard Row, Larkfield", notes: "" })));
    const elsewhere = await as(owner, () =>
      actions.saveMember({ jobId: otherJob, label: "DB1 deck beam", flowState: defaultFlowState("deck-beam"), chosenMember: null }),
    );
    if (!elsewhere.ok) throw new Error(elsewhere.error);
    const cross = await as(owner, () => actions.updateMember({ memberId: joist.id, carriedByMemberId: elsewhere.memberId }));
    expect(cross.ok ? 0 : cross.status).toBe(400);
  });

  test("duplicate a job: members and their carried-by links are copied into the new job", async () => {
    const copy = await as(owner, () => actions.duplicateJob({ jobId }));
    if (!copy.ok) throw new Error(copy.error);
    const job = await queries.getJob(owner.id, copy.jobId);
    expect(job?.name).toBe("Marsh Lane addition (copy)");
    const header = job?.members.find((m) => m.label === "H1 kitchen header");
    const joist = job?.members.find((m) => m.label === "J1 floor joists");
    expect(joist?.carriedByMemberId).toBe(header?.id);
    expect(header?.id).not.toBe(memberId);
  });

  test("search finds jobs by name or address, any case, and treats % literally", async () => {
    const byName = await queries.listJobs(owner.id, "marsh");
    expect(byName.map((j) => j.name)).toEqual(expect.arrayContaining(["Marsh Lane addition", "Marsh Lane addition (copy)"]));
    expect(byName.map((j) => j.name)).not.toContain("Orchard Row deck");
    const byAddress = await queries.listJobs(owner.id, "7 ORCHARD");
    expect(byAddress.map((j) => j.name)).toEqual(["Orchard Row deck"]);
    expect(await queries.listJobs(owner.id, "%")).toEqual([]);
    const counted = byName.find((j) => j.id === jobId);
    expect(counted?.memberCount).toBe(2);
  });

  test("bad input names the field and changes nothing", async () => {
    const empty = await as(owner, () => actions.createJob({ name: "  ", siteAddress: "" }));
    expect(empty.ok).toBe(false);
    if (!empty.ok) {
      expect(empty.status).toBe(400);
      expect("issues" in empty ? empty.issues?.[0] : undefined).toMatchObject({ path: "name", message: "Job name is required" });
    }
    const badState = await as(owner, () => actions.saveMember({ jobId, label: "X", flowState: { ...joist13, lengthFt: -3 }, chosenMember: null }));
    expect(badState.ok ? 0 : badState.status).toBe(400);
    if (!badState.ok && "issues" in badState) expect(badState.issues?.map((i) => i.path)).toContain("flowState.lengthFt");
    const both = await as(owner, () => actions.saveMember({ jobId, newJob: { name: "Two" }, label: "X", flowState: joist13, chosenMember: null }));
    expect(both.ok ? 0 : both.status).toBe(400);
    expect((await queries.getJob(owner.id, jobId))?.members).toHaveLength(2);
  });

  test(`the free plan keeps ${FREE_LIMITS.savedJobs} saved jobs; the next is refused with a way to upgrade, and Undo counts too`, async () => {
    const free = await account("builder");
    const ids: string[] = [];
    for (let i = 0; i < FREE_LIMITS.savedJobs; i++) ids.push(okJob(await as(free, () => actions.createJob({ name: `Job ${i + 1}` }))));
    const over = await as(free, () => actions.createJob({ name: "One too many" }));
    expect(over.ok).toBe(false);
    if (!over.ok) {
      expect(over.status).toBe(402);
      expect("upgrade" in over ? over.upgrade : undefined).toBe("/pricing");
    }
    const viaSave = await as(free, () => actions.saveMember({ newJob: { name: "Also too many" }, label: "H1", flowState: header10, chosenMember: null }));
    expect(viaSave.ok ? 0 : viaSave.status).toBe(402);
    // delete one: room again; the deleted one cannot come back while the room is taken
    await as(free, () => actions.deleteJob({ jobId: ids[0] }));
    okJob(await as(free, () => actions.createJob({ name: "Job 4" })));
    const undo = await as(free, () => actions.restoreJob({ jobId: ids[0] }));
    expect(undo.ok ? 0 : undo.status).toBe(402);
    expect(await queries.countJobs(free.id)).toBe(FREE_LIMITS.savedJobs);
  });
});
