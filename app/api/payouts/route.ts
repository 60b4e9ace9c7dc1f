// GET /api/payouts - the inspector's own payouts with monthly totals
import { listEarnings, monthlyTotals, payoutAccountOf } from "@/db/queries/payouts";
import { route } from "@/lib/api/route";

export const GET = route({ permission: "profile:edit" }, async ({ user }) => {
  const rows = await listEarnings(user.id);
  return { payouts: rows, months: monthlyTotals(rows), payoutAccountConnected: !!(await payoutAccountOf(user.id)) };
});
