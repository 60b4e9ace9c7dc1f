import clsx from "clsx";
import type { ReactNode } from "react";

import { SeverityBadge } from "@/components/ui/severity-badge";

import { ClipAtSecond } from "./clip-at-second";
import { clockText, ftSpan, SIDE_TEXT, type ReportFinding } from "./report-text";

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="flex items-baseline gap-2">
      <dt className="text-ink-2 text-sm">{label}</dt>
      <dd className="text-ink">{children}</dd>
    </div>
  );
}

function FindingItem({ f }: { f: ReportFinding }) {
  const place = ftSpan(f.at, f.to);
  const title = `${f.label} ${f.to !== null && f.to > f.at ? "from" : "at"} ${place}`;
  const clock = clockText(f.clock);
  const frame = f.stillUrl
    ? { src: f.stillUrl, alt: `Still frame from the camera: ${title.toLowerCase()}` }
    : f.clip?.posterUrl
      ? { src: f.clip.posterUrl, alt: `Opening frame of the clip that shows the ${title.toLowerCase()}` }
      : null;
  return (
    <li className={clsx("rounded-card border-rule grid gap-4 border bg-white p-4 sm:p-5", frame && "sm:grid-cols-[11rem_1fr]")}>
      {frame ? (
        <div className="order-last sm:order-none">
          {/* Signed, short-lived URLs: the image optimizer would only cache links that stop working. */}
          {/* eslint-disable-next-line @next/next/no-img-element */}
          <img
            src={frame.src}
            alt={frame.alt}
            width={320}
            height={240}
            loading="lazy"
            decoding="async"
            className="rounded-card border-rule bg-paper-2 aspect-[4/3] w-full max-w-[14rem] border object-cover sm:max-w-xs"
          />
        </div>
      ) : null}
      <div className="min-w-0 space-y-3">
        <div className="flex flex-wrap items-start justify-between gap-x-4 gap-y-2">
          <h3 className="font-sans text-base font-semibold">
            {f.label} <span className="num text-ink-2 font-normal">{place}</span>
          </h3>
          <p className="text-ink-2 flex items-center gap-2 text-sm">
            Grade <SeverityBadge severity={f.grade} size="sm" />
          </p>
        </div>
        <dl className="flex flex-wrap gap-x-6 gap-y-1 text-[0.9375rem]">
          <Fact label="Side">{SIDE_TEXT[f.side]}</Fact>
          {clock ? <Fact label="Clock position">{clock}</Fact> : null}
          {f.measure ? <Fact label="Measured">{f.measure}</Fact> : null}
        </dl>
        {f.note ? <p className="text-ink text-[0.9375rem]">{f.note}</p> : null}
        {f.clip ? (
          <ClipAtSecond
            src={f.clip.playbackUrl}
            poster={f.stillUrl ?? f.clip.posterUrl}
            second={f.clipSecond}
            label={title.toLowerCase()}
          />
        ) : null}
      </div>
    </li>
  );
}

export function FindingsList({ findings }: { findings: ReportFinding[] }) {
  if (findings.length === 0) {
    return <p className="text-ink-2">The inspector recorded no findings on this line.</p>;
  }
  return (
    <ol className="space-y-3" aria-label="Findings, worst grade first">
      {findings.map((f) => (
        <FindingItem key={f.index} f={f} />
      ))}
    </ol>
  );
}
