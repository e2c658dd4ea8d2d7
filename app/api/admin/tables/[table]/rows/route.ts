import { NextResponse } from "next/server";
import { HttpError, parseJson, route } from "@/lib/http";
import { requireTablesAdmin, tableFromParam, tablesOperation } from "@/lib/tables/db/admin-http";
import { deleteRowBody, editRowBody, saveRowBody } from "@/lib/tables/db/admin-schemas";
import { deleteRow, saveRow, type CommitResult } from "@/lib/tables/db/write";
import { parseFlatRow, rowKey, TABLE_SPECS, type TableKey } from "@/lib/tables/schemas";

export const runtime = "nodejs";

type Ctx = { params: Promise<{ table: string }> };

function parseValues<K extends TableKey>(table: K, values: Record<string, string>) {
  const known = new Set(TABLE_SPECS[table].fields.map((f) => f.name));
  const unknown = Object.keys(values).filter((name) => !known.has(name));
  if (unknown.length > 0) {
    throw new HttpError(400, "invalid input", {
      issues: unknown.map((name) => ({ path: `values.${name}`, message: `${TABLE_SPECS[table].title} has no column ${name}` })),
    });
  }
  const parsed = parseFlatRow(table, values);
  if (!parsed.ok) throw new HttpError(400, "invalid input", { issues: parsed.issues.map((i) => ({ path: `values.${i.column}`, message: i.message })) });
  return parsed.row;
}

function answer(result: CommitResult): Response {
  return NextResponse.json({
    created: result.created,
    version: result.version,
    counts: { added: result.summary.added, changed: result.summary.changed, removed: result.summary.removed },
    message: result.created ? `published version ${result.version.number}` : "nothing changed, so no new version was published",
  });
}

// POST /api/admin/tables/[table]/rows — add a row as a new version, admin
export const POST = route(async (req: Request, ctx: Ctx) => {
  const actor = await requireTablesAdmin();
  const table = tableFromParam((await ctx.params).table);
  const body = await parseJson(req, saveRowBody);
  const row = parseValues(table, body.values);
  const title = TABLE_SPECS[table].title;
  const note = body.note || `Added ${rowKey(table, row)} to ${title}`;
  return answer(await tablesOperation(() => saveRow({ table, row }, { actor, note, baseVersionId: body.baseVersionId })));
});

// PUT /api/admin/tables/[table]/rows — change one row as a new version, admin
export const PUT = route(async (req: Request, ctx: Ctx) => {
  const actor = await requireTablesAdmin();
  const table = tableFromParam((await ctx.params).table);
  const body = await parseJson(req, editRowBody);
  const row = parseValues(table, body.values);
  const note = body.note || `Edited ${body.originalKey} in ${TABLE_SPECS[table].title}`;
  return answer(await tablesOperation(() => saveRow({ table, row, originalKey: body.originalKey }, { actor, note, baseVersionId: body.baseVersionId })));
});

// DELETE /api/admin/tables/[table]/rows — remove one row as a new version, admin
export const DELETE = route(async (req: Request, ctx: Ctx) => {
  const actor = await requireTablesAdmin();
  const table = tableFromParam((await ctx.params).table);
  const body = await parseJson(req, deleteRowBody);
  const note = body.note || `Removed ${body.key} from ${TABLE_SPECS[table].title}`;
  return answer(await tablesOperation(() => deleteRow(table, body.key, { actor, note, baseVersionId: body.baseVersionId })));
});
