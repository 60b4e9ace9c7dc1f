import "server-only";

import { and, eq, gt, inArray, isNull, or } from "drizzle-orm";

import { appUrl } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { orderMail } from "@/lib/orders/mail";

import { getDb, type Tx } from "../client";
import { appointmentProposals, listings, orders, users } from "../schema";
import { inspectorStanding } from "./orders";
import { servesPostalCode } from "./inspectors";
import { mailOrder, transition } from "./order-commands";

type Actor = { id: string; name: string; email: string };

async function loadOrder(tx: Tx, orderId: string) {
  const [row] = await tx.select({ order: orders, listing: listings }).from(orders).innerJoin(listings, eq(listings.id, orders.listingId)).where(eq(orders.id, orderId)).limit(1);
  return row ?? null;
}

async function person(tx: Tx, id: string) {
  const [u] = await tx.select({ email: users.email, name: users.name, company: users.company }).from(users).where(eq(users.id, id)).limit(1);
  return u;
}

const buyerOf = (o: typeof orders.$inferSelect) => ({ email: o.buyerEmail, name: o.buyerName });

/** First to accept wins: the update only matches while the order is still open and unassigned. */
export async function acceptJob(inspector: Actor, orderId: string) {
  const standing = await inspectorStanding(inspector.id);
  if (!standing.canTakeJobs) throw new AppError("forbidden", "Your account must be verified, with a current licence, to take jobs.");
  const db = await getDb();
  return db.transaction(async (tx) => {
    const current = await loadOrder(tx, orderId);
    if (!current || !(await servesPostalCode(inspector.id, current.listing.postalCode, tx))) throw new AppError("not_found", "That job was not found.");
    const moved = await transition(tx, orderId, {
      from: ["open"],
      to: "accepted",
      actorId: inspector.id,
      set: { inspectorId: inspector.id, acceptedAt: new Date() },
      where: and(isNull(orders.inspectorId), gt(orders.deadline, new Date())),
    });
    if (!moved) throw new AppError("conflict", "Another inspector took this job a moment ago.");
    const agent = await person(tx, moved.order.agentId);
    const me = await person(tx, inspector.id);
    await orderMail.taken(tx, mailOrder(moved.order, current.listing), agent, { name: me.name, company: me.company }, moved.eventId);
    return moved.order;
  });
}

function insideWindows(slot: { start: Date; end: Date }, windows: { start: string; end: string }[]) {
  return windows.some((w) => slot.start >= new Date(w.start) && slot.end <= new Date(w.end));
}

export async function proposeTimes(inspector: Actor, orderId: string, slots: { start: string; end: string }[]) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const current = await loadOrder(tx, orderId);
    if (!current || current.order.inspectorId !== inspector.id) throw new AppError("not_found", "That job was not found.");
    const { order, listing } = current;
    if (order.status !== "accepted") throw new AppError("conflict", order.status === "scheduled" ? "The visit is already confirmed." : "This job can no longer be scheduled.");
    const parsed = slots.map((s) => ({ start: new Date(s.start), end: new Date(s.end) }));
    const fieldErrors: Record<string, string[]> = {};
    parsed.forEach((s, i) => {
      if (s.start <= new Date()) fieldErrors[`slots[${i}].start`] = ["This time has passed."];
      else if (s.end > order.deadline) fieldErrors[`slots[${i}].end`] = ["This visit would end after the contingency deadline."];
      else if (!insideWindows(s, order.visitWindows)) fieldErrors[`slots[${i}].start`] = ["Keep the visit inside one of the agent's windows."];
    });
    if (Object.keys(fieldErrors).length) throw new AppError("bad_request", "Some proposed times do not fit the order.", fieldErrors);

    await tx
      .update(appointmentProposals)
      .set({ status: "withdrawn" })
      .where(and(eq(appointmentProposals.orderId, orderId), eq(appointmentProposals.status, "proposed")));
    const rows = await tx
      .insert(appointmentProposals)
      .values(parsed.map((s) => ({ orderId, inspectorId: inspector.id, start: s.start, end: s.end })))
      .returning();
    const agent = await person(tx, order.agentId);
    const me = await person(tx, inspector.id);
    const people = { agent, inspector: me, buyer: buyerOf(order) };
    if (order.anyTimeInWindows) {
      await confirmInTx(tx, rows[0].id, order.agentId, null, "Confirmed automatically: the agent accepts any time inside the windows.");
    } else {
      await orderMail.proposed(tx, mailOrder(order, listing), `proposal:${rows[0].id}`, people, parsed);
    }
    return tx.select().from(appointmentProposals).where(inArray(appointmentProposals.id, rows.map((r) => r.id)));
  });
}

