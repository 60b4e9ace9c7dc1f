import type { FindingType } from "./finding-types";
import type { Problem } from "./problems";
import { FOOTAGE_EPSILON } from "./units";

interface Span {
  from: number;
  to: number;
}
interface FindingPlace {
  at: number;
  to: number | null;
  type: FindingType;
  waterDepthPct: number | null;
}
interface LocatePlace {
  at: number;
}

/** The parts of a record that parsed on their own; a part that did not parse is undefined. */
export interface RecordPlaces {
  segments?: readonly (Span | undefined)[];
  surveyEndAt?: number;
  findings?: readonly (FindingPlace | undefined)[];
  locates?: readonly (LocatePlace | undefined)[];
}

const fmt = (v: number) => String(Math.round(v * 100) / 100);

/** Rules that tie one field to another; each problem names the field to fix. */
export function crossCheck(places: RecordPlaces, unit: string, problems: Problem[]): void {
  const u = unit === "feet" ? "ft" : "m";
  const segments = places.segments ?? [];
  segments.forEach((s, i) => {
    if (!s) return;
    if (i === 0 && Math.abs(s.from) > FOOTAGE_EPSILON) {
      problems.push({
        path: "segments[0].from",
        message: `the first segment must start at 0 (the access point), not at ${fmt(s.from)} ${u}`,
      });
    }
    if (s.to <= s.from + FOOTAGE_EPSILON) {
      problems.push({ path: `segments[${i}].to`, message: `must be past the segment's start (${fmt(s.from)} ${u})` });
    }
    const prev = i > 0 ? segments[i - 1] : undefined;
    if (!prev) return;
    if (s.from > prev.to + FOOTAGE_EPSILON) {
      problems.push({
        path: `segments[${i}].from`,
        message: `gap: segments[${i - 1}] ends at ${fmt(prev.to)} ${u} but this one starts at ${fmt(s.from)} ${u}`,
      });
    } else if (s.from < prev.to - FOOTAGE_EPSILON) {
      problems.push({
        path: `segments[${i}].from`,
        message: `overlap: segments[${i - 1}] runs to ${fmt(prev.to)} ${u} but this one starts at ${fmt(s.from)} ${u}`,
      });
    }
  });

  const last = segments.length > 0 ? segments[segments.length - 1] : undefined;
  const end = places.surveyEndAt;
  if (last && end !== undefined && Math.abs(last.to - end) > FOOTAGE_EPSILON) {
    problems.push({
      path: `segments[${segments.length - 1}].to`,
      message: `the line profile ends at ${fmt(last.to)} ${u} but the survey ended at ${fmt(end)} ${u}; the segments must cover the whole survey`,
    });
  }
  const limit = end ?? last?.to;

  (places.findings ?? []).forEach((f, i) => {
    if (!f) return;
    if (limit !== undefined && f.at > limit + FOOTAGE_EPSILON) {
      problems.push({ path: `findings[${i}].at`, message: `${fmt(f.at)} ${u} is past the end of the survey (${fmt(limit)} ${u})` });
    }
    if (f.to !== null) {
      if (f.to < f.at - FOOTAGE_EPSILON) {
        problems.push({ path: `findings[${i}].to`, message: `ends (${fmt(f.to)} ${u}) before it starts (${fmt(f.at)} ${u})` });
      } else if (limit !== undefined && f.to > limit + FOOTAGE_EPSILON) {
        problems.push({ path: `findings[${i}].to`, message: `${fmt(f.to)} ${u} is past the end of the survey (${fmt(limit)} ${u})` });
      }
    }
    if (f.type === "sag" && f.waterDepthPct === null) {
      problems.push({
        path: `findings[${i}].waterDepthPct`,
        message: "a sag needs the depth of its standing water as a share of the diameter (0 when it holds none)",
      });
    }
    if (f.type !== "sag" && f.waterDepthPct !== null) {
      problems.push({ path: `findings[${i}].waterDepthPct`, message: "only a sag records standing water; leave it empty here" });
    }
  });

  const seen = new Map<number, number>();
  (places.locates ?? []).forEach((l, i) => {
    if (!l) return;
    if (limit !== undefined && l.at > limit + FOOTAGE_EPSILON) {
      problems.push({
        path: `locates[${i}].at`,
        message: `${fmt(l.at)} ${u} is past the end of the survey (${fmt(limit)} ${u}); the sonde cannot be located where the camera did not go`,
      });
    }
    for (const [at, j] of seen) {
      if (Math.abs(at - l.at) <= FOOTAGE_EPSILON) {
        problems.push({
          path: `locates[${i}].at`,
          message: `locates[${j}] is already at ${fmt(l.at)} ${u}; two marks at one footage give no grade`,
        });
        return;
      }
    }
    seen.set(l.at, i);
  });
}
