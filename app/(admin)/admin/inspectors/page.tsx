import type { Metadata } from "next";

import { PageHeader } from "@/components/ui/page-header";
import { INSURANCE_LINK_SECONDS, listInspectorsForAdmin } from "@/db/queries/admin-inspectors";
import { requireUser } from "@/lib/auth/session";

import { InspectorsView } from "./inspectors-view";

export const metadata: Metadata = { title: "Inspectors" };

export default async function AdminInspectorsPage() {
  await requireUser("admin");
  const inspectors = await listInspectorsForAdmin("all");
  return (
    <>
      <PageHeader
        title="Inspectors"
        description="Check each inspector's licence and insurance certificate before their job board opens. A rejection keeps them off the board, and its reason is e-mailed to them. A licence that expires un-verifies its inspector automatically."
      />
      <InspectorsView initial={inspectors} linkSeconds={INSURANCE_LINK_SECONDS} />
    </>
  );
}
