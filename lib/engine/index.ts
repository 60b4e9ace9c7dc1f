export { evaluate, tryEvaluate, type Evaluation, type EvaluateResult, type FindingView } from "./evaluate";
export type { EvaluateOptions } from "./options";
export { parseRecord, type ParseResult, type SourceUnits } from "./parse-record";
export { RecordProblemsError, type Problem } from "./problems";
export {
  InspectionRecordSchema,
  MetricInspectionRecordSchema,
  type Finding,
  type InspectionRecord,
  type Locate,
  type MetricRecordInput,
  type RecordInput,
  type Segment,
} from "./record";
export { FINDING_TYPES, FINDING_TYPE_IDS, findingGroup, findingLabel, type FindingGroup, type FindingType } from "./finding-types";
export * from "./vocabulary";
export type { Basis } from "./basis";
export { lineLengths, sideAt, type Lengths, type MaterialLength } from "./geometry";
export {
  DEFAULT_SLOPE_RULES,
  IPC_704_1,
  SLOPE_RULE_SETS,
  SlopeRuleSetSchema,
  UPC_708_1,
  minimumSlope,
  type SlopeRuleSet,
} from "./slope-rules";
export { gradeBetween, sondeDepthFromNulls, type GradeBetweenMarks } from "./slope";
export { areaFilledPct, areaFraction, hydraulicRadiusRatio, wettedPerimeterRatio } from "./pipe-section";
export { fullFlowGpm, manningFlow, manningVelocity, partFullRatios } from "./flow";
export { aggregate, bandGrade, type Aggregate, type AggregateInput, type Bands } from "./aggregate";
export { rate, SEVERITY_LABELS, type Density, type Rating, type Severity, type SeverityLabel } from "./rating";
export { linerWall, minStiffnessThickness, ovalityFactor, partlyDeterioratedThickness, type LinerWall } from "./liner";
export { DEMO_RATE_TABLE, RateTableSchema, REPAIR_METHODS, type MoneyRange, type RateTable, type RepairMethod } from "./rates";
export { METHOD_LABELS, type CostBySide, type RepairOption, type Stretch } from "./repair";
export type { Caution, CautionId } from "./cautions";
export type { SagReading } from "./sags";
export { CLAY_LATERAL_1950S, EXAMPLE_RECORDS, PVC_LATERAL_1990S } from "./examples";
export { ENGINE_VERSION, SEVERITY_METHOD_ID } from "./version";
