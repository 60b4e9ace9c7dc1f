"use client";

import { useEffect, useRef, useState } from "react";

import { ClipPlayer, type ClipPlayerHandle } from "@/components/clip-player";
import { ClipUploader } from "@/components/clip-uploader";
import { Alert } from "@/components/ui/alert";
import { Badge, type BadgeTone } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";

import { proposeFootage } from "./problem-fields";
import { captureFrame, frameAt } from "./still-frame";
import type { ClipStatus, ClipSummary } from "./use-clips";

const STATUS: Record<ClipStatus, { label: string; tone: BadgeTone }> = {
  uploading: { label: "Uploading", tone: "teal" },
  ready: { label: "Ready", tone: "success" },
  rejected: { label: "Rejected", tone: "danger" },
  aborted: { label: "Cancelled", tone: "outline" },
  removed: { label: "Removed", tone: "outline" },
};

export const secondsText = (s: number) => `${Math.floor(s / 60)}:${(s % 60).toFixed(1).padStart(4, "0")}`;

export type ClipMoment = { clip: ClipSummary; second: number; footage: number; speed: number; still: Blob | null };

export function ClipsSection({
  jobId,
  clips,
  error,
  onReload,
  onAddFinding,
}: {
  jobId: string;
  clips: ClipSummary[];
  error?: Error;
  onReload: () => void;
  onAddFinding: (moment: ClipMoment) => void;
}) {
  const [watching, setWatching] = useState<string | null>(null);
  const clip = clips.find((c) => c.id === watching && c.status === "ready") ?? null;
  return (
    <div className="space-y-4">
      <div data-part="clip-uploader">
        <ClipUploader jobId={jobId} onClipReady={() => onReload()} />
      </div>
      {error ? <Alert tone="warning">{error.message}</Alert> : null}
      {clips.length === 0 && !error ? (
        <p className="text-ink-2 text-sm">No clips yet. Upload the runs you recorded; at least one must be ready before you submit.</p>
      ) : null}
      {clips.length > 0 ? (
        <ul className="divide-rule border-rule divide-y rounded-md border bg-white">
          {clips.map((c) => (
            <li key={c.id} className="flex flex-wrap items-center gap-3 px-3 py-2.5">
              {c.posterUrl ? (
                // eslint-disable-next-line @next/next/no-img-element -- a short-lived signed storage URL, not an optimisable asset
                <img src={c.posterUrl} alt="" className="border-rule aspect-video w-20 shrink-0 rounded-sm border bg-black object-cover" />
              ) : null}
              <div className="min-w-0 flex-1">
                <p className="truncate font-medium">{c.label}</p>
                <p className="text-ink-2 flex flex-wrap items-center gap-x-3 gap-y-1 text-sm">
                  <Badge tone={STATUS[c.status].tone}>{STATUS[c.status].label}</Badge>
                  {c.durationSeconds !== null ? <span className="num">{secondsText(c.durationSeconds)}</span> : null}
                  {c.startFootage !== null ? (
                    <span>
                      starts at <span className="num">{c.startFootage.toFixed(1)} ft</span>
                    </span>
                  ) : (
                    <span>no start footage</span>
                  )}
                </p>
              </div>
              {c.status === "ready" ? (
                <Button
                  variant={watching === c.id ? "primary" : "secondary"}
                  className="min-h-11"
                  aria-pressed={watching === c.id}
                  onClick={() => setWatching(watching === c.id ? null : c.id)}
                >
                  {watching === c.id ? "Close" : "Watch"}
                  <span className="sr-only"> {c.label}</span>
                </Button>
              ) : null}
            </li>
          ))}
        </ul>
      ) : null}
      {clip ? <ClipViewer key={clip.id} clip={clip} onAddFinding={onAddFinding} /> : null}
    </div>
  );
}

// The viewer mounts only after a tap on "Watch", never on the server, so it can read storage at once.
function usePushSpeed(): [string, (v: string) => void] {
  const [speed, setSpeed] = useState(() => window.localStorage.getItem("gradeline.pushSpeed") ?? "1");
  return [
    speed,
    (v) => {
      setSpeed(v);
      window.localStorage.setItem("gradeline.pushSpeed", v);
    },
  ];
}

