// POST /api/orders/{id}/cancel - the agent cancels before the visit, with a reason
import { cancelOrder } from "@/db/queries/job-commands";
import { getOrderDetailForAgent } from "@/db/queries/order-detail";
import { route } from "@/lib/api/route";
import { idParams, reasonSchema } from "@/lib/validations/orders";

export const POST = route({ permission: "orders:cancel", params: idParams, body: reasonSchema }, async ({ user, params, body }) => {
  await cancelOrder(user, params.id, body.reason);
  return getOrderDetailForAgent(params.id, user.id);
});
