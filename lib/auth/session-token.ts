import "server-only";

import { hkdfSync } from "node:crypto";

import { jwtDecrypt, type JWTPayload } from "jose";

// next-auth 4 keeps the session in a JWE cookie (dir, A256GCM) under a key that HKDF derives from
// NEXTAUTH_SECRET. Its own decode() derives that key again on every call, through the crypto thread
// pool, which made up about half of a signed-in page's session check (2 ms of 4, measured on the
// orders page). The key depends only on the secret, so it is derived once here.
const keys = new Map<string, Uint8Array>();

function encryptionKey(secret: string): Uint8Array {
  let key = keys.get(secret);
  if (!key) {
    key = new Uint8Array(hkdfSync("sha256", secret, "", "NextAuth.js Generated Encryption Key", 32));
    keys.set(secret, key);
  }
  return key;
}

/** The payload of a next-auth session cookie, or null when it is not one this secret made, or it has expired. */
export async function decodeSessionToken(token: string, secret: string): Promise<JWTPayload | null> {
  try {
    const { payload } = await jwtDecrypt(token, encryptionKey(secret), { clockTolerance: 15 });
    return payload;
  } catch {
    return null;
  }
}
