import { getDb } from "@/db/client";
import { inspectorProfiles, serviceAreas } from "@/db/schema";
import type { CreateOrderInput } from "@/lib/validations/orders";

import { createTestUser, sessionCookieFor } from "./session";

export async function signedIn(role: Parameters<typeof createTestUser>[0], overrides?: Parameters<typeof createTestUser>[1]) {
  const user = await createTestUser(role, overrides);
  const { cookie } = await sessionCookieFor(user);
  return { user, cookie };
}

export async function verifiedInspector(postalCodes: string[], opts: { verified?: boolean; licenceExpiresOn?: string } = {}) {
  const inspector = await signedIn("inspector");
  const db = await getDb();
  await db.insert(inspectorProfiles).values({
    userId: inspector.user.id,
    licenceNumber: `T-${inspector.user.id.slice(0, 6)}`,
    licenceExpiresOn: opts.licenceExpiresOn ?? "2030-01-01",
    verifiedAt: opts.verified === false ? null : new Date(),
  });
  if (postalCodes.length) await db.insert(serviceAreas).values(postalCodes.map((postalCode) => ({ inspectorId: inspector.user.id, postalCode })));
  return inspector;
}

const HOUR = 3_600_000;
const iso = (ms: number) => new Date(Date.now() + ms).toISOString();

export function orderInput(overrides: Partial<CreateOrderInput> = {}): CreateOrderInput {
  return {
    address: { street: `${Math.floor(Math.random() * 900) + 10} Sluice Gate Way`, city: "Harrow Falls", state: "OR", postalCode: "97991" },
    propertyType: "single_family",
    yearBuilt: 1951,
    occupancy: "owner",
    accessNotes: "Lockbox on the side gate.",
    cleanoutKnown: true,
    cleanoutNote: "Outside cleanout by the hose bib.",
    buildingSewers: 1,
    deadline: iso(7 * 24 * HOUR),
    timeZone: "America/Los_Angeles",
    visitWindows: [{ start: iso(24 * HOUR), end: iso(32 * HOUR) }],
    anyTimeInWindows: false,
    buyer: { name: "Kai Morrow", email: "kai.morrow@example.test" },
    ...overrides,
  };
}
