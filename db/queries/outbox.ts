import "server-only";

import { and, eq, inArray, lte, sql } from "drizzle-orm";

import { getDb, type Tx } from "../client";
import { mailOutbox } from "../schema";

export type OutgoingMail = {
  /** One message per event: a second enqueue with the same key is ignored. */
  key: string;
  to: string;
  subject: string;
  text: string;
  html: string;
  attachments?: { filename: string; contentType: string; content: string }[];
};

export async function enqueueMail(mail: OutgoingMail, tx?: Tx) {
  const db = tx ?? (await getDb());
  await db
    .insert(mailOutbox)
    .values({ dedupeKey: mail.key, toAddress: mail.to, subject: mail.subject, text: mail.text, html: mail.html, attachments: mail.attachments ?? [] })
    .onConflictDoNothing({ target: mailOutbox.dedupeKey });
}

/** Claims due messages by pushing their next attempt out, so a crash mid-send retries later. */
export async function claimDueMail(limit = 10) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const due = await tx
      .select({ id: mailOutbox.id })
      .from(mailOutbox)
      .where(and(eq(mailOutbox.status, "pending"), lte(mailOutbox.nextAttemptAt, sql`now()`)))
      .orderBy(mailOutbox.createdAt)
      .limit(limit)
      .for("update", { skipLocked: true });
    if (due.length === 0) return [];
    return tx
      .update(mailOutbox)
      .set({
        attempts: sql`${mailOutbox.attempts} + 1`,
        nextAttemptAt: sql`now() + (interval '15 seconds' * power(2, least(${mailOutbox.attempts}, 8)))`,
      })
      .where(inArray(mailOutbox.id, due.map((d) => d.id)))
      .returning();
  });
}

export async function markMailSent(id: string) {
  const db = await getDb();
  await db.update(mailOutbox).set({ status: "sent", sentAt: new Date(), lastError: null }).where(eq(mailOutbox.id, id));
}

export async function markMailFailed(id: string, error: string, giveUp: boolean) {
  const db = await getDb();
  await db
    .update(mailOutbox)
    .set({ lastError: error.slice(0, 500), ...(giveUp ? { status: "failed" as const } : {}) })
    .where(eq(mailOutbox.id, id));
}

export async function listMail(limit = 100) {
  const db = await getDb();
  return db.select().from(mailOutbox).orderBy(sql`${mailOutbox.createdAt} desc`).limit(limit);
}
