"use client";

import { useCallback, useEffect, useId, useRef, useState, useSyncExternalStore } from "react";

import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Card, CardBody } from "@/components/ui/card";
import { Input } from "@/components/ui/input";
import type { ClipView } from "@/db/queries/clips";
import { expectedPartBytes, partRange, type UploadPlan } from "@/lib/uploads/plan";

type Status = "starting" | "uploading" | "paused" | "waiting" | "completing" | "ready" | "rejected" | "failed" | "cancelled";
type Snapshot = {
  key: string;
  name: string;
  size: number;
  status: Status;
  sent: number;
  speed: number;
  message: string;
  clip: ClipView | null;
};
type Answer<T> = { ok: true; status: number; data: T } | { ok: false; status: number; message: string };
type PartsAnswer = {
  partSizeBytes: number;
  partCount: number;
  uploaded: { partNumber: number; etag: string }[];
  parts: { partNumber: number; url: string }[];
  assembled?: boolean;
};

const IN_FLIGHT = 4;
const MAX_ATTEMPTS = 8;
const URL_FRESH_MS = 12 * 60_000;
const STORE_PREFIX = "gradeline.upload.";
const TYPES: Record<string, string> = { mp4: "video/mp4", m4v: "video/mp4", mov: "video/quicktime", webm: "video/webm" };
const KNOWN_TYPES = new Set(Object.values(TYPES));
const TICK_MS = 500;

async function api<T>(url: string, init?: { method?: string; body?: unknown }): Promise<Answer<T>> {
  try {
    const res = await fetch(url, {
      method: init?.method ?? "GET",
      headers: init?.body ? { "content-type": "application/json" } : undefined,
      body: init?.body ? JSON.stringify(init.body) : undefined,
    });
    const json = (await res.json().catch(() => null)) as
      (T & { error?: { message: string; fieldErrors?: Record<string, string[]> } }) | null;
    if (res.ok && json) return { ok: true, status: res.status, data: json };
    const field = json?.error?.fieldErrors ? Object.values(json.error.fieldErrors)[0]?.[0] : undefined;
    return { ok: false, status: res.status, message: field ?? json?.error?.message ?? `The server answered ${res.status}.` };
  } catch {
    return { ok: false, status: 0, message: "No connection to Gradeline." };
  }
}

const retryable = (status: number) => status === 0 || status === 429 || status >= 500;
const backoff = (attempt: number) => Math.min(30_000, 1000 * 2 ** attempt) * (0.5 + Math.random() / 2);
const whenOnline = () =>
  navigator.onLine ? Promise.resolve() : new Promise<void>((r) => window.addEventListener("online", () => r(), { once: true }));

/** One file's multipart upload: parts straight to storage, each retried alone, resumable after a reload. */
class ClipUpload {
  status: Status = "starting";
  message = "Preparing the upload…";
  clip: ClipView | null = null;
  clipId: string | null = null;
  speed = 0;
  private plan: UploadPlan | null = null;
  private done = new Map<number, string>();
  private urls = new Map<number, { url: string; at: number }>();
  private queue: number[] = [];
  private active = new Map<number, { xhr: XMLHttpRequest; loaded: number }>();
  private attempts = new Map<number, number>();
  private refreshing: Promise<void> | null = null;
  private resyncs = 0;
  private lastSample = { at: Date.now(), sent: 0 };
  readonly storeKey: string;

  constructor(
    readonly jobId: string,
    readonly file: File,
    private startFootage: number | null,
    private emit: () => void,
    private ready: (clip: ClipView) => void,
  ) {
    this.storeKey = `${STORE_PREFIX}${jobId}.${file.name}.${file.size}.${file.lastModified}`;
  }

  get sent() {
    const plan = this.plan;
    if (!plan) return 0;
    let bytes = 0;
    for (const n of this.done.keys()) bytes += expectedPartBytes(plan, n);
    for (const a of this.active.values()) bytes += a.loaded;
    return Math.min(bytes, plan.sizeBytes);
  }

  private set(status: Status, message: string) {
    this.status = status;
    this.message = message;
    this.emit();
  }

