import type { Metadata } from "next";

import { Alert } from "@/components/ui/alert";
import { DataList } from "@/components/ui/data-list";
import { EmptyState } from "@/components/ui/empty-state";
import { Money } from "@/components/ui/money";
import { PageHeader } from "@/components/ui/page-header";
import { inspectorStanding, listOpenJobsForInspector } from "@/db/queries/orders";
import { requireUser } from "@/lib/auth/session";
import { formatAddress, formatCountdown, formatDateTime } from "@/lib/format";

export const metadata: Metadata = { title: "Job board" };

export default async function JobBoardPage() {
  const user = await requireUser("inspector");
  const standing = await inspectorStanding(user.id);
  if (!standing.canTakeJobs) {
    return (
      <>
        <PageHeader title="Job board" description="Open sewer scopes in your service area, soonest deadline first." />
        <Alert tone="warning" title={standing.verified ? "Your licence has expired" : "Your account is waiting for verification"}>
          {standing.verified
            ? "Add your renewed licence to your profile; the job board opens again once an admin has checked it."
            : "An admin checks your licence and insurance before the job board opens. This usually takes one working day."}
        </Alert>
      </>
    );
  }
  const jobs = await listOpenJobsForInspector(user.id);
  const now = new Date();
  return (
    <>
      <PageHeader title="Job board" description="Open sewer scopes in your service area, soonest deadline first." />
      {jobs.length === 0 ? (
        <EmptyState title="No open jobs in your area right now" description="New orders in your postal codes appear here as soon as an agent places them." />
      ) : (
        <DataList
          caption="Open jobs"
          rows={jobs}
          rowKey={(j) => j.id}
          columns={[
            { key: "address", header: "Listing", primary: true, cell: (j) => formatAddress(j) },
            {
              key: "deadline",
              header: "Deadline",
              cell: (j) => (
                <span>
                  <span className="num">{formatDateTime(j.deadline, j.timeZone)}</span>
                  <span className="block text-xs text-ink-2">{formatCountdown(j.deadline, now)}</span>
                </span>
              ),
            },
            { key: "access", header: "Access", cell: (j) => j.accessNotes },
            { key: "addons", header: "Add-ons", cell: (j) => j.priceLines.slice(1).map((l) => l.label).join(", ") || "None" },
            { key: "payout", header: "Your payout", align: "right", cell: (j) => <Money cents={j.priceCents - j.platformFeeCents} /> },
          ]}
        />
      )}
    </>
  );
}
