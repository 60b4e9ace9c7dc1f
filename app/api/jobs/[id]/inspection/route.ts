// GET /api/jobs/{id}/inspection - the draft record, narrative and revision (assigned inspector only)
import { getInspection } from "@/db/queries/inspections";
import { getJobDetailForInspector } from "@/db/queries/order-detail";
import { route } from "@/lib/api/route";
import { notFound } from "@/lib/errors";
import { idParams } from "@/lib/validations/orders";

export const GET = route({ permission: "jobs:work", params: idParams }, async ({ user, params }) => {
  const detail = await getJobDetailForInspector(params.id, user.id);
  if (!detail || detail.job.inspector?.id !== user.id) throw notFound("That job");
  const row = await getInspection(params.id);
  return {
    job: detail.job,
    inspection: {
      record: row?.record ?? {},
      narrative: row?.narrative ?? "",
      recommendation: row?.recommendation ?? "",
      revision: row?.revision ?? 0,
      submittedAt: row?.submittedAt?.toISOString() ?? null,
      evaluation: row?.evaluation ?? null,
    },
  };
});
