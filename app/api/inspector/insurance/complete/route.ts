// POST /api/inspector/insurance/complete - check the uploaded certificate by its bytes and keep it
import { z } from "zod";

import { recordAudit } from "@/db/queries/audit";
import { setInsuranceDocument } from "@/db/queries/inspectors";
import { route } from "@/lib/api/route";
import { AppError } from "@/lib/errors";
import { objectSize, removeObject } from "@/lib/storage/client";
import { sniffObject } from "@/lib/storage/sniff";

const MAX_BYTES = 10 * 1024 * 1024;
const ACCEPTED = new Set(["application/pdf", "image/png", "image/jpeg"]);

const body = z.object({ key: z.string().max(300), fileName: z.string().trim().min(1).max(200) });

export const POST = route({ permission: "profile:edit", body }, async ({ user, body }) => {
  if (!body.key.startsWith(`insurance/${user.id}/`)) throw new AppError("not_found", "That upload was not found.");
  const size = await objectSize(body.key);
  if (size === null) throw new AppError("unprocessable", "The file did not arrive. Upload it again.");
  const type = size > 0 && size <= MAX_BYTES ? await sniffObject(body.key) : null;
  if (!type || !ACCEPTED.has(type.mime)) {
    await removeObject(body.key);
    const reason = size === 0 ? "The file is empty." : size > MAX_BYTES ? "The file is over 10 MB." : "That file is not a PDF, PNG or JPEG, whatever its name says.";
    throw new AppError("unprocessable", reason);
  }
  await setInsuranceDocument(user.id, body.key, body.fileName.replace(/[\u0000-\u001f/\\]/g, "_"));
  await recordAudit({ actorId: user.id, action: "inspector.insurance_uploaded", targetType: "user", targetId: user.id, data: { type: type.mime, size } });
  return { insurance: { fileName: body.fileName } };
});
