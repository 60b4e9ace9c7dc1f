// PUT /api/jobs/{id}/draft - autosave; refused with 409 when another tab saved since baseRevision
import { NextResponse } from "next/server";

import { saveDraft } from "@/db/queries/inspections";
import { requireWorkableJob } from "@/lib/api/assigned-job";
import { route } from "@/lib/api/route";
import { draftSchema } from "@/lib/validations/inspection";
import { idParams } from "@/lib/validations/orders";

export const PUT = route({ permission: "jobs:work", params: idParams, body: draftSchema }, async ({ user, params, body }) => {
  await requireWorkableJob(params.id, user.id);
  const { baseRevision, ...draft } = body;
  const saved = await saveDraft(params.id, draft, baseRevision);
  if ("conflict" in saved) {
    return NextResponse.json(
      { error: { code: "conflict", message: "This job was changed in another tab or device. Reload to see the latest." }, currentRevision: saved.conflict },
      { status: 409 },
    );
  }
  return { revision: saved.revision };
});
