import type { z } from "zod";

import { crossCheck, type RecordPlaces } from "./cross-checks";
import { metricToImperial } from "./metric";
import { formatPath, type Problem } from "./problems";
import { InspectionRecordSchema, MetricInspectionRecordSchema, type InspectionRecord } from "./record";

export type SourceUnits = "imperial" | "metric";

export type ParseResult = { ok: true; record: InspectionRecord; sourceUnits: SourceUnits } | { ok: false; problems: Problem[] };

type AnySchema = typeof InspectionRecordSchema | typeof MetricInspectionRecordSchema;

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);

function issuesToProblems(issues: readonly z.core.$ZodIssue[]): Problem[] {
  return issues.map((i) => ({ path: formatPath(i.path), message: i.message }));
}

function places<T>(schema: z.ZodType<T>, raw: unknown): (T | undefined)[] | undefined {
  if (!Array.isArray(raw)) return undefined;
  return raw.map((item) => {
    const r = schema.safeParse(item);
    return r.success ? r.data : undefined;
  });
}

// Slow path, only for a record already refused: read what parses on its own, so that the
// cross-field problems are reported together with the shape problems.
function partialPlaces(schema: AnySchema, raw: Record<string, unknown>): RecordPlaces {
  const end = schema.shape.surveyEnd.safeParse(raw.surveyEnd);
  return {
    segments: places<{ from: number; to: number }>(schema.shape.segments.element, raw.segments),
    surveyEndAt: end.success ? end.data.at : undefined,
    findings: places(schema.shape.findings.element, raw.findings),
    locates: places<{ at: number }>(schema.shape.locates.element, raw.locates),
  };
}

/** Checks an inspection record and returns it in feet and inches, or every problem with its path. */
export function parseRecord(input: unknown): ParseResult {
  if (!isObject(input)) return { ok: false, problems: [{ path: "record", message: "must be an object (the inspection record)" }] };
  let raw = input;
  const problems: Problem[] = [];
  let schema: AnySchema = InspectionRecordSchema;
  if (raw.units === "metric") schema = MetricInspectionRecordSchema;
  else if (raw.units !== undefined && raw.units !== "imperial") {
    problems.push({ path: "units", message: 'must be "imperial" (feet and inches, the default) or "metric" (metres and millimetres)' });
    raw = { ...raw, units: undefined };
  }
  const unit = schema === MetricInspectionRecordSchema ? "metres" : "feet";
  const parsed = schema.safeParse(raw);
  if (!parsed.success) {
    problems.push(...issuesToProblems(parsed.error.issues));
    crossCheck(partialPlaces(schema, raw), unit, problems);
    return { ok: false, problems };
  }
  const data = parsed.data;
  crossCheck({ segments: data.segments, surveyEndAt: data.surveyEnd.at, findings: data.findings, locates: data.locates }, unit, problems);
  if (problems.length > 0) return { ok: false, problems };
  if (data.units === "metric") return { ok: true, record: metricToImperial(data), sourceUnits: "metric" };
  const { units: _units, ...record } = data;
  return { ok: true, record, sourceUnits: "imperial" };
}
