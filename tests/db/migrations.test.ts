import path from "node:path";

import { PGlite } from "@electric-sql/pglite";
import { PGLiteSocketServer } from "@electric-sql/pglite-socket";
import { drizzle as drizzlePglite } from "drizzle-orm/pglite";
import { migrate as migratePglite } from "drizzle-orm/pglite/migrator";
import { drizzle as drizzlePg } from "drizzle-orm/node-postgres";
import { migrate as migratePg } from "drizzle-orm/node-postgres/migrator";
import { Pool } from "pg";
import { describe, expect, it } from "vitest";

const migrationsFolder = path.join(process.cwd(), "db", "migrations");
const EXPECTED = ["audit_log", "auth_sessions", "inspector_profiles", "listings", "mail_outbox", "order_events", "orders", "service_areas", "users"];

const tablesQuery = "select table_name from information_schema.tables where table_schema = 'public' order by table_name";

async function migrateOverWire(url: string) {
  const pool = new Pool({ connectionString: url, max: 1 });
  try {
    const db = drizzlePg({ client: pool });
    await migratePg(db, { migrationsFolder });
    await migratePg(db, { migrationsFolder });
    const { rows } = await pool.query<{ table_name: string }>(tablesQuery);
    return rows.map((r) => r.table_name);
  } finally {
    await pool.end();
  }
}

describe("migrations", () => {
  it("apply on a fresh embedded database, and a second run changes nothing", async () => {
    const client = await PGlite.create("memory://");
    const db = drizzlePglite({ client });
    await migratePglite(db, { migrationsFolder });
    await migratePglite(db, { migrationsFolder });
    const { rows } = await client.query<{ table_name: string }>(tablesQuery);
    expect(rows.map((r) => r.table_name)).toEqual(expect.arrayContaining(EXPECTED));
    await client.close();
  });

  it("apply through node-postgres over the PostgreSQL wire protocol (PGlite socket server)", async () => {
    const pglite = await PGlite.create("memory://");
    const server = new PGLiteSocketServer({ db: pglite, port: 0, host: "127.0.0.1" });
    await server.start();
    const port = Number(server.getServerConn().split(":").pop());
    try {
      expect(await migrateOverWire(`postgres://postgres@127.0.0.1:${port}/postgres`)).toEqual(expect.arrayContaining(EXPECTED));
    } finally {
      await server.stop();
      await pglite.close();
    }
  });

  it.runIf(!!process.env.PG_TEST_URL)("apply on a real PostgreSQL server (PG_TEST_URL)", async () => {
    const url = process.env.PG_TEST_URL!;
    const admin = new Pool({ connectionString: url, max: 1 });
    const name = `gradeline_test_${Date.now()}`;
    await admin.query(`create database ${name}`);
    try {
      const target = new URL(url);
      target.pathname = `/${name}`;
      expect(await migrateOverWire(target.toString())).toEqual(expect.arrayContaining(EXPECTED));
    } finally {
      await admin.query(`drop database ${name} with (force)`);
      await admin.end();
    }
  });
});
