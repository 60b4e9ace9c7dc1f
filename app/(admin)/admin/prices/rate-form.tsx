"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState, type ReactNode } from "react";
import { Controller, useFieldArray, useForm, type Control, type FieldError, type FieldPath, type UseFormRegister } from "react-hook-form";

import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardFooter, CardHeader } from "@/components/ui/card";
import { Checkbox } from "@/components/ui/checkbox";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import { Textarea } from "@/components/ui/textarea";
import type { RateVersionDto } from "@/db/queries/admin-prices";
import { COSTED_METHODS, type RateTable } from "@/lib/engine/rates";
import { METHOD_LABELS } from "@/lib/engine/repair";
import { SURFACE_LABELS, SURFACES } from "@/lib/engine/vocabulary";
import { rateVersionSchema, type RateVersionInput } from "@/lib/validations/admin";

import { sendJson } from "@/lib/api/client";
import { ScaledInput } from "./scaled-input";

export type RatesData = { current: { id: string; table: RateTable }; history: RateVersionDto[] };

type Form = RateVersionInput;
type Name = FieldPath<Form>;

const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

/** zod's wording for a blank number box is for developers; this one is for people. */
function message(error: FieldError | undefined): string | undefined {
  const m = error?.message ?? error?.root?.message;
  if (!m) return undefined;
  return /expected number/.test(m) ? "Enter a number." : /expected/.test(m) ? "Fill this in." : capital(m);
}

const valuesOf = (table: RateTable): Form => ({ table: JSON.parse(JSON.stringify(table)) as RateTable, sourceNote: "" });

/** Server paths ("table.depthBands[1].fromFt") as form names ("table.depthBands.1.fromFt"). */
const formName = (path: string) => path.replace(/\[(\d+)\]/g, ".$1") as Name;

