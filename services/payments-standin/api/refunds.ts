import { ApiError, invalid, noSuch } from "../core/errors";
import { expand } from "../core/expand";
import { newId } from "../core/ids";
import { formatAmount } from "../core/money";
import type { Charge, Refund } from "../types";
import type { ApiHandler, ApiRoute } from "./types";

function chargeToRefund(ctx: Parameters<ApiHandler>[0], chargeId?: string, intentId?: string): Charge {
  const state = ctx.store.state;
  if (!chargeId && !intentId) {
    throw invalid("One of the following params should be provided for this request: payment_intent or charge.");
  }
  if (intentId) {
    const intent = state.payment_intents[intentId];
    if (!intent) throw noSuch("payment_intent", intentId, "payment_intent");
    const charge = intent.latest_charge ? state.charges[intent.latest_charge] : undefined;
    if (intent.status !== "succeeded" || !charge) {
      throw invalid(`This PaymentIntent (${intentId}) does not have a successful charge to refund.`, "payment_intent");
    }
    if (chargeId && chargeId !== charge.id) throw invalid(`Charge ${chargeId} does not belong to PaymentIntent ${intentId}.`, "charge");
    return charge;
  }
  const charge = state.charges[chargeId as string];
  if (!charge) throw noSuch("charge", chargeId as string, "charge");
  return charge;
}

const create: ApiHandler = (ctx, { params: p, source, expand: paths }) => {
  p.allowOnly(["amount", "charge", "expand", "metadata", "payment_intent", "reason"]);
  const charge = chargeToRefund(ctx, p.string("charge"), p.string("payment_intent"));
  const reason = p.oneOf("reason", ["duplicate", "fraudulent", "requested_by_customer"] as const) ?? null;
  const metadata = p.metadata();
  const remaining = charge.amount - charge.amount_refunded;
  if (remaining === 0) {
    throw new ApiError(400, "invalid_request_error", `Charge ${charge.id} has already been refunded.`, "charge_already_refunded");
  }
  const amount = p.integer("amount", { min: 1 }) ?? remaining;
  if (amount > remaining) {
    throw invalid(
      `Refund amount (${formatAmount(amount, charge.currency)}) is greater than unrefunded amount on charge (${formatAmount(remaining, charge.currency)})`,
      "amount",
      "amount_too_large",
    );
  }
  const refund: Refund = {
    id: newId("re"),
    object: "refund",
    amount,
    charge: charge.id,
    created: ctx.store.now(),
    currency: charge.currency,
    metadata,
    payment_intent: charge.payment_intent,
    reason,
    status: "succeeded",
  };
  const previous = { amount_refunded: charge.amount_refunded, refunded: charge.refunded };
  charge.amount_refunded += amount;
  charge.refunded = charge.amount_refunded === charge.amount;
  ctx.store.state.refunds[refund.id] = refund;
  ctx.events.emit("charge.refunded", charge, source, previous);
  ctx.events.emit("refund.created", refund, source);
  return expand(ctx.store.state, refund, paths);
};

const retrieve: ApiHandler = (ctx, { params, path, expand: paths }) => {
  params.allowOnly(["expand"]);
  const refund = ctx.store.state.refunds[path.id as string];
  if (!refund) throw noSuch("refund", path.id as string);
  return expand(ctx.store.state, refund, paths);
};

export const refundRoutes: ApiRoute[] = [
  { method: "POST", pattern: "/v1/refunds", handler: create },
  { method: "GET", pattern: "/v1/refunds/:id", handler: retrieve },
];
