import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { MoneyRange } from "@/components/ui/money";
import { MATERIAL_LABELS, SURFACE_LABELS, type Evaluation, type RepairOption, type Side, type Stretch } from "@/lib/engine";

import { ftNumber, ftSpan, SIDE_SHORT, SIDE_TEXT } from "./report-text";

const inch = (v: number) => `${Math.round(v * 1000) / 1000} in`;

function LinerNote({ option }: { option: RepairOption }) {
  const l = option.liner;
  if (!option.fits || !l) return null;
  return (
    <p className="text-ink-2 border-l-2 border-teal-200 pl-3 text-sm">
      Liner wall: at least <span className="num">{inch(l.designIn)}</span> for this <span className="num">{ftNumber(l.diameterIn)}</span>
      -in pipe (ASTM F1216 Appendix X1, groundwater assumed up to the surface, <span className="num">{Math.round(l.ovalityPct)}</span> %
      ovality). An installed wall thinner than <span className="num">{inch(l.installedAtLeastIn)}</span> fails a common acceptance check.
    </p>
  );
}

function Cost({ option, side }: { option: RepairOption; side: Side }) {
  if (option.costLowCents === null || option.costHighCents === null) return null;
  if (option.costHighCents === 0) return <span className="text-ink-2 text-sm">No cost now</span>;
  return (
    <span className="block">
      <MoneyRange lowCents={option.costLowCents} highCents={option.costHighCents} className="text-ink font-medium" />
      <span className="text-ink-2 block text-xs">estimate, {SIDE_SHORT[side]}</span>
    </span>
  );
}

function StretchBlock({ s }: { s: Stretch }) {
  const fitting = s.options.filter((o) => o.fits);
  const ruledOut = s.options.filter((o) => !o.fits);
  const pipe = s.materials.map((m) => MATERIAL_LABELS[m]).join(" and ");
  const sizes = s.diametersIn.map((d) => `${ftNumber(d)}-in`).join(" and ");
  return (
    <section className="rounded-card border-rule border bg-white" aria-labelledby={`stretch-${s.from}`}>
      <header className="border-rule space-y-1 border-b px-4 py-3 sm:px-5">
        <h3 id={`stretch-${s.from}`} className="font-sans text-base font-semibold">
          <span className="num">{ftSpan(s.from, s.to)}</span> · {SIDE_TEXT[s.side]}
        </h3>
        <p className="text-ink-2 text-sm">
          Needs work for {s.why}. The pipe here is {sizes} {pipe}, about <span className="num">{ftNumber(s.depthFt)}</span> ft deep
          {s.depthAssumed ? " (assumed: no locate mark here)" : ""} under {SURFACE_LABELS[s.surface]}
          {s.surfaceAssumed ? " (assumed)" : ""}.
        </p>
      </header>
      <div className="space-y-4 px-4 py-4 sm:px-5">
        {s.note ? (
          <Alert tone="info" title="The city's part">
            {s.note}
          </Alert>
        ) : null}
        <div>
          <h4 className="text-ink-2 text-xs font-semibold tracking-[0.08em] uppercase">What fits</h4>
          <ul className="divide-rule divide-y">
            {fitting.map((o) => (
              <li key={o.method} className="grid gap-x-6 gap-y-1.5 py-3 sm:grid-cols-[1fr_auto]">
                <p className="flex flex-wrap items-center gap-2 font-medium">
                  {o.label}
                  {o.favoured ? <Badge tone="teal">Favoured here</Badge> : null}
                  {o.method === s.suggested ? <Badge tone="copper">Used in the estimate</Badge> : null}
                </p>
                <p className="sm:row-span-2 sm:text-right">
                  <Cost option={o} side={s.side} />
                </p>
                <p className="text-ink-2 text-sm">{o.reason}</p>
                <div className="sm:col-span-2">
                  <LinerNote option={o} />
                </div>
              </li>
            ))}
          </ul>
        </div>
        {ruledOut.length > 0 ? (
          <div>
            <h4 className="text-ink-2 text-xs font-semibold tracking-[0.08em] uppercase">Ruled out</h4>
            <ul className="divide-rule divide-y">
              {ruledOut.map((o) => (
                <li key={o.method} className="py-2.5 text-sm">
                  <span className="text-ink font-medium">{o.label}:</span> <span className="text-ink-2">{o.reason}</span>
                </li>
              ))}
            </ul>
          </div>
        ) : null}
      </div>
    </section>
  );
}

export function RepairOptions({ evaluation: e }: { evaluation: Evaluation }) {
  if (e.stretches.length === 0) {
    return <p className="text-ink-2">No stretch of this line needs repair work now, so there are no repair options or costs to weigh.</p>;
  }
  const sides = (["private", "public"] as const).filter((side) => e.stretches.some((s) => s.side === side));
  return (
    <div className="space-y-4">
      <p className="text-ink-2 max-w-[68ch] text-[0.9375rem]">
        For each stretch that needs work: the methods that fit and why, and the ones ruled out and why. Every figure is an estimate for
        negotiation, not a quote, from the rate table &ldquo;{e.rates.name}&rdquo; ({e.rates.effectiveDate}); a licensed contractor&rsquo;s
        written bid decides the real price.
      </p>
      {e.stretches.map((s) => (
        <StretchBlock key={`${s.from}-${s.to}`} s={s} />
      ))}
      <section aria-labelledby="repair-totals" className="rounded-card border-copper/40 bg-copper-light/40 border px-4 py-4 sm:px-5">
        <h3 id="repair-totals" className="font-sans text-base font-semibold">
          Estimated cost of the repairs used in the estimate
        </h3>
        <dl className="mt-2 space-y-2">
          {sides.map((side) => (
            <div key={side} className="flex flex-wrap items-baseline justify-between gap-x-6 gap-y-1">
              <dt className="text-ink">
                {SIDE_TEXT[side]}
                {side === "public" ? <span className="text-ink-2 text-sm"> · the city&rsquo;s or utility&rsquo;s to decide</span> : null}
              </dt>
              <dd>
                <MoneyRange lowCents={e.costBySide[side].lowCents} highCents={e.costBySide[side].highCents} className="font-semibold" />
              </dd>
            </div>
          ))}
        </dl>
        <p className="text-ink-2 mt-2 text-sm">Estimates for negotiation, not quotes.</p>
      </section>
    </div>
  );
}
