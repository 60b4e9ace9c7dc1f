// GET /api/reports/{id} - the locked preview or, once paid, the rated summary; 404 for anyone not entitled
import { getReportView } from "@/db/queries/reports";
import { route } from "@/lib/api/route";
import { notFound } from "@/lib/errors";
import { idParams } from "@/lib/validations/orders";

export const GET = route({ permission: "reports:read", params: idParams }, async ({ user, params }) => {
  const view = await getReportView(params.id, user);
  if (!view) throw notFound("That report");
  return view;
});
