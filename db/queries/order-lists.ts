import "server-only";

import { and, asc, count, desc, eq, exists, gte, ilike, isNull, or, sql, type SQL } from "drizzle-orm";

import type { OrderListDto } from "@/lib/orders/dto";
import type { z } from "zod";
import type { listOrdersQuery } from "@/lib/validations/orders";

import { getDb } from "../client";
import { listings, orders, serviceAreas, users } from "../schema";
import { atRiskCondition } from "./at-risk-sql";
import { selectOrders, toJobDto, toOrderDto } from "./order-dto";

type ListQuery = z.infer<typeof listOrdersQuery>;

const SORTS = {
  deadline: orders.deadline,
  created: orders.createdAt,
  address: listings.street,
  status: orders.status,
  price: orders.priceCents,
} as const;

/** One page of orders: the agent's own, or every order for an admin (agentId null). */
export async function listOrdersPage(agentId: string | null, q: ListQuery): Promise<OrderListDto> {
  const db = await getDb();
  const filters: (SQL | undefined)[] = [agentId ? eq(orders.agentId, agentId) : undefined];
  if (q.status === "at_risk") filters.push(atRiskCondition());
  else if (q.status) filters.push(eq(orders.status, q.status));
  if (q.q) {
    const like = `%${q.q.replace(/[%_\\]/g, (c) => `\\${c}`)}%`;
    filters.push(or(ilike(listings.street, like), ilike(listings.city, like), ilike(listings.postalCode, like), ilike(orders.listingRef, like), ilike(orders.buyerName, like)));
  }
  const where = and(...filters);
  const order = q.dir === "desc" ? desc(SORTS[q.sort]) : asc(SORTS[q.sort]);
  const [rows, [{ n }]] = await Promise.all([
    selectOrders(db)
      .where(where)
      .orderBy(order, asc(orders.id))
      .limit(q.pageSize)
      .offset((q.page - 1) * q.pageSize),
    db.select({ n: count() }).from(orders).innerJoin(listings, eq(listings.id, orders.listingId)).where(where),
  ]);
  const now = new Date();
  return { orders: rows.map((r) => toOrderDto(r, now)), total: Number(n), page: q.page, pageSize: q.pageSize };
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
