import { randomUUID } from "node:crypto";

import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { POST as refund } from "@/app/api/admin/payments/[id]/refund/route";
import { GET as listPayouts } from "@/app/api/payouts/route";
import { GET as getReport } from "@/app/api/reports/[id]/route";
import { getDb } from "@/db/client";
import { ledgerBalance } from "@/db/queries/payouts";
import { mailOutbox, orders, payments, payouts } from "@/db/schema";
import { reversalShare } from "@/lib/payments/refunds";
import { sendWaitingPayouts } from "@/lib/payments/payouts";

import { connectPayouts, deliver, standinEvents, unlockedReport } from "../utils/payments";
import { call } from "../utils/session";
import { signedIn } from "../utils/world";

async function paymentOf(orderId: string) {
  const db = await getDb();
  const [p] = await db.select().from(payments).where(eq(payments.orderId, orderId));
  const [po] = await db.select().from(payouts).where(eq(payouts.paymentId, p.id));
  return { payment: p, payout: po };
}

async function transfersTo(account: string) {
  const events = await standinEvents("transfer.created");
  return events.filter((e) => (e.data.object as { destination: string }).destination === account);
}

describe("inspector payouts", () => {
  it("waits (with a reminder) until the inspector connects an account, then pays exactly once whatever is retried", async () => {
    const r = await unlockedReport();
    await sendWaitingPayouts(r.inspector.user.id);
    expect((await paymentOf(r.id)).payout.status).toBe("waiting");
    const db = await getDb();
    const reminders = (await db.select().from(mailOutbox).where(eq(mailOutbox.toAddress, r.inspector.user.email))).filter((m) => m.subject.includes("is waiting"));
    expect(reminders).toHaveLength(1);

    const account = await connectPayouts(r.inspector.cookie);
    await Promise.all([sendWaitingPayouts(r.inspector.user.id), sendWaitingPayouts(r.inspector.user.id), sendWaitingPayouts()]);
    await sendWaitingPayouts();
    const { payout } = await paymentOf(r.id);
    expect(payout.status).toBe("sent");
    expect(await transfersTo(account)).toHaveLength(1);
    expect((await transfersTo(account))[0].data.object).toMatchObject({ amount: 26000 });
    const balance = await ledgerBalance(r.id);
    expect(balance).toMatchObject({ moneyIn: 32500, transfer: 26000, fee: 6500, balanced: true });

    const mine = await call(listPayouts, { cookie: r.inspector.cookie });
    expect(mine.json.payouts).toEqual([expect.objectContaining({ priceCents: 32500, feeCents: 6500, payoutCents: 26000, status: "sent" })]);
  });
});

describe("refunds", () => {
  it("a partial refund moves the right amounts and keeps the report open; a full one locks it again", async () => {
    const r = await unlockedReport();
    await connectPayouts(r.inspector.cookie);
    await sendWaitingPayouts(r.inspector.user.id);
    const admin = await signedIn("admin");
    const { payment } = await paymentOf(r.id);

    const part = await call(refund, { method: "POST", params: { id: payment.id }, body: { amountCents: 10000, reason: "Clip 2 was unreadable", requestId: randomUUID() }, cookie: admin.cookie });
    expect(part.status).toBe(200);
    expect(part.json).toMatchObject({ amountCents: 10000, reversalCents: 8000 });
    expect((await call(getReport, { params: { id: r.id }, cookie: r.buyer.cookie })).json.locked).toBe(false);
    expect(await ledgerBalance(r.id)).toMatchObject({ balanced: true, refund: 10000, reversal: 8000 });

    const rest = await call(refund, { method: "POST", params: { id: payment.id }, body: { reason: "Wrong address", requestId: randomUUID() }, cookie: admin.cookie });
    expect(rest.json).toMatchObject({ amountCents: 22500, reversalCents: 18000 });
    expect((await call(getReport, { params: { id: r.id }, cookie: r.buyer.cookie })).json.locked).toBe(true);
    const db = await getDb();
    const [order] = await db.select().from(orders).where(eq(orders.id, r.id));
    expect(order.status).toBe("refunded");
    expect((await paymentOf(r.id)).payout).toMatchObject({ status: "reversed", reversedCents: 26000 });
    expect(await ledgerBalance(r.id)).toMatchObject({ balanced: true, refund: 32500, reversal: 26000, fee: 0 });

    const over = await call(refund, { method: "POST", params: { id: payment.id }, body: { amountCents: 1, reason: "again", requestId: randomUUID() }, cookie: admin.cookie });
    expect(over.status).toBe(409);
  });

  it("the provider's refund webhook is booked once; an admin request retried with the same id refunds once", async () => {
    const r = await unlockedReport();
    const admin = await signedIn("admin");
    const { payment } = await paymentOf(r.id);
    const requestId = randomUUID();
    const body = { amountCents: 5000, reason: "Goodwill", requestId, reverseTransfer: false, noReversalReason: "Inspector not at fault" };
    const [a, b] = [await call(refund, { method: "POST", params: { id: payment.id }, body, cookie: admin.cookie }), await call(refund, { method: "POST", params: { id: payment.id }, body, cookie: admin.cookie })];
    expect(a.json.refundId).toBe(b.json.refundId);
    const events = (await standinEvents("refund.created")).filter((e) => (e.data.object as { id: string }).id === a.json.refundId);
    for (const e of [...events, ...events]) expect((await deliver(e)).status).toBe(200);
    const after = await paymentOf(r.id);
    expect(after.payment.refundedCents).toBe(5000);
    expect(after.payout.reversedCents).toBe(0);
    expect(await ledgerBalance(r.id)).toMatchObject({ balanced: true, refund: 5000, fee: 1500 });
  });

  it("is refused without a reason for not reversing, over the remaining amount, and to non-admins (404)", async () => {
    const r = await unlockedReport();
    const admin = await signedIn("admin");
    const { payment } = await paymentOf(r.id);
    expect((await call(refund, { method: "POST", params: { id: payment.id }, body: { reason: "x y z", reverseTransfer: false, requestId: randomUUID() }, cookie: admin.cookie })).status).toBe(400);
    expect((await call(refund, { method: "POST", params: { id: payment.id }, body: { amountCents: 99999, reason: "too much", requestId: randomUUID() }, cookie: admin.cookie })).status).toBe(400);
    expect((await call(refund, { method: "POST", params: { id: payment.id }, body: { reason: "nope", requestId: randomUUID() }, cookie: r.buyer.cookie })).status).toBe(404);
    expect((await paymentOf(r.id)).payment.refundedCents).toBe(0);
  });
});

