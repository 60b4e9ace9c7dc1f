// POST /api/reports/{id}/disputes - the buyer or agent of a delivered report disputes it
import { recordAudit } from "@/db/queries/audit";
import { disputeDto, openDispute } from "@/db/queries/disputes";
import { canSeeReport } from "@/db/queries/reports";
import { json, route } from "@/lib/api/route";
import { clientAddress } from "@/lib/auth/options";
import { notFound } from "@/lib/errors";
import { openDisputeSchema } from "@/lib/validations/disputes";
import { idParams } from "@/lib/validations/orders";

export const POST = route(
  { permission: "reports:read", params: idParams, body: openDisputeSchema },
  async ({ user, params, body, req }) => {
    if (user.role === "admin" || !(await canSeeReport(params.id, user))) throw notFound("That report");
    const dispute = await openDispute(user, params.id, body);
    await recordAudit({
      actorId: user.id,
      action: "disputes.opened",
      targetType: "dispute",
      targetId: dispute.id,
      ip: clientAddress(Object.fromEntries(req.headers)),
      data: { orderId: params.id, reason: body.reason },
    });
    return json(disputeDto(dispute), 201);
  },
);
