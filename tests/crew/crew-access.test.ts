// The crew link's access rules: the page opens signed out with a live token, a revoked or expired token is a
// plain 404 page, the page is kept out of search engines, and a token opens nothing else: no route or action
// that writes accepts it in place of a session.
import { readdirSync, statSync } from "node:fs";
import path from "node:path";
import { renderToStaticMarkup } from "react-dom/server";
import { beforeEach, describe, expect, test, vi } from "vitest";
import { CAUTION as CAUTION_TEXT } from "@/lib/caution";
import { ACCESS_TABLE } from "../api/access-table";
import { TEST_DB, makeAccount, makeJob } from "./fixtures";
import { who } from "../support/session-mock";

vi.mock("@/lib/auth/session", () => import("../support/session-mock"));
vi.mock("next/cache", () => ({ revalidatePath: vi.fn() }));

const page = await import("@/app/(public)/crew/[token]/page");
const notFoundPage = await import("@/app/(public)/crew/[token]/not-found");
const { createCrewLink, revokeCrewLink } = await import("@/lib/crew/links");
const { CrewLink } = await import("@/models/crew-link");
const { Job } = await import("@/models/job");
const { Member } = await import("@/models/member");

beforeEach(() => {
  who.current = null;
});

const root = path.resolve(__dirname, "../..");

function walk(dir: string, match: (name: string) => boolean): string[] {
  let found: string[] = [];
  for (const entry of readdirSync(dir)) {
    const full = path.join(dir, entry);
    if (statSync(full).isDirectory()) found = found.concat(walk(full, match));
    else if (match(entry)) found.push(full);
  }
  return found;
}

async function render(token: string): Promise<{ html: string } | { status: number }> {
  try {
    const element = await page.default({ params: Promise.resolve({ token }) });
    return { html: renderToStaticMarkup(element) };
  } catch (err) {
    // next/navigation notFound() throws an error whose digest carries the HTTP status
    const digest = String((err as { digest?: unknown }).digest ?? "");
    const m = /;(\d{3})$/.exec(digest);
    if (m) return { status: Number(m[1]) };
    throw err;
  }
}

function tokenOf(url: string | null): string {
  return /\/crew\/([A-Za-z0-9_-]+)$/.exec(url ?? "")![1];
}

describe("the crew page's metadata", () => {
  test("tells search engines to keep out and browsers to send no referrer", () => {
    expect(page.metadata.robots).toMatchObject({ index: false, follow: false });
    expect(page.metadata.referrer).toBe("no-referrer");
    expect(notFoundPage.metadata.robots).toMatchObject({ index: false, follow: false });
  });

  test("the no-longer-active page says so plainly", () => {
    const html = renderToStaticMarkup(notFoundPage.default());
    expect(html).toContain("This link is no longer active");
  });

  test("only GET rows of the authorization table may be opened by a crew link", () => {
    const crewRows = ACCESS_TABLE.filter((r) => r.allowed.includes("crew"));
    expect(crewRows.filter((r) => r.method !== "GET")).toEqual([]);
  });
});

