import "server-only";

import { cookies } from "next/headers";
import { notFound, redirect } from "next/navigation";
import { cache } from "react";

import { findLiveSessionUser } from "@/db/queries/users";
import type { Role } from "@/db/schema";
import { env } from "@/lib/env";

import { ROLE_HOME } from "./permissions";
import { decodeSessionToken } from "./session-token";

export type SessionUser = { id: string; email: string; name: string; role: Role; sessionId: string };

export const SESSION_COOKIES = ["__Secure-next-auth.session-token", "next-auth.session-token"];

/** Reads a next-auth session cookie value and checks it against the database on every request. */
export async function userFromSessionToken(raw: string | undefined | null): Promise<SessionUser | null> {
  if (!raw) return null;
  const token = await decodeSessionToken(raw, env().NEXTAUTH_SECRET);
  if (typeof token?.sid !== "string") return null;
  const user = await findLiveSessionUser(token.sid);
  return user ? { ...user, sessionId: token.sid } : null;
}

export function sessionTokenFromCookies(get: (name: string) => string | undefined): string | undefined {
  for (const name of SESSION_COOKIES) {
    const value = get(name);
    if (value) return value;
  }
  return undefined;
}

/** The signed-in user of this request, or null. */
export const getCurrentUser = cache(async (): Promise<SessionUser | null> => {
  const jar = await cookies();
  return userFromSessionToken(sessionTokenFromCookies((n) => jar.get(n)?.value));
});

/** For pages: sends signed-out visitors to sign in and answers 404 to the wrong role. */
export async function requireUser(...roles: Role[]): Promise<SessionUser> {
  const user = await getCurrentUser();
  if (!user) redirect("/sign-in");
  if (roles.length > 0 && !roles.includes(user.role)) notFound();
  return user;
}

export function homeFor(role: Role): string {
  return ROLE_HOME[role];
}
