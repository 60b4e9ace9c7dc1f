import "server-only";

import { and, asc, count, desc, eq, exists, gte, ilike, isNull, or, sql, type SQL } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import type { z } from "zod";

import { AT_RISK_TEXT, atRiskReasons } from "@/lib/orders/at-risk";
import type { OrderListDto, OrderSummaryDto } from "@/lib/orders/dto";
import type { listOrdersQuery } from "@/lib/validations/orders";

import { getDb, type Db } from "../client";
import { listings, orders, serviceAreas, users } from "../schema";
import { atRiskCondition } from "./at-risk-sql";
import { selectOrders, toJobDto } from "./order-dto";
import { orderSummary } from "./orders";

type ListQuery = z.infer<typeof listOrdersQuery>;

const SORTS = {
  deadline: orders.deadline,
  created: orders.createdAt,
  address: listings.street,
  status: orders.status,
  price: orders.priceCents,
} as const;

const inspectorUser = alias(users, "inspector_user");

/** The columns an orders table shows, and the few the at-risk rule reads. */
const summaryColumns = { ...orderSummary, listingRef: orders.listingRef, inspectorId: orders.inspectorId, inspectorName: inspectorUser.name };

/** One page of orders: the agent's own, or every order for an admin (agentId null). */
export async function listOrdersPage(agentId: string | null, q: ListQuery): Promise<OrderListDto> {
  const db = await getDb();
  const filters: (SQL | undefined)[] = [agentId ? eq(orders.agentId, agentId) : undefined];
  if (q.status === "at_risk") filters.push(atRiskCondition());
  else if (q.status) filters.push(eq(orders.status, q.status));
  if (q.q) {
    const like = `%${q.q.replace(/[%_\\]/g, (c) => `\\${c}`)}%`;
    filters.push(
      or(
        ilike(listings.street, like),
        ilike(listings.city, like),
        ilike(listings.postalCode, like),
        ilike(orders.listingRef, like),
        ilike(orders.buyerName, like),
      ),
    );
  }
  const where = and(...filters);
  const order = q.dir === "desc" ? desc(SORTS[q.sort]) : asc(SORTS[q.sort]);
  // Only the table's columns: the page runs on every visit and every 15 s refresh, and the wide rows
  // cost more to hand over from the embedded database than to find (see bench/README.md, P2).
  const [rows, [{ n }]] = await Promise.all([
    selectSummaries(db)
      .where(where)
      .orderBy(order, asc(orders.id))
      .limit(q.pageSize)
      .offset((q.page - 1) * q.pageSize),
    // Every order has its listing, so the count joins it only when the search reads the address.
    q.q
      ? db.select({ n: count() }).from(orders).innerJoin(listings, eq(listings.id, orders.listingId)).where(where)
      : db.select({ n: count() }).from(orders).where(where),
  ]);
  const now = new Date();
  return { orders: rows.map((r) => toOrderSummary(r, now)), total: Number(n), page: q.page, pageSize: q.pageSize };
}

function selectSummaries(db: Db) {
  return db
    .select(summaryColumns)
    .from(orders)
    .innerJoin(listings, eq(listings.id, orders.listingId))
    .leftJoin(inspectorUser, eq(inspectorUser.id, orders.inspectorId));
}

type SummaryRow = Awaited<ReturnType<typeof selectSummaries>>[number];

function toOrderSummary(r: SummaryRow, now: Date): OrderSummaryDto {
  const reasons = atRiskReasons(r, now);
  return {
    id: r.id,
    status: r.status,
    address: { street: r.street, unit: r.unit, city: r.city, state: r.state, postalCode: r.postalCode },
    listingRef: r.listingRef,
    deadline: r.deadline.toISOString(),
    timeZone: r.timeZone,
    priceCents: r.priceCents,
    appointment:
      r.appointmentStart && r.appointmentEnd ? { start: r.appointmentStart.toISOString(), end: r.appointmentEnd.toISOString() } : null,
    atRisk: { flagged: reasons.length > 0, reasons, text: reasons.map((x) => AT_RISK_TEXT[x]) },
    createdAt: r.createdAt.toISOString(),
    inspector: r.inspectorId ? { id: r.inspectorId, name: r.inspectorName ?? "" } : null,
    buyerName: r.buyerName,
  };
}

/** The job board: open orders in the inspector's service area, soonest deadline first. */
export async function listBoardJobs(inspectorId: string) {
  const db = await getDb();
  const rows = await selectOrders(db)
    .where(
      and(
        eq(orders.status, "open"),
        isNull(orders.inspectorId),
        gte(orders.deadline, sql`now()`),
        exists(
          db
            .select({ one: sql`1` })
            .from(serviceAreas)
            .where(and(eq(serviceAreas.inspectorId, inspectorId), eq(serviceAreas.postalCode, listings.postalCode))),
        ),
      ),
    )
    .orderBy(asc(orders.deadline));
  const now = new Date();
  return rows.map((r) => toJobDto(r, now));
}

export async function listAssignedJobs(inspectorId: string) {
  const db = await getDb();
  const rows = await selectOrders(db).where(eq(orders.inspectorId, inspectorId)).orderBy(asc(orders.deadline));
  const now = new Date();
  return rows.map((r) => toJobDto(r, now));
}

/** Orders that became at risk and have not been flagged yet, with their agent. */
export async function listUnflaggedAtRisk() {
  const db = await getDb();
  return db
    .select({ order: orders, listing: listings, agentEmail: users.email, agentName: users.name })
    .from(orders)
    .innerJoin(listings, eq(listings.id, orders.listingId))
    .innerJoin(users, eq(users.id, orders.agentId))
    .where(and(atRiskCondition(), isNull(orders.atRiskNotifiedAt)))
    .limit(100);
}
