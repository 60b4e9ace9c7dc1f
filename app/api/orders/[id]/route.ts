// GET /api/orders/{id} - the agent who ordered, the assigned inspector or an admin; 404 for anyone else
import { getJobDetailForInspector, getOrderDetailForAdmin, getOrderDetailForAgent } from "@/db/queries/order-detail";
import { route } from "@/lib/api/route";
import { notFound } from "@/lib/errors";
import { idParams } from "@/lib/validations/orders";

export const GET = route({ permission: "orders:read", params: idParams }, async ({ user, params }) => {
  if (user.role === "inspector") {
    const job = await getJobDetailForInspector(params.id, user.id);
    if (!job || job.job.inspector?.id !== user.id) throw notFound("That order");
    return job;
  }
  const detail = user.role === "admin" ? await getOrderDetailForAdmin(params.id) : await getOrderDetailForAgent(params.id, user.id);
  if (!detail) throw notFound("That order");
  return detail;
});
