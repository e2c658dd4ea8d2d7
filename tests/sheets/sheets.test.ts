import { beforeEach, describe, expect, test, vi } from "vitest";
import type { MaterialTables } from "@/lib/tables/types";
import { TEST_DB, asSessionUser, headerState, makeAccount, makeJob } from "../crew/fixtures";
import { isPdf, pdfStreamText } from "./pdf-text";
import { who } from "../support/session-mock";

const tables = vi.hoisted(() => ({ current: null as MaterialTables | null }));

vi.mock("@/lib/auth/session", () => import("../support/session-mock"));
vi.mock("@/lib/tables/current", async () => {
  const { STARTER_TABLES } = await import("@/lib/tables");
  return { getCurrentTables: async () => tables.current ?? STARTER_TABLES };
});
vi.mock("next/cache", () => ({ revalidatePath: vi.fn() }));

const { saveJobSheet, getJobSheet, listJobSheets } = await import("@/lib/sheets/sheets");
const actions = await import("@/components/sheets/actions");
const { GET: pdfRoute } = await import("@/app/api/sheets/[id]/pdf/route");
const { HttpError } = await import("@/lib/http");
const { JobSheet } = await import("@/models/job-sheet");
const { Member } = await import("@/models/member");
const { User } = await import("@/models/user");
const { STARTER_TABLES } = await import("@/lib/tables");
const { SHEET_CREATE_DENIED, SHEET_REPRINT_DENIED } = await import("@/lib/sheets/access");

beforeEach(() => {
  who.current = null;
  tables.current = null;
});

async function getPdf(id: string, query = ""): Promise<Response> {
  return pdfRoute(new Request(`http://127.0.0.1:3100/api/sheets/${id}/pdf${query}`), { params: Promise.resolve({ id }) });
}

function editedTables(): MaterialTables {
  const copy = structuredClone(STARTER_TABLES) as MaterialTables;
  copy.version = "edited-2026.2";
  for (const v of copy.sawnValues) if (v.species === "Douglas Fir-Larch" && v.grade === "No.2") v.Fb = Math.round(v.Fb * 0.6);
  return copy;
}

describe.skipIf(!TEST_DB)("job sheets: gating", () => {
  test("a free builder cannot save a sheet: 403 with a message that says why and what still works", async () => {
    const dee = await makeAccount("builder");
    const { job } = await makeJob(dee.id);
    who.current = asSessionUser(dee);
    const result = await actions.saveJobSheet({ jobId: job.id });
    // the one action helper carries the way to the plans, as the job actions always did
    expect(result).toEqual({ ok: false, status: 403, error: SHEET_CREATE_DENIED, upgrade: "/pricing" });
    expect(SHEET_CREATE_DENIED).toMatch(/needs a subscription/);
    expect(await JobSheet.count({ where: { ownerId: dee.id } })).toBe(0);
  });

  test("a lapsed subscriber keeps reading saved sheets but cannot save, print or download new ones", async () => {
    const sam = await makeAccount("subscriber");
    const { job } = await makeJob(sam.id);
    who.current = asSessionUser(sam);
    const saved = await actions.saveJobSheet({ jobId: job.id });
    if (!saved.ok) throw new Error(saved.error);
    expect((await getPdf(saved.sheet.id)).status).toBe(200);

    await User.update({ role: "builder" }, { where: { id: sam.id } });
    who.current = { ...asSessionUser(sam), role: "builder" };
    expect((await listJobSheets(sam.id)).map((s) => s.id)).toEqual([saved.sheet.id]);
    expect((await getJobSheet(sam.id, saved.sheet.id)).snapshot.members).toHaveLength(2);
    const pdf = await getPdf(saved.sheet.id);
    expect(pdf.status).toBe(403);
    expect(await pdf.json()).toMatchObject({ error: SHEET_REPRINT_DENIED });
    expect(await actions.saveJobSheet({ jobId: job.id })).toMatchObject({ ok: false, status: 403 });
    expect(await JobSheet.count({ where: { ownerId: sam.id } })).toBe(1);
  });
});

