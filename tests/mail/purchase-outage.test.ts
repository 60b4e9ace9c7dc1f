import { inArray } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { getDb } from "@/db/client";
import { mailOutbox, orders } from "@/db/schema";
import { processOutbox } from "@/lib/mail/outbox-worker";
import { readCaughtMail } from "@/services/mail-catcher";

import { freePort } from "../utils/free-port";
import { deliver, unlockedReport } from "../utils/payments";

const g = globalThis as unknown as { __gradelineMailer?: unknown; __gradelineEnv?: unknown };

function pointMailAt(port: string) {
  process.env.SMTP_PORT = port;
  g.__gradelineMailer = undefined;
  g.__gradelineEnv = undefined;
}

const caughtFor = (to: string) => readCaughtMail(process.env.MAIL_DIR!).filter((m) => m.to.includes(to));

describe("R16 the mail server down during purchases", () => {
  it("R16: purchases unlock while mail is down; each message waits in the outbox and goes out once per event after recovery", async () => {
    const realPort = process.env.SMTP_PORT!;
    pointMailAt(String(await freePort()));
    let purchases: Awaited<ReturnType<typeof unlockedReport>>[] = [];
    try {
      purchases = [await unlockedReport(), await unlockedReport(), await unlockedReport()];
      for (const p of purchases) expect(p.delivered).toMatchObject({ status: 200, json: { outcome: "unlocked" } });
      // The provider retries its webhook meanwhile: nothing is queued twice.
      for (const p of purchases) expect((await deliver(p.event)).status).toBe(200);

      const db = await getDb();
      const ids = purchases.map((p) => p.id);
      expect((await db.select({ s: orders.status }).from(orders).where(inArray(orders.id, ids))).map((o) => o.s)).toEqual([
        "unlocked",
        "unlocked",
        "unlocked",
      ]);

      // Five minutes of the worker's retries (about five attempts with its backoff), each one failing.
      for (let attempt = 0; attempt < 5; attempt++) {
        await db.update(mailOutbox).set({ nextAttemptAt: new Date(0) });
        for (let batch = 0; batch < 20; batch++) {
          const run = await processOutbox();
          expect(run.sent).toBe(0);
          if (run.failed === 0) break;
        }
      }
      const waiting = (await db.select().from(mailOutbox)).filter((m) => purchases.some((p) => m.toAddress === p.buyer.user.email));
      expect(waiting.length).toBeGreaterThanOrEqual(3);
      for (const m of waiting) expect(m).toMatchObject({ status: "pending", sentAt: null });
      for (const m of waiting) expect(m.lastError).toBeTruthy();
    } finally {
      pointMailAt(realPort);
    }

    const db = await getDb();
    await db.update(mailOutbox).set({ nextAttemptAt: new Date(0) });
    for (let run = 0; run < 20 && (await processOutbox()).sent > 0; run++);
    for (const p of purchases) {
      const receipts = caughtFor(p.buyer.user.email).filter((m) => m.subject.startsWith("Receipt:"));
      expect(receipts, p.buyer.user.email).toHaveLength(1);
      expect(caughtFor(p.agent.user.email).filter((m) => m.subject.startsWith("Summary unlocked"))).toHaveLength(1);
    }
    // A further run and a late replay send nothing again.
    await deliver(purchases[0].event);
    await db.update(mailOutbox).set({ nextAttemptAt: new Date(0) });
    await processOutbox();
    expect(caughtFor(purchases[0].buyer.user.email).filter((m) => m.subject.startsWith("Receipt:"))).toHaveLength(1);
  }, 120_000);
});
