// Upload tests run against their own s3rver (with the multipart listing the shared fake lacks), so
// each file sees only its own uploads and the sweeper cannot touch another file's.
import { createHash } from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";

import S3rver from "s3rver";

import { POST as acceptJob } from "@/app/api/jobs/[id]/accept/route";
import { POST as createOrder } from "@/app/api/orders/route";
import { ensureBucket } from "@/lib/storage/client";
import { listInProgressUploads } from "@/lib/storage/multipart";

import { freePort } from "../../utils/free-port";
import { call } from "../../utils/session";
import { orderInput, signedIn, verifiedInspector } from "../../utils/world";
import { addMultipartListing } from "@/services/storage/s3rver-multipart";

const g = globalThis as unknown as Record<"__gradelineEnv" | "__gradelineS3" | "__gradelineS3Presign" | "__gradelineS3PartSigner", unknown>;

/** Points the app's storage clients at another endpoint, as a restart with a new env would. */
export function pointStorageAt(endpoint: string) {
  process.env.S3_ENDPOINT = endpoint;
  g.__gradelineEnv = undefined;
  g.__gradelineS3 = undefined;
  g.__gradelineS3Presign = undefined;
  g.__gradelineS3PartSigner = undefined;
}

export async function startUploadStorage() {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "gradeline-uploads-"));
  const server = new S3rver({ port: 0, address: "127.0.0.1", directory: dir, silent: true, resetOnClose: false });
  addMultipartListing(server);
  const { port } = await server.run();
  const endpoint = `http://127.0.0.1:${port}`;
  pointStorageAt(endpoint);
  await ensureBucket();
  return {
    endpoint,
    dir,
    /** Storage stops answering (a closed port) until restore() is called. */
    async goDown() {
      pointStorageAt(`http://127.0.0.1:${await freePort()}`);
    },
    restore: () => pointStorageAt(endpoint),
    uploadFolder(uploadId: string) {
      return path.join(dir, process.env.S3_BUCKET ?? "gradeline-media", "._S3rver_uploads", uploadId);
    },
    async close() {
      await server.close();
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}

export const inProgressUploads = () => listInProgressUploads("clips/");

/** An order accepted by a verified inspector, plus an agent and an outsider inspector. */
export async function acceptedJob() {
  const inspector = await verifiedInspector(["97991"]);
  const agent = await signedIn("agent");
  const order = await call(createOrder, { method: "POST", body: orderInput(), cookie: agent.cookie });
  if (order.status !== 201 && order.status !== 200) throw new Error(`order not created: ${JSON.stringify(order.json)}`);
  const id = order.json.id as string;
  const accepted = await call(acceptJob, { method: "POST", params: { id }, cookie: inspector.cookie });
  if (accepted.status !== 200) throw new Error(`job not accepted: ${JSON.stringify(accepted.json)}`);
  return { jobId: id, inspector, agent };
}

export type PartUrl = { partNumber: number; url: string };

/** The browser's side of a part: one PUT of its exact bytes, the ETag read back. */
export async function putPart(url: string, bytes: Uint8Array, counter?: { puts: number }): Promise<string> {
  if (counter) counter.puts++;
  const res = await fetch(url, { method: "PUT", body: new Blob([Buffer.from(bytes)]) });
  if (!res.ok) throw new Error(`part PUT answered ${res.status}: ${await res.text()}`);
  return res.headers.get("etag") ?? "";
}

export const sha256 = (bytes: Uint8Array) => createHash("sha256").update(bytes).digest("hex");

export const demoClip = (name = "clay-joints") =>
  new Uint8Array(fs.readFileSync(path.join(process.cwd(), "db", "demo-media", `${name}.mp4`)));
export const demoPoster = (name = "clay-joints") =>
  new Uint8Array(fs.readFileSync(path.join(process.cwd(), "db", "demo-media", `${name}.jpg`)));

/** A real MP4 followed by filler, to make a file of several parts that still verifies as video. */
export function paddedClip(totalBytes: number): Uint8Array {
  const clip = demoClip();
  const out = new Uint8Array(totalBytes);
  out.set(clip);
  for (let i = clip.length; i < totalBytes; i++) out[i] = (i * 2654435761) >>> 24;
  return out;
}
