// GET /api/admin/audit - the audit log, newest first, filtered by action, actor and dates, paged (admin only)
import { listAudit } from "@/db/queries/admin-audit";
import { route } from "@/lib/api/route";
import { auditQuery } from "@/lib/validations/admin";

export const GET = route({ permission: "admin:manage", hide: true, query: auditQuery }, async ({ query }) => listAudit(query));
