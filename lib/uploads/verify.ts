import "server-only";

import { fileTypeFromBuffer } from "file-type";
import { createFile, MP4BoxBuffer, type Movie } from "mp4box";

import { headObject, readRange } from "@/lib/storage/multipart";

import { MAX_CLIP_BYTES } from "./plan";

export type VideoCheck =
  | { ok: true; mime: "video/mp4" | "video/quicktime" | "video/webm"; durationSeconds: number | null; sizeBytes: number }
  | { ok: false; reason: string; gone?: boolean };

const HEAD_BYTES = 64 * 1024;
const MAX_MOOV_BYTES = 64 * 1024 * 1024;

// file-type names MP4 brands in several ways; all of them are played as MP4.
const ACCEPTED: Record<string, "video/mp4" | "video/quicktime" | "video/webm"> = {
  "video/mp4": "video/mp4",
  "video/x-m4v": "video/mp4",
  "video/quicktime": "video/quicktime",
  "video/webm": "video/webm",
};

const gib = (n: number) => `${(n / 1024 ** 3).toFixed(0)} GiB`;

/** Reads a stored object and decides by its bytes alone whether it is a video we keep. */
export async function checkStoredVideo(key: string, declaredBytes: number): Promise<VideoCheck> {
  const head = await headObject(key);
  if (!head) return { ok: false, reason: "The file did not arrive in storage. Upload it again.", gone: true };
  if (head.size === 0) return { ok: false, reason: "The file is empty." };
  if (head.size > MAX_CLIP_BYTES) return { ok: false, reason: `The file is over the ${gib(MAX_CLIP_BYTES)} limit for a clip.` };
  if (head.size !== declaredBytes) return { ok: false, reason: `Storage holds ${head.size} bytes but ${declaredBytes} were declared.` };

  const first = await readRange(key, 0, Math.min(head.size, HEAD_BYTES) - 1);
  const type = await fileTypeFromBuffer(first);
  const mime = type ? ACCEPTED[type.mime] : undefined;
  if (!mime) {
    const seen = type ? ` (its bytes look like ${type.mime})` : "";
    return { ok: false, reason: `That file is not an MP4, QuickTime or WebM video, whatever its name says${seen}.` };
  }
  if (mime === "video/webm") return { ok: true, mime, sizeBytes: head.size, durationSeconds: webmDuration(first) };

  const movie = await readMp4Movie(key, head.size, first);
  if (!movie) return { ok: false, reason: "The video has no index (moov box); the recording may have been cut short." };
  if (movie.videoTracks.length === 0) return { ok: false, reason: "The file holds no video track." };
  const duration = movie.timescale > 0 ? movie.duration / movie.timescale : 0;
  return {
    ok: true,
    mime,
    sizeBytes: head.size,
    durationSeconds: Number.isFinite(duration) && duration > 0 ? Math.round(duration * 1000) / 1000 : null,
  };
}

// mp4box reads a movie only after an ftyp; old QuickTime files may have none, so one is made up.
const QT_FTYP = new Uint8Array([0, 0, 0, 16, 0x66, 0x74, 0x79, 0x70, 0x71, 0x74, 0x20, 0x20, 0, 0, 0, 0]);

/** Walks the top-level boxes with small range reads until moov (phones often write it last). */
async function readMp4Movie(key: string, size: number, first: Uint8Array): Promise<Movie | null> {
  let offset = 0;
  let ftyp: Uint8Array = QT_FTYP;
  for (let boxes = 0; boxes < 64 && offset + 8 <= size; boxes++) {
    const header =
      offset + 16 <= first.length ? first.subarray(offset, offset + 16) : await readRange(key, offset, Math.min(size, offset + 16) - 1);
    const view = new DataView(header.buffer, header.byteOffset, header.byteLength);
    let boxSize = view.getUint32(0);
    const type = String.fromCharCode(...header.subarray(4, 8));
    if (boxSize === 1 && header.length >= 16) boxSize = Number(view.getBigUint64(8));
    else if (boxSize === 0) boxSize = size - offset;
    if (boxSize < 8) return null;
    if (type === "ftyp" && offset + boxSize <= first.length && boxSize <= 4096) ftyp = first.subarray(offset, offset + boxSize);
    if (type === "moov") {
      if (boxSize > MAX_MOOV_BYTES || offset + boxSize > size) return null;
      const moov =
        offset + boxSize <= first.length ? first.subarray(offset, offset + boxSize) : await readRange(key, offset, offset + boxSize - 1);
      return parseMovie(ftyp, moov);
    }
    offset += boxSize;
  }
  return null;
}

