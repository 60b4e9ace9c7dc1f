// GET /api/admin/payments - every payment with its refunds and payout (admin only)
import { listPaymentsForAdmin } from "@/db/queries/admin-payments";
import { route } from "@/lib/api/route";

export const GET = route({ permission: "admin:manage", hide: true }, async () => ({ payments: await listPaymentsForAdmin() }));