async function signedUrl(clipId: string): Promise<string | null> {
  try {
    const res = await fetch(`/api/clips/${clipId}`, { headers: { accept: "application/json" }, cache: "no-store" });
    const body = (await res.json()) as { clip?: { playbackUrl?: string | null }; playbackUrl?: string | null };
    return (res.ok && (body.playbackUrl ?? body.clip?.playbackUrl)) || null;
  } catch {
    return null;
  }
}

function ClipViewer({ clip, onAddFinding }: { clip: ClipSummary; onAddFinding: (moment: ClipMoment) => void }) {
  const player = useRef<ClipPlayerHandle>(null);
  const [url, setUrl] = useState<{ src: string | null } | null>(null);
  const [second, setSecond] = useState(0);
  const [speedText, setSpeedText] = usePushSpeed();
  const [busy, setBusy] = useState(false);
  const speed = Number(speedText);
  const footage = proposeFootage(clip.startFootage, second, speed);

  useEffect(() => {
    let live = true;
    void signedUrl(clip.id).then((src) => live && setUrl({ src }));
    return () => {
      live = false;
    };
  }, [clip.id]);

  async function addHere() {
    const at = player.current?.currentTime() ?? second;
    player.current?.pause();
    setBusy(true);
    // The player asks storage for CORS, so the frame on screen can be drawn as it is. If it cannot
    // (no decoded frame yet), a separate element loads a freshly signed URL and seeks there.
    const shown = player.current?.element();
    let still = shown && shown.readyState >= 2 && !shown.seeking ? await captureFrame(shown) : null;
    if (!still) {
      console.warn("Still frame: the frame on screen could not be drawn; loading the clip again.");
      const fresh = await signedUrl(clip.id);
      still = fresh ? await frameAt(fresh, at) : null;
    }
    setBusy(false);
    const rounded = Math.round(at * 10) / 10;
    onAddFinding({ clip, second: rounded, footage: proposeFootage(clip.startFootage, at, speed), speed, still });
  }

  return (
    <div className="border-rule space-y-3 rounded-md border bg-white p-3">
      <h3 className="font-sans text-[0.9375rem] font-semibold">{clip.label}</h3>
      {url ? (
        <ClipPlayer ref={player} clipId={clip.id} label={clip.label} posterUrl={clip.posterUrl} src={url.src} onTimeUpdate={setSecond} corsReady />
      ) : (
        <div className="bg-paper-2 text-ink-2 flex aspect-video w-full items-center justify-center rounded-sm text-sm">
          Loading the clip…
        </div>
      )}
      <div className="grid items-end gap-3 sm:grid-cols-[10rem_1fr]">
        <Field label="Pushing speed (ft/s)" hint="How fast you fed the cable.">
          {(c) => (
            <Input
              type="number"
              inputMode="decimal"
              step={0.1}
              min={0.1}
              className="num min-h-11"
              value={speedText}
              onChange={(e) => setSpeedText(e.target.value)}
              {...c}
            />
          )}
        </Field>
        <p className="text-sm">
          At <span className="num">{secondsText(second)}</span> the footage is about{" "}
          <span className="num font-semibold">{footage.toFixed(1)} ft</span>
          <span className="text-ink-2">
            {" "}
            — a proposal:{" "}
            {clip.startFootage !== null ? <span className="num">{clip.startFootage.toFixed(1)} ft</span> : "0 ft (no start footage)"} +{" "}
            <span className="num">{second.toFixed(1)} s</span> × <span className="num">{Number.isFinite(speed) ? speed : 0} ft/s</span>.
            Check it against the counter on the video.
          </span>
        </p>
      </div>
      <Button size="lg" className="w-full sm:w-auto" onClick={addHere} pending={busy} disabled={!url}>
        Add a finding here
      </Button>
    </div>
  );
}