  sample() {
    const now = Date.now();
    const sent = this.sent;
    const rate = ((sent - this.lastSample.sent) * 1000) / Math.max(1, now - this.lastSample.at);
    this.speed = this.status === "uploading" ? (this.speed ? this.speed * 0.7 + rate * 0.3 : rate) : 0;
    this.lastSample = { at: now, sent };
  }

  async start(attempt = 0): Promise<void> {
    const saved = localStorage.getItem(this.storeKey);
    if (saved) {
      const { clipId } = JSON.parse(saved) as { clipId: string };
      const res = await api<PartsAnswer>(`/api/clips/${clipId}/parts?from=1`);
      if (res.ok) {
        this.clipId = clipId;
        this.adopt(res.data);
        this.set(
          "uploading",
          this.done.size ? `Resuming: ${this.done.size} of ${res.data.partCount} parts were already stored.` : "Uploading…",
        );
        return res.data.assembled ? this.complete() : this.pump();
      }
      if (retryable(res.status)) return this.wait(res.message, () => this.start(attempt + 1), attempt);
      localStorage.removeItem(this.storeKey);
    }
    // Some systems give .mov files no type; the server checks the bytes either way.
    const contentType = KNOWN_TYPES.has(this.file.type)
      ? this.file.type
      : (TYPES[this.file.name.split(".").pop()?.toLowerCase() ?? ""] ?? this.file.type);
    const res = await api<PartsAnswer & { clipId: string }>(`/api/jobs/${this.jobId}/clips`, {
      method: "POST",
      body: { fileName: this.file.name, sizeBytes: this.file.size, contentType, startFootage: this.startFootage },
    });
    if (!res.ok)
      return retryable(res.status) ? this.wait(res.message, () => this.start(attempt + 1), attempt) : this.set("failed", res.message);
    this.clipId = res.data.clipId;
    localStorage.setItem(this.storeKey, JSON.stringify({ clipId: this.clipId, name: this.file.name, size: this.file.size }));
    this.adopt({ ...res.data, uploaded: [] });
    this.set("uploading", "Uploading…");
    this.pump();
  }

  private adopt(answer: PartsAnswer) {
    this.plan = { sizeBytes: this.file.size, partSizeBytes: answer.partSizeBytes, partCount: answer.partCount };
    for (const p of answer.uploaded) this.done.set(p.partNumber, p.etag);
    for (const p of answer.parts) this.urls.set(p.partNumber, { url: p.url, at: Date.now() });
    this.queue = [];
    for (let n = 1; n <= answer.partCount; n++) if (!this.done.has(n) && !this.active.has(n)) this.queue.push(n);
  }

  private wait(message: string, again: () => Promise<void>, attempt: number) {
    this.set("waiting", `${message} Trying again shortly…`);
    setTimeout(() => void whenOnline().then(() => (this.status === "waiting" ? again() : undefined)), backoff(attempt));
  }

  private pump() {
    if (this.status !== "uploading" || !this.plan) return;
    if (this.done.size === this.plan.partCount) return void this.complete();
    while (this.active.size < IN_FLIGHT && this.queue.length) void this.send(this.queue.shift()!);
  }

  private async freshUrl(n: number): Promise<string | null> {
    for (let tries = 0; tries < 3; tries++) {
      const known = this.urls.get(n);
      if (known && Date.now() - known.at < URL_FRESH_MS) return known.url;
      this.refreshing ??= (async () => {
        const to = Math.min(this.plan!.partCount, n + 99);
        const res = await api<PartsAnswer>(`/api/clips/${this.clipId}/parts?from=${n}&to=${to}`);
        if (res.ok) {
          for (const p of res.data.uploaded) this.done.set(p.partNumber, p.etag);
          for (const p of res.data.parts) this.urls.set(p.partNumber, { url: p.url, at: Date.now() });
        }
      })().finally(() => (this.refreshing = null));
      await this.refreshing;
      if (this.done.has(n)) return null;
    }
    return null;
  }

