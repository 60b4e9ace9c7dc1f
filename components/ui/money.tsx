import clsx from "clsx";

const withCents = new Intl.NumberFormat("en-US", { style: "currency", currency: "USD" });
const wholeDollars = new Intl.NumberFormat("en-US", { style: "currency", currency: "USD", maximumFractionDigits: 0 });

/** Integer cents to "$1,234.50". whole: drop the cents when they are zero ("$325"). */
export function formatMoney(cents: number, { whole = false }: { whole?: boolean } = {}) {
  const dollars = cents / 100;
  return whole && Number.isInteger(dollars) ? wholeDollars.format(dollars) : withCents.format(dollars);
}

export function Money({ cents, whole, className }: { cents: number; whole?: boolean; className?: string }) {
  return <span className={clsx("num whitespace-nowrap", className)}>{formatMoney(cents, { whole })}</span>;
}

/** A cost range: "$2,400 – $4,100" (read as "2,400 to 4,100 dollars"). */
export function MoneyRange({ lowCents, highCents, className }: { lowCents: number; highCents: number; className?: string }) {
  return (
    <span className={clsx("num whitespace-nowrap", className)}>
      {formatMoney(lowCents, { whole: true })}
      <span aria-hidden="true"> – </span>
      <span className="sr-only"> to </span>
      {formatMoney(highCents, { whole: true })}
    </span>
  );
}
