"use client";

import { useFormContext } from "react-hook-form";

import { ChoiceField, NumberField } from "./controls";
import type { WorkspaceForm } from "./draft-record";

/** Where the owner's part of the line ends and the city's begins. */
export function BoundaryEditor() {
  const { watch } = useFormContext<WorkspaceForm>();
  const known = watch("boundary.known") === "yes";
  return (
    <div className="space-y-4">
      <ChoiceField<"yes" | "unknown">
        name="boundary.known"
        legend="Where the public side begins"
        hint="At the property line, the curb or the main, depending on the city."
        options={[
          { value: "yes", label: "At a footage I can give" },
          { value: "unknown", label: "Unknown", hint: "The whole line is treated as the owner's" },
        ]}
      />
      {known ? <NumberField name="boundary.at" label="Public side begins at" unit="ft" className="max-w-64" /> : null}
    </div>
  );
}
