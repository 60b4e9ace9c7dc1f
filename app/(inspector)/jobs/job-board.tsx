"use client";

import Link from "next/link";
import { useRef, useState } from "react";
import useSWR from "swr";

import { Countdown } from "@/components/countdown";
import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { Money } from "@/components/ui/money";
import { Skeleton } from "@/components/ui/skeleton";
import { formatDateTime } from "@/lib/format";
import type { JobDto } from "@/lib/orders/dto";
import { formatTimeRange } from "@/lib/time-zones";

type Notice = { tone: "success" | "warning" | "danger"; text: string; jobId?: string };

async function getJobs(url: string): Promise<JobDto[]> {
  const res = await fetch(url, { headers: { accept: "application/json" } });
  const data = (await res.json().catch(() => null)) as { jobs?: JobDto[]; error?: { message?: string } } | null;
  if (!res.ok || !data?.jobs) throw new Error(data?.error?.message ?? "The job board could not be loaded.");
  return data.jobs;
}

export function JobBoard() {
  const { data: jobs, error, isLoading, mutate } = useSWR("/api/jobs", getJobs, { refreshInterval: 15_000 });
  const [notice, setNotice] = useState<Notice | null>(null);
  const [pending, setPending] = useState<string | null>(null);
  const noticeRef = useRef<HTMLDivElement>(null);

  const show = (n: Notice) => {
    setNotice(n);
    requestAnimationFrame(() => noticeRef.current?.focus());
  };

  async function accept(job: JobDto) {
    setPending(job.id);
    setNotice(null);
    try {
      const res = await fetch(`/api/jobs/${job.id}/accept`, { method: "POST", headers: { "content-type": "application/json" } });
      const body = (await res.json().catch(() => null)) as { error?: { message?: string } } | null;
      if (res.ok) {
        show({ tone: "success", text: `You have the job at ${job.address.street}. Propose visit times next.`, jobId: job.id });
      } else if (res.status === 409 || res.status === 404) {
        show({ tone: "warning", text: res.status === 409 ? (body?.error?.message ?? "Another inspector took this job a moment ago.") : "That job is no longer on the board." });
      } else {
        show({ tone: "danger", text: body?.error?.message ?? "The job could not be accepted. Please try again." });
        return;
      }
      await mutate((current) => current?.filter((j) => j.id !== job.id), { revalidate: true });
    } catch {
      show({ tone: "danger", text: "Gradeline could not be reached. Check your connection and try again." });
    } finally {
      setPending(null);
    }
  }

  return (
    <div className="space-y-5">
      <div ref={noticeRef} tabIndex={-1} aria-live="polite" className="outline-none">
        {notice ? (
          <Alert tone={notice.tone} role={notice.tone === "danger" ? "alert" : "status"}>
            {notice.text}
            {notice.jobId ? (
              <>
                {" "}
                <Link href={`/jobs/${notice.jobId}`}>Open the job</Link>
              </>
            ) : null}
          </Alert>
        ) : null}
      </div>

      {error && !jobs ? (
        <Alert tone="danger" title="The job board could not be loaded">
          {error instanceof Error ? error.message : "Check your connection."} It refreshes by itself every 15 seconds.
        </Alert>
      ) : null}

      {isLoading && !jobs ? (
        <div className="grid gap-4 md:grid-cols-2" aria-hidden="true">
          {Array.from({ length: 3 }, (_, i) => (
            <Skeleton key={i} className="h-52" />
          ))}
        </div>
      ) : jobs && jobs.length === 0 ? (
        <EmptyState title="No open jobs in your area right now" description="New orders in your postal codes appear here as soon as an agent places them. The board refreshes by itself." />
      ) : jobs ? (
        <>
          <p className="sr-only" role="status">
            {jobs.length} open {jobs.length === 1 ? "job" : "jobs"}, soonest deadline first.
          </p>
          <ul className="grid gap-4 md:grid-cols-2">
            {jobs.map((job) => (
              <JobCard key={job.id} job={job} pending={pending === job.id} disabled={pending !== null} onAccept={() => accept(job)} />
            ))}
          </ul>
        </>
      ) : null}
    </div>
  );
}

function JobCard({ job, pending, disabled, onAccept }: { job: JobDto; pending: boolean; disabled: boolean; onAccept: () => void }) {
  const headingId = `job-${job.id}`;
  return (
    <li aria-labelledby={headingId} className="flex flex-col rounded-card border border-rule bg-white shadow-card">
      <div className="flex items-start justify-between gap-4 border-b border-rule px-5 py-4">
        <div className="min-w-0">
          <h2 id={headingId} className="text-lg leading-snug font-semibold">
            <Link href={`/jobs/${job.id}`} className="underline-offset-4 hover:text-teal hover:underline">
              {job.address.street}
              {job.address.unit ? `, ${job.address.unit}` : ""}
            </Link>
          </h2>
          <p className="text-sm text-ink-2">
            {job.address.city}, {job.address.state} <span className="num">{job.address.postalCode}</span>
          </p>
        </div>
        <div className="shrink-0 text-right">
          <p className="text-xs text-ink-2">Your payout</p>
          <Money cents={job.inspectorPayoutCents} className="text-lg font-semibold text-teal" />
        </div>
      </div>
      <dl className="grid flex-1 gap-3 px-5 py-4 text-[0.9375rem]">
        <div>
          <dt className="text-sm text-ink-2">Deadline</dt>
          <dd>
            <Countdown to={job.deadline} timeZone={job.timeZone} />
            <span className="num block text-xs text-ink-2" aria-hidden="true">
              {formatDateTime(job.deadline, job.timeZone)}
            </span>
          </dd>
        </div>
        <div>
          <dt className="text-sm text-ink-2">Visit windows</dt>
          <dd>
            <ul>
              {job.visitWindows.slice(0, 3).map((w) => (
                <li key={w.start} className="num text-sm">
                  {formatTimeRange(w.start, w.end, job.timeZone)}
                </li>
              ))}
              {job.visitWindows.length > 3 ? <li className="text-sm text-ink-2">and {job.visitWindows.length - 3} more</li> : null}
            </ul>
          </dd>
        </div>
        <div>
          <dt className="text-sm text-ink-2">Access</dt>
          <dd>{job.accessNotes}</dd>
        </div>
        <div>
          <dt className="text-sm text-ink-2">Add-ons</dt>
          <dd className="flex flex-wrap gap-1.5 pt-0.5">
            {job.addOns.length ? job.addOns.map((a) => <Badge key={a} tone="copper">{a}</Badge>) : <span className="text-ink-2">None</span>}
          </dd>
        </div>
      </dl>
      <div className="flex flex-wrap items-center justify-between gap-3 border-t border-rule bg-paper px-5 py-3">
        <Link href={`/jobs/${job.id}`} className="text-sm text-teal underline underline-offset-4">
          Details<span className="sr-only"> for {job.address.street}</span>
        </Link>
        <Button onClick={onAccept} pending={pending} disabled={disabled}>
          Accept job<span className="sr-only"> at {job.address.street}</span>
        </Button>
      </div>
    </li>
  );
}
