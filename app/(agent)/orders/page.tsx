import type { Metadata } from "next";

import { OrdersTable } from "@/components/orders-table";
import { ButtonLink } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { requireUser } from "@/lib/auth/session";


export const metadata: Metadata = { title: "Orders" };

export default async function OrdersPage() {
  await requireUser("agent");
  return (
    <>
      <PageHeader
        title="Orders"
        description="Every sewer scope you have ordered, with a live countdown to its contingency deadline."
        actions={<ButtonLink href="/orders/new">New order</ButtonLink>}
      />
      <OrdersTable />
    </>
  );
}
