import "server-only";

import { createHash } from "node:crypto";

import { and, count, desc, eq, gt, inArray, isNotNull, isNull, or } from "drizzle-orm";

import type { Role } from "@/db/schema";
import type { Evaluation } from "@/lib/engine";
import { localIsoDate } from "@/lib/format";
import { UNLOCK_INCLUDES, type ReportPreview, type ReportRecord, type ReportSummary, type ReportView } from "@/lib/reports/dto";
import { signedDownloadUrl } from "@/lib/storage/client";

import { getDb } from "../client";
import { clips, inspectorProfiles, inspections, listings, orders, payments, reportAccess, shareLinks, stills, users } from "../schema";

export type Viewer = { id: string; role: Role; email: string };

const REPORT_STATES = ["delivered", "unlocked", "refunded"] as const;

async function loadReportOrder(orderId: string) {
  const db = await getDb();
  const [row] = await db
    .select({ order: orders, listing: listings, inspectorName: users.name, inspectorCompany: users.company, licenceNumber: inspectorProfiles.licenceNumber })
    .from(orders)
    .innerJoin(listings, eq(listings.id, orders.listingId))
    .leftJoin(users, eq(users.id, orders.inspectorId))
    .leftJoin(inspectorProfiles, eq(inspectorProfiles.userId, orders.inspectorId))
    .where(and(eq(orders.id, orderId), inArray(orders.status, [...REPORT_STATES])))
    .limit(1);
  return row ?? null;
}

type ReportOrder = NonNullable<Awaited<ReturnType<typeof loadReportOrder>>>;

/** A reuse order reads the record, clips and stills of the report it resells. */
const sourceOf = (r: ReportOrder) => r.order.reuseOfOrderId ?? r.order.id;

async function hasAccess(orderId: string, userId: string) {
  const db = await getDb();
  const [row] = await db
    .select({ id: reportAccess.id })
    .from(reportAccess)
    .where(and(eq(reportAccess.orderId, orderId), eq(reportAccess.userId, userId), isNull(reportAccess.revokedAt)))
    .limit(1);
  return !!row;
}

async function anyoneUnlocked(orderId: string) {
  const db = await getDb();
  const [row] = await db.select({ n: count() }).from(reportAccess).where(and(eq(reportAccess.orderId, orderId), isNull(reportAccess.revokedAt)));
  return Number(row?.n ?? 0) > 0;
}

/** "summary" for those entitled to the rated summary, "preview" for the invited buyer before paying, null for everyone else. */
export async function reportAccessFor(r: ReportOrder, viewer: Viewer): Promise<"summary" | "preview" | null> {
  const o = r.order;
  switch (viewer.role) {
    case "admin":
      return "summary";
    case "agent":
      return o.agentId === viewer.id && (await anyoneUnlocked(o.id)) ? "summary" : null;
    case "buyer": {
      if (await hasAccess(o.id, viewer.id)) return "summary";
      const invited = o.buyerId === viewer.id || o.buyerEmail === viewer.email;
      return invited ? "preview" : null;
    }
    default:
      return null;
  }
}

/** Whether this viewer may see the report at all (its preview or its summary), without building it. */
export async function canSeeReport(orderId: string, viewer: Viewer): Promise<boolean> {
  const r = await loadReportOrder(orderId);
  return !!r && (await reportAccessFor(r, viewer)) !== null;
}

async function preview(r: ReportOrder, viewerId: string | null): Promise<ReportPreview> {
  const db = await getDb();
  const [[clipCount], [inspection], [payment]] = await Promise.all([
    db.select({ n: count() }).from(clips).where(and(eq(clips.orderId, sourceOf(r)), eq(clips.status, "ready"))),
    db.select({ evaluation: inspections.evaluation }).from(inspections).where(eq(inspections.orderId, sourceOf(r))).limit(1),
    viewerId
      ? db.select({ status: payments.status, createdAt: payments.createdAt }).from(payments).where(and(eq(payments.orderId, r.order.id), eq(payments.buyerId, viewerId))).orderBy(desc(payments.createdAt)).limit(1)
      : Promise.resolve([]),
  ]);
  const visitDay = r.order.appointmentStart ?? r.order.deliveredAt;
  const surveyed = (inspection?.evaluation as { lengths?: { surveyed?: number } } | null)?.lengths?.surveyed;
  return {
    id: r.order.id,
    locked: true,
    address: { street: r.listing.street, unit: r.listing.unit, city: r.listing.city, state: r.listing.state, postalCode: r.listing.postalCode },
    visitedOn: visitDay ? localIsoDate(visitDay, r.order.timeZone) : null,
    deliveredAt: r.order.deliveredAt?.toISOString() ?? null,
    timeZone: r.order.timeZone,
    inspector: r.inspectorName ? { name: r.inspectorName, company: r.inspectorCompany, licenceNumber: r.licenceNumber } : null,
    clipCount: Number(clipCount?.n ?? 0),
    surveyedFt: typeof surveyed === "number" ? surveyed : null,
    priceCents: r.order.priceCents,
    unlockIncludes: UNLOCK_INCLUDES,
    payment: payment ? { status: payment.status, createdAt: payment.createdAt.toISOString() } : null,
  };
}

