// GET /api/clips/{clipId} - the clip with a short-lived playback URL; PATCH - its start footage; DELETE - cancel or remove
import { getClipForInspector, markClipAborted, markClipRemoved, setClipStartFootage, toClipView, WORKABLE_STATUSES } from "@/db/queries/clips";
import { route } from "@/lib/api/route";
import { AppError, notFound } from "@/lib/errors";
import { abortMultipartUpload, deleteObject, MEDIA_URL_SECONDS, signedMediaUrl } from "@/lib/storage/multipart";
import { clipIdParams, patchClipSchema } from "@/lib/validations/clips";

async function load(clipId: string, inspectorId: string, forChange: boolean) {
  const found = await getClipForInspector(clipId, inspectorId);
  if (!found) throw notFound("That clip");
  if (forChange && !WORKABLE_STATUSES.includes(found.orderStatus))
    throw new AppError("conflict", "Clips can be changed only while the job is accepted or scheduled.");
  return found.clip;
}

export const GET = route({ permission: "jobs:work", params: clipIdParams }, async ({ user, params }) => {
  const clip = await load(params.clipId, user.id, false);
  const playbackUrl = clip.status === "ready" && clip.detectedType ? await signedMediaUrl(clip.objectKey, clip.detectedType) : null;
  return {
    clip: toClipView(clip, await signedMediaUrl(clip.posterKey)),
    playbackUrl,
    expiresInSeconds: playbackUrl ? MEDIA_URL_SECONDS : null,
  };
});

export const PATCH = route({ permission: "jobs:work", params: clipIdParams, body: patchClipSchema }, async ({ user, params, body }) => {
  const clip = await load(params.clipId, user.id, true);
  if (clip.status === "aborted" || clip.status === "rejected" || clip.status === "removed") throw new AppError("conflict", "This clip is no longer kept.");
  const row = (await setClipStartFootage(clip.id, body.startFootage)) ?? clip;
  return { clip: toClipView(row, await signedMediaUrl(row.posterKey)) };
});

export const DELETE = route({ permission: "jobs:work", params: clipIdParams }, async ({ user, params }) => {
  const clip = await load(params.clipId, user.id, true);
  if (clip.status === "uploading" && clip.uploadId) await abortMultipartUpload(clip.objectKey, clip.uploadId);
  if (clip.status === "ready") {
    await markClipRemoved(clip.id);
    await deleteObject(clip.objectKey);
    if (clip.posterKey) await deleteObject(clip.posterKey);
  } else {
    await markClipAborted(clip.id, ["uploading", "rejected"]);
  }
  return { ok: true };
});
