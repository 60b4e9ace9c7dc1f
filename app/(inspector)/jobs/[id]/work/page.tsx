import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";

import { PageHeader } from "@/components/ui/page-header";
import { getInspection } from "@/db/queries/inspections";
import { getJobDetailForInspector } from "@/db/queries/order-detail";
import { requireUser } from "@/lib/auth/session";
import { formatTimeRange } from "@/lib/time-zones";
import { idParams } from "@/lib/validations/orders";

import { Workspace } from "./workspace";

export const metadata: Metadata = { title: "Job workspace" };

export default async function WorkPage({ params }: { params: Promise<{ id: string }> }) {
  const user = await requireUser("inspector");
  const parsed = idParams.safeParse(await params);
  if (!parsed.success) notFound();
  const detail = await getJobDetailForInspector(parsed.data.id, user.id);
  if (!detail || detail.job.inspector?.id !== user.id) notFound();
  const { job } = detail;
  const { address } = job;
  const header = (
    <PageHeader
      back={{ href: `/jobs/${job.id}`, label: "The job" }}
      eyebrow="Job workspace"
      title={`${address.street}${address.unit ? `, ${address.unit}` : ""}`}
      description={
        job.appointment ? (
          <>
            {address.city} · visit <span className="num">{formatTimeRange(job.appointment.start, job.appointment.end, job.timeZone)}</span>
          </>
        ) : (
          address.city
        )
      }
      className="mb-5"
    />
  );

  if (job.status === "delivered" || job.status === "unlocked") {
    return (
      <>
        {header}
        <p className="max-w-[60ch] text-[0.9375rem]">
          This job is delivered, so its record is read-only now.{" "}
          <Link href={`/jobs/${job.id}`} className="text-teal underline underline-offset-2">
            Back to the job
          </Link>
        </p>
      </>
    );
  }
  if (job.status !== "accepted" && job.status !== "scheduled") notFound();

  const row = await getInspection(job.id);
  return (
    <>
      {header}
      <Workspace
        job={{ id: job.id, accessNotes: job.accessNotes, cleanoutNote: job.cleanoutKnown ? (job.cleanoutNote ?? "known") : null }}
        initial={{
          record: row?.record ?? {},
          narrative: row?.narrative ?? "",
          recommendation: row?.recommendation ?? "",
          revision: row?.revision ?? 0,
        }}
      />
    </>
  );
}
