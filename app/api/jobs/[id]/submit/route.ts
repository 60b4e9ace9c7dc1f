// POST /api/jobs/{id}/submit - check the record, run the engine, deliver, invite the buyer
import { submitInspection } from "@/db/queries/submit";
import { requireWorkableJob } from "@/lib/api/assigned-job";
import { route } from "@/lib/api/route";
import { submitSchema } from "@/lib/validations/inspection";
import { idParams } from "@/lib/validations/orders";

export const POST = route({ permission: "jobs:work", params: idParams, body: submitSchema }, async ({ user, params, body }) => {
  await requireWorkableJob(params.id, user.id);
  const order = await submitInspection(user, params.id, body.baseRevision);
  return { order: { id: order.id, status: order.status, deliveredAt: order.deliveredAt?.toISOString() ?? null } };
});
