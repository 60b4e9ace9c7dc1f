import { OrdersTable } from "@/components/orders-table";
import { ButtonLink } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import type { OrderListDto } from "@/lib/orders/dto";

/** The agent's orders page below the shell, from its first page of orders; the bench's fixed-data baseline renders it too. */
export function OrdersScreen({ initial }: { initial: OrderListDto }) {
  return (
    <>
      <PageHeader
        title="Orders"
        description="Every sewer scope you have ordered, with a live countdown to its contingency deadline."
        actions={<ButtonLink href="/orders/new">New order</ButtonLink>}
      />
      <OrdersTable initial={initial} />
    </>
  );
}
