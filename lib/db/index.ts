import pg from "pg";
import { Sequelize } from "sequelize";
import { initModels } from "@/models";

/**
 * The Sequelize instance, one per process (kept on globalThis so hot reload does not open new pools).
 * The schema comes only from migrations: this module never calls sync().
 */
const holder = globalThis as unknown as { spanlarkSequelize?: Sequelize };

export function createSequelize(url: string): Sequelize {
  const sequelize = new Sequelize(url, {
    dialect: "postgres",
    dialectModule: pg,
    logging: false,
    pool: { max: 10, min: 0, idle: 10_000 },
    // A database host that does not answer fails a request in 5 s (then 503) instead of holding it.
    dialectOptions: { connectionTimeoutMillis: 5_000 },
    define: { underscored: true },
  });
  initModels(sequelize);
  return sequelize;
}

// Next.js bundles route handlers and pages separately, each with its own copy of the model classes; the
// instance is shared through globalThis, so each copy initializes its own classes on it once.
let modelsReadyHere = false;

export function getSequelize(): Sequelize {
  if (!holder.spanlarkSequelize) {
    const url = process.env.DATABASE_URL;
    if (!url) throw new Error("DATABASE_URL is not set");
    holder.spanlarkSequelize = createSequelize(url);
    modelsReadyHere = true;
  } else if (!modelsReadyHere) {
    initModels(holder.spanlarkSequelize);
    modelsReadyHere = true;
  }
  return holder.spanlarkSequelize;
}

/** Used by GET /api/health: true when a trivial query answers. */
export async function databaseIsUp(): Promise<boolean> {
  try {
    await getSequelize().query("SELECT 1");
    return true;
  } catch {
    return false;
  }
}
