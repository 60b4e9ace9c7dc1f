import "server-only";

import { and, asc, count, desc, eq, inArray, isNotNull, or, sql } from "drizzle-orm";

import { getDb } from "../client";
import { inspectorProfiles, listings, orders, type OrderStatus, users } from "../schema";

/** The columns a list of orders shows: the order, its times and price, and its listing's address. */
export const orderSummary = {
  id: orders.id,
  status: orders.status,
  deadline: orders.deadline,
  timeZone: orders.timeZone,
  priceCents: orders.priceCents,
  platformFeeCents: orders.platformFeeCents,
  appointmentStart: orders.appointmentStart,
  appointmentEnd: orders.appointmentEnd,
  createdAt: orders.createdAt,
  buyerName: orders.buyerName,
  street: listings.street,
  unit: listings.unit,
  city: listings.city,
  state: listings.state,
  postalCode: listings.postalCode,
};

/** Whether the inspector may see the job board: verified and holding a licence that has not expired. */
export async function inspectorStanding(inspectorId: string) {
  const db = await getDb();
  const [profile] = await db.select().from(inspectorProfiles).where(eq(inspectorProfiles.userId, inspectorId)).limit(1);
  const today = new Date().toISOString().slice(0, 10);
  const licenceValid = !!profile?.licenceExpiresOn && profile.licenceExpiresOn >= today;
  return { profile: profile ?? null, verified: !!profile?.verifiedAt, licenceValid, canTakeJobs: !!profile?.verifiedAt && licenceValid };
}

export async function listJobsAssignedTo(inspectorId: string) {
  const db = await getDb();
  return db
    .select(orderSummary)
    .from(orders)
    .innerJoin(listings, eq(listings.id, orders.listingId))
    .where(eq(orders.inspectorId, inspectorId))
    .orderBy(asc(orders.deadline));
}

/** Reports delivered for the buyer's e-mail (or account), newest first. */
export async function listReportsForBuyer(buyer: { id: string; email: string }) {
  const db = await getDb();
  return db
    .select({ ...orderSummary, deliveredAt: orders.deliveredAt, unlockedAt: orders.unlockedAt, inspectorName: users.name })
    .from(orders)
    .innerJoin(listings, eq(listings.id, orders.listingId))
    .leftJoin(users, eq(users.id, orders.inspectorId))
    .where(
      and(
        or(eq(orders.buyerId, buyer.id), eq(orders.buyerEmail, buyer.email)),
        inArray(orders.status, ["delivered", "unlocked", "refunded"]),
        isNotNull(orders.deliveredAt),
      ),
    )
    .orderBy(desc(orders.deliveredAt));
}

export async function countOrdersByStatus(): Promise<Record<OrderStatus, number>> {
  const db = await getDb();
  const rows = await db.select({ status: orders.status, n: count() }).from(orders).groupBy(orders.status);
  const out = { open: 0, accepted: 0, scheduled: 0, delivered: 0, unlocked: 0, cancelled: 0, refunded: 0 };
  for (const r of rows) out[r.status] = Number(r.n);
  return out;
}

export async function countInspectorsAwaitingVerification(): Promise<number> {
  const db = await getDb();
  const [row] = await db.select({ n: count() }).from(inspectorProfiles).where(sql`${inspectorProfiles.verifiedAt} is null`);
  return Number(row?.n ?? 0);
}
