"use client";

import { useEffect, useRef, useState } from "react";

import { Button } from "@/components/ui/button";

import { clipTime } from "./report-text";

/** A button that opens the finding's clip and plays it from its second. Nothing loads until it is pressed. */
export function ClipAtSecond({ src, poster, second, label }: { src: string; poster: string | null; second: number; label: string }) {
  const [open, setOpen] = useState(false);
  const [failed, setFailed] = useState(false);
  const [plays, setPlays] = useState(0);
  const video = useRef<HTMLVideoElement>(null);

  useEffect(() => {
    const v = video.current;
    if (!open || !v) return;
    const start = () => {
      v.currentTime = second;
      v.play().catch(() => {
        // Autoplay refused: the controls are there for the viewer to press play.
      });
    };
    if (v.readyState >= 1) start();
    else v.addEventListener("loadedmetadata", start, { once: true });
    return () => v.removeEventListener("loadedmetadata", start);
  }, [open, plays, second]);

  const time = clipTime(second);
  return (
    <div className="space-y-2 print:hidden">
      <Button
        variant="secondary"
        size="sm"
        aria-label={`Play the clip of ${label} from ${time}`}
        onClick={() => {
          setOpen(true);
          setFailed(false);
          setPlays((n) => n + 1);
        }}
      >
        <svg viewBox="0 0 16 16" className="size-3.5" aria-hidden="true">
          <path d="M4.5 3v10l8-5-8-5Z" fill="currentColor" />
        </svg>
        Play from <span className="num">{time}</span>
      </Button>
      {open ? (
        <div className="space-y-1">
          <video
            ref={video}
            src={`${src}#t=${second}`}
            poster={poster ?? undefined}
            controls
            playsInline
            preload="metadata"
            onError={() => setFailed(true)}
            className="rounded-card bg-ink aspect-video w-full max-w-xl"
            aria-label={`Clip of ${label}`}
          />
          {failed ? (
            <p role="status" className="text-danger text-sm">
              The clip could not be loaded. Its link may have expired: reload the page and try again.
            </p>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}
