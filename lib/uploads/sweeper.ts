import "server-only";

import { z } from "zod";

import { activeUploadIds, listStaleUploads, markClipAborted } from "@/db/queries/clips";
import { abortMultipartUpload, listInProgressUploads } from "@/lib/storage/multipart";

const HOUR = 3_600_000;

const sweeperEnv = z.object({
  UPLOAD_ABANDON_HOURS: z.coerce
    .number()
    .positive()
    .max(24 * 90)
    .default(24),
});

export function abandonAfterMs(): number {
  const parsed = sweeperEnv.safeParse({ UPLOAD_ABANDON_HOURS: process.env.UPLOAD_ABANDON_HOURS || undefined });
  if (!parsed.success) throw new Error(`UPLOAD_ABANDON_HOURS: ${parsed.error.issues[0]?.message ?? "must be a number of hours"}`);
  return parsed.data.UPLOAD_ABANDON_HOURS * HOUR;
}

export type SweepResult = { aborted: number; orphans: number; failed: number };

/**
 * Aborts uploads of clips left `uploading` past the age (their parts go with them) and marks them
 * aborted; then aborts multipart uploads under clips/ that no uploading clip owns, past the same age
 * (a row that was never written, or one whose abort failed earlier).
 */
export async function sweepAbandonedUploads({
  olderThanMs = abandonAfterMs(),
  now = new Date(),
}: { olderThanMs?: number; now?: Date } = {}): Promise<SweepResult> {
  const cutoff = new Date(now.getTime() - olderThanMs);
  const result: SweepResult = { aborted: 0, orphans: 0, failed: 0 };

  for (const clip of await listStaleUploads(cutoff)) {
    try {
      if (clip.uploadId) await abortMultipartUpload(clip.objectKey, clip.uploadId);
      if (await markClipAborted(clip.id, ["uploading"], cutoff)) result.aborted++;
    } catch (error) {
      result.failed++;
      console.error("[uploads] could not abort", clip.id, error);
    }
  }

  const inStorage = await listInProgressUploads("clips/");
  const owned = await activeUploadIds(inStorage.map((u) => u.uploadId));
  for (const upload of inStorage) {
    if (owned.has(upload.uploadId) || !upload.initiated || upload.initiated > cutoff) continue;
    try {
      if (await abortMultipartUpload(upload.key, upload.uploadId)) result.orphans++;
    } catch (error) {
      result.failed++;
      console.error("[uploads] could not abort orphan upload", upload.key, error);
    }
  }
  return result;
}

export function startUploadSweeper(intervalMs = 15 * 60_000): () => void {
  let running = false;
  const timer = setInterval(async () => {
    if (running) return;
    running = true;
    try {
      const r = await sweepAbandonedUploads();
      if (r.aborted || r.orphans || r.failed)
        console.log(`[uploads] swept: ${r.aborted} abandoned, ${r.orphans} orphaned, ${r.failed} failed`);
    } catch (error) {
      console.error("[uploads] sweep failed", error);
    } finally {
      running = false;
    }
  }, intervalMs);
  timer.unref();
  return () => clearInterval(timer);
}
