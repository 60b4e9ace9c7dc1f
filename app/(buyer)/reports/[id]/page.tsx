import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { z } from "zod";

import { DisputePanel } from "@/components/report/dispute-panel";
import { RatedSummary } from "@/components/report/rated-summary";
import { Alert } from "@/components/ui/alert";
import { buttonClasses } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { latestDisputeBy } from "@/db/queries/disputes";
import { paidRecently } from "@/db/queries/payments";
import { getReportView } from "@/db/queries/reports";
import { listShareLinks } from "@/db/queries/share-links";
import { requireUser } from "@/lib/auth/session";
import { idParams } from "@/lib/validations/orders";

import { LockedPreview } from "./locked-preview";
import { SharePanel } from "./share-panel";

export const metadata: Metadata = { title: "Sewer scope report", referrer: "no-referrer" };

const returnQuery = z.object({
  paid: z.string().max(255).optional().catch(undefined),
  cancelled: z.literal("1").optional().catch(undefined),
});

export default async function ReportPage({
  params,
  searchParams,
}: {
  params: Promise<{ id: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const user = await requireUser("buyer");
  const parsed = idParams.safeParse(await params);
  if (!parsed.success) notFound();
  const view = await getReportView(parsed.data.id, user);
  if (!view) notFound();
  const query = returnQuery.parse(await searchParams);
  const { address } = view;
  const header = {
    back: { href: "/reports", label: "My reports" },
    title: `${address.street}${address.unit ? `, ${address.unit}` : ""}`,
    description: `${address.city}, ${address.state} ${address.postalCode}`,
  };

  if (view.locked) {
    return (
      <>
        <PageHeader {...header} eyebrow="Sewer scope report · locked" className="print:[&>a]:hidden" />
        <LockedPreview preview={view} returnedPaid={query.paid !== undefined} cancelled={query.cancelled === "1"} />
      </>
    );
  }

  const [links, justPaid, dispute] = await Promise.all([
    listShareLinks(view.id, user.id),
    query.paid !== undefined ? paidRecently(view.id, user.id, query.paid) : false,
    latestDisputeBy(view.id, user.id),
  ]);
  return (
    <>
      <PageHeader
        {...header}
        eyebrow="Rated summary"
        className="print:[&>a]:hidden"
        actions={
          <div className="flex flex-wrap gap-2" data-print="hide">
            <a href={`/api/reports/${view.id}/pdf`} download className={buttonClasses({ variant: "primary" })}>
              Download PDF
            </a>
            <a href="#share" className={buttonClasses({ variant: "secondary" })}>
              Share a read-only link
            </a>
          </div>
        }
      />
      {justPaid ? (
        <Alert tone="success" title="Payment received" className="mb-8" role="status">
          The rated summary is unlocked. A receipt is on its way to {user.email}.
        </Alert>
      ) : null}
      <RatedSummary summary={view} />
      <div className="mt-12" data-print="hide">
        <SharePanel
          reportId={view.id}
          initialLinks={links.map(({ id, label, expiresAt, revokedAt, createdAt }) => ({ id, label, expiresAt, revokedAt, createdAt }))}
        />
      </div>
      <div className="mt-8" data-print="hide">
        <DisputePanel reportId={view.id} initial={dispute} />
      </div>
    </>
  );
}
