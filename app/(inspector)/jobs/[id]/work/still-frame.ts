"use client";

import { postJson } from "@/lib/api/client";

/** The frame under the playhead as a JPEG, or null when the browser will not share it (a clip served without CORS). */
export async function captureFrame(video: HTMLVideoElement, maxWidth = 1280): Promise<Blob | null> {
  const w = video.videoWidth;
  const h = video.videoHeight;
  if (!w || !h) return null;
  const scale = Math.min(1, maxWidth / w);
  const canvas = document.createElement("canvas");
  canvas.width = Math.round(w * scale);
  canvas.height = Math.round(h * scale);
  const ctx = canvas.getContext("2d");
  if (!ctx) return null;
  try {
    ctx.drawImage(video, 0, 0, canvas.width, canvas.height);
    return await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, "image/jpeg", 0.85));
  } catch {
    return null;
  }
}

async function post<T>(url: string, body?: unknown): Promise<T> {
  const res = await postJson<T>(url, body);
  if (!res.ok) throw new Error(res.error.message);
  return res.data;
}

/** Stores a still beside its clip: ask for an upload URL, send the bytes straight to storage, confirm. */
export async function uploadStill(jobId: string, still: Blob, clipId: string, second: number): Promise<string> {
  const { stillId, uploadUrl } = await post<{ stillId: string; uploadUrl: string }>(`/api/jobs/${jobId}/stills`, {
    clipId,
    second,
    contentType: "image/jpeg",
    sizeBytes: still.size,
  });
  const put = await fetch(uploadUrl, { method: "PUT", headers: { "content-type": "image/jpeg" }, body: still });
  if (!put.ok) throw new Error("The still frame could not be uploaded.");
  await post(`/api/stills/${stillId}/complete`);
  return stillId;
}

function once(target: HTMLVideoElement, event: string, ms: number): Promise<boolean> {
  return new Promise((resolve) => {
    const timer = setTimeout(() => resolve(false), ms);
    target.addEventListener(
      event,
      () => {
        clearTimeout(timer);
        resolve(true);
      },
      { once: true },
    );
    target.addEventListener("error", () => resolve(false), { once: true });
  });
}

function giveUp(why: string, v: HTMLVideoElement): null {
  console.warn(`Still frame: ${why} (network state ${v.networkState}, ready state ${v.readyState}, error ${v.error?.code ?? "none"}).`);
  return null;
}

/**
 * The frame at a second of a clip, read through a separate CORS-enabled video element so the
 * canvas is not tainted (the player on screen does not ask storage for CORS).
 */
export async function frameAt(url: string, second: number): Promise<Blob | null> {
  const v = document.createElement("video");
  v.crossOrigin = "anonymous";
  v.muted = true;
  v.playsInline = true;
  v.preload = "auto";
  v.src = url;
  try {
    if (!(await once(v, "loadeddata", 15_000))) return giveUp("the clip did not load", v);
    v.currentTime = second;
    if (!(await once(v, "seeked", 15_000))) return giveUp("the clip did not seek", v);
    return (await captureFrame(v)) ?? giveUp("the frame could not be drawn", v);
  } finally {
    v.removeAttribute("src");
    v.load();
  }
}
