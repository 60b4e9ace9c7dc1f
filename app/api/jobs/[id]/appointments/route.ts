// POST /api/jobs/{id}/appointments - the assigned inspector proposes visit times
import { proposeTimes } from "@/db/queries/job-commands";
import { route } from "@/lib/api/route";
import { idParams, proposeSchema } from "@/lib/validations/orders";

export const POST = route({ permission: "jobs:work", params: idParams, body: proposeSchema }, async ({ user, params, body }) => {
  const rows = await proposeTimes(user, params.id, body.slots);
  return { proposals: rows.map((p) => ({ id: p.id, start: p.start.toISOString(), end: p.end.toISOString(), status: p.status })) };
});
