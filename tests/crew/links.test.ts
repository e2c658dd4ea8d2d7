import { beforeEach, describe, expect, test, vi } from "vitest";
import { TEST_DB, asSessionUser, makeAccount, makeJob } from "./fixtures";
import { who } from "../support/session-mock";

const mail = vi.hoisted(() => ({ sent: [] as { to: string; subject: string; text: string; html: string }[] }));

vi.mock("@/lib/auth/session", () => import("../support/session-mock"));
vi.mock("@/lib/mail", () => ({
  sendMail: vi.fn(async (m: { to: string; subject: string; text: string; html: string }) => {
    mail.sent.push(m);
    return { messageId: "<test@crew>" };
  }),
}));
vi.mock("next/cache", () => ({ revalidatePath: vi.fn() }));

const { createCrewLink, listCrewLinks, openCrewLink, revokeCrewLink, countActiveCrewLinks } = await import("@/lib/crew/links");
const actions = await import("@/components/crew/actions");
const { HttpError } = await import("@/lib/http");
const { CrewLink } = await import("@/models/crew-link");
const { Job } = await import("@/models/job");
const { Member } = await import("@/models/member");
const { FREE_LIMITS } = await import("@/lib/payments/plans");
const { hashCrewToken } = await import("@/lib/crew/token");

beforeEach(() => {
  who.current = null;
  mail.sent.length = 0;
});

function tokenOf(url: string | null): string {
  const m = /\/crew\/([A-Za-z0-9_-]+)$/.exec(url ?? "");
  if (!m) throw new Error(`not a crew link: ${url}`);
  return m[1];
}

async function statusOf(work: () => Promise<unknown>): Promise<number | "ok"> {
  try {
    await work();
    return "ok";
  } catch (err) {
    if (err instanceof HttpError) return err.status;
    throw err;
  }
}

