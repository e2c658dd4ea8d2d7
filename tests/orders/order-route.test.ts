// The order list of a saved job whose load path builds posts and footings, against PostgreSQL (TEST_DATABASE_URL):
// the deck is built through the job actions (joists on a beam, posts under the beam, footings under the posts,
// post and footing numbers typed on the beam too), then the order route is called as the owner's browser calls
// it, and its CSV and PDF are read back. Counting rules are common practice (a post per support, stock lengths
// 8–24 ft, 10 % extra concrete); the footing's size is the one the load path designed, read from the job.
import { randomUUID } from "node:crypto";
import Papa from "papaparse";
import { beforeAll, describe, expect, test, vi } from "vitest";
import type { SessionUser } from "@/lib/auth/roles";
import { defaultFlowState } from "@/lib/flow/defaults";
import type { FlowState } from "@/lib/flow/state";
import { concreteToOrder, DEFAULT_SAWN_STOCK_FT, padCubicYards, stockLengthFor } from "@/lib/orders/rules";
import { isPdf, pdfStreamText } from "../sheets/pdf-text";
import { who } from "../support/session-mock";

const TEST_DB = process.env.TEST_DATABASE_URL;
if (TEST_DB) process.env.DATABASE_URL = TEST_DB;
process.env.NEXTAUTH_SECRET ??= "test-secret-for-vitest-only-0123456789";

vi.mock("@/lib/auth/session", () => import("../support/session-mock"));
vi.mock("next/cache", () => ({ revalidatePath: vi.fn(), revalidateTag: vi.fn() }));

const joists: FlowState = {
  ...defaultFlowState("deck-joist"),
  areaLoads: [
    { id: "l", preset: "deck", label: "Deck", case: "L", psf: 40 },
    { id: "d", preset: "floor-dead", label: "Dead", case: "D", psf: 10 },
  ],
};
const beam: FlowState = {
  ...defaultFlowState("deck-beam"),
  lengthFt: 16,
  supports: [
    { x: 0, type: "pin" },
    { x: 8, type: "roller" },
    { x: 16, type: "roller" },
  ],
};
const POST_HEIGHT_FT = 6;

function ok<T extends { ok: boolean }>(r: T): Extract<T, { ok: true }> {
  if (!r.ok) throw new Error(`expected ok, got ${JSON.stringify(r)}`);
  return r as Extract<T, { ok: true }>;
}

const params = (jobId: string) => ({ params: Promise.resolve({ jobId }) });

describe.skipIf(!TEST_DB)("the order route lists a job's built posts and footings (PostgreSQL)", () => {
  let owner: SessionUser;
  let jobId = "";
  let route: typeof import("@/app/api/jobs/[jobId]/order/route");
  let footing = { shape: "round" as "round" | "square", sizeIn: 0, thicknessIn: 0, count: 0 };

  beforeAll(async () => {
    const actions = await import("@/components/jobs/actions");
    const queries = await import("@/lib/jobs/queries");
    route = await import("@/app/api/jobs/[jobId]/order/route");
    const { getSequelize } = await import("@/lib/db");
    const { User } = await import("@/models/user");
    getSequelize();
    const user = await User.create({
      email: `order-${randomUUID().slice(0, 8)}@orders-tests.test`,
      passwordHash: "not-a-hash",
      name: "Dee Rowe",
      company: null,
      role: "subscriber",
      emailVerifiedAt: new Date(),
    });
    owner = { id: user.id, email: user.email, name: user.name, company: user.company, role: user.role };
    who.current = owner;
    const j1 = ok(await actions.saveMember({ newJob: { name: "Kestrel Lane deck" }, label: "J1 deck joists", flowState: joists, chosenMember: null }));
    jobId = j1.jobId;
    const b1 = ok(await actions.saveMember({ jobId, label: "B1 deck beam", flowState: beam, chosenMember: null })).memberId;
    ok(await actions.updateMember({ memberId: j1.memberId, carriedByMemberId: b1, bearing: { supports: [1], fromFt: 0, toFt: 16 } }));
    // typed on the beam before the posts were built: must not be counted again once they are
    ok(await actions.updateMember({ memberId: b1, postHeightFt: 4, postSize: "4x4", footingDiameterIn: 12, footingDepthIn: 36 }));
    const p1 = ok(
      await actions.addSupport({
        jobId,
        underMemberId: b1,
        label: "P1 deck posts",
        design: { type: "post", size: "6x6", plies: 1, species: "Douglas Fir-Larch", grade: "No.2", heightFt: POST_HEIGHT_FT, wet: true },
      }),
    ).memberId;
    const f1 = ok(
      await actions.addSupport({
        jobId,
        underMemberId: p1,
        label: "F1 footings",
        design: { type: "footing", shape: "round", sizeIn: null, thicknessIn: 10, soilPsf: 1500, frostDepthIn: 36, bottomDepthIn: null },
      }),
    ).memberId;
    const job = await queries.getJob(owner.id, jobId);
    const saved = job?.members.find((m) => m.id === f1)?.resultSummary;
    if (saved?.spec.material !== "footing" || !saved.pass) throw new Error(`F1 not worked out: ${JSON.stringify(saved)}`);
    footing = { shape: saved.spec.shape, sizeIn: saved.spec.sizeIn, thicknessIn: saved.spec.thicknessIn, count: saved.checks.length };
  });

  test("CSV: one designed 6x6 post per support of B1, named with the beam and each support; the pad concrete; nothing typed counted again", async () => {
    who.current = owner;
    const res = await route.GET(new Request(`http://spanlark.test/api/jobs/${jobId}/order?format=csv`), params(jobId));
    expect(res.status).toBe(200);
    const rows = Papa.parse<string[]>((await res.text()).trim()).data;
    const post = rows.find((r) => r[1] === "6x6 post");
    expect(post?.[0]).toBe("Douglas Fir-Larch No.2");
    expect(post?.[2]).toBe(String(stockLengthFor(POST_HEIGHT_FT, DEFAULT_SAWN_STOCK_FT).pieceFt));
    expect(post?.[3]).toBe(String(beam.supports.length));
    expect(post?.[7]).toBe(`P1 deck posts: 3 posts 6' 0" tall under B1 deck beam at 0' 0", 8' 0" and 16' 0"`);
    expect(rows.find((r) => r[1] === "4x4 post")).toBeUndefined();
    expect(footing.count).toBe(beam.supports.length);
    const concrete = rows.find((r) => r[1] === "Footing concrete");
    expect(concrete?.[3]).toBe(String(concreteToOrder(footing.count * padCubicYards(footing.shape, footing.sizeIn, footing.thicknessIn))));
    expect(concrete?.[7]).toMatch(/^F1 footings: 3 footings \d+ in round × 10 in thick under P1 deck posts \(B1 deck beam\) at 0' 0", 8' 0" and 16' 0"$/);
    expect(concrete?.[8]).not.toMatch(/typed on a beam/);
  });

  test("PDF: the same lines with the member and supports they come from", async () => {
    who.current = owner;
    const res = await route.GET(new Request(`http://spanlark.test/api/jobs/${jobId}/order?format=pdf`), params(jobId));
    expect(res.status).toBe(200);
    const pdf = Buffer.from(await res.arrayBuffer());
    expect(isPdf(pdf)).toBe(true);
    const text = pdfStreamText(pdf).replace(/\s+/g, " ");
    expect(text).toContain("6x6 post");
    expect(text).toContain("P1 deck posts: 3 posts");
    expect(text).toContain("under B1 deck beam at");
    expect(text).toContain("Footing concrete");
    expect(text).toContain("F1 footings: 3 footings");
  });
});
