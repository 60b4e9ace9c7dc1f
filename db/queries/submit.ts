import "server-only";

import { eq } from "drizzle-orm";

import { tryEvaluate, type Evaluation } from "@/lib/engine";
import { AppError } from "@/lib/errors";
import { renderMail } from "@/lib/mail/render";

import { getDb } from "../client";
import { listings, orders, users } from "../schema";
import { verifiedStillIds } from "./clips";
import { getInspection, markSubmitted, readyClipIds } from "./inspections";
import { transition } from "./order-commands";
import { enqueueMail } from "./outbox";
import { currentRates } from "./rates";
import { reportInvitationPath } from "./users";

type Problems = Record<string, string[]>;

/** Everything that stops a job from being delivered, keyed by the field it concerns. */
export async function submissionProblems(orderId: string, baseRevision: number) {
  const inspection = await getInspection(orderId);
  const problems: Problems = {};
  if (!inspection) return { problems: { record: ["Nothing is recorded yet."] }, evaluation: null, inspection: null, rates: null };
  if (inspection.revision !== baseRevision) throw new AppError("conflict", "This job was changed in another tab or device. Reload to see the latest before submitting.");
  const [ready, stillIds] = await Promise.all([readyClipIds(orderId), verifiedStillIds(orderId)]);
  if (ready.length === 0) problems.clips = ["Upload at least one ready clip of the line."];
  if (inspection.narrative.trim().length < 20) problems.narrative = ["Write your summary and recommendation for the buyer (a few sentences)."];
  const findings = Array.isArray(inspection.record.findings) ? (inspection.record.findings as { clipId?: unknown; stillId?: unknown }[]) : [];
  findings.forEach((f, i) => {
    if (typeof f.clipId === "string" && !ready.includes(f.clipId)) (problems[`findings[${i}].clipId`] ??= []).push("This finding points at a clip that is not ready.");
    if (typeof f.stillId === "string" && !stillIds.includes(f.stillId))
      (problems[`findings[${i}].stillId`] ??= []).push("This finding's still frame did not finish uploading. Take it again or remove it.");
  });
  const rates = await currentRates();
  const result = tryEvaluate(inspection.record, { rates: rates.table });
  if (!result.ok) for (const p of result.problems) (problems[p.path || "record"] ??= []).push(p.message);
  return { problems, evaluation: result.ok ? result.evaluation : null, inspection, rates };
}

export async function submitInspection(inspector: { id: string }, orderId: string, baseRevision: number) {
  const { problems, evaluation, rates } = await submissionProblems(orderId, baseRevision);
  const count = Object.values(problems).reduce((n, l) => n + l.length, 0);
  if (count > 0 || !evaluation || !rates) throw new AppError("bad_request", `The record has ${count} problem${count === 1 ? "" : "s"} to fix before it can be delivered.`, problems);
  const db = await getDb();
  return db.transaction(async (tx) => {
    const moved = await transition(tx, orderId, {
      from: ["accepted", "scheduled"],
      to: "delivered",
      actorId: inspector.id,
      set: { deliveredAt: new Date() },
      where: eq(orders.inspectorId, inspector.id),
    });
    if (!moved) throw new AppError("conflict", "This job can no longer be delivered: it was released, cancelled or delivered already.");
    await markSubmitted(tx, orderId, { evaluation: evaluation as unknown as Record<string, unknown>, engineVersion: evaluation.engineVersion, ratesId: rates.id });
    const [listing] = await tx.select().from(listings).where(eq(listings.id, moved.order.listingId));
    const [agent] = await tx.select({ email: users.email, name: users.name }).from(users).where(eq(users.id, moved.order.agentId));
    await deliveryMail(tx, moved.order, listing, agent, evaluation);
    return moved.order;
  });
}

async function deliveryMail(
  tx: Parameters<typeof transition>[0],
  order: typeof orders.$inferSelect,
  listing: typeof listings.$inferSelect,
  agent: { email: string; name: string },
  evaluation: Evaluation,
) {
  const address = `${listing.street}, ${listing.city}`;
  const invitation = await reportInvitationPath(tx, order.buyerEmail, order.id);
  await enqueueMail(
    {
      key: `order:${order.id}:delivered:buyer`,
      to: order.buyerEmail,
      subject: `Your sewer scope report for ${address} is ready`,
      ...renderMail({
        heading: "The sewer scope report is ready",
        paragraphs: [
          `${order.buyerName}, the inspector has delivered the camera inspection of the sewer line at ${address}, ordered by your agent ${agent.name}.`,
          `Sign in (or create your account with this e-mail address) to see what the report covers, then unlock the rated summary: how serious the line's condition is, where the problems are, which repairs fit and roughly what they cost.`,
        ],
        facts: [["Surveyed", `${evaluation.lengths.surveyed.toFixed(1)} ft of line`]],
        action: { label: "Open my report", path: invitation },
      }),
    },
    tx,
  );
  await enqueueMail(
    {
      key: `order:${order.id}:delivered:agent`,
      to: agent.email,
      subject: `Report delivered: ${address}`,
      ...renderMail({
        heading: "The inspector delivered the report",
        paragraphs: [`We invited ${order.buyerName} to unlock the rated summary. You can read it as soon as they do.`],
        action: { label: "Open the order", path: `/orders/${order.id}` },
      }),
    },
    tx,
  );
}
