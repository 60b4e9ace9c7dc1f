import { describe, expect, it } from "vitest";

import { formatTimeRange, isoToZonedLocal, offsetMinutesAt, rezoneIso, toZonedIso, zonedLocalToIso } from "@/lib/time-zones";

describe("zonedLocalToIso", () => {
  it("gives Los Angeles winter times the -08:00 offset", () => {
    expect(zonedLocalToIso("2026-12-09", "17:00", "America/Los_Angeles")).toBe("2026-12-09T17:00:00-08:00");
  });

  it("gives Los Angeles summer times the -07:00 offset", () => {
    expect(zonedLocalToIso("2026-07-01", "09:30", "America/Los_Angeles")).toBe("2026-07-01T09:30:00-07:00");
  });

  it("names the same instant the wall clock shows", () => {
    const iso = zonedLocalToIso("2026-03-20", "08:15", "America/New_York")!;
    expect(new Date(iso).toISOString()).toBe("2026-03-20T12:15:00.000Z");
  });

  it("keeps Phoenix on -07:00 all year", () => {
    expect(zonedLocalToIso("2026-01-15", "12:00", "America/Phoenix")).toBe("2026-01-15T12:00:00-07:00");
    expect(zonedLocalToIso("2026-07-15", "12:00", "America/Phoenix")).toBe("2026-07-15T12:00:00-07:00");
  });

  it("takes the first of the two 01:30s when the clocks fall back", () => {
    expect(zonedLocalToIso("2026-11-01", "01:30", "America/Los_Angeles")).toBe("2026-11-01T01:30:00-07:00");
  });

  it("moves a time inside the spring-forward gap on by the hour that never happened", () => {
    expect(zonedLocalToIso("2026-03-08", "02:30", "America/Los_Angeles")).toBe("2026-03-08T03:30:00-07:00");
  });

  it("handles a day just before and after midnight UTC", () => {
    expect(zonedLocalToIso("2026-12-31", "23:59", "Pacific/Honolulu")).toBe("2026-12-31T23:59:00-10:00");
    expect(zonedLocalToIso("2027-01-01", "00:00", "America/Los_Angeles")).toBe("2027-01-01T00:00:00-08:00");
  });

  it("refuses incomplete or impossible input and unknown zones", () => {
    expect(zonedLocalToIso("", "17:00", "America/Los_Angeles")).toBeNull();
    expect(zonedLocalToIso("2026-12-09", "", "America/Los_Angeles")).toBeNull();
    expect(zonedLocalToIso("2026-02-30", "10:00", "America/Los_Angeles")).toBeNull();
    expect(zonedLocalToIso("2026-12-09", "24:00", "America/Los_Angeles")).toBeNull();
    expect(zonedLocalToIso("2026-12-09", "10:00", "Mars/Olympus_Mons")).toBeNull();
  });

  it("answers what the order schema accepts", async () => {
    const { visitWindowSchema } = await import("@/lib/validations/orders");
    const start = zonedLocalToIso("2026-12-08", "09:00", "America/Chicago")!;
    const end = zonedLocalToIso("2026-12-08", "12:00", "America/Chicago")!;
    expect(visitWindowSchema.safeParse({ start, end }).success).toBe(true);
  });
});

describe("isoToZonedLocal and rezoneIso", () => {
  it("reads an instant back as the listing's wall clock", () => {
    expect(isoToZonedLocal("2026-12-10T01:00:00Z", "America/Los_Angeles")).toEqual({ date: "2026-12-09", time: "17:00" });
  });

  it("round-trips every quarter hour of a daylight-saving day", () => {
    for (let minutes = 0; minutes < 24 * 60; minutes += 15) {
      const time = `${String(Math.floor(minutes / 60)).padStart(2, "0")}:${String(minutes % 60).padStart(2, "0")}`;
      if (time >= "02:00" && time < "03:00") continue;
      const iso = zonedLocalToIso("2026-03-08", time, "America/Los_Angeles")!;
      expect(isoToZonedLocal(iso, "America/Los_Angeles")).toEqual({ date: "2026-03-08", time });
    }
  });

  it("keeps the wall clock when the zone changes", () => {
    expect(rezoneIso("2026-12-09T17:00:00-08:00", "America/Los_Angeles", "America/New_York")).toBe("2026-12-09T17:00:00-05:00");
  });

  it("formats any instant with the zone's offset at that instant", () => {
    expect(toZonedIso(Date.parse("2026-06-01T12:00:00Z"), "America/Denver")).toBe("2026-06-01T06:00:00-06:00");
    expect(offsetMinutesAt(Date.parse("2026-01-01T00:00:00Z"), "UTC")).toBe(0);
  });
});

describe("formatTimeRange", () => {
  it("writes a same-day window once with the zone's short name", () => {
    expect(formatTimeRange("2026-12-08T09:00:00-08:00", "2026-12-08T12:00:00-08:00", "America/Los_Angeles")).toBe("Tue, Dec 8, 9:00 AM – 12:00 PM PST");
  });

  it("repeats the date when the range crosses midnight", () => {
    expect(formatTimeRange("2026-12-08T22:00:00-08:00", "2026-12-09T01:00:00-08:00", "America/Los_Angeles")).toBe("Tue, Dec 8, 10:00 PM – Wed, Dec 9, 1:00 AM PST");
  });
});
