import "server-only";

import { and, eq, gte, isNotNull, sql } from "drizzle-orm";

import type { InspectorProfileInput } from "@/lib/validations/orders";

import { getDb, type Tx } from "../client";
import { inspectorProfiles, serviceAreas } from "../schema";

const today = () => new Date().toISOString().slice(0, 10);

export async function servesPostalCode(inspectorId: string, postalCode: string, tx?: Tx) {
  const db = tx ?? (await getDb());
  const [row] = await db
    .select({ one: sql`1` })
    .from(serviceAreas)
    .where(and(eq(serviceAreas.inspectorId, inspectorId), eq(serviceAreas.postalCode, postalCode)))
    .limit(1);
  return !!row;
}

/** Whether any verified inspector with a current licence serves the postal code. */
export async function isPostalCodeServed(postalCode: string, tx?: Tx) {
  const db = tx ?? (await getDb());
  const [row] = await db
    .select({ one: sql`1` })
    .from(serviceAreas)
    .innerJoin(inspectorProfiles, eq(inspectorProfiles.userId, serviceAreas.inspectorId))
    .where(and(eq(serviceAreas.postalCode, postalCode), isNotNull(inspectorProfiles.verifiedAt), gte(inspectorProfiles.licenceExpiresOn, today())))
    .limit(1);
  return !!row;
}

export async function getInspectorProfile(inspectorId: string) {
  const db = await getDb();
  const [profile] = await db.select().from(inspectorProfiles).where(eq(inspectorProfiles.userId, inspectorId)).limit(1);
  const areas = await db.select({ postalCode: serviceAreas.postalCode }).from(serviceAreas).where(eq(serviceAreas.inspectorId, inspectorId)).orderBy(serviceAreas.postalCode);
  const licenceValid = !!profile?.licenceExpiresOn && profile.licenceExpiresOn >= today();
  return {
    licenceNumber: profile?.licenceNumber ?? "",
    licenceExpiresOn: profile?.licenceExpiresOn ?? "",
    baseLocation: profile?.baseLocation ?? "",
    postalCodes: areas.map((a) => a.postalCode),
    availability: profile?.availability ?? {},
    verified: !!profile?.verifiedAt,
    licenceValid,
    rejectedReason: profile?.rejectedReason ?? null,
    insurance: profile?.insuranceFileName ? { fileName: profile.insuranceFileName } : null,
  };
}

/** Saves the profile; a changed licence number or expiry sends the inspector back to verification. */
export async function saveInspectorProfile(inspectorId: string, input: InspectorProfileInput) {
  const db = await getDb();
  await db.transaction(async (tx) => {
    const [existing] = await tx.select().from(inspectorProfiles).where(eq(inspectorProfiles.userId, inspectorId)).limit(1);
    const licenceChanged = !existing || existing.licenceNumber !== input.licenceNumber || existing.licenceExpiresOn !== input.licenceExpiresOn;
    const values = {
      licenceNumber: input.licenceNumber,
      licenceExpiresOn: input.licenceExpiresOn,
      baseLocation: input.baseLocation,
      availability: input.availability,
      updatedAt: new Date(),
      ...(licenceChanged ? { verifiedAt: null, verifiedBy: null } : {}),
    };
    if (existing) await tx.update(inspectorProfiles).set(values).where(eq(inspectorProfiles.userId, inspectorId));
    else await tx.insert(inspectorProfiles).values({ userId: inspectorId, ...values });
    await tx.delete(serviceAreas).where(eq(serviceAreas.inspectorId, inspectorId));
    const codes = [...new Set(input.postalCodes)];
    if (codes.length) await tx.insert(serviceAreas).values(codes.map((postalCode) => ({ inspectorId, postalCode })));
  });
}

export async function setInsuranceDocument(inspectorId: string, key: string, fileName: string) {
  const db = await getDb();
  const [existing] = await db.select({ id: inspectorProfiles.userId }).from(inspectorProfiles).where(eq(inspectorProfiles.userId, inspectorId)).limit(1);
  if (existing) await db.update(inspectorProfiles).set({ insuranceKey: key, insuranceFileName: fileName, updatedAt: new Date() }).where(eq(inspectorProfiles.userId, inspectorId));
  else await db.insert(inspectorProfiles).values({ userId: inspectorId, insuranceKey: key, insuranceFileName: fileName });
}
