"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useDeferredValue, useId, useState, type Ref } from "react";
import { Controller, useFieldArray, useForm, useWatch, type FieldError, type FieldPath } from "react-hook-form";
import useSWR from "swr";
import type { z } from "zod";

import { useNow } from "@/components/countdown";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { Checkbox } from "@/components/ui/checkbox";
import { Field, Fieldset } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { Money } from "@/components/ui/money";
import { Select } from "@/components/ui/select";
import { Textarea } from "@/components/ui/textarea";
import { formatDate } from "@/lib/format";
import type { OrderDto } from "@/lib/orders/dto";
import { DEFAULT_TIME_ZONE, isoToZonedLocal, rezoneIso, US_TIME_ZONES, zonedLocalToIso } from "@/lib/time-zones";
import { createOrderSchema, OCCUPANCIES, OCCUPANCY_LABELS, PROPERTY_TYPE_LABELS, PROPERTY_TYPES } from "@/lib/validations/orders";
import { postJson } from "@/lib/api/client";

type FormIn = z.input<typeof createOrderSchema>;
type FormOut = z.output<typeof createOrderSchema>;
/** A listing's fresh report that the next buyer can unlock instead of a new visit (report reuse). */
type FreshReport = { orderId: string; visitedOn: string; inspectorName: string | null; priceCents: number };
type Quote = { served: boolean; lines: { label: string; cents: number }[]; priceCents: number; inspectorPayoutCents: number; reuse: FreshReport | null };

const optionalText = { setValueAs: (v: unknown) => (typeof v === "string" && v.trim() === "" ? undefined : v) };

const TOP_LEVEL = new Set(Object.keys(createOrderSchema.shape));

/** Server paths ("visitWindows[0].start") as form paths ("visitWindows.0.start"). */
const toFormPath = (key: string) => key.replace(/\[(\d+)\]/g, ".$1");

/** Zod's format errors are for programs; people typing a date get plain words. */
function plain(error: FieldError | undefined, whenMissing: string): string | undefined {
  if (!error) return undefined;
  return error.type === "invalid_format" || error.type === "invalid_type" ? whenMissing : error.message;
}

async function fetchQuote([, street, postalCode, cleanoutKnown, buildingSewers, deadline]: readonly [string, string, string, boolean, number, string]) {
  const res = await postJson<Quote>("/api/orders/quote", { ...(street ? { address: { street } } : {}), postalCode, cleanoutKnown, buildingSewers, deadline });
  if (!res.ok) throw new Error(res.error.message);
  return res.data;
}

function DeadlineInputs({
  value,
  timeZone,
  onChange,
  inputRef,
  error,
}: {
  value: string;
  timeZone: string;
  onChange: (iso: string) => void;
  inputRef: Ref<HTMLInputElement>;
  error?: string;
}) {
  const id = useId();
  const [draft, setDraft] = useState(() => isoToZonedLocal(value, timeZone) ?? { date: "", time: "" });
  const update = (next: typeof draft) => {
    setDraft(next);
    onChange(zonedLocalToIso(next.date, next.time, timeZone) ?? "");
  };
  const a11y = { "aria-invalid": error ? true : undefined, "aria-describedby": `${id}-hint${error ? ` ${id}-err` : ""}` } as const;
  return (
    <fieldset className="space-y-2">
      <legend className="text-sm font-medium text-ink">Inspection contingency deadline</legend>
      <p id={`${id}-hint`} className="-mt-1 text-sm text-ink-2">
        The last moment the buyer can act on the inspection, from the purchase agreement.
      </p>
      <div className="grid grid-cols-2 gap-3 sm:max-w-md">
        <div className="space-y-1.5">
          <label htmlFor={`${id}-d`} className="text-sm text-ink-2">
            Date
          </label>
          <Input id={`${id}-d`} ref={inputRef} type="date" value={draft.date} onChange={(e) => update({ ...draft, date: e.target.value })} {...a11y} />
        </div>
        <div className="space-y-1.5">
          <label htmlFor={`${id}-t`} className="text-sm text-ink-2">
            Time
          </label>
          <Input id={`${id}-t`} type="time" value={draft.time} onChange={(e) => update({ ...draft, time: e.target.value })} {...a11y} />
        </div>
      </div>
      <p id={`${id}-err`} aria-live="polite" className="text-sm font-medium text-danger empty:hidden">
        {error}
      </p>
    </fieldset>
  );
}

