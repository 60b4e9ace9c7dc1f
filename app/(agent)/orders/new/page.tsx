import type { Metadata } from "next";

import { PageHeader } from "@/components/ui/page-header";
import { requireUser } from "@/lib/auth/session";

import { NewOrderForm } from "./new-order-form";

export const metadata: Metadata = { title: "New order" };

export default async function NewOrderPage() {
  await requireUser("agent");
  return (
    <>
      <PageHeader
        back={{ href: "/orders", label: "Orders" }}
        title="Order a sewer scope"
        description="Tell us about the listing, how to get in and when the contingency ends. The price updates as you go."
      />
      <NewOrderForm />
    </>
  );
}
