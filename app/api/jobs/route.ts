// GET /api/jobs - the job board (verified inspectors); ?assigned=me - the inspector's own jobs
import { z } from "zod";

import { listAssignedJobs, listBoardJobs } from "@/db/queries/order-lists";
import { requireVerifiedInspector } from "@/lib/api/inspector";
import { route } from "@/lib/api/route";

export const GET = route({ permission: "jobs:list", query: z.object({ assigned: z.literal("me").optional() }) }, async ({ user, query }) => {
  if (query.assigned === "me") return { jobs: await listAssignedJobs(user.id) };
  await requireVerifiedInspector(user.id);
  return { jobs: await listBoardJobs(user.id) };
});
