import "server-only";

import {
  AbortMultipartUploadCommand,
  CompleteMultipartUploadCommand,
  CreateMultipartUploadCommand,
  HeadObjectCommand,
  ListMultipartUploadsCommand,
  ListPartsCommand,
  S3Client,
  UploadPartCommand,
} from "@aws-sdk/client-s3";
import { getSignedUrl } from "@aws-sdk/s3-request-presigner";

import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { expectedPartBytes, type StoredPart, type UploadPlan } from "@/lib/uploads/plan";

import { bucket, getObjectBytes, removeObject, s3, signedDownloadUrl } from "./client";

export const PART_URL_SECONDS = 15 * 60;

/** The multipart upload is gone from storage: completed, aborted or swept. */
export class UploadGoneError extends Error {
  constructor() {
    super("The multipart upload no longer exists in storage.");
    this.name = "UploadGoneError";
  }
}

export const storageUnavailable = () =>
  new AppError(
    "unavailable",
    "Storage is not answering just now. Nothing was lost: try again in a moment and the upload carries on.",
    undefined,
    { "Retry-After": "5" },
  );

type SdkError = { name?: string; $metadata?: { httpStatusCode?: number } };

/** Connection failures and 5xx answers become a retryable 503; a missing upload its own error. */
async function guard<T>(fn: () => Promise<T>): Promise<T> {
  try {
    return await fn();
  } catch (error) {
    const e = error as SdkError;
    if (e.name === "NoSuchUpload") throw new UploadGoneError();
    const status = e.$metadata?.httpStatusCode;
    if (status === undefined || status >= 500) {
      console.error("[storage] not answering:", (error as Error).message || e.name);
      throw storageUnavailable();
    }
    throw error;
  }
}

const g = globalThis as unknown as { __gradelineS3PartSigner?: { endpoint: string; client: S3Client } };

// Part URLs are signed for the endpoint the browser reaches, like signedUploadUrl in client.ts.
function partSigner(): S3Client {
  const e = env();
  if (!e.S3_PUBLIC_ENDPOINT) return s3();
  if (g.__gradelineS3PartSigner?.endpoint !== e.S3_PUBLIC_ENDPOINT) {
    const client = new S3Client({
      region: e.S3_REGION,
      endpoint: e.S3_PUBLIC_ENDPOINT,
      forcePathStyle: true,
      credentials: { accessKeyId: e.S3_ACCESS_KEY_ID, secretAccessKey: e.S3_SECRET_ACCESS_KEY },
      // Otherwise the SDK signs a checksum of an empty body into every part URL.
      requestChecksumCalculation: "WHEN_REQUIRED",
      responseChecksumValidation: "WHEN_REQUIRED",
    });
    g.__gradelineS3PartSigner = { endpoint: e.S3_PUBLIC_ENDPOINT, client };
  }
  return g.__gradelineS3PartSigner.client;
}

export async function createMultipartUpload(key: string, contentType: string): Promise<string> {
  const res = await guard(() => s3().send(new CreateMultipartUploadCommand({ Bucket: bucket(), Key: key, ContentType: contentType })));
  if (!res.UploadId) throw storageUnavailable();
  return res.UploadId;
}

/** Each URL carries its part's exact Content-Length in the signature, so real S3 refuses any other size. */
export function signPartUrls(key: string, uploadId: string, plan: UploadPlan, partNumbers: readonly number[]) {
  const client = partSigner();
  return Promise.all(
    partNumbers.map(async (partNumber) => ({
      partNumber,
      url: await getSignedUrl(
        client,
        new UploadPartCommand({
          Bucket: bucket(),
          Key: key,
          UploadId: uploadId,
          PartNumber: partNumber,
          ContentLength: expectedPartBytes(plan, partNumber),
        }),
        { expiresIn: PART_URL_SECONDS },
      ),
    })),
  );
}

