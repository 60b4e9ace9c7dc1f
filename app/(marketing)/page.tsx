import type { Metadata } from "next";
import Link from "next/link";
import type { ReactNode } from "react";

import { ButtonLink } from "@/components/ui/button";
import { Caution } from "@/components/ui/caution";
import { formatMoney } from "@/components/ui/money";
import { SeverityScale } from "@/components/ui/severity-badge";
import { DEFAULT_PRICES } from "@/lib/pricing-defaults";

import { LateralFigure } from "./lateral-figure";
import { SampleSummary } from "./sample-summary";
import { Steps } from "./steps";

export const metadata: Metadata = {
  title: { absolute: "Gradeline · Sewer scopes before you buy" },
};

const P = DEFAULT_PRICES;
const pct = (bps: number) => `${bps / 100}%`;
const REUSE_FRESH_DAYS = P.reuseFreshDays;

const defects = [
  "Roots at joints and through cracks",
  "Cracks, fractures, breaks and holes",
  "Offset or separated joints",
  "Sags (bellies) that hold water",
  "Deformed or collapsed pipe",
  "Grease, scale and other deposits",
  "A poor connection at the main",
];

const roles: { id: string; title: string; lead: string; points: ReactNode[] }[] = [
  {
    id: "agents",
    title: "Buyer's agents",
    lead: "The scope booked, done and read inside the contingency.",
    points: [
      "Order in two minutes: the listing, access notes and the contingency deadline.",
      "Follow it from open to accepted, scheduled and delivered, with a countdown to the deadline.",
      "An at-risk flag as soon as no appointment can meet the deadline, while there is still time to act.",
      "Invite the buyer, then read the rated summary once they unlock it.",
    ],
  },
  {
    id: "inspectors",
    title: "Inspectors",
    lead: "Jobs in your area, a clear report built from your own records, and pay on unlock.",
    points: [
      "A job board of open orders in your service area, soonest deadline first. Accept, and the job is yours.",
      "A workspace that works one-handed on a phone in a basement: clips, line profile, locate marks, findings.",
      "Grades, the rated summary and the repair options are worked out from what you record, beside your own narrative.",
      <>
        Paid to your payout account when the buyer unlocks: the price less a {pct(P.platformFeeBps)} platform fee, and a share again each
        time your report is reused.
      </>,
    ],
  },
  {
    id: "buyers",
    title: "Home buyers",
    lead: "A verdict in plain words, the evidence, and numbers to negotiate with.",
    points: [
      "Your agent's invitation opens a preview of the report, so you know it is there before you pay.",
      "Pay once to unlock the rated summary: severity, where each problem is, what fits as a repair and what it costs.",
      "Download the PDF and send a read-only link to your contractor or the seller's agent.",
      "Ask for a credit or a repair with cost ranges in hand, before the contingency ends.",
    ],
  },
];

const gives = [
  {
    title: "A severity rating, 1 to 5",
    text: "One rating for the whole line, from Sound to Critical, backed by a structural grade and a service grade, and a figure for how densely the defects sit.",
  },
  {
    title: "Where each problem is",
    text: "Every finding at its footage from the cleanout and its clock position, drawn on a side view of the line with the locate marks, their depths, and where the city's part begins.",
  },
  {
    title: "Repair options that fit",
    text: "For each stretch that needs work: the methods that fit and the ones ruled out, each with its reason, and a cost range split between the private line and the public portion.",
  },
  {
    title: "The clips",
    text: "Each finding opens the video at the second it shows, so the buyer, the seller's side and a contractor all look at the same thing.",
  },
];

function Section({
  id,
  eyebrow,
  title,
  children,
  className = "",
}: {
  id: string;
  eyebrow?: string;
  title: ReactNode;
  children: ReactNode;
  className?: string;
}) {
  return (
    <section aria-labelledby={`${id}-title`} className={`border-rule border-t py-16 sm:py-24 ${className}`}>
      <div className="mx-auto max-w-6xl px-4 sm:px-6">
        {eyebrow ? <p className="text-copper text-xs font-semibold tracking-[0.14em] uppercase">{eyebrow}</p> : null}
        <h2 id={`${id}-title`} className="mt-2 max-w-[30ch] text-3xl leading-tight font-semibold tracking-[-0.01em] sm:text-4xl">
          {title}
        </h2>
        {children}
      </div>
    </section>
  );
}