describe.skipIf(!TEST_DB)("the crew page", () => {
  test("signed out, a live link shows the schedule and the full caution, with nothing to edit", async () => {
    const owner = await makeAccount("builder");
    const { job, header } = await makeJob(owner.id);
    const link = await createCrewLink({ ownerId: owner.id, jobId: job.id, expiresInDays: 0, activeLimit: null });
    const out = await render(tokenOf(link.url));
    if (!("html" in out)) throw new Error(`status ${out.status}`);
    expect(out.html).toContain("Marsh Lane addition");
    expect(out.html).toContain("H1 kitchen header");
    // the headline's trade fractions and ply counts sit in no-wrap spans: read the text without the tags
    expect(out.html.replace(/<[^>]+>/g, "")).toContain(header.resultSummary!.headline.replace("&", "&amp;"));
    expect(out.html).toContain("Member schedule");
    expect(out.html).toContain(CAUTION_TEXT.slice(0, 60));
    expect(out.html).toContain("Spanlark does not check");
    expect(out.html).not.toMatch(/<form|<input|<button|<textarea|<select/);
    expect(out.html).not.toContain(`/jobs/${job.id}`);
  });

  test.each([
    { label: "revoked", act: async (ownerId: string, id: string) => void (await revokeCrewLink(ownerId, id)) },
    { label: "expired", act: async (_o: string, id: string) => void (await CrewLink.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id } })) },
  ])("a $label link is a 404", async ({ act }) => {
    const owner = await makeAccount("builder");
    const { job } = await makeJob(owner.id);
    const link = await createCrewLink({ ownerId: owner.id, jobId: job.id, expiresInDays: 30, activeLimit: null });
    await act(owner.id, link.id);
    expect(await render(tokenOf(link.url))).toEqual({ status: 404 });
  });

  test("a made-up token is a 404", async () => {
    expect(await render("x".repeat(43))).toEqual({ status: 404 });
    expect(await render("short")).toEqual({ status: 404 });
  });

  test("no write route or action on jobs, members, crew links or sheets accepts a crew token instead of a session", async () => {
    const owner = await makeAccount("builder");
    const { job, header } = await makeJob(owner.id);
    const link = await createCrewLink({ ownerId: owner.id, jobId: job.id, expiresInDays: 0, activeLimit: null });
    const token = tokenOf(link.url);
    const before = JSON.stringify({
      job: (await Job.findByPk(job.id))!.get({ plain: true }),
      member: (await Member.findByPk(header.id))!.get({ plain: true }),
    });
    const payload = {
      token,
      crewToken: token,
      jobId: job.id,
      memberId: header.id,
      linkId: link.id,
      id: header.id,
      name: "Hacked",
      label: "Hacked",
      expiresInDays: 0,
      to: "x@example.test",
    };

    const tried: string[] = [];
    const routes = walk(path.join(root, "app/api"), (n) => n === "route.ts").filter((f) => /jobs|members|crew|sheets/.test(f));
    for (const file of routes) {
      const mod = (await import(file)) as Record<string, unknown>;
      for (const method of ["POST", "PUT", "PATCH", "DELETE"] as const) {
        const handler = mod[method] as ((req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>) | undefined;
        if (!handler) continue;
        const params = { id: header.id, jobId: job.id, memberId: header.id, token };
        const req = new Request(`http://127.0.0.1:3100/api/x?token=${token}`, {
          method,
          headers: { "content-type": "application/json", authorization: `Bearer ${token}`, "x-crew-token": token, cookie: `crew=${token}` },
          body: JSON.stringify(payload),
        });
        const res = await handler(req, { params: Promise.resolve(params) });
        tried.push(`${method} ${path.relative(root, file)}`);
        expect([401, 403, 404], `${method} ${file}`).toContain(res.status);
      }
    }
    const actionFiles = walk(path.join(root, "components"), (n) => n === "actions.ts").filter((f) => /components\/(jobs|crew|sheets)\//.test(f));
    for (const file of actionFiles) {
      const mod = (await import(file)) as Record<string, unknown>;
      for (const [name, fn] of Object.entries(mod)) {
        if (typeof fn !== "function") continue;
        const result = (await (fn as (...a: unknown[]) => Promise<unknown>)(payload, token)) as { ok?: boolean; status?: number };
        tried.push(`${path.relative(root, file)}#${name}`);
        expect(result, `${file}#${name}`).toMatchObject({ ok: false, status: 401 });
      }
    }
    expect(tried.length).toBeGreaterThanOrEqual(4);
    const after = JSON.stringify({ job: (await Job.findByPk(job.id))!.get({ plain: true }), member: (await Member.findByPk(header.id))!.get({ plain: true }) });
    expect(after).toBe(before);
    expect((await CrewLink.findByPk(link.id))!.revokedAt).toBeNull();
  });
});
