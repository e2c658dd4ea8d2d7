// The load path in a saved job against PostgreSQL (TEST_DATABASE_URL): joists on a beam, posts under the beam,
// footings under the posts, built through the job actions; a change to the joists flows down and is flagged;
// cycles are refused by name; deleting a carrier asks what to do with what sits on it.
import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, test, vi } from "vitest";
import type { SessionUser } from "@/lib/auth/roles";
import type { FlowState } from "@/lib/flow/state";
import { who } from "../support/session-mock";
import { WRENFIELD_BEAM, WRENFIELD_JOISTS } from "../support/wrenfield-deck";

const TEST_DB = process.env.TEST_DATABASE_URL;
if (TEST_DB) process.env.DATABASE_URL = TEST_DB;
process.env.NEXTAUTH_SECRET ??= "test-secret-for-vitest-only-0123456789";

vi.mock("@/lib/auth/session", () => import("../support/session-mock"));
vi.mock("next/cache", () => ({ revalidatePath: vi.fn(), revalidateTag: vi.fn() }));

type Actions = typeof import("@/components/jobs/actions");
type Queries = typeof import("@/lib/jobs/queries");

const joists = WRENFIELD_JOISTS;
const beam = WRENFIELD_BEAM;

function ok<T extends { ok: boolean }>(r: T): Extract<T, { ok: true }> {
  if (!r.ok) throw new Error(`expected ok, got ${JSON.stringify(r)}`);
  return r as Extract<T, { ok: true }>;
}

