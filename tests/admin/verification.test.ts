import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { POST as verify } from "@/app/api/admin/inspectors/[id]/verify/route";
import { GET as inspectors } from "@/app/api/admin/inspectors/route";
import { GET as board } from "@/app/api/jobs/route";
import { getDb } from "@/db/client";
import { auditLog, inspectorProfiles, mailOutbox } from "@/db/schema";
import { sweepExpiredLicences } from "@/lib/admin/licence-sweep";
import { putObject } from "@/lib/storage/client";

import { call } from "../utils/session";
import { signedIn, verifiedInspector } from "../utils/world";

const isoDay = (days: number) => new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);

async function mailTo(email: string) {
  const db = await getDb();
  return db.select().from(mailOutbox).where(eq(mailOutbox.toAddress, email));
}

async function auditFor(targetId: string, action: string) {
  const db = await getDb();
  return db
    .select()
    .from(auditLog)
    .where(and(eq(auditLog.targetId, targetId), eq(auditLog.action, action)));
}

describe("inspector verification", async () => {
  const admin = await signedIn("admin");
  const decide = (id: string, body: unknown) =>
    call(verify, { method: "POST", params: { id }, body, cookie: admin.cookie, headers: { "x-forwarded-for": "203.0.113.7" } });

  it("lists the waiting inspector in the queue with licence, expiry and service area", async () => {
    const waiting = await verifiedInspector(["97991", "97992"], { verified: false });
    const res = await call(inspectors, { path: "/api/admin/inspectors?filter=queue", cookie: admin.cookie });
    expect(res.status).toBe(200);
    const row = (res.json.inspectors as { id: string }[]).find((i) => i.id === waiting.user.id);
    expect(row).toMatchObject({
      status: "awaiting",
      licenceNumber: `T-${waiting.user.id.slice(0, 6)}`,
      licenceExpiresOn: "2030-01-01",
      licenceValid: true,
      postalCodes: ["97991", "97992"],
      insurance: null,
    });
    expect(JSON.stringify(res.json)).not.toMatch(/passwordHash|insuranceKey|sessionVersion/);
  });

  it("opens the insurance certificate through a short-lived signed link that downloads it as an attachment", async () => {
    const waiting = await verifiedInspector(["97991"], { verified: false });
    const key = `insurance/${waiting.user.id}/test-${Date.now()}.pdf`;
    await putObject(key, "%PDF-1.7\n%%EOF\n", "application/pdf");
    const db = await getDb();
    await db
      .update(inspectorProfiles)
      .set({ insuranceKey: key, insuranceFileName: "liability cert.pdf" })
      .where(eq(inspectorProfiles.userId, waiting.user.id));
    const res = await call(inspectors, { path: "/api/admin/inspectors?filter=queue", cookie: admin.cookie });
    const row = (res.json.inspectors as { id: string; insurance: { fileName: string; url: string } }[]).find(
      (i) => i.id === waiting.user.id,
    )!;
    expect(row.insurance.fileName).toBe("liability cert.pdf");
    const url = new URL(row.insurance.url);
    expect(url.searchParams.get("X-Amz-Expires")).toBe("600");
    const file = await fetch(url);
    expect(file.status).toBe(200);
    expect(file.headers.get("content-disposition")).toMatch(/^attachment; filename="liability_cert.pdf"/);
    expect(JSON.stringify(res.json)).not.toContain(`"${key}"`);
  });

  it("approving opens the job board for that inspector, e-mails them and is audited with the address", async () => {
    const waiting = await verifiedInspector(["97991"], { verified: false });
    expect((await call(board, { path: "/api/jobs", cookie: waiting.cookie })).status).toBe(403);
    const res = await decide(waiting.user.id, { decision: "approve" });
    expect(res.status).toBe(200);
    expect(res.json.inspector).toMatchObject({ status: "verified", verifiedByName: admin.user.name });
    expect((await call(board, { path: "/api/jobs", cookie: waiting.cookie })).status).toBe(200);
    expect((await mailTo(waiting.user.email)).map((m) => m.subject)).toEqual(["You are verified on Gradeline"]);
    const [entry] = await auditFor(waiting.user.id, "admin.inspector_approved");
    expect(entry).toMatchObject({ actorId: admin.user.id, ip: "203.0.113.7" });

    const queue = await call(inspectors, { path: "/api/admin/inspectors?filter=queue", cookie: admin.cookie });
    expect((queue.json.inspectors as { id: string }[]).some((i) => i.id === waiting.user.id)).toBe(false);
  });

  it("rejecting keeps the board closed, stores the reason and e-mails it once, even when the same rejection is sent twice", async () => {
    const waiting = await verifiedInspector(["97991"], { verified: false });
    const reason = "The insurance certificate is for a different business name; upload the one in your own name.";
    expect((await decide(waiting.user.id, { decision: "reject", reason })).status).toBe(200);
    const again = await decide(waiting.user.id, { decision: "reject", reason });
    expect(again.json).toMatchObject({ changed: false, inspector: { status: "changes_asked", rejectedReason: reason } });
    expect((await call(board, { path: "/api/jobs", cookie: waiting.cookie })).status).toBe(403);
    const db = await getDb();
    const [profile] = await db.select().from(inspectorProfiles).where(eq(inspectorProfiles.userId, waiting.user.id));
    expect(profile).toMatchObject({ verifiedAt: null, rejectedReason: reason });
    const mails = await mailTo(waiting.user.email);
    expect(mails).toHaveLength(1);
    expect(mails[0].text).toContain(reason);
    expect(await auditFor(waiting.user.id, "admin.inspector_rejected")).toHaveLength(1);
  });

  it("rejecting a verified inspector closes the board again", async () => {
    const active = await verifiedInspector(["97991"]);
    expect((await call(board, { path: "/api/jobs", cookie: active.cookie })).status).toBe(200);
    expect((await decide(active.user.id, { decision: "reject", reason: "Licence number does not match the state register." })).status).toBe(
      200,
    );
    expect((await call(board, { path: "/api/jobs", cookie: active.cookie })).status).toBe(403);
  });

  it("refuses a rejection without a reason, and writes nothing", async () => {
    const waiting = await verifiedInspector(["97991"], { verified: false });
    for (const body of [{ decision: "reject" }, { decision: "reject", reason: "  " }]) {
      const res = await decide(waiting.user.id, body);
      expect(res.status).toBe(400);
      expect(Object.keys(res.json.error?.fieldErrors ?? {})).toEqual(["reason"]);
    }
    expect((await decide(waiting.user.id, { decision: "maybe" })).json.error?.fieldErrors).toHaveProperty("decision");
    expect(await mailTo(waiting.user.email)).toHaveLength(0);
    expect(await auditFor(waiting.user.id, "admin.inspector_rejected")).toHaveLength(0);
  });

  it("refuses to approve an expired licence, and answers 404 for someone who is not an inspector", async () => {
    const expired = await verifiedInspector(["97991"], { verified: false, licenceExpiresOn: isoDay(-3) });
    const res = await decide(expired.user.id, { decision: "approve" });
    expect(res.status).toBe(422);
    expect(res.json.error?.message).toMatch(/expired/);
    const agent = await signedIn("agent");
    expect((await decide(agent.user.id, { decision: "approve" })).status).toBe(404);
  });
});

