"use client";

import { useRef } from "react";
import { useFieldArray, useFormContext } from "react-hook-form";

import { Button } from "@/components/ui/button";
import { MATERIAL_LABELS, MATERIALS } from "@/lib/engine/vocabulary";

import { SizeOptions } from "./access-editor";
import { NumberField, SelectField } from "./controls";
import { emptySegment, parseNumber, type WorkspaceForm } from "./draft-record";
import { fieldId } from "./problem-fields";
import { useWorkspace } from "./workspace-context";

const ft = (s: string) => {
  const n = parseNumber(s);
  return n === undefined ? "…" : n.toFixed(1);
};

/** Segments tile the line: each starts where the one before it ends, so only the ends are typed. */
export function SegmentsEditor() {
  const { control, watch, setValue } = useFormContext<WorkspaceForm>();
  const { fields, append, remove } = useFieldArray({ control, name: "segments" });
  const { errorFor } = useWorkspace();
  const addRef = useRef<HTMLButtonElement>(null);
  const segments = watch("segments");
  const end = watch("surveyEnd.at");
  const last = segments.length - 1;
  const lastTo = last >= 0 ? segments[last].to : "";
  const endNumber = parseNumber(end);
  const canRunToEnd = endNumber !== undefined && last >= 0 && parseNumber(lastTo) !== endNumber;
  const listError = errorFor("segments");

  function add() {
    append(emptySegment(), { shouldFocus: false });
    requestAnimationFrame(() => document.getElementById(fieldId(`segments[${fields.length}].to`))?.focus());
  }

  return (
    <div className="space-y-4">
      <p className="text-ink-2 text-sm">
        Add a segment wherever the material or the diameter changes. The last one ends where the survey ended.
      </p>
      {listError ? (
        <p className="text-danger text-sm font-medium" id={fieldId("segments")} tabIndex={-1}>
          {listError}
        </p>
      ) : null}
      <ol className="space-y-3">
        {fields.map((f, i) => {
          const fromError = errorFor(`segments[${i}].from`);
          return (
            <li key={f.id} className="border-rule bg-paper/60 rounded-md border p-3">
              <div className="mb-3 flex items-center justify-between gap-3">
                <h3 className="font-sans text-[0.9375rem] font-semibold">
                  Segment {i + 1}{" "}
                  <span className="text-ink-2 font-normal">
                    from <span className="num">{i === 0 ? "0.0" : ft(segments[i - 1]?.to ?? "")} ft</span>
                  </span>
                </h3>
                <Button
                  variant="ghost"
                  className="min-h-11"
                  onClick={() => {
                    remove(i);
                    addRef.current?.focus();
                  }}
                  aria-label={`Remove segment ${i + 1}`}
                >
                  Remove
                </Button>
              </div>
              {fromError ? (
                <p className="text-danger mb-2 text-sm font-medium" id={fieldId(`segments[${i}].from`)} tabIndex={-1}>
                  {fromError}
                </p>
              ) : null}
              <div className="grid gap-3 sm:grid-cols-3">
                <NumberField name={`segments.${i}.to`} label="Ends at" unit="ft" />
                <SelectField name={`segments.${i}.material`} label="Material">
                  <option value="">Choose…</option>
                  {MATERIALS.map((m) => (
                    <option key={m} value={m}>
                      {MATERIAL_LABELS[m].charAt(0).toUpperCase() + MATERIAL_LABELS[m].slice(1)}
                    </option>
                  ))}
                </SelectField>
                <SelectField name={`segments.${i}.diameterIn`} label="Diameter">
                  <SizeOptions current={segments[i]?.diameterIn ?? ""} />
                </SelectField>
              </div>
            </li>
          );
        })}
      </ol>
      <div className="flex flex-wrap gap-2">
        <Button ref={addRef} variant="secondary" className="min-h-11" onClick={add}>
          {fields.length === 0 ? "Add the first segment" : "Add a segment"}
        </Button>
        {canRunToEnd ? (
          <Button variant="ghost" className="min-h-11" onClick={() => setValue(`segments.${last}.to`, end, { shouldDirty: true })}>
            End segment {last + 1} at the survey end (<span className="num">{endNumber.toFixed(1)} ft</span>)
          </Button>
        ) : null}
      </div>
    </div>
  );
}
