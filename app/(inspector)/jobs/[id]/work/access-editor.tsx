"use client";

import { useFormContext } from "react-hook-form";

import { Field } from "@/components/ui/field";
import { Textarea } from "@/components/ui/textarea";
import type { AccessKind } from "@/lib/engine/vocabulary";

import { ChoiceField, SelectField } from "./controls";
import type { WorkspaceForm } from "./draft-record";
import { fieldId } from "./problem-fields";
import { useWorkspace } from "./workspace-context";

const KINDS: { value: AccessKind; label: string; hint?: string }[] = [
  { value: "cleanout_inside", label: "Cleanout inside", hint: "Basement, crawl space or utility room" },
  { value: "cleanout_outside", label: "Cleanout outside", hint: "In the yard or by the foundation" },
  { value: "toilet_removed", label: "Toilet pulled", hint: "Camera in through the closet flange" },
  { value: "roof_vent", label: "Roof vent" },
  { value: "other", label: "Somewhere else", hint: "Say where in the note" },
];

export const PIPE_SIZES_IN = [1.5, 2, 3, 4, 5, 6, 8, 10, 12, 15, 18] as const;

export function SizeOptions({ current }: { current: string }) {
  const sizes: number[] = [...PIPE_SIZES_IN];
  const n = Number(current);
  if (current !== "" && Number.isFinite(n) && !sizes.includes(n)) sizes.push(n);
  return (
    <>
      <option value="">Choose…</option>
      {sizes
        .sort((a, b) => a - b)
        .map((s) => (
          <option key={s} value={String(s)}>
            {s} in
          </option>
        ))}
    </>
  );
}

export function AccessEditor() {
  const { register, watch } = useFormContext<WorkspaceForm>();
  const { errorFor } = useWorkspace();
  return (
    <>
      <ChoiceField<AccessKind> name="access.kind" legend="Where the camera went in" options={KINDS} />
      <Field
        id={fieldId("access.note")}
        label="Where it is"
        optional
        hint="So the next person finds it: “Basement, behind the water heater”."
        error={errorFor("access.note")}
      >
        {(c) => <Textarea rows={2} {...c} {...register("access.note")} />}
      </Field>
      <SelectField name="access.diameterIn" label="Diameter at the opening" optional className="max-w-64">
        <SizeOptions current={watch("access.diameterIn")} />
      </SelectField>
    </>
  );
}