  private async send(n: number) {
    const plan = this.plan!;
    this.active.set(n, { xhr: new XMLHttpRequest(), loaded: 0 });
    const url = await this.freshUrl(n);
    if (this.status !== "uploading") return;
    if (!url) {
      this.active.delete(n);
      return this.done.has(n) ? this.pump() : this.retry(n);
    }
    const { start, end } = partRange(plan, n);
    const slot = this.active.get(n)!;
    const xhr = slot.xhr;
    xhr.open("PUT", url);
    xhr.upload.onprogress = (e) => {
      slot.loaded = e.loaded;
    };
    xhr.onload = () => {
      this.active.delete(n);
      const etag = xhr.getResponseHeader("ETag");
      if (xhr.status >= 200 && xhr.status < 300 && etag) {
        this.done.set(n, etag);
        this.emit();
        return this.pump();
      }
      if (xhr.status === 403) this.urls.delete(n);
      this.retry(n);
    };
    xhr.onerror = xhr.ontimeout = () => {
      this.active.delete(n);
      this.retry(n);
    };
    xhr.send(this.file.slice(start, end));
  }

  private retry(n: number) {
    if (!navigator.onLine) return this.waitForConnection(n);
    const attempt = (this.attempts.get(n) ?? 0) + 1;
    this.attempts.set(n, attempt);
    if (attempt > MAX_ATTEMPTS)
      return this.set("failed", `Part ${n} failed ${MAX_ATTEMPTS} times. Choose the file again to carry on from the parts already stored.`);
    this.message = `Part ${n} did not go through; retrying it…`;
    this.emit();
    setTimeout(
      () => {
        void whenOnline().then(() => {
          if (this.status === "cancelled" || this.done.has(n) || this.queue.includes(n)) return;
          this.queue.unshift(n);
          this.pump();
        });
      },
      backoff(attempt - 1),
    );
  }

  /** Offline: the part goes back in the queue without using up an attempt, and the upload waits for the connection. */
  private waitForConnection(n: number) {
    if (!this.queue.includes(n)) this.queue.unshift(n);
    if (this.status !== "uploading") return;
    this.set("waiting", "The connection dropped. The upload carries on by itself when it returns.");
    void whenOnline().then(() => {
      if (this.status !== "waiting") return;
      this.set("uploading", "Uploading…");
      this.pump();
    });
  }

  private async complete(attempt = 0): Promise<void> {
    this.set("completing", "Checking the video…");
    const parts = [...this.done].sort((a, b) => a[0] - b[0]).map(([partNumber, etag]) => ({ partNumber, etag }));
    const res = await api<{ clip: ClipView }>(`/api/clips/${this.clipId}/complete`, { method: "POST", body: { parts } });
    if (res.ok) {
      localStorage.removeItem(this.storeKey);
      this.clip = res.data.clip;
      this.set("ready", "Ready.");
      await this.addPoster().catch(() => undefined);
      this.ready(this.clip ?? res.data.clip);
      return;
    }
    if (retryable(res.status)) return this.wait(res.message, () => this.complete(attempt + 1), attempt);
    if (res.status === 400 && this.resyncs++ < 2) {
      // Storage holds something other than what we sent: ask it, and send the parts it lacks again.
      this.done.clear();
      const listed = await api<PartsAnswer>(`/api/clips/${this.clipId}/parts?from=1`);
      if (listed.ok) {
        this.adopt(listed.data);
        this.set("uploading", "Sending the parts storage is missing again…");
        return this.pump();
      }
    }
    if (res.status !== 400) localStorage.removeItem(this.storeKey);
    this.set(res.status === 422 ? "rejected" : "failed", res.message);
  }

  private async addPoster() {
    const blob = await posterFrame(this.file).catch(() => null);
    if (!blob || !this.clipId) return;
    const presigned = await api<{ uploadUrl: string; key: string }>(`/api/clips/${this.clipId}/poster`, {
      method: "POST",
      body: { contentType: "image/jpeg", sizeBytes: blob.size },
    });
    if (!presigned.ok) return;
    const put = await fetch(presigned.data.uploadUrl, { method: "PUT", body: blob, headers: { "content-type": "image/jpeg" } }).catch(
      () => null,
    );
    if (!put?.ok) return;
    const done = await api<{ clip: ClipView }>(`/api/clips/${this.clipId}/poster/complete`, {
      method: "POST",
      body: { key: presigned.data.key },
    });
    if (done.ok) {
      this.clip = done.data.clip;
      this.emit();
    }
  }

