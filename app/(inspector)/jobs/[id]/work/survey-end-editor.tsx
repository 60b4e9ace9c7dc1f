"use client";

import type { SurveyEndReason } from "@/lib/engine/vocabulary";

import { ChoiceField, NumberField } from "./controls";

const REASONS: { value: SurveyEndReason; label: string; hint?: string }[] = [
  { value: "reached_main", label: "Reached the main" },
  { value: "blocked", label: "Blocked", hint: "Something in the line stopped the camera" },
  { value: "could_not_pass", label: "Camera could not pass", hint: "A collapse, a sharp bend, a big offset" },
  { value: "cable_end", label: "Cable ran out" },
  { value: "other", label: "Other reason", hint: "Say why in the narrative" },
];

/** Where and why the survey ended: the end of the footage the segments must cover. */
export function SurveyEndEditor() {
  return (
    <div className="space-y-4">
      <NumberField
        name="surveyEnd.at"
        label="Survey ended at"
        unit="ft"
        hint="Counter footage from the access point."
        className="max-w-64"
      />
      <ChoiceField<SurveyEndReason> name="surveyEnd.reason" legend="Why it ended" options={REASONS} />
    </div>
  );
}