export default function LandingPage() {
  return (
    <>
      <div className="mx-auto grid max-w-6xl items-center gap-x-14 gap-y-12 px-4 pt-14 pb-16 sm:px-6 sm:pt-20 sm:pb-24 lg:grid-cols-[minmax(0,5fr)_minmax(0,6fr)]">
        <div>
          <p className="text-copper text-xs font-semibold tracking-[0.14em] uppercase">Pre-purchase sewer scopes</p>
          <h1 className="mt-3 text-[2.5rem] leading-[1.08] font-semibold tracking-[-0.015em] sm:text-5xl lg:text-[3.4rem]">
            See inside the sewer line before the contingency runs out.
          </h1>
          <p className="text-ink-2 mt-6 max-w-[52ch] text-lg leading-relaxed">
            Gradeline books a camera inspection of a listing&rsquo;s building sewer with a verified local inspector, and turns what the
            camera saw into a rated summary the buyer can negotiate with: how bad the line is, where, what would fix it, and roughly what
            that costs.
          </p>
          <div className="mt-8 flex flex-wrap items-center gap-3">
            <ButtonLink href="/sign-up" size="lg">
              Get started
            </ButtonLink>
            <ButtonLink href="/how-it-works" size="lg" variant="secondary">
              How it works
            </ButtonLink>
          </div>
          <p className="text-ink-2 mt-5 text-sm">
            Scopes from <span className="num text-ink">{formatMoney(P.baseCents, { whole: true })}</span> in the demo market. The buyer pays
            once, when the report is unlocked.
          </p>
        </div>
        <LateralFigure />
      </div>

      <Section id="why" eyebrow="Why scope the sewer" title="The one pipe a home inspection doesn’t look inside">
        <div className="mt-10 grid gap-12 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
          <div className="prose-doc text-ink space-y-0 text-[1.0625rem]">
            <p>
              The building sewer, also called the lateral or side sewer, carries everything the house drains out to the public main under
              the street. In older neighborhoods it is often cast iron or clay, with a joint every few feet for roots to find. When it
              fails, the fix means a trench across the yard or a liner pulled through from the cleanout, and the owner pays for the private
              part.
            </p>
            <p>
              A general home inspection runs the taps and watches them drain. It does not put a camera inside the lateral, so a cracked,
              root-filled or sagging line passes unnoticed until the day it backs up. A sewer scope does: the inspector enters at the
              cleanout, zeroes the counter, pushes a camera to the main and records every defect at its footage.
            </p>
            <p>
              An inspection contingency runs a week or two. The scope has to be booked, done and read inside that window, with days left
              over to ask for a credit. Gradeline is built around that deadline.
            </p>
          </div>
          <div className="border-ink self-start border-t-2 pt-4">
            <h3 className="text-ink-2 font-sans text-sm font-semibold tracking-[0.06em] uppercase">What a scope finds</h3>
            <ul className="divide-rule mt-3 divide-y">
              {defects.map((d) => (
                <li key={d} className="flex items-center gap-3 py-2.5 text-[0.9375rem]">
                  <span className="bg-copper h-px w-4 shrink-0" aria-hidden="true" />
                  {d}
                </li>
              ))}
            </ul>
            <p className="text-ink-2 mt-4 text-sm">
              Also: material and diameter changes, where the camera could not pass, and whether the line drains.
            </p>
          </div>
        </div>
      </Section>

      <Section id="gives" eyebrow="The rated summary" title="A verdict to negotiate with, not a video to squint at">
        <div className="mt-10 grid items-start gap-12 lg:grid-cols-[minmax(0,5fr)_minmax(0,6fr)]">
          <div>
            <dl className="space-y-7">
              {gives.map((g) => (
                <div key={g.title}>
                  <dt className="font-serif text-xl font-semibold">{g.title}</dt>
                  <dd className="text-ink-2 mt-1.5 text-[0.9375rem] leading-relaxed">{g.text}</dd>
                </div>
              ))}
            </dl>
            <div className="mt-9">
              <p className="text-ink mb-2 text-sm font-medium">The severity scale, the same on every page</p>
              <SeverityScale />
            </div>
          </div>
          <SampleSummary />
        </div>
      </Section>

      <Section id="roles" eyebrow="Who it is for" title="Built for the three people on the job">
        <div className="mt-12 grid gap-12 md:grid-cols-3 md:gap-10">
          {roles.map((r) => (
            <section key={r.id} aria-labelledby={`role-${r.id}`} className="border-teal border-t-2 pt-5">
              <h3 id={`role-${r.id}`} className="text-2xl font-semibold">
                {r.title}
              </h3>
              <p className="text-ink mt-2 text-[0.9375rem] font-medium">{r.lead}</p>
              <ul className="mt-4 space-y-3">
                {r.points.map((pt, i) => (
                  <li key={i} className="text-ink-2 flex gap-3 text-[0.9375rem] leading-relaxed">
                    <span className="bg-copper mt-[0.7em] h-px w-3 shrink-0" aria-hidden="true" />
                    <span>{pt}</span>
                  </li>
                ))}
              </ul>
            </section>
          ))}
        </div>
      </Section>

      <Section id="steps" eyebrow="How it works" title="How an order runs, start to finish">
        <div className="mt-12">
          <Steps />
        </div>
        <p className="mt-10 text-[0.9375rem]">
          <Link href="/how-it-works" className="text-teal hover:text-teal-dark font-medium underline underline-offset-4">
            What the inspector records, and how the rating is worked out
          </Link>
        </p>
      </Section>

      <Section id="reuse" eyebrow="Report reuse" title="When the deal falls through, the report doesn’t go to waste">
        <div className="mt-10 grid gap-12 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
          <div className="prose-doc text-ink text-[1.0625rem]">
            <p>
              Deals come apart over financing, an appraisal or cold feet, and the next buyer of the same house would normally book the same
              scope again. On Gradeline the report stays with the listing. While it is fresh, a later buyer can unlock the existing rated
              summary at a lower price instead of waiting on a new visit, and the inspector who did the work earns a share of it.
            </p>
            <p className="text-ink-2">
              The inspection date is printed on every page, so the later buyer knows exactly how old the look inside is.
            </p>
          </div>
          <dl className="border-rule grid grid-cols-3 gap-4 self-start border-y py-6 lg:grid-cols-1 lg:gap-6">
            <div>
              <dt className="text-ink-2 text-sm">Later buyer pays</dt>
              <dd className="num text-ink mt-1 text-2xl sm:text-3xl">{formatMoney(P.reuseCents, { whole: true })}</dd>
            </div>
            <div>
              <dt className="text-ink-2 text-sm">Report stays fresh</dt>
              <dd className="num text-ink mt-1 text-2xl sm:text-3xl">
                {REUSE_FRESH_DAYS}
                <span className="text-ink-2 font-sans text-base"> days</span>
              </dd>
            </div>
            <div>
              <dt className="text-ink-2 text-sm">To the inspector</dt>
              <dd className="num text-ink mt-1 text-2xl sm:text-3xl">{pct(P.reuseInspectorShareBps)}</dd>
            </div>
          </dl>
        </div>
      </Section>

      <div className="border-rule border-t py-16 sm:py-24">
        <div className="mx-auto max-w-6xl px-4 sm:px-6">
          <Caution />
        </div>
      </div>

      <section aria-labelledby="cta-title" className="border-rule border-t">
        <div className="mx-auto flex max-w-6xl flex-col items-start gap-6 px-4 py-16 sm:px-6 md:flex-row md:items-end md:justify-between">
          <div>
            <h2 id="cta-title" className="text-3xl font-semibold tracking-[-0.01em]">
              Order the scope while there&rsquo;s time to use it.
            </h2>
            <p className="text-ink-2 mt-3 max-w-[56ch]">
              Agents and inspectors sign up with their work e-mail; buyers usually come in through their agent&rsquo;s invitation.
            </p>
          </div>
          <div className="flex flex-wrap gap-3">
            <ButtonLink href="/sign-up" size="lg">
              Get started
            </ButtonLink>
            <ButtonLink href="/pricing" size="lg" variant="secondary">
              See pricing
            </ButtonLink>
          </div>
        </div>
      </section>
    </>
  );
}
