"use client";

import clsx from "clsx";
import type { ReactNode } from "react";
import { Controller, useFormContext, type FieldPath } from "react-hook-form";

import { Field, Fieldset } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import { SEVERITY_LABELS, type Severity } from "@/components/ui/severity-badge";

import type { WorkspaceForm } from "./draft-record";
import { fieldId, recordPath } from "./problem-fields";
import { useWorkspace } from "./workspace-context";

export type FormPath = FieldPath<WorkspaceForm>;

const UNIT_WORDS: Record<string, string> = { ft: "feet", "%": "percent", s: "seconds" };

/** A number typed in the field, in mono, with its unit shown inside the box and spoken in the label. */
export function NumberField({
  name,
  label,
  unit,
  step = 0.1,
  min = 0,
  max,
  hint,
  optional,
  className,
}: {
  name: FormPath;
  label: string;
  unit: string;
  step?: number;
  min?: number;
  max?: number;
  hint?: ReactNode;
  optional?: boolean;
  className?: string;
}) {
  const { register } = useFormContext<WorkspaceForm>();
  const path = recordPath(name);
  const error = useWorkspace().errorFor(path);
  return (
    <Field
      id={fieldId(path)}
      label={
        <>
          {label}
          <span className="sr-only"> ({UNIT_WORDS[unit] ?? unit})</span>
        </>
      }
      hint={hint}
      error={error}
      optional={optional}
      className={className}
    >
      {(control) => (
        <div className="relative">
          <Input
            type="number"
            inputMode="decimal"
            step={step}
            min={min}
            max={max}
            className="num min-h-11 pr-10"
            {...control}
            {...register(name)}
          />
          <span aria-hidden="true" className="num text-ink-2 pointer-events-none absolute top-1/2 right-3 -translate-y-1/2 text-sm">
            {unit}
          </span>
        </div>
      )}
    </Field>
  );
}

export function SelectField({
  name,
  label,
  children,
  hint,
  optional,
  className,
}: {
  name: FormPath;
  label: string;
  children: ReactNode;
  hint?: ReactNode;
  optional?: boolean;
  className?: string;
}) {
  const { register } = useFormContext<WorkspaceForm>();
  const path = recordPath(name);
  const error = useWorkspace().errorFor(path);
  return (
    <Field id={fieldId(path)} label={label} hint={hint} error={error} optional={optional} className={className}>
      {(control) => (
        <Select className="min-h-11" {...control} {...register(name)}>
          {children}
        </Select>
      )}
    </Field>
  );
}

/** A set of radios drawn as large tap targets. */
export function ChoiceField<T extends string>({
  name,
  legend,
  options,
  hint,
  columns = "sm:grid-cols-2",
}: {
  name: FormPath;
  legend: string;
  options: readonly { value: T; label: ReactNode; hint?: ReactNode }[];
  hint?: ReactNode;
  columns?: string;
}) {
  const { register } = useFormContext<WorkspaceForm>();
  const path = recordPath(name);
  const error = useWorkspace().errorFor(path);
  return (
    <Fieldset legend={legend} hint={hint} error={error}>
      <div className={clsx("grid gap-2", columns)}>
        {options.map((o, i) => (
          <label
            key={o.value}
            className="border-rule-strong has-[:checked]:border-teal has-[:focus-visible]:outline-teal flex min-h-12 cursor-pointer items-start gap-3 rounded-md border bg-white px-3 py-2.5 has-[:checked]:bg-teal-50 has-[:focus-visible]:outline-2"
          >
            <input
              type="radio"
              value={o.value}
              id={i === 0 ? fieldId(path) : undefined}
              className="accent-teal mt-0.5 size-4.5 shrink-0"
              {...register(name)}
            />
            <span className="text-[0.9375rem]">
              {o.label}
              {o.hint ? <span className="text-ink-2 block text-sm">{o.hint}</span> : null}
            </span>
          </label>
        ))}
      </div>
    </Fieldset>
  );
}

