// GET /api/clips/{clipId}/parts?from=&to= - the parts storage holds, and fresh URLs for the missing ones
import { getClipForInspector, markClipAborted, touchClip } from "@/db/queries/clips";
import { limitPerUser } from "@/lib/api/rate-limit";
import { route } from "@/lib/api/route";
import { AppError, notFound } from "@/lib/errors";
import { headObject, listStoredParts, signPartUrls, UploadGoneError } from "@/lib/storage/multipart";
import { expectedPartBytes, missingParts, PARTS_PER_ANSWER } from "@/lib/uploads/plan";
import { clipIdParams, partsQuerySchema } from "@/lib/validations/clips";

export const GET = route({ permission: "jobs:work", params: clipIdParams, query: partsQuerySchema }, async ({ user, params, query }) => {
  await limitPerUser("upload-sign", user.id);
  const found = await getClipForInspector(params.clipId, user.id);
  if (!found) throw notFound("That clip");
  const { clip } = found;
  if (clip.status !== "uploading" || !clip.uploadId)
    throw new AppError(
      "conflict",
      clip.status === "ready" ? "This clip has finished uploading." : "This upload was stopped. Start it again.",
    );

  const from = query.from ?? 1;
  const to = query.to ?? Math.min(clip.partCount, from + PARTS_PER_ANSWER - 1);
  if (from > clip.partCount || to > clip.partCount) {
    throw new AppError("bad_request", `This upload has parts 1 to ${clip.partCount}.`, {
      [from > clip.partCount ? "from" : "to"]: [`Use a part number from 1 to ${clip.partCount}.`],
    });
  }
  if (to - from >= 1000)
    throw new AppError("bad_request", "Ask for at most 1,000 parts at a time.", { to: ["Ask for at most 1,000 parts at a time."] });

  const plan = { sizeBytes: clip.sizeBytes, partSizeBytes: clip.partSizeBytes, partCount: clip.partCount };
  let stored;
  try {
    stored = await listStoredParts(clip.objectKey, clip.uploadId);
  } catch (error) {
    if (!(error instanceof UploadGoneError)) throw error;
    // Assembled already (completion was cut short before the check): the client completes again.
    if (await headObject(clip.objectKey))
      return { partSizeBytes: plan.partSizeBytes, partCount: plan.partCount, uploaded: [], parts: [], assembled: true };
    await markClipAborted(clip.id, ["uploading"]);
    throw new AppError("conflict", "This upload expired in storage. Start it again.");
  }
  await touchClip(clip.id);
  const uploaded = stored
    .filter((p) => p.partNumber <= plan.partCount && p.size === expectedPartBytes(plan, p.partNumber))
    .map((p) => ({ partNumber: p.partNumber, etag: p.etag, size: p.size }));
  const parts = await signPartUrls(clip.objectKey, clip.uploadId, plan, missingParts(plan, stored, from, to));
  return { partSizeBytes: plan.partSizeBytes, partCount: plan.partCount, uploaded, parts, assembled: false };
});
