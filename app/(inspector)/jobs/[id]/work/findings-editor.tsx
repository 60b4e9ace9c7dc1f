"use client";

import { useRef } from "react";
import { useFieldArray, useFormContext } from "react-hook-form";

import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { SeverityBadge } from "@/components/ui/severity-badge";
import { Textarea } from "@/components/ui/textarea";
import { FINDING_TYPES, type FindingType } from "@/lib/engine/finding-types";

import { ClockPicker, GradePicker, NumberField, SelectField } from "./controls";
import { emptyFinding, shareKind, type WorkspaceForm } from "./draft-record";
import { fieldId } from "./problem-fields";
import { useWorkspace } from "./workspace-context";

const TYPE_IDS = Object.keys(FINDING_TYPES) as FindingType[];
const GROUPS = [
  { group: "structural", label: "The pipe itself" },
  { group: "service", label: "In or entering the pipe" },
] as const;

const SHARE_FIELDS = {
  area: { label: "Share of the cross-section lost", hint: "How much of the opening is taken up." },
  diameter: { label: "Diameter reduced by", hint: "How far the pipe is squashed out of round." },
  water: { label: "Standing water depth", hint: "As a share of the diameter; 0 when the sag holds none." },
} as const;

/** Where the footage of a finding came from, when it was proposed from a clip. */
export type FootageProposal = { text: string };

export const proposalKey = (clipId: string, second: string) => `${clipId}@${second}`;

export function FindingsEditor({ proposals }: { proposals: Map<string, FootageProposal> }) {
  const { control, register, watch } = useFormContext<WorkspaceForm>();
  const { fields, append, remove } = useFieldArray({ control, name: "findings" });
  const { errorFor, readyClips, setActiveFinding } = useWorkspace();
  const addRef = useRef<HTMLButtonElement>(null);
  const findings = watch("findings");

  function add() {
    append(emptyFinding(), { shouldFocus: false });
    requestAnimationFrame(() => document.getElementById(fieldId(`findings[${fields.length}].type`))?.focus());
  }

  return (
    <div className="space-y-4">
      <p className="text-ink-2 text-sm">
        One entry per defect. Give an end footage for a defect that runs along the pipe. While watching a clip, “Add a finding here” fills
        in the clip, the second and a proposed footage.
      </p>
      <ol className="space-y-3">
        {fields.map((f, i) => {
          const v = findings[i] ?? emptyFinding();
          const share = shareKind(v.type);
          const proposal = v.clipId ? proposals.get(proposalKey(v.clipId, v.second)) : undefined;
          const grade = Number(v.grade);
          return (
            <li
              key={f.id}
              id={`finding-${i}`}
              className="border-rule bg-paper/60 rounded-md border p-3"
              onFocusCapture={() => setActiveFinding(i)}
            >
              <div className="mb-3 flex flex-wrap items-center justify-between gap-2">
                <h3 className="flex flex-wrap items-center gap-2 font-sans text-[0.9375rem] font-semibold">
                  Finding {i + 1}
                  {v.type ? <span className="text-ink-2 font-normal">{FINDING_TYPES[v.type].label}</span> : null}
                  {grade >= 1 && grade <= 5 ? <SeverityBadge severity={grade} size="sm" /> : null}
                </h3>
                <Button
                  variant="ghost"
                  className="min-h-11"
                  aria-label={`Remove finding ${i + 1}`}
                  onClick={() => {
                    remove(i);
                    setActiveFinding(null);
                    addRef.current?.focus();
                  }}
                >
                  Remove
                </Button>
              </div>
              {proposal ? (
                <Alert tone="info" title="Footage proposed from the clip" className="mb-3">
                  {proposal.text}
                </Alert>
              ) : null}
              <div className="grid gap-3 sm:grid-cols-2">
                <SelectField name={`findings.${i}.type`} label="Type" className="sm:col-span-2">
                  <option value="">Choose…</option>
                  {GROUPS.map((g) => (
                    <optgroup key={g.group} label={g.label}>
                      {TYPE_IDS.filter((t) => FINDING_TYPES[t].group === g.group).map((t) => (
                        <option key={t} value={t}>
                          {FINDING_TYPES[t].label}
                        </option>
                      ))}
                    </optgroup>
                  ))}
                </SelectField>
                <NumberField name={`findings.${i}.at`} label="Footage" unit="ft" hint="Where it starts." />
                <NumberField name={`findings.${i}.to`} label="Ends at" unit="ft" optional hint="For a defect that runs along the pipe." />
                <div className="sm:col-span-2">
                  <GradePicker name={`findings.${i}.grade`} />
                </div>
                <div className="sm:col-span-2">
                  <ClockPicker name={`findings.${i}.clock`} />
                </div>
                {share ? (
                  <NumberField
                    name={share === "water" ? `findings.${i}.waterDepthPct` : `findings.${i}.lossPct`}
                    label={SHARE_FIELDS[share].label}
                    unit="%"
                    step={1}
                    max={100}
                    hint={SHARE_FIELDS[share].hint}
                    optional={share !== "water"}
                  />
                ) : null}
                <SelectField name={`findings.${i}.clipId`} label="Clip" optional className={share ? undefined : "sm:col-start-1"}>
                  <option value="">No clip</option>
                  {readyClips.map((c) => (
                    <option key={c.id} value={c.id}>
                      {c.label}
                    </option>
                  ))}
                  {v.clipId && !readyClips.some((c) => c.id === v.clipId) ? (
                    <option value={v.clipId}>A clip that is not ready</option>
                  ) : null}
                </SelectField>
                {v.clipId ? <NumberField name={`findings.${i}.second`} label="Second in the clip" unit="s" optional /> : null}
                {v.stillId ? <p className="text-ink-2 self-end text-sm sm:col-span-2">A still frame from the clip is attached.</p> : null}
                <Field
                  id={fieldId(`findings[${i}].note`)}
                  label="Note"
                  optional
                  error={errorFor(`findings[${i}].note`)}
                  className="sm:col-span-2"
                >
                  {(c) => <Textarea rows={2} {...c} {...register(`findings.${i}.note`)} />}
                </Field>
              </div>
            </li>
          );
        })}
      </ol>
      <Button ref={addRef} variant="secondary" className="min-h-11" onClick={add}>
        {fields.length === 0 ? "Add a finding" : "Add another finding"}
      </Button>
    </div>
  );
}
