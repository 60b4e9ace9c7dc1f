import type { ReactNode } from "react";

import { LineDiagramInteractive } from "@/components/line-diagram-interactive";
import { MoneyRange } from "@/components/ui/money";
import { SeverityBadge, SeverityScale } from "@/components/ui/severity-badge";
import type { ReportSummary } from "@/lib/reports/dto";

import { FindingsList } from "./findings-list";
import { RepairOptions } from "./repair-options";
import { ReportCautions } from "./report-cautions";
import { DISCLAIMER, findingsWorstFirst, ftNumber, methodLines, observedLine, severityMeaning } from "./report-text";

function Section({ id, title, children, description }: { id: string; title: string; children: ReactNode; description?: ReactNode }) {
  return (
    <section aria-labelledby={id} className="space-y-4">
      <div className="space-y-1">
        <h2 id={id} className="text-2xl font-semibold">
          {title}
        </h2>
        {description ? <p className="text-ink-2 max-w-[68ch] text-[0.9375rem]">{description}</p> : null}
      </div>
      {children}
    </section>
  );
}

function Figure({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="border-rule border-t pt-2">
      <dt className="text-ink-2 text-xs font-semibold tracking-[0.06em] uppercase">{label}</dt>
      <dd className="text-ink mt-0.5">{children}</dd>
    </div>
  );
}

const paragraphs = (text: string) =>
  text
    .split(/\n\s*\n/)
    .map((p) => p.trim())
    .filter(Boolean);

const capitalise = (t: string) => t.charAt(0).toUpperCase() + t.slice(1);

/**
 * The whole rated summary, for the buyer's page, the read-only share page and the agent's order page.
 * The host page supplies the h1 (the address); sections here start at h2.
 */
export function RatedSummary({ summary }: { summary: ReportSummary }) {
  const e = summary.evaluation;
  const findings = findingsWorstFirst(summary);
  const inspector = summary.inspector;
  const hasPublic = e.lengths.public > 0;
  return (
    <article aria-label="Rated summary" className="space-y-12 [print-color-adjust:exact]">
      <section aria-labelledby="rating-title" className="rounded-card border-rule shadow-card border bg-white">
        <div className="grid gap-6 px-5 py-5 sm:px-7 sm:py-6 lg:grid-cols-[1fr_20rem]">
          <div className="min-w-0 space-y-4">
            <p className="text-copper text-xs font-semibold tracking-[0.12em] uppercase">{observedLine(summary)}</p>
            <h2 id="rating-title" className="flex flex-wrap items-center gap-3 text-2xl font-semibold sm:text-3xl">
              Severity rating
              <SeverityBadge severity={e.severity} size="lg" />
            </h2>
            <p className="text-ink max-w-[60ch] font-serif text-lg leading-relaxed sm:text-xl">{severityMeaning(e)}</p>
            {e.severityReasons.length > 0 ? (
              <p className="text-ink-2 text-sm">Why this rating: {capitalise(e.severityReasons.join("; "))}.</p>
            ) : null}
            <SeverityScale current={e.severity} className="max-w-lg" />
          </div>
          <dl className="grid grid-cols-2 content-start gap-x-5 gap-y-4 lg:grid-cols-1">
            <Figure label="Line surveyed">
              <span className="num">{ftNumber(e.lengths.surveyed)}</span> ft
              {hasPublic ? (
                <span className="text-ink-2 block text-sm">
                  <span className="num">{ftNumber(e.lengths.private)}</span> ft owner&rsquo;s,{" "}
                  <span className="num">{ftNumber(e.lengths.public)}</span> ft city&rsquo;s
                </span>
              ) : null}
            </Figure>
            <Figure label="Findings">
              <span className="num">{e.findings.length}</span>
              <span className="text-ink-2 text-sm">
                {" "}
                · <span className="num">{e.stretches.length}</span> {e.stretches.length === 1 ? "stretch needs" : "stretches need"} work
              </span>
            </Figure>
            <Figure label="Estimate, owner's side">
              {e.costBySide.private.highCents > 0 ? (
                <MoneyRange lowCents={e.costBySide.private.lowCents} highCents={e.costBySide.private.highCents} className="font-semibold" />
              ) : (
                "No repair work"
              )}
            </Figure>
            {e.costBySide.public.highCents > 0 ? (
              <Figure label="Estimate, city's side">
                <MoneyRange lowCents={e.costBySide.public.lowCents} highCents={e.costBySide.public.highCents} />
              </Figure>
            ) : null}
            {inspector ? (
              <Figure label="Inspector">
                {inspector.name}
                {inspector.company ? <span className="text-ink-2 block text-sm">{inspector.company}</span> : null}
                {inspector.licenceNumber ? (
                  <span className="text-ink-2 block text-sm">
                    Licence <span className="num">{inspector.licenceNumber}</span>
                  </span>
                ) : null}
              </Figure>
            ) : null}
          </dl>
        </div>
      </section>

      <Section id="summary-title" title="In short">
        <ul className="marker:text-copper max-w-[72ch] list-disc space-y-2 pl-5 text-[0.9375rem] leading-relaxed">
          {e.summary.map((b) => (
            <li key={b}>{b}</li>
          ))}
        </ul>
      </Section>

      {summary.narrative.trim() || summary.recommendation.trim() ? (
        <Section id="notes-title" title="The inspector's notes">
          <div className="grid gap-6 md:grid-cols-2">
            {summary.narrative.trim() ? (
              <div className="space-y-2">
                <h3 className="text-lg font-semibold">What they saw</h3>
                <div className="prose-doc text-[0.9375rem]">
                  {paragraphs(summary.narrative).map((p) => (
                    <p key={p}>{p}</p>
                  ))}
                </div>
              </div>
            ) : null}
            {summary.recommendation.trim() ? (
              <div className="space-y-2">
                <h3 className="text-lg font-semibold">What they recommend</h3>
                <div className="prose-doc text-[0.9375rem]">
                  {paragraphs(summary.recommendation).map((p) => (
                    <p key={p}>{p}</p>
                  ))}
                </div>
              </div>
            ) : null}
          </div>
        </Section>
      ) : null}

      <Section
        id="diagram-title"
        title="Side view of the line"
        description="Footage runs from the access point (0 ft) towards the main. Depths come from the locate marks; all footages and depths are approximate."
      >
        <div className="rounded-card border-rule border bg-white p-3 sm:p-4">
          <LineDiagramInteractive record={summary.record} evaluation={e} />
        </div>
      </Section>

      <Section
        id="findings-title"
        title="Findings, worst first"
        description="Each finding with its footage, side, clock position (as seen looking downstream) and grade from 1 to 5."
      >
        <FindingsList findings={findings} />
      </Section>

      <Section id="repairs-title" title="Repair options">
        <RepairOptions evaluation={e} />
      </Section>

      <Section id="cautions-title" title="Cautions">
        <ReportCautions cautions={e.cautions} />
      </Section>

      <section aria-labelledby="method-title" className="border-rule text-ink-2 space-y-3 border-t pt-6 text-sm leading-relaxed">
        <h2 id="method-title" className="text-ink text-lg font-semibold">
          How this summary was made
        </h2>
        <ul className="max-w-[80ch] space-y-1.5">
          {methodLines(summary).map((l) => (
            <li key={l}>{l}</li>
          ))}
        </ul>
        <p className="text-ink font-medium">{observedLine(summary)}.</p>
        <div className="max-w-[80ch] space-y-1.5">
          {DISCLAIMER.map((d) => (
            <p key={d}>{d}</p>
          ))}
        </div>
      </section>
    </article>
  );
}
