import type { Metadata } from "next";

import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { StatusBadge } from "@/components/ui/status-badge";
import { countInspectorsAwaitingVerification, countOrdersByStatus } from "@/db/queries/orders";
import type { OrderStatus } from "@/db/schema";
import { requireUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Overview" };

export default async function AdminOverviewPage() {
  await requireUser("admin");
  const [byStatus, awaiting] = await Promise.all([countOrdersByStatus(), countInspectorsAwaitingVerification()]);
  return (
    <>
      <PageHeader title="Marketplace overview" description="Orders by state and inspectors waiting for verification." />
      <div className="grid gap-6 md:grid-cols-2">
        <Card>
          <CardHeader title="Orders by state" />
          <CardBody>
            <dl className="divide-y divide-rule">
              {(Object.entries(byStatus) as [OrderStatus, number][]).map(([status, n]) => (
                <div key={status} className="flex items-center justify-between py-2">
                  <dt>
                    <StatusBadge status={status} />
                  </dt>
                  <dd className="num text-lg">{n}</dd>
                </div>
              ))}
            </dl>
          </CardBody>
        </Card>
        <Card>
          <CardHeader title="Inspectors awaiting verification" />
          <CardBody>
            <p className="num text-4xl">{awaiting}</p>
          </CardBody>
        </Card>
      </div>
    </>
  );
}
