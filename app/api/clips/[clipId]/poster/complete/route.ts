// POST /api/clips/{clipId}/poster/complete - keep the uploaded poster if its bytes are a JPEG or PNG
import { getClipForInspector, setClipPoster, toClipView } from "@/db/queries/clips";
import { route } from "@/lib/api/route";
import { AppError, notFound } from "@/lib/errors";
import { deleteObject, signedMediaUrl } from "@/lib/storage/multipart";
import { checkStoredImage } from "@/lib/uploads/verify";
import { clipIdParams, MAX_IMAGE_BYTES, posterCompleteSchema } from "@/lib/validations/clips";

export const POST = route({ permission: "jobs:work", params: clipIdParams, body: posterCompleteSchema }, async ({ user, params, body }) => {
  const found = await getClipForInspector(params.clipId, user.id);
  if (!found) throw notFound("That clip");
  const { clip } = found;
  if (!body.key.startsWith(`posters/${clip.id}/`) || body.key.includes("..")) throw new AppError("not_found", "That upload was not found.");
  if (clip.status !== "ready") throw new AppError("conflict", "Add the poster once the clip has finished uploading.");
  const check = await checkStoredImage(body.key, MAX_IMAGE_BYTES);
  if (!check.ok) {
    if (!check.gone) await deleteObject(body.key);
    throw new AppError("unprocessable", check.reason);
  }
  const previous = clip.posterKey;
  const row = (await setClipPoster(clip.id, body.key)) ?? clip;
  if (previous && previous !== body.key) await deleteObject(previous).catch(() => undefined);
  return { clip: toClipView(row, await signedMediaUrl(row.posterKey)) };
});
