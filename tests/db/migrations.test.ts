import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { Sequelize } from "sequelize";
import { createSequelize } from "@/lib/db";
import { migrator } from "@/lib/db/migrator";
import { createOwnDatabase, TEST_DB, type OwnDatabase } from "../tables/db/support";

// Every migration goes up, comes all the way down to nothing, and goes up again, on a fresh database of
// this file's own; each down must put the schema back exactly as it found it (tables, columns, indexes,
// enum types). A migration that cannot be undone is a bug (STYLE.md).

let db: OwnDatabase;
let sequelize: Sequelize;

interface Snapshot {
  tables: string[];
  columns: string[];
  indexes: string[];
  types: string[];
}

async function snapshot(): Promise<Snapshot> {
  const list = async (sql: string) => ((await sequelize.query(sql, { type: "SELECT" })) as { v: string }[]).map((r) => r.v);
  return {
    tables: await list("SELECT table_name AS v FROM information_schema.tables WHERE table_schema = 'public' AND table_name <> 'schema_migrations' ORDER BY 1"),
    columns: await list(
      "SELECT table_name || '.' || column_name || ':' || data_type || ':' || is_nullable AS v FROM information_schema.columns WHERE table_schema = 'public' AND table_name <> 'schema_migrations' ORDER BY 1",
    ),
    indexes: await list("SELECT indexname AS v FROM pg_indexes WHERE schemaname = 'public' AND tablename <> 'schema_migrations' ORDER BY 1"),
    types: await list(
      "SELECT t.typname AS v FROM pg_type t JOIN pg_namespace n ON n.oid = t.typnamespace WHERE n.nspname = 'public' AND t.typtype = 'e' ORDER BY 1",
    ),
  };
}

describe.skipIf(!TEST_DB)("migrations up, down to 0, up again", () => {
  beforeAll(async () => {
    db = await createOwnDatabase("migrations");
    sequelize = createSequelize(db.url);
  });

  afterAll(async () => {
    await sequelize?.close();
    await db?.drop();
  });

  test("each migration's down restores the schema it found; the whole set runs up twice", async () => {
    const umzug = migrator(sequelize);
    const pending = await umzug.pending();
    expect(pending.length).toBeGreaterThan(0);
    const empty = await snapshot();
    expect(empty.tables).toEqual([]);

    // Up one at a time, remembering the schema before each.
    const before: Snapshot[] = [];
    for (const m of pending) {
      before.push(await snapshot());
      await umzug.up({ migrations: [m.name] });
    }
    const full = await snapshot();
    expect(full.tables).toEqual(expect.arrayContaining(["users", "table_versions", "sawn_values", "steel_shapes"]));

    // Down one at a time: each down must give back exactly the schema its up started from.
    for (let i = pending.length - 1; i >= 0; i -= 1) {
      await umzug.down({ migrations: [pending[i].name] });
      expect(await snapshot(), `after reverting ${pending[i].name}`).toEqual(before[i]);
    }
    expect(await snapshot()).toEqual(empty);
    expect(await umzug.executed()).toEqual([]);

    // And the whole set again, up, down to 0 in one call, up.
    await umzug.up();
    expect(await snapshot()).toEqual(full);
    await umzug.down({ to: 0 });
    expect(await snapshot()).toEqual(empty);
    await umzug.up();
    expect(await snapshot()).toEqual(full);
  });
});