function WindowInputs({
  value,
  timeZone,
  onChange,
  inputRef,
  index,
  errors,
  onRemove,
}: {
  value: { start: string; end: string };
  timeZone: string;
  onChange: (w: { start: string; end: string }) => void;
  inputRef: Ref<HTMLInputElement>;
  index: number;
  errors?: { start?: FieldError; end?: FieldError };
  onRemove?: () => void;
}) {
  const id = useId();
  const [draft, setDraft] = useState(() => {
    const s = isoToZonedLocal(value.start, timeZone);
    const e = isoToZonedLocal(value.end, timeZone);
    return { date: s?.date ?? "", from: s?.time ?? "", to: e?.time ?? "" };
  });
  const update = (next: typeof draft) => {
    setDraft(next);
    onChange({ start: zonedLocalToIso(next.date, next.from, timeZone) ?? "", end: zonedLocalToIso(next.date, next.to, timeZone) ?? "" });
  };
  const message = plain(errors?.start, "Enter the day and both times of this window.") ?? plain(errors?.end, "Enter the time this window ends.");
  const a11y = { "aria-invalid": message ? true : undefined, "aria-describedby": message ? `${id}-err` : undefined } as const;
  return (
    <li className="rounded-md border border-rule bg-paper/60 p-3">
      <fieldset>
        <legend className="text-sm font-medium text-ink">Window {index + 1}</legend>
        <div className="mt-2 grid grid-cols-2 gap-3 sm:grid-cols-[1.4fr_1fr_1fr_auto] sm:items-end">
          <div className="col-span-2 space-y-1.5 sm:col-span-1">
            <label htmlFor={`${id}-d`} className="text-sm text-ink-2">
              Day
            </label>
            <Input id={`${id}-d`} ref={inputRef} type="date" value={draft.date} onChange={(e) => update({ ...draft, date: e.target.value })} {...a11y} />
          </div>
          <div className="space-y-1.5">
            <label htmlFor={`${id}-f`} className="text-sm text-ink-2">
              From
            </label>
            <Input id={`${id}-f`} type="time" value={draft.from} onChange={(e) => update({ ...draft, from: e.target.value })} {...a11y} />
          </div>
          <div className="space-y-1.5">
            <label htmlFor={`${id}-t`} className="text-sm text-ink-2">
              Until
            </label>
            <Input id={`${id}-t`} type="time" value={draft.to} onChange={(e) => update({ ...draft, to: e.target.value })} {...a11y} />
          </div>
          {onRemove ? (
            <Button variant="ghost" size="md" className="col-span-2 justify-self-start sm:col-span-1" onClick={onRemove}>
              Remove<span className="sr-only"> window {index + 1}</span>
            </Button>
          ) : null}
        </div>
        <p id={`${id}-err`} aria-live="polite" className="mt-2 text-sm font-medium text-danger empty:hidden">
          {message}
        </p>
      </fieldset>
    </li>
  );
}

type PriceBoxProps = {
  street: string;
  postalCode: string;
  cleanoutKnown: boolean;
  buildingSewers: number;
  deadline: string;
  timeZone: string;
  /** Orders the fresh report for the buyer instead of a new visit. */
  onReuse: (report: FreshReport) => void;
  reusing: boolean;
};

