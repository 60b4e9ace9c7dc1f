import "server-only";

import { enqueueMail } from "@/db/queries/outbox";
import { listWaitingPayouts, markPayoutSent } from "@/db/queries/payouts";
import { renderMail } from "@/lib/mail/render";
import { formatMoney } from "@/lib/money";

import { getStripe } from "./stripe";

/**
 * Sends every waiting payout whose inspector has a payout account that can receive it. The
 * idempotency key is tied to the payment, so a retry or a second worker never pays twice.
 */
export async function sendWaitingPayouts(inspectorId?: string): Promise<{ sent: number; waiting: number }> {
  const stripe = getStripe();
  let sent = 0;
  let waiting = 0;
  for (const row of await listWaitingPayouts(inspectorId)) {
    const amount = row.payout.amountCents - row.payout.reversedCents;
    if (!row.accountId) {
      waiting++;
      await enqueueMail({
        key: `payout:${row.payout.id}:connect-reminder`,
        to: row.email,
        subject: `${formatMoney(amount)} is waiting for you on Gradeline`,
        ...renderMail({
          heading: "Connect a payout account to get paid",
          paragraphs: [`A buyer unlocked one of your reports. Your share of ${formatMoney(amount)} is waiting until you connect a payout account.`],
          action: { label: "Set up payouts", path: "/earnings" },
        }),
      });
      continue;
    }
    try {
      const account = await stripe.accounts.retrieve(row.accountId);
      if (!account.payouts_enabled) {
        waiting++;
        continue;
      }
      const transfer = await stripe.transfers.create(
        {
          amount,
          currency: row.payment.currency,
          destination: row.accountId,
          transfer_group: `order_${row.payment.orderId}`,
          ...(row.payment.chargeId ? { source_transaction: row.payment.chargeId } : {}),
          metadata: { paymentId: row.payment.id, payoutId: row.payout.id },
        },
        { idempotencyKey: `payout-${row.payment.id}` },
      );
      await markPayoutSent(row.payout.id, transfer.id);
      await enqueueMail({
        key: `payout:${row.payout.id}:sent`,
        to: row.email,
        subject: `Payout sent: ${formatMoney(amount)}`,
        ...renderMail({ heading: "Your payout is on its way", paragraphs: [`We sent ${formatMoney(amount)} to your payout account.`], action: { label: "See your earnings", path: "/earnings" } }),
      });
      sent++;
    } catch (error) {
      waiting++;
      console.error("[payouts] transfer failed; will retry", row.payout.id, error instanceof Error ? error.message : error);
    }
  }
  return { sent, waiting };
}

export function startPayoutWorker(intervalMs = 30_000): () => void {
  const timer = setInterval(() => void sendWaitingPayouts().catch((e) => console.error("[payouts] run failed", e)), intervalMs);
  timer.unref();
  return () => clearInterval(timer);
}