describe.skipIf(!TEST_DB)("crew links", () => {
  test("a new link opens the job's schedule without an account, as saved with each member", async () => {
    const owner = await makeAccount("builder");
    const { job, header } = await makeJob(owner.id, { unsized: true });
    const link = await createCrewLink({ ownerId: owner.id, jobId: job.id, label: "Framing crew", expiresInDays: 0, activeLimit: null });
    expect(link.status).toBe("active");
    const view = await openCrewLink(tokenOf(link.url));
    expect(view?.job).toEqual({ name: "Marsh Lane addition", siteAddress: "14 Marsh Lane, Larkfield", notes: job.notes });
    expect(view?.rows.map((r) => r.label)).toEqual(["H1 kitchen header", "J1 family room joists", "B1 not sized"]);
    const h = view!.rows[0];
    expect(h.headline).toBe(header.resultSummary!.headline);
    expect(h.supports).toHaveLength(2);
    const studs = header.resultSummary!.reactions[0].jackStuds!;
    expect(h.supports[0].bearing).toBe(`${studs} jack stud${studs === 1 ? "" : "s"}`);
    expect(h.supports[0].reaction).toBe(`${Math.round(header.resultSummary!.reactions[0].maxDown).toLocaleString("en-US")} lb down`);
    expect(view!.rows[2].headline).toBeNull();
  });

  test("the database keeps only the token's hash and a sealed copy, never the token itself", async () => {
    const owner = await makeAccount("builder");
    const { job } = await makeJob(owner.id);
    const link = await createCrewLink({ ownerId: owner.id, jobId: job.id, expiresInDays: 0, activeLimit: null });
    const token = tokenOf(link.url);
    const row = await CrewLink.findByPk(link.id);
    expect(row!.tokenHash).toBe(hashCrewToken(token));
    expect(JSON.stringify(row!.get({ plain: true }))).not.toContain(token);
    // the owner can copy it again later
    const [listed] = await listCrewLinks(owner.id, job.id);
    expect(listed.url).toBe(link.url);
  });

  test("revoking stops the link at once; revoking twice changes nothing", async () => {
    const owner = await makeAccount("builder");
    const { job } = await makeJob(owner.id);
    const link = await createCrewLink({ ownerId: owner.id, jobId: job.id, expiresInDays: 0, activeLimit: null });
    const token = tokenOf(link.url);
    expect(await openCrewLink(token)).not.toBeNull();
    const revoked = await revokeCrewLink(owner.id, link.id);
    expect(revoked.status).toBe("revoked");
    expect(revoked.url).toBeNull();
    expect(await openCrewLink(token)).toBeNull();
    const again = await revokeCrewLink(owner.id, link.id);
    expect(again.revokedAt).toBe(revoked.revokedAt);
  });

  test.each([
    { label: "1 day, opened after 23 h", days: 1, laterMs: 23 * 3600_000, open: true },
    { label: "1 day, opened after 25 h", days: 1, laterMs: 25 * 3600_000, open: false },
    { label: "7 days, opened after 8 days", days: 7, laterMs: 8 * 86_400_000, open: false },
    { label: "no expiry, opened after a year", days: 0, laterMs: 365 * 86_400_000, open: true },
  ])("expiry: $label → opens: $open", async ({ days, laterMs, open }) => {
    const owner = await makeAccount("builder");
    const { job } = await makeJob(owner.id);
    const now = new Date();
    const link = await createCrewLink({ ownerId: owner.id, jobId: job.id, expiresInDays: days, activeLimit: null, now });
    const later = new Date(now.getTime() + laterMs);
    expect((await openCrewLink(tokenOf(link.url), later)) !== null).toBe(open);
    const [listed] = await listCrewLinks(owner.id, job.id, later);
    expect(listed.status).toBe(open ? "active" : "expired");
  });

  test("an unknown, malformed or deleted-job token opens nothing", async () => {
    const owner = await makeAccount("builder");
    const { job } = await makeJob(owner.id);
    const link = await createCrewLink({ ownerId: owner.id, jobId: job.id, expiresInDays: 0, activeLimit: null });
    expect(await openCrewLink("A".repeat(43))).toBeNull();
    expect(await openCrewLink("not a token")).toBeNull();
    await Job.update({ deletedAt: new Date() }, { where: { id: job.id } });
    expect(await openCrewLink(tokenOf(link.url))).toBeNull();
  });

  test("a deleted member leaves the schedule; a changed member shows its new answer", async () => {
    const owner = await makeAccount("builder");
    const { job, joist } = await makeJob(owner.id);
    const link = await createCrewLink({ ownerId: owner.id, jobId: job.id, expiresInDays: 0, activeLimit: null });
    await Member.update({ deletedAt: new Date() }, { where: { id: joist.id } });
    const view = await openCrewLink(tokenOf(link.url));
    expect(view?.rows.map((r) => r.label)).toEqual(["H1 kitchen header"]);
  });

  test("nobody but the owner lists, makes or revokes a job's links (404, as if it did not exist)", async () => {
    const owner = await makeAccount("builder");
    const stranger = await makeAccount("subscriber");
    const { job } = await makeJob(owner.id);
    const link = await createCrewLink({ ownerId: owner.id, jobId: job.id, expiresInDays: 0, activeLimit: null });
    expect(await statusOf(() => listCrewLinks(stranger.id, job.id))).toBe(404);
    expect(await statusOf(() => createCrewLink({ ownerId: stranger.id, jobId: job.id, expiresInDays: 0, activeLimit: null }))).toBe(404);
    expect(await statusOf(() => revokeCrewLink(stranger.id, link.id))).toBe(404);
    expect((await CrewLink.findByPk(link.id))!.revokedAt).toBeNull();
  });

  test(`a free account keeps at most FREE_LIMITS.activeCrewLinks (${FREE_LIMITS.activeCrewLinks}) live links across its jobs`, async () => {
    const owner = await makeAccount("builder");
    const { job } = await makeJob(owner.id);
    const { job: other } = await makeJob(owner.id);
    const made = [];
    for (let i = 0; i < FREE_LIMITS.activeCrewLinks; i++) {
      made.push(await createCrewLink({ ownerId: owner.id, jobId: i % 2 ? other.id : job.id, expiresInDays: 0, activeLimit: FREE_LIMITS.activeCrewLinks }));
    }
    expect(await countActiveCrewLinks(owner.id)).toBe(FREE_LIMITS.activeCrewLinks);
    const refused = await createCrewLink({ ownerId: owner.id, jobId: job.id, expiresInDays: 0, activeLimit: FREE_LIMITS.activeCrewLinks }).catch(
      (e: unknown) => e,
    );
    expect(refused).toBeInstanceOf(HttpError);
    expect((refused as InstanceType<typeof HttpError>).status).toBe(403);
    expect((refused as Error).message).toMatch(/free account can keep 3 crew links live/i);
    await revokeCrewLink(owner.id, made[0].id);
    await expect(createCrewLink({ ownerId: owner.id, jobId: job.id, expiresInDays: 0, activeLimit: FREE_LIMITS.activeCrewLinks })).resolves.toMatchObject({
      status: "active",
    });
  });
});

