// POST /api/jobs/{id}/clips - start a clip upload straight to storage; GET - the job's clips
import { getAssignedOrder, insertClip, listClipsForOrder, toClipView, WORKABLE_STATUSES } from "@/db/queries/clips";
import { limitPerUser } from "@/lib/api/rate-limit";
import { json, route } from "@/lib/api/route";
import { AppError, notFound } from "@/lib/errors";
import { objectKey } from "@/lib/storage/keys";
import { abortMultipartUpload, createMultipartUpload, signedMediaUrl, signPartUrls } from "@/lib/storage/multipart";
import { CLIP_TYPES, PARTS_PER_ANSWER, planUpload } from "@/lib/uploads/plan";
import { startClipSchema } from "@/lib/validations/clips";
import { idParams } from "@/lib/validations/orders";

export const POST = route({ permission: "jobs:work", params: idParams, body: startClipSchema }, async ({ user, params, body }) => {
  await limitPerUser("upload-sign", user.id);
  const order = await getAssignedOrder(params.id, user.id);
  if (!order) throw notFound("That job");
  if (!WORKABLE_STATUSES.includes(order.status))
    throw new AppError("conflict", "Clips can be added only while the job is accepted or scheduled.");

  const plan = planUpload(body.sizeBytes);
  const key = objectKey("clips", order.id, CLIP_TYPES[body.contentType]);
  // Storage first: a row never points at an upload that does not exist. The sweeper removes an
  // upload whose row was never written.
  const uploadId = await createMultipartUpload(key, body.contentType);
  let clip;
  try {
    clip = await insertClip({
      orderId: order.id,
      inspectorId: user.id,
      label: body.fileName.normalize("NFC"),
      sizeBytes: plan.sizeBytes,
      declaredType: body.contentType,
      objectKey: key,
      uploadId,
      partSizeBytes: plan.partSizeBytes,
      partCount: plan.partCount,
      startFootage: body.startFootage ?? null,
    });
  } catch (error) {
    await abortMultipartUpload(key, uploadId).catch(() => undefined);
    throw error;
  }
  const first = Array.from({ length: Math.min(plan.partCount, PARTS_PER_ANSWER) }, (_, i) => i + 1);
  const parts = await signPartUrls(key, uploadId, plan, first);
  return json({ clipId: clip.id, partSizeBytes: plan.partSizeBytes, partCount: plan.partCount, parts }, 201);
});

export const GET = route({ permission: "jobs:work", params: idParams }, async ({ user, params }) => {
  const order = await getAssignedOrder(params.id, user.id);
  if (!order) throw notFound("That job");
  const rows = await listClipsForOrder(order.id);
  return { clips: await Promise.all(rows.map(async (c) => toClipView(c, await signedMediaUrl(c.posterKey)))) };
});
