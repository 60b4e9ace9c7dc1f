// POST /api/jobs/{id}/release - the assigned inspector gives the job back before the visit
import { releaseJob } from "@/db/queries/job-commands";
import { route } from "@/lib/api/route";
import { idParams, reasonSchema } from "@/lib/validations/orders";

export const POST = route({ permission: "jobs:work", params: idParams, body: reasonSchema }, async ({ user, params, body }) => {
  await releaseJob(user, params.id, body.reason);
  return { ok: true };
});
