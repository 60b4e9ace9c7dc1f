import "server-only";

import { eq, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";

import { AT_RISK_TEXT, atRiskReasons } from "@/lib/orders/at-risk";
import type { JobDto, OrderDto } from "@/lib/orders/dto";

import type { Db, Tx } from "../client";
import { inspectorProfiles, listings, orders, users } from "../schema";

const inspectorUser = alias(users, "inspector_user");
const buyerUser = alias(users, "buyer_user");

export const orderColumns = {
  order: orders,
  listing: listings,
  inspectorName: inspectorUser.name,
  inspectorCompany: inspectorUser.company,
  licenceNumber: inspectorProfiles.licenceNumber,
  buyerJoined: sql<boolean>`${buyerUser.id} is not null`,
};

/** Orders with their listing, inspector and whether the buyer has an account: one query, no N+1. */
export function selectOrders(db: Db | Tx) {
  return db
    .select(orderColumns)
    .from(orders)
    .innerJoin(listings, eq(listings.id, orders.listingId))
    .leftJoin(inspectorUser, eq(inspectorUser.id, orders.inspectorId))
    .leftJoin(inspectorProfiles, eq(inspectorProfiles.userId, orders.inspectorId))
    .leftJoin(buyerUser, eq(buyerUser.email, orders.buyerEmail));
}

export type OrderRow = {
  order: typeof orders.$inferSelect;
  listing: typeof listings.$inferSelect;
  inspectorName: string | null;
  inspectorCompany: string | null;
  licenceNumber: string | null;
  buyerJoined: boolean;
};

export function toOrderDto(r: OrderRow, now = new Date()): OrderDto {
  const o = r.order;
  const reasons = atRiskReasons(o, now);
  const delivered = ["delivered", "unlocked", "refunded"].includes(o.status);
  return {
    id: o.id,
    status: o.status,
    address: { street: r.listing.street, unit: r.listing.unit, city: r.listing.city, state: r.listing.state, postalCode: r.listing.postalCode },
    listingRef: o.listingRef,
    propertyType: r.listing.propertyType,
    yearBuilt: r.listing.yearBuilt,
    occupancy: o.occupancy,
    accessNotes: o.accessNotes,
    cleanoutKnown: o.cleanoutKnown,
    cleanoutNote: o.cleanoutNote,
    buildingSewers: o.buildingSewers,
    deadline: o.deadline.toISOString(),
    timeZone: o.timeZone,
    visitWindows: o.visitWindows,
    anyTimeInWindows: o.anyTimeInWindows,
    buyer: { name: o.buyerName, email: o.buyerEmail, invitation: r.buyerJoined ? "joined" : delivered ? "invited" : "waiting_for_report" },
    notes: o.notes,
    priceCents: o.priceCents,
    priceLines: o.priceLines,
    inspectorPayoutCents: o.priceCents - o.platformFeeCents,
    inspector: o.inspectorId ? { id: o.inspectorId, name: r.inspectorName ?? "", company: r.inspectorCompany, licenceNumber: r.licenceNumber } : null,
    appointment: o.appointmentStart && o.appointmentEnd ? { start: o.appointmentStart.toISOString(), end: o.appointmentEnd.toISOString() } : null,
    atRisk: { flagged: reasons.length > 0, reasons, text: reasons.map((x) => AT_RISK_TEXT[x]) },
    createdAt: o.createdAt.toISOString(),
  };
}

export function toJobDto(r: OrderRow, now = new Date()): JobDto {
  const { buyer, priceCents: _price, priceLines, notes, ...rest } = toOrderDto(r, now);
  return { ...rest, buyerName: buyer.name, notes, addOns: priceLines.slice(1).map((l) => l.label) };
}
