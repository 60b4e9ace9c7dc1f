import "server-only";

import { listVerifiedWithExpiredLicence, unverifyExpiredLicence, utcToday } from "@/db/queries/admin-inspectors";

/** Un-verifies every inspector whose licence has expired; each is e-mailed once and audited. */
export async function sweepExpiredLicences(today = utcToday()): Promise<number> {
  const expired = await listVerifiedWithExpiredLicence(today);
  let unverified = 0;
  for (const inspector of expired) if (await unverifyExpiredLicence(inspector, today)) unverified++;
  return unverified;
}

/** Runs the sweep now and then every intervalMs; returns a function that stops it. */
export function startLicenceSweeper(intervalMs = 60 * 60_000): () => void {
  const run = () => void sweepExpiredLicences().catch((e) => console.error("[licence-sweep] sweep failed", e));
  run();
  const timer = setInterval(run, intervalMs);
  timer.unref();
  return () => clearInterval(timer);
}
