// POST /api/stills/{stillId}/complete - keep the still if its bytes are a JPEG or PNG, otherwise drop it
import { deleteStill, getStillForInspector, markStillVerified } from "@/db/queries/clips";
import { route } from "@/lib/api/route";
import { AppError, notFound } from "@/lib/errors";
import { deleteObject, signedMediaUrl } from "@/lib/storage/multipart";
import { checkStoredImage } from "@/lib/uploads/verify";
import { MAX_IMAGE_BYTES, stillIdParams } from "@/lib/validations/clips";

export const POST = route({ permission: "jobs:work", params: stillIdParams }, async ({ user, params }) => {
  const found = await getStillForInspector(params.stillId, user.id);
  if (!found) throw notFound("That still");
  const { still } = found;
  const check = await checkStoredImage(still.objectKey, MAX_IMAGE_BYTES);
  if (!check.ok) {
    // Not arrived yet: the upload URL may still be used, so the still stays.
    if (!check.gone) {
      await deleteObject(still.objectKey);
      await deleteStill(still.id);
    }
    throw new AppError("unprocessable", check.reason);
  }
  await markStillVerified(still.id);
  return { still: { id: still.id, clipId: still.clipId, second: still.second, url: await signedMediaUrl(still.objectKey) } };
});
