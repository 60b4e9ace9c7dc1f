import { FINDING_TYPES } from "@/lib/engine/finding-types";

import { parseNumber, type WorkspaceForm } from "./draft-record";
import { sectionOf, type SectionId } from "./problem-fields";
import type { SectionStatus } from "./section";

type Errors = Record<string, string[]>;

/** The step to open first: the first one with nothing in it yet. */
export function firstOpen(form: WorkspaceForm): SectionId {
  if (!form.access.kind) return "access";
  if (!form.surveyEnd.at || form.segments.length === 0) return "profile";
  return "findings";
}

export function sectionStatus(
  id: SectionId,
  form: WorkspaceForm,
  errors: Errors,
  shown: (path: string) => boolean,
  readyClips: number,
): SectionStatus {
  const count = Object.entries(errors)
    .filter(([path]) => sectionOf(path) === id && shown(path))
    .reduce((n, [, list]) => n + list.length, 0);
  if (id !== "review" && count > 0) return { tone: "fix", text: `${count} to fix` };
  switch (id) {
    case "clips":
      return readyClips > 0 ? { tone: "done", text: "Done" } : { tone: "todo", text: "To do" };
    case "access":
      return form.access.kind ? { tone: "done", text: "Done" } : { tone: "todo", text: "To do" };
    case "profile": {
      const filled = form.surveyEnd.at !== "" && form.surveyEnd.reason !== "" && form.segments.length > 0;
      return filled ? { tone: "done", text: "Done" } : { tone: "todo", text: "To do" };
    }
    case "locates":
      return form.locates.length > 0 ? { tone: "done", text: "Done" } : { tone: "optional", text: "Optional" };
    case "boundary":
      return { tone: "done", text: "Done" };
    case "findings":
      return form.findings.length > 0 ? { tone: "done", text: "Done" } : { tone: "optional", text: "None yet" };
    case "narrative":
      return form.narrative.trim().length >= 20 ? { tone: "done", text: "Done" } : { tone: "todo", text: "To do" };
    case "review": {
      const total = Object.values(errors).reduce((n, l) => n + l.length, 0);
      return total > 0 ? { tone: "todo", text: `${total} to fix` } : { tone: "done", text: "Ready" };
    }
  }
}

export function sectionSummary(id: SectionId, form: WorkspaceForm, readyClips: number): string | undefined {
  const n = (count: number, one: string, many: string) => `${count} ${count === 1 ? one : many}`;
  switch (id) {
    case "clips":
      return readyClips > 0 ? n(readyClips, "ready clip", "ready clips") : "Upload and watch the runs";
    case "access":
      return form.access.note.trim() || "How the camera went in";
    case "profile": {
      const end = parseNumber(form.surveyEnd.at);
      return `${n(form.segments.length, "segment", "segments")}${end !== undefined ? ` · survey ended at ${end.toFixed(1)} ft` : ""}`;
    }
    case "locates":
      return form.locates.length > 0 ? n(form.locates.length, "mark", "marks") : "Depths read with the sonde";
    case "boundary": {
      const at = parseNumber(form.boundary.at);
      return form.boundary.known === "yes" && at !== undefined ? `Public side begins at ${at.toFixed(1)} ft` : "Unknown";
    }
    case "findings": {
      const types = [...new Set(form.findings.flatMap((f) => (f.type ? [FINDING_TYPES[f.type].label as string] : [])))];
      return form.findings.length > 0
        ? `${n(form.findings.length, "finding", "findings")}${types.length ? ` · ${types.slice(0, 3).join(", ")}` : ""}`
        : "Defects by footage";
    }
    case "narrative":
      return form.narrative.trim()
        ? `${form.narrative.trim().slice(0, 60)}${form.narrative.trim().length > 60 ? "…" : ""}`
        : "Your summary and recommendation";
    case "review":
      return "Check and deliver";
  }
}
