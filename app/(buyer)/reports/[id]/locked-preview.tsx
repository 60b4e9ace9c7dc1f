
import { dateText, ftNumber } from "@/components/report/report-text";
import { Alert } from "@/components/ui/alert";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { Money } from "@/components/ui/money";
import { SeverityScale } from "@/components/ui/severity-badge";
import { UNLOCK_INCLUDES, type ReportPreview } from "@/lib/reports/dto";

import { ConfirmingPayment } from "./confirming-payment";
import { UnlockButton } from "./unlock-button";
import { DetailRow } from "@/components/ui/detail-row";

type PaymentState = "confirming" | "not-completed" | "refunded" | null;

function paymentState(preview: ReportPreview, returnedPaid: boolean, cancelled: boolean): PaymentState {
  const status = preview.payment?.status;
  if (returnedPaid || status === "paid") return "confirming";
  if (status === "refunded" || status === "partially_refunded") return "refunded";
  if (cancelled || status === "pending" || status === "expired") return "not-completed";
  return null;
}

/** Before payment: what was inspected and what unlocking gives. No rating, findings, costs or clips are in this page. */
export function LockedPreview({ preview, returnedPaid, cancelled }: { preview: ReportPreview; returnedPaid: boolean; cancelled: boolean }) {
  const state = paymentState(preview, returnedPaid, cancelled);
  const includes = preview.unlockIncludes.length > 0 ? preview.unlockIncludes : UNLOCK_INCLUDES;
  const visited = dateText(preview.visitedOn);
  const delivered = dateText(preview.deliveredAt, preview.timeZone);
  const inspector = preview.inspector;

  return (
    <div className="space-y-6">
      {state === "confirming" ? <ConfirmingPayment reportId={preview.id} /> : null}
      {state === "not-completed" ? (
        <Alert tone="warning" title="Payment not completed" role="status">
          Nothing was charged; the report is still locked. You can try again below.
        </Alert>
      ) : null}
      {state === "refunded" ? (
        <Alert tone="info" title="Your payment was refunded" role="status">
          The report is locked again. You can unlock it again below.
        </Alert>
      ) : null}

      <div className="grid gap-6 lg:grid-cols-[1fr_22rem]">
        <Card className="self-start">
          <CardHeader
            title="What was inspected"
            description="The inspector has delivered this sewer scope. The rated summary opens once you pay."
          />
          <CardBody>
            <dl className="divide-rule divide-y">
              <DetailRow label="Visit">{visited ? <span className="num">{visited}</span> : "Date not recorded"}</DetailRow>
              {delivered ? (
                <DetailRow label="Delivered">
                  <span className="num">{delivered}</span>
                </DetailRow>
              ) : null}
              <DetailRow label="Inspector">
                {inspector ? (
                  <>
                    {inspector.name}
                    {inspector.company ? <span className="text-ink-2"> · {inspector.company}</span> : null}
                  </>
                ) : (
                  "Not recorded"
                )}
              </DetailRow>
              <DetailRow label="Licence">{inspector?.licenceNumber ? <span className="num">{inspector.licenceNumber}</span> : "Not on file"}</DetailRow>
              <DetailRow label="Clips">
                <span className="num">{preview.clipCount}</span> video {preview.clipCount === 1 ? "clip" : "clips"}
              </DetailRow>
              <DetailRow label="Line surveyed">
                {preview.surveyedFt !== null ? (
                  <>
                    <span className="num">{ftNumber(preview.surveyedFt)}</span> ft
                  </>
                ) : (
                  "Not recorded"
                )}
              </DetailRow>
            </dl>
          </CardBody>
        </Card>

        <Card className="self-start">
          <CardHeader title="Unlock the rated summary" />
          <CardBody className="space-y-4">
            <p className="flex items-baseline gap-2">
              <Money cents={preview.priceCents} whole className="text-ink text-3xl font-semibold" />
              <span className="text-ink-2 text-sm">once, for this report</span>
            </p>
            <div>
              <h3 className="text-ink font-sans text-sm font-semibold">You get</h3>
              <ul className="marker:text-copper mt-2 list-disc space-y-1.5 pl-5 text-[0.9375rem]">
                {includes.map((item) => (
                  <li key={item}>{item}</li>
                ))}
              </ul>
            </div>
            {state === "confirming" ? null : <UnlockButton reportId={preview.id} />}
            <p className="text-ink-2 text-xs">Payment is handled by our card processor; Gradeline never sees your card number.</p>
          </CardBody>
        </Card>
      </div>

      <section aria-labelledby="scale-title" className="rounded-card border-rule bg-paper-2/50 border px-5 py-5">
        <h2 id="scale-title" className="text-lg font-semibold">
          The severity rating
        </h2>
        <p className="text-ink-2 mt-1 mb-4 max-w-[68ch] text-sm">
          Every rated summary places the line on this one scale, from 1 (sound) to 5 (critical), with a sentence on what it means for the
          house. This report&rsquo;s rating is shown once it is unlocked.
        </p>
        <SeverityScale className="max-w-lg" />
      </section>
    </div>
  );
}
