import clsx from "clsx";
import { useId, type ReactNode } from "react";

/**
 * Label + control + hint + error, wired for assistive tech. The child is a function that receives
 * the props to spread on the control (id, aria-describedby, aria-invalid, aria-required):
 *
 *   <Field label="E-mail" hint="The receipt goes here." error={errors.email?.message}>
 *     {(control) => <Input type="email" {...control} {...register("email")} />}
 *   </Field>
 *
 * The error line is always in the DOM with aria-live="polite", so a new message is announced.
 */
export type FieldControlProps = {
  id: string;
  "aria-describedby"?: string;
  "aria-invalid"?: true;
  "aria-required"?: true;
};

type FieldProps = {
  label: ReactNode;
  hint?: ReactNode;
  error?: string | null;
  /** Shows "optional" beside the label; fields are read as required otherwise. */
  optional?: boolean;
  required?: boolean;
  id?: string;
  className?: string;
  children: (control: FieldControlProps) => ReactNode;
};

export function Field({ label, hint, error, optional, required, id, className, children }: FieldProps) {
  const autoId = useId();
  const controlId = id ?? `f${autoId.replace(/[^a-zA-Z0-9_-]/g, "")}`;
  const hintId = `${controlId}-hint`;
  const errorId = `${controlId}-error`;
  const describedBy = [hint ? hintId : null, error ? errorId : null].filter(Boolean).join(" ") || undefined;

  return (
    <div className={clsx("space-y-1.5", className)}>
      <label htmlFor={controlId} className="text-ink flex items-baseline gap-2 text-sm font-medium">
        {label}
        {optional ? <span className="text-ink-2 text-xs font-normal">optional</span> : null}
      </label>
      {children({
        id: controlId,
        "aria-describedby": describedBy,
        "aria-invalid": error ? true : undefined,
        "aria-required": required ? true : undefined,
      })}
      {hint ? (
        <p id={hintId} className="text-ink-2 text-sm">
          {hint}
        </p>
      ) : null}
      <FieldError id={errorId} error={error} />
    </div>
  );
}

/** A group of radios or checkboxes under one legend, with the same hint and error wiring. */
export function Fieldset({
  legend,
  hint,
  error,
  className,
  children,
}: {
  legend: ReactNode;
  hint?: ReactNode;
  error?: string | null;
  className?: string;
  children: ReactNode;
}) {
  const autoId = useId().replace(/[^a-zA-Z0-9_-]/g, "");
  const hintId = `fs${autoId}-hint`;
  const errorId = `fs${autoId}-error`;
  const describedBy = [hint ? hintId : null, error ? errorId : null].filter(Boolean).join(" ") || undefined;

  return (
    <fieldset aria-describedby={describedBy} className={clsx("space-y-2", className)}>
      <legend className="text-ink text-sm font-medium">{legend}</legend>
      {hint ? (
        <p id={hintId} className="text-ink-2 -mt-1 text-sm">
          {hint}
        </p>
      ) : null}
      <div className="space-y-2">{children}</div>
      <FieldError id={errorId} error={error} />
    </fieldset>
  );
}

function FieldError({ id, error }: { id: string; error?: string | null }) {
  return (
    <p id={id} aria-live="polite" className={clsx("text-danger text-sm font-medium", !error && "sr-only")}>
      {error ? (
        <span className="inline-flex items-start gap-1.5">
          <svg viewBox="0 0 16 16" className="mt-0.5 size-4 shrink-0" aria-hidden="true">
            <circle cx="8" cy="8" r="7" fill="currentColor" />
            <path d="M8 4.5v4.2M8 11.2v.3" stroke="#fff" strokeWidth="1.7" strokeLinecap="round" />
          </svg>
          {error}
        </span>
      ) : null}
    </p>
  );
}