const GRADE_STYLES: Record<Severity, string> = {
  1: "border-sev-1/40 text-sev-1 has-[:checked]:bg-sev-1 has-[:checked]:text-white",
  2: "border-sev-2/40 text-sev-2 has-[:checked]:bg-sev-2 has-[:checked]:text-white",
  3: "border-sev-3/40 text-sev-3 has-[:checked]:bg-sev-3 has-[:checked]:text-white",
  4: "border-sev-4/40 text-sev-4 has-[:checked]:bg-sev-4 has-[:checked]:text-white",
  5: "border-sev-5/40 text-sev-5 has-[:checked]:bg-sev-5 has-[:checked]:text-white",
};

/** Grade 1 (sound) to 5 (worst) in the severity colours, each with its number and word. */
export function GradePicker({ name }: { name: FormPath }) {
  const { register } = useFormContext<WorkspaceForm>();
  const path = recordPath(name);
  const error = useWorkspace().errorFor(path);
  return (
    <Fieldset legend="Grade" hint="1 is sound, 5 is the worst." error={error}>
      <div className="grid grid-cols-5 gap-1.5">
        {([1, 2, 3, 4, 5] as const).map((g) => (
          <label
            key={g}
            className={clsx(
              "has-[:focus-visible]:outline-ink flex min-h-12 cursor-pointer flex-col items-center justify-center rounded-md border bg-white px-1 py-1 has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-offset-2",
              GRADE_STYLES[g],
            )}
          >
            <input type="radio" value={String(g)} id={g === 1 ? fieldId(path) : undefined} className="sr-only" {...register(name)} />
            <span className="num text-base leading-none font-semibold">{g}</span>
            <span className="mt-0.5 text-[0.6875rem] leading-tight font-medium">{SEVERITY_LABELS[g]}</span>
          </label>
        ))}
      </div>
    </Fieldset>
  );
}

const HOURS = [12, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11] as const;
const HOUR_WORDS: Partial<Record<number, string>> = { 12: "12 (top)", 3: "3 (right)", 6: "6 (bottom)", 9: "9 (left)" };

/** The clock position as one hour or a range of hours, looking downstream. */
export function ClockPicker({ name }: { name: FormPath }) {
  const { control } = useFormContext<WorkspaceForm>();
  const path = recordPath(name);
  const error = useWorkspace().errorFor(path);
  return (
    <Controller
      control={control}
      name={name}
      render={({ field }) => {
        const [from = "", to = ""] = String(field.value ?? "").split("-");
        const set = (f: string, t: string) => field.onChange(f === "" ? "" : t === "" || t === f ? f : `${f}-${t}`);
        return (
          <Fieldset
            legend="Clock position"
            hint="Looking downstream; 12 is the top of the pipe. Leave the second hour empty for one position."
            error={error}
          >
            <div className="grid grid-cols-2 gap-2">
              <Field id={fieldId(path)} label="At or from" optional>
                {(c) => (
                  <Select className="num min-h-11" {...c} value={from} onChange={(e) => set(e.target.value, to)} onBlur={field.onBlur}>
                    <option value="">Not recorded</option>
                    {HOURS.map((h) => (
                      <option key={h} value={String(h)}>
                        {HOUR_WORDS[h] ?? h}
                      </option>
                    ))}
                  </Select>
                )}
              </Field>
              <Field label="To" optional>
                {(c) => (
                  <Select
                    className="num min-h-11"
                    {...c}
                    value={to}
                    disabled={from === ""}
                    onChange={(e) => set(from, e.target.value)}
                    onBlur={field.onBlur}
                  >
                    <option value="">One position</option>
                    {HOURS.map((h) => (
                      <option key={h} value={String(h)}>
                        {HOUR_WORDS[h] ?? h}
                      </option>
                    ))}
                  </Select>
                )}
              </Field>
            </div>
          </Fieldset>
        );
      }}
    />
  );
}