  pause() {
    if (this.status !== "uploading") return;
    for (const [n, a] of this.active) {
      a.xhr.abort();
      this.queue.unshift(n);
    }
    this.active.clear();
    this.set("paused", "Paused. Parts already stored are kept.");
  }

  resume() {
    if (this.status === "paused") {
      this.set("uploading", "Uploading…");
      this.pump();
    }
  }

  async cancel() {
    this.status = "cancelled";
    for (const a of this.active.values()) a.xhr.abort();
    this.active.clear();
    localStorage.removeItem(this.storeKey);
    if (this.clipId) await api(`/api/clips/${this.clipId}`, { method: "DELETE" });
    this.set("cancelled", "Cancelled.");
  }

  async saveStartFootage(value: number | null) {
    this.startFootage = value;
    if (!this.clipId) return;
    const res = await api<{ clip: ClipView }>(`/api/clips/${this.clipId}`, { method: "PATCH", body: { startFootage: value } });
    if (res.ok && this.clip) this.clip = res.data.clip;
    this.message = res.ok ? "Start footage saved." : res.message;
    this.emit();
  }
}

/** A JPEG of the frame near 1 s, drawn from the local file (nothing is downloaded). */
async function posterFrame(file: File): Promise<Blob | null> {
  const url = URL.createObjectURL(file);
  const video = document.createElement("video");
  video.muted = true;
  video.playsInline = true;
  video.preload = "auto";
  const event = (name: string) =>
    new Promise<void>((resolve, reject) => {
      const timer = setTimeout(() => reject(new Error("timeout")), 10_000);
      video.addEventListener(name, () => (clearTimeout(timer), resolve()), { once: true });
      video.addEventListener("error", () => (clearTimeout(timer), reject(new Error("unreadable"))), { once: true });
    });
  try {
    video.src = url;
    await event("loadeddata");
    video.currentTime = Math.min(1, (video.duration || 2) / 2);
    await event("seeked");
    const scale = Math.min(1, 640 / (video.videoWidth || 640));
    const canvas = document.createElement("canvas");
    canvas.width = Math.round((video.videoWidth || 640) * scale);
    canvas.height = Math.round((video.videoHeight || 360) * scale);
    canvas.getContext("2d")?.drawImage(video, 0, 0, canvas.width, canvas.height);
    return await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, "image/jpeg", 0.8));
  } finally {
    URL.revokeObjectURL(url);
    video.removeAttribute("src");
  }
}

const mb = (bytes: number) => (bytes >= 1e9 ? `${(bytes / 1e9).toFixed(2)} GB` : `${(bytes / 1e6).toFixed(1)} MB`);
const clock = (seconds: number) => `${Math.floor(seconds / 60)}:${String(Math.round(seconds % 60)).padStart(2, "0")}`;
function timeLeft(bytes: number, speed: number) {
  if (speed <= 0) return "";
  const s = Math.ceil(bytes / speed);
  return s >= 90 ? `about ${Math.round(s / 60)} min left` : `${s} s left`;
}

type Leftover = { name: string; size: number };
const NONE: Leftover[] = [];
let leftoverCache = { raw: "[]", list: NONE };

/** Uploads of this job that a reload or a closed tab interrupted, remembered in localStorage. */
function interrupted(jobId: string): Leftover[] {
  const list: Leftover[] = [];
  for (let i = 0; i < localStorage.length; i++) {
    const key = localStorage.key(i);
    if (!key?.startsWith(`${STORE_PREFIX}${jobId}.`)) continue;
    try {
      list.push(JSON.parse(localStorage.getItem(key) ?? "") as Leftover);
    } catch {
      // Not ours to read; left alone.
    }
  }
  const raw = JSON.stringify(list);
  if (raw !== leftoverCache.raw) leftoverCache = { raw, list };
  return leftoverCache.list;
}

function onStorage(listener: () => void) {
  window.addEventListener("storage", listener);
  return () => window.removeEventListener("storage", listener);
}

