import { FINDING_TYPES, type FindingType } from "@/lib/engine/finding-types";

import type { WorkspaceForm } from "./draft-record";

export type SectionId = "clips" | "access" | "profile" | "locates" | "boundary" | "findings" | "narrative" | "review";

export const SECTIONS: { id: SectionId; title: string }[] = [
  { id: "clips", title: "Clips" },
  { id: "access", title: "Access point" },
  { id: "profile", title: "Line profile" },
  { id: "locates", title: "Locate marks" },
  { id: "boundary", title: "Responsibility boundary" },
  { id: "findings", title: "Findings" },
  { id: "narrative", title: "Narrative" },
  { id: "review", title: "Review and submit" },
];

type Step = string | number;

/** "findings[2].lossPct" to ["findings", 2, "lossPct"]. */
export function splitPath(path: string): Step[] {
  const out: Step[] = [];
  for (const m of path.matchAll(/([^.[\]]+)|\[(\d+)\]/g)) out.push(m[2] !== undefined ? Number(m[2]) : m[1]);
  return out;
}

export function sectionOf(path: string): SectionId {
  const head = splitPath(path)[0];
  switch (head) {
    case "clips":
      return "clips";
    case "access":
      return "access";
    case "segments":
    case "surveyEnd":
      return "profile";
    case "locates":
      return "locates";
    case "boundaryAt":
      return "boundary";
    case "findings":
      return "findings";
    case "narrative":
    case "recommendation":
      return "narrative";
    default:
      return "review";
  }
}

/** The DOM id of the control that edits a record path ("segments[2].to" to "f-segments-2-to"). */
export function fieldId(path: string): string {
  return `f-${splitPath(path).join("-")}`;
}

/** The record path of an editor field name: "segments.2.to" to "segments[2].to". */
export const recordPath = (name: string) =>
  name
    .replace(/\.(\d+)(?=\.|$)/g, "[$1]")
    .replace(/^boundary\.at$/, "boundaryAt")
    .replace(/^(findings\[\d+\])\.second$/, "$1.clipSecond");

/** Candidate ids to focus for a problem, most precise first, ending at the section's heading. */
export function focusTargets(path: string): string[] {
  const steps = splitPath(path);
  const ids: string[] = [];
  for (let n = steps.length; n > 0; n--) ids.push(`f-${steps.slice(0, n).join("-")}`);
  ids.push(`section-${sectionOf(path)}`);
  return ids;
}

const PART_LABELS: Record<string, string> = {
  from: "start",
  to: "end",
  at: "footage",
  material: "material",
  diameterIn: "diameter",
  depthFt: "depth",
  groundElevationFt: "ground elevation",
  surface: "surface",
  note: "note",
  kind: "type",
  reason: "why it ended",
  type: "type",
  grade: "grade",
  clock: "clock position",
  lossPct: "share lost",
  waterDepthPct: "standing water",
  clipId: "clip",
  second: "clip second",
  clipSecond: "clip second",
};

function typeLabel(form: WorkspaceForm | undefined, i: number): string {
  const t = form?.findings[i]?.type;
  return t ? ` (${FINDING_TYPES[t as FindingType].label})` : "";
}

/** Where a problem is, in words: "Segment 3: end", "Finding 2 (Roots): share lost". */
export function fieldLabel(path: string, form?: WorkspaceForm): string {
  const [head, index, part] = splitPath(path);
  const partText = typeof part === "string" ? `: ${PART_LABELS[part] ?? part}` : "";
  const n = typeof index === "number" ? index + 1 : null;
  switch (head) {
    case "access":
      return `Access point${typeof index === "string" ? `: ${PART_LABELS[index] ?? index}` : ""}`;
    case "surveyEnd":
      return `Survey end${typeof index === "string" ? `: ${PART_LABELS[index] ?? index}` : ""}`;
    case "segments":
      return n ? `Segment ${n}${partText}` : "Line profile";
    case "locates":
      return n ? `Locate mark ${n}${partText}` : "Locate marks";
    case "findings":
      return n ? `Finding ${n}${typeLabel(form, n - 1)}${partText}` : "Findings";
    case "boundaryAt":
      return "Responsibility boundary";
    case "clips":
      return "Clips";
    case "narrative":
      return "Narrative";
    case "recommendation":
      return "Recommendation";
    default:
      return "The record";
  }
}