export async function listStoredParts(key: string, uploadId: string): Promise<StoredPart[]> {
  const parts: StoredPart[] = [];
  let marker: string | undefined;
  for (let page = 0; page < 20; page++) {
    const res = await guard(() =>
      s3().send(new ListPartsCommand({ Bucket: bucket(), Key: key, UploadId: uploadId, PartNumberMarker: marker })),
    );
    for (const p of res.Parts ?? []) {
      if (p.PartNumber !== undefined && p.Size !== undefined) parts.push({ partNumber: p.PartNumber, size: p.Size, etag: p.ETag ?? "" });
    }
    if (!res.IsTruncated || !res.NextPartNumberMarker) break;
    marker = res.NextPartNumberMarker;
  }
  return parts.sort((a, b) => a.partNumber - b.partNumber);
}

export async function completeMultipartUpload(key: string, uploadId: string, parts: readonly StoredPart[]): Promise<void> {
  await guard(() =>
    s3().send(
      new CompleteMultipartUploadCommand({
        Bucket: bucket(),
        Key: key,
        UploadId: uploadId,
        MultipartUpload: { Parts: parts.map((p) => ({ PartNumber: p.partNumber, ETag: p.etag })) },
      }),
    ),
  );
}

/** true when storage dropped the upload now, false when it was already gone. */
export async function abortMultipartUpload(key: string, uploadId: string): Promise<boolean> {
  try {
    await guard(() => s3().send(new AbortMultipartUploadCommand({ Bucket: bucket(), Key: key, UploadId: uploadId })));
    return true;
  } catch (error) {
    if (error instanceof UploadGoneError) return false;
    throw error;
  }
}

export type InProgressUpload = { key: string; uploadId: string; initiated: Date | null };

export async function listInProgressUploads(prefix: string, maxPages = 50): Promise<InProgressUpload[]> {
  const out: InProgressUpload[] = [];
  let keyMarker: string | undefined;
  let uploadIdMarker: string | undefined;
  for (let page = 0; page < maxPages; page++) {
    const res = await guard(() =>
      s3().send(
        new ListMultipartUploadsCommand({ Bucket: bucket(), Prefix: prefix, KeyMarker: keyMarker, UploadIdMarker: uploadIdMarker }),
      ),
    );
    for (const u of res.Uploads ?? [])
      if (u.Key && u.UploadId) out.push({ key: u.Key, uploadId: u.UploadId, initiated: u.Initiated ?? null });
    if (!res.IsTruncated) break;
    keyMarker = res.NextKeyMarker;
    uploadIdMarker = res.NextUploadIdMarker;
  }
  return out;
}

/** null when there is no such object; a retryable error when storage does not answer. */
export async function headObject(key: string): Promise<{ size: number } | null> {
  try {
    const head = await guard(() => s3().send(new HeadObjectCommand({ Bucket: bucket(), Key: key })));
    return { size: head.ContentLength ?? 0 };
  } catch (error) {
    const status = (error as SdkError).$metadata?.httpStatusCode;
    if (status === 404 || (error as SdkError).name === "NotFound") return null;
    throw error;
  }
}

/** Bytes [start, end] inclusive. */
export const readRange = (key: string, start: number, end: number) => guard(() => getObjectBytes(key, `bytes=${start}-${end}`));

export const deleteObject = (key: string) => guard(() => removeObject(key));

const MEDIA_TYPES: Record<string, string> = {
  mp4: "video/mp4",
  mov: "video/quicktime",
  webm: "video/webm",
  jpg: "image/jpeg",
  png: "image/png",
};
export const MEDIA_URL_SECONDS = 15 * 60;

/** A short-lived read URL whose response type is fixed by the key the server made, never by the upload. */
export async function signedMediaUrl(key: string | null, contentType?: string): Promise<string | null> {
  if (!key) return null;
  const type = contentType ?? MEDIA_TYPES[key.split(".").pop() ?? ""] ?? "application/octet-stream";
  return signedDownloadUrl(key, { contentType: type, expiresIn: MEDIA_URL_SECONDS });
}
