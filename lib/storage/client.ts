import "server-only";

import {
  CreateBucketCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  PutBucketCorsCommand,
  PutObjectCommand,
  S3Client,
} from "@aws-sdk/client-s3";
import { getSignedUrl } from "@aws-sdk/s3-request-presigner";

import { appUrl, env } from "@/lib/env";

const g = globalThis as unknown as { __gradelineS3?: S3Client; __gradelineS3Presign?: S3Client };

function makeClient(endpoint: string | undefined): S3Client {
  const e = env();
  return new S3Client({
    region: e.S3_REGION,
    endpoint,
    forcePathStyle: !!endpoint,
    credentials: { accessKeyId: e.S3_ACCESS_KEY_ID, secretAccessKey: e.S3_SECRET_ACCESS_KEY },
    // Without these the SDK framed streamed uploads in chunks that the local fake stored inside the file.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
}

export function s3(): S3Client {
  g.__gradelineS3 ??= makeClient(env().S3_ENDPOINT);
  return g.__gradelineS3;
}

/** Signs URLs against the endpoint the browser can reach (may differ from the server's). */
function presignClient(): S3Client {
  const e = env();
  if (!e.S3_PUBLIC_ENDPOINT) return s3();
  g.__gradelineS3Presign ??= makeClient(e.S3_PUBLIC_ENDPOINT);
  return g.__gradelineS3Presign;
}

export const bucket = () => env().S3_BUCKET;

export async function ensureBucket(): Promise<void> {
  const client = s3();
  try {
    await client.send(new HeadBucketCommand({ Bucket: bucket() }));
  } catch {
    try {
      await client.send(new CreateBucketCommand({ Bucket: bucket() }));
    } catch (error) {
      // Another process made it in the meantime.
      if (!/BucketAlready/.test((error as Error).name)) throw error;
    }
  }
  await client.send(
    new PutBucketCorsCommand({
      Bucket: bucket(),
      CORSConfiguration: {
        CORSRules: [
          {
            AllowedOrigins: [new URL(appUrl()).origin],
            AllowedMethods: ["GET", "PUT", "HEAD"],
            AllowedHeaders: ["*"],
            ExposeHeaders: ["ETag", "Content-Length", "Content-Range"],
            MaxAgeSeconds: 3600,
          },
        ],
      },
    }),
  );
}

export async function pingStorage(): Promise<void> {
  await s3().send(new HeadBucketCommand({ Bucket: bucket() }));
}

export async function putObject(key: string, body: Uint8Array | string, contentType: string): Promise<void> {
  await s3().send(new PutObjectCommand({ Bucket: bucket(), Key: key, Body: body, ContentType: contentType }));
}

export async function getObjectBytes(key: string, range?: string): Promise<Uint8Array> {
  const res = await s3().send(new GetObjectCommand({ Bucket: bucket(), Key: key, Range: range }));
  return res.Body ? await res.Body.transformToByteArray() : new Uint8Array();
}

export async function removeObject(key: string): Promise<void> {
  await s3().send(new DeleteObjectCommand({ Bucket: bucket(), Key: key }));
}

export function signedUploadUrl(key: string, contentType: string, expiresIn = 900): Promise<string> {
  return getSignedUrl(presignClient(), new PutObjectCommand({ Bucket: bucket(), Key: key, ContentType: contentType }), { expiresIn });
}

export function signedDownloadUrl(key: string, opts: { expiresIn?: number; contentType?: string; attachmentName?: string } = {}): Promise<string> {
  return getSignedUrl(
    presignClient(),
    new GetObjectCommand({
      Bucket: bucket(),
      Key: key,
      ResponseContentType: opts.contentType,
      ResponseContentDisposition: opts.attachmentName ? `attachment; filename="${opts.attachmentName.replace(/[^\w.-]/g, "_")}"` : undefined,
    }),
    { expiresIn: opts.expiresIn ?? 600 },
  );
}

export async function objectSize(key: string): Promise<number | null> {
  const { HeadObjectCommand } = await import("@aws-sdk/client-s3");
  try {
    const head = await s3().send(new HeadObjectCommand({ Bucket: bucket(), Key: key }));
    return head.ContentLength ?? null;
  } catch {
    return null;
  }
}