export function ClipUploader({ jobId, onClipReady }: { jobId: string; onClipReady?: (clip: ClipView) => void }) {
  const inputId = useId();
  const uploads = useRef(new Map<string, ClipUpload>());
  const [rows, setRows] = useState<Snapshot[]>([]);
  const remembered = useSyncExternalStore(
    onStorage,
    () => interrupted(jobId),
    () => NONE,
  );
  const leftOver = remembered.filter((l) => !rows.some((r) => r.name === l.name && r.size === l.size));
  const [footage, setFootage] = useState("");
  const onReady = useRef(onClipReady);
  useEffect(() => {
    onReady.current = onClipReady;
  }, [onClipReady]);

  const refresh = useCallback(() => {
    setRows(
      [...uploads.current.entries()].map(([key, u]) => ({
        key,
        name: u.file.name,
        size: u.file.size,
        status: u.status,
        sent: u.sent,
        speed: u.speed,
        message: u.message,
        clip: u.clip,
      })),
    );
  }, []);

  useEffect(() => {
    const timer = setInterval(() => {
      uploads.current.forEach((u) => u.sample());
      refresh();
    }, TICK_MS);
    const all = uploads.current;
    return () => {
      clearInterval(timer);
      all.forEach((u) => u.pause());
    };
  }, [refresh]);

  function choose(files: FileList | null) {
    const start = footage.trim() === "" ? null : Number(footage);
    for (const file of Array.from(files ?? [])) {
      const key = `${file.name}.${file.size}.${file.lastModified}`;
      const existing = uploads.current.get(key);
      if (existing && !["failed", "cancelled"].includes(existing.status)) continue;
      const upload = new ClipUpload(jobId, file, Number.isFinite(start) ? start : null, refresh, (clip) => onReady.current?.(clip));
      uploads.current.set(key, upload);
      void upload.start();
    }
    refresh();
  }

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end gap-4">
        <div className="space-y-1.5">
          <label htmlFor={inputId} className="text-ink block text-sm font-medium">
            Video clips
          </label>
          <input
            id={inputId}
            type="file"
            multiple
            accept="video/mp4,video/quicktime,video/webm,.mp4,.mov,.m4v,.webm"
            aria-describedby={`${inputId}-hint`}
            onChange={(e) => {
              choose(e.target.files);
              e.target.value = "";
            }}
            className="text-ink file:border-rule-strong file:text-ink hover:file:bg-paper-2 block text-sm file:mr-3 file:min-h-11 file:rounded-md file:border file:bg-white file:px-4 file:font-medium"
          />
          <p id={`${inputId}-hint`} className="text-ink-2 text-sm">
            MP4, QuickTime or WebM, up to 20 GiB each. An interrupted upload carries on when you choose the same file again.
          </p>
        </div>
        <div className="w-40 space-y-1.5">
          <label htmlFor={`${inputId}-ft`} className="text-ink block text-sm font-medium">
            Start footage (ft) <span className="text-ink-2 text-xs font-normal">optional</span>
          </label>
          <Input
            id={`${inputId}-ft`}
            className="min-h-11"
            type="number"
            inputMode="decimal"
            min={0}
            max={2000}
            step={0.1}
            value={footage}
            onChange={(e) => setFootage(e.target.value)}
          />
        </div>
      </div>

      {leftOver.length ? (
        <Alert tone="warning" title="Unfinished uploads">
          {leftOver.map((l) => `${l.name} (${mb(l.size)})`).join(", ")} stopped before finishing. Choose the same file again to carry on
          where it stopped.
        </Alert>
      ) : null}

      <ul className="space-y-3" aria-label="Clip uploads">
        {rows.map((row) => (
          <li key={row.key}>
            <UploadRow row={row} act={(fn) => fn(uploads.current.get(row.key)!)} />
          </li>
        ))}
      </ul>
    </div>
  );
}