function parseMovie(ftyp: Uint8Array, moov: Uint8Array): Movie | null {
  const bytes = new Uint8Array(ftyp.length + moov.length);
  bytes.set(ftyp);
  bytes.set(moov, ftyp.length);
  const file = createFile();
  let movie: Movie | null = null;
  file.onReady = (info) => {
    movie = info;
  };
  try {
    file.appendBuffer(MP4BoxBuffer.fromArrayBuffer(bytes.buffer, 0), true);
    file.flush();
  } catch {
    return null;
  }
  return movie;
}

// EBML ids of the WebM elements on the way to the duration.
const SEGMENT = 0x18538067;
const INFO = 0x1549a966;
const TIMECODE_SCALE = 0x2ad7b1;
const DURATION = 0x4489;
const CLUSTER = 0x1f43b675;

function readVint(bytes: Uint8Array, at: number, keepMarker: boolean): { value: number; length: number; unknown: boolean } | null {
  const first = bytes[at];
  if (first === undefined || first === 0) return null;
  const length = Math.clz32(first) - 23;
  if (at + length > bytes.length) return null;
  let value = keepMarker ? first : first & (0xff >> length);
  let allOnes = value === 0xff >> length;
  for (let i = 1; i < length; i++) {
    value = value * 256 + bytes[at + i];
    if (bytes[at + i] !== 0xff) allOnes = false;
  }
  return { value, length, unknown: !keepMarker && allOnes };
}

/**
 * The Duration in the Segment's Info, in seconds. Browsers' MediaRecorder writes WebM without a
 * Duration; then the clip is kept and its duration stays null.
 */
export function webmDuration(bytes: Uint8Array): number | null {
  let at = 0;
  let end = bytes.length;
  let scale = 1_000_000;
  let duration: number | null = null;
  while (at < end) {
    const id = readVint(bytes, at, true);
    if (!id) return null;
    const size = readVint(bytes, at + id.length, false);
    if (!size) return null;
    const body = at + id.length + size.length;
    if (id.value === SEGMENT || id.value === INFO) {
      if (id.value === INFO) end = Math.min(end, body + size.value);
      at = body;
      continue;
    }
    if (id.value === CLUSTER) break;
    if (size.unknown || body + size.value > bytes.length) break;
    const view = new DataView(bytes.buffer, bytes.byteOffset + body, size.value);
    if (id.value === TIMECODE_SCALE && size.value <= 6)
      scale = [...bytes.subarray(body, body + size.value)].reduce((n, b) => n * 256 + b, 0);
    if (id.value === DURATION) duration = size.value === 4 ? view.getFloat32(0) : size.value === 8 ? view.getFloat64(0) : null;
    at = body + size.value;
  }
  return duration !== null && Number.isFinite(duration) && duration > 0 ? Math.round(((duration * scale) / 1e9) * 1000) / 1000 : null;
}

const IMAGE_TYPES = new Set(["image/jpeg", "image/png"]);

/** A poster or still: a real JPEG or PNG under the size limit, judged by its bytes. */
export async function checkStoredImage(
  key: string,
  maxBytes: number,
): Promise<{ ok: true; mime: string } | { ok: false; reason: string; gone?: boolean }> {
  const head = await headObject(key);
  if (!head) return { ok: false, reason: "The image did not arrive in storage. Upload it again.", gone: true };
  if (head.size === 0) return { ok: false, reason: "The image is empty." };
  if (head.size > maxBytes) return { ok: false, reason: `The image is over ${Math.round(maxBytes / 1024 / 1024)} MB.` };
  const type = await fileTypeFromBuffer(await readRange(key, 0, Math.min(head.size, 4100) - 1));
  if (!type || !IMAGE_TYPES.has(type.mime)) return { ok: false, reason: "That image is not a JPEG or PNG, whatever its name says." };
  return { ok: true, mime: type.mime };
}
