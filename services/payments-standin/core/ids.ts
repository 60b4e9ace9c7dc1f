import { randomBytes } from "node:crypto";

const ALPHABET = "0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz";

function randomToken(length: number): string {
  const bytes = randomBytes(length);
  let out = "";
  for (const byte of bytes) out += ALPHABET[byte % ALPHABET.length];
  return out;
}

const LENGTHS: Record<string, number> = { cs_test: 58, acct: 16, req: 14, prod: 14 };

/** Ids shaped like the real API's: a type prefix, an underscore, random base62. */
export function newId(prefix: string): string {
  return `${prefix}_${randomToken(LENGTHS[prefix] ?? 24)}`;
}
