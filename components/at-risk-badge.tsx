import clsx from "clsx";

import { Badge } from "@/components/ui/badge";
import type { OrderDto } from "@/lib/orders/dto";

/** "At risk" with the reason in plain words; nothing when the order is on track. */
export function AtRiskBadge({ atRisk, showReasons = true, className }: { atRisk: OrderDto["atRisk"]; showReasons?: boolean; className?: string }) {
  if (!atRisk.flagged) return null;
  return (
    <span className={clsx("inline-flex flex-col items-start gap-1", className)}>
      <Badge tone="danger">
        <svg viewBox="0 0 12 12" className="size-3" aria-hidden="true">
          <path d="M6 1 11 10.5H1L6 1Z" fill="none" stroke="currentColor" strokeWidth="1.3" strokeLinejoin="round" />
          <path d="M6 4.6v2.6M6 8.6v.2" stroke="currentColor" strokeWidth="1.3" strokeLinecap="round" />
        </svg>
        At risk
      </Badge>
      {showReasons ? (
        <span className="text-xs text-danger">{atRisk.text.join(" ")}</span>
      ) : (
        <span className="sr-only">: {atRisk.text.join(" ")}</span>
      )}
    </span>
  );
}
