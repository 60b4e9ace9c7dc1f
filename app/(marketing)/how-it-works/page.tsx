import type { Metadata } from "next";

import { ButtonLink } from "@/components/ui/button";
import { Caution } from "@/components/ui/caution";
import { SEVERITY_LABELS, SeverityBadge, type Severity } from "@/components/ui/severity-badge";

import { Steps } from "../steps";

export const metadata: Metadata = {
  title: "How it works",
  description:
    "How a Gradeline order runs, what the inspector records along the line, how the severity rating is set and which repair options are considered.",
};

const records = [
  {
    term: "Access point",
    text: "Where the camera went in (a cleanout inside or outside, a pulled toilet, a roof vent), with a location note and the pipe diameter. The counter is zeroed there.",
  },
  {
    term: "Line profile",
    text: "The line from zero to the end of the survey in segments, each with its material and diameter, and why the survey ended: at the main, at a blockage, or where the camera could not pass.",
  },
  {
    term: "Locate marks",
    text: "Spots where the inspector found the camera head from the surface with a sonde receiver and painted a mark: the footage, the depth read there, and whether it is lawn, concrete or street.",
  },
  {
    term: "Responsibility boundary",
    text: "The footage where the city's part of the line begins, at the property line, the curb or the main depending on the city, when it is known.",
  },
  {
    term: "Findings",
    text: "Each defect at its footage (start and end for a continuous one), its clock position, a grade from 1 to 5, the share of the pipe lost to roots or deposits or filled by standing water, a note and the clip at the right second.",
  },
  {
    term: "Narrative",
    text: "The inspector's own summary and recommendation, printed beside the generated summary, never replaced by it.",
  },
];

const meaning: Record<Severity, string> = {
  1: "No defects that need work. Keep the report.",
  2: "Small defects to watch; no repair needed before closing.",
  3: "Defects that call for cleaning, a re-check or a planned repair.",
  4: "Damage that needs repair soon; worth a credit in negotiation.",
  5: "A break, collapse or blockage: the line may fail or is failing.",
};

const repairs = [
  { name: "No action", when: "The line is sound or the defects are minor." },
  { name: "Cleaning and re-check", when: "Roots or deposits without structural damage behind them." },
  { name: "Spot repair", when: "One short damaged stretch; dug up or patched from inside." },
  {
    name: "Trenchless lining",
    when: "Cracks and root entry along a line that still holds its shape; ruled out where water stands over a quarter of the diameter, or at a collapse.",
  },
  { name: "Pipe bursting", when: "Replacing a run without a trench, where the line and the soil allow it; ruled out at a collapse." },
  {
    name: "Excavation and replacement",
    when: "Collapses, deep sags, or where nothing else fits; favored less under concrete or a street.",
  },
];

export default function HowItWorksPage() {
  return (
    <div className="mx-auto max-w-6xl px-4 pt-14 sm:px-6 sm:pt-20">
      <header className="max-w-3xl">
        <p className="text-copper text-xs font-semibold tracking-[0.14em] uppercase">How it works</p>
        <h1 className="mt-3 text-4xl leading-tight font-semibold tracking-[-0.01em] sm:text-5xl">
          From the order to a rated summary, inside the contingency
        </h1>
        <p className="text-ink-2 mt-5 text-lg leading-relaxed">
          Every order follows the same path, and everyone involved sees where it stands: open, accepted, scheduled, delivered, unlocked.
        </p>
      </header>

      <section aria-labelledby="path-title" className="mt-16">
        <h2 id="path-title" className="sr-only">
          The steps
        </h2>
        <Steps />
      </section>

      <section aria-labelledby="records-title" className="border-rule mt-20 border-t pt-14">
        <div className="grid gap-10 lg:grid-cols-[minmax(0,2fr)_minmax(0,5fr)]">
          <div>
            <h2 id="records-title" className="text-3xl leading-tight font-semibold">
              What the inspector records
            </h2>
            <p className="text-ink-2 mt-3 text-[0.9375rem] leading-relaxed">
              All distances are footage from the zero point at the access point. The rated summary is built from these records alone.
            </p>
          </div>
          <dl className="divide-rule border-rule divide-y border-y">
            {records.map((r) => (
              <div key={r.term} className="grid gap-1 py-4 sm:grid-cols-[12rem_1fr] sm:gap-6">
                <dt className="font-serif text-lg font-semibold">{r.term}</dt>
                <dd className="text-ink-2 text-[0.9375rem] leading-relaxed">{r.text}</dd>
              </div>
            ))}
          </dl>
        </div>
      </section>

      <section aria-labelledby="rating-title" className="border-rule mt-20 border-t pt-14">
        <div className="grid gap-10 lg:grid-cols-[minmax(0,2fr)_minmax(0,5fr)]">
          <div>
            <h2 id="rating-title" className="text-3xl leading-tight font-semibold">
              How the rating is set
            </h2>
            <p className="text-ink-2 mt-3 text-[0.9375rem] leading-relaxed">
              Findings are grouped into structural defects (cracks, breaks, offsets, sags, deformation) and service defects (roots,
              deposits, infiltration). Each group takes the grade of its worst finding; the severity rating the buyer sees follows from
              both, with how densely the defects sit along the line.
            </p>
            <p className="text-ink-2 mt-3 text-[0.9375rem] leading-relaxed">
              Grades between locate marks are worked out from the depths and shown as estimates, since locator readings are approximate.
            </p>
          </div>
          <ul className="divide-rule border-rule divide-y border-y">
            {([1, 2, 3, 4, 5] as const).map((s) => (
              <li key={s} className="flex flex-col gap-2 py-4 sm:flex-row sm:items-center sm:gap-6">
                <span className="w-36 shrink-0">
                  <SeverityBadge severity={s} />
                </span>
                <span className="text-ink-2 text-[0.9375rem]">
                  <span className="sr-only">{SEVERITY_LABELS[s]}: </span>
                  {meaning[s]}
                </span>
              </li>
            ))}
          </ul>
        </div>
      </section>

      <section aria-labelledby="repairs-title" className="border-rule mt-20 border-t pt-14">
        <div className="grid gap-10 lg:grid-cols-[minmax(0,2fr)_minmax(0,5fr)]">
          <div>
            <h2 id="repairs-title" className="text-3xl leading-tight font-semibold">
              Repair options
            </h2>
            <p className="text-ink-2 mt-3 text-[0.9375rem] leading-relaxed">
              For each stretch of line that needs work, the summary lists the methods that fit and those ruled out, each with its reason,
              and a cost range from the market&rsquo;s rate table, adjusted for depth and surface and split between the private line and the
              public portion.
            </p>
          </div>
          <dl className="divide-rule border-rule divide-y border-y">
            {repairs.map((r) => (
              <div key={r.name} className="grid gap-1 py-4 sm:grid-cols-[12rem_1fr] sm:gap-6">
                <dt className="font-serif text-lg font-semibold">{r.name}</dt>
                <dd className="text-ink-2 text-[0.9375rem] leading-relaxed">{r.when}</dd>
              </div>
            ))}
          </dl>
        </div>
      </section>

      <div className="mt-20">
        <Caution />
      </div>

      <div className="mt-16 flex flex-wrap gap-3">
        <ButtonLink href="/sign-up" size="lg">
          Get started
        </ButtonLink>
        <ButtonLink href="/pricing" size="lg" variant="secondary">
          See pricing
        </ButtonLink>
      </div>
    </div>
  );
}