describe.skipIf(!TEST_DB)("job sheets: frozen when saved", () => {
  test("after the tables and the member change, the sheet's data and PDF are what they were", async () => {
    const sam = await makeAccount("subscriber");
    const { job, header } = await makeJob(sam.id);
    who.current = asSessionUser(sam);
    const saved = await actions.saveJobSheet({ jobId: job.id });
    if (!saved.ok) throw new Error(saved.error);
    expect(saved.sheet.tablesVersion).toBe(STARTER_TABLES.version);
    const before = await getJobSheet(sam.id, saved.sheet.id);
    const pdfBefore = await getPdf(saved.sheet.id);
    expect(pdfBefore.headers.get("content-type")).toBe("application/pdf");
    const textBefore = pdfStreamText(Buffer.from(await pdfBefore.arrayBuffer()));

    // an admin publishes new tables, and the builder lengthens the header
    tables.current = editedTables();
    await Member.update(
      {
        flowState: {
          ...headerState(),
          lengthFt: 12,
          supports: [
            { x: 0, type: "pin" },
            { x: 12, type: "roller" },
          ],
        },
        label: "H1 renamed",
      },
      { where: { id: header.id } },
    );

    const after = await getJobSheet(sam.id, saved.sheet.id);
    expect(after.snapshot).toEqual(before.snapshot);
    expect(after.tablesVersion).toBe(STARTER_TABLES.version);
    const textAfter = pdfStreamText(Buffer.from(await (await getPdf(saved.sheet.id)).arrayBuffer()));
    expect(textAfter).toBe(textBefore);
    expect(textAfter).toContain("H1 kitchen header");
    expect(textAfter).not.toContain("H1 renamed");

    // a new sheet saved now carries the new tables and the changed member
    const fresh = await actions.saveJobSheet({ jobId: job.id });
    if (!fresh.ok) throw new Error(fresh.error);
    const freshSheet = await getJobSheet(sam.id, fresh.sheet.id);
    expect(freshSheet.tablesVersion).toBe("edited-2026.2");
    expect(freshSheet.snapshot.members[0]).toMatchObject({ label: "H1 renamed", lengthFt: 12 });
    expect(freshSheet.snapshot.members[0].ratio).toBeGreaterThan(before.snapshot.members[0].ratio);
  });

  test("the PDF is a valid PDF with the members' names, on Letter or A4; a bad paper is a 400", async () => {
    const sam = await makeAccount("subscriber");
    const { job } = await makeJob(sam.id);
    who.current = asSessionUser(sam);
    const saved = await saveJobSheet(asSessionUser(sam), job.id);
    for (const q of ["", "?paper=a4"]) {
      const res = await getPdf(saved.id, q);
      expect(res.status).toBe(200);
      expect(res.headers.get("content-disposition")).toMatch(/^attachment; filename="Marsh-Lane-addition-\d{1,2}-[A-Z][a-z]{2}-\d{4}\.pdf"$/);
      const buf = Buffer.from(await res.arrayBuffer());
      expect(isPdf(buf)).toBe(true);
      const text = pdfStreamText(buf);
      expect(text).toContain("H1 kitchen header");
      expect(text).toContain("J1 family room joists");
    }
    const bad = await getPdf(saved.id, "?paper=legal");
    expect(bad.status).toBe(400);
    expect(await bad.json()).toMatchObject({ issues: [{ path: "paper", message: "must be letter or a4" }] });
  });
});

describe.skipIf(!TEST_DB)("job sheets: only the owner", () => {
  test("another account gets 404 for the sheet, its PDF and saving a sheet of the job", async () => {
    const sam = await makeAccount("subscriber");
    const other = await makeAccount("subscriber");
    const { job } = await makeJob(sam.id);
    const saved = await saveJobSheet(asSessionUser(sam), job.id);
    who.current = asSessionUser(other);
    expect((await getPdf(saved.id)).status).toBe(404);
    await expect(getJobSheet(other.id, saved.id)).rejects.toMatchObject({ status: 404 });
    expect(await actions.saveJobSheet({ jobId: job.id })).toMatchObject({ ok: false, status: 404 });
    expect(await listJobSheets(other.id)).toEqual([]);
    who.current = null;
    expect((await getPdf(saved.id)).status).toBe(401);
  });

  test("a job with nothing sized is a 400 that says what to do", async () => {
    const sam = await makeAccount("subscriber");
    const { job, header, joist } = await makeJob(sam.id);
    await Member.update({ chosenMember: null, resultSummary: null }, { where: { id: [header.id, joist.id] } });
    const err = await saveJobSheet(asSessionUser(sam), job.id).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(HttpError);
    expect(err).toMatchObject({ status: 400, message: expect.stringMatching(/pick the size to build/) });
  });
});
