import { AppError } from "@/lib/errors";

/** The engine's problems as field errors keyed by record path (`segments[2].to`). */
export function problemsError(problems: { path: string; message: string }[], extra: Record<string, string[]> = {}): AppError {
  const fieldErrors: Record<string, string[]> = { ...extra };
  for (const p of problems) (fieldErrors[p.path || "record"] ??= []).push(p.message);
  const n = Object.values(fieldErrors).reduce((sum, list) => sum + list.length, 0);
  return new AppError("bad_request", `The record has ${n} problem${n === 1 ? "" : "s"} to fix.`, fieldErrors);
}
