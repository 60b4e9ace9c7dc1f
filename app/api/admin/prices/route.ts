// GET /api/admin/prices - current prices and their history; POST - save a new version (admin only)
import { insertPriceVersion, pricesOverview } from "@/db/queries/admin-prices";
import { route } from "@/lib/api/route";
import { clientAddress } from "@/lib/auth/options";
import { priceVersionSchema } from "@/lib/validations/admin";

export const GET = route({ permission: "admin:manage", hide: true }, async () => pricesOverview());

export const POST = route({ permission: "admin:manage", hide: true, body: priceVersionSchema }, async ({ user, body, req }) => {
  const { sourceNote, ...prices } = body;
  await insertPriceVersion(
    { ...prices, sourceNote: sourceNote || null },
    { id: user.id, ip: clientAddress(Object.fromEntries(req.headers)) },
  );
  return pricesOverview();
});