function PriceBox({ street, postalCode, cleanoutKnown, buildingSewers, deadline, timeZone, onReuse, reusing }: PriceBoxProps) {
  const ready = /^\d{5}$/.test(postalCode.trim()) && deadline !== "";
  const typedStreet = useDeferredValue(street.trim());
  const key = ready ? (["quote", typedStreet, postalCode.trim(), cleanoutKnown, buildingSewers, deadline] as const) : null;
  const { data, error, isLoading } = useSWR(key, fetchQuote, {
    keepPreviousData: true,
    revalidateOnFocus: false,
  });
  const now = useNow();
  const passed = deadline !== "" && now !== null && Date.parse(deadline) <= now;
  return (
    <Card aria-labelledby="price-heading">
      <header className="border-b border-rule px-5 py-4">
        <h2 id="price-heading" className="text-lg font-semibold">
          Price
        </h2>
        <p className="text-sm text-ink-2">Paid by the buyer when they unlock the report.</p>
      </header>
      <CardBody aria-live="polite" aria-busy={isLoading || undefined} className="space-y-3">
        {!ready ? (
          <p className="text-sm text-ink-2">Enter the postal code and the deadline to see the price.</p>
        ) : error && !data ? (
          <p className="text-sm text-danger">{error instanceof Error ? error.message : "The price could not be worked out."}</p>
        ) : data ? (
          <>
            <dl className="space-y-1.5 text-[0.9375rem]">
              {data.lines.map((l) => (
                <div key={l.label} className="flex items-baseline justify-between gap-4">
                  <dt className="text-ink-2">{l.label}</dt>
                  <dd>
                    <Money cents={l.cents} />
                  </dd>
                </div>
              ))}
              <div className="flex items-baseline justify-between gap-4 border-t border-rule pt-2 font-semibold">
                <dt>Total</dt>
                <dd>
                  <Money cents={data.priceCents} className="text-lg" />
                </dd>
              </div>
            </dl>
            {data.reuse ? (
              <section aria-labelledby="reuse-heading" className="space-y-2 rounded-md border border-rule bg-paper p-3">
                <h3 id="reuse-heading" className="font-semibold">
                  This listing already has a fresh report
                </h3>
                <p className="text-sm">
                  Filmed on <span className="num">{formatDate(data.reuse.visitedOn, timeZone)}</span>
                  {data.reuse.inspectorName ? ` by ${data.reuse.inspectorName}` : ""}. Instead of a new visit, the buyer can unlock it for{" "}
                  <Money cents={data.reuse.priceCents} />; its findings stay locked until they pay, and the first buyer&apos;s details are never shown.
                </p>
                <Button type="button" variant="secondary" size="sm" pending={reusing} onClick={() => onReuse(data.reuse!)}>
                  {reusing ? "Ordering the report…" : "Offer this report instead"}
                </Button>
              </section>
            ) : null}
            {!data.served ? (
              <Alert tone="warning" title="No inspector serves this postal code yet">
                Check the postal code. If it is right, no verified inspector covers {postalCode.trim()} at the moment, so the order cannot be placed.
              </Alert>
            ) : null}
          </>
        ) : (
          <p className="text-sm text-ink-2">Working out the price…</p>
        )}
        {passed ? <p className="text-sm font-medium text-danger">This deadline has already passed.</p> : null}
      </CardBody>
    </Card>
  );
}

