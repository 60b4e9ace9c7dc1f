import "server-only";

import { and, desc, eq, gte, inArray, isNotNull, isNull, sql } from "drizzle-orm";

import { AppError } from "@/lib/errors";
import { renderMail } from "@/lib/mail/render";
import { formatMoney } from "@/lib/money";

import { getDb } from "../client";
import { inspections, listings, orderEvents, orders, users } from "../schema";
import { enqueueMail } from "./outbox";
import { currentPrices } from "./prices";
import { reportInvitationPath } from "./users";

export type FreshReport = { orderId: string; visitedOn: string; inspectorName: string | null; priceCents: number };

/** The newest report of the listing still fresh enough to sell again (the admin's days since the visit; never a reuse of a reuse). */
export async function findFreshReport(addressKey: string): Promise<FreshReport | null> {
  const db = await getDb();
  const prices = await currentPrices();
  const since = new Date(Date.now() - prices.reuseFreshDays * 86_400_000);
  const [row] = await db
    .select({ id: orders.id, visitedOn: orders.appointmentStart, deliveredAt: orders.deliveredAt, inspectorName: users.name })
    .from(orders)
    .innerJoin(listings, eq(listings.id, orders.listingId))
    .innerJoin(inspections, eq(inspections.orderId, orders.id))
    .leftJoin(users, eq(users.id, orders.inspectorId))
    .where(
      and(
        eq(listings.addressKey, addressKey),
        inArray(orders.status, ["delivered", "unlocked", "refunded"]),
        isNull(orders.reuseOfOrderId),
        isNotNull(inspections.submittedAt),
        gte(sql`coalesce(${orders.appointmentStart}, ${orders.deliveredAt})`, since.toISOString()),
      ),
    )
    .orderBy(desc(orders.deliveredAt))
    .limit(1);
  if (!row) return null;
  return { orderId: row.id, visitedOn: (row.visitedOn ?? row.deliveredAt)!.toISOString(), inspectorName: row.inspectorName, priceCents: prices.reuseCents };
}

/** A new order that sells an existing fresh report to the listing's next buyer; the original inspector earns a share. */
export async function createReuseOrder(agent: { id: string; name: string }, input: { sourceOrderId: string; buyer: { name: string; email: string }; timeZone: string }) {
  const db = await getDb();
  const [source] = await db.select({ order: orders, listing: listings }).from(orders).innerJoin(listings, eq(listings.id, orders.listingId)).where(eq(orders.id, input.sourceOrderId)).limit(1);
  const fresh = source ? await findFreshReport(source.listing.addressKey) : null;
  if (!source || !fresh || fresh.orderId !== source.order.id) throw new AppError("not_found", "No fresh report is available for that listing any more.");
  const prices = await currentPrices();
  const share = Math.round((prices.reuseCents * prices.reuseInspectorShareBps) / 10_000);
  return db.transaction(async (tx) => {
    const [buyer] = await tx.select({ id: users.id }).from(users).where(and(eq(users.email, input.buyer.email), eq(users.role, "buyer"))).limit(1);
    const now = new Date();
    const [order] = await tx
      .insert(orders)
      .values({
        listingId: source.order.listingId,
        agentId: agent.id,
        inspectorId: source.order.inspectorId,
        status: "delivered",
        reuseOfOrderId: source.order.id,
        occupancy: source.order.occupancy,
        accessNotes: "Report reuse: no visit.",
        cleanoutKnown: source.order.cleanoutKnown,
        timeZone: input.timeZone,
        deadline: new Date(now.getTime() + 14 * 86_400_000),
        visitWindows: [],
        buyerName: input.buyer.name,
        buyerEmail: input.buyer.email,
        buyerId: buyer?.id ?? null,
        priceCents: prices.reuseCents,
        platformFeeCents: prices.reuseCents - share,
        priceLines: [{ label: "Report reuse (existing sewer scope report)", cents: prices.reuseCents }],
        appointmentStart: source.order.appointmentStart,
        appointmentEnd: source.order.appointmentEnd,
        deliveredAt: now,
      })
      .returning();
    await tx.insert(orderEvents).values([
      { orderId: order.id, fromStatus: null, toStatus: "open", actorId: agent.id, reason: "Report reuse ordered" },
      { orderId: order.id, fromStatus: "open", toStatus: "delivered", actorId: agent.id, reason: `Reuses the report of ${fresh.visitedOn.slice(0, 10)}` },
    ]);
    await enqueueMail(
      {
        key: `order:${order.id}:reuse-invite`,
        to: input.buyer.email,
        subject: `A sewer scope report for ${source.listing.street} is ready for you`,
        ...renderMail({
          heading: "A recent sewer scope report of this house is available",
          paragraphs: [`${agent.name} ordered the existing sewer scope report of ${source.listing.street}, ${source.listing.city} for you. Unlock it for ${formatMoney(prices.reuseCents)} instead of waiting for a new visit.`],
          facts: [["Inspected on", fresh.visitedOn.slice(0, 10)]],
          action: { label: "Open my report", path: await reportInvitationPath(tx, input.buyer.email, order.id) },
        }),
      },
      tx,
    );
    return order;
  });
}
