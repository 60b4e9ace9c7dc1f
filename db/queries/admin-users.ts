import "server-only";

import { and, asc, count, eq, ilike, isNotNull, isNull, or, sql, type SQL } from "drizzle-orm";

import type { UserSearchQuery } from "@/lib/validations/admin";

import { getDb } from "../client";
import { users, type Role } from "../schema";
import { recordAudit } from "./audit";
import { forgetLiveSessions } from "./users";

export type AdminUserDto = {
  id: string;
  name: string;
  email: string;
  role: Role;
  company: string | null;
  disabled: boolean;
  createdAt: string;
};
export type AdminUserPage = { users: AdminUserDto[]; total: number; page: number; pageSize: number };

const toDto = (u: typeof users.$inferSelect): AdminUserDto => ({
  id: u.id,
  name: u.name,
  email: u.email,
  role: u.role,
  company: u.company,
  disabled: !!u.disabledAt,
  createdAt: u.createdAt.toISOString(),
});

const escapeLike = (s: string) => s.replace(/[%_\\]/g, (c) => `\\${c}`);

/** Users matching a name, e-mail or company, optionally of one role or state, by name. */
export async function searchUsers(q: UserSearchQuery): Promise<AdminUserPage> {
  const db = await getDb();
  const filters: (SQL | undefined)[] = [];
  if (q.q) {
    const like = `%${escapeLike(q.q)}%`;
    filters.push(or(ilike(users.name, like), ilike(users.email, like), ilike(users.company, like)));
  }
  if (q.role) filters.push(eq(users.role, q.role));
  if (q.status === "disabled") filters.push(isNotNull(users.disabledAt));
  if (q.status === "active") filters.push(isNull(users.disabledAt));
  const where = and(...filters);
  const [rows, [{ n }]] = await Promise.all([
    db
      .select()
      .from(users)
      .where(where)
      .orderBy(asc(sql`lower(${users.name})`), asc(users.id))
      .limit(q.pageSize)
      .offset((q.page - 1) * q.pageSize),
    db.select({ n: count() }).from(users).where(where),
  ]);
  return { users: rows.map(toDto), total: Number(n), page: q.page, pageSize: q.pageSize };
}

export async function findUserForAdmin(id: string): Promise<AdminUserDto | null> {
  const db = await getDb();
  const [row] = await db.select().from(users).where(eq(users.id, id)).limit(1);
  return row ? toDto(row) : null;
}

export type UserChange = { disabled?: boolean; role?: Role; reason: string | null };

/**
 * Disables, enables or re-roles an account with its audit rows, in one transaction. Every change
 * bumps the session version, so the person's open sessions end at once (as setDisabled does).
 */
export async function changeUser(userId: string, change: UserChange, actor: { id: string; ip: string }): Promise<AdminUserDto | null> {
  const db = await getDb();
  const changed = await db.transaction(async (tx) => {
    const [before] = await tx.select().from(users).where(eq(users.id, userId)).for("update").limit(1);
    if (!before) return null;
    const disable = change.disabled !== undefined && change.disabled !== !!before.disabledAt;
    const role = change.role !== undefined && change.role !== before.role;
    if (!disable && !role) return toDto(before);
    const [after] = await tx
      .update(users)
      .set({
        ...(disable ? { disabledAt: change.disabled ? new Date() : null } : {}),
        ...(role ? { role: change.role } : {}),
        sessionVersion: sql`${users.sessionVersion} + 1`,
      })
      .where(eq(users.id, userId))
      .returning();
    const target = { actorId: actor.id, targetType: "user", targetId: userId, ip: actor.ip } as const;
    if (disable)
      await recordAudit(
        {
          ...target,
          action: change.disabled ? "admin.user_disabled" : "admin.user_enabled",
          data: { email: before.email, reason: change.reason },
        },
        tx,
      );
    if (role)
      await recordAudit(
        {
          ...target,
          action: "admin.user_role_changed",
          data: { email: before.email, from: before.role, to: change.role, reason: change.reason },
        },
        tx,
      );
    return toDto(after);
  });
  // After the commit, so no lookup remembers the session as it was before.
  forgetLiveSessions();
  return changed;
}