export function NewOrderForm() {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    control,
    handleSubmit,
    setError,
    getValues,
    setValue,
    trigger,
    formState: { errors, isSubmitting, submitCount },
  } = useForm<FormIn, unknown, FormOut>({
    resolver: zodResolver(createOrderSchema),
    defaultValues: {
      address: { street: "", city: "", state: "OR", postalCode: "" },
      accessNotes: "",
      cleanoutKnown: true,
      buildingSewers: 1,
      deadline: "",
      timeZone: DEFAULT_TIME_ZONE,
      visitWindows: [{ start: "", end: "" }],
      anyTimeInWindows: false,
      buyer: { name: "", email: "" },
    },
  });
  const windows = useFieldArray({ control, name: "visitWindows" });
  const [street = "", postalCode = "", cleanoutKnown = true, buildingSewers = 1, deadline = "", timeZone = DEFAULT_TIME_ZONE] = useWatch({
    control,
    name: ["address.street", "address.postalCode", "cleanoutKnown", "buildingSewers", "deadline", "timeZone"],
  });
  const [reusing, setReusing] = useState(false);

  async function offerReuse(report: FreshReport) {
    setFormError(null);
    if (!(await trigger(["buyer.name", "buyer.email"], { shouldFocus: true }))) {
      setFormError("Enter the buyer's name and e-mail first: the invitation to the existing report goes there.");
      return;
    }
    setReusing(true);
    const res = await postJson<OrderDto>("/api/orders/reuse", { sourceOrderId: report.orderId, buyer: getValues("buyer"), timeZone: getValues("timeZone") });
    if (res.ok) return router.push(`/orders/${res.data.id}`);
    setReusing(false);
    setFormError(res.error.message);
  }
  const tz = register("timeZone");
  const errorCount = Object.keys(errors).length;

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const res = await postJson<OrderDto>("/api/orders", values);
    if (res.ok) return router.push(`/orders/${res.data.id}`);
    const unplaced: string[] = [];
    let first = true;
    for (const [key, messages] of Object.entries(res.error.fieldErrors ?? {})) {
      const path = toFormPath(key);
      if (!TOP_LEVEL.has(path.split(".")[0])) unplaced.push(...messages);
      else {
        setError(path as FieldPath<FormIn>, { type: "server", message: messages[0] }, { shouldFocus: first });
        first = false;
      }
    }
    setFormError([res.error.message, ...unplaced].join(" "));
  });

  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_20rem] lg:items-start">
      <div className="space-y-6">
        {formError ? (
          <Alert tone="danger" title="The order was not placed">
            {formError}
          </Alert>
        ) : submitCount > 0 && errorCount > 0 ? (
          <Alert tone="danger" title="Some answers need another look">
            Fix the fields marked below, then place the order again.
          </Alert>
        ) : null}

        <Card>
          <CardHeader title="Listing" description="The house the scope is for." />
          <CardBody className="grid gap-4 sm:grid-cols-6">
            <Field label="Street address" error={errors.address?.street?.message} required className="sm:col-span-4">
              {(c) => <Input autoComplete="address-line1" {...c} {...register("address.street")} />}
            </Field>
            <Field label="Unit" optional error={errors.address?.unit?.message} className="sm:col-span-2">
              {(c) => <Input autoComplete="address-line2" {...c} {...register("address.unit", optionalText)} />}
            </Field>
            <Field label="City" error={errors.address?.city?.message} required className="sm:col-span-3">
              {(c) => <Input autoComplete="address-level2" {...c} {...register("address.city")} />}
            </Field>
            <Field label="State" error={errors.address?.state?.message} required className="sm:col-span-1">
              {(c) => <Input autoComplete="address-level1" maxLength={2} className="uppercase" {...c} {...register("address.state")} />}
            </Field>
            <Field label="Postal code" error={errors.address?.postalCode?.message} required className="sm:col-span-2">
              {(c) => <Input autoComplete="postal-code" inputMode="numeric" maxLength={5} {...c} {...register("address.postalCode")} />}
            </Field>
            <Field label="Listing reference" optional hint="The MLS number or your own reference." error={errors.listingRef?.message} className="sm:col-span-3">
              {(c) => <Input {...c} {...register("listingRef", optionalText)} />}
            </Field>
            <Field label="Time zone of the listing" error={errors.timeZone?.message} className="sm:col-span-3">
              {(c) => (
                <Select
                  {...c}
                  {...tz}
                  onChange={async (e) => {
                    const from = getValues("timeZone") ?? DEFAULT_TIME_ZONE;
                    await tz.onChange(e);
                    const to = e.target.value;
                    const moved = (iso: string) => (iso ? (rezoneIso(iso, from, to) ?? "") : "");
                    setValue("deadline", moved(getValues("deadline")));
                    getValues("visitWindows").forEach((w, i) => setValue(`visitWindows.${i}`, { start: moved(w.start), end: moved(w.end) }));
                  }}
                >
                  {US_TIME_ZONES.map((z) => (
                    <option key={z.id} value={z.id}>
                      {z.label}
                    </option>
                  ))}
                </Select>
              )}
            </Field>
            <Field label="Property type" error={errors.propertyType?.message} required className="sm:col-span-3">
              {(c) => (
                <Select {...c} defaultValue="" {...register("propertyType")}>
                  <option value="" disabled>
                    Choose…
                  </option>
                  {PROPERTY_TYPES.map((p) => (
                    <option key={p} value={p}>
                      {PROPERTY_TYPE_LABELS[p]}
                    </option>
                  ))}
                </Select>
              )}
            </Field>
            <Field
              label="Year built"
              optional
              error={plain(errors.yearBuilt, "Enter the year as four digits, like 1962.")}
              className="sm:col-span-3"
            >
              {(c) => (
                <Input
                  inputMode="numeric"
                  maxLength={4}
                  {...c}
                  {...register("yearBuilt", { setValueAs: (v: unknown) => (v === "" || v === undefined || v === null ? undefined : Number(v)) })}
                />
              )}
            </Field>
          </CardBody>
        </Card>

        <Card>
          <CardHeader title="Access" description="What the inspector needs to get in and find the line." />
          <CardBody className="space-y-4">
            <Field label="Who lives there now" error={errors.occupancy?.message} required className="sm:max-w-xs">
              {(c) => (
                <Select {...c} defaultValue="" {...register("occupancy")}>
                  <option value="" disabled>
                    Choose…
                  </option>
                  {OCCUPANCIES.map((o) => (
                    <option key={o} value={o}>
                      {OCCUPANCY_LABELS[o]}
                    </option>
                  ))}
                </Select>
              )}
            </Field>
            <Field label="Access instructions" hint="Lockbox and code, or who to call to get in." error={errors.accessNotes?.message} required>
              {(c) => <Textarea rows={3} {...c} {...register("accessNotes")} />}
            </Field>
            <Controller
              control={control}
              name="cleanoutKnown"
              render={({ field }) => (
                <Fieldset legend="Is there a known cleanout?" hint="Without one the inspector may pull a toilet or go in through a roof vent, which costs more.">
                  <div className="flex flex-col gap-2 sm:flex-row sm:gap-6">
                    <label className="flex items-center gap-2 text-[0.9375rem]">
                      <input type="radio" name={field.name} ref={field.ref} className="size-4 accent-teal" checked={field.value === true} onChange={() => field.onChange(true)} />
                      Yes, I know where it is
                    </label>
                    <label className="flex items-center gap-2 text-[0.9375rem]">
                      <input type="radio" name={field.name} className="size-4 accent-teal" checked={field.value === false} onChange={() => field.onChange(false)} />
                      No, or not sure
                    </label>
                  </div>
                </Fieldset>
              )}
            />
            {cleanoutKnown ? (
              <Field label="Where is the cleanout?" hint="For example: basement utility room, by the front steps." error={errors.cleanoutNote?.message} required>
                {(c) => <Input {...c} {...register("cleanoutNote", optionalText)} />}
              </Field>
            ) : null}
            <Field label="Building sewers to scope" hint="Most houses have one; a second line costs extra." error={errors.buildingSewers?.message} className="sm:max-w-xs">
              {(c) => (
                <Select {...c} {...register("buildingSewers", { setValueAs: (v: unknown) => Number(v) })}>
                  {[1, 2, 3, 4].map((n) => (
                    <option key={n} value={n}>
                      {n}
                    </option>
                  ))}
                </Select>
              )}
            </Field>
          </CardBody>
        </Card>

        <Card>
          <CardHeader title="Deadline and visit windows" description={`Dates and times are in the listing's time zone: ${US_TIME_ZONES.find((z) => z.id === timeZone)?.label ?? timeZone}.`} />
          <CardBody className="space-y-5">
            <Controller
              control={control}
              name="deadline"
              render={({ field, fieldState }) => (
                <DeadlineInputs
                  value={field.value}
                  timeZone={timeZone}
                  onChange={field.onChange}
                  inputRef={field.ref}
                  error={plain(fieldState.error, "Enter the date and time the inspection contingency ends.")}
                />
              )}
            />
            <Fieldset
              legend="When may the inspector visit?"
              hint="Add one or more windows before the deadline. The inspector proposes a time inside them."
              error={errors.visitWindows?.root?.message ?? errors.visitWindows?.message}
            >
              <ul className="space-y-3">
                {windows.fields.map((w, i) => (
                  <Controller
                    key={w.id}
                    control={control}
                    name={`visitWindows.${i}`}
                    render={({ field }) => (
                      <WindowInputs
                        value={field.value}
                        timeZone={timeZone}
                        onChange={field.onChange}
                        inputRef={field.ref}
                        index={i}
                        errors={errors.visitWindows?.[i]}
                        onRemove={windows.fields.length > 1 ? () => windows.remove(i) : undefined}
                      />
                    )}
                  />
                ))}
              </ul>
              {windows.fields.length < 10 ? (
                <Button variant="secondary" size="sm" onClick={() => windows.append({ start: "", end: "" }, { shouldFocus: false })}>
                  Add another window
                </Button>
              ) : null}
            </Fieldset>
            <Checkbox
              label="Any time in my windows"
              hint="The first time the inspector proposes inside your windows is confirmed without asking you."
              {...register("anyTimeInWindows")}
            />
          </CardBody>
        </Card>

        <Card>
          <CardHeader title="Buyer" description="The report invitation goes to the buyer once the findings are in." />
          <CardBody className="grid gap-4 sm:grid-cols-2">
            <Field label="Buyer's name" error={errors.buyer?.name?.message} required>
              {(c) => <Input autoComplete="off" {...c} {...register("buyer.name")} />}
            </Field>
            <Field label="Buyer's e-mail" error={errors.buyer?.email?.message} required>
              {(c) => <Input type="email" autoComplete="off" {...c} {...register("buyer.email")} />}
            </Field>
          </CardBody>
        </Card>

        <Card>
          <CardHeader title="Notes" />
          <CardBody>
            <Field label="Notes for the inspector" optional hint="Anything else: pets, parking, a known problem with the line." error={errors.notes?.message}>
              {(c) => <Textarea rows={3} {...c} {...register("notes", optionalText)} />}
            </Field>
          </CardBody>
        </Card>
      </div>

      <div className="space-y-4 lg:sticky lg:top-6">
        <PriceBox
          street={street}
          postalCode={postalCode}
          cleanoutKnown={cleanoutKnown}
          buildingSewers={Number(buildingSewers) || 1}
          deadline={deadline}
          timeZone={timeZone}
          onReuse={(r) => void offerReuse(r)}
          reusing={reusing}
        />
        <Button type="submit" size="lg" className="w-full" pending={isSubmitting}>
          {isSubmitting ? "Placing the order…" : "Place order"}
        </Button>
        <p className="text-sm text-ink-2">Inspectors who serve the postal code see the job at once; you get an e-mail when one takes it.</p>
      </div>
    </form>
  );
}
