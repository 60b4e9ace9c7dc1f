// POST /api/webhooks/stripe - the payment provider's signed events; the only thing that unlocks a report
import { NextResponse, type NextRequest } from "next/server";

import { recordAudit } from "@/db/queries/audit";
import { clientAddress } from "@/lib/auth/options";
import { PaymentNotRecordedYet } from "@/lib/payments/events/checkout-completed";
import { handleStripeEvent } from "@/lib/payments/webhook";
import { verifyWebhook } from "@/lib/payments/stripe";

export async function POST(req: NextRequest) {
  const raw = await req.text();
  let event;
  try {
    event = verifyWebhook(raw, req.headers.get("stripe-signature"));
  } catch (error) {
    await recordAudit({ action: "security.webhook_signature_rejected", ip: clientAddress(Object.fromEntries(req.headers)), data: { reason: error instanceof Error ? error.message.slice(0, 200) : "unknown" } });
    return NextResponse.json({ error: { code: "bad_request", message: "Invalid signature." } }, { status: 400 });
  }
  try {
    const { outcome } = await handleStripeEvent(event);
    return NextResponse.json({ received: true, outcome });
  } catch (error) {
    if (error instanceof PaymentNotRecordedYet) {
      console.warn(`[webhook] ${error.message} Asking the provider to send it again.`);
      return NextResponse.json({ error: { code: "unavailable", message: "Not ready for this event yet; send it again." } }, { status: 503, headers: { "Retry-After": "30" } });
    }
    console.error("[webhook] handling failed; the provider will retry", error);
    return NextResponse.json({ error: { code: "internal", message: "Try again." } }, { status: 500 });
  }
}
