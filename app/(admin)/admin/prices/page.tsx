import type { Metadata } from "next";

import { PageHeader } from "@/components/ui/page-header";
import { pricesOverview, ratesOverview } from "@/db/queries/admin-prices";
import { requireUser } from "@/lib/auth/session";

import { PricesView } from "./prices-view";

export const metadata: Metadata = { title: "Prices and rates" };

export default async function AdminPricesPage() {
  await requireUser("admin");
  const [prices, rates] = await Promise.all([pricesOverview(), ratesOverview()]);
  return (
    <>
      <PageHeader
        title="Prices and rates"
        description="Every change is saved as a new dated version with who made it. Orders keep the price they were quoted, and reports keep the rates they were computed with."
      />
      <PricesView prices={prices} rates={rates} />
    </>
  );
}
