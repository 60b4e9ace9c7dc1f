import { randomUUID } from "node:crypto";

import { describe, expect, it } from "vitest";

import { GET as audit } from "@/app/api/admin/audit/route";
import { POST as verify } from "@/app/api/admin/inspectors/[id]/verify/route";
import { GET as inspectors } from "@/app/api/admin/inspectors/route";
import { GET as prices, POST as savePrices } from "@/app/api/admin/prices/route";
import { GET as rates, POST as saveRates } from "@/app/api/admin/rates/route";
import { PATCH as patchUser } from "@/app/api/admin/users/[id]/route";
import { GET as users } from "@/app/api/admin/users/route";
import { getDb } from "@/db/client";
import { auditLog, priceSettings, rateTables } from "@/db/schema";

import { call } from "../utils/session";
import { signedIn, verifiedInspector } from "../utils/world";

const id = randomUUID();
const ROUTES = [
  { name: "GET /api/admin/inspectors", handler: inspectors, method: "GET" },
  { name: "POST /api/admin/inspectors/{id}/verify", handler: verify, method: "POST", params: { id }, body: { decision: "approve" } },
  { name: "GET /api/admin/prices", handler: prices, method: "GET" },
  { name: "POST /api/admin/prices", handler: savePrices, method: "POST", body: { baseCents: 1 } },
  { name: "GET /api/admin/rates", handler: rates, method: "GET" },
  { name: "POST /api/admin/rates", handler: saveRates, method: "POST", body: { table: {} } },
  { name: "GET /api/admin/users", handler: users, method: "GET" },
  { name: "PATCH /api/admin/users/{id}", handler: patchUser, method: "PATCH", params: { id }, body: { disabled: true } },
  { name: "GET /api/admin/audit", handler: audit, method: "GET" },
] as const;

describe("admin routes are for admins only", async () => {
  const agent = await signedIn("agent");
  const inspector = await verifiedInspector(["97991"]);
  const buyer = await signedIn("buyer");
  const admin = await signedIn("admin");
  const people = { agent, inspector, buyer };

  for (const r of ROUTES) {
    it(`${r.name} answers 404 to an agent, an inspector, a buyer and a signed-out visitor, and writes nothing`, async () => {
      const db = await getDb();
      const before = await Promise.all([db.$count(priceSettings), db.$count(rateTables), db.$count(auditLog)]);
      const opts = { method: r.method, params: "params" in r ? r.params : undefined, body: "body" in r ? r.body : undefined };
      for (const [role, who] of Object.entries(people)) {
        const res = await call(r.handler, { ...opts, cookie: who.cookie });
        expect(res.status, role).toBe(404);
        expect(JSON.stringify(res.json)).not.toMatch(/admin/i);
      }
      expect((await call(r.handler, opts)).status).toBe(404);
      expect(await Promise.all([db.$count(priceSettings), db.$count(rateTables), db.$count(auditLog)])).toEqual(before);
    });
  }

  it("the same GET routes answer 200 to an admin", async () => {
    for (const handler of [inspectors, prices, rates, users, audit])
      expect((await call(handler, { cookie: admin.cookie })).status).toBe(200);
  });

  it("a state-changing admin request from another site is refused", async () => {
    const res = await call(patchUser, {
      method: "PATCH",
      params: { id: agent.user.id },
      body: { disabled: true },
      cookie: admin.cookie,
      headers: { origin: "https://elsewhere.example" },
    });
    expect(res.status).toBe(403);
  });
});
