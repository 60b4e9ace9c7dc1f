"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";

import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { signInWithPassword } from "@/lib/auth/sign-in-client";
import { signInSchema, type SignInInput } from "@/lib/validations/auth";

export function SignInForm({ defaultEmail, next }: { defaultEmail: string; next?: string | null }) {
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    formState: { errors, isSubmitting },
  } = // No defaultValues: the server renders the e-mail into the page, and react-hook-form then reads what is
  // in the inputs, so whatever was typed or autofilled before hydration is kept.
  useForm<SignInInput>({ resolver: zodResolver(signInSchema) });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const result = await signInWithPassword(values.email, values.password);
    if (!result.ok) return setFormError(result.message);
    window.location.assign(next ?? "/home");
  });

  return (
    <form method="post" onSubmit={onSubmit} noValidate className="space-y-5">
      <div aria-live="assertive">{formError ? <Alert tone="danger">{formError}</Alert> : null}</div>
      <Field label="E-mail" error={errors.email?.message} required>
        {(control) => <Input type="email" autoComplete="email" defaultValue={defaultEmail} {...control} {...register("email")} />}
      </Field>
      <Field label="Password" error={errors.password?.message} required>
        {(control) => <Input type="password" autoComplete="current-password" {...control} {...register("password")} />}
      </Field>
      <Button type="submit" className="w-full" disabled={isSubmitting}>
        {isSubmitting ? "Signing in…" : "Sign in"}
      </Button>
    </form>
  );
}
