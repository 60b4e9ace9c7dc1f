// GET /api/reports - the buyer's reports; an agent's reports once unlocked
import { listReportsForViewer } from "@/db/queries/reports";
import { route } from "@/lib/api/route";

export const GET = route({ permission: "reports:read" }, async ({ user }) => ({ reports: await listReportsForViewer(user) }));
