import { afterAll, beforeAll, describe, expect, test, vi } from "vitest";
import { getSequelize } from "@/lib/db";
import { STARTER_TABLES } from "@/lib/tables";
import { getCurrentTables, getTablesVersion, resetTablesCache } from "@/lib/tables/current";
import { expectedHeader, MAX_CSV_BYTES } from "@/lib/tables/csv/format";
import { seedTables } from "@/lib/tables/db/write";
import { TableVersion } from "@/models/material-tables";
import { makeAdmin, TEST_DB, useOwnMigratedDatabase, type OwnDatabase } from "../tables/db/support";
import { who } from "../support/session-mock";

// The admin table routes, called directly with a mocked session, on a database of this file's own.

process.env.NEXTAUTH_SECRET ??= "test-secret-for-vitest-only-0123456789";

vi.mock("@/lib/auth/session", () => import("../support/session-mock"));

const overview = await import("@/app/api/admin/tables/route");
const tableRoute = await import("@/app/api/admin/tables/[table]/route");
const rowsRoute = await import("@/app/api/admin/tables/[table]/rows/route");
const csvRoute = await import("@/app/api/admin/tables/[table]/csv/route");
const previewRoute = await import("@/app/api/admin/tables/[table]/import/preview/route");
const importRoute = await import("@/app/api/admin/tables/[table]/import/route");
const versionsRoute = await import("@/app/api/admin/tables/versions/route");
const versionRoute = await import("@/app/api/admin/tables/versions/[versionId]/route");
const restoreRoute = await import("@/app/api/admin/tables/versions/[versionId]/restore/route");

let db: OwnDatabase;

const params = <T extends Record<string, string>>(p: T) => ({ params: Promise.resolve(p) });
const json = (method: string, body: unknown) =>
  new Request("http://spanlark.test/api/admin/tables", { method, body: JSON.stringify(body), headers: { "content-type": "application/json" } });
const get = (query = "") => new Request(`http://spanlark.test/api/admin/tables${query}`);

async function multipart(file: File, fields: Record<string, string> = {}): Promise<Request> {
  const form = new FormData();
  form.set("file", file);
  for (const [k, v] of Object.entries(fields)) form.set(k, v);
  const encoded = new Response(form);
  const body = await encoded.arrayBuffer();
  return new Request("http://spanlark.test/api/admin/tables/x/import", {
    method: "POST",
    body,
    headers: { "content-type": encoded.headers.get("content-type") ?? "", "content-length": String(body.byteLength) },
  });
}

const csvFile = (text: string, name = "values.csv") => new File([text], name, { type: "text/csv" });
const VALUES_HEADER = expectedHeader("sawn-values").join(",");
const DFL_NO2 = "Douglas Fir-Larch,No.2,dimension,,875,575,180,625,1350,1600000,580000,0.5,Yard correction sheet 2026";
const HF_NO1 = "Hem-Fir,No.1,dimension,,990,625,150,405,1350,1500000,550000,0.43,Yard correction sheet 2026";

async function versionCount(): Promise<number> {
  return TableVersion.count();
}

async function currentId(): Promise<string> {
  return (await getCurrentTables()).version;
}