describe.skipIf(!TEST_DB)("a live job's load path (PostgreSQL)", () => {
  let actions: Actions;
  let queries: Queries;
  let owner: SessionUser;
  let jobId = "";
  const ids: Record<string, string> = {};

  beforeAll(async () => {
    actions = await import("@/components/jobs/actions");
    queries = await import("@/lib/jobs/queries");
    const { getSequelize } = await import("@/lib/db");
    const { User } = await import("@/models/user");
    getSequelize();
    const user = await User.create({
      email: `path-${randomUUID().slice(0, 8)}@jobs-tests.test`,
      passwordHash: "not-a-hash",
      name: "Dee Rowe",
      company: null,
      role: "subscriber",
      emailVerifiedAt: new Date(),
    });
    owner = { id: user.id, email: user.email, name: user.name, company: user.company, role: user.role };
    who.current = owner;
    const j1 = ok(await actions.saveMember({ newJob: { name: "Wrenfield Road deck" }, label: "J1", flowState: joists, chosenMember: null }));
    jobId = j1.jobId;
    ids.j1 = j1.memberId;
    ids.b1 = ok(await actions.saveMember({ jobId, label: "B1", flowState: beam, chosenMember: null })).memberId;
  });

  const member = async (id: string) => {
    const job = await queries.getJob(owner.id, jobId);
    return job?.members.find((m) => m.id === id);
  };

  test("joists put on the beam become its load, by case, saying where they come from; its typed psf loads drop out", async () => {
    who.current = owner;
    ok(await actions.updateMember({ memberId: ids.j1, carriedByMemberId: ids.b1, bearing: { supports: [1], fromFt: 0, toFt: 24 } }));
    const b1 = await member(ids.b1);
    expect(b1?.resultSummary?.carried?.[0].words).toBe(`from J1 deck joists @ 16 in, 0' 0" to 24' 0"`);
    // the joists' own weight is in D; live is 40 psf × 12 ft / 2 = 240 plf exactly (IRC 2021 Table R301.5)
    expect(b1?.resultSummary?.carried?.[0].byCase.L).toBeCloseTo(240, 0);
    expect(b1?.resultSummary?.facts).toContain("Loads: from the joists bearing on it (its own psf loads and tributary width are not used)");
  });

  test("where it sits must be on the carrier: a 400 naming the field, nothing changes", async () => {
    who.current = owner;
    const r = await actions.updateMember({ memberId: ids.j1, bearing: { supports: [1], fromFt: 0, toFt: 30 } });
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.status).toBe(400);
      expect("issues" in r ? r.issues?.[0] : null).toEqual({ path: "bearing.toFt", message: "must be on B1, 0 to 24 ft" });
    }
    expect((await member(ids.j1))?.bearing).toEqual({ supports: [1], fromFt: 0, toFt: 24 });
  });

  test("posts under the beam and footings under the posts are members of the job, each checked", async () => {
    who.current = owner;
    const p1 = ok(
      await actions.addSupport({
        jobId,
        underMemberId: ids.b1,
        label: "P1",
        design: { type: "post", size: "6x6", plies: 1, species: "Douglas Fir-Larch", grade: "No.2", heightFt: 8, wet: true },
      }),
    );
    ids.p1 = p1.memberId;
    const f1 = ok(
      await actions.addSupport({
        jobId,
        underMemberId: ids.p1,
        label: "F1",
        design: { type: "footing", shape: "round", sizeIn: null, thicknessIn: 10, soilPsf: 1500, frostDepthIn: 36, bottomDepthIn: null },
      }),
    );
    ids.f1 = f1.memberId;
    const post = await member(ids.p1);
    expect(post?.kind).toBe("post");
    expect(post?.resultSummary?.reactions).toHaveLength(4);
    expect(post?.resultSummary?.headline).toMatch(/^4 × 6x6 posts No\.2, 8' 0" tall — OK \d+%$/);
    const footing = await member(ids.f1);
    expect(footing?.resultSummary?.headline).toMatch(/^4 × \d+ in round × 10 in thick, bottom 36 in below grade — OK \d+%$/);
  });

  test("a cycle is refused with a 400 naming the field; nothing changes", async () => {
    who.current = owner;
    const r = await actions.updateMember({ memberId: ids.b1, carriedByMemberId: ids.j1 });
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.status).toBe(400);
      expect("issues" in r ? r.issues?.[0] : null).toEqual({ path: "carriedByMemberId", message: expect.stringContaining("round in a circle") });
    }
    expect((await member(ids.b1))?.carriedByMemberId).toBe(ids.p1);
  });

  test("longer joists: the beam, posts and footings are worked out again and the changed ones say so", async () => {
    who.current = owner;
    const before = await member(ids.f1);
    const longer: FlowState = {
      ...joists,
      lengthFt: 18,
      supports: [
        { x: 0, type: "pin" },
        { x: 18, type: "roller" },
      ],
    };
    ok(await actions.updateMember({ memberId: ids.j1, flowState: longer }));
    const b1 = await member(ids.b1);
    expect(b1?.resultSummary?.carried?.[0].byCase.L).toBeCloseTo(360, 0);
    const after = await member(ids.f1);
    expect(after?.resultSummary?.memberLabel).not.toBe(before?.resultSummary?.memberLabel);
    expect(after?.resultSummary?.change).toMatchObject({ was: before?.resultSummary?.headline, reason: "J1 changed" });
    expect((await member(ids.j1))?.resultSummary?.change ?? null).toBeNull();
    ok(await actions.markChangesSeen({ jobId }));
    expect((await member(ids.f1))?.resultSummary?.change ?? null).toBeNull();
  });

  test("new tables since the members were worked out: opening the job works the whole path out again", async () => {
    who.current = owner;
    const { Member } = await import("@/models/member");
    const { recheckIfOutdated } = await import("@/lib/jobs/service");
    const { getCurrentTables } = await import("@/lib/tables/current");
    const current = (await getCurrentTables()).version;
    const row = await Member.findByPk(ids.f1);
    if (!row?.resultSummary) throw new Error("F1 has no answer");
    // as if F1 had been worked out with an older published version
    row.resultSummary = { ...row.resultSummary, tables: "an-older-version" };
    row.changed("resultSummary", true);
    await row.save();
    expect(await recheckIfOutdated(jobId)).toBe(true);
    expect((await member(ids.f1))?.resultSummary?.tables).toBe(current);
    expect(await recheckIfOutdated(jobId)).toBe(false);
  });

  test("answers from an earlier edition of the design rules: opening the job works them out again on the current one", async () => {
    who.current = owner;
    const { Member } = await import("@/models/member");
    const { recheckIfOutdated } = await import("@/lib/jobs/service");
    const { DESIGN_RULES } = await import("@/lib/solver/design");
    const row = await Member.findByPk(ids.b1);
    if (!row?.resultSummary) throw new Error("B1 has no answer");
    expect(row.resultSummary.rules).toBe(DESIGN_RULES);
    // as if B1 had been saved before design rule editions were recorded
    const { rules: _rules, ...older } = row.resultSummary;
    row.resultSummary = older;
    row.changed("resultSummary", true);
    await row.save();
    expect(await recheckIfOutdated(jobId)).toBe(true);
    expect((await member(ids.b1))?.resultSummary?.rules).toBe(DESIGN_RULES);
    expect(await recheckIfOutdated(jobId)).toBe(false);
  });

  test("deleting a carrier asks first (409 naming what sits on it); keeping them leaves them on nothing", async () => {
    who.current = owner;
    const asked = await actions.deleteMember({ memberId: ids.p1 });
    expect(asked.ok).toBe(false);
    if (!asked.ok) {
      expect(asked.status).toBe(409);
      expect(asked.error).toContain("B1 bears on P1");
    }
    expect(await member(ids.p1)).toBeDefined();
    ok(await actions.deleteMember({ memberId: ids.p1, carried: "keep" }));
    expect(await member(ids.p1)).toBeUndefined();
    expect((await member(ids.b1))?.carriedByMemberId).toBeNull();
  });
});
