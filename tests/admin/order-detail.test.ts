import { randomUUID } from "node:crypto";

import { describe, expect, it } from "vitest";

import { POST as closeDispute } from "@/app/api/admin/disputes/[id]/close/route";
import { POST as refund } from "@/app/api/admin/payments/[id]/refund/route";
import { POST as openDispute } from "@/app/api/reports/[id]/disputes/route";
import { getAdminOrder } from "@/db/queries/admin-order";
import { latestDisputeBy } from "@/db/queries/disputes";
import { sendWaitingPayouts } from "@/lib/payments/payouts";

import { connectPayouts, unlockedReport } from "../utils/payments";
import { call } from "../utils/session";
import { signedIn } from "../utils/world";

describe("the admin's order detail", () => {
  it("gathers one order's payment, partial refund, payout, ledger, dispute and audit entries, and nothing of another order", async () => {
    const r = await unlockedReport();
    const other = await unlockedReport();
    await connectPayouts(r.inspector.cookie);
    await sendWaitingPayouts(r.inspector.user.id);
    const admin = await signedIn("admin");
    const before = await getAdminOrder(r.id);
    const paymentId = before!.payments[0].id;

    const refunded = await call(refund, {
      method: "POST",
      params: { id: paymentId },
      body: { amountCents: 10000, reason: "Clip 2 was unreadable", requestId: randomUUID() },
      cookie: admin.cookie,
    });
    expect(refunded.status).toBe(200);
    const opened = await call(openDispute, {
      method: "POST",
      params: { id: r.id },
      body: { reason: "missing_footage", message: "The last ten feet to the main were never filmed." },
      cookie: r.buyer.cookie,
    });
    expect(opened.status).toBe(201);
    expect(opened.json).toEqual({
      id: expect.any(String),
      status: "open",
      reason: "missing_footage",
      createdAt: expect.any(String),
      outcome: null,
      outcomeNote: null,
      closedAt: null,
    });
    expect(await latestDisputeBy(r.id, r.buyer.user.id)).toEqual(opened.json);
    expect(await latestDisputeBy(r.id, r.agent.user.id)).toBeNull();
    const elsewhere = await call(openDispute, {
      method: "POST",
      params: { id: other.id },
      body: { reason: "other", message: "A dispute on a different order entirely." },
      cookie: other.buyer.cookie,
    });
    expect(elsewhere.status).toBe(201);
    const closed = await call(closeDispute, {
      method: "POST",
      params: { id: opened.json.id as string },
      body: { outcome: "no_action", note: "The main was reached; clip 3 shows it." },
      cookie: admin.cookie,
    });
    expect(closed.status).toBe(200);

    const o = (await getAdminOrder(r.id))!;
    expect(o.order).toMatchObject({ id: r.id, status: "unlocked" });
    expect(o.agent.email).toBe(r.agent.user.email);
    expect(o.payments).toHaveLength(1);
    expect(o.payments[0]).toMatchObject({
      amountCents: 32500,
      refundedCents: 10000,
      status: "partially_refunded",
      payout: { amountCents: 26000, reversedCents: 8000, status: "partially_reversed", transferId: expect.any(String) },
      refunds: [{ amountCents: 10000, reason: "Clip 2 was unreadable", by: admin.user.name }],
    });
    expect(o.ledger.map((l) => l.kind).sort()).toEqual(["charge", "fee", "fee", "refund", "reversal", "transfer"]);
    expect(o.ledger.reduce((s, l) => s + (l.kind === "charge" ? l.amountCents : 0), 0)).toBe(32500);
    expect(o.balance).toMatchObject({ balanced: true, moneyIn: 32500, refund: 10000, reversal: 8000, transfer: 26000 });
    expect(o.disputes).toEqual([
      expect.objectContaining({
        status: "closed",
        outcome: "no_action",
        outcomeNote: "The main was reached; clip 3 shows it.",
        opener: { name: r.buyer.user.name, email: r.buyer.user.email },
      }),
    ]);
    expect(o.audit.map((a) => a.action).sort()).toEqual(["disputes.closed", "disputes.opened", "payments.refund"]);
    expect(o.audit.every((a) => a.target?.id !== elsewhere.json.id)).toBe(true);
    expect(o.events.map((e) => e.to)).toContain("unlocked");
  });

  it("is null for an order that does not exist", async () => {
    expect(await getAdminOrder(randomUUID())).toBeNull();
  });
});
