"use client";

import { useRef } from "react";
import { useFieldArray, useFormContext } from "react-hook-form";

import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { SURFACE_LABELS, SURFACES } from "@/lib/engine/vocabulary";

import { NumberField, SelectField } from "./controls";
import { emptyLocate, type WorkspaceForm } from "./draft-record";
import { fieldId } from "./problem-fields";
import { useWorkspace } from "./workspace-context";

/** Marks painted on the ground above the sonde, with the depth the locator read there. */
export function LocatesEditor() {
  const { control, register } = useFormContext<WorkspaceForm>();
  const { fields, append, remove } = useFieldArray({ control, name: "locates" });
  const { errorFor } = useWorkspace();
  const addRef = useRef<HTMLButtonElement>(null);

  function add() {
    append(emptyLocate(), { shouldFocus: false });
    requestAnimationFrame(() => document.getElementById(fieldId(`locates[${fields.length}].at`))?.focus());
  }

  return (
    <div className="space-y-4">
      <p className="text-ink-2 text-sm">
        Depths from a locator are approximate. Two or more marks give the grade between them; add the ground elevation only where you
        measured it (the ground is taken as level otherwise).
      </p>
      <ol className="space-y-3">
        {fields.map((f, i) => (
          <li key={f.id} className="border-rule bg-paper/60 rounded-md border p-3">
            <div className="mb-3 flex items-center justify-between gap-3">
              <h3 className="font-sans text-[0.9375rem] font-semibold">Locate mark {i + 1}</h3>
              <Button
                variant="ghost"
                className="min-h-11"
                aria-label={`Remove locate mark ${i + 1}`}
                onClick={() => {
                  remove(i);
                  addRef.current?.focus();
                }}
              >
                Remove
              </Button>
            </div>
            <div className="grid gap-3 sm:grid-cols-2">
              <NumberField name={`locates.${i}.at`} label="Footage" unit="ft" />
              <NumberField name={`locates.${i}.depthFt`} label="Depth read at the surface" unit="ft" />
              <SelectField name={`locates.${i}.surface`} label="Surface above the mark">
                <option value="">Choose…</option>
                {SURFACES.map((s) => (
                  <option key={s} value={s}>
                    {SURFACE_LABELS[s].charAt(0).toUpperCase() + SURFACE_LABELS[s].slice(1)}
                  </option>
                ))}
              </SelectField>
              <NumberField name={`locates.${i}.groundElevationFt`} label="Ground elevation" unit="ft" step={0.01} min={-1000} optional />
              <Field
                id={fieldId(`locates[${i}].note`)}
                label="Mark left on the ground"
                optional
                hint="“White paint dot on the lawn”, “chalk X on the driveway”."
                error={errorFor(`locates[${i}].note`)}
                className="sm:col-span-2"
              >
                {(c) => <Input className="min-h-11" {...c} {...register(`locates.${i}.note`)} />}
              </Field>
            </div>
          </li>
        ))}
      </ol>
      <Button ref={addRef} variant="secondary" className="min-h-11" onClick={add}>
        {fields.length === 0 ? "Add a locate mark" : "Add another locate mark"}
      </Button>
    </div>
  );
}
