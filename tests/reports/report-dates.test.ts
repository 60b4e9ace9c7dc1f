import { describe, expect, it } from "vitest";

import { dateText, observedLine } from "@/components/report/report-text";
import { localIsoDate } from "@/lib/format";

describe("the dates a report shows are the listing's days, not the server's", () => {
  it("a visit at 8:30 pm on Mar 10 in Harrow Falls (Pacific time) is the 10th, though it is already the 11th in UTC", () => {
    const visit = "2026-03-11T04:30:00.000Z";
    expect(localIsoDate(visit, "America/Los_Angeles")).toBe("2026-03-10");
    expect(localIsoDate(visit, "UTC")).toBe("2026-03-11");
    expect(observedLine({ observedOn: localIsoDate(visit, "America/Los_Angeles"), visitedOn: null })).toBe("As observed on Mar 10, 2026");
  });

  it("an ISO date reads as that day in any zone; a timestamp reads in the zone it is given", () => {
    expect(dateText("2026-12-01", "Pacific/Kiritimati")).toBe("Dec 1, 2026");
    expect(dateText("2026-12-01T07:00:00.000Z", "America/New_York")).toBe("Dec 1, 2026");
    expect(dateText("2026-12-01T03:00:00.000Z", "America/New_York")).toBe("Nov 30, 2026");
    expect(dateText("not a date")).toBeNull();
    expect(dateText(null)).toBeNull();
  });
});
