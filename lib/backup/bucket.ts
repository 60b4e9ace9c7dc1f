import "server-only";

import type { Readable } from "node:stream";

import { DeleteObjectCommand, GetObjectCommand, ListObjectsCommand } from "@aws-sdk/client-s3";
import { Upload } from "@aws-sdk/lib-storage";

import { bucket, s3 } from "@/lib/storage/client";

import type { ObjectSource } from "./archive";

// Listing v1 with markers: the local stand-in answers a truncated v2 listing with an internal error.

/** Every object of the bucket, page by page, each opened only when the archive asks for it. */
export async function* bucketObjects(): AsyncGenerator<ObjectSource> {
  let marker: string | undefined;
  do {
    const page = await s3().send(new ListObjectsCommand({ Bucket: bucket(), Marker: marker }));
    for (const item of page.Contents ?? []) {
      const key = item.Key!;
      const res = await s3().send(new GetObjectCommand({ Bucket: bucket(), Key: key }));
      const body = res.Body as Readable | undefined;
      if (!body) throw new Error(`Storage returned no body for ${key}.`);
      yield { key, bytes: res.ContentLength ?? item.Size ?? 0, contentType: res.ContentType, open: async () => body };
    }
    marker = page.IsTruncated ? (page.NextMarker ?? page.Contents?.at(-1)?.Key) : undefined;
  } while (marker);
}

/** True when the bucket holds no object (a bucket that does not exist yet is empty). */
export async function bucketIsEmpty(): Promise<boolean> {
  try {
    const page = await s3().send(new ListObjectsCommand({ Bucket: bucket(), MaxKeys: 1 }));
    return (page.Contents?.length ?? 0) === 0;
  } catch (error) {
    if ((error as { name?: string }).name === "NoSuchBucket") return true;
    throw error;
  }
}

export async function uploadObject(key: string, body: Readable, contentType?: string): Promise<void> {
  await new Upload({ client: s3(), params: { Bucket: bucket(), Key: key, Body: body, ContentType: contentType } }).done();
}

export async function deleteObjects(keys: string[]): Promise<void> {
  for (const key of keys) await s3().send(new DeleteObjectCommand({ Bucket: bucket(), Key: key }));
}
