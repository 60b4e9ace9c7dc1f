import clsx from "clsx";

export type OrderStatus = "open" | "accepted" | "scheduled" | "delivered" | "unlocked" | "cancelled" | "refunded";

export const ORDER_STATUS_LABELS: Record<OrderStatus, string> = {
  open: "Open",
  accepted: "Accepted",
  scheduled: "Scheduled",
  delivered: "Delivered",
  unlocked: "Unlocked",
  cancelled: "Cancelled",
  refunded: "Refunded",
};

// The marker shape changes along the flow as well as the colour, so state never rests on colour alone.
const styles: Record<OrderStatus, { badge: string; dot: string }> = {
  open: { badge: "border-rule-strong bg-white text-ink", dot: "size-2 rounded-full border border-ink-2" },
  accepted: { badge: "border-teal-200 bg-teal-50 text-teal-800", dot: "size-2 rounded-full border border-teal-700 bg-teal-200" },
  scheduled: { badge: "border-teal-300 bg-teal-100 text-teal-900", dot: "size-2 rounded-full bg-teal-700" },
  delivered: { badge: "border-[#ebd0bc] bg-copper-light text-copper-dark", dot: "size-2 rotate-45 bg-copper" },
  unlocked: { badge: "border-teal bg-teal text-white", dot: "size-2 rounded-full bg-white" },
  cancelled: { badge: "border-rule bg-paper-2 text-ink-2", dot: "h-0.5 w-2 bg-ink-2" },
  refunded: { badge: "border-rule bg-paper-2 text-ink-2", dot: "size-2 rotate-45 border border-copper-dark" },
};

export function StatusBadge({ status, className }: { status: OrderStatus; className?: string }) {
  const style = styles[status];
  return (
    <span
      className={clsx(
        "inline-flex items-center gap-1.5 rounded-full border px-2.5 py-0.5 text-xs leading-5 font-medium whitespace-nowrap",
        style.badge,
        className,
      )}
    >
      <span className={clsx("inline-block shrink-0", style.dot)} aria-hidden="true" />
      {ORDER_STATUS_LABELS[status] ?? status}
    </span>
  );
}
