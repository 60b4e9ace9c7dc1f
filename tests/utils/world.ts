import { getDb } from "@/db/client";
import { inspectorProfiles, serviceAreas } from "@/db/schema";
import type { CreateOrderInput } from "@/lib/validations/orders";

import { createTestUser, sessionCookieFor } from "./session";

export async function signedIn(role: Parameters<typeof createTestUser>[0], overrides?: Parameters<typeof createTestUser>[1]) {
  const user = await createTestUser(role, overrides);
  const { cookie } = await sessionCookieFor(user);
  return { user, cookie };
}

export async function verifiedInspector(postalCodes: string[], opts: { verified?: boolean; licenceExpiresOn?: string } = {}) {
  const inspector = await signedIn("inspector");
  const db = await getDb();
  await db.insert(inspectorProfiles).values({
    userId: inspector.user.id,
    licenceNumber: `T-${inspector.user.id.slice(0, 6)}`,
    licenceExpiresOn: opts.licenceExpiresOn ?? "2030-01-01",
    verifiedAt: opts.verified === false ? null : new Date(),
  });
  if (postalCodes.length) await db.insert(serviceAreas).values(postalCodes.map((postalCode) => ({ inspectorId: inspector.user.id, postalCode })));
  return inspector;
}

const HOUR = 3_600_000;
const iso = (ms: number) => new Date(Date.now() + ms).toISOString();

export function orderInput(overrides: Partial<CreateOrderInput> = {}): CreateOrderInput {
  return {
    address: { street: `${Math.floor(Math.random() * 900) + 10} Sluice Gate Way`, city: "Harrow Falls", state: "OR", postalCode: "97991" },
    propertyType: "single_family",
    yearBuilt: 1951,
    occupancy: "owner",
    accessNotes: "Lockbox on the side gate.",
    cleanoutKnown: true,
    cleanoutNote: "Outside cleanout by the hose bib.",
    buildingSewers: 1,
    deadline: iso(7 * 24 * HOUR),
    timeZone: "America/Los_Angeles",
    visitWindows: [{ start: iso(24 * HOUR), end: iso(32 * HOUR) }],
    anyTimeInWindows: false,
    buyer: { name: "Kai Morrow", email: "kai.morrow@example.test" },
    ...overrides,
  };
}

/** A delivered report: agent, inspector, invited buyer (with an account), a ready clip, a submitted record. */
export async function deliveredReport() {
  const { POST: createOrder } = await import("@/app/api/orders/route");
  const { POST: accept } = await import("@/app/api/jobs/[id]/accept/route");
  const { PUT: saveDraft } = await import("@/app/api/jobs/[id]/draft/route");
  const { POST: submit } = await import("@/app/api/jobs/[id]/submit/route");
  const { CLAY_LATERAL_1950S } = await import("@/lib/engine");
  const { clips } = await import("@/db/schema");
  const { call } = await import("./session");
  const inspector = await verifiedInspector(["97991"]);
  const agent = await signedIn("agent");
  const buyer = await signedIn("buyer");
  const order = await call(createOrder, { method: "POST", body: orderInput({ buyer: { name: buyer.user.name, email: buyer.user.email } }), cookie: agent.cookie });
  const id = order.json.id as string;
  await call(accept, { method: "POST", params: { id }, cookie: inspector.cookie });
  const db = await getDb();
  await db.insert(clips).values({
    orderId: id,
    inspectorId: inspector.user.id,
    status: "ready",
    label: "run-1.mp4",
    sizeBytes: 1000,
    declaredType: "video/mp4",
    detectedType: "video/mp4",
    objectKey: `clips/${id}/test-${Math.random().toString(36).slice(2)}.mp4`,
    partSizeBytes: 8 << 20,
    partCount: 1,
    durationSeconds: 12,
    startFootage: 0,
  });
  const narrative = "Clay lateral with roots at several joints and a sag holding water near the property line.";
  await call(saveDraft, { method: "PUT", params: { id }, body: { record: CLAY_LATERAL_1950S, narrative, recommendation: "Clean and line.", baseRevision: 0 }, cookie: inspector.cookie });
  const res = await call(submit, { method: "POST", params: { id }, body: { baseRevision: 1 }, cookie: inspector.cookie });
  if (res.status !== 200) throw new Error(`submit failed: ${JSON.stringify(res.json)}`);
  return { id, inspector, agent, buyer };
}
