// POST /api/jobs/{id}/accept - first verified inspector to accept gets the job; 409 for the others
import { acceptJob } from "@/db/queries/job-commands";
import { getJobDetailForInspector } from "@/db/queries/order-detail";
import { route } from "@/lib/api/route";
import { idParams } from "@/lib/validations/orders";

export const POST = route({ permission: "jobs:accept", params: idParams }, async ({ user, params }) => {
  await acceptJob(user, params.id);
  const detail = await getJobDetailForInspector(params.id, user.id);
  return { job: detail!.job };
});
