// POST /api/orders/{id}/appointment - the agent confirms one of the proposed times
import { confirmAppointment } from "@/db/queries/job-commands";
import { getOrderDetailForAgent } from "@/db/queries/order-detail";
import { route } from "@/lib/api/route";
import { confirmAppointmentSchema, idParams } from "@/lib/validations/orders";

export const POST = route({ permission: "orders:confirm", params: idParams, body: confirmAppointmentSchema }, async ({ user, params, body }) => {
  await confirmAppointment(user, params.id, body.proposalId);
  return getOrderDetailForAgent(params.id, user.id);
});
