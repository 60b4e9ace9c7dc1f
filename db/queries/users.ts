import "server-only";

import { and, eq, gt, isNull, sql } from "drizzle-orm";

import { authLink } from "@/lib/auth/next-path";

import { getDb, isOnlyWriter, type Db, type Tx } from "../client";
import { authSessions, users, type Role } from "../schema";

export const normalizeEmail = (email: string) => email.trim().toLowerCase();

export async function findUserByEmail(email: string) {
  const db = await getDb();
  const [row] = await db
    .select()
    .from(users)
    .where(eq(users.email, normalizeEmail(email)))
    .limit(1);
  return row ?? null;
}

/** The invitation e-mail's link: sign in if this address has an account, else sign up as a buyer; either way on to the report. */
export async function reportInvitationPath(executor: Db | Tx, email: string, orderId: string): Promise<string> {
  const address = normalizeEmail(email);
  const [existing] = await executor.select({ id: users.id }).from(users).where(eq(users.email, address)).limit(1);
  const next = `/reports/${orderId}`;
  return existing ? authLink("/sign-in", { email: address, next }) : authLink("/sign-up", { email: address, role: "buyer", next });
}

export async function findUserById(id: string) {
  const db = await getDb();
  const [row] = await db.select().from(users).where(eq(users.id, id)).limit(1);
  return row ?? null;
}

export async function createUser(input: { email: string; name: string; role: Role; passwordHash: string; company?: string | null }) {
  const db = await getDb();
  const [row] = await db
    .insert(users)
    .values({ ...input, email: normalizeEmail(input.email) })
    .onConflictDoNothing({ target: users.email })
    .returning();
  return row ?? null;
}

export async function createAuthSession(input: {
  userId: string;
  sessionVersion: number;
  ip: string | null;
  userAgent: string | null;
  expiresAt: Date;
}) {
  const db = await getDb();
  const [row] = await db.insert(authSessions).values(input).returning({ id: authSessions.id });
  return row.id;
}

export async function revokeAuthSession(sessionId: string) {
  const db = await getDb();
  await db
    .update(authSessions)
    .set({ revokedAt: new Date() })
    .where(and(eq(authSessions.id, sessionId), isNull(authSessions.revokedAt)));
  forgetLiveSessions();
}

type LiveUser = { id: string; email: string; name: string; role: Role };

// Every page and API call checks its session. With the embedded database this process is its only
// writer (the data lock), so a session found live is remembered for up to a minute, and every write
// that can end a session (below, and changeUser) forgets them all once it has committed. A lookup
// that overlapped such a write is not remembered (the generation moved). A PostgreSQL server may
// have other writers, so with it every request asks the database.
const memo = globalThis as unknown as {
  __gradelineLiveSessions?: { generation: number; sessions: Map<string, { user: LiveUser; until: number }> };
};
const liveSessions = () => (memo.__gradelineLiveSessions ??= { generation: 0, sessions: new Map() });
const REMEMBER_MS = 60_000;

/** Forgets every remembered session; call after any committed write that can end one. */
export function forgetLiveSessions() {
  const live = liveSessions();
  live.generation++;
  live.sessions.clear();
}

/** The user behind a live session: not revoked, not expired, same session version, account enabled. */
export async function findLiveSessionUser(sessionId: string): Promise<LiveUser | null> {
  const live = liveSessions();
  const known = live.sessions.get(sessionId);
  if (known && known.until > Date.now()) return known.user;
  const generation = live.generation;
  const db = await getDb();
  const [row] = await db
    .select({ id: users.id, email: users.email, name: users.name, role: users.role, expiresAt: authSessions.expiresAt })
    .from(authSessions)
    .innerJoin(users, eq(users.id, authSessions.userId))
    .where(
      and(
        eq(authSessions.id, sessionId),
        isNull(authSessions.revokedAt),
        gt(authSessions.expiresAt, sql`now()`),
        eq(authSessions.sessionVersion, users.sessionVersion),
        isNull(users.disabledAt),
      ),
    )
    .limit(1);
  if (!row) return null;
  const { expiresAt, ...user } = row;
  if (generation === live.generation && (await isOnlyWriter())) {
    if (live.sessions.size >= 10_000) live.sessions.clear();
    live.sessions.set(sessionId, { user, until: Math.min(expiresAt.getTime(), Date.now() + REMEMBER_MS) });
  }
  return user;
}

/** Ends every session of the user at once (password change, disabled account). */
export async function bumpSessionVersion(userId: string) {
  const db = await getDb();
  await db
    .update(users)
    .set({ sessionVersion: sql`${users.sessionVersion} + 1` })
    .where(eq(users.id, userId));
  forgetLiveSessions();
}

export async function setPassword(userId: string, passwordHash: string) {
  const db = await getDb();
  await db
    .update(users)
    .set({ passwordHash, sessionVersion: sql`${users.sessionVersion} + 1` })
    .where(eq(users.id, userId));
  forgetLiveSessions();
}

export async function setDisabled(userId: string, disabled: boolean) {
  const db = await getDb();
  await db
    .update(users)
    .set({ disabledAt: disabled ? new Date() : null, sessionVersion: sql`${users.sessionVersion} + 1` })
    .where(eq(users.id, userId));
  forgetLiveSessions();
}
