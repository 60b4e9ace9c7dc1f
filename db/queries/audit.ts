import "server-only";

import { getDb, type Tx } from "../client";
import { auditLog } from "../schema";

export type AuditEntry = {
  actorId?: string | null;
  action: string;
  targetType?: string;
  targetId?: string;
  ip?: string | null;
  data?: Record<string, unknown>;
};

export async function recordAudit(entry: AuditEntry, tx?: Tx) {
  const db = tx ?? (await getDb());
  await db.insert(auditLog).values({ ...entry, data: entry.data ?? {} });
}
