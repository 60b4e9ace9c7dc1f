import type { Metadata } from "next";
import { notFound } from "next/navigation";

import { OrdersScreen } from "@/components/orders-screen";

import { fixedOrderList } from "./fixed-orders";

// The benchmark's baseline for P2: the orders page from fixed in-memory data, inside a layout shaped
// like the agent's (async shell, error boundary), with no session or database work.
export const metadata: Metadata = { title: "Orders", robots: { index: false } };

const ORDERS = fixedOrderList();

export default async function FixedOrdersPage() {
  if (process.env.GRADELINE_BENCH_ROUTES !== "1") notFound();
  return <OrdersScreen initial={await Promise.resolve(ORDERS)} />;
}
