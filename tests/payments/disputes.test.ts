import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { POST as close } from "@/app/api/admin/disputes/[id]/close/route";
import { POST as message } from "@/app/api/admin/disputes/[id]/messages/route";
import { GET as queue } from "@/app/api/admin/disputes/route";
import { POST as openDispute } from "@/app/api/reports/[id]/disputes/route";
import { GET as getReport } from "@/app/api/reports/[id]/route";
import { getDb } from "@/db/client";
import { disputes, mailOutbox, payments } from "@/db/schema";

import { unlockedReport } from "../utils/payments";
import { call } from "../utils/session";
import { signedIn } from "../utils/world";

describe("disputes", () => {
  it("a buyer opens one; the admin writes to the inspector and closes it with a refund that locks the report", async () => {
    const r = await unlockedReport();
    const admin = await signedIn("admin");
    const opened = await call(openDispute, { method: "POST", params: { id: r.id }, body: { reason: "unreadable_clips", message: "The second clip will not play at all." }, cookie: r.buyer.cookie });
    expect(opened.status).toBe(201);
    expect((await call(openDispute, { method: "POST", params: { id: r.id }, body: { reason: "other", message: "And another thing to say." }, cookie: r.buyer.cookie })).status).toBe(409);
    const list = await call(queue, { path: "/api/admin/disputes?status=open", cookie: admin.cookie });
    const found = (list.json.disputes as { id: string }[]).find((d) => d.id === opened.json.id);
    expect(found).toBeDefined();

    expect((await call(message, { method: "POST", params: { id: opened.json.id as string }, body: { to: "inspector", body: "Could you upload the clip again?" }, cookie: admin.cookie })).status).toBe(201);
    const db = await getDb();
    const toInspector = await db.select().from(mailOutbox).where(eq(mailOutbox.toAddress, r.inspector.user.email));
    expect(toInspector.some((m) => m.text.includes("Could you upload the clip again?"))).toBe(true);

    const closed = await call(close, { method: "POST", params: { id: opened.json.id as string }, body: { outcome: "refund", note: "Clip could not be recovered." }, cookie: admin.cookie });
    expect(closed.status).toBe(200);
    const [payment] = await db.select().from(payments).where(eq(payments.orderId, r.id));
    expect(payment.status).toBe("refunded");
    expect((await call(getReport, { params: { id: r.id }, cookie: r.buyer.cookie })).json.locked).toBe(true);
    expect((await call(close, { method: "POST", params: { id: opened.json.id as string }, body: { outcome: "refund", note: "again" }, cookie: admin.cookie })).status).toBe(409);
  });

  it("only the buyer or agent of the report may open one; the queue is admin-only", async () => {
    const r = await unlockedReport();
    const stranger = await signedIn("buyer");
    expect((await call(openDispute, { method: "POST", params: { id: r.id }, body: { reason: "other", message: "This is not my report." }, cookie: stranger.cookie })).status).toBe(404);
    expect((await call(openDispute, { method: "POST", params: { id: r.id }, body: { reason: "wrong_address", message: "Wrong house entirely here." }, cookie: r.agent.cookie })).status).toBe(201);
    expect((await call(queue, { cookie: r.agent.cookie })).status).toBe(404);
  });

  it("refuses an unknown reason, a too-short message and unknown fields with field errors, and opens nothing", async () => {
    const r = await unlockedReport();
    const post = (body: unknown) => call(openDispute, { method: "POST", params: { id: r.id }, body, cookie: r.buyer.cookie });
    const bad = await post({ reason: "too_expensive", message: "short" });
    expect(bad.status).toBe(400);
    expect(bad.json.error?.fieldErrors).toEqual({ reason: ["Choose what is wrong."], message: ["Say in a sentence or two what is wrong."] });
    expect((await post({ reason: "other", message: "A long enough message here.", status: "closed" })).status).toBe(400);
    const db = await getDb();
    expect(await db.$count(disputes, eq(disputes.orderId, r.id))).toBe(0);
  });
});
