import type { Metadata } from "next";

import { OrdersScreen } from "@/components/orders-screen";
import { listOrdersPage } from "@/db/queries/order-lists";
import { requireUser } from "@/lib/auth/session";
import { listOrdersQuery } from "@/lib/validations/orders";

export const metadata: Metadata = { title: "Orders" };

// The table's default view, rendered on the server so the first page needs no second round trip.
const FIRST_PAGE = listOrdersQuery.parse({});

export default async function OrdersPage() {
  const user = await requireUser("agent");
  return <OrdersScreen initial={await listOrdersPage(user.id, FIRST_PAGE)} />;
}
