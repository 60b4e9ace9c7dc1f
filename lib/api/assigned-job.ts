import "server-only";

import { getJobDetailForInspector } from "@/db/queries/order-detail";
import { AppError, notFound } from "@/lib/errors";

/** The job must be held by this inspector and not yet delivered. */
export async function requireWorkableJob(orderId: string, inspectorId: string) {
  const detail = await getJobDetailForInspector(orderId, inspectorId);
  if (!detail || detail.job.inspector?.id !== inspectorId) throw notFound("That job");
  if (!["accepted", "scheduled"].includes(detail.job.status)) throw new AppError("conflict", "This job is delivered or closed; its record can no longer change.");
  return detail.job;
}
