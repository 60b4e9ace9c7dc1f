export interface Problem {
  /** Where in the record, e.g. `segments[2].to`; `record` for the record as a whole. */
  path: string;
  message: string;
}

export function formatPath(path: readonly PropertyKey[]): string {
  let out = "";
  for (const key of path) {
    if (typeof key === "number") out += `[${key}]`;
    else out += out === "" ? String(key) : `.${String(key)}`;
  }
  return out === "" ? "record" : out;
}

/** Thrown by `evaluate` when the record (or the options) cannot be evaluated; carries every problem. */
export class RecordProblemsError extends Error {
  readonly problems: Problem[];
  constructor(problems: Problem[]) {
    super(
      `The inspection record has ${problems.length} problem${problems.length === 1 ? "" : "s"}: ${problems.map((p) => `${p.path}: ${p.message}`).join("; ")}`,
    );
    this.name = "RecordProblemsError";
    this.problems = problems;
  }
}
