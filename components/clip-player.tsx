"use client";

import clsx from "clsx";
import { useCallback, useEffect, useImperativeHandle, useRef, useState, type Ref } from "react";

import { Alert } from "@/components/ui/alert";

export type ClipPlayerHandle = {
  /** Jumps to a second of the clip ("play from this second") and plays. */
  seekTo: (second: number) => void;
  currentTime: () => number;
  pause: () => void;
  /** The video element, for taking a still frame from what is on screen (only untainted with `corsReady`). */
  element: () => HTMLVideoElement | null;
};

type Props = {
  clipId: string;
  label: string;
  posterUrl?: string | null;
  /** A playback URL already signed by the server; fetched from /api/clips/{id} when absent. */
  src?: string | null;
  /** Another way to seek: each new value moves the playhead there. */
  seekSecond?: number | null;
  onTimeUpdate?: (second: number) => void;
  /** Ask storage for CORS so the frames can be drawn on a canvas (storage allows the app's origin). */
  corsReady?: boolean;
  ref?: Ref<ClipPlayerHandle>;
  className?: string;
};

async function playbackUrl(clipId: string): Promise<{ url: string | null; error: string | null }> {
  try {
    const res = await fetch(`/api/clips/${clipId}`);
    const json = (await res.json()) as { playbackUrl?: string | null; error?: { message: string } };
    if (res.ok && json.playbackUrl) return { url: json.playbackUrl, error: null };
    return { url: null, error: json.error?.message ?? "This clip cannot be played yet." };
  } catch {
    return { url: null, error: "No connection to Gradeline: the clip cannot be loaded." };
  }
}

/** Plays a clip from its short-lived signed URL; when the URL expires mid-watch it fetches a new one and keeps the place. */
export function ClipPlayer({ clipId, label, posterUrl, src, seekSecond, onTimeUpdate, corsReady, ref, className }: Props) {
  const video = useRef<HTMLVideoElement>(null);
  const [fetched, setFetched] = useState<string | null>(null);
  const url = fetched ?? src ?? null;
  const [error, setError] = useState<string | null>(null);
  const pending = useRef<{ at: number; play: boolean } | null>(null);
  const renewedAt = useRef(0);

  const fetchUrl = useCallback(
    () =>
      playbackUrl(clipId).then((r) => {
        setError(r.error);
        if (r.url) setFetched(r.url);
      }),
    [clipId],
  );

  useEffect(() => {
    if (src) return;
    let live = true;
    void playbackUrl(clipId).then((r) => {
      if (!live) return;
      setError(r.error);
      if (r.url) setFetched(r.url);
    });
    return () => {
      live = false;
    };
  }, [src, clipId]);

  const seekTo = useCallback((second: number) => {
    const v = video.current;
    if (!v) return;
    const at = Math.max(0, Number.isFinite(v.duration) ? Math.min(second, v.duration) : second);
    if (v.readyState >= 1) {
      v.currentTime = at;
      void v.play().catch(() => undefined);
    } else {
      pending.current = { at, play: true };
    }
  }, []);

  useImperativeHandle(
    ref,
    () => ({
      seekTo,
      currentTime: () => video.current?.currentTime ?? 0,
      pause: () => video.current?.pause(),
      element: () => video.current,
    }),
    [seekTo],
  );

  useEffect(() => {
    if (seekSecond !== null && seekSecond !== undefined) seekTo(seekSecond);
  }, [seekSecond, seekTo]);

  function onError() {
    const v = video.current;
    // A signed URL that expired answers 403: renew it at most once a minute and resume where we were.
    if (Date.now() - renewedAt.current < 60_000) return setError("The clip could not be loaded. Reload the page to try again.");
    renewedAt.current = Date.now();
    pending.current = { at: v?.currentTime ?? 0, play: !!v && !v.paused };
    void fetchUrl();
  }

  return (
    <div className={clsx("space-y-2", className)}>
      <video
        ref={video}
        src={url ?? undefined}
        poster={posterUrl ?? undefined}
        crossOrigin={corsReady ? "anonymous" : undefined}
        controls
        playsInline
        preload="metadata"
        aria-label={`Clip: ${label}`}
        className="aspect-video w-full rounded-md bg-black"
        onLoadedMetadata={() => {
          const v = video.current;
          if (v && pending.current) {
            v.currentTime = pending.current.at;
            if (pending.current.play) void v.play().catch(() => undefined);
            pending.current = null;
          }
        }}
        onTimeUpdate={() => onTimeUpdate?.(video.current?.currentTime ?? 0)}
        onError={onError}
      />
      {error ? <Alert tone="danger">{error}</Alert> : null}
    </div>
  );
}
