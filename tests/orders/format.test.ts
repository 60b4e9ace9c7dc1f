import { describe, expect, it } from "vitest";

import { formatDate, formatDateTime } from "@/lib/format";

describe("date formatting (formatters kept per time zone)", () => {
  const instant = "2026-12-09T06:30:00Z";

  it("formats each time zone in its own wall clock, whatever zone came first", () => {
    expect(formatDateTime(instant, "America/Los_Angeles")).toBe("Tue, Dec 8, 10:30 PM PST");
    expect(formatDateTime(instant, "America/New_York")).toBe("Wed, Dec 9, 1:30 AM EST");
    expect(formatDateTime(instant, "America/Los_Angeles")).toBe("Tue, Dec 8, 10:30 PM PST");
    expect(formatDate(instant, "America/Los_Angeles")).toBe("Dec 8, 2026");
    expect(formatDate(instant)).toBe("Dec 9, 2026");
  });

  it("keeps the date and the date-and-time kinds apart for one zone", () => {
    expect(formatDate(instant, "Pacific/Honolulu")).toBe("Dec 8, 2026");
    expect(formatDateTime(instant, "Pacific/Honolulu")).toBe("Tue, Dec 8, 8:30 PM HST");
  });

  it("still refuses an unknown time zone", () => {
    expect(() => formatDate(instant, "Mars/Olympus_Mons")).toThrow(RangeError);
    expect(() => formatDate(instant, "Mars/Olympus_Mons")).toThrow(RangeError);
  });
});
