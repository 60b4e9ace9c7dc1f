"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useId, useRef, useState, type ChangeEvent } from "react";
import { useFieldArray, useForm, useWatch, type Control, type FieldErrors, type UseFormRegister } from "react-hook-form";

import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { inspectorProfileSchema, insuranceUploadSchema, WEEKDAYS, type InspectorProfileInput } from "@/lib/validations/orders";
import { sendJson } from "@/lib/api/client";

export type InspectorProfile = InspectorProfileInput & {
  verified: boolean;
  licenceValid: boolean;
  rejectedReason?: string | null;
  insurance: { fileName: string } | null;
};

type Weekday = (typeof WEEKDAYS)[number];

const DAY_NAMES: Record<Weekday, string> = { mon: "Monday", tue: "Tuesday", wed: "Wednesday", thu: "Thursday", fri: "Friday", sat: "Saturday", sun: "Sunday" };

function toFormValues(p: InspectorProfile): InspectorProfileInput {
  const availability: InspectorProfileInput["availability"] = {};
  for (const d of WEEKDAYS) availability[d] = p.availability[d] ?? [];
  return { licenceNumber: p.licenceNumber, licenceExpiresOn: p.licenceExpiresOn, baseLocation: p.baseLocation, postalCodes: p.postalCodes, availability };
}

export function ProfileForm({ initial }: { initial: InspectorProfile }) {
  const [profile, setProfile] = useState(initial);
  return (
    <div className="space-y-6">
      <Standing profile={profile} />
      <InsuranceUpload current={profile.insurance} onUploaded={(insurance) => setProfile((old) => ({ ...old, insurance }))} />
      <DetailsForm initial={profile} onSaved={(p) => setProfile((old) => ({ ...old, ...p }))} />
    </div>
  );
}

function Standing({ profile }: { profile: InspectorProfile }) {
  const open = profile.verified && profile.licenceValid;
  return (
    <Card>
      <CardHeader title="Verification" description="Only verified inspectors with a current licence see the job board." />
      <CardBody className="space-y-3">
        <p className="flex flex-wrap items-center gap-2 text-[0.9375rem]">
          <Badge tone={profile.verified ? "success" : "warning"}>{profile.verified ? "Verified" : "Not verified yet"}</Badge>
          <Badge tone={profile.licenceValid ? "success" : "danger"}>{profile.licenceValid ? "Licence current" : profile.licenceExpiresOn ? "Licence expired" : "No licence on file"}</Badge>
          <Badge tone={profile.insurance ? "success" : "warning"}>{profile.insurance ? "Insurance on file" : "No insurance certificate"}</Badge>
        </p>
        <p className="text-sm text-ink-2">
          {open
            ? "The job board is open to you."
            : profile.verified
              ? "Add your renewed licence below; the job board opens again once an admin has checked it."
              : "An admin checks your licence and insurance certificate, usually within one working day."}
        </p>
        {profile.rejectedReason ? (
          <Alert tone="warning" title="An admin asked for changes">
            {profile.rejectedReason}
          </Alert>
        ) : null}
      </CardBody>
    </Card>
  );
}

