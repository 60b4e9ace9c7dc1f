import "server-only";

import fs from "node:fs";
import path from "node:path";

import { and, eq, inArray } from "drizzle-orm";

import { CLAY_LATERAL_1950S, DEMO_RATE_TABLE, evaluate, PVC_LATERAL_1990S } from "@/lib/engine";
import { putObject } from "@/lib/storage/client";
import { objectKey } from "@/lib/storage/keys";

import { getDb } from "./client";
import { auditLog, clips, inspections, ledgerEntries, listings, orderEvents, orders, payments, payouts, reportAccess } from "./schema";

const MEDIA = path.join(process.cwd(), "db", "demo-media");
const DEMO_CLIPS = [
  { file: "clay-joints", startFootage: 0, durationSeconds: 10 },
  { file: "roots-at-joint", startFootage: 18, durationSeconds: 12 },
  { file: "sag-water", startFootage: 42, durationSeconds: 8 },
];

const NARRATIVES = {
  clay: {
    narrative:
      "The line leaves the basement in cast iron, changes to a short PVC repair and then runs in clay to the main. Roots enter at several clay joints, the line holds water for about eight feet near mid-yard, and there is a fracture just past the sag. The public part near the street shows an offset joint and some deposits.",
    recommendation:
      "Have the roots cut and the line re-scoped, then get quotes for lining the clay section or replacing the sag and fracture stretch. Report the public-side offset to the city.",
  },
  pvc: {
    narrative:
      "A PVC lateral in good shape from the outside cleanout to the main, with a thin grease film mid-run and no structural defects seen.",
    recommendation: "No repair needed. Keep grease out of the drains; a re-check in five years is reasonable.",
  },
};

