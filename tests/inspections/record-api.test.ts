import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { POST as evaluate } from "@/app/api/evaluate/route";
import { PUT as saveDraft } from "@/app/api/jobs/[id]/draft/route";
import { GET as getInspection } from "@/app/api/jobs/[id]/inspection/route";
import { POST as submit } from "@/app/api/jobs/[id]/submit/route";
import { POST as accept } from "@/app/api/jobs/[id]/accept/route";
import { POST as createOrder } from "@/app/api/orders/route";
import { getDb } from "@/db/client";
import { clips, mailOutbox, orders, stills } from "@/db/schema";
import { CLAY_LATERAL_1950S } from "@/lib/engine";

import { call } from "../utils/session";
import { orderInput, signedIn, verifiedInspector } from "../utils/world";

const NARRATIVE = "Clay lateral with root intrusion at several joints and a sag holding water near the property line.";

async function acceptedJob() {
  const inspector = await verifiedInspector(["97991"]);
  const agent = await signedIn("agent");
  const buyerEmail = `buyer-${Math.random().toString(36).slice(2)}@example.test`;
  const order = await call(createOrder, { method: "POST", body: orderInput({ buyer: { name: "Jordan Avery", email: buyerEmail } }), cookie: agent.cookie });
  const id = order.json.id as string;
  await call(accept, { method: "POST", params: { id }, cookie: inspector.cookie });
  return { id, inspector, agent, buyerEmail };
}

async function addReadyClip(orderId: string, inspectorId: string) {
  const db = await getDb();
  const [clip] = await db
    .insert(clips)
    .values({ orderId, inspectorId, status: "ready", label: "run-1.mp4", sizeBytes: 1000, declaredType: "video/mp4", detectedType: "video/mp4", objectKey: `clips/${orderId}/${Math.random()}`, partSizeBytes: 8 << 20, partCount: 1, durationSeconds: 12 })
    .returning();
  return clip.id;
}

describe("POST /api/evaluate", async () => {
  const inspector = await signedIn("inspector");
  it("evaluates a valid record", async () => {
    const res = await call(evaluate, { method: "POST", body: { record: CLAY_LATERAL_1950S }, cookie: inspector.cookie });
    expect(res.status).toBe(200);
    expect((res.json.evaluation as { severity: number }).severity).toBeGreaterThanOrEqual(1);
  });
  it("answers each problem with its path", async () => {
    const bad = { ...CLAY_LATERAL_1950S, segments: [{ from: 0, to: 10, material: "pvc", diameterIn: 4 }, { from: 12, to: 20, material: "pvc", diameterIn: 4 }] };
    const res = await call(evaluate, { method: "POST", body: { record: bad }, cookie: inspector.cookie });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error?.fieldErrors ?? {}).some((k) => k.startsWith("segments["))).toBe(true);
  });
  it("is refused to agents and buyers", async () => {
    for (const role of ["agent", "buyer"] as const) {
      const other = await signedIn(role);
      expect((await call(evaluate, { method: "POST", body: { record: CLAY_LATERAL_1950S }, cookie: other.cookie })).status).toBe(403);
    }
  });
});

