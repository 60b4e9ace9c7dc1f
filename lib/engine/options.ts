import { formatPath, type Problem } from "./problems";
import { DEMO_RATE_TABLE, RateTableSchema, type RateTable } from "./rates";
import { DEFAULT_SLOPE_RULES, SLOPE_RULE_SETS, SlopeRuleSetSchema, type SlopeRuleSet } from "./slope-rules";

export interface EvaluateOptions {
  /** The repair-cost rate table; the demo table when omitted. */
  rates?: RateTable;
  /** A built-in slope rule set by id ("ipc", "upc") or a rule set of its own; the IPC when omitted. */
  jurisdiction?: string | SlopeRuleSet;
}

export interface ResolvedOptions {
  rates: RateTable;
  slopeRules: SlopeRuleSet;
}

// A table checked once need not be checked on every evaluation. An edited table must be a new
// object (as one read afresh from the database is), or the edit goes unchecked.
const checked = new WeakSet<object>([DEMO_RATE_TABLE, ...Object.values(SLOPE_RULE_SETS)]);

function check<T extends object>(
  schema: {
    safeParse(v: unknown): { success: true; data: T } | { success: false; error: { issues: { path: PropertyKey[]; message: string }[] } };
  },
  value: T,
  prefix: string[],
  problems: Problem[],
): T {
  if (checked.has(value)) return value;
  const r = schema.safeParse(value);
  if (r.success) {
    checked.add(value);
    return value;
  }
  for (const i of r.error.issues) problems.push({ path: formatPath([...prefix, ...i.path]), message: i.message });
  return value;
}

export function resolveOptions(options: EvaluateOptions | undefined, problems: Problem[]): ResolvedOptions {
  const rates = options?.rates === undefined ? DEMO_RATE_TABLE : check(RateTableSchema, options.rates, ["options", "rates"], problems);
  let slopeRules = DEFAULT_SLOPE_RULES;
  const j = options?.jurisdiction;
  if (typeof j === "string") {
    const found = SLOPE_RULE_SETS[j];
    if (found) slopeRules = found;
    else
      problems.push({
        path: "options.jurisdiction",
        message: `no slope rule set "${j}"; known: ${Object.keys(SLOPE_RULE_SETS).join(", ")}`,
      });
  } else if (j !== undefined) {
    slopeRules = check(SlopeRuleSetSchema, j, ["options", "jurisdiction"], problems);
  }
  return { rates, slopeRules };
}
