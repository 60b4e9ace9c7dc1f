import "server-only";

import { and, asc, eq, inArray, isNotNull, isNull, lt, notInArray } from "drizzle-orm";

import { getDb } from "../client";
import { clips, orders, stills, type Clip, type OrderStatus } from "../schema";

export type ClipStatus = Clip["status"];
export const WORKABLE_STATUSES: readonly OrderStatus[] = ["accepted", "scheduled"];

/** The order when it is assigned to this inspector; null for anyone else. */
export async function getAssignedOrder(orderId: string, inspectorId: string) {
  const db = await getDb();
  const [row] = await db
    .select({ id: orders.id, status: orders.status })
    .from(orders)
    .where(and(eq(orders.id, orderId), eq(orders.inspectorId, inspectorId)))
    .limit(1);
  return row ?? null;
}

/** The clip when its job is still assigned to the inspector who uploads it. */
export async function getClipForInspector(clipId: string, inspectorId: string) {
  const db = await getDb();
  const [row] = await db
    .select({ clip: clips, orderStatus: orders.status })
    .from(clips)
    .innerJoin(orders, eq(orders.id, clips.orderId))
    .where(and(eq(clips.id, clipId), eq(clips.inspectorId, inspectorId), eq(orders.inspectorId, inspectorId)))
    .limit(1);
  return row ?? null;
}

export async function getClip(clipId: string) {
  const db = await getDb();
  const [row] = await db.select().from(clips).where(eq(clips.id, clipId)).limit(1);
  return row ?? null;
}

export async function insertClip(values: typeof clips.$inferInsert) {
  const db = await getDb();
  const [row] = await db.insert(clips).values(values).returning();
  return row;
}

/** Clips of a job the inspector can still see: everything but cancelled or removed uploads. */
export async function listClipsForOrder(orderId: string) {
  const db = await getDb();
  return db
    .select()
    .from(clips)
    .where(and(eq(clips.orderId, orderId), notInArray(clips.status, ["aborted", "removed"])))
    .orderBy(asc(clips.createdAt));
}

/** Activity on an upload keeps the sweeper away from it. */
export async function touchClip(clipId: string) {
  const db = await getDb();
  await db
    .update(clips)
    .set({ updatedAt: new Date() })
    .where(and(eq(clips.id, clipId), eq(clips.status, "uploading")));
}

/** Moves an upload to ready or rejected once; null when another request got there first. */
export async function finishClip(
  clipId: string,
  outcome:
    | { status: "ready"; detectedType: string; durationSeconds: number | null }
    | { status: "rejected"; reason: string; detectedType?: string | null },
) {
  const db = await getDb();
  const now = new Date();
  const set =
    outcome.status === "ready"
      ? {
          status: "ready" as const,
          detectedType: outcome.detectedType,
          durationSeconds: outcome.durationSeconds,
          completedAt: now,
          updatedAt: now,
          rejectedReason: null,
        }
      : {
          status: "rejected" as const,
          rejectedReason: outcome.reason,
          detectedType: outcome.detectedType ?? null,
          completedAt: now,
          updatedAt: now,
        };
  const [row] = await db
    .update(clips)
    .set(set)
    .where(and(eq(clips.id, clipId), eq(clips.status, "uploading")))
    .returning();
  return row ?? null;
}

export async function markClipAborted(clipId: string, from: readonly ClipStatus[], olderThan?: Date) {
  return markClipGone(clipId, "aborted", from, olderThan);
}

/** A ready clip the inspector took out of the job: kept as a row (findings may name it), its object deleted. */
export async function markClipRemoved(clipId: string) {
  return markClipGone(clipId, "removed", ["ready"]);
}

async function markClipGone(clipId: string, status: "aborted" | "removed", from: readonly ClipStatus[], olderThan?: Date) {
  const db = await getDb();
  const [row] = await db
    .update(clips)
    .set({ status, updatedAt: new Date() })
    .where(and(eq(clips.id, clipId), inArray(clips.status, [...from]), olderThan ? lt(clips.updatedAt, olderThan) : undefined))
    .returning();
  return row ?? null;
}

