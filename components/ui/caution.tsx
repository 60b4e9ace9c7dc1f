import clsx from "clsx";
import { useId } from "react";

// The standing cautions shown beside every rated summary, on the landing page and in the PDF.
export const CAUTIONS = [
  {
    title: "What the camera saw, that day",
    text: "A camera inspection shows only what the camera saw inside the line on the day of the inspection. It is not a warranty or a guarantee of the line's condition, then or later.",
  },
  {
    title: "Footages and depths are approximate",
    text: "Footages come from the camera's cable counter and depths from a surface locator reading the sonde. Both are approximate; confirm them on site before anyone digs or cuts.",
  },
  {
    title: "Call 811 before digging",
    text: "Before any digging, call 811 (the US utility locate service) at least 2–3 working days ahead so buried gas, power, water and communication lines are marked. The exact lead time is set by each state.",
  },
  {
    title: "Trenches 5 feet or deeper",
    text: "A trench 5 feet deep or more needs a protective system (sloping, benching, shoring or a trench shield) under OSHA\u00a029\u00a0CFR\u00a01926.652; a shallower one can need it too. Never enter an unprotected trench.",
  },
  {
    title: "Confined spaces and sewage",
    text: "Sewer work can mean confined spaces such as pits, manholes and deep trenches with bad air, and contact with raw sewage. It is work for trained crews with the right equipment.",
  },
  {
    title: "Codes and contractors decide repairs",
    text: "Local codes, the city and a licensed contractor decide which repair is allowed and needed. Cost ranges here are estimates for negotiation, not quotes; get written bids before you rely on a figure.",
  },
] as const;

/** The cautions block. compact: one short paragraph per item without titles (for tight spaces). */
export function Caution({
  title = "Before you act on a sewer scope",
  as: H = "h2",
  compact = false,
  className,
}: {
  title?: string;
  as?: "h2" | "h3";
  compact?: boolean;
  className?: string;
}) {
  const headingId = useId();
  return (
    <section
      aria-labelledby={headingId}
      className={clsx("rounded-card border-rule border-l-copper bg-paper-2/60 border border-l-4 px-5 py-5 sm:px-6", className)}
    >
      <H id={headingId} className={clsx("flex items-center gap-2 font-semibold", compact ? "text-base" : "text-xl")}>
        <svg viewBox="0 0 20 20" className="text-copper size-5 shrink-0" aria-hidden="true">
          <path d="M10 2.5 18 17H2L10 2.5Z" fill="none" stroke="currentColor" strokeWidth="1.5" strokeLinejoin="round" />
          <path d="M10 8v4.2M10 14.4v.2" stroke="currentColor" strokeWidth="1.7" strokeLinecap="round" />
        </svg>
        {title}
      </H>
      {compact ? (
        <ul className="text-ink-2 marker:text-copper mt-3 list-disc space-y-1.5 pl-5 text-sm">
          {CAUTIONS.map((c) => (
            <li key={c.title}>{c.text}</li>
          ))}
        </ul>
      ) : (
        <dl className="mt-5 grid gap-x-8 gap-y-5 sm:grid-cols-2">
          {CAUTIONS.map((c) => (
            <div key={c.title} className="border-rule border-t pt-3">
              <dt className="text-ink text-[0.9375rem] font-semibold">{c.title}</dt>
              <dd className="text-ink-2 mt-1 text-sm leading-relaxed">{c.text}</dd>
            </div>
          ))}
        </dl>
      )}
    </section>
  );
}
