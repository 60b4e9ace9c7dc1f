// POST /api/admin/payments/{id}/refund - a full or partial refund with a reason (admin only)
import { z } from "zod";

import { route } from "@/lib/api/route";
import { clientAddress } from "@/lib/auth/options";
import { refundPayment } from "@/lib/payments/refunds";

const body = z.object({
  amountCents: z.number().int().positive().optional(),
  reason: z.string().trim().min(3, "Give the reason for the refund.").max(500),
  reverseTransfer: z.boolean().default(true),
  noReversalReason: z.string().trim().max(500).optional(),
  requestId: z.uuid(),
});

export const POST = route({ permission: "admin:manage", hide: true, params: z.object({ id: z.uuid() }), body }, async ({ user, params, body, req }) =>
  refundPayment(user, { ...body, paymentId: params.id }, clientAddress(Object.fromEntries(req.headers))),
);
