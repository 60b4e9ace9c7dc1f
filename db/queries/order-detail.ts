import "server-only";

import { and, asc, eq } from "drizzle-orm";

import type { OrderDetailDto, OrderEventDto, ProposalDto } from "@/lib/orders/dto";

import { getDb, type Db } from "../client";
import { appointmentProposals, orderEvents, orders, users } from "../schema";
import { inspectorStanding } from "./orders";
import { selectOrders, toJobDto, toOrderDto } from "./order-dto";

async function timeline(db: Db, orderId: string): Promise<OrderEventDto[]> {
  const rows = await db
    .select({ e: orderEvents, name: users.name, role: users.role })
    .from(orderEvents)
    .leftJoin(users, eq(users.id, orderEvents.actorId))
    .where(eq(orderEvents.orderId, orderId))
    .orderBy(asc(orderEvents.at));
  return rows.map(({ e, name, role }) => ({ id: e.id, from: e.fromStatus, to: e.toStatus, at: e.at.toISOString(), by: name && role ? { name, role } : null, reason: e.reason }));
}

async function proposals(db: Db, orderId: string): Promise<ProposalDto[]> {
  const rows = await db.select().from(appointmentProposals).where(eq(appointmentProposals.orderId, orderId)).orderBy(asc(appointmentProposals.start));
  return rows.map((p) => ({ id: p.id, start: p.start.toISOString(), end: p.end.toISOString(), status: p.status }));
}

async function detail(where: ReturnType<typeof and>): Promise<OrderDetailDto | null> {
  const db = await getDb();
  const [row] = await selectOrders(db).where(where).limit(1);
  if (!row) return null;
  const [events, props] = await Promise.all([timeline(db, row.order.id), proposals(db, row.order.id)]);
  return { order: toOrderDto(row), events, proposals: props };
}

/** The agent's own order, or null (the page answers 404). */
export function getOrderDetailForAgent(orderId: string, agentId: string) {
  return detail(and(eq(orders.id, orderId), eq(orders.agentId, agentId)));
}

export function getOrderDetailForAdmin(orderId: string) {
  return detail(eq(orders.id, orderId));
}

/** A job the inspector holds, or an open job on their board; null otherwise. */
export async function getJobDetailForInspector(orderId: string, inspectorId: string) {
  const db = await getDb();
  const [row] = await selectOrders(db).where(eq(orders.id, orderId)).limit(1);
  if (!row) return null;
  const mine = row.order.inspectorId === inspectorId;
  if (!mine) {
    if (row.order.status !== "open") return null;
    const standing = await inspectorStanding(inspectorId);
    if (!standing.canTakeJobs) return null;
    const { servesPostalCode } = await import("./inspectors");
    if (!(await servesPostalCode(inspectorId, row.listing.postalCode))) return null;
  }
  const [events, props] = await Promise.all([timeline(db, orderId), mine ? proposals(db, orderId) : Promise.resolve([])]);
  return { job: toJobDto(row), events, proposals: props };
}