async function confirmInTx(tx: Tx, proposalId: string, agentId: string, actorId: string | null, reason: string | null) {
  const [proposal] = await tx.select().from(appointmentProposals).where(eq(appointmentProposals.id, proposalId)).limit(1);
  const current = proposal ? await loadOrder(tx, proposal.orderId) : null;
  if (!proposal || !current || current.order.agentId !== agentId) throw new AppError("not_found", "That proposed time was not found.");
  if (proposal.status !== "proposed") throw new AppError("conflict", "That time is no longer on offer. Pick another one.");
  if (proposal.start <= new Date()) throw new AppError("conflict", "That time has passed. Ask the inspector for a new one.");
  const moved = await transition(tx, proposal.orderId, {
    from: ["accepted"],
    to: "scheduled",
    actorId,
    reason,
    set: { appointmentStart: proposal.start, appointmentEnd: proposal.end },
    where: eq(orders.inspectorId, proposal.inspectorId),
  });
  if (!moved) throw new AppError("conflict", "The order changed in the meantime. Reload the page.");
  await tx.update(appointmentProposals).set({ status: "confirmed" }).where(eq(appointmentProposals.id, proposalId));
  await tx
    .update(appointmentProposals)
    .set({ status: "declined" })
    .where(and(eq(appointmentProposals.orderId, proposal.orderId), eq(appointmentProposals.status, "proposed")));
  const agent = await person(tx, agentId);
  const inspector = await person(tx, proposal.inspectorId);
  await orderMail.confirmed(tx, mailOrder(moved.order, current.listing), { agent, inspector, buyer: buyerOf(moved.order) }, { start: proposal.start, end: proposal.end }, `${appUrl()}/orders/${moved.order.id}`);
  return moved.order;
}

export async function confirmAppointment(agent: Actor, orderId: string, proposalId: string) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [p] = await tx.select({ orderId: appointmentProposals.orderId }).from(appointmentProposals).where(eq(appointmentProposals.id, proposalId)).limit(1);
    if (!p || p.orderId !== orderId) throw new AppError("not_found", "That proposed time was not found.");
    return confirmInTx(tx, proposalId, agent.id, agent.id, null);
  });
}

const notStarted = () => or(isNull(orders.appointmentStart), gt(orders.appointmentStart, new Date()));

export async function cancelOrder(agent: Actor, orderId: string, reason: string) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const current = await loadOrder(tx, orderId);
    if (!current || current.order.agentId !== agent.id) throw new AppError("not_found", "That order was not found.");
    const moved = await transition(tx, orderId, { from: ["open", "accepted", "scheduled"], to: "cancelled", actorId: agent.id, reason, set: { cancelledAt: new Date() }, where: notStarted() });
    if (!moved) throw new AppError("conflict", "This order can no longer be cancelled: the visit has started or the report is delivered.");
    await tx.update(appointmentProposals).set({ status: "withdrawn" }).where(and(eq(appointmentProposals.orderId, orderId), inArray(appointmentProposals.status, ["proposed", "confirmed"])));
    if (moved.order.inspectorId) await orderMail.cancelled(tx, mailOrder(moved.order, current.listing), await person(tx, moved.order.inspectorId), reason);
    return moved.order;
  });
}

export async function releaseJob(inspector: Actor, orderId: string, reason: string) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const current = await loadOrder(tx, orderId);
    if (!current || current.order.inspectorId !== inspector.id) throw new AppError("not_found", "That job was not found.");
    const moved = await transition(tx, orderId, {
      from: ["accepted", "scheduled"],
      to: "open",
      actorId: inspector.id,
      reason,
      set: { inspectorId: null, acceptedAt: null, appointmentStart: null, appointmentEnd: null },
      where: and(eq(orders.inspectorId, inspector.id), notStarted()),
    });
    if (!moved) throw new AppError("conflict", "This job can no longer be released: the visit has started.");
    await tx.update(appointmentProposals).set({ status: "withdrawn" }).where(and(eq(appointmentProposals.orderId, orderId), inArray(appointmentProposals.status, ["proposed", "confirmed"])));
    await orderMail.released(tx, mailOrder(moved.order, current.listing), await person(tx, moved.order.agentId), inspector.name, reason, moved.eventId);
    return moved.order;
  });
}
