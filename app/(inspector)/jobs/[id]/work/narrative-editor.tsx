"use client";

import { useFormContext } from "react-hook-form";

import { Field } from "@/components/ui/field";
import { Textarea } from "@/components/ui/textarea";

import type { WorkspaceForm } from "./draft-record";
import { fieldId } from "./problem-fields";
import { useWorkspace } from "./workspace-context";

/** The inspector's own words, shown to the buyer beside the generated summary. */
export function NarrativeEditor() {
  const { register, watch } = useFormContext<WorkspaceForm>();
  const { errorFor } = useWorkspace();
  const length = watch("narrative").trim().length;
  return (
    <>
      <Field
        id={fieldId("narrative")}
        label="Your summary for the buyer"
        hint={
          <>
            A few plain sentences: what the line is made of, what you saw and where. <span className="num">{length}</span> characters.
          </>
        }
        error={errorFor("narrative")}
      >
        {(c) => <Textarea rows={6} maxLength={20_000} {...c} {...register("narrative")} />}
      </Field>
      <Field
        id={fieldId("recommendation")}
        label="Your recommendation"
        optional
        hint="What you would do next: clean and re-check, a spot repair, lining, replacement, reporting the public part to the city."
        error={errorFor("recommendation")}
      >
        {(c) => <Textarea rows={4} maxLength={5_000} {...c} {...register("recommendation")} />}
      </Field>
    </>
  );
}