describe.skipIf(!TEST_DB)("crew link actions", () => {
  test("signed out, every crew action is refused with 401, even holding a valid token", async () => {
    const owner = await makeAccount("builder");
    const { job } = await makeJob(owner.id);
    const link = await createCrewLink({ ownerId: owner.id, jobId: job.id, expiresInDays: 0, activeLimit: null });
    const token = tokenOf(link.url);
    who.current = null;
    expect(await actions.createCrewLink({ jobId: job.id, expiresInDays: 0, token })).toMatchObject({ ok: false, status: 401 });
    expect(await actions.revokeCrewLink({ linkId: link.id, token })).toMatchObject({ ok: false, status: 401 });
    expect(await actions.sendCrewLink({ linkId: link.id, to: "crew@example.test", token })).toMatchObject({ ok: false, status: 401 });
    expect((await CrewLink.findByPk(link.id))!.revokedAt).toBeNull();
  });

  test("the owner makes a link, e-mails it with the job-shared mail, then revokes it", async () => {
    const owner = await makeAccount("builder");
    const { job } = await makeJob(owner.id);
    who.current = asSessionUser(owner);
    const made = await actions.createCrewLink({ jobId: job.id, label: "Crew", expiresInDays: "7" });
    expect(made.ok).toBe(true);
    if (!made.ok) return;
    const sent = await actions.sendCrewLink({ linkId: made.link.id, to: "Framer@Example.test", note: "Headers first" });
    expect(sent).toEqual({ ok: true, sentTo: "framer@example.test" });
    expect(mail.sent).toHaveLength(1);
    expect(mail.sent[0].to).toBe("framer@example.test");
    expect(mail.sent[0].text).toContain(made.link.url!);
    expect(mail.sent[0].text).toContain("Marsh Lane addition");
    expect(mail.sent[0].text).toContain("Headers first");
    const revoked = await actions.revokeCrewLink({ linkId: made.link.id });
    expect(revoked).toMatchObject({ ok: true, link: { status: "revoked" } });
    expect(await actions.sendCrewLink({ linkId: made.link.id, to: "framer@example.test" })).toMatchObject({ ok: false, status: 409 });
    expect(mail.sent).toHaveLength(1);
  });

  test.each([
    { label: "expiry not offered", input: { expiresInDays: 3 }, path: "expiresInDays" },
    { label: "job id not a uuid", input: { jobId: "12", expiresInDays: 0 }, path: "jobId" },
    { label: "label too long", input: { label: "x".repeat(81), expiresInDays: 0 }, path: "label" },
  ])("bad input ($label) gets a 400 naming the field and changes nothing", async ({ input, path }) => {
    const owner = await makeAccount("builder");
    const { job } = await makeJob(owner.id);
    who.current = asSessionUser(owner);
    const result = await actions.createCrewLink({ jobId: job.id, ...input });
    expect(result).toMatchObject({ ok: false, status: 400 });
    expect(!result.ok && "issues" in result ? result.issues?.map((i) => i.path) : []).toContain(path);
    expect(await CrewLink.count({ where: { jobId: job.id } })).toBe(0);
  });

  test("an e-mail address that is not one is refused by name", async () => {
    const owner = await makeAccount("builder");
    const { job } = await makeJob(owner.id);
    who.current = asSessionUser(owner);
    const made = await actions.createCrewLink({ jobId: job.id, expiresInDays: 0 });
    if (!made.ok) throw new Error(made.error);
    const result = await actions.sendCrewLink({ linkId: made.link.id, to: "not-an-address" });
    expect(result).toMatchObject({ ok: false, status: 400, issues: [{ path: "to", message: "must be an e-mail address" }] });
    expect(mail.sent).toHaveLength(0);
  });

  test("the free limit reaches the owner as a clear message, not an error page", async () => {
    const owner = await makeAccount("builder");
    const { job } = await makeJob(owner.id);
    who.current = asSessionUser(owner);
    const { FREE_LIMITS: limits } = await import("@/lib/payments/plans");
    for (let i = 0; i < limits.activeCrewLinks; i++) expect((await actions.createCrewLink({ jobId: job.id, expiresInDays: 0 })).ok).toBe(true);
    const over = await actions.createCrewLink({ jobId: job.id, expiresInDays: 0 });
    expect(over).toMatchObject({ ok: false, status: 403 });
    expect(!over.ok && over.error).toMatch(/Revoke one you no longer need, or subscribe/);
  });
});
