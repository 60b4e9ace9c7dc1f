import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { POST as confirm } from "@/app/api/orders/[id]/appointment/route";
import { POST as cancel } from "@/app/api/orders/[id]/cancel/route";
import { GET as getOrder } from "@/app/api/orders/[id]/route";
import { POST as createOrder } from "@/app/api/orders/route";
import { POST as accept } from "@/app/api/jobs/[id]/accept/route";
import { POST as propose } from "@/app/api/jobs/[id]/appointments/route";
import { POST as release } from "@/app/api/jobs/[id]/release/route";
import { GET as board } from "@/app/api/jobs/route";
import { getDb } from "@/db/client";
import { mailOutbox } from "@/db/schema";

import { call } from "../utils/session";
import { orderInput, signedIn, verifiedInspector } from "../utils/world";

const HOUR = 3_600_000;
const at = (h: number) => new Date(Date.now() + h * HOUR).toISOString();

async function mailTo(email: string) {
  const db = await getDb();
  return db.select().from(mailOutbox).where(eq(mailOutbox.toAddress, email));
}

describe("the job board and the race to accept", async () => {
  const first = await verifiedInspector(["97991"]);
  const second = await verifiedInspector(["97991"]);
  const elsewhere = await verifiedInspector(["97993"]);
  const unverified = await verifiedInspector(["97991"], { verified: false });
  const expired = await verifiedInspector(["97991"], { licenceExpiresOn: "2020-01-01" });
  const agent = await signedIn("agent");

  it("shows an open order to verified inspectors whose area covers it, soonest deadline first", async () => {
    const later = await call(createOrder, { method: "POST", body: orderInput({ deadline: at(200) }), cookie: agent.cookie });
    const sooner = await call(createOrder, { method: "POST", body: orderInput({ deadline: at(100) }), cookie: agent.cookie });
    const ids = ((await call(board, { path: "/api/jobs", cookie: first.cookie })).json.jobs as { id: string }[]).map((j) => j.id);
    expect(ids.indexOf(sooner.json.id as string)).toBeLessThan(ids.indexOf(later.json.id as string));
    const jobs = (await call(board, { path: "/api/jobs", cookie: first.cookie })).json.jobs as Record<string, unknown>[];
    expect(jobs[0]).not.toHaveProperty("buyer");
    expect(jobs[0].inspectorPayoutCents).toBe(26000);
    expect(((await call(board, { path: "/api/jobs", cookie: elsewhere.cookie })).json.jobs as unknown[]).length).toBe(0);
  });

  it("hides the board from unverified inspectors and those whose licence expired", async () => {
    expect((await call(board, { path: "/api/jobs", cookie: unverified.cookie })).status).toBe(403);
    expect((await call(board, { path: "/api/jobs", cookie: expired.cookie })).status).toBe(403);
  });

  it("gives each job to exactly one of two inspectors accepting at the same moment, every time", async () => {
    for (let round = 0; round < 15; round++) {
      const order = await call(createOrder, { method: "POST", body: orderInput(), cookie: agent.cookie });
      const id = order.json.id as string;
      const results = await Promise.all([call(accept, { method: "POST", params: { id }, cookie: first.cookie }), call(accept, { method: "POST", params: { id }, cookie: second.cookie })]);
      const statuses = results.map((r) => r.status).sort();
      expect(statuses).toEqual([200, 409]);
      const loser = results.find((r) => r.status === 409)!;
      expect(loser.json.error?.message).toMatch(/Another inspector took this job/);
      const detail = await call(getOrder, { params: { id }, cookie: agent.cookie });
      expect(detail.json.order).toMatchObject({ status: "accepted" });
      expect((detail.json.events as unknown[]).length).toBe(2);
    }
  });

  it("refuses the job to an inspector outside the area, and to an agent", async () => {
    const order = await call(createOrder, { method: "POST", body: orderInput(), cookie: agent.cookie });
    expect((await call(accept, { method: "POST", params: { id: order.json.id as string }, cookie: elsewhere.cookie })).status).toBe(404);
    expect((await call(accept, { method: "POST", params: { id: order.json.id as string }, cookie: agent.cookie })).status).toBe(403);
  });
});

