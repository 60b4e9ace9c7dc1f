import "server-only";

import { randomBytes } from "node:crypto";

import { and, desc, eq, isNull } from "drizzle-orm";

import { appUrl } from "@/lib/env";

import { getDb } from "../client";
import { shareLinks } from "../schema";
import { hashShareToken } from "./reports";

/** Only the token's hash is stored; the URL is shown once, at creation. */
export async function createShareLink(orderId: string, userId: string, opts: { label?: string; days: number }) {
  const db = await getDb();
  const token = randomBytes(24).toString("base64url");
  const [row] = await db
    .insert(shareLinks)
    .values({ orderId, createdBy: userId, tokenHash: hashShareToken(token), label: opts.label || null, expiresAt: new Date(Date.now() + opts.days * 86_400_000) })
    .returning();
  return { id: row.id, url: `${appUrl()}/s/${token}`, label: row.label, expiresAt: row.expiresAt.toISOString(), revokedAt: null, createdAt: row.createdAt.toISOString() };
}

export async function listShareLinks(orderId: string, userId: string) {
  const db = await getDb();
  const rows = await db.select().from(shareLinks).where(and(eq(shareLinks.orderId, orderId), eq(shareLinks.createdBy, userId))).orderBy(desc(shareLinks.createdAt));
  return rows.map((r) => ({ id: r.id, url: null, label: r.label, expiresAt: r.expiresAt.toISOString(), revokedAt: r.revokedAt?.toISOString() ?? null, createdAt: r.createdAt.toISOString() }));
}

export async function revokeShareLink(orderId: string, userId: string, shareId: string) {
  const db = await getDb();
  const rows = await db
    .update(shareLinks)
    .set({ revokedAt: new Date() })
    .where(and(eq(shareLinks.id, shareId), eq(shareLinks.orderId, orderId), eq(shareLinks.createdBy, userId), isNull(shareLinks.revokedAt)))
    .returning({ id: shareLinks.id });
  return rows.length > 0;
}