/** The editor value behind a record path, or undefined when the path has no single control. */
export function valueAt(form: WorkspaceForm, path: string): unknown {
  const steps = splitPath(path);
  if (steps[0] === "boundaryAt") return form.boundary.at;
  if (steps[0] === "findings" && steps[2] === "clipSecond") return form.findings[Number(steps[1])]?.second;
  let v: unknown = form;
  for (const s of steps) {
    if (v === null || typeof v !== "object") return undefined;
    v = (v as Record<string | number, unknown>)[s];
  }
  return v;
}

const BLANK_MESSAGES: Record<string, string> = {
  at: "Enter the footage.",
  to: "Enter the footage where it ends.",
  material: "Choose the material.",
  diameterIn: "Enter the diameter in inches.",
  depthFt: "Enter the depth read at the surface.",
  surface: "Choose the surface above the mark.",
  kind: "Choose how you entered the line.",
  reason: "Choose why the survey ended.",
  type: "Choose the type of finding.",
  grade: "Choose a grade from 1 to 5.",
  waterDepthPct: "Enter the depth of standing water as a share of the diameter (0 when it holds none).",
};

/** The engine speaks of types and ranges; for a field left blank, say what to enter instead. */
export function problemMessage(path: string, message: string, form: WorkspaceForm): string {
  const steps = splitPath(path);
  const last = steps[steps.length - 1];
  if (steps[0] === "segments" && last === "from" && typeof steps[1] === "number" && steps[1] > 0) {
    if (form.segments[steps[1] - 1]?.to.trim() === "") return `Enter where segment ${steps[1]} ends first.`;
  }
  const value = valueAt(form, path);
  if (typeof last === "string" && value === "" && BLANK_MESSAGES[last]) return BLANK_MESSAGES[last];
  if (path === "segments" && form.segments.length === 0) return "Add the first segment of the line profile.";
  return message.charAt(0).toUpperCase() + message.slice(1);
}

export type ListedProblem = { path: string; label: string; message: string; section: SectionId };

/** Field errors (keyed by path) as a list in the order of the sections, then of the record. */
export function listProblems(fieldErrors: Record<string, string[]>, form: WorkspaceForm): ListedProblem[] {
  const order = SECTIONS.map((s) => s.id);
  const items: ListedProblem[] = [];
  for (const [path, messages] of Object.entries(fieldErrors)) {
    for (const m of messages)
      items.push({ path, label: fieldLabel(path, form), message: problemMessage(path, m, form), section: sectionOf(path) });
  }
  return items
    .map((p, i) => ({ p, i }))
    .sort((a, b) => order.indexOf(a.p.section) - order.indexOf(b.p.section) || comparePaths(a.p.path, b.p.path) || a.i - b.i)
    .map(({ p }) => p);
}

function comparePaths(a: string, b: string): number {
  const [, ia] = splitPath(a);
  const [, ib] = splitPath(b);
  return typeof ia === "number" && typeof ib === "number" ? ia - ib : 0;
}

/**
 * The footage a clip second suggests: the counter at the clip's start plus the seconds pushed at
 * the inspector's pushing speed. A proposal to check against the counter, to a tenth of a foot.
 */
export function proposeFootage(startFootage: number | null, second: number, feetPerSecond: number): number {
  const start = startFootage !== null && Number.isFinite(startFootage) ? startFootage : 0;
  const speed = Number.isFinite(feetPerSecond) && feetPerSecond > 0 ? feetPerSecond : 0;
  const s = Number.isFinite(second) && second > 0 ? second : 0;
  return Math.round((start + s * speed) * 10) / 10;
}
