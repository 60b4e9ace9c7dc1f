import type { ReactNode } from "react";

/** One label and value of a description list: stacked on a phone, label column beside the value from sm up. */
export function DetailRow({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="grid gap-0.5 py-2.5 sm:grid-cols-[10rem_1fr] sm:gap-4">
      <dt className="text-ink-2 text-sm">{label}</dt>
      <dd className="text-ink text-[0.9375rem]">{children}</dd>
    </div>
  );
}