export function RateForm({ current, onSaved }: { current: RateTable; onSaved: (data: RatesData) => void }) {
  const [notice, setNotice] = useState<{ tone: "success" | "danger"; text: string } | null>(null);
  const form = useForm<Form>({ resolver: zodResolver(rateVersionSchema), defaultValues: valuesOf(current) });
  const {
    control,
    register,
    handleSubmit,
    setError,
    reset,
    getFieldState,
    formState: { errors, isSubmitting },
  } = form;
  const bands = useFieldArray({ control, name: "table.depthBands" });
  const err = (name: Name) => message(getFieldState(name, form.formState).error as FieldError | undefined);

  const onSubmit = handleSubmit(
    async (values) => {
      setNotice(null);
      const res = await sendJson<RatesData>("/api/admin/rates", "POST", values);
      if (!res.ok) {
        for (const [key, messages] of Object.entries(res.error.fieldErrors ?? {}))
          setError(formName(key), { type: "server", message: messages[0] });
        return setNotice({ tone: "danger", text: res.error.message });
      }
      reset(valuesOf(res.data.current.table));
      onSaved(res.data);
      setNotice({
        tone: "success",
        text: "New rate table saved. New evaluations use it; reports already delivered keep the rates they were computed with.",
      });
    },
    () => setNotice({ tone: "danger", text: "The rate table has problems: fix the fields marked below." }),
  );

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="rate-form-title" className="space-y-6">
      <Card>
        <CardHeader
          title={<span id="rate-form-title">Repair-cost rates</span>}
          description="What the engine uses to put a cost range on each repair option: amounts per job and per foot, adjusted for depth and for what lies on top. Saving makes a new dated version."
        />
        <CardBody className="grid gap-5 sm:grid-cols-2">
          <Field label="Name of this table" error={err("table.name")} required>
            {(c) => <Input {...c} {...register("table.name")} />}
          </Field>
          <Field label="Rates set on" hint="The day the figures were gathered." error={err("table.effectiveDate")} required>
            {(c) => <Input type="date" {...c} {...register("table.effectiveDate")} />}
          </Field>
          <Field label="Where the figures come from" error={err("table.source")} required className="sm:col-span-2">
            {(c) => <Textarea rows={2} {...c} {...register("table.source")} />}
          </Field>
          <Checkbox label="Demo figures" hint="Invented values for the demo world; reports say so." {...register("table.demo")} />
        </CardBody>
      </Card>

      <Card>
        <CardHeader
          title="Methods"
          as="h3"
          description="Low and high amounts of each repair method. Short work is priced as the minimum footage: a crew costs the same for 1 ft or 4."
        />
        <CardBody className="divide-rule space-y-0 divide-y">
          {COSTED_METHODS.map((m) => (
            <Group key={m} legend={METHOD_LABELS[m]} className="py-4 first:pt-0 last:pb-0">
              <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-5">
                <Money
                  control={control}
                  name={`table.methods.${m}.fixed.lowCents`}
                  label="Per job, low"
                  error={err(`table.methods.${m}.fixed.lowCents`)}
                />
                <Money
                  control={control}
                  name={`table.methods.${m}.fixed.highCents`}
                  label="Per job, high"
                  error={err(`table.methods.${m}.fixed.highCents`)}
                />
                <Money
                  control={control}
                  name={`table.methods.${m}.perFoot.lowCents`}
                  label="Per foot, low"
                  error={err(`table.methods.${m}.perFoot.lowCents`)}
                />
                <Money
                  control={control}
                  name={`table.methods.${m}.perFoot.highCents`}
                  label="Per foot, high"
                  error={err(`table.methods.${m}.perFoot.highCents`)}
                />
                <NumberField
                  register={register}
                  name={`table.methods.${m}.minimumFt`}
                  label="Minimum footage (ft)"
                  error={err(`table.methods.${m}.minimumFt`)}
                  step="0.5"
                />
              </div>
            </Group>
          ))}
          <Group legend="Diameter change inside a lined stretch" className="pt-4">
            <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-5">
              <Money
                control={control}
                name="table.transitionLiner.lowCents"
                label="Added, low"
                error={err("table.transitionLiner.lowCents")}
              />
              <Money
                control={control}
                name="table.transitionLiner.highCents"
                label="Added, high"
                error={err("table.transitionLiner.highCents")}
              />
            </div>
          </Group>
        </CardBody>
      </Card>

      <Card>
        <CardHeader
          title="Depth"
          as="h3"
          description="Multipliers by depth of the pipe, from each band's start down to the next. The first band starts at 0 ft; each one starts deeper than the one before."
        />
        <CardBody className="space-y-4">
          <ol className="space-y-3">
            {bands.fields.map((f, i) => (
              <li key={f.id}>
                <Group legend={`Depth band ${i + 1}`}>
                  <div className="grid items-end gap-4 sm:grid-cols-[repeat(3,minmax(0,1fr))_auto]">
                    <NumberField
                      register={register}
                      name={`table.depthBands.${i}.fromFt`}
                      label="From depth (ft)"
                      error={err(`table.depthBands.${i}.fromFt`)}
                      step="0.5"
                    />
                    <NumberField
                      register={register}
                      name={`table.depthBands.${i}.excavation`}
                      label="Digging multiplier"
                      error={err(`table.depthBands.${i}.excavation`)}
                    />
                    <NumberField
                      register={register}
                      name={`table.depthBands.${i}.trenchless`}
                      label="Trenchless multiplier"
                      error={err(`table.depthBands.${i}.trenchless`)}
                    />
                    <Button variant="ghost" disabled={bands.fields.length === 1} onClick={() => bands.remove(i)} className="mb-0.5">
                      Remove<span className="sr-only"> depth band {i + 1}</span>
                    </Button>
                  </div>
                </Group>
              </li>
            ))}
          </ol>
          <p aria-live="polite" className="text-danger text-sm font-medium empty:hidden">
            {message(errors.table?.depthBands?.root ?? (errors.table?.depthBands as FieldError | undefined))}
          </p>
          <Button
            variant="secondary"
            onClick={() => {
              const last = bands.fields.at(-1);
              bands.append({ fromFt: (last?.fromFt ?? 0) + 2, excavation: last?.excavation ?? 1, trenchless: last?.trenchless ?? 1 });
            }}
          >
            Add a deeper band
          </Button>
        </CardBody>
      </Card>

      <Card>
        <CardHeader
          title="Surface on top"
          as="h3"
          description="Multipliers by what lies over the pipe, and the cost of breaking and restoring it for digging work (permits and traffic control included)."
        />
        <CardBody className="divide-rule divide-y">
          {SURFACES.map((s) => (
            <Group key={s} legend={capital(SURFACE_LABELS[s])} className="py-4 first:pt-0 last:pb-0">
              <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
                <NumberField
                  register={register}
                  name={`table.surfaces.${s}.excavation`}
                  label="Digging multiplier"
                  error={err(`table.surfaces.${s}.excavation`)}
                />
                <NumberField
                  register={register}
                  name={`table.surfaces.${s}.trenchless`}
                  label="Trenchless multiplier"
                  error={err(`table.surfaces.${s}.trenchless`)}
                />
                <Money
                  control={control}
                  name={`table.surfaces.${s}.restoration.lowCents`}
                  label="Restoration, low"
                  error={err(`table.surfaces.${s}.restoration.lowCents`)}
                />
                <Money
                  control={control}
                  name={`table.surfaces.${s}.restoration.highCents`}
                  label="Restoration, high"
                  error={err(`table.surfaces.${s}.restoration.highCents`)}
                />
              </div>
            </Group>
          ))}
        </CardBody>
      </Card>

      <Card>
        <CardHeader title="When the record is silent" as="h3" />
        <CardBody className="grid gap-5 sm:grid-cols-2">
          <NumberField
            register={register}
            name="table.assumedDepthFt"
            label="Depth assumed without a locate mark (ft)"
            error={err("table.assumedDepthFt")}
            step="0.5"
          />
          <Field label="Surface assumed without a locate mark" error={err("table.assumedSurface")} required>
            {(c) => (
              <Select {...c} {...register("table.assumedSurface")}>
                {SURFACES.map((s) => (
                  <option key={s} value={s}>
                    {capital(SURFACE_LABELS[s])}
                  </option>
                ))}
              </Select>
            )}
          </Field>
          <Field
            label="Note on this change"
            optional
            hint="Why the rates changed: bids gathered, a city's guidance."
            error={err("sourceNote")}
            className="sm:col-span-2"
          >
            {(c) => <Input {...c} {...register("sourceNote")} />}
          </Field>
        </CardBody>
        <CardFooter className="justify-between">
          <div aria-live="polite" className="min-w-0 flex-1">
            {notice ? (
              <Alert tone={notice.tone} role={null}>
                {notice.text}
              </Alert>
            ) : null}
          </div>
          <Button type="submit" pending={isSubmitting}>
            Save as a new rate table
          </Button>
        </CardFooter>
      </Card>
    </form>
  );
}

function Group({ legend, className, children }: { legend: string; className?: string; children: ReactNode }) {
  return (
    <fieldset className={className}>
      <legend className="mb-3 font-semibold">{legend}</legend>
      {children}
    </fieldset>
  );
}

function Money({ control, name, label, error }: { control: Control<Form>; name: Name; label: string; error?: string }) {
  return (
    <Field label={`${label} ($)`} error={error} required>
      {(c) => (
        <Controller
          control={control}
          name={name}
          render={({ field }) => (
            <ScaledInput
              {...c}
              unit="dollars"
              value={field.value as number}
              onChange={field.onChange}
              onBlur={field.onBlur}
              name={field.name}
              ref={field.ref}
            />
          )}
        />
      )}
    </Field>
  );
}

function NumberField({
  register,
  name,
  label,
  error,
  step = "0.01",
}: {
  register: UseFormRegister<Form>;
  name: Name;
  label: string;
  error?: string;
  step?: string;
}) {
  return (
    <Field label={label} error={error} required>
      {(c) => (
        <Input type="number" inputMode="decimal" step={step} min="0" className="num" {...c} {...register(name, { valueAsNumber: true })} />
      )}
    </Field>
  );
}
