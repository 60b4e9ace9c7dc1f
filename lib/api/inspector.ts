import "server-only";

import { inspectorStanding } from "@/db/queries/orders";
import { AppError } from "@/lib/errors";

/** The job board is for verified inspectors with a current licence. */
export async function requireVerifiedInspector(inspectorId: string): Promise<void> {
  const standing = await inspectorStanding(inspectorId);
  if (!standing.canTakeJobs) {
    throw new AppError("forbidden", standing.verified ? "Your licence has expired: add the renewed one to your profile." : "Your account is waiting for verification by an admin.");
  }
}
