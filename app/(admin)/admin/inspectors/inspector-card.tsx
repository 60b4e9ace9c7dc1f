"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useId, useState, type ReactNode } from "react";
import { useForm } from "react-hook-form";

import { Alert } from "@/components/ui/alert";
import { Badge, type BadgeTone } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardFooter, CardHeader } from "@/components/ui/card";
import { Field } from "@/components/ui/field";
import { Textarea } from "@/components/ui/textarea";
import type { AdminInspectorDto, InspectorStatus } from "@/db/queries/admin-inspectors";
import { formatDate } from "@/lib/format";
import { verifyInspectorSchema, type VerifyInspectorInput } from "@/lib/validations/admin";

import { sendJson } from "@/lib/api/client";

const STATUS: Record<InspectorStatus, { label: string; tone: BadgeTone }> = {
  awaiting: { label: "Waiting for verification", tone: "warning" },
  changes_asked: { label: "Changes asked", tone: "copper" },
  verified: { label: "Verified", tone: "success" },
  licence_expired: { label: "Verified, licence expired", tone: "danger" },
  no_profile: { label: "No licence on file yet", tone: "neutral" },
};

type Decided = (inspector: AdminInspectorDto, message: string) => void;

const formatDay = (d: string) => formatDate(`${d}T12:00:00Z`);

export function InspectorCard({ inspector: i, onDecided }: { inspector: AdminInspectorDto; onDecided: Decided }) {
  const [rejecting, setRejecting] = useState(false);
  const [approving, setApproving] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const status = STATUS[i.status];
  const canApprove = i.status !== "verified" && !!i.licenceNumber && i.licenceValid;
  const canReject = i.status !== "no_profile";

  async function approve() {
    setProblem(null);
    setApproving(true);
    const res = await sendJson<{ inspector: AdminInspectorDto }>(`/api/admin/inspectors/${i.id}/verify`, "POST", { decision: "approve" });
    setApproving(false);
    if (!res.ok) return setProblem(res.error.message);
    onDecided(res.data.inspector, `${i.name} is verified and e-mailed; open orders in their service area now show on their job board.`);
  }

  return (
    <Card aria-labelledby={`inspector-${i.id}`}>
      <CardHeader
        as="h2"
        title={<span id={`inspector-${i.id}`}>{i.name}</span>}
        description={[i.company, i.email, i.phone].filter(Boolean).join(" · ")}
        actions={
          <>
            <Badge tone={status.tone}>{status.label}</Badge>
            {i.disabled ? <Badge tone="danger">Account disabled</Badge> : null}
          </>
        }
      />
      <CardBody className="space-y-4">
        <dl className="grid gap-x-6 gap-y-3 text-[0.9375rem] sm:grid-cols-2 lg:grid-cols-4">
          <Fact label="Licence number">
            {i.licenceNumber ? <span className="num">{i.licenceNumber}</span> : <span className="text-ink-2">None on file</span>}
          </Fact>
          <Fact label="Licence expires on">
            {i.licenceExpiresOn ? (
              <span className="flex flex-wrap items-center gap-2">
                <span className="num">{formatDay(i.licenceExpiresOn)}</span>
                {i.licenceValid ? null : <Badge tone="danger">Expired</Badge>}
              </span>
            ) : (
              <span className="text-ink-2">None on file</span>
            )}
          </Fact>
          <Fact label="Service area">
            {i.postalCodes.length ? (
              <span className="num">{i.postalCodes.join(", ")}</span>
            ) : (
              <span className="text-ink-2">No postal codes</span>
            )}
            {i.baseLocation ? <span className="text-ink-2 block text-sm">Based in {i.baseLocation}</span> : null}
          </Fact>
          <Fact label="Insurance certificate">
            {i.insurance ? (
              <a href={i.insurance.url} className="text-teal break-all underline underline-offset-2" rel="noopener">
                Download {i.insurance.fileName}
              </a>
            ) : (
              <Badge tone="warning">No certificate on file</Badge>
            )}
          </Fact>
        </dl>
        {i.verifiedAt ? (
          <p className="text-ink-2 text-sm">
            Verified on {formatDate(i.verifiedAt)}
            {i.verifiedByName ? ` by ${i.verifiedByName}` : ""}.
          </p>
        ) : null}
        {i.rejectedReason && !i.verifiedAt ? (
          <Alert tone="info" title="Changes asked of the inspector">
            {i.rejectedReason}
          </Alert>
        ) : null}
        {i.status !== "verified" && !i.licenceValid && i.licenceNumber ? (
          <p className="text-ink-2 text-sm">
            The licence on file has expired, so it cannot be approved until the inspector adds the renewed one.
          </p>
        ) : null}
        {i.status === "no_profile" ? (
          <p className="text-ink-2 text-sm">This inspector has not added a licence yet; there is nothing to check.</p>
        ) : null}
        {canApprove && !i.insurance ? (
          <p className="text-ink-2 text-sm">
            No insurance certificate is on file. Ask for one before approving, unless you have it from elsewhere.
          </p>
        ) : null}
        <div aria-live="polite">
          {problem ? (
            <Alert tone="danger" role={null}>
              {problem}
            </Alert>
          ) : null}
        </div>
        {rejecting ? (
          <RejectForm
            inspector={i}
            onCancel={() => setRejecting(false)}
            onDone={(inspector, message) => {
              setRejecting(false);
              onDecided(inspector, message);
            }}
          />
        ) : null}
      </CardBody>
      {(canApprove || canReject) && !rejecting ? (
        <CardFooter>
          {canReject ? (
            <Button variant="secondary" onClick={() => setRejecting(true)} aria-describedby={`inspector-${i.id}`}>
              {i.status === "verified" || i.status === "licence_expired" ? "Withdraw verification" : "Reject with a reason"}
            </Button>
          ) : null}
          {canApprove ? (
            <Button onClick={approve} pending={approving} aria-describedby={`inspector-${i.id}`}>
              Approve
            </Button>
          ) : null}
        </CardFooter>
      ) : null}
    </Card>
  );
}

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div>
      <dt className="text-ink-2 text-sm">{label}</dt>
      <dd className="mt-0.5">{children}</dd>
    </div>
  );
}

