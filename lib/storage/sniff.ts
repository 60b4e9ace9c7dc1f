import "server-only";

import { fileTypeFromBuffer } from "file-type";

import { getObjectBytes } from "./client";

/** The type an object really is, read from its first bytes (never from its name or declared type). */
export async function sniffObject(key: string): Promise<{ mime: string; ext: string } | null> {
  const head = await getObjectBytes(key, "bytes=0-4099");
  if (head.length === 0) return null;
  return (await fileTypeFromBuffer(head)) ?? null;
}
