import { encode } from "next-auth/jwt";
import { NextRequest } from "next/server";

import { createAuthSession, createUser } from "@/db/queries/users";
import type { Role } from "@/db/schema";
import { hashPassword } from "@/lib/auth/password";

let counter = 0;
let cachedHash: string | undefined;

export const TEST_PASSWORD = "correct-horse-battery";

export async function createTestUser(role: Role, overrides: { email?: string; name?: string } = {}) {
  cachedHash ??= await hashPassword(TEST_PASSWORD);
  const n = ++counter;
  const user = await createUser({ role, email: overrides.email ?? `${role}${n}-${Date.now()}@example.test`, name: overrides.name ?? `Test ${role} ${n}`, passwordHash: cachedHash });
  if (!user) throw new Error("test user already exists");
  return user;
}

/** A session cookie exactly as next-auth would set it after a sign-in. */
export async function sessionCookieFor(user: { id: string; email: string; name: string; role: Role; sessionVersion: number }) {
  const sid = await createAuthSession({ userId: user.id, sessionVersion: user.sessionVersion, ip: "127.0.0.1", userAgent: "vitest", expiresAt: new Date(Date.now() + 3_600_000) });
  const token = await encode({ token: { sub: user.id, uid: user.id, email: user.email, name: user.name, role: user.role, sid }, secret: process.env.NEXTAUTH_SECRET! });
  return { cookie: `next-auth.session-token=${token}`, sid };
}

type Handler = (req: NextRequest, ctx: { params: Promise<Record<string, string | string[]>> }) => Promise<Response>;

/** Calls a route handler in process, the way Next.js would. */
export async function call(
  handler: Handler,
  opts: { method?: string; path?: string; body?: unknown; cookie?: string; params?: Record<string, string | string[]>; headers?: Record<string, string> } = {},
) {
  const url = `http://127.0.0.1:3999${opts.path ?? "/"}`;
  const headers = new Headers(opts.headers);
  if (opts.cookie) headers.set("cookie", opts.cookie);
  if (opts.body !== undefined) headers.set("content-type", "application/json");
  const req = new NextRequest(url, {
    method: opts.method ?? "GET",
    headers,
    body: opts.body === undefined ? undefined : typeof opts.body === "string" ? opts.body : JSON.stringify(opts.body),
  });
  const res = await handler(req, { params: Promise.resolve(opts.params ?? {}) });
  const text = await res.text();
  let json: unknown = null;
  try {
    json = text ? JSON.parse(text) : null;
  } catch {
    json = text;
  }
  return { status: res.status, headers: res.headers, json: json as Record<string, unknown> & { error?: { code: string; message: string; fieldErrors?: Record<string, string[]> } } };
}