const TONE: Record<Status, "neutral" | "teal" | "warning" | "danger" | "success"> = {
  starting: "neutral",
  uploading: "teal",
  paused: "neutral",
  waiting: "warning",
  completing: "teal",
  ready: "success",
  rejected: "danger",
  failed: "danger",
  cancelled: "neutral",
};
const WORD: Record<Status, string> = {
  starting: "Starting",
  uploading: "Uploading",
  paused: "Paused",
  waiting: "Waiting for connection",
  completing: "Checking",
  ready: "Ready",
  rejected: "Rejected",
  failed: "Failed",
  cancelled: "Cancelled",
};

function UploadRow({ row, act }: { row: Snapshot; act: (fn: (upload: ClipUpload) => void) => void }) {
  const pct = row.size ? Math.floor((row.sent / row.size) * 100) : 0;
  const finished = ["ready", "rejected", "failed", "cancelled"].includes(row.status);
  const footageId = useId();
  return (
    <Card>
      <CardBody className="space-y-3">
        <div className="flex flex-wrap items-center justify-between gap-2">
          <p className="min-w-0 truncate font-medium">{row.name}</p>
          <Badge tone={TONE[row.status]}>{WORD[row.status]}</Badge>
        </div>
        {row.status === "ready" && row.clip ? (
          <div className="flex flex-wrap items-center gap-4">
            {/* Signed, short-lived storage URLs: the image optimiser would cache them past their expiry. */}
            {row.clip.posterUrl ? (
              // eslint-disable-next-line @next/next/no-img-element
              <img
                src={row.clip.posterUrl}
                alt={`First frames of ${row.name}`}
                width={160}
                height={120}
                className="border-rule rounded-md border"
              />
            ) : null}
            <p className="text-sm">
              {mb(row.size)} · {row.clip.durationSeconds !== null ? `${clock(row.clip.durationSeconds)} long` : "length unknown"}
            </p>
            <div className="w-40 space-y-1">
              <label htmlFor={footageId} className="text-sm font-medium">
                Start footage (ft)
              </label>
              <Input
                id={footageId}
                className="min-h-11"
                type="number"
                inputMode="decimal"
                min={0}
                max={2000}
                step={0.1}
                defaultValue={row.clip.startFootage ?? ""}
                onBlur={(e) => {
                  const value = e.target.value === "" ? null : Number(e.target.value);
                  act((u) => void u.saveStartFootage(value));
                }}
              />
            </div>
          </div>
        ) : !finished ? (
          <div className="space-y-1">
            <div
              role="progressbar"
              aria-label={`Upload of ${row.name}`}
              aria-valuemin={0}
              aria-valuemax={100}
              aria-valuenow={pct}
              aria-valuetext={`${pct}%, ${mb(row.sent)} of ${mb(row.size)}`}
              className="bg-paper-2 h-2.5 overflow-hidden rounded-full"
            >
              <div className="bg-teal h-full transition-[width]" style={{ width: `${pct}%` }} />
            </div>
            <p className="text-ink-2 text-sm tabular-nums">
              {mb(row.sent)} of {mb(row.size)}
              {row.status === "uploading" && row.speed > 0 ? ` · ${mb(row.speed)}/s · ${timeLeft(row.size - row.sent, row.speed)}` : ""}
            </p>
          </div>
        ) : null}
        <p
          aria-live="polite"
          className={row.status === "rejected" || row.status === "failed" ? "text-danger text-sm font-medium" : "text-ink-2 text-sm"}
        >
          {row.message}
        </p>
        {!finished ? (
          <div className="flex flex-wrap gap-2">
            {row.status === "paused" ? (
              <Button size="sm" variant="secondary" className="min-h-11 px-4" onClick={() => act((u) => u.resume())} aria-label={`Resume upload of ${row.name}`}>
                Resume
              </Button>
            ) : (
              <Button
                size="sm"
                variant="secondary"
                className="min-h-11 px-4"
                onClick={() => act((u) => u.pause())}
                disabled={row.status !== "uploading"}
                aria-label={`Pause upload of ${row.name}`}
              >
                Pause
              </Button>
            )}
            <Button size="sm" variant="ghost" className="min-h-11 px-4" onClick={() => act((u) => void u.cancel())} aria-label={`Cancel upload of ${row.name}`}>
              Cancel
            </Button>
          </div>
        ) : null}
      </CardBody>
    </Card>
  );
}