describe("the ledger", () => {
  it("balances for every order and overall across generated orders, refunds and retried events (money in = transfers + fees + refunds + owed)", async () => {
    const admin = await signedIn("admin");
    const plans = [
      { connect: true, refunds: [] as number[] },
      { connect: true, refunds: [3333] },
      { connect: false, refunds: [777, 1001] },
      { connect: true, refunds: [32500] },
      { connect: false, refunds: [] },
      { connect: true, refunds: [1, 2, 3] },
    ];
    const made: { id: string; plan: (typeof plans)[number]; account: string | null }[] = [];
    for (const plan of plans) {
      const r = await unlockedReport();
      await deliver(r.event);
      made.push({ id: r.id, plan, account: plan.connect ? await connectPayouts(r.inspector.cookie) : null });
      await sendWaitingPayouts();
      const { payment } = await paymentOf(r.id);
      for (const amount of plan.refunds) {
        const res = await call(refund, { method: "POST", params: { id: payment.id }, body: { amountCents: amount, reason: "generated", requestId: randomUUID() }, cookie: admin.cookie });
        expect(res.status).toBe(200);
        const ev = (await standinEvents("refund.created")).find((e) => (e.data.object as { id: string }).id === res.json.refundId)!;
        await deliver(ev);
      }
      await sendWaitingPayouts();
    }
    for (const { id, plan, account } of made) {
      const refunded = plan.refunds.reduce((a, b) => a + b, 0);
      const { payment, payout } = await paymentOf(id);
      const balance = await ledgerBalance(id);
      // The completed event was delivered twice and each refund event once more after the admin's call: booked once each.
      expect(balance, id).toMatchObject({ balanced: true, moneyIn: 32500 });
      expect(balance.refund ?? 0).toBe(refunded);
      expect(payment.refundedCents).toBe(refunded);
      expect(payout.reversedCents).toBe(Math.round((26000 * refunded) / 32500));
      if (account) {
        const transfers = await transfersTo(account);
        expect(transfers, id).toHaveLength(1);
        expect((transfers[0].data.object as { amount: number }).amount).toBe(balance.transfer);
        expect(balance.owed).toBe(0);
      } else {
        expect(payout.status).toBe("waiting");
        expect(balance.owed).toBe(payout.amountCents - payout.reversedCents);
        expect(balance.transfer).toBeUndefined();
      }
    }
    expect((await ledgerBalance()).balanced).toBe(true);
  });

  it("splits each refund between the inspector and the fee so several refunds sum exactly", () => {
    let reversed = 0;
    let refunded = 0;
    for (const part of [1, 2, 3, 777, 9999]) {
      const v = reversalShare({ payoutCents: 26000, chargeCents: 32500, refundedBefore: refunded, refundCents: part, reversedBefore: reversed });
      reversed += v;
      refunded += part;
    }
    expect(reversed).toBe(Math.round((26000 * refunded) / 32500));
  });
});
