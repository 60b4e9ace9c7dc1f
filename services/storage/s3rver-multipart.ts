// s3rver 3.7.1 stores multipart uploads but answers ListParts and AbortMultipartUpload with 405 and
// ListMultipartUploads with 501. This adds the three, read from s3rver's own upload folders, so the
// app's resume and sweeper run against the fake as they do against S3. Call before server.run().
import fs from "node:fs/promises";
import path from "node:path";

import type S3rver from "s3rver";

type Ctx = {
  method: string;
  path: string;
  query: Record<string, string | string[] | undefined>;
  status: number;
  type: string;
  body: unknown;
};
type Middleware = (ctx: Ctx, next: () => Promise<void>) => Promise<void>;
type Store = { getResourcePath(bucket: string, key: string | undefined, resource: string): string };

const esc = (s: string) => s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
const xml = (root: string, inner: string) =>
  `<?xml version="1.0" encoding="UTF-8"?>\n<${root} xmlns="http://s3.amazonaws.com/doc/2006-03-01/">${inner}</${root}>`;
const one = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

function fail(ctx: Ctx, status: number, code: string, message: string) {
  ctx.status = status;
  ctx.type = "application/xml";
  ctx.body = `<?xml version="1.0" encoding="UTF-8"?>\n<Error><Code>${code}</Code><Message>${esc(message)}</Message></Error>`;
}

async function readKey(dir: string): Promise<string | null> {
  try {
    return await fs.readFile(path.join(dir, "key"), "utf8");
  } catch {
    return null;
  }
}

export function addMultipartListing(server: S3rver): void {
  const app = server as unknown as { store: Store; middleware: Middleware[] };
  const uploadsDir = (bucket: string) => app.store.getResourcePath(bucket, undefined, "uploads");

  const listParts = async (ctx: Ctx, dir: string, bucket: string, key: string, uploadId: string) => {
    const marker = Number(one(ctx.query["part-number-marker"]) ?? 0);
    const max = Math.min(1000, Number(one(ctx.query["max-parts"]) ?? 1000));
    const numbers = (await fs.readdir(dir))
      .filter((f) => /^\d+$/.test(f))
      .map(Number)
      .filter((n) => n > marker)
      .sort((a, b) => a - b);
    const page = numbers.slice(0, max);
    const parts = await Promise.all(
      page.map(async (n) => {
        const [stat, md5] = await Promise.all([
          fs.stat(path.join(dir, String(n))),
          fs.readFile(path.join(dir, `${n}.md5`), "utf8").catch(() => ""),
        ]);
        return `<Part><PartNumber>${n}</PartNumber><LastModified>${stat.mtime.toISOString()}</LastModified><ETag>"${md5}"</ETag><Size>${stat.size}</Size></Part>`;
      }),
    );
    const truncated = numbers.length > page.length;
    ctx.type = "application/xml";
    ctx.body = xml(
      "ListPartsResult",
      `<Bucket>${esc(bucket)}</Bucket><Key>${esc(key)}</Key><UploadId>${esc(uploadId)}</UploadId><PartNumberMarker>${marker}</PartNumberMarker>` +
        `<NextPartNumberMarker>${page.at(-1) ?? marker}</NextPartNumberMarker><MaxParts>${max}</MaxParts><IsTruncated>${truncated}</IsTruncated>${parts.join("")}`,
    );
  };

  const listUploads = async (ctx: Ctx, bucket: string) => {
    const prefix = one(ctx.query.prefix) ?? "";
    const keyMarker = one(ctx.query["key-marker"]) ?? "";
    const idMarker = one(ctx.query["upload-id-marker"]) ?? "";
    const max = Math.min(1000, Number(one(ctx.query["max-uploads"]) ?? 1000));
    const root = uploadsDir(bucket);
    const ids = await fs.readdir(root).catch(() => [] as string[]);
    const uploads = (
      await Promise.all(
        ids.map(async (uploadId) => {
          const key = await readKey(path.join(root, uploadId));
          if (key === null || !key.startsWith(prefix)) return null;
          const initiated = (await fs.stat(path.join(root, uploadId, "key"))).mtime;
          return { key, uploadId, initiated };
        }),
      )
    )
      .filter((u): u is NonNullable<typeof u> => !!u && (u.key > keyMarker || (u.key === keyMarker && u.uploadId > idMarker)))
      .sort((a, b) => (a.key === b.key ? a.uploadId.localeCompare(b.uploadId) : a.key < b.key ? -1 : 1));
    const page = uploads.slice(0, max);
    const last = page.at(-1);
    ctx.type = "application/xml";
    ctx.body = xml(
      "ListMultipartUploadsResult",
      `<Bucket>${esc(bucket)}</Bucket><KeyMarker>${esc(keyMarker)}</KeyMarker><UploadIdMarker>${esc(idMarker)}</UploadIdMarker>` +
        `<NextKeyMarker>${esc(last?.key ?? "")}</NextKeyMarker><NextUploadIdMarker>${esc(last?.uploadId ?? "")}</NextUploadIdMarker>` +
        `<Prefix>${esc(prefix)}</Prefix><MaxUploads>${max}</MaxUploads><IsTruncated>${uploads.length > page.length}</IsTruncated>` +
        page
          .map(
            (u) =>
              `<Upload><Key>${esc(u.key)}</Key><UploadId>${esc(u.uploadId)}</UploadId><StorageClass>STANDARD</StorageClass><Initiated>${u.initiated.toISOString()}</Initiated></Upload>`,
          )
          .join(""),
    );
  };

  const middleware: Middleware = async (ctx, next) => {
    const [bucket, ...rest] = ctx.path.split("/").filter(Boolean).map(decodeURIComponent);
    const key = rest.join("/");
    const uploadId = one(ctx.query.uploadId);
    if (bucket && !key && ctx.method === "GET" && "uploads" in ctx.query) return listUploads(ctx, bucket);
    if (!bucket || !key || !uploadId || (ctx.method !== "GET" && ctx.method !== "DELETE")) return next();
    const dir = path.join(uploadsDir(bucket), path.basename(uploadId));
    if ((await readKey(dir)) !== key) return fail(ctx, 404, "NoSuchUpload", "The specified upload does not exist.");
    if (ctx.method === "GET") return listParts(ctx, dir, bucket, key, uploadId);
    await fs.rm(dir, { recursive: true, force: true });
    ctx.status = 204;
    ctx.body = null;
  };

  // Before s3rver's router (the last middleware), after its logger, XML and host handling.
  app.middleware.splice(app.middleware.length - 1, 0, middleware);
}
