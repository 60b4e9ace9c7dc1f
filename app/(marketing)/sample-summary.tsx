import { MoneyRange } from "@/components/ui/money";
import { SeverityBadge } from "@/components/ui/severity-badge";

// An excerpt of a rated summary for the landing page. Address, findings and figures are invented.
const findings = [
  { at: "12.0", what: "Material change, cast iron to clay", severity: 1 },
  { at: "34.5", what: "Roots at joint, 30% of the cross-section, 4 to 8 o'clock", severity: 4 },
  { at: "44–50", what: "Sag holding water, 35% of the diameter", severity: 3 },
  { at: "61.0", what: "Offset joint, 1/2 in, drains", severity: 2 },
];

const options = [
  {
    name: "Spot repair at 34.5 ft",
    fit: "Fits",
    why: "A single damaged joint under lawn, 4.3 ft deep.",
    low: 240000,
    high: 380000,
  },
  {
    name: "Lining, 12–56 ft",
    fit: "Ruled out for 44–50 ft",
    why: "Standing water over a quarter of the diameter: a liner would keep the belly.",
    low: null,
    high: null,
  },
  {
    name: "Replace the private run, 12–56 ft",
    fit: "Fits",
    why: "Clears the roots and the sag in one job; open trench under lawn.",
    low: 980000,
    high: 1450000,
  },
];

export function SampleSummary() {
  return (
    <article
      aria-labelledby="sample-title"
      className="rounded-card border-rule border bg-white shadow-[0_1px_0_rgb(27_36_34/0.04),0_18px_40px_-28px_rgb(27_36_34/0.35)]"
    >
      <header className="border-rule flex flex-wrap items-start justify-between gap-4 border-b px-5 py-4 sm:px-7 sm:py-5">
        <div>
          <p className="text-copper text-xs font-semibold tracking-[0.12em] uppercase">Rated summary · sample</p>
          <h3 id="sample-title" className="mt-1 text-xl font-semibold">
            14 Larch Street, Harrow Falls
          </h3>
          <p className="text-ink-2 mt-1 text-sm">
            <span className="num">80</span> ft surveyed, cleanout to main · <span className="num">4</span>-in cast iron, then clay
          </p>
        </div>
        <div className="sm:text-right">
          <p className="text-ink-2 mb-1 text-xs">Severity rating</p>
          <SeverityBadge severity={4} size="lg" />
        </div>
      </header>

      <div className="px-5 py-5 sm:px-7">
        <h4 className="text-ink-2 font-sans text-xs font-semibold tracking-[0.08em] uppercase">Findings</h4>
        <table className="mt-2 w-full text-sm">
          <caption className="sr-only">Findings by footage</caption>
          <thead className="sr-only">
            <tr>
              <th scope="col">Footage (ft)</th>
              <th scope="col">Finding</th>
              <th scope="col" className="hidden sm:table-cell">
                Severity
              </th>
            </tr>
          </thead>
          <tbody className="divide-rule divide-y">
            {findings.map((f) => (
              <tr key={f.at}>
                <td className="num text-ink w-16 py-2 pr-3 align-top sm:w-20">{f.at}</td>
                <td className="py-2 pr-3 align-top">
                  {f.what}
                  <span className="mt-1 block sm:hidden">
                    <SeverityBadge severity={f.severity} size="sm" />
                  </span>
                </td>
                <td className="hidden py-2 text-right align-top sm:table-cell">
                  <SeverityBadge severity={f.severity} size="sm" />
                </td>
              </tr>
            ))}
          </tbody>
        </table>

        <h4 className="text-ink-2 mt-6 font-sans text-xs font-semibold tracking-[0.08em] uppercase">Repair options</h4>
        <ul className="divide-rule mt-2 divide-y text-sm">
          {options.map((o) => (
            <li key={o.name} className="grid gap-x-4 gap-y-0.5 py-2.5 sm:grid-cols-[1fr_auto]">
              <p className="text-ink font-medium">
                {o.name} <span className="text-ink-2 font-normal">· {o.fit}</span>
              </p>
              <p className="text-ink sm:row-span-2 sm:text-right">
                {o.low !== null && o.high !== null ? (
                  <MoneyRange lowCents={o.low} highCents={o.high} />
                ) : (
                  <span className="text-ink-2">n/a</span>
                )}
              </p>
              <p className="text-ink-2">{o.why}</p>
            </li>
          ))}
        </ul>
        <p className="border-rule text-ink-2 mt-4 border-t pt-3 text-xs leading-relaxed">
          56–80 ft lies past the property line: the city&rsquo;s portion, suggested for a report to Harrow Falls public works. Cost ranges
          are estimates for negotiation, not quotes.
        </p>
      </div>
    </article>
  );
}
