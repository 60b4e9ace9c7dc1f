import fs from "node:fs";
import path from "node:path";

import { eq } from "drizzle-orm";
import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";

import { POST as startClip } from "@/app/api/jobs/[id]/clips/route";
import { getDb } from "@/db/client";
import { getClip as clipRow } from "@/db/queries/clips";
import { clips } from "@/db/schema";
import { createMultipartUpload, listStoredParts, UploadGoneError } from "@/lib/storage/multipart";
import { abandonAfterMs, sweepAbandonedUploads } from "@/lib/uploads/sweeper";

import { call } from "../utils/session";
import { acceptedJob, inProgressUploads, putPart, startUploadStorage, type PartUrl } from "./support/harness";

let storage: Awaited<ReturnType<typeof startUploadStorage>>;
let job: Awaited<ReturnType<typeof acceptedJob>>;
const HOUR = 3_600_000;

beforeAll(async () => {
  storage = await startUploadStorage();
  job = await acceptedJob();
});
afterAll(() => storage.close());
afterEach(() => {
  delete process.env.UPLOAD_ABANDON_HOURS;
});

async function startedWithOnePart() {
  const res = await call(startClip, {
    method: "POST",
    params: { id: job.jobId },
    body: { fileName: "left.mp4", sizeBytes: 9 * 1024 * 1024, contentType: "video/mp4" },
    cookie: job.inspector.cookie,
  });
  await putPart((res.json.parts as PartUrl[])[1].url, new Uint8Array(1024 * 1024));
  return (await clipRow(res.json.clipId as string))!;
}

describe("the abandoned-upload sweeper", () => {
  it("aborts an upload left longer than the configured age, parts and all, and leaves a fresh one", async () => {
    const old = await startedWithOnePart();
    const fresh = await startedWithOnePart();
    const db = await getDb();
    await db
      .update(clips)
      .set({ updatedAt: new Date(Date.now() - 25 * HOUR) })
      .where(eq(clips.id, old.id));

    const result = await sweepAbandonedUploads();
    expect(result).toMatchObject({ aborted: 1, failed: 0 });
    expect((await clipRow(old.id))?.status).toBe("aborted");
    expect((await clipRow(fresh.id))?.status).toBe("uploading");

    await expect(listStoredParts(old.objectKey, old.uploadId!)).rejects.toBeInstanceOf(UploadGoneError);
    expect(fs.existsSync(storage.uploadFolder(old.uploadId!))).toBe(false);
    const listed = (await inProgressUploads()).map((u) => u.uploadId);
    expect(listed).not.toContain(old.uploadId);
    expect(listed).toContain(fresh.uploadId);
    expect((await listStoredParts(fresh.objectKey, fresh.uploadId!)).map((p) => p.partNumber)).toEqual([2]);

    expect(await sweepAbandonedUploads()).toMatchObject({ aborted: 0, orphans: 0 });
  });

  it("reads the age from UPLOAD_ABANDON_HOURS", async () => {
    process.env.UPLOAD_ABANDON_HOURS = "2";
    expect(abandonAfterMs()).toBe(2 * HOUR);
    const clip = await startedWithOnePart();
    const db = await getDb();
    await db
      .update(clips)
      .set({ updatedAt: new Date(Date.now() - 3 * HOUR) })
      .where(eq(clips.id, clip.id));
    expect((await sweepAbandonedUploads()).aborted).toBe(1);
    process.env.UPLOAD_ABANDON_HOURS = "soon";
    expect(() => abandonAfterMs()).toThrow(/UPLOAD_ABANDON_HOURS/);
  });

  it("aborts an old multipart upload in storage that no clip owns, and leaves a new one", async () => {
    const orphanKey = `clips/${job.jobId}/orphan.mp4`;
    const orphan = await createMultipartUpload(orphanKey, "video/mp4");
    const young = await createMultipartUpload(`clips/${job.jobId}/young.mp4`, "video/mp4");
    const long = new Date(Date.now() - 30 * HOUR);
    fs.utimesSync(path.join(storage.uploadFolder(orphan), "key"), long, long);

    const result = await sweepAbandonedUploads();
    expect(result.orphans).toBe(1);
    const listed = (await inProgressUploads()).map((u) => u.uploadId);
    expect(listed).not.toContain(orphan);
    expect(listed).toContain(young);
  });
});