export async function setClipStartFootage(clipId: string, startFootage: number | null) {
  const db = await getDb();
  const [row] = await db.update(clips).set({ startFootage, updatedAt: new Date() }).where(eq(clips.id, clipId)).returning();
  return row ?? null;
}

export async function setClipPoster(clipId: string, posterKey: string | null) {
  const db = await getDb();
  const [row] = await db.update(clips).set({ posterKey, updatedAt: new Date() }).where(eq(clips.id, clipId)).returning();
  return row ?? null;
}

export async function listStaleUploads(olderThan: Date, limit = 500) {
  const db = await getDb();
  return db
    .select({ id: clips.id, objectKey: clips.objectKey, uploadId: clips.uploadId })
    .from(clips)
    .where(and(eq(clips.status, "uploading"), lt(clips.updatedAt, olderThan)))
    .orderBy(asc(clips.updatedAt))
    .limit(limit);
}

/** Upload ids that still belong to an upload in progress. */
export async function activeUploadIds(uploadIds: readonly string[]) {
  if (uploadIds.length === 0) return new Set<string>();
  const db = await getDb();
  const rows = await db
    .select({ uploadId: clips.uploadId })
    .from(clips)
    .where(and(eq(clips.status, "uploading"), inArray(clips.uploadId, [...uploadIds])));
  return new Set(rows.map((r) => r.uploadId).filter((id): id is string => !!id));
}

export async function insertStill(values: typeof stills.$inferInsert) {
  const db = await getDb();
  const [row] = await db.insert(stills).values(values).returning();
  return row;
}

export async function getStillForInspector(stillId: string, inspectorId: string) {
  const db = await getDb();
  const [row] = await db
    .select({ still: stills, orderStatus: orders.status })
    .from(stills)
    .innerJoin(orders, eq(orders.id, stills.orderId))
    .where(and(eq(stills.id, stillId), eq(orders.inspectorId, inspectorId)))
    .limit(1);
  return row ?? null;
}

export async function markStillVerified(stillId: string) {
  const db = await getDb();
  await db.update(stills).set({ verifiedAt: new Date() }).where(and(eq(stills.id, stillId), isNull(stills.verifiedAt)));
}

/** Ids of this job's stills whose bytes were checked: the only ones a finding may point at. */
export async function verifiedStillIds(orderId: string): Promise<string[]> {
  const db = await getDb();
  const rows = await db.select({ id: stills.id }).from(stills).where(and(eq(stills.orderId, orderId), isNotNull(stills.verifiedAt)));
  return rows.map((r) => r.id);
}

export async function listStillsForOrder(orderId: string) {
  const db = await getDb();
  return db.select().from(stills).where(eq(stills.orderId, orderId)).orderBy(asc(stills.createdAt));
}

export async function deleteStill(stillId: string) {
  const db = await getDb();
  await db.delete(stills).where(eq(stills.id, stillId));
}

export type ClipView = {
  id: string;
  jobId: string;
  status: ClipStatus;
  label: string;
  sizeBytes: number;
  contentType: string;
  durationSeconds: number | null;
  startFootage: number | null;
  partSizeBytes: number;
  partCount: number;
  rejectedReason: string | null;
  posterUrl: string | null;
  createdAt: string;
  completedAt: string | null;
};

/** What a handler may send for a clip: never the object keys or the storage upload id. */
export function toClipView(c: Clip, posterUrl: string | null): ClipView {
  return {
    id: c.id,
    jobId: c.orderId,
    status: c.status,
    label: c.label,
    sizeBytes: c.sizeBytes,
    contentType: c.detectedType ?? c.declaredType,
    durationSeconds: c.durationSeconds,
    startFootage: c.startFootage,
    partSizeBytes: c.partSizeBytes,
    partCount: c.partCount,
    rejectedReason: c.rejectedReason,
    posterUrl,
    createdAt: c.createdAt.toISOString(),
    completedAt: c.completedAt?.toISOString() ?? null,
  };
}
