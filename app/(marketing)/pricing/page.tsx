import type { Metadata } from "next";

import { ButtonLink } from "@/components/ui/button";
import { formatMoney, Money } from "@/components/ui/money";
import { DEFAULT_PRICES } from "@/lib/pricing-defaults";

export const metadata: Metadata = {
  title: "Pricing",
  description: "What a sewer scope costs on Gradeline in the demo market, what the add-ons are, and what inspectors keep.",
};

const P = DEFAULT_PRICES;
const share = (cents: number, bps: number) => Math.round((cents * bps) / 10000);
const inspectorGets = (cents: number) => cents - share(cents, P.platformFeeBps);

const lines = [
  {
    name: "Sewer scope",
    detail: "One building sewer, cleanout to main: camera inspection, clips, the rated summary, repair options and the PDF.",
    cents: P.baseCents,
    add: false,
  },
  {
    name: "No known cleanout",
    detail: "The inspector enters through a pulled toilet or a roof vent instead, which takes longer and needs more care.",
    cents: P.noCleanoutCents,
    add: true,
  },
  {
    name: "Rush",
    detail: "The visit within 48 hours of the order, for a contingency that is nearly up.",
    cents: P.rushCents,
    add: true,
  },
  {
    name: "Each additional building sewer",
    detail: "A second line on the same lot: a detached unit, a duplex with two laterals.",
    cents: P.extraSewerCents,
    add: true,
  },
];

const example = P.baseCents + P.noCleanoutCents + P.rushCents;

