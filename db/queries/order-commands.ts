import "server-only";

import { and, eq, inArray, sql } from "drizzle-orm";

import { AppError } from "@/lib/errors";
import { formatAddress } from "@/lib/format";
import type { OrderDto } from "@/lib/orders/dto";
import { orderMail, type MailOrder } from "@/lib/orders/mail";
import { quoteScope } from "@/lib/pricing";
import type { CreateOrderInput } from "@/lib/validations/orders";

import { getDb, type Tx } from "../client";
import { listings, orderEvents, orders, type OrderStatus, users } from "../schema";
import { isPostalCodeServed } from "./inspectors";
import { selectOrders, toOrderDto } from "./order-dto";
import { currentPrices } from "./prices";

type Actor = { id: string; name: string; email: string };

export const mailOrder = (o: typeof orders.$inferSelect, l: typeof listings.$inferSelect): MailOrder => ({
  id: o.id,
  address: formatAddress(l),
  timeZone: o.timeZone,
  deadline: o.deadline,
  priceCents: o.priceCents,
});

/** Moves an order from one of `from` to `to` atomically, and records who, when and why. */
export async function transition(
  tx: Tx,
  orderId: string,
  step: { from: OrderStatus[]; to: OrderStatus; actorId: string | null; reason?: string | null; set?: Partial<typeof orders.$inferInsert>; where?: ReturnType<typeof and> },
) {
  const [row] = await tx
    .update(orders)
    .set({ ...step.set, status: step.to, updatedAt: new Date() })
    .where(and(eq(orders.id, orderId), inArray(orders.status, step.from), step.where))
    .returning();
  if (!row) return null;
  const [prev] = await tx.select({ s: orderEvents.toStatus }).from(orderEvents).where(eq(orderEvents.orderId, orderId)).orderBy(sql`${orderEvents.at} desc`).limit(1);
  const [event] = await tx
    .insert(orderEvents)
    .values({ orderId, fromStatus: prev?.s ?? null, toStatus: step.to, actorId: step.actorId, reason: step.reason ?? null })
    .returning({ id: orderEvents.id });
  return { order: row, eventId: event.id };
}

async function loadDto(tx: Tx, orderId: string): Promise<OrderDto> {
  const [row] = await selectOrders(tx).where(eq(orders.id, orderId)).limit(1);
  return toOrderDto(row);
}

export const listingAddressKey = (a: { street: string; unit?: string | null; postalCode: string }) =>
  [a.street, a.unit ?? "", a.postalCode].map((p) => p.toLowerCase().replace(/[^a-z0-9]+/g, " ").trim()).join("|");

export async function createOrder(agent: Actor, input: CreateOrderInput): Promise<OrderDto> {
  const db = await getDb();
  if (!(await isPostalCodeServed(input.address.postalCode))) {
    throw new AppError("bad_request", "No verified inspector serves that postal code yet.", {
      "address.postalCode": [`No verified inspector serves ${input.address.postalCode} yet. Check the code; if it is right, write to us and we will find one.`],
    });
  }
  return db.transaction(async (tx) => {
    const prices = await currentPrices(undefined, tx);
    const quote = quoteScope(prices, { cleanoutKnown: input.cleanoutKnown, buildingSewers: input.buildingSewers, deadline: new Date(input.deadline) });
    const key = listingAddressKey(input.address);
    await tx
      .insert(listings)
      .values({ ...input.address, unit: input.address.unit || null, addressKey: key, propertyType: input.propertyType, yearBuilt: input.yearBuilt ?? null })
      .onConflictDoUpdate({ target: listings.addressKey, set: { propertyType: input.propertyType, yearBuilt: input.yearBuilt ?? null } });
    const [listing] = await tx.select().from(listings).where(eq(listings.addressKey, key)).limit(1);
    const [buyer] = await tx.select({ id: users.id }).from(users).where(and(eq(users.email, input.buyer.email), eq(users.role, "buyer"))).limit(1);
    const [order] = await tx
      .insert(orders)
      .values({
        listingId: listing.id,
        agentId: agent.id,
        listingRef: input.listingRef || null,
        occupancy: input.occupancy,
        accessNotes: input.accessNotes,
        cleanoutKnown: input.cleanoutKnown,
        cleanoutNote: input.cleanoutNote || null,
        buildingSewers: input.buildingSewers,
        timeZone: input.timeZone,
        deadline: new Date(input.deadline),
        visitWindows: input.visitWindows,
        anyTimeInWindows: input.anyTimeInWindows,
        buyerName: input.buyer.name,
        buyerEmail: input.buyer.email,
        buyerId: buyer?.id ?? null,
        notes: input.notes || null,
        priceCents: quote.priceCents,
        platformFeeCents: quote.platformFeeCents,
        priceLines: quote.lines,
      })
      .returning();
    await tx.insert(orderEvents).values({ orderId: order.id, fromStatus: null, toStatus: "open", actorId: agent.id, reason: null });
    await orderMail.placed(tx, mailOrder(order, listing), agent);
    return loadDto(tx, order.id);
  });
}
