import { z } from "zod";

/** Bodies of the admin table routes (zod, parsed at the route). */

const versionId = z.uuid("must be a version id");
const note = z.string().trim().max(500, "the note must be at most 500 characters");

export const saveRowBody = z.object({
  /** the version the admin was looking at; another version being current since is a 409 */
  baseVersionId: versionId,
  note: note.optional(),
  /** the row's values by column name, as text (the CSV columns) */
  values: z.record(z.string(), z.string().max(2000, "a value must be at most 2000 characters")),
});

export const editRowBody = saveRowBody.extend({
  /** the key of the row being changed (it may change the key itself) */
  originalKey: z.string().min(1, "originalKey is required").max(400),
});

export const deleteRowBody = z.object({
  baseVersionId: versionId,
  note: note.optional(),
  key: z.string().min(1, "key is required").max(400),
});

export const restoreBody = z.object({
  note: note.optional(),
  baseVersionId: versionId.optional(),
});

export const importFields = z.object({
  mode: z.enum(["merge", "replace"], { error: 'mode must be "merge" (add or replace rows) or "replace" (the table becomes the file)' }).default("merge"),
  note: note.optional(),
  baseVersionId: versionId.optional(),
});

export const versionQuery = z.object({ version: versionId.optional() });

export const listQuery = z.object({
  limit: z.coerce.number().int().min(1).max(200).default(50),
  offset: z.coerce.number().int().min(0).default(0),
});
