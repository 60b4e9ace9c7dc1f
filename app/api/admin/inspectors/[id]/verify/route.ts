// POST /api/admin/inspectors/{id}/verify - approve, or reject with a reason that is e-mailed (admin only)
import { decideVerification, listInspectorsForAdmin } from "@/db/queries/admin-inspectors";
import { route } from "@/lib/api/route";
import { clientAddress } from "@/lib/auth/options";
import { AppError, notFound } from "@/lib/errors";
import { userIdParams, verifyInspectorSchema } from "@/lib/validations/admin";

const PROBLEMS = {
  no_licence: "There is no licence on file: the inspector must add one before approval.",
  licence_expired: "The licence on file has expired: the inspector must add the renewed one before approval.",
} as const;

export const POST = route(
  { permission: "admin:manage", hide: true, params: userIdParams, body: verifyInspectorSchema },
  async ({ user, params, body, req }) => {
    const outcome = await decideVerification({
      inspectorId: params.id,
      decision: body.decision,
      reason: body.decision === "reject" ? (body.reason ?? null) : null,
      admin: user,
      ip: clientAddress(Object.fromEntries(req.headers)),
    });
    if (!outcome.ok) {
      if (outcome.problem === "not_found") throw notFound("That inspector");
      throw new AppError("unprocessable", PROBLEMS[outcome.problem]);
    }
    const [inspector] = await listInspectorsForAdmin("all", [params.id]);
    return { inspector, changed: outcome.changed };
  },
);
