export function formatAddress(a: { street: string; unit?: string | null; city: string; state: string; postalCode: string }): string {
  return `${a.street}${a.unit ? `, ${a.unit}` : ""}, ${a.city}, ${a.state} ${a.postalCode}`;
}

// Building an Intl.DateTimeFormat costs far more than formatting with one (it was most of the
// orders page's render time), so each kind is made once per time zone and kept.
const KINDS = {
  dateTime: { locale: "en-US", options: { weekday: "short", month: "short", day: "numeric", hour: "numeric", minute: "2-digit", timeZoneName: "short" } },
  date: { locale: "en-US", options: { month: "short", day: "numeric", year: "numeric" } },
  isoDate: { locale: "en-CA", options: { year: "numeric", month: "2-digit", day: "2-digit" } },
} as const satisfies Record<string, { locale: string; options: Intl.DateTimeFormatOptions }>;
const formatters = new Map<string, Intl.DateTimeFormat>();

function formatter(kind: keyof typeof KINDS, timeZone: string): Intl.DateTimeFormat {
  const key = `${kind} ${timeZone}`;
  let f = formatters.get(key);
  if (!f) {
    f = new Intl.DateTimeFormat(KINDS[kind].locale, { timeZone, ...KINDS[kind].options });
    formatters.set(key, f);
  }
  return f;
}

export function formatDateTime(date: Date | string, timeZone: string): string {
  return formatter("dateTime", timeZone).format(new Date(date));
}

export function formatDate(date: Date | string, timeZone = "UTC"): string {
  return formatter("date", timeZone).format(new Date(date));
}

/** The calendar day a moment falls on in a time zone, as an ISO date: "2026-11-30". */
export function localIsoDate(date: Date | string, timeZone: string): string {
  return formatter("isoDate", timeZone).format(new Date(date));
}

/** "in 3 d 4 h", "in 5 h", "2 h ago": for deadlines. */
export function formatCountdown(target: Date | string, now = new Date()): string {
  const ms = new Date(target).getTime() - now.getTime();
  const abs = Math.abs(ms);
  const days = Math.floor(abs / 86_400_000);
  const hours = Math.floor((abs % 86_400_000) / 3_600_000);
  const minutes = Math.floor((abs % 3_600_000) / 60_000);
  const text = days > 0 ? `${days} d ${hours} h` : hours > 0 ? `${hours} h ${minutes} min` : `${minutes} min`;
  return ms >= 0 ? `in ${text}` : `${text} ago`;
}
