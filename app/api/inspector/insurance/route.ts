// POST /api/inspector/insurance - a presigned upload URL for the insurance certificate
import { route } from "@/lib/api/route";
import { signedUploadUrl } from "@/lib/storage/client";
import { objectKey } from "@/lib/storage/keys";
import { insuranceUploadSchema } from "@/lib/validations/orders";

const EXT = { "application/pdf": "pdf", "image/png": "png", "image/jpeg": "jpg" } as const;

export const POST = route({ permission: "profile:edit", body: insuranceUploadSchema }, async ({ user, body }) => {
  const key = objectKey("insurance", user.id, EXT[body.contentType]);
  return { key, uploadUrl: await signedUploadUrl(key, body.contentType, 600) };
});
