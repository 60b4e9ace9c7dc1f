// POST /api/admin/disputes/{id}/messages - write to the inspector or the person who disputed, by e-mail
import { z } from "zod";

import { recordAudit } from "@/db/queries/audit";
import { messageAboutDispute } from "@/db/queries/disputes";
import { json, route } from "@/lib/api/route";

const body = z.object({ to: z.enum(["inspector", "opener"]), body: z.string().trim().min(5, "Write the message.").max(5000) });

export const POST = route({ permission: "admin:manage", hide: true, params: z.object({ id: z.uuid() }), body }, async ({ user, params, body }) => {
  const m = await messageAboutDispute(user, params.id, body);
  await recordAudit({ actorId: user.id, action: "disputes.message", targetType: "dispute", targetId: params.id, data: { to: body.to } });
  return json({ id: m.id }, 201);
});
