import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { POST as complete } from "@/app/api/clips/[clipId]/complete/route";
import { GET as listParts } from "@/app/api/clips/[clipId]/parts/route";
import { GET as getClip } from "@/app/api/clips/[clipId]/route";
import { POST as startClip } from "@/app/api/jobs/[id]/clips/route";
import { getClip as clipRow } from "@/db/queries/clips";
import { getObjectBytes } from "@/lib/storage/client";
import { completeMultipartUpload, listStoredParts } from "@/lib/storage/multipart";
import { MiB, partRange, type UploadPlan } from "@/lib/uploads/plan";

import { call } from "../utils/session";
import { acceptedJob, paddedClip, putPart, sha256, startUploadStorage, type PartUrl } from "./support/harness";

let storage: Awaited<ReturnType<typeof startUploadStorage>>;
let job: Awaited<ReturnType<typeof acceptedJob>>;

beforeAll(async () => {
  storage = await startUploadStorage();
  job = await acceptedJob();
});
afterAll(() => storage.close());

type Started = { clipId: string; partSizeBytes: number; partCount: number; parts: PartUrl[] };

async function begin(file: Uint8Array, fileName = "run-2.mp4") {
  const res = await call(startClip, {
    method: "POST",
    params: { id: job.jobId },
    body: { fileName, sizeBytes: file.length, contentType: "video/mp4" },
    cookie: job.inspector.cookie,
  });
  expect(res.status).toBe(201);
  const started = res.json as unknown as Started;
  const plan: UploadPlan = { sizeBytes: file.length, partSizeBytes: started.partSizeBytes, partCount: started.partCount };
  const slice = (n: number) => file.subarray(partRange(plan, n).start, partRange(plan, n).end);
  return { ...started, plan, slice };
}

const parts = (clipId: string) => call(listParts, { params: { clipId }, cookie: job.inspector.cookie });
const finish = (clipId: string, list: { partNumber: number; etag: string }[]) =>
  call(complete, { method: "POST", params: { clipId }, body: { parts: list }, cookie: job.inspector.cookie });

