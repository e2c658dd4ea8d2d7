// The crew sheet PDF route against PostgreSQL: ten opens of an unchanged schedule draw it once; a phone holding the
// current copy (If-None-Match, RFC 9110 §13.1.2) gets a 304 and nothing is drawn; a changed member, another paper or
// a revoked link is never answered from the cache. The cache's bounds are checked without the database.
import { beforeEach, describe, expect, test, vi } from "vitest";
import { defaultFlowState } from "@/lib/flow/defaults";
import type { CrewJobView } from "@/lib/crew/links";
import { TEST_DB, makeAccount, makeJob } from "./fixtures";
import { isPdf } from "../sheets/pdf-text";

vi.mock("next/cache", () => ({ revalidatePath: vi.fn() }));

const cache = await import("@/lib/crew/pdf-cache");

beforeEach(() => cache.resetCrewPdfCache());

function tokenOf(url: string | null): string {
  const m = /\/crew\/([A-Za-z0-9_-]+)$/.exec(url ?? "");
  if (!m) throw new Error(`not a crew link: ${url}`);
  return m[1];
}

describe("ETag matching (RFC 9110 §13.1.2: If-None-Match uses the weak comparison)", () => {
  test.each([
    { header: null, match: false },
    { header: '"abc"', match: true },
    { header: 'W/"abc"', match: true },
    { header: '"x", "abc"', match: true },
    { header: "*", match: true },
    { header: '"abcd"', match: false },
  ])("If-None-Match $header", ({ header, match }) => {
    expect(cache.etagMatches(header, '"abc"')).toBe(match);
  });
});

describe("the cache's bounds", () => {
  const view = (name: string): CrewJobView => ({
    job: { name, siteAddress: "", notes: "" },
    rows: [],
    expiresAt: null,
    notChecked: [],
    changedAt: new Date(0).toISOString(),
    readAt: new Date(0).toISOString(),
  });
  const now = new Date("2026-12-03T12:00:00Z");

  test("one drawing per version, however many ask at once; the least recently used sheet leaves first", async () => {
    const a = view("Kestrel Lane deck");
    const url = "http://spanlark.test/crew/AAAAAAAAAAAAAAAAAAAAAA";
    const ten = await Promise.all(Array.from({ length: 10 }, () => cache.crewPdf(a, url, "letter", now)));
    expect(cache.crewPdfCounts()).toMatchObject({ renders: 1, hits: 9, entries: 1 });
    expect(new Set(ten).size).toBe(1);
    expect(isPdf(ten[0])).toBe(true);
  });

  test("bounded by entries and bytes, the least recently used out first; a failed making is not kept", async () => {
    const made: string[] = [];
    const c = new cache.VersionCache<string>(3, 10, (v: string) => v.length);
    const get = (k: string, v = k) => c.get(k, async () => (made.push(k), v));
    await get("a", "aa");
    await get("b", "bb");
    await get("c", "cc");
    await get("a", "aa"); // a is now the most recently used
    await get("d", "dd"); // four entries: b leaves
    expect(c.size).toEqual({ entries: 3, bytes: 6 });
    await get("b", "bb");
    expect(made).toEqual(["a", "b", "c", "d", "b"]);
    // 8 bytes: a leaves for the count (4 entries); then 2 + 2 + 8 = 12 bytes is over 10: d leaves too
    await get("e", "eeeeeeee");
    expect(c.size).toEqual({ entries: 2, bytes: 10 });
    await expect(c.get("x", () => Promise.reject(new Error("no")))).rejects.toThrow("no");
    await get("x");
    expect(made.at(-1)).toBe("x");
  });

  test("the version follows what the sheet draws: the schedule, the paper and the printed day", () => {
    const url = "http://spanlark.test/crew/AAAAAAAAAAAAAAAAAAAAAA";
    const v = cache.crewPdfVersion(view("A"), url, "letter", now);
    expect(cache.crewPdfVersion({ ...view("A"), readAt: new Date().toISOString() }, url, "letter", now)).toBe(v);
    expect(cache.crewPdfVersion(view("B"), url, "letter", now)).not.toBe(v);
    expect(cache.crewPdfVersion(view("A"), url, "a4", now)).not.toBe(v);
    expect(cache.crewPdfVersion(view("A"), url, "letter", new Date("2026-12-04T12:00:00Z"))).not.toBe(v);
  });
});

describe.skipIf(!TEST_DB)("GET /api/crew/[token]/pdf with the cache (PostgreSQL)", () => {
  test("ten opens draw one sheet; the current copy is a 304; a change, another paper or a revoked link is not served from it", async () => {
    const { createCrewLink, revokeCrewLink } = await import("@/lib/crew/links");
    const { updateMember } = await import("@/lib/jobs/service");
    const route = await import("@/app/api/crew/[token]/pdf/route");
    const owner = await makeAccount("builder");
    const { job, joist } = await makeJob(owner.id);
    const link = await createCrewLink({ ownerId: owner.id, jobId: job.id, label: "Framing crew", expiresInDays: 0, activeLimit: null });
    const token = tokenOf(link.url);
    const get = (query = "", headers: Record<string, string> = {}) =>
      route.GET(new Request(`http://spanlark.test/api/crew/${token}/pdf${query}`, { headers }), { params: Promise.resolve({ token }) });

    const first = await get();
    expect(first.status).toBe(200);
    const etag = first.headers.get("etag")!;
    expect(etag).toMatch(/^"[\w-]+"$/);
    expect(isPdf(Buffer.from(await first.arrayBuffer()))).toBe(true);
    for (let i = 0; i < 9; i++) expect((await get()).headers.get("etag")).toBe(etag);
    expect(cache.crewPdfCounts()).toMatchObject({ renders: 1, hits: 9 });

    const kept = await get("", { "if-none-match": etag });
    expect(kept.status).toBe(304);
    expect(await kept.text()).toBe("");
    expect(cache.crewPdfCounts()).toMatchObject({ renders: 1, hits: 9 });

    expect((await get("?paper=a4")).headers.get("etag")).not.toBe(etag);
    expect(cache.crewPdfCounts().renders).toBe(2);

    // the joists get longer: a new schedule, a new version, drawn again
    await updateMember(owner.id, {
      memberId: joist.id,
      flowState: {
        ...defaultFlowState("floor-joist"),
        lengthFt: 14,
        supports: [
          { x: 0, type: "pin" },
          { x: 14, type: "roller" },
        ],
      },
    });
    const changed = await get("", { "if-none-match": etag });
    expect(changed.status).toBe(200);
    expect(changed.headers.get("etag")).not.toBe(etag);
    expect(cache.crewPdfCounts().renders).toBe(3);

    await revokeCrewLink(owner.id, link.id);
    expect((await get("", { "if-none-match": changed.headers.get("etag")! })).status).toBe(404);
  });
});
