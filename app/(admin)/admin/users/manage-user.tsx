"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useId, useState, type FormEvent } from "react";
import { useForm } from "react-hook-form";

import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import { Textarea } from "@/components/ui/textarea";
import type { AdminUserDto } from "@/db/queries/admin-users";
import type { Role } from "@/db/schema";
import { ROLE_LABEL } from "@/lib/auth/permissions";
import { updateUserSchema, type UpdateUserInput } from "@/lib/validations/admin";

import { sendJson } from "@/lib/api/client";

type Changed = (user: AdminUserDto, message: string) => void;

export function ManageUser({ user, onClose, onChanged }: { user: AdminUserDto; onClose: () => void; onChanged: Changed }) {
  const headingId = useId();
  return (
    <Card aria-labelledby={headingId}>
      <CardHeader
        title={
          <span id={headingId} tabIndex={-1} className="outline-none">
            Manage {user.name}
          </span>
        }
        description={`${user.email} · ${ROLE_LABEL[user.role]}${user.disabled ? " · disabled" : ""}`}
        actions={
          <Button variant="ghost" size="sm" onClick={onClose}>
            Close
          </Button>
        }
      />
      <CardBody className="grid gap-8 lg:grid-cols-2">
        <AccessForm user={user} onChanged={onChanged} />
        <RoleForm user={user} onChanged={onChanged} />
      </CardBody>
    </Card>
  );
}

async function patch(user: AdminUserDto, body: UpdateUserInput) {
  return sendJson<{ user: AdminUserDto }>(`/api/admin/users/${user.id}`, "PATCH", body);
}

function AccessForm({ user, onChanged }: { user: AdminUserDto; onChanged: Changed }) {
  const titleId = useId();
  const [reason, setReason] = useState("");
  const [pending, setPending] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const disable = !user.disabled;

  async function submit(e: FormEvent) {
    e.preventDefault();
    setProblem(null);
    setPending(true);
    const res = await patch(user, { disabled: disable, reason: reason.trim() || undefined });
    setPending(false);
    if (!res.ok) return setProblem(res.error.message);
    setReason("");
    onChanged(
      res.data.user,
      disable ? `${user.name} is disabled and signed out everywhere.` : `${user.name} is enabled and can sign in again.`,
    );
  }

  return (
    <form onSubmit={submit} aria-labelledby={titleId} className="space-y-3">
      <h3 id={titleId} className="font-semibold">
        {disable ? "Disable the account" : "Enable the account"}
      </h3>
      <p className="text-ink-2 text-sm">
        {disable
          ? "Ends every session of this person at once; they cannot sign in until an admin enables the account."
          : "The person can sign in again with their password."}
      </p>
      <Field label="Reason" optional hint="Kept in the audit log.">
        {(c) => <Input {...c} value={reason} onChange={(e) => setReason(e.target.value)} maxLength={500} />}
      </Field>
      <div aria-live="polite">
        {problem ? (
          <Alert tone="danger" role={null}>
            {problem}
          </Alert>
        ) : null}
      </div>
      <Button type="submit" variant={disable ? "danger" : "primary"} pending={pending}>
        {disable ? "Disable and sign out" : "Enable the account"}
      </Button>
    </form>
  );
}

function RoleForm({ user, onChanged }: { user: AdminUserDto; onChanged: Changed }) {
  const titleId = useId();
  const [problem, setProblem] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<UpdateUserInput>({ resolver: zodResolver(updateUserSchema), defaultValues: { role: user.role, reason: "" } });

  const onSubmit = handleSubmit(async (values) => {
    setProblem(null);
    if (values.role === user.role) return setError("role", { type: "same", message: `${user.name} already has this role.` });
    const res = await patch(user, values);
    if (!res.ok) {
      for (const [key, messages] of Object.entries(res.error.fieldErrors ?? {}))
        if (key === "role" || key === "reason") setError(key, { type: "server", message: messages[0] });
      return setProblem(res.error.message);
    }
    reset({ role: res.data.user.role, reason: "" });
    onChanged(res.data.user, `${user.name} is now ${ROLE_LABEL[res.data.user.role as Role].toLowerCase()}; their open sessions ended.`);
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby={titleId} className="space-y-3">
      <h3 id={titleId} className="font-semibold">
        Change the role
      </h3>
      <p className="text-ink-2 text-sm">
        One person has one role. The change ends their sessions; they sign in again into the new role&apos;s pages.
      </p>
      <Field label="New role" error={errors.role?.message} required>
        {(c) => (
          <Select {...c} {...register("role")}>
            {Object.entries(ROLE_LABEL).map(([value, label]) => (
              <option key={value} value={value}>
                {label}
              </option>
            ))}
          </Select>
        )}
      </Field>
      <Field label="Reason" hint="Required. Kept in the audit log." error={errors.reason?.message} required>
        {(c) => <Textarea rows={2} {...c} {...register("reason")} />}
      </Field>
      <div aria-live="polite">
        {problem ? (
          <Alert tone="danger" role={null}>
            {problem}
          </Alert>
        ) : null}
      </div>
      <Button type="submit" pending={isSubmitting}>
        Change the role
      </Button>
    </form>
  );
}
