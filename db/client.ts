import "server-only";

import fs from "node:fs";
import path from "node:path";

import { PGlite } from "@electric-sql/pglite";
import type { PgDatabase, PgQueryResultHKT } from "drizzle-orm/pg-core";

import { env } from "@/lib/env";

import { acquireDataLock, releaseDataLock } from "./lock";
import * as schema from "./schema";

export type Db = PgDatabase<PgQueryResultHKT, typeof schema>;
export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];

type Handle = { db: Db; kind: "pglite" | "postgres"; close: () => Promise<void>; ping: () => Promise<void>; pglite?: PGlite };

const g = globalThis as unknown as { __gradelineDb?: Promise<Handle> };

export const migrationsFolder = path.join(process.cwd(), "db", "migrations");

export function databaseDir(): string {
  return path.resolve(env().DATA_DIR, "db");
}

async function openPglite(dataDir: string | null): Promise<Handle> {
  const { drizzle } = await import("drizzle-orm/pglite");
  const { migrate } = await import("drizzle-orm/pglite/migrator");
  if (dataDir) {
    acquireDataLock(dataDir);
    fs.mkdirSync(path.dirname(dataDir), { recursive: true });
  }
  // Tests start each file from a migrated template (PGlite's own initdb is slow on small machines).
  const template =
    !dataDir && process.env.PGLITE_TEMPLATE && fs.existsSync(process.env.PGLITE_TEMPLATE)
      ? new Blob([fs.readFileSync(process.env.PGLITE_TEMPLATE)])
      : null;
  const client = template ? await PGlite.create({ loadDataDir: template }) : await PGlite.create(dataDir ?? "memory://");
  const db = drizzle({ client, schema });
  await migrate(db, { migrationsFolder });
  // PGlite runs no autovacuum, so without this the planner never learns table sizes and joins whole
  // tables where an index would read twenty rows. startStatisticsRefresher() repeats it.
  await client.exec("ANALYZE");
  return {
    db: db as unknown as Db,
    kind: "pglite",
    pglite: client,
    ping: async () => void (await client.query("select 1")),
    close: async () => {
      await client.query("CHECKPOINT");
      await client.close();
      if (dataDir) releaseDataLock(dataDir);
    },
  };
}

async function openPostgres(url: string): Promise<Handle> {
  const { drizzle } = await import("drizzle-orm/node-postgres");
  const { migrate } = await import("drizzle-orm/node-postgres/migrator");
  const { Pool } = await import("pg");
  const pool = new Pool({ connectionString: url, max: 10 });
  const db = drizzle({ client: pool, schema });
  await migrate(db, { migrationsFolder });
  return {
    db: db as unknown as Db,
    kind: "postgres",
    ping: async () => void (await pool.query("select 1")),
    close: () => pool.end(),
  };
}

function open(): Promise<Handle> {
  const url = env().DATABASE_URL;
  if (url?.startsWith("memory://")) return openPglite(null);
  if (url) return openPostgres(url);
  return openPglite(databaseDir());
}

async function handle(): Promise<Handle> {
  if (!g.__gradelineDb) {
    g.__gradelineDb = open();
    g.__gradelineDb.catch(() => (g.__gradelineDb = undefined));
  }
  return g.__gradelineDb;
}

/** The database, opened and migrated on first use (never at import or build time). */
export async function getDb(): Promise<Db> {
  return (await handle()).db;
}

/**
 * Refreshes the planner's statistics of the embedded database every intervalMs (PostgreSQL's own
 * autovacuum does this on a server); returns a function that stops it.
 */
export function startStatisticsRefresher(intervalMs = 60 * 60_000): () => void {
  const timer = setInterval(() => {
    // Only a database that is open: a closed one is not reopened for this.
    void g.__gradelineDb?.then((h) => h.pglite?.exec("ANALYZE")).catch((e) => console.error("[statistics] ANALYZE failed", e));
  }, intervalMs);
  timer.unref();
  return () => clearInterval(timer);
}

/** True with the embedded database: the data lock makes this process its only writer. */
export async function isOnlyWriter(): Promise<boolean> {
  return (await handle()).kind === "pglite";
}

export async function pingDb(): Promise<{ kind: string }> {
  const h = await handle();
  await h.ping();
  return { kind: h.kind };
}

/** Checkpoints and closes the database and releases the lock. */
export async function closeDb(): Promise<void> {
  const pending = g.__gradelineDb;
  g.__gradelineDb = undefined;
  if (pending) await (await pending).close();
}

export async function dumpDataDir(compression: "gzip" | "none" = "gzip"): Promise<Blob> {
  const h = await handle();
  if (!h.pglite) throw new Error("Backups of a PostgreSQL server are made with pg_dump, not this command.");
  return h.pglite.dumpDataDir(compression);
}

/** Loads a dump made by dumpDataDir into an empty folder (restore); the app migrates it at its next start. */
export async function loadDataDirInto(dir: string, dump: Uint8Array): Promise<{ tables: number }> {
  fs.mkdirSync(path.dirname(dir), { recursive: true });
  const client = await PGlite.create(dir, { loadDataDir: new Blob([Buffer.from(dump)]) });
  try {
    const { rows } = await client.query<{ n: number }>(
      "select count(*)::int as n from information_schema.tables where table_schema = 'public'",
    );
    await client.query("CHECKPOINT");
    return { tables: rows[0].n };
  } finally {
    await client.close();
  }
}