describe("drafts and submit", () => {
  it("saves a draft, refuses a stale one from another tab, and keeps the later revision", async () => {
    const { id, inspector } = await acceptedJob();
    const first = await call(saveDraft, { method: "PUT", params: { id }, body: { record: { segments: [] }, narrative: "", recommendation: "", baseRevision: 0 }, cookie: inspector.cookie });
    expect(first.json).toEqual({ revision: 1 });
    const tabA = await call(saveDraft, { method: "PUT", params: { id }, body: { record: { segments: [{ from: 0 }] }, narrative: "a", recommendation: "", baseRevision: 1 }, cookie: inspector.cookie });
    expect(tabA.json).toEqual({ revision: 2 });
    const tabB = await call(saveDraft, { method: "PUT", params: { id }, body: { record: { segments: [] }, narrative: "b", recommendation: "", baseRevision: 1 }, cookie: inspector.cookie });
    expect(tabB.status).toBe(409);
    expect(tabB.json).toMatchObject({ currentRevision: 2 });
    const current = await call(getInspection, { params: { id }, cookie: inspector.cookie });
    expect(current.json.inspection).toMatchObject({ narrative: "a", revision: 2 });
  });

  it("answers 404 to another inspector and the agent", async () => {
    const { id, agent } = await acceptedJob();
    const other = await verifiedInspector(["97991"]);
    for (const cookie of [other.cookie, agent.cookie]) {
      const res = await call(getInspection, { params: { id }, cookie });
      expect([403, 404]).toContain(res.status);
    }
    expect((await call(saveDraft, { method: "PUT", params: { id }, body: { record: {}, narrative: "", recommendation: "", baseRevision: 0 }, cookie: other.cookie })).status).toBe(404);
  });

  it("lists every problem with its field and changes nothing", async () => {
    const { id, inspector } = await acceptedJob();
    await call(saveDraft, { method: "PUT", params: { id }, body: { record: { ...CLAY_LATERAL_1950S, findings: [{ at: 500, type: "roots", grade: 3 }] }, narrative: "", recommendation: "", baseRevision: 0 }, cookie: inspector.cookie });
    const res = await call(submit, { method: "POST", params: { id }, body: { baseRevision: 1 }, cookie: inspector.cookie });
    expect(res.status).toBe(400);
    const fields = Object.keys(res.json.error?.fieldErrors ?? {});
    expect(fields).toEqual(expect.arrayContaining(["clips", "narrative"]));
    expect(fields.some((f) => f.startsWith("findings[0]"))).toBe(true);
    const db = await getDb();
    const [order] = await db.select().from(orders).where(eq(orders.id, id));
    expect(order.status).toBe("accepted");
  });

  it("refuses a finding whose still frame was never verified (its upload did not finish)", async () => {
    const { id, inspector } = await acceptedJob();
    await addReadyClip(id, inspector.user.id);
    const db = await getDb();
    const [unverified] = await db.insert(stills).values({ orderId: id, objectKey: `stills/${id}/never-arrived.jpg` }).returning();
    const findings = [{ ...CLAY_LATERAL_1950S.findings[0], stillId: unverified.id }];
    await call(saveDraft, { method: "PUT", params: { id }, body: { record: { ...CLAY_LATERAL_1950S, findings }, narrative: NARRATIVE, recommendation: "", baseRevision: 0 }, cookie: inspector.cookie });
    const res = await call(submit, { method: "POST", params: { id }, body: { baseRevision: 1 }, cookie: inspector.cookie });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error?.fieldErrors ?? {})).toEqual(["findings[0].stillId"]);
    await db.update(stills).set({ verifiedAt: new Date() }).where(eq(stills.id, unverified.id));
    expect((await call(submit, { method: "POST", params: { id }, body: { baseRevision: 1 }, cookie: inspector.cookie })).status).toBe(200);
  });

  it("a good submit stores the evaluation with the engine version, delivers, and invites the buyer once", async () => {
    const { id, inspector, agent, buyerEmail } = await acceptedJob();
    await addReadyClip(id, inspector.user.id);
    await call(saveDraft, { method: "PUT", params: { id }, body: { record: CLAY_LATERAL_1950S, narrative: NARRATIVE, recommendation: "Clean the roots and line the clay section.", baseRevision: 0 }, cookie: inspector.cookie });
    const res = await call(submit, { method: "POST", params: { id }, body: { baseRevision: 1 }, cookie: inspector.cookie });
    expect(res.status).toBe(200);
    expect(res.json.order).toMatchObject({ status: "delivered" });
    const again = await call(submit, { method: "POST", params: { id }, body: { baseRevision: 1 }, cookie: inspector.cookie });
    expect(again.status).toBe(409);
    const inspection = await call(getInspection, { params: { id }, cookie: inspector.cookie });
    expect(inspection.json.inspection).toMatchObject({ submittedAt: expect.any(String), evaluation: expect.objectContaining({ engineVersion: expect.any(String) }) });
    const db = await getDb();
    const mail = await db.select().from(mailOutbox);
    const invitations = mail.filter((m) => m.toAddress === buyerEmail && m.subject.includes("is ready"));
    expect(invitations).toHaveLength(1);
    // The buyer has no account yet: the link signs them up as a buyer with that address, then opens the report.
    expect(invitations[0].text).toContain(`/sign-up?email=${encodeURIComponent(buyerEmail)}&role=buyer&next=${encodeURIComponent(`/reports/${id}`)}`);
    expect(mail.filter((m) => m.toAddress === agent.user.email && m.subject.startsWith("Report delivered"))).toHaveLength(1);
    const draftAfter = await call(saveDraft, { method: "PUT", params: { id }, body: { record: {}, narrative: "", recommendation: "", baseRevision: 1 }, cookie: inspector.cookie });
    expect(draftAfter.status).toBe(409);
  });
});
