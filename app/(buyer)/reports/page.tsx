import type { Metadata } from "next";
import Link from "next/link";

import { DataList } from "@/components/ui/data-list";
import { EmptyState } from "@/components/ui/empty-state";
import { Money } from "@/components/ui/money";
import { PageHeader } from "@/components/ui/page-header";
import { StatusBadge } from "@/components/ui/status-badge";
import { listReportsForBuyer } from "@/db/queries/orders";
import { requireUser } from "@/lib/auth/session";
import { formatAddress, formatDate } from "@/lib/format";

export const metadata: Metadata = { title: "My reports" };

export default async function MyReportsPage() {
  const user = await requireUser("buyer");
  const reports = await listReportsForBuyer(user);
  return (
    <>
      <PageHeader title="My reports" description="Sewer scope reports your agent ordered for you. Unlock one to read the rated summary." />
      {reports.length === 0 ? (
        <EmptyState title="No reports yet" description="When the inspector delivers the scope of your listing, it appears here and you get an e-mail." />
      ) : (
        <DataList
          caption="My reports"
          rows={reports}
          rowKey={(r) => r.id}
          columns={[
            {
              key: "address",
              header: "Listing",
              primary: true,
              cell: (r) => (
                <Link href={`/reports/${r.id}`} className="font-medium text-teal underline underline-offset-4">
                  {formatAddress(r)}
                </Link>
              ),
            },
            { key: "status", header: "State", cell: (r) => <StatusBadge status={r.status} /> },
            { key: "visit", header: "Inspected", cell: (r) => (r.appointmentStart ? <span className="num">{formatDate(r.appointmentStart, r.timeZone)}</span> : "—") },
            { key: "inspector", header: "Inspector", cell: (r) => r.inspectorName ?? "—" },
            { key: "price", header: "Unlock price", align: "right", cell: (r) => (r.status === "delivered" ? <Money cents={r.priceCents} /> : "Paid") },
          ]}
        />
      )}
    </>
  );
}
