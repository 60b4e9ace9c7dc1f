import type { Metadata } from "next";

import { PageHeader } from "@/components/ui/page-header";
import { listAudit } from "@/db/queries/admin-audit";
import { requireUser } from "@/lib/auth/session";
import { zodFieldErrors } from "@/lib/errors";
import { auditQuery } from "@/lib/validations/admin";

import { AuditView } from "./audit-view";

export const metadata: Metadata = { title: "Audit log" };

export default async function AdminAuditPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  await requireUser("admin");
  const raw = Object.fromEntries(Object.entries(await searchParams).map(([k, v]) => [k, (Array.isArray(v) ? v[0] : v) ?? ""]));
  const parsed = auditQuery.safeParse(raw);
  const log = await listAudit(parsed.success ? parsed.data : auditQuery.parse({}));
  return (
    <>
      <PageHeader
        title="Audit log"
        description="Every state change, money movement, admin action and sign-in failure: who, when, what and from where. Entries are only ever added; nobody can change or remove one."
      />
      <AuditView
        log={log}
        filters={{ action: raw.action ?? "", actor: raw.actor ?? "", from: raw.from ?? "", to: raw.to ?? "" }}
        fieldErrors={parsed.success ? {} : zodFieldErrors(parsed.error.issues)}
      />
    </>
  );
}
