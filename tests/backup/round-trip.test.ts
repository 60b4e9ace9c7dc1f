import { spawn } from "node:child_process";
import { createHash, randomBytes } from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { pipeline } from "node:stream/promises";
import { createGzip } from "node:zlib";

import { GetObjectCommand, ListObjectsCommand, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { PGlite } from "@electric-sql/pglite";
import tar from "tar-stream";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { dumpDataDir, loadDataDirInto } from "@/db/client";
import { acquireDataLock, releaseDataLock } from "@/db/lock";
import { seedDemoWorld } from "@/db/seed";
import { DamagedArchiveError, verifyArchive } from "@/lib/backup/archive";
import { startStorage } from "@/services/storage";

const tsx = path.join(process.cwd(), "node_modules", ".bin", "tsx");
const tmp = fs.mkdtempSync(path.join(os.tmpdir(), "gradeline-backup-test-"));
const src = path.join(tmp, "src");
const backups = path.join(tmp, "backups");
const sharedStorage = process.env.S3_ENDPOINT!;
// Read when this worker first parses its environment (in the setup file's beforeAll), so the demo
// world's clips land in a bucket no other test file uses.
const SOURCE_BUCKET = "backup-source";
process.env.S3_BUCKET = SOURCE_BUCKET;

/** Runs one of the npm scripts the way `npm run` does, with its own DATA_DIR and storage settings. */
function run(script: string, args: string[], env: Record<string, string>) {
  const child = spawn(tsx, ["--tsconfig", "tsconfig.scripts.json", `scripts/${script}.ts`, ...args], {
    cwd: process.cwd(),
    env: { ...process.env, NODE_ENV: "development", DATABASE_URL: "", S3_ENDPOINT: "", S3_BUCKET: "", BACKUP_DIR: backups, ...env },
    stdio: ["ignore", "pipe", "pipe"],
  });
  let stdout = "";
  let stderr = "";
  child.stdout.on("data", (d: Buffer) => (stdout += d));
  child.stderr.on("data", (d: Buffer) => (stderr += d));
  const timer = setTimeout(() => child.kill("SIGKILL"), 60_000);
  return new Promise<{ code: number | null; stdout: string; stderr: string }>((resolve) =>
    child.on("exit", (code) => {
      clearTimeout(timer);
      resolve({ code, stdout, stderr });
    }),
  );
}

function client(endpoint: string) {
  return new S3Client({
    region: "us-east-1",
    endpoint,
    forcePathStyle: true,
    credentials: { accessKeyId: "S3RVER", secretAccessKey: "S3RVER" },
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
}

async function bucketContents(endpoint: string, bucket: string) {
  const s3 = client(endpoint);
  const out = new Map<string, { bytes: number; sha256: string; contentType?: string }>();
  let marker: string | undefined;
  do {
    const page = await s3.send(new ListObjectsCommand({ Bucket: bucket, Marker: marker, MaxKeys: 50 }));
    for (const item of page.Contents ?? []) {
      const res = await s3.send(new GetObjectCommand({ Bucket: bucket, Key: item.Key }));
      const bytes = await res.Body!.transformToByteArray();
      out.set(item.Key!, { bytes: bytes.length, sha256: createHash("sha256").update(bytes).digest("hex"), contentType: res.ContentType });
    }
    marker = page.IsTruncated ? page.Contents!.at(-1)!.Key : undefined;
  } while (marker);
  s3.destroy();
  return out;
}

/** Every row of every table (the migration journal too), as sorted JSON text per table. */
async function tableRows(dataDir: string) {
  const db = await PGlite.create(path.join(dataDir, "db"));
  try {
    const { rows: tables } = await db.query<{ s: string; t: string }>(
      "select table_schema as s, table_name as t from information_schema.tables where table_schema in ('public', 'drizzle') and table_type = 'BASE TABLE' order by 1, 2",
    );
    const out: Record<string, string[]> = {};
    for (const { s, t } of tables) {
      const { rows } = await db.query<{ r: string }>(`select to_jsonb(x)::text as r from "${s}"."${t}" x`);
      out[`${s}.${t}`] = rows.map((r) => r.r).sort();
    }
    return out;
  } finally {
    await db.close();
  }
}

async function forge(file: string, entries: { name: string; body: Buffer }[]) {
  const pack = tar.pack();
  const done = pipeline(pack, createGzip(), fs.createWriteStream(file));
  for (const e of entries) pack.entry({ name: e.name }, e.body);
  pack.finalize();
  await done;
}

const archives = () => (fs.existsSync(backups) ? fs.readdirSync(backups).filter((f) => f.endsWith(".tar.gz")) : []);
let archive = "";
const extraObjects = [
  { key: "notes/été 2026/run sheet.txt", body: Buffer.from("Footage 0 at the outside cleanout.\n"), type: "text/plain" },
  { key: "blobs/random.bin", body: randomBytes(300_000), type: "application/octet-stream" },
  { key: "blobs/empty", body: Buffer.alloc(0), type: "application/octet-stream" },
];

beforeAll(async () => {
  // A source folder as the app leaves it: the demo world (seeded here, in process, for speed) and
  // its clips in a bucket of this file's own.
  const s3 = client(sharedStorage);
  for (const o of extraObjects)
    await s3.send(new PutObjectCommand({ Bucket: SOURCE_BUCKET, Key: o.key, Body: o.body, ContentType: o.type }));
  s3.destroy();
  await seedDemoWorld();
  await loadDataDirInto(path.join(src, "db"), new Uint8Array(await (await dumpDataDir("none")).arrayBuffer()));
}, 120_000);

afterAll(() => fs.rmSync(tmp, { recursive: true, force: true }));

describe("npm run backup and npm run restore", { timeout: 180_000 }, () => {
  it("back up the database and every object into one dated archive; a restore into a fresh folder and bucket loses nothing", async () => {
    const backedUp = await run("backup", [], { DATA_DIR: src, S3_ENDPOINT: sharedStorage, S3_BUCKET: SOURCE_BUCKET });
    expect(backedUp.code, backedUp.stderr).toBe(0);
    expect(archives()).toHaveLength(1);
    archive = path.join(backups, archives()[0]);
    expect(archives()[0]).toMatch(/^gradeline-backup-\d{4}-\d{2}-\d{2}T\d{2}-\d{2}-\d{2}\.tar\.gz$/);
    expect(backedUp.stdout).toContain(`bucket ${SOURCE_BUCKET} from ${sharedStorage}`);

    // Into a fresh folder on one machine: restore starts the storage stand-in on DATA_DIR/objects itself.
    const dst = path.join(tmp, "dst");
    const restored = await run("restore", [archive], { DATA_DIR: dst });
    expect(restored.code, restored.stderr).toBe(0);
    expect(restored.stdout).toContain(`the local storage in ${path.join(dst, "objects")}`);

    const [before, after] = [await tableRows(src), await tableRows(dst)];
    expect(Object.keys(after)).toEqual(Object.keys(before));
    for (const table of Object.keys(before)) expect(after[table], table).toEqual(before[table]);
    const filled = Object.entries(before)
      .filter(([, rows]) => rows.length > 0)
      .map(([t]) => t);
    for (const t of [
      "public.users",
      "public.orders",
      "public.clips",
      "public.inspections",
      "public.payments",
      "drizzle.__drizzle_migrations",
    ])
      expect(filled).toContain(t);

    const objectsBefore = await bucketContents(sharedStorage, SOURCE_BUCKET);
    const target = await startStorage({ port: 0, dir: path.join(dst, "objects") });
    const objectsAfter = await bucketContents(`http://127.0.0.1:${target.port}`, "gradeline-media");
    await target.close();
    expect(objectsBefore.size).toBeGreaterThan(extraObjects.length);
    expect(objectsAfter).toEqual(objectsBefore);
    for (const o of extraObjects) expect(objectsAfter.get(o.key)?.sha256).toBe(createHash("sha256").update(o.body).digest("hex"));
  });

  it("refuses a folder whose database is not empty and a bucket that is not empty, changing nothing", async () => {
    const dst = path.join(tmp, "dst");
    const filesBefore = fs.readdirSync(path.join(dst, "db")).sort();
    const again = await run("restore", [archive], { DATA_DIR: dst });
    expect(again.code).toBe(1);
    expect(again.stderr).toContain("is not empty");
    expect(fs.readdirSync(path.join(dst, "db")).sort()).toEqual(filesBefore);

    const fresh = path.join(tmp, "fresh-folder");
    const objectsBefore = await bucketContents(sharedStorage, SOURCE_BUCKET);
    const intoFull = await run("restore", [archive], { DATA_DIR: fresh, S3_ENDPOINT: sharedStorage, S3_BUCKET: SOURCE_BUCKET });
    expect(intoFull.code).toBe(1);
    expect(intoFull.stderr).toContain(`The bucket ${SOURCE_BUCKET}`);
    expect(fs.existsSync(fresh)).toBe(false);
    expect(await bucketContents(sharedStorage, SOURCE_BUCKET)).toEqual(objectsBefore);
  });

  it("refuses a damaged archive before touching the target", async () => {
    const bad = path.join(tmp, "cut-short.tar.gz");
    fs.writeFileSync(bad, fs.readFileSync(archive).subarray(0, Math.floor(fs.statSync(archive).size / 2)));
    const target = path.join(tmp, "target-of-damaged");
    const res = await run("restore", [bad], { DATA_DIR: target, S3_ENDPOINT: sharedStorage, S3_BUCKET: "restored-damaged" });
    expect(res.code).toBe(1);
    expect(res.stderr).toContain("is damaged or not a Gradeline backup");
    expect(fs.existsSync(target)).toBe(false);
    expect((await bucketContents(sharedStorage, "restored-damaged").catch(() => new Map())).size).toBe(0);
  });

  it.each([
    ["cut short", (b: Buffer) => b.subarray(0, b.length - 100)],
    ["with one byte changed", (b: Buffer) => Buffer.from(b.map((v, i) => (i === Math.floor(b.length * 0.6) ? v ^ 0xff : v)))],
    ["that is not an archive at all", () => Buffer.from("<html>not a backup</html>")],
  ])("finds an archive %s damaged when checking it", async (label, damage) => {
    const bad = path.join(tmp, `damaged-${label.replace(/\W+/g, "-")}.tar.gz`);
    fs.writeFileSync(bad, damage(fs.readFileSync(archive)));
    await expect(verifyArchive(bad)).rejects.toThrow(DamagedArchiveError);
  });

  it("checks every entry against the manifest: a changed object, a missing one or an extra one is damage", async () => {
    const sha = (b: Buffer) => createHash("sha256").update(b).digest("hex");
    const db = Buffer.from("database bytes");
    const clip = Buffer.from("clip bytes");
    const manifest = (objects: { entry: string; key: string; body: Buffer }[]) => ({
      format: "gradeline-backup",
      version: 1,
      createdAt: new Date().toISOString(),
      bucket: "b",
      database: { entry: "database.tar", bytes: db.length, sha256: sha(db) },
      objects: objects.map((o) => ({ entry: o.entry, key: o.key, bytes: o.body.length, sha256: sha(o.body) })),
    });
    const listed = [{ entry: "objects/000001", key: "clips/a.mp4", body: clip }];
    const cases: [string, { name: string; body: Buffer }[], boolean][] = [
      [
        "intact",
        [
          { name: "database.tar", body: db },
          { name: "objects/000001", body: clip },
        ],
        true,
      ],
      [
        "changed object",
        [
          { name: "database.tar", body: db },
          { name: "objects/000001", body: Buffer.from("clip bytez") },
        ],
        false,
      ],
      ["missing object", [{ name: "database.tar", body: db }], false],
      [
        "extra entry",
        [
          { name: "database.tar", body: db },
          { name: "objects/000001", body: clip },
          { name: "objects/000002", body: clip },
        ],
        false,
      ],
    ];
    for (const [label, entries, ok] of cases) {
      const file = path.join(tmp, `forged-${label.replace(/\W+/g, "-")}.tar.gz`);
      await forge(file, [...entries, { name: "manifest.json", body: Buffer.from(JSON.stringify(manifest(listed))) }]);
      if (ok)
        expect(
          (await verifyArchive(file)).objects.map((o) => o.key),
          label,
        ).toEqual(["clips/a.mp4"]);
      else await expect(verifyArchive(file), label).rejects.toThrow(DamagedArchiveError);
    }
  });

  it("respects the data lock: backup refuses to run while another process holds the folder", async () => {
    const dbDir = path.join(src, "db");
    acquireDataLock(dbDir);
    try {
      const before = archives();
      const backup = await run("backup", [], { DATA_DIR: src });
      expect(backup.code).toBe(1);
      expect(backup.stderr).toContain("is in use by another Gradeline process");
      expect(archives()).toEqual(before);
    } finally {
      releaseDataLock(dbDir);
    }
  });
});
