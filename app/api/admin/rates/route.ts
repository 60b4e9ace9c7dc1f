// GET /api/admin/rates - the repair-cost rate table in force and its history; POST - save a new version (admin only)
import { insertRateVersion, ratesOverview } from "@/db/queries/admin-prices";
import { route } from "@/lib/api/route";
import { clientAddress } from "@/lib/auth/options";
import { rateVersionSchema } from "@/lib/validations/admin";

export const GET = route({ permission: "admin:manage", hide: true }, async () => ratesOverview());

export const POST = route({ permission: "admin:manage", hide: true, body: rateVersionSchema }, async ({ user, body, req }) => {
  await insertRateVersion(body.table, body.sourceNote || null, { id: user.id, ip: clientAddress(Object.fromEntries(req.headers)) });
  return ratesOverview();
});
