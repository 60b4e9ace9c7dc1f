"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";

import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field, Fieldset } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { signInWithPassword } from "@/lib/auth/sign-in-client";
import { signUpSchema, type SignUpInput } from "@/lib/validations/auth";

const ROLES = [
  { value: "agent", label: "Buyer's agent", hint: "I order sewer scopes for my clients' offers." },
  { value: "inspector", label: "Inspector", hint: "I scope sewer lines and want jobs in my area." },
  { value: "buyer", label: "Home buyer", hint: "My agent invited me to a report." },
] as const;

type ApiError = { error?: { message?: string; fieldErrors?: Record<string, string[]> } };

export function SignUpForm({ defaultEmail, defaultRole, next }: { defaultEmail: string; defaultRole?: SignUpInput["role"]; next?: string | null }) {
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    control,
    formState: { errors, isSubmitting },
  } = useForm<SignUpInput>({ resolver: zodResolver(signUpSchema), defaultValues: { role: defaultRole } });
  const role = useWatch({ control, name: "role" });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const res = await fetch("/api/sign-up", { method: "POST", headers: { "Content-Type": "application/json" }, body: JSON.stringify(values) });
    if (!res.ok) {
      const body = (await res.json().catch(() => ({}))) as ApiError;
      for (const [field, messages] of Object.entries(body.error?.fieldErrors ?? {})) {
        if (field in values) setError(field as keyof SignUpInput, { message: messages[0] });
      }
      return setFormError(body.error?.message ?? "We could not create the account. Try again.");
    }
    const signedIn = await signInWithPassword(values.email, values.password);
    if (!signedIn.ok) return setFormError(signedIn.message);
    window.location.assign(next ?? "/home");
  });

  return (
    <form method="post" onSubmit={onSubmit} noValidate className="space-y-5">
      <div aria-live="assertive">{formError ? <Alert tone="danger">{formError}</Alert> : null}</div>
      <Fieldset legend="I am a" error={errors.role?.message}>
        <div className="grid gap-2">
          {ROLES.map((r) => (
            <label key={r.value} className="flex cursor-pointer items-start gap-3 rounded-md border border-rule bg-white p-3 has-[:checked]:border-teal has-[:checked]:bg-teal-50">
              <input type="radio" value={r.value} defaultChecked={r.value === defaultRole} className="mt-1 accent-teal" {...register("role")} />
              <span>
                <span className="block font-medium">{r.label}</span>
                <span className="block text-sm text-ink-2">{r.hint}</span>
              </span>
            </label>
          ))}
        </div>
      </Fieldset>
      <Field label="Full name" error={errors.name?.message} required>
        {(control) => <Input autoComplete="name" {...control} {...register("name")} />}
      </Field>
      {role === "agent" || role === "inspector" ? (
        <Field label={role === "agent" ? "Brokerage" : "Company"} error={errors.company?.message} optional>
          {(control) => <Input autoComplete="organization" {...control} {...register("company")} />}
        </Field>
      ) : null}
      <Field label="E-mail" error={errors.email?.message} required>
        {(control) => <Input type="email" autoComplete="email" defaultValue={defaultEmail} {...control} {...register("email")} />}
      </Field>
      <Field label="Password" hint="At least 10 characters." error={errors.password?.message} required>
        {(control) => <Input type="password" autoComplete="new-password" {...control} {...register("password")} />}
      </Field>
      <Button type="submit" className="w-full" disabled={isSubmitting}>
        {isSubmitting ? "Creating your account…" : "Create account"}
      </Button>
    </form>
  );
}