describe("resuming a multipart upload", () => {
  it("cut after 2 of 3 parts, resumed through the parts route: the stored object is the file, byte for byte, and no part is sent twice", async () => {
    const file = paddedClip(17 * MiB + 12_345);
    const up = await begin(file);
    expect(up.partCount).toBe(3);
    const counter = { puts: 0 };
    const etags = new Map<number, string>();
    for (const p of up.parts.slice(0, 2)) etags.set(p.partNumber, await putPart(p.url, up.slice(p.partNumber), counter));
    // The page reloads: the browser only knows the clip id, and asks what storage already holds.
    etags.clear();
    const resumed = await parts(up.clipId);
    expect(resumed.status).toBe(200);
    const uploaded = resumed.json.uploaded as { partNumber: number; etag: string; size: number }[];
    expect(uploaded.map((p) => [p.partNumber, p.size])).toEqual([
      [1, 8 * MiB],
      [2, 8 * MiB],
    ]);
    for (const p of uploaded) etags.set(p.partNumber, p.etag);
    const missing = resumed.json.parts as PartUrl[];
    expect(missing.map((p) => p.partNumber)).toEqual([3]);
    for (const p of missing) etags.set(p.partNumber, await putPart(p.url, up.slice(p.partNumber), counter));
    expect(counter.puts).toBe(3);

    const done = await finish(
      up.clipId,
      [...etags].sort((a, b) => a[0] - b[0]).map(([partNumber, etag]) => ({ partNumber, etag })),
    );
    expect(done.status).toBe(200);
    expect(done.json.clip).toMatchObject({ id: up.clipId, status: "ready", sizeBytes: file.length, contentType: "video/mp4" });
    expect(Math.abs((done.json.clip as { durationSeconds: number }).durationSeconds - 10)).toBeLessThan(0.2);

    const row = await clipRow(up.clipId);
    const stored = await getObjectBytes(row!.objectKey);
    expect(stored.length).toBe(file.length);
    expect(sha256(stored)).toBe(sha256(file));

    // Completing twice answers the same ready clip and makes no second object.
    const again = await finish(
      up.clipId,
      [...etags].map(([partNumber, etag]) => ({ partNumber, etag })),
    );
    expect(again.status).toBe(200);
    expect(again.json.clip).toEqual(done.json.clip);
    expect((await clipRow(up.clipId))?.objectKey).toBe(row!.objectKey);
  });

  it("two completions at the same moment give one ready clip", async () => {
    const file = paddedClip(300_000);
    const up = await begin(file);
    const etag = await putPart(up.parts[0].url, up.slice(1));
    const [a, b] = await Promise.all([finish(up.clipId, [{ partNumber: 1, etag }]), finish(up.clipId, [{ partNumber: 1, etag }])]);
    expect([a.status, b.status]).toEqual([200, 200]);
    expect(a.json.clip).toEqual(b.json.clip);
  });

  it("storage down mid-upload: a retryable 503, no clip says ready, and the upload carries on once storage is back", async () => {
    const file = paddedClip(9 * MiB);
    const up = await begin(file, "down-and-up.mp4");
    const counter = { puts: 0 };
    const first = await putPart(up.parts[0].url, up.slice(1), counter);

    await storage.goDown();
    try {
      const listed = await parts(up.clipId);
      expect(listed.status).toBe(503);
      expect(listed.headers.get("retry-after")).toBeTruthy();
      expect(listed.json.error?.code).toBe("unavailable");
      const completed = await finish(up.clipId, [
        { partNumber: 1, etag: first },
        { partNumber: 2, etag: "not-sent" },
      ]);
      expect(completed.status).toBe(503);
      const started = await call(startClip, {
        method: "POST",
        params: { id: job.jobId },
        body: { fileName: "x.mp4", sizeBytes: 10, contentType: "video/mp4" },
        cookie: job.inspector.cookie,
      });
      expect(started.status).toBe(503);
      expect((await clipRow(up.clipId))?.status).toBe("uploading");
    } finally {
      storage.restore();
    }

    const resumed = await parts(up.clipId);
    expect(resumed.status).toBe(200);
    expect((resumed.json.parts as PartUrl[]).map((p) => p.partNumber)).toEqual([2]);
    const second = await putPart((resumed.json.parts as PartUrl[])[0].url, up.slice(2), counter);
    const done = await finish(up.clipId, [
      { partNumber: 1, etag: first },
      { partNumber: 2, etag: second },
    ]);
    expect(done.status).toBe(200);
    expect((done.json.clip as { status: string }).status).toBe("ready");
    expect(counter.puts).toBe(2);
    expect(sha256(await getObjectBytes((await clipRow(up.clipId))!.objectKey))).toBe(sha256(file));
  });

  it("finishes a completion that was cut short after storage assembled the object", async () => {
    const file = paddedClip(400_000);
    const up = await begin(file);
    await putPart(up.parts[0].url, up.slice(1));
    const row = await clipRow(up.clipId);
    await completeMultipartUpload(row!.objectKey, row!.uploadId!, await listStoredParts(row!.objectKey, row!.uploadId!));
    expect((await clipRow(up.clipId))?.status).toBe("uploading");

    const resumed = await parts(up.clipId);
    expect(resumed.json).toMatchObject({ assembled: true, parts: [] });
    const done = await finish(up.clipId, [{ partNumber: 1, etag: "from-before" }]);
    expect(done.status).toBe(200);
    expect((done.json.clip as { status: string }).status).toBe("ready");
  });

  it("plays back through a short-lived signed URL that answers range requests", async () => {
    const file = paddedClip(250_000);
    const up = await begin(file);
    const etag = await putPart(up.parts[0].url, up.slice(1));
    expect((await finish(up.clipId, [{ partNumber: 1, etag }])).status).toBe(200);
    const res = await call(getClip, { params: { clipId: up.clipId }, cookie: job.inspector.cookie });
    expect(res.status).toBe(200);
    const url = new URL(res.json.playbackUrl as string);
    expect(Number(url.searchParams.get("X-Amz-Expires"))).toBeLessThanOrEqual(900);
    const ranged = await fetch(url, { headers: { range: "bytes=1000-1999" } });
    expect(ranged.status).toBe(206);
    expect(ranged.headers.get("content-type")).toBe("video/mp4");
    expect(sha256(new Uint8Array(await ranged.arrayBuffer()))).toBe(sha256(file.subarray(1000, 2000)));
  });
});
