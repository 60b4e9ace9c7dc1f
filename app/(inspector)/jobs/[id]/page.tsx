import type { Metadata } from "next";
import { notFound } from "next/navigation";

import { PageHeader } from "@/components/ui/page-header";
import { getJobDetailForInspector } from "@/db/queries/order-detail";
import { requireUser } from "@/lib/auth/session";
import { idParams, OCCUPANCY_LABELS, PROPERTY_TYPE_LABELS } from "@/lib/validations/orders";

import { JobDetail } from "./job-detail";

export const metadata: Metadata = { title: "Job" };

export default async function JobPage({ params }: { params: Promise<{ id: string }> }) {
  const user = await requireUser("inspector");
  const parsed = idParams.safeParse(await params);
  if (!parsed.success) notFound();
  const detail = await getJobDetailForInspector(parsed.data.id, user.id);
  if (!detail) notFound();
  const { address } = detail.job;
  const mine = detail.job.inspector?.id === user.id;
  const labels = {
    propertyType: PROPERTY_TYPE_LABELS[detail.job.propertyType as keyof typeof PROPERTY_TYPE_LABELS] ?? detail.job.propertyType,
    occupancy: OCCUPANCY_LABELS[detail.job.occupancy as keyof typeof OCCUPANCY_LABELS] ?? detail.job.occupancy,
  };
  return (
    <>
      <PageHeader
        back={mine ? { href: "/jobs/mine", label: "My jobs" } : { href: "/jobs", label: "Job board" }}
        eyebrow="Sewer scope job"
        title={`${address.street}${address.unit ? `, ${address.unit}` : ""}`}
        description={`${address.city}, ${address.state} ${address.postalCode}`}
      />
      <JobDetail initial={detail} inspectorId={user.id} labels={labels} />
    </>
  );
}
