import type { Metadata } from "next";
import Link from "next/link";

import { DataList } from "@/components/ui/data-list";
import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { StatusBadge } from "@/components/ui/status-badge";
import { listJobsAssignedTo } from "@/db/queries/orders";
import { requireUser } from "@/lib/auth/session";
import { formatAddress, formatDateTime } from "@/lib/format";

export const metadata: Metadata = { title: "My jobs" };

export default async function MyJobsPage() {
  const user = await requireUser("inspector");
  const jobs = await listJobsAssignedTo(user.id);
  return (
    <>
      <PageHeader title="My jobs" description="Jobs you have taken, in every state." />
      {jobs.length === 0 ? (
        <EmptyState title="No jobs yet" description="Accept a job from the job board and it moves here." />
      ) : (
        <DataList
          caption="My jobs"
          rows={jobs}
          rowKey={(j) => j.id}
          columns={[
            {
              key: "address",
              header: "Listing",
              primary: true,
              cell: (j) => (
                <Link href={`/jobs/${j.id}`} className="underline-offset-4 hover:text-teal hover:underline">
                  {formatAddress(j)}
                </Link>
              ),
            },
            { key: "status", header: "State", cell: (j) => <StatusBadge status={j.status} /> },
            { key: "visit", header: "Visit", cell: (j) => (j.appointmentStart ? <span className="num">{formatDateTime(j.appointmentStart, j.timeZone)}</span> : "Not scheduled") },
            { key: "deadline", header: "Deadline", cell: (j) => <span className="num">{formatDateTime(j.deadline, j.timeZone)}</span> },
          ]}
        />
      )}
    </>
  );
}
