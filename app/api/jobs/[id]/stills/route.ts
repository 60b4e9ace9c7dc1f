// POST /api/jobs/{id}/stills - a presigned URL for a still frame (a finding points at it by id)
import { getAssignedOrder, getClipForInspector, insertStill, WORKABLE_STATUSES } from "@/db/queries/clips";
import { json, route } from "@/lib/api/route";
import { AppError, notFound } from "@/lib/errors";
import { signedUploadUrl } from "@/lib/storage/client";
import { objectKey } from "@/lib/storage/keys";
import { IMAGE_TYPES, stillUploadSchema } from "@/lib/validations/clips";
import { idParams } from "@/lib/validations/orders";

export const POST = route({ permission: "jobs:work", params: idParams, body: stillUploadSchema }, async ({ user, params, body }) => {
  const order = await getAssignedOrder(params.id, user.id);
  if (!order) throw notFound("That job");
  if (!WORKABLE_STATUSES.includes(order.status))
    throw new AppError("conflict", "Stills can be added only while the job is accepted or scheduled.");
  if (body.clipId) {
    const clip = await getClipForInspector(body.clipId, user.id);
    if (!clip || clip.clip.orderId !== order.id)
      throw new AppError("bad_request", "That clip is not part of this job.", { clipId: ["Choose a clip of this job."] });
  }
  const key = objectKey("stills", order.id, IMAGE_TYPES[body.contentType]);
  const still = await insertStill({ orderId: order.id, clipId: body.clipId ?? null, second: body.second ?? null, objectKey: key });
  return json({ stillId: still.id, uploadUrl: await signedUploadUrl(key, body.contentType, 600) }, 201);
});
