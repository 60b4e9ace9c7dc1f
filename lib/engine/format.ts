import { findingWord } from "./finding-types";
import type { Finding } from "./record";

const tenth = (v: number) => Math.round(v * 10) / 10;

/** Footages to a tenth of a foot: the counter reads no finer. */
export const ftText = (v: number): string => `${tenth(v)} ft`;

export const ftRange = (from: number, to: number): string => `${tenth(from)}-${tenth(to)} ft`;

/** Liner walls to a thousandth of an inch, as F1216 figures are given. */
export const wallText = (v: number): string => `${Math.round(v * 1000) / 1000} in`;

export const pctText = (v: number): string => `${Math.round(v)} %`;

export const inText = (v: number): string => `${Math.round(v * 100) / 100} in`;

/** A pipe size used as an adjective: "4-in pipe". */
export const sizeText = (v: number): string => `${Math.round(v * 100) / 100}-in`;

export function dollarsText(cents: number): string {
  return `$${Math.round(cents / 100).toLocaleString("en-US")}`;
}

export const rangeText = (low: number, high: number): string => `${dollarsText(low)}-${dollarsText(high)}`;

export function placeText(f: Finding): string {
  return f.to !== null && f.to > f.at ? `from ${ftText(f.at)} to ${ftText(f.to)}` : `at ${ftText(f.at)}`;
}

export const describeFinding = (f: Finding): string => `${findingWord(f.type)} (grade ${f.grade}) ${placeText(f)}`;

export function listText(items: readonly string[]): string {
  if (items.length <= 1) return items.join("");
  return `${items.slice(0, -1).join(", ")} and ${items[items.length - 1]}`;
}
