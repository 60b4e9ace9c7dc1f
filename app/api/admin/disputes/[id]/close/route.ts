// POST /api/admin/disputes/{id}/close - close with an outcome; "refund" refunds the report's payment in full
import { and, eq, inArray } from "drizzle-orm";
import { z } from "zod";

import { getDb } from "@/db/client";
import { recordAudit } from "@/db/queries/audit";
import { closeDispute } from "@/db/queries/disputes";
import { payments } from "@/db/schema";
import { route } from "@/lib/api/route";
import { clientAddress } from "@/lib/auth/options";
import { refundPayment } from "@/lib/payments/refunds";

const body = z.object({ outcome: z.enum(["no_action", "redeliver", "refund"]), note: z.string().trim().min(3, "Say what was decided and why.").max(2000) });

export const POST = route({ permission: "admin:manage", hide: true, params: z.object({ id: z.uuid() }), body }, async ({ user, params, body, req }) => {
  const ip = clientAddress(Object.fromEntries(req.headers));
  const orderId = await closeDispute(user, params.id, body);
  let refunded: { refundId: string; amountCents: number } | null = null;
  if (body.outcome === "refund") {
    const db = await getDb();
    const [payment] = await db.select().from(payments).where(and(eq(payments.orderId, orderId), inArray(payments.status, ["paid", "partially_refunded"]))).limit(1);
    if (payment) refunded = await refundPayment(user, { paymentId: payment.id, reason: `Dispute: ${body.note}`, reverseTransfer: true, requestId: params.id }, ip);
  }
  await recordAudit({ actorId: user.id, action: "disputes.closed", targetType: "dispute", targetId: params.id, ip, data: { outcome: body.outcome, refunded } });
  return { ok: true, refunded };
});
