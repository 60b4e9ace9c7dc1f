import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { PATCH as patchUser } from "@/app/api/admin/users/[id]/route";
import { GET as searchUsers } from "@/app/api/admin/users/route";
import { GET as me } from "@/app/api/me/route";
import { getDb } from "@/db/client";
import { auditLog, users } from "@/db/schema";

import { call, sessionCookieFor } from "../utils/session";
import { signedIn } from "../utils/world";

describe("managing users", async () => {
  const admin = await signedIn("admin");
  const patch = (id: string, body: unknown) => call(patchUser, { method: "PATCH", params: { id }, body, cookie: admin.cookie });
  const audited = async (id: string, action: string) =>
    (await getDb())
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.targetId, id), eq(auditLog.action, action)));

  it("finds users by part of a name, e-mail or company, and by role", async () => {
    const agent = await signedIn("agent", { name: "Tamsin Quarrie", email: `tamsin.q-${Date.now()}@example.test` });
    await signedIn("buyer", { name: "Tamsin Ebbet" });
    const byName = await call(searchUsers, { path: "/api/admin/users?q=tamsin", cookie: admin.cookie });
    expect(byName.status).toBe(200);
    expect((byName.json.users as { name: string }[]).map((u) => u.name)).toEqual(["Tamsin Ebbet", "Tamsin Quarrie"]);
    const byRole = await call(searchUsers, { path: "/api/admin/users?q=tamsin&role=agent", cookie: admin.cookie });
    expect(byRole.json).toMatchObject({ total: 1, users: [{ id: agent.user.id, role: "agent", disabled: false }] });
    const byEmail = await call(searchUsers, {
      path: `/api/admin/users?q=${encodeURIComponent(agent.user.email.toUpperCase())}`,
      cookie: admin.cookie,
    });
    expect(byEmail.json.total).toBe(1);
    expect(JSON.stringify(byName.json)).not.toMatch(/passwordHash|sessionVersion/);
    expect((await call(searchUsers, { path: "/api/admin/users?role=wizard", cookie: admin.cookie })).status).toBe(400);
  });

  it("disabling ends the user's sessions at once; enabling lets them sign in again but old sessions stay ended", async () => {
    const agent = await signedIn("agent");
    expect((await call(me, { cookie: agent.cookie })).status).toBe(200);
    const res = await patch(agent.user.id, { disabled: true, reason: "Reported for sharing the account." });
    expect(res.status).toBe(200);
    expect(res.json.user).toMatchObject({ id: agent.user.id, disabled: true });
    expect((await call(me, { cookie: agent.cookie })).status).toBe(401);
    expect(await audited(agent.user.id, "admin.user_disabled")).toHaveLength(1);

    expect((await patch(agent.user.id, { disabled: false })).json.user).toMatchObject({ disabled: false });
    expect((await call(me, { cookie: agent.cookie })).status).toBe(401);
    const [fresh] = await (await getDb()).select().from(users).where(eq(users.id, agent.user.id));
    expect((await call(me, { cookie: (await sessionCookieFor(fresh)).cookie })).status).toBe(200);
    expect(await audited(agent.user.id, "admin.user_enabled")).toHaveLength(1);
  });

  it("refuses a role change without a reason and changes nothing", async () => {
    const buyer = await signedIn("buyer");
    for (const body of [{ role: "agent" }, { role: "agent", reason: " " }]) {
      const res = await patch(buyer.user.id, body);
      expect(res.status).toBe(400);
      expect(Object.keys(res.json.error?.fieldErrors ?? {})).toEqual(["reason"]);
    }
    const [row] = await (await getDb()).select().from(users).where(eq(users.id, buyer.user.id));
    expect(row.role).toBe("buyer");
    expect((await call(me, { cookie: buyer.cookie })).status).toBe(200);
    expect(await audited(buyer.user.id, "admin.user_role_changed")).toHaveLength(0);
  });

  it("changes a role with a reason, records it with both roles, and ends the old sessions", async () => {
    const buyer = await signedIn("buyer");
    const reason = "Signed up as a buyer by mistake; works as an agent at Millrace Realty.";
    expect((await call(me, { cookie: buyer.cookie })).status).toBe(200);
    const res = await patch(buyer.user.id, { role: "agent", reason });
    expect(res.status).toBe(200);
    expect(res.json.user).toMatchObject({ role: "agent" });
    const [entry] = await audited(buyer.user.id, "admin.user_role_changed");
    expect(entry).toMatchObject({ actorId: admin.user.id, data: { from: "buyer", to: "agent", reason } });
    expect((await call(me, { cookie: buyer.cookie })).status).toBe(401);
  });

  it("never changes the admin's own account", async () => {
    for (const body of [{ disabled: true }, { role: "agent", reason: "Trying to step down." }]) {
      const res = await patch(admin.user.id, body);
      expect(res.status).toBe(403);
    }
    expect((await call(me, { cookie: admin.cookie })).status).toBe(200);
  });

  it("answers 400 to an empty change and 404 to an unknown user", async () => {
    const agent = await signedIn("agent");
    expect((await patch(agent.user.id, {})).status).toBe(400);
    expect((await patch(agent.user.id, { disabled: "yes" })).status).toBe(400);
    expect((await patch("6c3f1d0e-0000-4000-8000-000000000000", { disabled: true })).status).toBe(404);
  });
});