describe("the licence-expiry sweep", () => {
  it("un-verifies an inspector whose licence expired, e-mails them once and leaves a current licence alone", async () => {
    const expired = await verifiedInspector(["97991"], { licenceExpiresOn: isoDay(-1) });
    const endsToday = await verifiedInspector(["97991"], { licenceExpiresOn: isoDay(0) });
    const current = await verifiedInspector(["97991"], { licenceExpiresOn: isoDay(200) });

    expect(await sweepExpiredLicences()).toBe(1);
    expect(await sweepExpiredLicences()).toBe(0);

    const db = await getDb();
    const standing = async (id: string) =>
      (await db.select().from(inspectorProfiles).where(eq(inspectorProfiles.userId, id)))[0].verifiedAt;
    expect(await standing(expired.user.id)).toBeNull();
    expect(await standing(endsToday.user.id)).not.toBeNull();
    expect(await standing(current.user.id)).not.toBeNull();

    const mails = await mailTo(expired.user.email);
    expect(mails.map((m) => m.subject)).toEqual(["Your licence on Gradeline has expired"]);
    expect(await mailTo(current.user.email)).toHaveLength(0);
    expect(await auditFor(expired.user.id, "inspector.licence_expired")).toHaveLength(1);
    expect((await call(board, { path: "/api/jobs", cookie: current.cookie })).status).toBe(200);
  });
});
