import { StatusBadge } from "@/components/ui/status-badge";
import { ROLE_LABEL } from "@/lib/auth/permissions";
import { formatDateTime } from "@/lib/format";
import type { OrderEventDto } from "@/lib/orders/dto";

function describe(e: OrderEventDto): string {
  if (e.from === null) return "Order placed";
  if (e.from === "accepted" && e.to === "open") return "Job released back to the board";
  if (e.from === "scheduled" && e.to === "open") return "Job released back to the board";
  switch (e.to) {
    case "accepted":
      return "Job taken by an inspector";
    case "scheduled":
      return "Appointment confirmed";
    case "delivered":
      return "Findings delivered";
    case "unlocked":
      return "Report unlocked by the buyer";
    case "cancelled":
      return "Order cancelled";
    case "refunded":
      return "Payment refunded";
    default:
      return "State changed";
  }
}

/** Every state change of an order, oldest first: what, who, when and why. */
export function OrderTimeline({ events, timeZone }: { events: OrderEventDto[]; timeZone: string }) {
  if (events.length === 0) return <p className="text-sm text-ink-2">Nothing has happened to this order yet.</p>;
  return (
    <ol className="relative space-y-5 border-l border-rule pl-5">
      {events.map((e) => (
        <li key={e.id} className="relative">
          <span className="absolute top-1.5 -left-[1.6rem] size-2.5 rounded-full border-2 border-paper bg-teal" aria-hidden="true" />
          <div className="flex flex-wrap items-center gap-x-2 gap-y-1">
            <span className="font-medium text-ink">{describe(e)}</span>
            <StatusBadge status={e.to} />
          </div>
          <p className="mt-0.5 text-sm text-ink-2">
            <time dateTime={e.at} className="num">
              {formatDateTime(e.at, timeZone)}
            </time>
            {" · "}
            {e.by ? `${e.by.name} (${ROLE_LABEL[e.by.role as keyof typeof ROLE_LABEL] ?? e.by.role})` : "Gradeline"}
          </p>
          {e.reason ? <p className="mt-1 text-sm text-ink">“{e.reason}”</p> : null}
        </li>
      ))}
    </ol>
  );
}
