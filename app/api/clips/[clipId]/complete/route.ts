// POST /api/clips/{clipId}/complete - check the parts against storage, assemble, and keep only real video
import { finishClip, getClip, getClipForInspector, markClipAborted, toClipView, type ClipView } from "@/db/queries/clips";
import type { Clip } from "@/db/schema";
import { route } from "@/lib/api/route";
import { AppError, notFound } from "@/lib/errors";
import { completeMultipartUpload, deleteObject, listStoredParts, signedMediaUrl, UploadGoneError } from "@/lib/storage/multipart";
import { checkCompletionList, checkStoredParts, normalizeEtag, type PartProblem, type StoredPart } from "@/lib/uploads/plan";
import { checkStoredVideo } from "@/lib/uploads/verify";
import { clipIdParams, completeClipSchema, type CompleteClipInput } from "@/lib/validations/clips";

const g = globalThis as unknown as { __gradelineClipCompletions?: Map<string, Promise<ClipView>> };

const refuse = (message: string, problems: PartProblem[]) =>
  new AppError("bad_request", message, Object.fromEntries(problems.map((p) => [p.path, [p.message]])));

async function answerFor(clip: Clip): Promise<ClipView> {
  if (clip.status === "ready") return toClipView(clip, await signedMediaUrl(clip.posterKey));
  if (clip.status === "rejected") throw new AppError("unprocessable", clip.rejectedReason ?? "That file was not accepted as video.");
  throw new AppError("conflict", "This upload was stopped. Start it again.");
}

async function complete(clip: Clip, listed: CompleteClipInput["parts"]): Promise<ClipView> {
  const plan = { sizeBytes: clip.sizeBytes, partSizeBytes: clip.partSizeBytes, partCount: clip.partCount };
  let stored: StoredPart[] | null = null;
  try {
    stored = clip.uploadId ? await listStoredParts(clip.objectKey, clip.uploadId) : null;
  } catch (error) {
    // Gone from storage: assembled by an earlier attempt whose check did not finish, or aborted.
    if (!(error instanceof UploadGoneError)) throw error;
  }
  if (stored && clip.uploadId) {
    const problems = checkStoredParts(plan, stored);
    const byNumber = new Map(stored.map((p) => [p.partNumber, p]));
    listed.forEach((p, i) => {
      const held = byNumber.get(p.partNumber);
      if (held && normalizeEtag(held.etag) !== normalizeEtag(p.etag))
        problems.push({ path: `parts[${i}].etag`, message: `Part ${p.partNumber} in storage is not the one listed (its ETag differs).` });
    });
    if (problems.length) throw refuse("Storage does not hold the parts this upload needs: send the parts listed again.", problems);
    await completeMultipartUpload(
      clip.objectKey,
      clip.uploadId,
      stored.filter((p) => p.partNumber <= plan.partCount),
    );
  }

  const check = await checkStoredVideo(clip.objectKey, clip.sizeBytes);
  if (!check.ok && check.gone && !stored) {
    await markClipAborted(clip.id, ["uploading"]);
    throw new AppError("conflict", "This upload expired in storage. Start it again.");
  }
  if (!check.ok) {
    await deleteObject(clip.objectKey);
    const row = await finishClip(clip.id, { status: "rejected", reason: check.reason });
    return answerFor(row ?? (await getClip(clip.id)) ?? clip);
  }
  const row = await finishClip(clip.id, { status: "ready", detectedType: check.mime, durationSeconds: check.durationSeconds });
  return answerFor(row ?? (await getClip(clip.id)) ?? clip);
}

export const POST = route({ permission: "jobs:work", params: clipIdParams, body: completeClipSchema }, async ({ user, params, body }) => {
  const found = await getClipForInspector(params.clipId, user.id);
  if (!found) throw notFound("That clip");
  const { clip } = found;
  if (clip.status !== "uploading") return { clip: await answerFor(clip) };
  const problems = checkCompletionList(body.parts, clip.partCount);
  if (problems.length) throw refuse("The list of parts has problems: fix the fields listed.", problems);

  // Two completions of one clip at once in this process share one run.
  const running = (g.__gradelineClipCompletions ??= new Map());
  let run = running.get(clip.id);
  if (!run) {
    run = complete(clip, body.parts).finally(() => running.delete(clip.id));
    running.set(clip.id, run);
  }
  return { clip: await run };
});
