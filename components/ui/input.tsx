import clsx from "clsx";
import type { ComponentProps } from "react";

// Shared look of text-like controls. aria-invalid (set by <Field>) turns the border red.
export const controlClasses =
  "block w-full rounded-md border border-rule-strong bg-white px-3 text-base text-ink sm:text-[0.9375rem] placeholder:text-[#6b7470] transition-colors hover:border-ink-2 focus-visible:border-teal focus-visible:outline-2 focus-visible:outline-offset-0 focus-visible:outline-teal disabled:cursor-not-allowed disabled:bg-paper-2 disabled:text-ink-2 aria-invalid:border-danger aria-invalid:focus-visible:outline-danger";

export function Input({ className, type = "text", ...props }: ComponentProps<"input">) {
  return <input type={type} className={clsx(controlClasses, "h-10", className)} {...props} />;
}
