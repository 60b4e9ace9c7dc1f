// GET /api/admin/disputes - the dispute queue (admin only)
import { z } from "zod";

import { listDisputes } from "@/db/queries/disputes";
import { route } from "@/lib/api/route";

export const GET = route({ permission: "admin:manage", hide: true, query: z.object({ status: z.enum(["open", "closed"]).optional() }) }, async ({ query }) => ({
  disputes: await listDisputes(query.status),
}));
