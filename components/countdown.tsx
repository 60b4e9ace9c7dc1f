"use client";

import clsx from "clsx";
import { useSyncExternalStore } from "react";

import { formatCountdown, formatDateTime } from "@/lib/format";

const TICK_MS = 30_000;

// One shared clock for every countdown on the page, ticking only while something listens.
let now = Date.now();
const listeners = new Set<() => void>();
let timer: ReturnType<typeof setInterval> | null = null;

function subscribe(listener: () => void) {
  listeners.add(listener);
  if (!timer) {
    now = Date.now();
    timer = setInterval(() => {
      now = Date.now();
      listeners.forEach((l) => l());
    }, TICK_MS);
  }
  return () => {
    listeners.delete(listener);
    if (listeners.size === 0 && timer) {
      clearInterval(timer);
      timer = null;
    }
  };
}

/** The current time, refreshed every 30 s; null while rendering on the server and hydrating. */
export function useNow(): number | null {
  return useSyncExternalStore(
    subscribe,
    () => now,
    () => null,
  );
}

/**
 * "in 2 d 5 h" to a deadline, updated every 30 s. Not announced as it changes (aria-live off);
 * the full date and time stay readable in the tooltip and for screen readers.
 */
export function Countdown({
  to,
  timeZone,
  warnWithinHours = 48,
  className,
}: {
  to: string;
  timeZone: string;
  warnWithinHours?: number;
  className?: string;
}) {
  const current = useNow();
  const full = formatDateTime(to, timeZone);
  const left = current === null ? null : Date.parse(to) - current;
  const passed = left !== null && left <= 0;
  const soon = left !== null && !passed && left < warnWithinHours * 3_600_000;
  return (
    <time
      dateTime={to}
      title={full}
      aria-live="off"
      className={clsx("num", passed ? "font-semibold text-danger" : soon ? "font-medium text-warning" : "text-ink", className)}
    >
      {current === null ? full : passed ? `passed ${formatCountdown(to, new Date(current))}` : formatCountdown(to, new Date(current))}
      {current === null ? null : <span className="sr-only"> ({full})</span>}
    </time>
  );
}