function DetailsForm({ initial, onSaved }: { initial: InspectorProfile; onSaved: (p: InspectorProfile) => void }) {
  const [notice, setNotice] = useState<{ tone: "success" | "danger" | "warning"; text: string } | null>(null);
  const {
    register,
    control,
    handleSubmit,
    setError,
    clearErrors,
    setValue,
    getValues,
    formState: { errors, isSubmitting },
  } = useForm<InspectorProfileInput>({ resolver: zodResolver(inspectorProfileSchema), defaultValues: toFormValues(initial) });
  const postalCodes = useWatch({ control, name: "postalCodes" });

  const onSubmit = handleSubmit(async (values) => {
    setNotice(null);
    let badHours = false;
    for (const d of WEEKDAYS) {
      (values.availability[d] ?? []).forEach((r, i) => {
        if (r.end <= r.start) {
          setError(`availability.${d}.${i}.end`, { type: "order", message: "End after the start time." });
          badHours = true;
        }
      });
    }
    if (badHours) return setNotice({ tone: "danger", text: "Some working hours end before they start." });
    const res = await sendJson<{ profile: InspectorProfile }>("/api/inspector/profile", "PUT", values);
    if (!res.ok) {
      for (const [key, messages] of Object.entries(res.error.fieldErrors ?? {})) {
        setError(key.replace(/\[(\d+)\]/g, ".$1") as "licenceNumber", { type: "server", message: messages[0] });
      }
      return setNotice({ tone: "danger", text: res.error.message });
    }
    onSaved(res.data.profile);
    const reverify = initial.verified && !res.data.profile.verified;
    setNotice(
      reverify
        ? { tone: "warning", text: "Saved. Your licence details changed, so an admin checks them again before the job board reopens." }
        : { tone: "success", text: "Profile saved." },
    );
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-6">
      <Card>
        <CardHeader title="Licence and base" />
        <CardBody className="grid gap-4 sm:grid-cols-2">
          <Field label="Licence number" error={errors.licenceNumber?.message} required>
            {(c) => <Input autoComplete="off" {...c} {...register("licenceNumber")} />}
          </Field>
          <Field label="Licence expires on" error={errors.licenceExpiresOn?.type === "invalid_format" ? "Enter the expiry date." : errors.licenceExpiresOn?.message} required>
            {(c) => <Input type="date" {...c} {...register("licenceExpiresOn")} />}
          </Field>
          <Field label="Base location" hint="Where you start your day: a town or neighbourhood." error={errors.baseLocation?.message} required className="sm:col-span-2">
            {(c) => <Input {...c} {...register("baseLocation")} />}
          </Field>
        </CardBody>
      </Card>

      <Card>
        <CardHeader title="Service area" description="The postal codes you serve. Open orders there show on your job board." />
        <CardBody>
          <PostalCodeChips
            codes={postalCodes}
            error={errors.postalCodes?.message ?? errors.postalCodes?.root?.message ?? errors.postalCodes?.find?.((e) => e?.message)?.message}
            onChange={(codes) => {
              setValue("postalCodes", codes, { shouldDirty: true });
              clearErrors("postalCodes");
            }}
            existing={() => getValues("postalCodes")}
          />
        </CardBody>
      </Card>

      <Card>
        <CardHeader title="Weekly availability" description="The hours you usually take visits, in your local time." />
        <CardBody>
          <ul className="divide-y divide-rule">
            {WEEKDAYS.map((d) => (
              <DayHours key={d} day={d} control={control} register={register} errors={errors.availability} />
            ))}
          </ul>
        </CardBody>
      </Card>

      <div aria-live="polite">{notice ? <Alert tone={notice.tone}>{notice.text}</Alert> : null}</div>
      <Button type="submit" size="lg" pending={isSubmitting}>
        Save profile
      </Button>
    </form>
  );
}

function PostalCodeChips({ codes, error, onChange, existing }: { codes: string[]; error?: string; onChange: (codes: string[]) => void; existing: () => string[] }) {
  const id = useId();
  const inputRef = useRef<HTMLInputElement>(null);
  const [draft, setDraft] = useState("");
  const [local, setLocal] = useState<string | null>(null);
  const message = local ?? error;

  function add() {
    const code = draft.trim();
    if (!/^\d{5}$/.test(code)) return setLocal("A postal code has five digits, like 97991.");
    const current = existing();
    if (current.includes(code)) return setLocal(`${code} is already in your list.`);
    setLocal(null);
    setDraft("");
    onChange([...current, code].sort());
    inputRef.current?.focus();
  }

  return (
    <div className="space-y-3">
      <ul aria-label="Postal codes you serve" className="flex flex-wrap gap-2">
        {codes.length === 0 ? <li className="text-sm text-ink-2">None yet.</li> : null}
        {codes.map((c) => (
          <li key={c} className="inline-flex items-center gap-1 rounded-full border border-teal-200 bg-teal-50 py-0.5 pr-1 pl-3 text-sm text-teal-800">
            <span className="num">{c}</span>
            <button
              type="button"
              onClick={() => {
                onChange(existing().filter((x) => x !== c));
                inputRef.current?.focus();
              }}
              className="inline-flex size-7 items-center justify-center rounded-full hover:bg-teal-100"
            >
              <svg viewBox="0 0 12 12" className="size-3" aria-hidden="true">
                <path d="m3 3 6 6m0-6-6 6" stroke="currentColor" strokeWidth="1.5" strokeLinecap="round" />
              </svg>
              <span className="sr-only">Remove {c}</span>
            </button>
          </li>
        ))}
      </ul>
      <div className="flex items-end gap-2">
        <div className="space-y-1.5">
          <label htmlFor={`${id}-code`} className="text-sm font-medium">
            Add a postal code
          </label>
          <Input
            id={`${id}-code`}
            ref={inputRef}
            inputMode="numeric"
            maxLength={5}
            className="w-32"
            value={draft}
            aria-invalid={message ? true : undefined}
            aria-describedby={message ? `${id}-err` : undefined}
            onChange={(e) => setDraft(e.target.value)}
            onKeyDown={(e) => {
              if (e.key === "Enter") {
                e.preventDefault();
                add();
              }
            }}
          />
        </div>
        <Button variant="secondary" onClick={add}>
          Add
        </Button>
      </div>
      <p id={`${id}-err`} aria-live="polite" className="text-sm font-medium text-danger empty:hidden">
        {message}
      </p>
    </div>
  );
}

function DayHours({
  day,
  control,
  register,
  errors,
}: {
  day: Weekday;
  control: Control<InspectorProfileInput>;
  register: UseFormRegister<InspectorProfileInput>;
  errors: FieldErrors<InspectorProfileInput>["availability"];
}) {
  const { fields, append, remove } = useFieldArray({ control, name: `availability.${day}` });
  const dayErrors = errors?.[day];
  return (
    <li className="py-3">
      <fieldset className="gap-4 sm:flex sm:items-start">
        <legend className="sr-only">{DAY_NAMES[day]}</legend>
        <span className="block pt-2 pb-1 text-sm font-medium sm:w-28 sm:shrink-0" aria-hidden="true">
          {DAY_NAMES[day]}
        </span>
        <div className="flex-1 space-y-2">
          {fields.length === 0 ? <p className="pt-2 text-sm text-ink-2">Not available</p> : null}
          {fields.map((f, i) => {
            const message = dayErrors?.[i]?.start?.message ?? dayErrors?.[i]?.end?.message;
            const errId = `${day}-${f.id}-err`;
            const a11y = { "aria-invalid": message ? true : undefined, "aria-describedby": message ? errId : undefined } as const;
            return (
              <div key={f.id}>
                <div className="flex flex-wrap items-end gap-2">
                  <div className="space-y-1">
                    <label htmlFor={`${day}-${f.id}-s`} className="text-xs text-ink-2">
                      From
                    </label>
                    <Input id={`${day}-${f.id}-s`} type="time" className="w-32" {...a11y} {...register(`availability.${day}.${i}.start`)} />
                  </div>
                  <div className="space-y-1">
                    <label htmlFor={`${day}-${f.id}-e`} className="text-xs text-ink-2">
                      Until
                    </label>
                    <Input id={`${day}-${f.id}-e`} type="time" className="w-32" {...a11y} {...register(`availability.${day}.${i}.end`)} />
                  </div>
                  <Button variant="ghost" onClick={() => remove(i)}>
                    Remove<span className="sr-only"> {DAY_NAMES[day]} hours {i + 1}</span>
                  </Button>
                </div>
                <p id={errId} aria-live="polite" className="mt-1 text-sm font-medium text-danger empty:hidden">
                  {message}
                </p>
              </div>
            );
          })}
          {fields.length < 4 ? (
            <Button variant="secondary" size="sm" onClick={() => append({ start: "08:00", end: "17:00" })}>
              Add hours<span className="sr-only"> on {DAY_NAMES[day]}</span>
            </Button>
          ) : null}
        </div>
      </fieldset>
    </li>
  );
}

function InsuranceUpload({ current, onUploaded }: { current: { fileName: string } | null; onUploaded: (insurance: { fileName: string }) => void }) {
  const id = useId();
  const [file, setFile] = useState<File | null>(null);
  const [stage, setStage] = useState<"idle" | "preparing" | "uploading" | "checking">("idle");
  const [progress, setProgress] = useState(0);
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const busy = stage !== "idle";

  function pick(e: ChangeEvent<HTMLInputElement>) {
    setError(null);
    setDone(null);
    setFile(e.target.files?.[0] ?? null);
  }

  function put(url: string, f: File): Promise<boolean> {
    return new Promise((resolve) => {
      const xhr = new XMLHttpRequest();
      xhr.open("PUT", url);
      xhr.setRequestHeader("Content-Type", f.type);
      xhr.upload.onprogress = (e) => e.lengthComputable && setProgress(Math.round((e.loaded / e.total) * 100));
      xhr.onload = () => resolve(xhr.status >= 200 && xhr.status < 300);
      xhr.onerror = () => resolve(false);
      xhr.send(f);
    });
  }

  async function upload() {
    if (!file) return setError("Choose the certificate file first.");
    const check = insuranceUploadSchema.safeParse({ fileName: file.name, sizeBytes: file.size, contentType: file.type });
    if (!check.success) return setError(check.error.issues[0]?.message ?? "That file cannot be used.");
    setError(null);
    setDone(null);
    setProgress(0);
    setStage("preparing");
    const start = await sendJson<{ uploadUrl: string; key: string }>("/api/inspector/insurance", "POST", check.data);
    if (!start.ok) {
      setStage("idle");
      return setError(start.error.message);
    }
    setStage("uploading");
    if (!(await put(start.data.uploadUrl, file))) {
      setStage("idle");
      return setError("The upload did not finish. Check your connection and try again.");
    }
    setStage("checking");
    const complete = await sendJson<{ insurance: { fileName: string } }>("/api/inspector/insurance/complete", "POST", { key: start.data.key, fileName: file.name });
    setStage("idle");
    if (!complete.ok) return setError(complete.error.message);
    onUploaded(complete.data.insurance);
    setDone(`${complete.data.insurance.fileName} is on file.`);
    setFile(null);
  }

  return (
    <Card>
      <CardHeader title="Insurance certificate" description="A PDF, PNG or JPEG under 10 MB. Gradeline checks the file itself, not just its name." />
      <CardBody className="space-y-4">
        <p className="text-[0.9375rem]">
          {current ? (
            <>
              On file: <span className="font-medium break-all">{current.fileName}</span>
            </>
          ) : (
            <span className="text-ink-2">No certificate uploaded yet.</span>
          )}
        </p>
        <div className="space-y-1.5">
          <label htmlFor={`${id}-file`} className="text-sm font-medium">
            {current ? "Replace the certificate" : "Certificate file"}
          </label>
          <input
            id={`${id}-file`}
            type="file"
            accept="application/pdf,image/png,image/jpeg"
            onChange={pick}
            disabled={busy}
            aria-describedby={error ? `${id}-err` : undefined}
            aria-invalid={error ? true : undefined}
            className="block w-full text-sm text-ink file:mr-3 file:h-10 file:rounded-md file:border file:border-rule-strong file:bg-white file:px-4 file:text-[0.9375rem] file:font-medium file:text-ink hover:file:bg-paper-2"
          />
        </div>
        {stage === "uploading" ? (
          <div className="space-y-1">
            <label htmlFor={`${id}-progress`} className="text-sm text-ink-2">
              Uploading {progress}%
            </label>
            <progress id={`${id}-progress`} max={100} value={progress} className="h-2 w-full accent-teal" />
          </div>
        ) : null}
        <p id={`${id}-err`} role="alert" className="text-sm font-medium text-danger empty:hidden">
          {error}
        </p>
        <div aria-live="polite">{done ? <Alert tone="success">{done}</Alert> : null}</div>
        <Button onClick={upload} pending={busy} disabled={!file}>
          {stage === "preparing" ? "Preparing…" : stage === "uploading" ? "Uploading…" : stage === "checking" ? "Checking the file…" : "Upload certificate"}
        </Button>
      </CardBody>
    </Card>
  );
}
