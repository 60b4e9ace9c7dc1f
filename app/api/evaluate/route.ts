// POST /api/evaluate - the inspection record in, the engine's evaluation out (400 with each problem and its path)
import { route } from "@/lib/api/route";
import { tryEvaluate } from "@/lib/engine";
import { problemsError } from "@/lib/api/problems";
import { evaluateSchema } from "@/lib/validations/inspection";

export const POST = route({ permission: "engine:evaluate", body: evaluateSchema }, async ({ body }) => {
  const result = tryEvaluate(body.record);
  if (!result.ok) throw problemsError(result.problems);
  return { evaluation: result.evaluation };
});
