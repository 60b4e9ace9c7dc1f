// POST /api/clips/{clipId}/poster - a presigned URL for the poster frame the browser took from the clip
import { getClipForInspector, WORKABLE_STATUSES } from "@/db/queries/clips";
import { route } from "@/lib/api/route";
import { AppError, notFound } from "@/lib/errors";
import { signedUploadUrl } from "@/lib/storage/client";
import { objectKey } from "@/lib/storage/keys";
import { clipIdParams, IMAGE_TYPES, posterUploadSchema } from "@/lib/validations/clips";

export const POST = route({ permission: "jobs:work", params: clipIdParams, body: posterUploadSchema }, async ({ user, params, body }) => {
  const found = await getClipForInspector(params.clipId, user.id);
  if (!found) throw notFound("That clip");
  if (!WORKABLE_STATUSES.includes(found.orderStatus))
    throw new AppError("conflict", "Clips can be changed only while the job is accepted or scheduled.");
  if (found.clip.status !== "ready") throw new AppError("conflict", "Add the poster once the clip has finished uploading.");
  const key = objectKey("posters", found.clip.id, IMAGE_TYPES[body.contentType]);
  return { key, uploadUrl: await signedUploadUrl(key, body.contentType, 600) };
});
