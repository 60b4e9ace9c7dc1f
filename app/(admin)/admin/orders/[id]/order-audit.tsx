import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { DataList } from "@/components/ui/data-list";
import type { AdminOrder } from "@/db/queries/admin-order";
import { AUDIT_ACTIONS } from "@/lib/audit-actions";
import { formatDateTime } from "@/lib/format";

/** Audit entries about this order, its payments and its disputes, newest first. */
export function OrderAudit({ entries, timeZone }: { entries: AdminOrder["audit"]; timeZone: string }) {
  return (
    <Card>
      <CardHeader title="Audit log" description="Admin actions and money movements on this order, its payments and its disputes." />
      <CardBody>
        <DataList
          caption="Audit entries for this order, newest first"
          rows={entries}
          rowKey={(e) => e.id}
          empty={<p className="text-ink-2">No audit entries for this order.</p>}
          columns={[
            { key: "what", header: "What", primary: true, cell: (e) => AUDIT_ACTIONS[e.action] ?? e.action },
            { key: "who", header: "Who", cell: (e) => e.actor?.name ?? "Gradeline" },
            { key: "when", header: "When", cell: (e) => <span className="num text-sm">{formatDateTime(e.at, timeZone)}</span> },
            { key: "from", header: "From", cell: (e) => <span className="num text-ink-2 text-sm">{e.ip ?? "—"}</span> },
          ]}
        />
      </CardBody>
    </Card>
  );
}
