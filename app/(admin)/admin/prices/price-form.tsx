"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { Controller, useForm, type Control } from "react-hook-form";

import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardFooter, CardHeader } from "@/components/ui/card";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { formatMoney } from "@/components/ui/money";
import type { PriceVersionDto } from "@/db/queries/admin-prices";
import type { Prices } from "@/lib/pricing-defaults";
import { priceVersionSchema, type PriceVersionInput } from "@/lib/validations/admin";

import { sendJson } from "@/lib/api/client";
import { ScaledInput } from "./scaled-input";

export type PricesData = { current: Prices & { id: string | null }; history: PriceVersionDto[] };

type Key = Exclude<keyof PriceVersionInput, "sourceNote" | "reuseFreshDays">;

const FIELDS: { name: Key; label: string; hint: string; unit: "dollars" | "percent" }[] = [
  { name: "baseCents", label: "Base price", hint: "One building sewer, known cleanout, a normal deadline.", unit: "dollars" },
  {
    name: "noCleanoutCents",
    label: "No known cleanout",
    hint: "Added when the inspector must pull a toilet or go in by a roof vent.",
    unit: "dollars",
  },
  { name: "rushCents", label: "Rush", hint: "Added when the contingency deadline is under 48 hours away.", unit: "dollars" },
  { name: "extraSewerCents", label: "Each extra building sewer", hint: "Added per sewer beyond the first.", unit: "dollars" },
  {
    name: "platformFeeBps",
    label: "Platform fee",
    hint: "Share of each scope's price Gradeline keeps; the inspector is paid the rest.",
    unit: "percent",
  },
  {
    name: "reuseCents",
    label: "Report reuse price",
    hint: "What a later buyer of the listing pays to unlock a fresh report.",
    unit: "dollars",
  },
  {
    name: "reuseInspectorShareBps",
    label: "Inspector's share of a reuse",
    hint: "Share of the reuse price paid to the inspector who did the visit.",
    unit: "percent",
  },
];

const valuesOf = (p: Prices): PriceVersionInput => ({
  baseCents: p.baseCents,
  noCleanoutCents: p.noCleanoutCents,
  rushCents: p.rushCents,
  extraSewerCents: p.extraSewerCents,
  reuseCents: p.reuseCents,
  platformFeeBps: p.platformFeeBps,
  reuseInspectorShareBps: p.reuseInspectorShareBps,
  reuseFreshDays: p.reuseFreshDays,
  sourceNote: "",
});

export function PriceForm({ current, onSaved }: { current: Prices; onSaved: (data: PricesData) => void }) {
  const [notice, setNotice] = useState<{ tone: "success" | "danger"; text: string } | null>(null);
  const {
    control,
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting, isDirty },
  } = useForm<PriceVersionInput>({ resolver: zodResolver(priceVersionSchema), defaultValues: valuesOf(current) });

  const onSubmit = handleSubmit(
    async (values) => {
      setNotice(null);
      if (!isDirty) return setNotice({ tone: "danger", text: "Nothing changed: edit a price before saving a new version." });
      const res = await sendJson<PricesData>("/api/admin/prices", "POST", values);
      if (!res.ok) {
        for (const [key, messages] of Object.entries(res.error.fieldErrors ?? {}))
          setError(key as keyof PriceVersionInput, { type: "server", message: messages[0] });
        return setNotice({ tone: "danger", text: res.error.message });
      }
      reset(valuesOf(res.data.current));
      onSaved(res.data);
      setNotice({
        tone: "success",
        text: `New prices saved: a scope now starts at ${formatMoney(res.data.current.baseCents)}. Orders already placed keep the price they were quoted.`,
      });
    },
    () => setNotice({ tone: "danger", text: "Some prices have problems: fix the fields marked below." }),
  );

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="price-form-title">
      <Card>
        <CardHeader
          title={<span id="price-form-title">Prices</span>}
          description="The market's scope price, add-ons, platform fee and report reuse terms. Saving makes a new dated version; orders placed before keep their price."
        />
        <CardBody className="grid gap-5 sm:grid-cols-2">
          {FIELDS.map((f) => (
            <MoneyField key={f.name} control={control} {...f} error={errors[f.name]?.message} />
          ))}
          <Field
            label="Report reuse freshness (days)"
            hint="How long after the visit a later buyer of the listing may unlock the report at the reuse price."
            error={errors.reuseFreshDays?.message}
            required
          >
            {(c) => (
              <Input
                {...c}
                inputMode="numeric"
                autoComplete="off"
                className="num"
                {...register("reuseFreshDays", { valueAsNumber: true })}
              />
            )}
          </Field>
          <Field
            label="Note on this change"
            optional
            hint="Why the prices changed, or where the figures come from."
            error={errors.sourceNote?.message}
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
            Save new prices
          </Button>
        </CardFooter>
      </Card>
    </form>
  );
}

function MoneyField({
  control,
  name,
  label,
  hint,
  unit,
  error,
}: {
  control: Control<PriceVersionInput>;
  name: Key;
  label: string;
  hint: string;
  unit: "dollars" | "percent";
  error?: string;
}) {
  return (
    <Field label={`${label} (${unit === "dollars" ? "$" : "%"})`} hint={hint} error={error} required>
      {(c) => (
        <Controller
          control={control}
          name={name}
          render={({ field }) => (
            <ScaledInput
              {...c}
              unit={unit}
              value={field.value}
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
