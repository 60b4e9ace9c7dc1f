// POST /api/reports/{id}/checkout - a Checkout Session for the invited buyer to unlock the rated summary
import { getReportView } from "@/db/queries/reports";
import { limitPerUser } from "@/lib/api/rate-limit";
import { route } from "@/lib/api/route";
import { AppError, notFound } from "@/lib/errors";
import { createReportCheckout } from "@/lib/payments/checkout";
import { idParams } from "@/lib/validations/orders";

export const POST = route({ permission: "reports:pay", params: idParams }, async ({ user, params }) => {
  const view = await getReportView(params.id, user);
  if (!view) throw notFound("That report");
  if (!view.locked) throw new AppError("conflict", "You have already unlocked this report.");
  await limitPerUser("checkout", user.id);
  const address = `${view.address.street}, ${view.address.city}`;
  const { url } = await createReportCheckout({ orderId: view.id, buyer: user, amountCents: view.priceCents, productName: `Sewer scope rated summary: ${address}` });
  return { url };
});
