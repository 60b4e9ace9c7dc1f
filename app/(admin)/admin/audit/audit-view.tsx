"use client";

import Link from "next/link";
import { useId } from "react";

import { Alert } from "@/components/ui/alert";
import { Button, ButtonLink } from "@/components/ui/button";
import { DataList } from "@/components/ui/data-list";
import { EmptyState } from "@/components/ui/empty-state";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import type { AuditEntryDto, AuditPage } from "@/db/queries/admin-audit";
import { AUDIT_ACTIONS as ACTIONS } from "@/lib/audit-actions";
import { formatDateTime } from "@/lib/format";
import { US_TIME_ZONES } from "@/lib/time-zones";

type Filters = { action: string; actor: string; from: string; to: string };

const PREFIXES = [
  ["admin.", "Admin actions"],
  ["auth.", "Sign-ins"],
  ["disputes.", "Disputes"],
  ["inspector.", "Inspectors"],
  ["payments.", "Payments"],
  ["security.", "Security"],
] as const;

function pageHref(filters: Filters, page: number) {
  const p = new URLSearchParams();
  for (const [k, v] of Object.entries(filters)) if (v) p.set(k, v);
  if (page > 1) p.set("page", String(page));
  const s = p.toString();
  return `/admin/audit${s ? `?${s}` : ""}`;
}

export function AuditView({ log, filters, fieldErrors }: { log: AuditPage; filters: Filters; fieldErrors: Record<string, string[]> }) {
  const listId = useId();
  const pages = Math.max(1, Math.ceil(log.total / log.pageSize));
  const hasErrors = Object.keys(fieldErrors).length > 0;
  const when = (e: AuditEntryDto) => formatDateTime(e.at, log.timeZone);
  return (
    <div className="space-y-6">
      <form
        method="get"
        action="/admin/audit"
        role="search"
        aria-label="Filter the audit log"
        className="rounded-card border-rule grid gap-4 border bg-white p-5 sm:grid-cols-2 lg:grid-cols-[1.2fr_1.2fr_1fr_1fr_auto] lg:items-end"
      >
        <Field label="Action starts with" error={fieldErrors.action?.[0]} optional>
          {(c) => <Input {...c} name="action" defaultValue={filters.action} list={`${listId}-actions`} autoComplete="off" />}
        </Field>
        <datalist id={`${listId}-actions`}>
          {PREFIXES.map(([value, label]) => (
            <option key={value} value={value}>
              {label}
            </option>
          ))}
          {Object.entries(ACTIONS).map(([value, label]) => (
            <option key={value} value={value}>
              {label}
            </option>
          ))}
        </datalist>
        <Field label="Who (e-mail)" error={fieldErrors.actor?.[0]} optional>
          {(c) => <Input {...c} name="actor" defaultValue={filters.actor} autoComplete="off" />}
        </Field>
        <Field label="From" error={fieldErrors.from?.[0]} optional>
          {(c) => <Input {...c} type="date" name="from" defaultValue={filters.from} />}
        </Field>
        <Field label="To" error={fieldErrors.to?.[0]} optional>
          {(c) => <Input {...c} type="date" name="to" defaultValue={filters.to} />}
        </Field>
        <div className="flex gap-2 lg:pb-0.5">
          <Button type="submit">Filter</Button>
          <ButtonLink href="/admin/audit" variant="ghost">
            Clear
          </ButtonLink>
        </div>
      </form>

      {hasErrors ? (
        <Alert tone="warning">Some filters could not be used; showing the whole log instead. Fix the fields marked above.</Alert>
      ) : null}
      <p className="text-ink-2 text-sm" role="status">
        {log.total} {log.total === 1 ? "entry" : "entries"}, newest first · times in{" "}
        {US_TIME_ZONES.find((z) => z.id === log.timeZone)?.label ?? log.timeZone} time
      </p>

      <DataList
        caption="Audit log entries, newest first"
        rows={log.entries}
        rowKey={(e) => e.id}
        empty={<EmptyState title="No entries match" description="Widen the dates, or clear the filters." />}
        columns={[
          {
            key: "what",
            header: "What",
            primary: true,
            cell: (e) => (
              <span className="flex flex-col">
                <span>{ACTIONS[e.action] ?? e.action}</span>
                <code className="num text-ink-2 text-xs font-normal">{e.action}</code>
              </span>
            ),
          },
          {
            key: "when",
            header: "When",
            cell: (e) => (
              <time dateTime={e.at} className="num text-sm whitespace-nowrap">
                {when(e)}
              </time>
            ),
          },
          {
            key: "who",
            header: "Who",
            cell: (e) =>
              e.actor ? (
                <span className="flex flex-col text-sm">
                  <span>{e.actor.name}</span>
                  <span className="text-ink-2 break-all">{e.actor.email}</span>
                </span>
              ) : (
                <span className="text-ink-2 text-sm">{e.ip === "system" ? "Gradeline (automatic)" : "Nobody signed in"}</span>
              ),
          },
          {
            key: "target",
            header: "Target",
            cell: (e) => (e.target ? <Target entry={e} /> : "—"),
          },
          { key: "from", header: "From", cell: (e) => <span className="num text-sm">{e.ip ?? "—"}</span> },
          {
            key: "details",
            header: "Details",
            cell: (e) =>
              Object.keys(e.data).length ? (
                <details className="text-left text-sm">
                  <summary className="text-teal cursor-pointer">
                    Details
                    <span className="sr-only">
                      {" "}
                      of {ACTIONS[e.action] ?? e.action} at {when(e)}
                    </span>
                  </summary>
                  <pre className="num bg-paper-2 mt-2 max-w-[28rem] overflow-x-auto rounded-sm p-2 text-xs whitespace-pre-wrap">
                    {JSON.stringify(e.data, null, 2)}
                  </pre>
                </details>
              ) : (
                "—"
              ),
          },
        ]}
      />

      {pages > 1 ? (
        <nav aria-label="Pages of the audit log" className="flex items-center justify-between gap-4">
          {log.page > 1 ? (
            <Link href={pageHref(filters, log.page - 1)} className="text-teal underline underline-offset-2" rel="prev">
              Newer entries
            </Link>
          ) : (
            <span />
          )}
          <span className="num text-ink-2 text-sm">
            Page {log.page} of {pages}
          </span>
          {log.page < pages ? (
            <Link href={pageHref(filters, log.page + 1)} className="text-teal underline underline-offset-2" rel="next">
              Older entries
            </Link>
          ) : (
            <span />
          )}
        </nav>
      ) : null}
    </div>
  );
}

/** A user target reads as their e-mail when the entry recorded it; other targets as type and short id. */
function Target({ entry }: { entry: AuditEntryDto }) {
  const email = typeof entry.data.email === "string" ? entry.data.email : null;
  return (
    <span className="flex flex-col text-sm">
      {email && entry.target?.type === "user" ? <span className="break-all">{email}</span> : null}
      <span className="num text-ink-2 break-all" title={entry.target?.id ?? undefined}>
        {entry.target?.type} {entry.target?.id?.slice(0, 8)}
      </span>
    </span>
  );
}
