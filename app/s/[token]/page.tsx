import type { Metadata } from "next";
import { notFound } from "next/navigation";

import { RatedSummary } from "@/components/report/rated-summary";
import { dateText } from "@/components/report/report-text";
import { SiteFooter } from "@/components/site-footer";
import { SiteHeader } from "@/components/site-header";
import { Alert } from "@/components/ui/alert";
import { buttonClasses } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { getSharedReport } from "@/db/queries/reports";

export const dynamic = "force-dynamic";

export const metadata: Metadata = {
  title: "Shared sewer scope report",
  robots: { index: false, follow: false },
  referrer: "no-referrer",
};

export default async function SharedReportPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const shared = await getSharedReport(token);
  if (!shared) notFound();
  const { address } = shared;
  const expires = dateText(shared.shareExpiresAt);
  return (
    <div className="flex min-h-dvh flex-col">
      <SiteHeader />
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-6xl flex-1 px-4 py-8 outline-none sm:px-6 sm:py-10">
        <Alert tone="info" title="Shared read-only by the buyer" className="mb-8" role={null}>
          {expires ? `This link expires ${expires}. ` : ""}You can read the rated summary and download its PDF; nothing here can be changed.
        </Alert>
        <PageHeader
          eyebrow="Rated summary"
          title={`${address.street}${address.unit ? `, ${address.unit}` : ""}`}
          description={`${address.city}, ${address.state} ${address.postalCode}`}
          actions={
            <a href={`/s/${encodeURIComponent(token)}/pdf`} download className={buttonClasses({ variant: "primary" })} data-print="hide">
              Download PDF
            </a>
          }
        />
        <RatedSummary summary={shared} />
      </main>
      <SiteFooter />
    </div>
  );
}
