// GET /api/jobs/{id} - a job on the inspector's board or held by them
import { getJobDetailForInspector } from "@/db/queries/order-detail";
import { route } from "@/lib/api/route";
import { notFound } from "@/lib/errors";
import { idParams } from "@/lib/validations/orders";

export const GET = route({ permission: "jobs:list", params: idParams }, async ({ user, params }) => {
  const detail = await getJobDetailForInspector(params.id, user.id);
  if (!detail) throw notFound("That job");
  return detail;
});