describe("scheduling, release and cancel", async () => {
  const inspector = await verifiedInspector(["97991"]);
  const other = await verifiedInspector(["97991"]);
  const agent = await signedIn("agent");
  const stranger = await signedIn("agent");

  async function acceptedOrder(overrides = {}) {
    const order = await call(createOrder, { method: "POST", body: orderInput({ visitWindows: [{ start: at(24), end: at(48) }], ...overrides }), cookie: agent.cookie });
    const id = order.json.id as string;
    expect((await call(accept, { method: "POST", params: { id }, cookie: inspector.cookie })).status).toBe(200);
    return id;
  }

  it("the inspector proposes times inside the windows; the agent confirms one; the order is scheduled and each party gets one e-mail", async () => {
    const buyerEmail = `buyer-${Date.now()}@example.test`;
    const id = await acceptedOrder({ buyer: { name: "Lena Brightwater", email: buyerEmail } });
    const slots = [{ start: at(25), end: at(27) }, { start: at(30), end: at(32) }];
    const proposed = await call(propose, { method: "POST", params: { id }, body: { slots }, cookie: inspector.cookie });
    expect(proposed.status).toBe(200);
    const proposals = proposed.json.proposals as { id: string }[];
    expect(proposals).toHaveLength(2);
    expect((await call(confirm, { method: "POST", params: { id }, body: { proposalId: proposals[1].id }, cookie: stranger.cookie })).status).toBe(404);
    const confirmed = await call(confirm, { method: "POST", params: { id }, body: { proposalId: proposals[1].id }, cookie: agent.cookie });
    expect(confirmed.status).toBe(200);
    expect(confirmed.json.order).toMatchObject({ status: "scheduled", appointment: slots[1] });
    const again = await call(confirm, { method: "POST", params: { id }, body: { proposalId: proposals[0].id }, cookie: agent.cookie });
    expect(again.status).toBe(409);

    const buyerMail = await mailTo(buyerEmail);
    expect(buyerMail.map((m) => m.subject).sort()).toEqual([expect.stringMatching(/^Sewer scope booked/), expect.stringMatching(/^Sewer scope times proposed/)]);
    const booked = buyerMail.find((m) => m.subject.startsWith("Sewer scope booked"))!;
    expect(booked.attachments[0].filename).toBe("sewer-scope-visit.ics");
    expect(booked.attachments[0].content).toContain("BEGIN:VEVENT");
    const agentMail = (await mailTo(agent.user.email)).map((m) => m.subject);
    expect(agentMail.filter((s) => s.startsWith("Visit booked"))).toHaveLength(1);
    expect(agentMail.filter((s) => s.startsWith("An inspector took"))).toHaveLength(1);
  });

  it("refuses times outside the windows or after the deadline, naming the slot", async () => {
    const id = await acceptedOrder();
    const res = await call(propose, { method: "POST", params: { id }, body: { slots: [{ start: at(25), end: at(27) }, { start: at(60), end: at(62) }] }, cookie: inspector.cookie });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error?.fieldErrors ?? {})).toEqual(["slots[1].start"]);
    expect((await call(propose, { method: "POST", params: { id }, body: { slots: [{ start: at(25), end: at(27) }] }, cookie: other.cookie })).status).toBe(404);
  });

  it("confirms automatically when the agent takes any time in the windows", async () => {
    const id = await acceptedOrder({ anyTimeInWindows: true });
    await call(propose, { method: "POST", params: { id }, body: { slots: [{ start: at(26), end: at(28) }] }, cookie: inspector.cookie });
    expect((await call(getOrder, { params: { id }, cookie: agent.cookie })).json.order).toMatchObject({ status: "scheduled" });
  });

  it("a released job goes back on the board and the agent is told", async () => {
    const id = await acceptedOrder();
    expect((await call(release, { method: "POST", params: { id }, body: { reason: "Van broke down" }, cookie: other.cookie })).status).toBe(404);
    expect((await call(release, { method: "POST", params: { id }, body: { reason: "" }, cookie: inspector.cookie })).status).toBe(400);
    expect((await call(release, { method: "POST", params: { id }, body: { reason: "Van broke down" }, cookie: inspector.cookie })).status).toBe(200);
    const jobs = (await call(board, { path: "/api/jobs", cookie: other.cookie })).json.jobs as { id: string }[];
    expect(jobs.map((j) => j.id)).toContain(id);
    const detail = await call(getOrder, { params: { id }, cookie: agent.cookie });
    expect(detail.json.order).toMatchObject({ status: "open", inspector: null });
    expect((detail.json.events as { to: string; reason: string | null }[]).at(-1)).toMatchObject({ to: "open", reason: "Van broke down" });
    expect((await mailTo(agent.user.email)).some((m) => m.subject.startsWith("The inspector released"))).toBe(true);
  });

  it("the agent cancels with a reason before the visit; the inspector is told; a second cancel is refused", async () => {
    const id = await acceptedOrder();
    const res = await call(cancel, { method: "POST", params: { id }, body: { reason: "Offer withdrawn" }, cookie: agent.cookie });
    expect(res.status).toBe(200);
    expect(res.json.order).toMatchObject({ status: "cancelled" });
    expect((await call(cancel, { method: "POST", params: { id }, body: { reason: "Offer withdrawn" }, cookie: agent.cookie })).status).toBe(409);
    expect((await call(cancel, { method: "POST", params: { id }, body: { reason: "Offer withdrawn" }, cookie: stranger.cookie })).status).toBe(404);
    expect((await mailTo(inspector.user.email)).filter((m) => m.subject.startsWith("Cancelled:"))).toHaveLength(1);
  });
});
