import "server-only";

import { createHash } from "node:crypto";
import fs from "node:fs";
import { PassThrough, Readable, Transform } from "node:stream";
import { pipeline } from "node:stream/promises";
import { createGunzip, createGzip } from "node:zlib";

import tar from "tar-stream";
import { z } from "zod";

// One dated .tar.gz: database.tar (PGlite's own dump), objects/NNNNNN (one file per object,
// named by position so no key ever becomes a path), and manifest.json last, with every size
// and hash. A cut or changed archive fails the check before anything is restored.

export const DATABASE_ENTRY = "database.tar";
const MANIFEST_ENTRY = "manifest.json";
const MANIFEST_MAX_BYTES = 64 << 20;

const fileSchema = z.object({ entry: z.string(), bytes: z.number().int().nonnegative(), sha256: z.string().regex(/^[0-9a-f]{64}$/) });
const manifestSchema = z.object({
  format: z.literal("gradeline-backup"),
  version: z.literal(1),
  createdAt: z.string(),
  bucket: z.string(),
  database: fileSchema,
  objects: z.array(fileSchema.extend({ key: z.string().min(1).max(1024), contentType: z.string().max(255).optional() })),
});
export type Manifest = z.infer<typeof manifestSchema>;
export type ObjectSource = { key: string; bytes: number; contentType?: string; open: () => Promise<Readable> };

export class DamagedArchiveError extends Error {
  constructor(file: string, reason: string) {
    super(`The archive ${file} is damaged or not a Gradeline backup (${reason}). Nothing was restored.`);
    this.name = "DamagedArchiveError";
  }
}

function hashing(into: { sha256: string; bytes: number }): Transform {
  const hash = createHash("sha256");
  return new Transform({
    transform(chunk: Buffer, _enc, done) {
      hash.update(chunk);
      into.bytes += chunk.length;
      done(null, chunk);
    },
    flush(done) {
      into.sha256 = hash.digest("hex");
      done();
    },
  });
}

async function addEntry(pack: tar.Pack, name: string, size: number, source: Readable) {
  const seen = { sha256: "", bytes: 0 };
  await pipeline(source, hashing(seen), pack.entry({ name, size, mode: 0o600, mtime: new Date() }));
  return { entry: name, ...seen };
}

/** Writes the database dump and every object to `file` (through a .partial file, renamed at the end). */
export async function writeArchive(
  file: string,
  input: { bucket: string; database: Uint8Array; objects: AsyncIterable<ObjectSource> },
): Promise<Manifest> {
  const partial = `${file}.partial`;
  const pack = tar.pack();
  const written = pipeline(pack, createGzip(), fs.createWriteStream(partial, { mode: 0o600 }));
  try {
    const database = await addEntry(pack, DATABASE_ENTRY, input.database.length, Readable.from([Buffer.from(input.database)]));
    const objects: Manifest["objects"] = [];
    for await (const o of input.objects) {
      const entry = `objects/${String(objects.length + 1).padStart(6, "0")}`;
      const stored = await addEntry(pack, entry, o.bytes, await o.open());
      objects.push({ ...stored, key: o.key, ...(o.contentType ? { contentType: o.contentType } : {}) });
    }
    const manifest: Manifest = {
      format: "gradeline-backup",
      version: 1,
      createdAt: new Date().toISOString(),
      bucket: input.bucket,
      database,
      objects,
    };
    pack.entry({ name: MANIFEST_ENTRY, mode: 0o600 }, JSON.stringify(manifest, null, 1));
    pack.finalize();
    await written;
    fs.renameSync(partial, file);
    return manifest;
  } catch (error) {
    pack.destroy();
    await written.catch(() => undefined);
    fs.rmSync(partial, { force: true });
    throw error;
  }
}

type EntryHandler = (name: string, body: Readable) => Promise<void>;

/** Streams every entry of the archive through `onEntry`, hashing each; returns what was seen. */
async function readEntries(file: string, onEntry: EntryHandler) {
  const seen = new Map<string, { sha256: string; bytes: number }>();
  let manifestText = "";
  const extract = tar.extract();
  const reading = pipeline(fs.createReadStream(file), createGunzip(), extract);
  reading.catch(() => undefined); // awaited below; a failure inside the loop ends the read early
  for await (const entry of extract) {
    const name = entry.header.name;
    if (entry.header.type !== "file" || seen.has(name)) throw new Error(`unexpected entry ${JSON.stringify(name)}`);
    const info = { sha256: "", bytes: 0 };
    if (name === MANIFEST_ENTRY) {
      for await (const chunk of entry) {
        manifestText += chunk;
        if (manifestText.length > MANIFEST_MAX_BYTES) throw new Error("the manifest is too large");
      }
    } else {
      const body = new PassThrough();
      await Promise.all([pipeline(entry, hashing(info), body), onEntry(name, body)]);
    }
    seen.set(name, info);
  }
  await reading;
  return { seen, manifestText };
}

function checkManifest(text: string, seen: Map<string, { sha256: string; bytes: number }>): Manifest {
  if (!text) throw new Error("it has no manifest, so it was cut short");
  const parsed = manifestSchema.safeParse(JSON.parse(text));
  if (!parsed.success) throw new Error("its manifest is not readable");
  const manifest = parsed.data;
  const listed = [manifest.database, ...manifest.objects];
  if (new Set(manifest.objects.map((o) => o.key)).size !== manifest.objects.length) throw new Error("its manifest names a key twice");
  if (manifest.database.entry !== DATABASE_ENTRY) throw new Error("its manifest names no database");
  for (const f of listed) {
    const got = seen.get(f.entry);
    if (!got) throw new Error(`${f.entry} is missing`);
    if (got.bytes !== f.bytes || got.sha256 !== f.sha256) throw new Error(`${f.entry} does not match its recorded size and hash`);
  }
  if (seen.size !== listed.length + 1) throw new Error("it holds entries its manifest does not list");
  return manifest;
}

const drain: EntryHandler = async (_name, body) => {
  for await (const chunk of body) void chunk;
};

/** Reads the whole archive and checks every entry against the manifest; writes nothing. */
export async function verifyArchive(file: string): Promise<Manifest> {
  try {
    const { seen, manifestText } = await readEntries(file, drain);
    return checkManifest(manifestText, seen);
  } catch (error) {
    throw new DamagedArchiveError(file, error instanceof Error ? error.message : String(error));
  }
}

/** Reads a verified archive again, handing the database and each object to the callbacks. */
export async function readArchive(
  file: string,
  manifest: Manifest,
  on: { database: (bytes: Buffer) => Promise<void>; object: (o: Manifest["objects"][number], body: Readable) => Promise<void> },
): Promise<void> {
  const byEntry = new Map(manifest.objects.map((o) => [o.entry, o]));
  const { seen, manifestText } = await readEntries(file, async (name, body) => {
    if (name === DATABASE_ENTRY) {
      const chunks: Buffer[] = [];
      for await (const chunk of body) chunks.push(chunk as Buffer);
      return on.database(Buffer.concat(chunks));
    }
    const object = byEntry.get(name);
    if (!object) throw new DamagedArchiveError(file, `unexpected entry ${name}`);
    return on.object(object, body);
  });
  // The file could have changed since it was checked: the second read must match as well.
  try {
    checkManifest(manifestText, seen);
  } catch (error) {
    throw new DamagedArchiveError(file, (error as Error).message);
  }
}
