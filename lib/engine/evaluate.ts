import { cautions, type Caution } from "./cautions";
import { findingGroup, findingLabel, type FindingGroup, type FindingType } from "./finding-types";
import { lineLengths, sideAt, type Lengths } from "./geometry";
import { resolveOptions, type EvaluateOptions } from "./options";
import { parseRecord, type SourceUnits } from "./parse-record";
import { RecordProblemsError, type Problem } from "./problems";
import type { RateTable } from "./rates";
import { rate, type Density, type Severity, type SeverityLabel } from "./rating";
import type { InspectionRecord } from "./record";
import { costBySide, repairStretches, type CostBySide, type Stretch } from "./repair";
import { sagReadings, type SagReading } from "./sags";
import { gradesBetweenMarks, type GradeBetweenMarks } from "./slope";
import type { SlopeRuleSet } from "./slope-rules";
import { summaryBullets } from "./summary";
import { ENGINE_VERSION, SEVERITY_METHOD_ID } from "./version";
import type { Side } from "./vocabulary";

export interface FindingView {
  index: number;
  type: FindingType;
  label: string;
  group: FindingGroup;
  grade: number;
  at: number;
  to: number | null;
  side: Side;
  clock: string | null;
}

export interface Evaluation {
  engineVersion: string;
  severityMethod: typeof SEVERITY_METHOD_ID;
  /** The record's own units; everything below is in feet, inches and integer US cents. */
  sourceUnits: SourceUnits;
  lengths: Lengths;
  /** Estimates: locator depths and counter footages are approximate. */
  grades: GradeBetweenMarks[];
  slopeRules: Pick<SlopeRuleSet, "id" | "name" | "source" | "basis" | "note">;
  sags: SagReading[];
  structuralGrade: number;
  serviceGrade: number;
  density: Density;
  severity: Severity;
  severityLabel: SeverityLabel;
  severityReasons: string[];
  findings: FindingView[];
  stretches: Stretch[];
  costBySide: CostBySide;
  rates: Pick<RateTable, "name" | "effectiveDate" | "source" | "demo">;
  cautions: Caution[];
  summary: string[];
}

export type EvaluateResult = { ok: true; evaluation: Evaluation } | { ok: false; problems: Problem[] };

function compute(record: InspectionRecord, sourceUnits: SourceUnits, rates: RateTable, slopeRules: SlopeRuleSet): Evaluation {
  const lengths = lineLengths(record);
  const grades = gradesBetweenMarks(record, slopeRules);
  const sags = sagReadings(record);
  const rating = rate(record);
  const stretches = repairStretches(record, rates);
  const costs = costBySide(stretches);
  return {
    engineVersion: ENGINE_VERSION,
    severityMethod: SEVERITY_METHOD_ID,
    sourceUnits,
    lengths,
    grades,
    slopeRules: { id: slopeRules.id, name: slopeRules.name, source: slopeRules.source, basis: slopeRules.basis, note: slopeRules.note },
    sags,
    structuralGrade: rating.structuralGrade,
    serviceGrade: rating.serviceGrade,
    density: rating.density,
    severity: rating.severity,
    severityLabel: rating.severityLabel,
    severityReasons: rating.reasons,
    findings: record.findings.map((f, index) => ({
      index,
      type: f.type,
      label: findingLabel(f.type),
      group: findingGroup(f.type),
      grade: f.grade,
      at: f.at,
      to: f.to,
      side: sideAt(f.at, record.boundaryAt),
      clock: f.clock,
    })),
    stretches,
    costBySide: costs,
    rates: { name: rates.name, effectiveDate: rates.effectiveDate, source: rates.source, demo: rates.demo },
    cautions: cautions({ record, lengths, grades, stretches, rates }),
    summary: summaryBullets({ record, lengths, rating, grades, sags, stretches, costs, slopeRules }),
  };
}

/** Checks the record and the options, then evaluates; never evaluates a record with problems. */
export function tryEvaluate(input: unknown, options?: EvaluateOptions): EvaluateResult {
  const parsed = parseRecord(input);
  const problems: Problem[] = parsed.ok ? [] : [...parsed.problems];
  const resolved = resolveOptions(options, problems);
  if (!parsed.ok || problems.length > 0) return { ok: false, problems };
  return { ok: true, evaluation: compute(parsed.record, parsed.sourceUnits, resolved.rates, resolved.slopeRules) };
}

/** The single entry: record in, evaluation out. Throws RecordProblemsError, listing every problem, for a bad record. */
export function evaluate(input: unknown, options?: EvaluateOptions): Evaluation {
  const result = tryEvaluate(input, options);
  if (!result.ok) throw new RecordProblemsError(result.problems);
  return result.evaluation;
}
