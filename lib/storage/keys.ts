import { randomBytes } from "node:crypto";

/** Object keys are made here from ids and a random suffix, never from a browser's file name. */
export function objectKey(kind: "clips" | "posters" | "stills" | "insurance" | "reports", ownerId: string, ext: string): string {
  const safeExt = ext.replace(/[^a-z0-9]/gi, "").slice(0, 8).toLowerCase();
  return `${kind}/${ownerId}/${Date.now().toString(36)}-${randomBytes(9).toString("base64url")}${safeExt ? `.${safeExt}` : ""}`;
}
