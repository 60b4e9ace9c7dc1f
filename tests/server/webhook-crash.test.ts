import fs from "node:fs";
import path from "node:path";

import { PGlite } from "@electric-sql/pglite";
import { afterAll, describe, expect, it } from "vitest";

import { appPorts, startApp, tempDataDir, type AppProcess } from "../utils/app-process";
import { signIn } from "../utils/http-session";

const dataDir = tempDataDir("r4");
const running: AppProcess[] = [];
const SUCCESS_CARD = { card_number: "4242 4242 4242 4242", exp: "12 / 34", cvc: "123" };

afterAll(async () => {
  for (const app of running) await app.stop(5_000);
  fs.rmSync(dataDir, { recursive: true, force: true });
});

async function countsFor(orderId: string, eventId: string) {
  const db = await PGlite.create(path.join(dataDir, "db"));
  try {
    const one = async (q: string) => (await db.query<{ n: number }>(q, [orderId])).rows[0].n;
    return {
      status: (await db.query<{ status: string }>("select status from orders where id = $1", [orderId])).rows[0].status,
      paid: await one("select count(*)::int as n from payments where order_id = $1 and status = 'paid'"),
      access: await one("select count(*)::int as n from report_access where order_id = $1"),
      ledger: await one("select count(*)::int as n from ledger_entries where order_id = $1"),
      payouts: await one("select count(*)::int as n from payouts p join payments y on y.id = p.payment_id where y.order_id = $1"),
      unlockEvents: await one("select count(*)::int as n from order_events where order_id = $1 and to_status = 'unlocked'"),
      receipts: await one(
        "select count(*)::int as n from mail_outbox m join payments y on m.dedupe_key = 'payment:' || y.id || ':receipt' where y.order_id = $1",
      ),
      eventRows: (await db.query<{ n: number }>("select count(*)::int as n from webhook_events where id = $1", [eventId])).rows[0].n,
    };
  } finally {
    await db.close();
  }
}

describe("R4 the server killed between recording a webhook event and acting on it", () => {
  it("R4: after kill and restart the replayed checkout-completed event unlocks exactly once", async () => {
    const ports = await appPorts();
    const standin = `http://127.0.0.1:${ports.payments}`;
    const app = await startApp({ dataDir, ports, env: { GRADELINE_CRASH_AT: "webhook-recorded:checkout.session.completed" } });
    running.push(app);
    const buyer = await signIn("buyer@gradeline.test", "gradeline-demo", app.url);
    const list = (await (await fetch(`${app.url}/api/reports`, { headers: { cookie: buyer.cookie } })).json()) as {
      reports: { id: string; status: string; street: string }[];
    };
    const report = list.reports.find((r) => r.status === "delivered" && r.street === "42 Sluice Gate Way")!;
    expect(report).toBeTruthy();
    const started = await fetch(`${app.url}/api/reports/${report.id}/checkout`, {
      method: "POST",
      headers: { cookie: buyer.cookie, origin: app.url },
    });
    expect(started.status).toBe(200);
    const { url } = (await started.json()) as { url: string };
    const sessionId = new URL(url).pathname.split("/pay/")[1];

    // Paying makes the provider send checkout.session.completed; the app dies inside that transaction.
    await fetch(url, { method: "POST", body: new URLSearchParams({ action: "pay", ...SUCCESS_CARD }), redirect: "manual" }).catch(
      () => undefined,
    );
    const killed = await Promise.race([app.exited, new Promise<null>((r) => setTimeout(() => r(null), 30_000))]);
    expect(killed).toEqual({ code: null, signal: "SIGKILL" });

    const again = await startApp({ dataDir, ports });
    running.push(again);
    const events = (await (await fetch(`${standin}/_standin/events?type=checkout.session.completed`)).json()) as {
      data: { event: { id: string; data: { object: { id: string } } } }[];
    };
    const event = events.data.map((d) => d.event).find((e) => e.data.object.id === sessionId)!;
    expect(event).toBeTruthy();
    const view = async () =>
      (await (await fetch(`${again.url}/api/reports/${report.id}`, { headers: { cookie: buyer.cookie } })).json()) as { locked: boolean };
    expect((await view()).locked).toBe(true);

    // The provider replays the event: twice at once, then once more.
    await Promise.all([
      fetch(`${standin}/_standin/resend/${event.id}`, { method: "POST" }),
      fetch(`${standin}/_standin/resend/${event.id}`, { method: "POST" }),
    ]);
    await fetch(`${standin}/_standin/resend/${event.id}`, { method: "POST" });
    expect((await view()).locked).toBe(false);
    expect((await again.stop()).code).toBe(0);

    expect(await countsFor(report.id, event.id)).toEqual({
      status: "unlocked",
      paid: 1,
      access: 1,
      ledger: 2,
      payouts: 1,
      unlockEvents: 1,
      receipts: 1,
      eventRows: 1,
    });
  }, 240_000);
});
