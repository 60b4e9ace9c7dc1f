import "server-only";

import { and, count, desc, eq, gte, ilike, like, lt, type SQL } from "drizzle-orm";

import { DEFAULT_TIME_ZONE, zonedLocalToIso } from "@/lib/time-zones";
import type { AuditQuery } from "@/lib/validations/admin";

import { getDb } from "../client";
import { auditLog, users, type Role } from "../schema";

export type AuditEntryDto = {
  id: string;
  at: string;
  action: string;
  actor: { id: string; name: string; email: string; role: Role } | null;
  target: { type: string; id: string | null } | null;
  ip: string | null;
  data: Record<string, unknown>;
};
export type AuditPage = { entries: AuditEntryDto[]; total: number; page: number; pageSize: number; timeZone: string };

const escapeLike = (s: string) => s.replace(/[%_\\]/g, (c) => `\\${c}`);

const nextDay = (date: string) => new Date(Date.parse(`${date}T12:00:00Z`) + 86_400_000).toISOString().slice(0, 10);

/** The audit log, newest first. Read only: nothing in the app updates or deletes these rows. */
export async function listAudit(q: AuditQuery, timeZone = DEFAULT_TIME_ZONE): Promise<AuditPage> {
  const db = await getDb();
  const filters: (SQL | undefined)[] = [];
  if (q.action) filters.push(like(auditLog.action, `${escapeLike(q.action)}%`));
  if (q.actor) filters.push(ilike(users.email, `%${escapeLike(q.actor)}%`));
  // Dates are the market's calendar days; "to" includes the whole of that day.
  const from = q.from ? zonedLocalToIso(q.from, "00:00", timeZone) : null;
  const to = q.to ? zonedLocalToIso(nextDay(q.to), "00:00", timeZone) : null;
  if (from) filters.push(gte(auditLog.at, new Date(from)));
  if (to) filters.push(lt(auditLog.at, new Date(to)));
  const where = and(...filters);
  const [rows, [{ n }]] = await Promise.all([
    db
      .select({ entry: auditLog, actorName: users.name, actorEmail: users.email, actorRole: users.role })
      .from(auditLog)
      .leftJoin(users, eq(users.id, auditLog.actorId))
      .where(where)
      .orderBy(desc(auditLog.at), desc(auditLog.id))
      .limit(q.pageSize)
      .offset((q.page - 1) * q.pageSize),
    db.select({ n: count() }).from(auditLog).leftJoin(users, eq(users.id, auditLog.actorId)).where(where),
  ]);
  return {
    entries: rows.map(({ entry, actorName, actorEmail, actorRole }) => ({
      id: entry.id,
      at: entry.at.toISOString(),
      action: entry.action,
      actor:
        entry.actorId && actorEmail && actorName && actorRole
          ? { id: entry.actorId, name: actorName, email: actorEmail, role: actorRole }
          : null,
      target: entry.targetType ? { type: entry.targetType, id: entry.targetId } : null,
      ip: entry.ip,
      data: entry.data,
    })),
    total: Number(n),
    page: q.page,
    pageSize: q.pageSize,
    timeZone,
  };
}
