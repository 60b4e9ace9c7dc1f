// POST /api/orders/reuse - order the listing's fresh existing report for the next buyer instead of a new visit
import { getOrderDetailForAgent } from "@/db/queries/order-detail";
import { createReuseOrder } from "@/db/queries/reuse";
import { json, route } from "@/lib/api/route";
import { reuseOrderSchema } from "@/lib/validations/orders";

export const POST = route({ permission: "orders:create", body: reuseOrderSchema }, async ({ user, body }) => {
  const order = await createReuseOrder(user, body);
  return json((await getOrderDetailForAgent(order.id, user.id))!.order, 201);
});
