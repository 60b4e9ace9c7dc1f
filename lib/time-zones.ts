// Wall-clock times in a listing's time zone <-> ISO 8601 instants with their offset, using Intl only.

export const DEFAULT_TIME_ZONE = "America/Los_Angeles";

export const US_TIME_ZONES = [
  { id: "America/Los_Angeles", label: "Pacific (Los Angeles)" },
  { id: "America/Denver", label: "Mountain (Denver)" },
  { id: "America/Phoenix", label: "Mountain, no daylight saving (Phoenix)" },
  { id: "America/Chicago", label: "Central (Chicago)" },
  { id: "America/New_York", label: "Eastern (New York)" },
  { id: "America/Anchorage", label: "Alaska (Anchorage)" },
  { id: "Pacific/Honolulu", label: "Hawaii (Honolulu)" },
] as const;

export type LocalDateTime = { date: string; time: string };

const formatters = new Map<string, Intl.DateTimeFormat>();

function formatter(timeZone: string): Intl.DateTimeFormat {
  let f = formatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat("en-US", {
      timeZone,
      hourCycle: "h23",
      year: "numeric",
      month: "2-digit",
      day: "2-digit",
      hour: "2-digit",
      minute: "2-digit",
      second: "2-digit",
    });
    formatters.set(timeZone, f);
  }
  return f;
}

function wallClock(ms: number, timeZone: string) {
  const parts: Record<string, number> = {};
  for (const p of formatter(timeZone).formatToParts(new Date(ms))) if (p.type !== "literal") parts[p.type] = Number(p.value);
  return { year: parts.year, month: parts.month, day: parts.day, hour: parts.hour, minute: parts.minute, second: parts.second };
}

/** The zone's offset from UTC at an instant, in minutes (Los Angeles in winter: -480). */
export function offsetMinutesAt(ms: number, timeZone: string): number {
  const w = wallClock(ms, timeZone);
  const asUtc = Date.UTC(w.year, w.month - 1, w.day, w.hour, w.minute, w.second);
  return Math.round((asUtc - Math.floor(ms / 1000) * 1000) / 60_000);
}

export function isValidTimeZone(timeZone: string): boolean {
  try {
    formatter(timeZone);
    return true;
  } catch {
    return false;
  }
}

const pad = (n: number, width = 2) => String(Math.abs(n)).padStart(width, "0");

function formatOffset(minutes: number): string {
  const sign = minutes < 0 ? "-" : "+";
  return `${sign}${pad(Math.floor(Math.abs(minutes) / 60))}:${pad(Math.abs(minutes) % 60)}`;
}

function parseLocal(date: string, time: string) {
  const d = /^(\d{4})-(\d{2})-(\d{2})$/.exec(date);
  const t = /^(\d{2}):(\d{2})$/.exec(time);
  if (!d || !t) return null;
  const [year, month, day, hour, minute] = [d[1], d[2], d[3], t[1], t[2]].map(Number);
  if (month < 1 || month > 12 || day < 1 || day > 31 || hour > 23 || minute > 59) return null;
  const probe = new Date(Date.UTC(year, month - 1, day));
  if (probe.getUTCDate() !== day) return null;
  return { year, month, day, hour, minute };
}

/** An instant as ISO 8601 with the zone's offset at that instant: "2026-12-09T17:00:00-08:00". */
export function toZonedIso(ms: number, timeZone: string): string {
  const w = wallClock(ms, timeZone);
  return `${w.year}-${pad(w.month)}-${pad(w.day)}T${pad(w.hour)}:${pad(w.minute)}:${pad(w.second)}${formatOffset(offsetMinutesAt(ms, timeZone))}`;
}

/**
 * A local date ("2026-12-09") and time ("17:00") in a time zone, as ISO 8601 with the right offset.
 * A time that happens twice (the hour clocks fall back) means the first one; a time that never
 * happens (the hour clocks spring forward) moves forward by the gap, as a wall clock would.
 * Returns null for an incomplete or impossible date or time.
 */
export function zonedLocalToIso(date: string, time: string, timeZone: string): string | null {
  const local = parseLocal(date, time);
  if (!local || !isValidTimeZone(timeZone)) return null;
  const asUtc = Date.UTC(local.year, local.month - 1, local.day, local.hour, local.minute);
  const before = offsetMinutesAt(asUtc - 86_400_000, timeZone);
  const after = offsetMinutesAt(asUtc + 86_400_000, timeZone);
  const candidates = [...new Set([before, after])]
    .map((offset) => asUtc - offset * 60_000)
    .filter((ms) => {
      const w = wallClock(ms, timeZone);
      return w.year === local.year && w.month === local.month && w.day === local.day && w.hour === local.hour && w.minute === local.minute;
    })
    .sort((a, b) => a - b);
  const ms = candidates[0] ?? asUtc - before * 60_000;
  return toZonedIso(ms, timeZone);
}

/** An ISO instant as the local date and time in a zone, for date and time inputs. */
export function isoToZonedLocal(iso: string, timeZone: string): LocalDateTime | null {
  const ms = Date.parse(iso);
  if (Number.isNaN(ms) || !isValidTimeZone(timeZone)) return null;
  const w = wallClock(ms, timeZone);
  return { date: `${w.year}-${pad(w.month)}-${pad(w.day)}`, time: `${pad(w.hour)}:${pad(w.minute)}` };
}

/** Keeps the wall-clock time and moves it to another zone (the agent changed the listing's zone). */
export function rezoneIso(iso: string, fromZone: string, toZone: string): string | null {
  const local = isoToZonedLocal(iso, fromZone);
  return local ? zonedLocalToIso(local.date, local.time, toZone) : null;
}

// Display formatters, made once per zone and kind: building one costs far more than using it.
const display = new Map<string, Intl.DateTimeFormat>();
function displayFormatter(kind: "zone" | "day" | "time", timeZone: string): Intl.DateTimeFormat {
  const key = `${kind} ${timeZone}`;
  let f = display.get(key);
  if (!f) {
    const options: Intl.DateTimeFormatOptions =
      kind === "zone" ? { timeZoneName: "short" } : kind === "day" ? { weekday: "short", month: "short", day: "numeric" } : { hour: "numeric", minute: "2-digit" };
    f = new Intl.DateTimeFormat("en-US", { timeZone, ...options });
    display.set(key, f);
  }
  return f;
}

/** The short zone name at an instant: "PST", "PDT", "MST". */
export function zoneAbbreviation(ms: number, timeZone: string): string {
  const part = displayFormatter("zone", timeZone).formatToParts(new Date(ms)).find((p) => p.type === "timeZoneName");
  return part?.value ?? timeZone;
}

/** "Tue, Dec 8, 9:00 AM – 12:00 PM PST"; the date is repeated only when the range crosses midnight. */
export function formatTimeRange(startIso: string, endIso: string, timeZone: string): string {
  const day = displayFormatter("day", timeZone);
  const time = displayFormatter("time", timeZone);
  const start = new Date(startIso);
  const end = new Date(endIso);
  const zone = zoneAbbreviation(end.getTime(), timeZone);
  const sameDay = day.format(start) === day.format(end);
  return sameDay
    ? `${day.format(start)}, ${time.format(start)} – ${time.format(end)} ${zone}`
    : `${day.format(start)}, ${time.format(start)} – ${day.format(end)}, ${time.format(end)} ${zone}`;
}
