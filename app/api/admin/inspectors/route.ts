// GET /api/admin/inspectors - every inspector, or ?filter=queue for the verification queue (admin only)
import { listInspectorsForAdmin } from "@/db/queries/admin-inspectors";
import { route } from "@/lib/api/route";
import { adminInspectorsQuery } from "@/lib/validations/admin";

export const GET = route({ permission: "admin:manage", hide: true, query: adminInspectorsQuery }, async ({ query }) => ({
  inspectors: await listInspectorsForAdmin(query.filter),
}));
