// DELETE /api/reports/{id}/share/{shareId} - revoke a share link at once
import { z } from "zod";

import { revokeShareLink } from "@/db/queries/share-links";
import { route } from "@/lib/api/route";
import { notFound } from "@/lib/errors";

export const DELETE = route({ permission: "reports:pay", params: z.object({ id: z.uuid(), shareId: z.uuid() }) }, async ({ user, params }) => {
  if (!(await revokeShareLink(params.id, user.id, params.shareId))) throw notFound("That share link");
  return { ok: true };
});
