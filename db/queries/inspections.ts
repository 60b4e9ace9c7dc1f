import "server-only";

import { and, eq, sql } from "drizzle-orm";

import { getDb, type Tx } from "../client";
import { clips, inspections } from "../schema";

export type InspectionDraft = { record: Record<string, unknown>; narrative: string; recommendation: string };

export async function getInspection(orderId: string) {
  const db = await getDb();
  const [row] = await db.select().from(inspections).where(eq(inspections.orderId, orderId)).limit(1);
  return row ?? null;
}

/**
 * Saves a draft only if nobody saved since `baseRevision` (two tabs never overwrite each other
 * silently). Returns the new revision, or null with the current one on a conflict.
 */
export async function saveDraft(orderId: string, draft: InspectionDraft, baseRevision: number, tx?: Tx): Promise<{ revision: number } | { conflict: number }> {
  const db = tx ?? (await getDb());
  if (baseRevision === 0) {
    const [created] = await db
      .insert(inspections)
      .values({ orderId, ...draft, revision: 1 })
      .onConflictDoNothing({ target: inspections.orderId })
      .returning({ revision: inspections.revision });
    if (created) return created;
  }
  const [updated] = await db
    .update(inspections)
    .set({ ...draft, revision: sql`${inspections.revision} + 1`, updatedAt: new Date() })
    .where(and(eq(inspections.orderId, orderId), eq(inspections.revision, baseRevision), sql`${inspections.submittedAt} is null`))
    .returning({ revision: inspections.revision });
  if (updated) return updated;
  const [current] = await db.select({ revision: inspections.revision }).from(inspections).where(eq(inspections.orderId, orderId)).limit(1);
  return { conflict: current?.revision ?? 0 };
}

export async function markSubmitted(tx: Tx, orderId: string, result: { evaluation: Record<string, unknown>; engineVersion: string; ratesId: string }) {
  await tx
    .update(inspections)
    .set({ evaluation: result.evaluation, engineVersion: result.engineVersion, ratesId: result.ratesId, submittedAt: new Date(), updatedAt: new Date() })
    .where(eq(inspections.orderId, orderId));
}

export async function readyClipIds(orderId: string): Promise<string[]> {
  const db = await getDb();
  const rows = await db.select({ id: clips.id }).from(clips).where(and(eq(clips.orderId, orderId), eq(clips.status, "ready")));
  return rows.map((r) => r.id);
}
