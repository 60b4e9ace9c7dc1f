// How a clip is cut into multipart parts. Pure: the server, the browser and the tests share it.

export const MiB = 1024 * 1024;
export const GiB = 1024 * MiB;

export const MAX_CLIP_BYTES = 20 * GiB;
/** S3's limits: at most 10,000 parts, every part but the last at least 5 MiB. */
export const MAX_PARTS = 10_000;
export const MIN_PART_BYTES = 5 * MiB;
export const PART_FLOOR_BYTES = 8 * MiB;
/** Part URLs handed out in one answer; the client asks the parts route for the rest. */
export const PARTS_PER_ANSWER = 100;

export const CLIP_TYPES = { "video/mp4": "mp4", "video/quicktime": "mov", "video/webm": "webm" } as const;
export type ClipType = keyof typeof CLIP_TYPES;

export type UploadPlan = { sizeBytes: number; partSizeBytes: number; partCount: number };

/** max(8 MiB, size / 10,000), rounded up to a whole MiB, so the count never passes 10,000. */
export function planUpload(sizeBytes: number): UploadPlan {
  if (!Number.isSafeInteger(sizeBytes) || sizeBytes <= 0) throw new RangeError("The size must be a whole number of bytes above zero.");
  const partSizeBytes = Math.max(PART_FLOOR_BYTES, Math.ceil(sizeBytes / MAX_PARTS / MiB) * MiB);
  return { sizeBytes, partSizeBytes, partCount: Math.ceil(sizeBytes / partSizeBytes) };
}

/** The exact byte count part n must hold: the part size, or what is left for the last one. */
export function expectedPartBytes(plan: UploadPlan, partNumber: number): number {
  return partNumber < plan.partCount ? plan.partSizeBytes : plan.sizeBytes - plan.partSizeBytes * (plan.partCount - 1);
}

/** The byte range [start, end) of part n within the file. */
export function partRange(plan: UploadPlan, partNumber: number): { start: number; end: number } {
  const start = (partNumber - 1) * plan.partSizeBytes;
  return { start, end: Math.min(plan.sizeBytes, start + plan.partSizeBytes) };
}

export type PartProblem = { path: string; message: string };

/** A completion list must name parts 1..count, each once, in ascending order. */
export function checkCompletionList(parts: readonly { partNumber: number }[], partCount: number): PartProblem[] {
  const problems: PartProblem[] = [];
  if (parts.length !== partCount)
    problems.push({ path: "parts", message: `The upload has ${partCount} part(s); the list names ${parts.length}.` });
  parts.forEach((p, i) => {
    if (!Number.isInteger(p.partNumber) || p.partNumber < 1 || p.partNumber > Math.min(partCount, MAX_PARTS)) {
      problems.push({ path: `parts[${i}].partNumber`, message: `Part numbers run from 1 to ${partCount}.` });
    } else if (p.partNumber !== i + 1) {
      problems.push({ path: `parts[${i}].partNumber`, message: `Expected part ${i + 1} here: list each part once, in ascending order.` });
    }
  });
  return problems;
}

export type StoredPart = { partNumber: number; size: number; etag: string };

/** Compares what storage holds with the plan; the fake store checks none of this, so the app does. */
export function checkStoredParts(plan: UploadPlan, stored: readonly StoredPart[]): PartProblem[] {
  const problems: PartProblem[] = [];
  const byNumber = new Map(stored.map((p) => [p.partNumber, p]));
  const total = stored.filter((p) => p.partNumber <= plan.partCount).reduce((sum, p) => sum + p.size, 0);
  for (let n = 1; n <= plan.partCount; n++) {
    const part = byNumber.get(n);
    const path = `parts[${n - 1}]`;
    if (!part) problems.push({ path, message: `Part ${n} has not arrived in storage.` });
    else if (n < plan.partCount && part.size < MIN_PART_BYTES)
      problems.push({ path, message: `Part ${n} holds ${part.size} bytes; every part but the last must hold at least 5 MiB.` });
    else if (part.size !== expectedPartBytes(plan, n))
      problems.push({ path, message: `Part ${n} holds ${part.size} bytes; it must hold ${expectedPartBytes(plan, n)}.` });
  }
  if (total > plan.sizeBytes || stored.some((p) => p.partNumber > plan.partCount)) {
    problems.push({ path: "parts", message: `More bytes arrived than the ${plan.sizeBytes} declared.` });
  }
  return problems;
}

/** Part numbers in from..to not yet stored with the right size. */
export function missingParts(plan: UploadPlan, stored: readonly StoredPart[], from = 1, to = plan.partCount): number[] {
  const good = new Set(stored.filter((p) => p.size === expectedPartBytes(plan, p.partNumber)).map((p) => p.partNumber));
  const out: number[] = [];
  for (let n = Math.max(1, from); n <= Math.min(to, plan.partCount); n++) if (!good.has(n)) out.push(n);
  return out;
}

export const normalizeEtag = (etag: string) => etag.replace(/"/g, "").trim().toLowerCase();