export default function PricingPage() {
  return (
    <div className="mx-auto max-w-6xl px-4 pt-14 sm:px-6 sm:pt-20">
      <header className="max-w-3xl">
        <p className="text-copper text-xs font-semibold tracking-[0.14em] uppercase">Pricing</p>
        <h1 className="mt-3 text-4xl leading-tight font-semibold tracking-[-0.01em] sm:text-5xl">
          One price per scope, paid once by the buyer
        </h1>
        <p className="text-ink-2 mt-5 text-lg leading-relaxed">
          These are the prices in Gradeline&rsquo;s demo market, Harrow Falls. Admins set the prices for each market, so the figures where
          you work may differ. The buyer pays when they unlock the rated summary; ordering the scope costs the agent nothing.
        </p>
      </header>

      <div className="mt-14 grid items-start gap-12 lg:grid-cols-[minmax(0,7fr)_minmax(0,4fr)]">
        <section aria-labelledby="prices-title">
          <h2 id="prices-title" className="text-2xl font-semibold">
            The scope and its add-ons
          </h2>
          <table className="border-ink mt-5 w-full border-t-2 text-left">
            <caption className="sr-only">Prices in the demo market, US dollars</caption>
            <thead className="sr-only">
              <tr>
                <th scope="col">Item</th>
                <th scope="col">Price</th>
              </tr>
            </thead>
            <tbody className="divide-rule border-rule divide-y border-b">
              {lines.map((l) => (
                <tr key={l.name}>
                  <th scope="row" className="py-5 pr-6 align-top font-normal">
                    <span className="text-ink block font-serif text-lg font-semibold">{l.name}</span>
                    <span className="text-ink-2 mt-1 block max-w-[52ch] text-[0.9375rem] leading-relaxed">{l.detail}</span>
                  </th>
                  <td className="text-ink py-5 text-right align-top text-xl">
                    {l.add ? (
                      <span className="num">
                        <span aria-hidden="true">+</span>
                        <span className="sr-only">plus </span>
                        {formatMoney(l.cents, { whole: true })}
                      </span>
                    ) : (
                      <>
                        <span className="text-ink-2 block text-xs">from</span>
                        <Money cents={l.cents} whole className="text-2xl" />
                      </>
                    )}
                  </td>
                </tr>
              ))}
              <tr>
                <th scope="row" className="py-5 pr-6 align-top font-normal">
                  <span className="text-ink block font-serif text-lg font-semibold">Report reuse</span>
                  <span className="text-ink-2 mt-1 block max-w-[52ch] text-[0.9375rem] leading-relaxed">
                    When a deal falls through, a later buyer of the same listing unlocks the existing report while it is fresh, instead of
                    booking a new scope.
                  </span>
                </th>
                <td className="py-5 text-right align-top">
                  <Money cents={P.reuseCents} whole className="text-2xl" />
                </td>
              </tr>
            </tbody>
          </table>

          <div className="rounded-card border-rule mt-8 border bg-white px-5 py-4">
            <h3 className="text-ink font-sans text-sm font-semibold">Example</h3>
            <p className="text-ink-2 mt-1 text-[0.9375rem]">A scope with no known cleanout, booked as a rush:</p>
            <p className="num text-ink mt-2 text-lg">
              {formatMoney(P.baseCents, { whole: true })} + {formatMoney(P.noCleanoutCents, { whole: true })} +{" "}
              {formatMoney(P.rushCents, { whole: true })} ={" "}
              <strong className="font-semibold">{formatMoney(example, { whole: true })}</strong>
            </p>
          </div>
        </section>

        <section aria-labelledby="inspectors-title" className="rounded-card border-rule bg-paper-2/60 border px-5 py-6 sm:px-6">
          <h2 id="inspectors-title" className="text-2xl font-semibold">
            For inspectors
          </h2>
          <p className="text-ink-2 mt-3 text-[0.9375rem] leading-relaxed">
            Gradeline keeps a platform fee on each unlocked order and sends the rest to your connected payout account once the buyer has
            paid.
          </p>
          <dl className="divide-rule border-rule mt-6 divide-y border-y">
            <div className="flex items-baseline justify-between gap-4 py-3">
              <dt className="text-ink text-[0.9375rem]">Platform fee</dt>
              <dd className="num text-ink text-lg">{P.platformFeeBps / 100}%</dd>
            </div>
            <div className="flex items-baseline justify-between gap-4 py-3">
              <dt className="text-ink text-[0.9375rem]">
                You receive on a <span className="num">{formatMoney(P.baseCents, { whole: true })}</span> scope
              </dt>
              <dd className="text-ink text-lg">
                <Money cents={inspectorGets(P.baseCents)} whole />
              </dd>
            </div>
            <div className="flex items-baseline justify-between gap-4 py-3">
              <dt className="text-ink text-[0.9375rem]">
                On the <span className="num">{formatMoney(example, { whole: true })}</span> example
              </dt>
              <dd className="text-ink text-lg">
                <Money cents={inspectorGets(example)} whole />
              </dd>
            </div>
            <div className="flex items-baseline justify-between gap-4 py-3">
              <dt className="text-ink text-[0.9375rem]">Your share of each reuse ({P.reuseInspectorShareBps / 100}%)</dt>
              <dd className="text-ink text-lg">
                <Money cents={share(P.reuseCents, P.reuseInspectorShareBps)} />
              </dd>
            </div>
          </dl>
          <ButtonLink href="/sign-up" className="mt-6 w-full">
            Sign up as an inspector
          </ButtonLink>
        </section>
      </div>

      <section aria-labelledby="notes-title" className="border-rule mt-16 border-t pt-10">
        <h2 id="notes-title" className="text-xl font-semibold">
          Good to know
        </h2>
        <ul className="text-ink-2 mt-4 grid gap-x-10 gap-y-3 text-[0.9375rem] leading-relaxed md:grid-cols-2">
          <li>Prices are in US dollars and include the rated summary, the clips, the PDF and a read-only share link.</li>
          <li>The buyer pays once. Payment is confirmed by the payment provider before anything unlocks.</li>
          <li>An agent can cancel an order at no charge before the visit.</li>
          <li>Refunds after payment are handled by a Gradeline admin.</li>
          <li>Repair cost ranges in a report come from the market&rsquo;s rate table: estimates for negotiation, not quotes.</li>
          <li>All prices, places and examples on this site belong to the invented demo market.</li>
        </ul>
      </section>
    </div>
  );
}
