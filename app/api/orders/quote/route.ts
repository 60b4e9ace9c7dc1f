// POST /api/orders/quote - the price of a scope before ordering, and whether anyone serves the postal code
import { isPostalCodeServed } from "@/db/queries/inspectors";
import { listingAddressKey } from "@/db/queries/order-commands";
import { currentPrices } from "@/db/queries/prices";
import { findFreshReport } from "@/db/queries/reuse";
import { route } from "@/lib/api/route";
import { quoteScope } from "@/lib/pricing";
import { quoteSchema } from "@/lib/validations/orders";

export const POST = route({ permission: "orders:create", body: quoteSchema }, async ({ body }) => {
  const [prices, served] = await Promise.all([currentPrices(), isPostalCodeServed(body.postalCode)]);
  const quote = quoteScope(prices, { cleanoutKnown: body.cleanoutKnown, buildingSewers: body.buildingSewers, deadline: new Date(body.deadline) });
  const reuse = body.address?.street ? await findFreshReport(listingAddressKey({ ...body.address, postalCode: body.postalCode })) : null;
  return { served, lines: quote.lines, priceCents: quote.priceCents, inspectorPayoutCents: quote.inspectorPayoutCents, reuse };
});
