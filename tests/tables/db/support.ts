import { randomUUID } from "node:crypto";
import { Sequelize } from "sequelize";
import { getSequelize } from "@/lib/db";
import { migrator } from "@/lib/db/migrator";
import { User } from "@/models/user";

/**
 * A database of the test file's own, so versions written here never meet another file's (the material
 * tables are one shared history per database). Made from TEST_DATABASE_URL's server with CREATE DATABASE,
 * migrated, and dropped afterwards. Locally: `bash scripts/pg.sh url spanlark_dev` as TEST_DATABASE_URL.
 */
export const TEST_DB = process.env.TEST_DATABASE_URL;

function withDatabase(url: string, name: string): string {
  const u = new URL(url);
  u.pathname = `/${name}`;
  return u.toString();
}

async function onServer<T>(fn: (admin: Sequelize) => Promise<T>): Promise<T> {
  if (!TEST_DB) throw new Error("TEST_DATABASE_URL is not set");
  const admin = new Sequelize(TEST_DB, { dialect: "postgres", logging: false });
  try {
    return await fn(admin);
  } finally {
    await admin.close();
  }
}

export interface OwnDatabase {
  name: string;
  url: string;
  drop(): Promise<void>;
}

/** Creates an empty database on the test server (no migrations run). */
export async function createOwnDatabase(tag: string): Promise<OwnDatabase> {
  const name = `spanlark_t_${tag}_${process.pid}_${randomUUID().slice(0, 6)}`.replace(/[^a-z0-9_]/g, "_");
  await onServer(async (admin) => {
    await admin.query(`CREATE DATABASE "${name}"`);
  });
  return {
    name,
    url: withDatabase(TEST_DB ?? "", name),
    drop: () => onServer(async (admin) => void (await admin.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`))),
  };
}

/**
 * Points this test process at a fresh, migrated database of its own (DATABASE_URL, so getSequelize and
 * getCurrentTables use it) and returns it.
 */
export async function useOwnMigratedDatabase(tag: string): Promise<OwnDatabase> {
  const db = await createOwnDatabase(tag);
  process.env.DATABASE_URL = db.url;
  await migrator(getSequelize()).up();
  return db;
}

export async function makeAdmin(): Promise<{ id: string; email: string }> {
  getSequelize();
  const user = await User.create({
    email: `tables-admin-${randomUUID().slice(0, 8)}@tables-tests.test`,
    passwordHash: "not-used-in-these-tests",
    name: "Tables Admin",
    company: null,
    role: "admin",
    emailVerifiedAt: new Date(),
  });
  return { id: user.id, email: user.email };
}
