"use client";

import { useState } from "react";

import { Badge } from "@/components/ui/badge";
import { DataList } from "@/components/ui/data-list";
import { Money } from "@/components/ui/money";
import { formatDate, formatDateTime } from "@/lib/format";
import { DEFAULT_TIME_ZONE } from "@/lib/time-zones";

import { PriceForm, type PricesData } from "./price-form";
import { RateForm, type RatesData } from "./rate-form";

const percent = (bps: number) => `${(bps / 100).toFixed(2).replace(/\.?0+$/, "")}\u00a0%`;
const when = (iso: string) => formatDateTime(iso, DEFAULT_TIME_ZONE);

export function PricesView({ prices: initialPrices, rates: initialRates }: { prices: PricesData; rates: RatesData }) {
  const [prices, setPrices] = useState(initialPrices);
  const [rates, setRates] = useState(initialRates);
  return (
    <div className="space-y-10">
      <section aria-labelledby="price-form-title" className="space-y-6">
        <PriceForm current={prices.current} onSaved={setPrices} />
        <DataList
          caption="Price history, newest first"
          captionVisible
          rows={prices.history}
          rowKey={(p) => p.id}
          empty={<p className="text-ink-2 text-sm">No prices saved yet: the demo defaults apply.</p>}
          columns={[
            {
              key: "when",
              header: "Saved",
              primary: true,
              cell: (p) => (
                <span className="flex flex-wrap items-center gap-2">
                  <span className="num text-sm">{when(p.effectiveAt)}</span>
                  {p.id === prices.current.id ? <Badge tone="teal">In force</Badge> : null}
                </span>
              ),
            },
            { key: "by", header: "By", cell: (p) => p.by ?? "System" },
            { key: "base", header: "Base", align: "right", cell: (p) => <Money cents={p.baseCents} /> },
            {
              key: "addons",
              header: "No cleanout · rush · extra sewer",
              align: "right",
              cell: (p) => (
                <span className="num whitespace-nowrap">
                  <Money cents={p.noCleanoutCents} /> · <Money cents={p.rushCents} /> · <Money cents={p.extraSewerCents} />
                </span>
              ),
            },
            {
              key: "fee",
              header: "Fee",
              align: "right",
              cell: (p) => <span className="num whitespace-nowrap">{percent(p.platformFeeBps)}</span>,
            },
            {
              key: "reuse",
              header: "Reuse · share · fresh for",
              align: "right",
              cell: (p) => (
                <span className="num whitespace-nowrap">
                  <Money cents={p.reuseCents} /> · {percent(p.reuseInspectorShareBps)} · {p.reuseFreshDays}&nbsp;days
                </span>
              ),
            },
            { key: "note", header: "Note", cell: (p) => <span className="text-sm">{p.sourceNote ?? "—"}</span> },
          ]}
        />
      </section>

      <section aria-labelledby="rate-form-title" className="space-y-6">
        <RateForm current={rates.current.table} onSaved={setRates} />
        <DataList
          caption="Rate table history, newest first"
          captionVisible
          rows={rates.history}
          rowKey={(r) => r.id}
          empty={
            <p className="text-ink-2 text-sm">No rate table saved yet: the engine uses its demo table ({rates.current.table.name}).</p>
          }
          columns={[
            {
              key: "when",
              header: "Saved",
              primary: true,
              cell: (r) => (
                <span className="flex flex-wrap items-center gap-2">
                  <span className="num text-sm">{when(r.effectiveAt)}</span>
                  {r.id === rates.current.id ? <Badge tone="teal">In force</Badge> : null}
                </span>
              ),
            },
            { key: "by", header: "By", cell: (r) => r.by ?? "System" },
            {
              key: "name",
              header: "Table",
              cell: (r) => (
                <span>
                  {r.name}
                  {r.demo ? <span className="text-ink-2"> (demo)</span> : null}
                </span>
              ),
            },
            {
              key: "date",
              header: "Rates set on",
              cell: (r) => <span className="num text-sm">{r.effectiveDate ? formatDate(`${r.effectiveDate}T12:00:00Z`) : "—"}</span>,
            },
            { key: "note", header: "Note", cell: (r) => <span className="text-sm">{r.sourceNote ?? "—"}</span> },
          ]}
        />
      </section>
    </div>
  );
}
