import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { POST as savePrices } from "@/app/api/admin/prices/route";
import { POST as quote } from "@/app/api/orders/quote/route";
import { POST as reuse } from "@/app/api/orders/reuse/route";
import { POST as checkout } from "@/app/api/reports/[id]/checkout/route";
import { GET as getReport } from "@/app/api/reports/[id]/route";
import { getDb } from "@/db/client";
import { listings, orders, payments, payouts } from "@/db/schema";
import { DEFAULT_PRICES } from "@/lib/pricing-defaults";

import { deliver, standinEvents, SUCCESS_CARD } from "../utils/payments";
import { call } from "../utils/session";
import { deliveredReport, signedIn } from "../utils/world";

describe("report reuse", () => {
  it("offers a listing's fresh report to the next agent, sells it at the reuse price, and pays the inspector's share", async () => {
    const first = await deliveredReport();
    const db = await getDb();
    const [{ listing }] = await db.select({ listing: listings }).from(orders).innerJoin(listings, eq(listings.id, orders.listingId)).where(eq(orders.id, first.id));
    const agent = await signedIn("agent");
    const offer = await call(quote, {
      method: "POST",
      body: { address: { street: listing.street }, postalCode: listing.postalCode, cleanoutKnown: true, buildingSewers: 1, deadline: new Date(Date.now() + 5 * 86_400_000).toISOString() },
      cookie: agent.cookie,
    });
    expect(offer.json.reuse).toMatchObject({ orderId: first.id, priceCents: 14500 });

    const nextBuyer = await signedIn("buyer");
    const created = await call(reuse, { method: "POST", body: { sourceOrderId: first.id, buyer: { name: nextBuyer.user.name, email: nextBuyer.user.email } }, cookie: agent.cookie });
    expect(created.status).toBe(201);
    expect(created.json).toMatchObject({ status: "delivered", priceCents: 14500 });
    const id = created.json.id as string;

    const locked = await call(getReport, { params: { id }, cookie: nextBuyer.cookie });
    expect(locked.json).toMatchObject({ locked: true, priceCents: 14500 });
    const started = await call(checkout, { method: "POST", params: { id }, cookie: nextBuyer.cookie });
    const url = started.json.url as string;
    await fetch(url, { method: "POST", body: new URLSearchParams({ action: "pay", ...SUCCESS_CARD }), redirect: "manual" });
    const sessionId = url.split("/pay/")[1];
    const event = (await standinEvents("checkout.session.completed")).find((e) => (e.data.object as { id: string }).id === sessionId)!;
    expect((await deliver(event)).json.outcome).toBe("unlocked");

    const view = await call(getReport, { params: { id }, cookie: nextBuyer.cookie });
    expect(view.json.locked).toBe(false);
    expect(view.json).toHaveProperty("evaluation.severity");
    expect(JSON.stringify(view.json)).not.toContain(first.buyer.user.email);
    expect(JSON.stringify(view.json)).not.toContain(first.buyer.user.name);
    const [payment] = await db.select().from(payments).where(eq(payments.orderId, id));
    const [payout] = await db.select().from(payouts).where(eq(payouts.paymentId, payment.id));
    expect(payout).toMatchObject({ inspectorId: first.inspector.user.id, amountCents: 7250 });
    expect((await call(getReport, { params: { id: first.id }, cookie: nextBuyer.cookie })).status).toBe(404);
  });

  it("refuses a report that is no longer fresh", async () => {
    const first = await deliveredReport();
    const db = await getDb();
    await db.update(orders).set({ deliveredAt: new Date(Date.now() - 200 * 86_400_000) }).where(eq(orders.id, first.id));
    const agent = await signedIn("agent");
    const res = await call(reuse, { method: "POST", body: { sourceOrderId: first.id, buyer: { name: "Kai Morrow", email: "kai@example.test" } }, cookie: agent.cookie });
    expect(res.status).toBe(404);
  });

  it("follows the admin's freshness setting, counted in days from the visit", async () => {
    const first = await deliveredReport();
    const db = await getDb();
    const day = 86_400_000;
    // Visited 100 days ago, delivered yesterday: the visit is what counts.
    await db
      .update(orders)
      .set({ appointmentStart: new Date(Date.now() - 100 * day), appointmentEnd: new Date(Date.now() - 100 * day + 7_200_000), deliveredAt: new Date(Date.now() - day) })
      .where(eq(orders.id, first.id));
    const [{ listing }] = await db.select({ listing: listings }).from(orders).innerJoin(listings, eq(listings.id, orders.listingId)).where(eq(orders.id, first.id));
    const admin = await signedIn("admin");
    const agent = await signedIn("agent");
    const offer = async () =>
      (
        await call(quote, {
          method: "POST",
          body: { address: { street: listing.street }, postalCode: listing.postalCode, cleanoutKnown: true, buildingSewers: 1, deadline: new Date(Date.now() + 5 * day).toISOString() },
          cookie: agent.cookie,
        })
      ).json.reuse as { orderId: string; visitedOn: string } | null | undefined;
    const setFreshDays = async (reuseFreshDays: number) =>
      expect((await call(savePrices, { method: "POST", body: { ...DEFAULT_PRICES, reuseFreshDays }, cookie: admin.cookie })).status).toBe(200);

    const offered = await offer();
    expect(offered?.orderId).toBe(first.id);
    expect(offered?.visitedOn.slice(0, 10)).toBe(new Date(Date.now() - 100 * day).toISOString().slice(0, 10));
    await setFreshDays(90);
    expect(await offer()).toBeFalsy();
    const refused = await call(reuse, { method: "POST", body: { sourceOrderId: first.id, buyer: { name: "Kai Morrow", email: "kai@example.test" } }, cookie: agent.cookie });
    expect(refused.status).toBe(404);

    await setFreshDays(101);
    expect((await offer())?.orderId).toBe(first.id);
    const created = await call(reuse, { method: "POST", body: { sourceOrderId: first.id, buyer: { name: "Kai Morrow", email: "kai@example.test" } }, cookie: agent.cookie });
    expect(created.status).toBe(201);
    await setFreshDays(DEFAULT_PRICES.reuseFreshDays);
  });
});
