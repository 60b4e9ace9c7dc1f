import { describe, expect, it } from "vitest";

import { GET as me } from "@/app/api/me/route";
import { POST as signUp } from "@/app/api/sign-up/route";
import type { Role } from "@/db/schema";
import { can, PERMISSIONS } from "@/lib/auth/permissions";

import { call, createTestUser, sessionCookieFor } from "../utils/session";

const ROLES: Role[] = ["agent", "inspector", "buyer", "admin"];

describe("GET /api/me", () => {
  it("answers 401 when signed out", async () => {
    const res = await call(me, { path: "/api/me" });
    expect(res.status).toBe(401);
    expect(res.json.error?.code).toBe("unauthorized");
  });

  it.each(ROLES)("answers the signed-in %s's id, name, e-mail and role", async (role) => {
    const user = await createTestUser(role);
    const { cookie } = await sessionCookieFor(user);
    const res = await call(me, { path: "/api/me", cookie });
    expect(res.status).toBe(200);
    expect(res.json).toEqual({ id: user.id, name: user.name, email: user.email, role });
  });

  it("answers 401 to a forged cookie", async () => {
    const res = await call(me, { path: "/api/me", cookie: "next-auth.session-token=not-a-real-token" });
    expect(res.status).toBe(401);
  });
});

describe("POST /api/sign-up", () => {
  const valid = { name: "Avery Quill", email: "avery.quill@example.test", password: "a-long-password", role: "agent" };

  it("creates an agent and answers 201 without the password hash", async () => {
    const res = await call(signUp, { method: "POST", path: "/api/sign-up", body: valid });
    expect(res.status).toBe(201);
    expect(res.json).toMatchObject({ email: valid.email, role: "agent" });
    expect(JSON.stringify(res.json)).not.toContain("password");
  });

  it("refuses a second account with the same e-mail, whatever its case", async () => {
    await call(signUp, { method: "POST", path: "/api/sign-up", body: { ...valid, email: "dup@example.test" } });
    const res = await call(signUp, { method: "POST", path: "/api/sign-up", body: { ...valid, email: "DUP@example.test" } });
    expect(res.status).toBe(409);
    expect(res.json.error?.fieldErrors?.email?.[0]).toMatch(/already exists/);
  });

  it("refuses admin sign-ups: admins come only from the seed or the CLI", async () => {
    const res = await call(signUp, { method: "POST", path: "/api/sign-up", body: { ...valid, email: "x@example.test", role: "admin" } });
    expect(res.status).toBe(400);
    expect(res.json.error?.fieldErrors?.role).toBeDefined();
  });

  it("answers field errors in plain words for bad input", async () => {
    const res = await call(signUp, { method: "POST", path: "/api/sign-up", body: { name: "", email: "nope", password: "short", role: "agent" } });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error?.fieldErrors ?? {}).sort()).toEqual(["email", "name", "password"]);
  });

  it("answers 400 to a body that is not JSON", async () => {
    const res = await call(signUp, { method: "POST", path: "/api/sign-up", body: "{not json" });
    expect(res.status).toBe(400);
  });

  it("refuses a cross-site POST", async () => {
    const res = await call(signUp, { method: "POST", path: "/api/sign-up", body: { ...valid, email: "csrf@example.test" }, headers: { origin: "http://evil.example" } });
    expect(res.status).toBe(403);
  });
});

describe("the permission table", () => {
  it("gives admin powers to admins alone", () => {
    expect(ROLES.filter((r) => can(r, "admin:manage"))).toEqual(["admin"]);
  });

  it("lets only agents order and only inspectors take jobs", () => {
    expect(ROLES.filter((r) => can(r, "orders:create"))).toEqual(["agent"]);
    expect(ROLES.filter((r) => can(r, "jobs:accept"))).toEqual(["inspector"]);
    expect(ROLES.filter((r) => can(r, "reports:pay"))).toEqual(["buyer"]);
  });

  it("fails closed for a missing role", () => {
    for (const permission of Object.keys(PERMISSIONS) as (keyof typeof PERMISSIONS)[]) expect(can(undefined, permission)).toBe(false);
  });
});
