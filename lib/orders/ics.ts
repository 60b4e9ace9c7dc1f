import { createEvent } from "ics";

/** A calendar file for a confirmed visit, attached to the confirmation e-mail. */
export function visitCalendarFile(visit: { orderId: string; start: Date; end: Date; address: string; inspectorName: string; url: string }): string {
  const { error, value } = createEvent({
    uid: `visit-${visit.orderId}@gradeline`,
    title: `Sewer scope at ${visit.address}`,
    description: `Camera inspection of the building sewer by ${visit.inspectorName}. Order: ${visit.url}`,
    location: visit.address,
    start: visit.start.getTime(),
    end: visit.end.getTime(),
    startInputType: "utc",
    startOutputType: "utc",
    endInputType: "utc",
    endOutputType: "utc",
    status: "CONFIRMED",
    productId: "gradeline/visits",
    url: visit.url,
  });
  if (error || !value) throw error ?? new Error("Could not build the calendar file.");
  return value;
}