async function summary(r: ReportOrder, viewerId: string | null): Promise<ReportSummary | null> {
  const db = await getDb();
  const [inspection] = await db.select().from(inspections).where(eq(inspections.orderId, sourceOf(r))).limit(1);
  if (!inspection?.evaluation) return null;
  const [base, clipRows, stillRows] = await Promise.all([
    preview(r, viewerId),
    db.select().from(clips).where(and(eq(clips.orderId, sourceOf(r)), eq(clips.status, "ready"))).orderBy(clips.createdAt),
    db.select().from(stills).where(and(eq(stills.orderId, sourceOf(r)), isNotNull(stills.verifiedAt))),
  ]);
  const reportClips = await Promise.all(
    clipRows.map(async (c) => ({
      id: c.id,
      label: c.label,
      durationSeconds: c.durationSeconds,
      startFootage: c.startFootage,
      playbackUrl: await signedDownloadUrl(c.objectKey, { contentType: c.detectedType ?? "video/mp4", expiresIn: 3600 }),
      posterUrl: c.posterKey ? await signedDownloadUrl(c.posterKey, { contentType: "image/jpeg", expiresIn: 3600 }) : null,
    })),
  );
  const stillUrls: Record<string, string> = {};
  for (const s of stillRows) stillUrls[s.id] = await signedDownloadUrl(s.objectKey, { contentType: "image/jpeg", expiresIn: 3600 });
  const evaluation = inspection.evaluation as unknown as Evaluation;
  return {
    ...base,
    locked: false,
    record: inspection.record as ReportRecord,
    evaluation,
    narrative: inspection.narrative,
    recommendation: inspection.recommendation,
    clips: reportClips,
    stills: stillUrls,
    engineVersion: inspection.engineVersion ?? evaluation.engineVersion,
    observedOn: base.visitedOn,
  };
}

/** The report as this viewer may see it; a buyer who has not paid never gets findings, ratings, costs or clip URLs. */
export async function getReportView(orderId: string, viewer: Viewer): Promise<ReportView | null> {
  const r = await loadReportOrder(orderId);
  if (!r) return null;
  const access = await reportAccessFor(r, viewer);
  if (access === "summary") return (await summary(r, viewer.id)) ?? preview(r, viewer.id);
  if (access === "preview") return preview(r, viewer.id);
  return null;
}

export const hashShareToken = (token: string) => createHash("sha256").update(token).digest("hex");

export async function getSharedReport(token: string): Promise<(ReportSummary & { shareExpiresAt: string }) | null> {
  if (!/^[A-Za-z0-9_-]{20,100}$/.test(token)) return null;
  const db = await getDb();
  const [link] = await db
    .select()
    .from(shareLinks)
    .where(and(eq(shareLinks.tokenHash, hashShareToken(token)), isNull(shareLinks.revokedAt), gt(shareLinks.expiresAt, new Date())))
    .limit(1);
  if (!link) return null;
  const r = await loadReportOrder(link.orderId);
  if (!r || !(await hasAccess(link.orderId, link.createdBy))) return null;
  const s = await summary(r, null);
  return s ? { ...s, shareExpiresAt: link.expiresAt.toISOString() } : null;
}

/** The buyer's reports (invited or unlocked) or an agent's unlocked ones. */
export async function listReportsForViewer(viewer: Viewer) {
  const db = await getDb();
  const base = db
    .select({ id: orders.id, status: orders.status, street: listings.street, city: listings.city, postalCode: listings.postalCode, deliveredAt: orders.deliveredAt, priceCents: orders.priceCents, inspectorName: users.name })
    .from(orders)
    .innerJoin(listings, eq(listings.id, orders.listingId))
    .leftJoin(users, eq(users.id, orders.inspectorId));
  const rows =
    viewer.role === "buyer"
      ? await base.where(and(inArray(orders.status, [...REPORT_STATES]), or(eq(orders.buyerId, viewer.id), eq(orders.buyerEmail, viewer.email)))).orderBy(desc(orders.deliveredAt))
      : viewer.role === "agent"
        ? await base.where(and(eq(orders.agentId, viewer.id), inArray(orders.status, ["unlocked"]))).orderBy(desc(orders.deliveredAt))
        : await base.where(inArray(orders.status, [...REPORT_STATES])).orderBy(desc(orders.deliveredAt)).limit(200);
  const unlocked = new Set(
    viewer.role === "buyer"
      ? (await db.select({ orderId: reportAccess.orderId }).from(reportAccess).where(and(eq(reportAccess.userId, viewer.id), isNull(reportAccess.revokedAt)))).map((a) => a.orderId)
      : rows.map((r) => r.id),
  );
  return rows.map((r) => ({ ...r, deliveredAt: r.deliveredAt?.toISOString() ?? null, locked: !unlocked.has(r.id) }));
}
