import { describe, expect, it } from "vitest";

import { base, signIn, signOut } from "../utils/http-session";

const PASSWORD = "gradeline-demo";

describe("sign-in from a script against the running app", () => {
  it.each([
    ["agent@gradeline.test", "agent"],
    ["inspector@gradeline.test", "inspector"],
    ["buyer@gradeline.test", "buyer"],
    ["admin@gradeline.test", "admin"],
  ])("%s signs in and /api/me answers the %s role", async (email, role) => {
    const session = await signIn(email, PASSWORD);
    expect(session.signedIn).toBe(true);
    const me = await fetch(`${base()}/api/me`, { headers: { cookie: session.cookie } });
    expect(me.status).toBe(200);
    expect(await me.json()).toMatchObject({ email, role });
  });

  it("a wrong password signs nobody in", async () => {
    const session = await signIn("agent2@gradeline.test", "not-the-password");
    expect(session.signedIn).toBe(false);
  });

  it("after sign-out the old cookie is refused", async () => {
    const session = await signIn("buyer2@gradeline.test", PASSWORD);
    expect((await fetch(`${base()}/api/me`, { headers: { cookie: session.cookie } })).status).toBe(200);
    await signOut(session.jar, session.csrfToken);
    expect((await fetch(`${base()}/api/me`, { headers: { cookie: session.cookie } })).status).toBe(401);
  });

  it("answers 429 with Retry-After past the per-account limit, and other accounts still sign in", async () => {
    const statuses: number[] = [];
    let retryAfter: string | null = null;
    for (let i = 0; i < 7; i++) {
      const { res } = await signIn("agent3@gradeline.test", `wrong-${i}`);
      statuses.push(res.status);
      if (res.status === 429) retryAfter = res.headers.get("retry-after");
    }
    expect(statuses.slice(0, 5).every((s) => s !== 429)).toBe(true);
    expect(statuses.slice(5)).toEqual([429, 429]);
    expect(Number(retryAfter)).toBeGreaterThan(0);
    const locked = await signIn("agent3@gradeline.test", PASSWORD);
    expect(locked.res.status).toBe(429);
    expect((await signIn("inspector2@gradeline.test", PASSWORD)).signedIn).toBe(true);
  });
});

describe("GET /api/health", () => {
  it("reports the database, storage, payments and mail as reachable", async () => {
    const res = await fetch(`${base()}/api/health`);
    expect(res.status).toBe(200);
    const body = (await res.json()) as { ok: boolean; services: Record<string, { ok: boolean }> };
    expect(body.ok).toBe(true);
    expect(Object.keys(body.services).sort()).toEqual(["database", "mail", "payments", "storage"]);
    for (const s of Object.values(body.services)) expect(s.ok).toBe(true);
  });
});
