// Database tasks: `tsx scripts/db.ts migrate | rollback [--all] | seed | reset`.
// Uses DATABASE_URL (scripts/start.sh and scripts/test.sh set it for the local cluster).
import { createSequelize } from "@/lib/db";
import { migrator, seeder } from "@/lib/db/migrator";

const task = process.argv[2];
const url = process.env.DATABASE_URL;
if (!url) {
  console.error("DATABASE_URL is not set (npm start and npm test set it for the local PostgreSQL)");
  process.exit(2);
}
const sequelize = createSequelize(url);
try {
  if (task === "migrate") {
    const done = await migrator(sequelize).up();
    console.log(`[db] migrations applied: ${done.length}`);
  } else if (task === "rollback") {
    const all = process.argv.includes("--all");
    const done = await migrator(sequelize).down(all ? { to: 0 } : undefined);
    console.log(`[db] migrations reverted: ${done.length}`);
  } else if (task === "seed") {
    const done = await seeder(sequelize).up();
    console.log(`[db] seeders applied: ${done.length}`);
  } else if (task === "reset") {
    await seeder(sequelize).down({ to: 0 });
    await migrator(sequelize).down({ to: 0 });
    await migrator(sequelize).up();
    await seeder(sequelize).up();
    console.log("[db] reset: migrated and seeded from scratch");
  } else {
    console.error("usage: tsx scripts/db.ts migrate | rollback [--all] | seed | reset");
    process.exitCode = 2;
  }
} catch (err) {
  console.error(`[db] ${task} failed: ${(err as Error).message}`);
  process.exitCode = 1;
} finally {
  await sequelize.close();
}
