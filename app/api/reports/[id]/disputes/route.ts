// POST /api/reports/{id}/disputes - the buyer or agent of a delivered report disputes it
import { z } from "zod";

import { openDispute } from "@/db/queries/disputes";
import { getReportView } from "@/db/queries/reports";
import { json, route } from "@/lib/api/route";
import { notFound } from "@/lib/errors";
import { idParams } from "@/lib/validations/orders";

const body = z.object({
  reason: z.enum(["missing_footage", "wrong_address", "unreadable_clips", "other"], { message: "Choose what is wrong." }),
  message: z.string().trim().min(10, "Say in a sentence or two what is wrong.").max(3000),
});

export const POST = route({ permission: "reports:read", params: idParams, body }, async ({ user, params, body }) => {
  if (user.role === "admin") throw notFound("That report");
  const view = await getReportView(params.id, user);
  if (!view) throw notFound("That report");
  const dispute = await openDispute(user, params.id, body);
  return json({ id: dispute.id, status: dispute.status }, 201);
});
