import { encode } from "next-auth/jwt";
import { describe, expect, it } from "vitest";

import { GET as me } from "@/app/api/me/route";
import { createAuthSession, revokeAuthSession, setDisabled, setPassword } from "@/db/queries/users";

import { call, createTestUser, sessionCookieFor } from "../utils/session";

describe("sessions end at once", () => {
  it("after sign-out the old cookie no longer works", async () => {
    const user = await createTestUser("agent");
    const { cookie, sid } = await sessionCookieFor(user);
    expect((await call(me, { cookie })).status).toBe(200);
    await revokeAuthSession(sid);
    expect((await call(me, { cookie })).status).toBe(401);
  });

  it("a password change ends every session of the user, and only that user", async () => {
    const user = await createTestUser("buyer");
    const other = await createTestUser("buyer");
    const a = await sessionCookieFor(user);
    const b = await sessionCookieFor(user);
    const c = await sessionCookieFor(other);
    await setPassword(user.id, "new-hash");
    expect((await call(me, { cookie: a.cookie })).status).toBe(401);
    expect((await call(me, { cookie: b.cookie })).status).toBe(401);
    expect((await call(me, { cookie: c.cookie })).status).toBe(200);
  });

  it("disabling an account ends its sessions, even if enabled again later", async () => {
    const user = await createTestUser("inspector");
    const { cookie } = await sessionCookieFor(user);
    expect((await call(me, { cookie })).status).toBe(200);
    await setDisabled(user.id, true);
    expect((await call(me, { cookie })).status).toBe(401);
    await setDisabled(user.id, false);
    expect((await call(me, { cookie })).status).toBe(401);
  });

  it("a session remembered by earlier requests still ends when it expires", async () => {
    const user = await createTestUser("agent");
    const sid = await createAuthSession({
      userId: user.id,
      sessionVersion: user.sessionVersion,
      ip: null,
      userAgent: "vitest",
      expiresAt: new Date(Date.now() + 1_500),
    });
    const token = await encode({ token: { sub: user.id, sid }, secret: process.env.NEXTAUTH_SECRET! });
    const cookie = `next-auth.session-token=${token}`;
    expect((await call(me, { cookie })).status).toBe(200);
    expect((await call(me, { cookie })).status).toBe(200);
    await new Promise((r) => setTimeout(r, 1_700));
    expect((await call(me, { cookie })).status).toBe(401);
  });
});