function RejectForm({ inspector, onCancel, onDone }: { inspector: AdminInspectorDto; onCancel: () => void; onDone: Decided }) {
  const formId = useId();
  const [problem, setProblem] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<VerifyInspectorInput>({ resolver: zodResolver(verifyInspectorSchema), defaultValues: { decision: "reject", reason: "" } });

  const onSubmit = handleSubmit(async (values) => {
    setProblem(null);
    const res = await sendJson<{ inspector: AdminInspectorDto }>(`/api/admin/inspectors/${inspector.id}/verify`, "POST", values);
    if (!res.ok) {
      const reason = res.error.fieldErrors?.reason?.[0];
      if (reason) setError("reason", { type: "server", message: reason });
      return setProblem(res.error.message);
    }
    onDone(res.data.inspector, `${inspector.name} stays off the job board; the reason is e-mailed to ${inspector.email}.`);
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby={`${formId}-title`} className="border-rule space-y-3 border-t pt-4">
      <h3 id={`${formId}-title`} className="font-semibold">
        Reject {inspector.name}
      </h3>
      <Field
        label="Reason"
        hint="Say what the inspector must fix. It is e-mailed to them and kept in the audit log."
        error={errors.reason?.message}
        required
      >
        {(c) => <Textarea rows={3} autoFocus {...c} {...register("reason")} />}
      </Field>
      <div aria-live="polite">
        {problem ? (
          <Alert tone="danger" role={null}>
            {problem}
          </Alert>
        ) : null}
      </div>
      <div className="flex flex-wrap justify-end gap-2">
        <Button variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" variant="danger" pending={isSubmitting}>
          Reject and send the reason
        </Button>
      </div>
    </form>
  );
}
