import fs from "node:fs";

import S3rver from "s3rver";

import { addMultipartListing } from "./s3rver-multipart";

/** The local S3 fake. Buckets and CORS are created by the app at start (lib/storage ensureBucket). */
export async function startStorage(opts: { port: number; host?: string; dir: string }) {
  fs.mkdirSync(opts.dir, { recursive: true });
  const server = new S3rver({ port: opts.port, address: opts.host ?? "127.0.0.1", directory: opts.dir, silent: true, resetOnClose: false });
  addMultipartListing(server);
  const info = await server.run();
  return { port: info.port, close: () => server.close() };
}