describe.skipIf(!TEST_DB)("admin table routes", () => {
  beforeAll(async () => {
    db = await useOwnMigratedDatabase("admin_api");
    resetTablesCache();
    await seedTables(STARTER_TABLES, "Starter tables");
    const admin = await makeAdmin();
    who.current = { id: admin.id, email: admin.email, name: "Tables Admin", company: null, role: "admin" };
  });

  afterAll(async () => {
    await getSequelize().close();
    await db.drop();
  });

  test("a builder is refused (403) and a visitor must sign in (401)", async () => {
    const admin = who.current;
    who.current = admin && { ...admin, role: "builder" };
    expect((await overview.GET(get(), params({}))).status).toBe(403);
    who.current = null;
    expect((await tableRoute.GET(get(), params({ table: "sawn-values" }))).status).toBe(401);
    who.current = admin;
  });

  test("GET lists the tables with row counts and the current version", async () => {
    const res = await overview.GET(get(), params({}));
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.current).toMatchObject({ number: 1, source: "seed" });
    expect(body.tables.find((t: { key: string }) => t.key === "steel-shapes").rowCount).toBe(STARTER_TABLES.steel.length);
  });

  test("GET one table gives rows as text with their keys and the columns with units; an unknown table is a 404", async () => {
    const res = await tableRoute.GET(get(), params({ table: "sawn-values" }));
    const body = await res.json();
    const row = body.rows.find((r: { key: string }) => r.key === "Douglas Fir-Larch|No.2|dimension|all");
    expect(row.values).toMatchObject({ Fb_psi: "900", E_psi: "1600000" });
    expect(body.table.fields.find((f: { name: string }) => f.name === "Fb_psi")).toMatchObject({ unit: "psi", min: 50, max: 10000 });
    expect((await tableRoute.GET(get(), params({ table: "doors" }))).status).toBe(404);
  });

  test("PUT changes a row as a new version; with Fb 90,000 psi it is a 400 naming the field and publishes nothing", async () => {
    const count = await versionCount();
    const res = await rowsRoute.PUT(
      json("PUT", {
        baseVersionId: await currentId(),
        originalKey: "Douglas Fir-Larch|No.2|dimension|all",
        values: Object.fromEntries(expectedHeader("sawn-values").map((h, i) => [h, DFL_NO2.split(",")[i]])),
        note: "Yard correction",
      }),
      params({ table: "sawn-values" }),
    );
    expect(res.status).toBe(200);
    const bad = await rowsRoute.PUT(
      json("PUT", {
        baseVersionId: await currentId(),
        originalKey: "Douglas Fir-Larch|No.2|dimension|all",
        values: Object.fromEntries(expectedHeader("sawn-values").map((h, i) => [h, DFL_NO2.replace(",875,", ",90000,").split(",")[i]])),
      }),
      params({ table: "sawn-values" }),
    );
    expect(bad.status).toBe(400);
    expect((await bad.json()).issues).toEqual([{ path: "values.Fb_psi", message: "Fb must be at most 10,000 psi" }]);
    expect(await versionCount()).toBe(count + 1);
  });

  test("PUT against a version that is no longer current is a 409", async () => {
    const { versions } = await (await versionsRoute.GET(get(), params({}))).json();
    const old = versions[versions.length - 1].id;
    const res = await rowsRoute.PUT(
      json("PUT", { baseVersionId: old, originalKey: "A36", values: { name: "A36", Fy_ksi: "36", Fu_ksi: "59" } }),
      params({ table: "steel-grades" }),
    );
    expect(res.status).toBe(409);
  });

  test("POST adds a row and DELETE removes it, each as a version with its author and note", async () => {
    const added = await rowsRoute.POST(
      json("POST", { baseVersionId: await currentId(), note: "yard stocks A572", values: { name: "A572-50", Fy_ksi: "50", Fu_ksi: "65" } }),
      params({ table: "steel-grades" }),
    );
    const body = await added.json();
    expect(added.status).toBe(200);
    expect(body.version).toMatchObject({ note: "yard stocks A572", createdBy: { email: who.current?.email } });
    const removed = await rowsRoute.DELETE(json("DELETE", { baseVersionId: await currentId(), key: "A572-50" }), params({ table: "steel-grades" }));
    expect((await removed.json()).counts).toEqual({ added: 0, changed: 0, removed: 1 });
  });

  test("a good CSV previews without writing, then applies as one version; the same file again publishes nothing", async () => {
    const text = `${VALUES_HEADER}\n${DFL_NO2.replace(",875,", ",880,")}\n${HF_NO1}\n`;
    const count = await versionCount();
    const preview = await previewRoute.POST(await multipart(csvFile(text)), params({ table: "sawn-values" }));
    const p = await preview.json();
    expect(preview.status).toBe(200);
    expect(p).toMatchObject({ ok: true, acceptedRows: 2, rejected: [], fileError: null });
    expect(p.changes.changed.map((c: { key: string }) => c.key).sort()).toEqual(["Douglas Fir-Larch|No.2|dimension|all", "Hem-Fir|No.1|dimension|all"]);
    expect(await versionCount()).toBe(count);

    const applied = await importRoute.POST(
      await multipart(csvFile(text), { baseVersionId: p.baseVersion.id, note: "Yard corrections" }),
      params({ table: "sawn-values" }),
    );
    const a = await applied.json();
    expect(applied.status).toBe(200);
    expect(a).toMatchObject({ created: true, counts: { added: 0, changed: 2, removed: 0 }, version: { source: "import", note: "Yard corrections" } });
    expect((await getCurrentTables()).sawnValues.find((v) => v.species === "Hem-Fir" && v.grade === "No.1" && v.sizeClass === "dimension")?.Fb).toBe(990);

    // Idempotent: the second apply of the same file finds nothing to change and publishes no version.
    const again = await importRoute.POST(await multipart(csvFile(text)), params({ table: "sawn-values" }));
    expect(await again.json()).toMatchObject({ created: false, version: { id: a.version.id } });
    expect(await versionCount()).toBe(count + 1);
  });

  test("a CSV with one bad line applies nothing and reports that line", async () => {
    const before = await getCurrentTables();
    const count = await versionCount();
    const text = `${VALUES_HEADER}\n${DFL_NO2.replace(",875,", ",870,")}\n${HF_NO1.replace(",990,", ",90000,")}\n`;
    const preview = await (await previewRoute.POST(await multipart(csvFile(text)), params({ table: "sawn-values" }))).json();
    expect(preview).toMatchObject({ ok: false, acceptedRows: 1, changes: null });
    expect(preview.rejected).toEqual([{ line: 3, issues: [{ column: "Fb_psi", message: "Fb must be at most 10,000 psi", value: "90000" }] }]);

    const res = await importRoute.POST(await multipart(csvFile(text)), params({ table: "sawn-values" }));
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.error).toMatch(/nothing was applied: 1 of 2 lines/);
    expect(body.rejected[0].line).toBe(3);
    expect(await versionCount()).toBe(count);
    expect(await currentId()).toBe(before.version);
    expect((await getCurrentTables()).sawnValues.find((v) => v.species === "Douglas Fir-Larch" && v.grade === "No.2" && v.sizeClass === "dimension")?.Fb).toBe(
      880,
    );
  });

  test.each([
    ["a file over 1 MB", () => csvFile(`${VALUES_HEADER}\n${"x".repeat(MAX_CSV_BYTES)}\n`), 413],
    ["an image", () => new File([new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a])], "beam.png", { type: "image/png" }), 415],
    ["a CSV of another table", () => csvFile("name,Fy_ksi,Fu_ksi\nA36,36,58\n"), 400],
  ])("%s is refused and changes nothing", async (_label, make, status) => {
    const count = await versionCount();
    const res = await importRoute.POST(await multipart(make()), params({ table: "sawn-values" }));
    expect(res.status).toBe(status);
    expect((await res.json()).error).toEqual(expect.any(String));
    expect(await versionCount()).toBe(count);
  });

  test("a request claiming a huge body is refused before it is read", async () => {
    const req = new Request("http://spanlark.test/x", {
      method: "POST",
      body: "x",
      headers: { "content-length": String(50 * 1024 * 1024), "content-type": "multipart/form-data; boundary=x" },
    });
    expect((await previewRoute.POST(req, params({ table: "sawn-values" }))).status).toBe(413);
  });

  test("a downloaded table uploads back as no change", async () => {
    const res = await csvRoute.GET(get(), params({ table: "engineered" }));
    expect(res.headers.get("content-type")).toMatch(/text\/csv/);
    expect(res.headers.get("content-disposition")).toMatch(/spanlark-engineered-v\d+\.csv/);
    const text = await res.text();
    expect(text.split("\n")[0]).toBe(expectedHeader("engineered").join(","));
    const back = await (await importRoute.POST(await multipart(csvFile(text, "engineered.csv")), params({ table: "engineered" }))).json();
    expect(back.created).toBe(false);
  });

  test("history lists versions newest first; a version shows its changes; restore publishes a copy and the old sheet still reprints", async () => {
    const { versions, total } = await (await versionsRoute.GET(get("?limit=2"), params({}))).json();
    expect(versions).toHaveLength(2);
    expect(total).toBeGreaterThanOrEqual(4);
    expect(versions[0].number).toBeGreaterThan(versions[1].number);

    const detail = await (await versionRoute.GET(get(), params({ versionId: versions[0].id }))).json();
    expect(detail.summary.tables["sawn-values"].changed.length).toBeGreaterThan(0);
    expect((await versionRoute.GET(get(), params({ versionId: "nope" }))).status).toBe(404);

    const all = (await (await versionsRoute.GET(get("?limit=200"), params({}))).json()).versions;
    const v1 = all[all.length - 1];
    const restored = await restoreRoute.POST(json("POST", { note: "undo the yard corrections" }), params({ versionId: v1.id }));
    const r = await restored.json();
    expect(r).toMatchObject({ created: true, version: { source: "restore", restoredFrom: { number: 1 }, note: "undo the yard corrections" } });
    expect((await getCurrentTables()).sawnValues.find((v) => v.species === "Hem-Fir" && v.grade === "No.1" && v.sizeClass === "dimension")?.Fb).toBe(975);
    // A sheet saved with the import version still reprints with its numbers.
    const importVersion = all.find((v: { source: string }) => v.source === "import");
    const sheet = await getTablesVersion(importVersion.id);
    expect(sheet.sawnValues.find((v) => v.species === "Hem-Fir" && v.grade === "No.1" && v.sizeClass === "dimension")?.Fb).toBe(990);
    expect((await restoreRoute.POST(json("POST", {}), params({ versionId: "00000000-0000-4000-8000-000000000000" }))).status).toBe(404);
  });
});
