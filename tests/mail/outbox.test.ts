import net from "node:net";

import { describe, expect, it } from "vitest";

import { getDb } from "@/db/client";
import { enqueueMail } from "@/db/queries/outbox";
import { mailOutbox } from "@/db/schema";
import { processOutbox } from "@/lib/mail/outbox-worker";
import { renderMail } from "@/lib/mail/render";
import { readCaughtMail } from "@/services/mail-catcher";

const mailDir = () => process.env.MAIL_DIR!;
const caughtFor = (to: string) => readCaughtMail(mailDir()).filter((m) => m.to.includes(to));

describe("the mail outbox", () => {
  it("sends a queued message once, with plain-text and HTML parts", async () => {
    const to = `once-${Date.now()}@example.test`;
    const body = renderMail({ heading: "Your scope is booked", paragraphs: ["See you Tuesday."], action: { label: "Open the order", path: "/orders/1" } });
    await enqueueMail({ key: `test:${to}`, to, subject: "Booked", ...body });
    await enqueueMail({ key: `test:${to}`, to, subject: "Booked", ...body });
    await processOutbox();
    await processOutbox();
    const caught = caughtFor(to);
    expect(caught).toHaveLength(1);
    expect(caught[0].text).toContain("See you Tuesday.");
    expect(caught[0].text).toContain("http://127.0.0.1:3999/orders/1");
    expect(caught[0].html).toContain("<h1");
  });

  it("keeps a message pending while the mail server is down, then sends it once after recovery", async () => {
    const to = `later-${Date.now()}@example.test`;
    await enqueueMail({ key: `test:${to}`, to, subject: "Later", ...renderMail({ heading: "Later", paragraphs: ["x"] }) });
    const realPort = process.env.SMTP_PORT!;
    const closed = await new Promise<number>((resolve) => {
      const s = net.createServer();
      s.listen(0, "127.0.0.1", () => {
        const port = (s.address() as net.AddressInfo).port;
        s.close(() => resolve(port));
      });
    });
    const g = globalThis as unknown as { __gradelineMailer?: unknown; __gradelineEnv?: unknown };
    process.env.SMTP_PORT = String(closed);
    g.__gradelineMailer = undefined;
    g.__gradelineEnv = undefined;
    const down = await processOutbox();
    expect(down.failed).toBeGreaterThanOrEqual(1);
    const db = await getDb();
    const [row] = (await db.select().from(mailOutbox)).filter((m) => m.toAddress === to);
    expect(row.status).toBe("pending");
    expect(row.lastError).toBeTruthy();

    process.env.SMTP_PORT = realPort;
    g.__gradelineMailer = undefined;
    g.__gradelineEnv = undefined;
    await db.update(mailOutbox).set({ nextAttemptAt: new Date(0) });
    await processOutbox();
    await processOutbox();
    expect(caughtFor(to)).toHaveLength(1);
  });
});
