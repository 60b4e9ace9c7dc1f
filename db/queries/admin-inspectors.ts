import "server-only";

import { and, asc, eq, inArray, isNotNull, isNull, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";

import { renderMail } from "@/lib/mail/render";
import { signedDownloadUrl } from "@/lib/storage/client";

import { getDb } from "../client";
import { inspectorProfiles, serviceAreas, users } from "../schema";
import { recordAudit } from "./audit";
import { enqueueMail } from "./outbox";

export type InspectorStatus = "no_profile" | "awaiting" | "changes_asked" | "verified" | "licence_expired";

export type AdminInspectorDto = {
  id: string;
  name: string;
  email: string;
  company: string | null;
  phone: string | null;
  disabled: boolean;
  status: InspectorStatus;
  licenceNumber: string | null;
  licenceExpiresOn: string | null;
  licenceValid: boolean;
  baseLocation: string | null;
  postalCodes: string[];
  /** A short-lived signed link that downloads the certificate; null when none is on file. */
  insurance: { fileName: string; url: string } | null;
  verifiedAt: string | null;
  verifiedByName: string | null;
  rejectedReason: string | null;
  updatedAt: string | null;
};

/** Signed certificate links live this long; the page refreshes its list well before. */
export const INSURANCE_LINK_SECONDS = 600;

export const utcToday = () => new Date().toISOString().slice(0, 10);

const verifier = alias(users, "verifier");

function statusOf(
  p: { licenceNumber: string | null; verifiedAt: Date | null; rejectedReason: string | null } | null,
  licenceValid: boolean,
): InspectorStatus {
  if (!p?.licenceNumber) return "no_profile";
  if (p.verifiedAt) return licenceValid ? "verified" : "licence_expired";
  return p.rejectedReason ? "changes_asked" : "awaiting";
}

/** Every inspector account, or only the verification queue (unverified, with a licence on file). */
export async function listInspectorsForAdmin(filter: "queue" | "all" = "all", ids?: string[]): Promise<AdminInspectorDto[]> {
  const db = await getDb();
  const where = and(
    eq(users.role, "inspector"),
    ids ? inArray(users.id, ids) : undefined,
    filter === "queue"
      ? and(isNull(inspectorProfiles.verifiedAt), isNotNull(inspectorProfiles.licenceNumber), isNull(users.disabledAt))
      : undefined,
  );
  const rows = await db
    .select({ user: users, profile: inspectorProfiles, verifierName: verifier.name })
    .from(users)
    .leftJoin(inspectorProfiles, eq(inspectorProfiles.userId, users.id))
    .leftJoin(verifier, eq(verifier.id, inspectorProfiles.verifiedBy))
    .where(where)
    // Waiting longest first in the queue; by name in the full list.
    .orderBy(...(filter === "queue" ? [asc(inspectorProfiles.updatedAt)] : [asc(users.name)]), asc(users.id));
  if (rows.length === 0) return [];
  const areas = await db
    .select({ inspectorId: serviceAreas.inspectorId, postalCode: serviceAreas.postalCode })
    .from(serviceAreas)
    .where(
      inArray(
        serviceAreas.inspectorId,
        rows.map((r) => r.user.id),
      ),
    )
    .orderBy(asc(serviceAreas.postalCode));
  const codes = new Map<string, string[]>();
  for (const a of areas) codes.set(a.inspectorId, [...(codes.get(a.inspectorId) ?? []), a.postalCode]);
  const today = utcToday();
  return Promise.all(
    rows.map(async ({ user, profile, verifierName }) => {
      const licenceValid = !!profile?.licenceExpiresOn && profile.licenceExpiresOn >= today;
      const insurance =
        profile?.insuranceKey && profile.insuranceFileName
          ? {
              fileName: profile.insuranceFileName,
              url: await signedDownloadUrl(profile.insuranceKey, {
                attachmentName: profile.insuranceFileName,
                expiresIn: INSURANCE_LINK_SECONDS,
              }),
            }
          : null;
      return {
        id: user.id,
        name: user.name,
        email: user.email,
        company: user.company,
        phone: user.phone,
        disabled: !!user.disabledAt,
        status: statusOf(profile, licenceValid),
        licenceNumber: profile?.licenceNumber ?? null,
        licenceExpiresOn: profile?.licenceExpiresOn ?? null,
        licenceValid,
        baseLocation: profile?.baseLocation ?? null,
        postalCodes: codes.get(user.id) ?? [],
        insurance,
        verifiedAt: profile?.verifiedAt?.toISOString() ?? null,
        verifiedByName: profile?.verifiedAt ? (verifierName ?? null) : null,
        rejectedReason: profile?.rejectedReason ?? null,
        updatedAt: profile?.updatedAt.toISOString() ?? null,
      };
    }),
  );
}

export type VerificationOutcome = { ok: true; changed: boolean } | { ok: false; problem: "not_found" | "no_licence" | "licence_expired" };

/**
 * Approves or rejects an inspector in one transaction with its audit row and its e-mail. Repeating
 * the same decision changes nothing and sends nothing.
 */
export async function decideVerification(input: {
  inspectorId: string;
  decision: "approve" | "reject";
  reason: string | null;
  admin: { id: string; name: string };
  ip: string;
}): Promise<VerificationOutcome> {
  const db = await getDb();
  return db.transaction(async (tx): Promise<VerificationOutcome> => {
    const [row] = await tx
      .select({ user: users, profile: inspectorProfiles })
      .from(users)
      .innerJoin(inspectorProfiles, eq(inspectorProfiles.userId, users.id))
      .where(and(eq(users.id, input.inspectorId), eq(users.role, "inspector")))
      .for("update", { of: inspectorProfiles })
      .limit(1);
    if (!row) return { ok: false, problem: "not_found" };
    const { user, profile } = row;
    const now = new Date();

    if (input.decision === "approve") {
      if (!profile.licenceNumber || !profile.licenceExpiresOn) return { ok: false, problem: "no_licence" };
      if (profile.licenceExpiresOn < utcToday()) return { ok: false, problem: "licence_expired" };
      if (profile.verifiedAt) return { ok: true, changed: false };
      await tx
        .update(inspectorProfiles)
        .set({ verifiedAt: now, verifiedBy: input.admin.id, rejectedReason: null, updatedAt: now })
        .where(eq(inspectorProfiles.userId, user.id));
      await enqueueMail(
        {
          key: `inspector:${user.id}:verified:${now.toISOString()}`,
          to: user.email,
          subject: "You are verified on Gradeline",
          ...renderMail({
            heading: "Your account is verified",
            paragraphs: ["An admin checked your licence and insurance. Open orders in your service area now show on your job board."],
            facts: [
              ["Licence", profile.licenceNumber],
              ["Licence expires on", profile.licenceExpiresOn],
            ],
            action: { label: "Open the job board", path: "/jobs" },
          }),
        },
        tx,
      );
    } else {
      const reason = input.reason ?? "";
      if (!profile.verifiedAt && profile.rejectedReason === reason) return { ok: true, changed: false };
      await tx
        .update(inspectorProfiles)
        .set({ verifiedAt: null, verifiedBy: null, rejectedReason: reason, updatedAt: now })
        .where(eq(inspectorProfiles.userId, user.id));
      await enqueueMail(
        {
          key: `inspector:${user.id}:changes-asked:${now.toISOString()}`,
          to: user.email,
          subject: "Gradeline needs a change to your profile",
          ...renderMail({
            heading: "Your verification needs a change",
            paragraphs: [
              "An admin looked at your licence and insurance and could not verify your account yet:",
              reason,
              "Update your profile and we will look again. The job board opens once you are verified.",
            ],
            action: { label: "Open your profile", path: "/profile" },
          }),
        },
        tx,
      );
    }
    await recordAudit(
      {
        actorId: input.admin.id,
        action: input.decision === "approve" ? "admin.inspector_approved" : "admin.inspector_rejected",
        targetType: "user",
        targetId: user.id,
        ip: input.ip,
        data: {
          email: user.email,
          licenceNumber: profile.licenceNumber,
          licenceExpiresOn: profile.licenceExpiresOn,
          insuranceOnFile: !!profile.insuranceKey,
          ...(input.decision === "reject" ? { reason: input.reason } : {}),
        },
      },
      tx,
    );
    return { ok: true, changed: true };
  });
}

/** Verified inspectors whose licence expired before today (UTC date, as the job board checks it). */
export async function listVerifiedWithExpiredLicence(today = utcToday()) {
  const db = await getDb();
  return db
    .select({
      id: users.id,
      email: users.email,
      name: users.name,
      licenceNumber: inspectorProfiles.licenceNumber,
      licenceExpiresOn: inspectorProfiles.licenceExpiresOn,
    })
    .from(inspectorProfiles)
    .innerJoin(users, eq(users.id, inspectorProfiles.userId))
    .where(
      and(
        isNotNull(inspectorProfiles.verifiedAt),
        sql`(${inspectorProfiles.licenceExpiresOn} is null or ${inspectorProfiles.licenceExpiresOn} < ${today})`,
      ),
    )
    .limit(500);
}

/** Un-verifies one inspector whose licence expired, with its e-mail (once per expiry date) and audit row. */
export async function unverifyExpiredLicence(
  inspector: { id: string; email: string; name: string; licenceNumber: string | null; licenceExpiresOn: string | null },
  today = utcToday(),
): Promise<boolean> {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [claimed] = await tx
      .update(inspectorProfiles)
      .set({ verifiedAt: null, verifiedBy: null, updatedAt: new Date() })
      .where(
        and(
          eq(inspectorProfiles.userId, inspector.id),
          isNotNull(inspectorProfiles.verifiedAt),
          sql`(${inspectorProfiles.licenceExpiresOn} is null or ${inspectorProfiles.licenceExpiresOn} < ${today})`,
        ),
      )
      .returning({ licenceExpiresOn: inspectorProfiles.licenceExpiresOn });
    if (!claimed) return false;
    const expiry = claimed.licenceExpiresOn ?? "none";
    await enqueueMail(
      {
        key: `inspector:${inspector.id}:licence-expired:${expiry}`,
        to: inspector.email,
        subject: "Your licence on Gradeline has expired",
        ...renderMail({
          heading: "Your licence has expired",
          paragraphs: [
            "The licence on your Gradeline profile has passed its expiry date, so your account is no longer verified and the job board is closed to you. Jobs you already hold stay yours.",
            "Add your renewed licence to your profile; an admin checks it and the job board opens again.",
          ],
          facts: [
            ["Licence", inspector.licenceNumber ?? "none on file"],
            ["Expired on", claimed.licenceExpiresOn ?? "no expiry date on file"],
          ],
          action: { label: "Update your profile", path: "/profile" },
        }),
      },
      tx,
    );
    await recordAudit(
      {
        actorId: null,
        action: "inspector.licence_expired",
        targetType: "user",
        targetId: inspector.id,
        ip: "system",
        data: { email: inspector.email, licenceNumber: inspector.licenceNumber, licenceExpiresOn: claimed.licenceExpiresOn },
      },
      tx,
    );
    return true;
  });
}