/** Gives the demo world's delivered reports their clips, records and (for the unlocked one) its payment. */
export async function seedDemoReports(): Promise<void> {
  const db = await getDb();
  const rows = await db
    .select({ order: orders, street: listings.street })
    .from(orders)
    .innerJoin(listings, eq(listings.id, orders.listingId))
    .where(inArray(orders.status, ["delivered", "unlocked", "refunded"]));
  for (const { order, street } of rows) {
    const [done] = await db.select({ id: inspections.orderId }).from(inspections).where(eq(inspections.orderId, order.id)).limit(1);
    if (done || !order.inspectorId) continue;
    const clay = /Sluice|Cooper/.test(street);
    const clipIds: string[] = [];
    for (const c of clay ? DEMO_CLIPS : DEMO_CLIPS.slice(0, 1)) {
      const video = fs.readFileSync(path.join(MEDIA, `${c.file}.mp4`));
      const poster = fs.readFileSync(path.join(MEDIA, `${c.file}.jpg`));
      const key = objectKey("clips", order.id, "mp4");
      const posterKey = objectKey("posters", order.id, "jpg");
      await putObject(key, video, "video/mp4");
      await putObject(posterKey, poster, "image/jpeg");
      const [clip] = await db
        .insert(clips)
        .values({
          orderId: order.id,
          inspectorId: order.inspectorId,
          status: "ready",
          label: `${c.file}.mp4`,
          sizeBytes: video.length,
          declaredType: "video/mp4",
          detectedType: "video/mp4",
          objectKey: key,
          uploadId: null,
          partSizeBytes: 8 << 20,
          partCount: 1,
          durationSeconds: c.durationSeconds,
          startFootage: c.startFootage,
          posterKey,
          completedAt: order.deliveredAt,
        })
        .returning({ id: clips.id });
      clipIds.push(clip.id);
    }
    const base = clay ? CLAY_LATERAL_1950S : PVC_LATERAL_1990S;
    const record = clay
      ? {
          ...base,
          findings: base.findings.map((f) =>
            f.at === 9
              ? { ...f, clipId: clipIds[0], clipSecond: 7.5 }
              : f.at === 19.5
                ? { ...f, clipId: clipIds[1], clipSecond: 1.5 }
                : f.at === 28.5
                  ? { ...f, clipId: clipIds[1], clipSecond: 10.5 }
                  : f.at === 44
                    ? { ...f, clipId: clipIds[2], clipSecond: 1.8 }
                    : f,
          ),
        }
      : base;
    const evaluation = evaluate(record, { rates: DEMO_RATE_TABLE });
    const text = clay ? NARRATIVES.clay : NARRATIVES.pvc;
    await db.insert(inspections).values({
      orderId: order.id,
      record: record as unknown as Record<string, unknown>,
      ...text,
      revision: 1,
      evaluation: evaluation as unknown as Record<string, unknown>,
      engineVersion: evaluation.engineVersion,
      ratesId: "demo",
      submittedAt: order.deliveredAt,
    });
    if ((order.status === "unlocked" || order.status === "refunded") && order.buyerId) {
      const paidAt = order.unlockedAt ?? new Date();
      const [refundEvent] = await db
        .select({ at: orderEvents.at, actorId: orderEvents.actorId, reason: orderEvents.reason })
        .from(orderEvents)
        .where(and(eq(orderEvents.orderId, order.id), eq(orderEvents.toStatus, "refunded")))
        .limit(1);
      const refundedAt = refundEvent?.at ?? paidAt;
      await db.transaction(async (tx) => {
        const refunded = order.status === "refunded";
        const [payment] = await tx
          .insert(payments)
          .values({
            orderId: order.id,
            buyerId: order.buyerId!,
            amountCents: order.priceCents,
            status: refunded ? "refunded" : "paid",
            refundedCents: refunded ? order.priceCents : 0,
            checkoutSessionId: `cs_demo_${order.id.slice(0, 8)}`,
            paidAt,
            createdAt: paidAt,
          })
          .returning();
        await tx
          .insert(reportAccess)
          .values({
            orderId: order.id,
            userId: order.buyerId!,
            paymentId: payment.id,
            grantedAt: paidAt,
            revokedAt: refunded ? refundedAt : null,
          });
        await tx.insert(ledgerEntries).values([
          {
            orderId: order.id,
            paymentId: payment.id,
            kind: "charge",
            amountCents: order.priceCents,
            externalId: payment.checkoutSessionId,
            createdAt: paidAt,
          },
          {
            orderId: order.id,
            paymentId: payment.id,
            kind: "fee",
            amountCents: order.platformFeeCents,
            externalId: `fee-${payment.checkoutSessionId}`,
            createdAt: paidAt,
          },
          ...(refunded
            ? [
                {
                  orderId: order.id,
                  paymentId: payment.id,
                  kind: "refund" as const,
                  amountCents: order.priceCents,
                  externalId: `re_demo_${order.id.slice(0, 8)}`,
                  createdAt: refundedAt,
                },
                // The payout was never sent, so the whole refund beyond the inspector's share comes out of the fee.
                {
                  orderId: order.id,
                  paymentId: payment.id,
                  kind: "fee" as const,
                  amountCents: -order.platformFeeCents,
                  externalId: `fee-re_demo_${order.id.slice(0, 8)}`,
                  createdAt: refundedAt,
                },
              ]
            : []),
        ]);
        if (refunded && refundEvent) {
          await tx.insert(auditLog).values({
            at: refundedAt,
            actorId: refundEvent.actorId,
            action: "payments.refund",
            targetType: "payment",
            targetId: payment.id,
            data: {
              amountCents: order.priceCents,
              reason: refundEvent.reason,
              reverseTransfer: true,
              noReversalReason: null,
              refundId: `re_demo_${order.id.slice(0, 8)}`,
            },
          });
        }
        await tx
          .insert(payouts)
          .values({
            paymentId: payment.id,
            inspectorId: order.inspectorId!,
            amountCents: order.priceCents - order.platformFeeCents,
            status: refunded ? "reversed" : "waiting",
            reversedCents: refunded ? order.priceCents - order.platformFeeCents : 0,
            createdAt: paidAt,
          });
      });
    }
  }
}
