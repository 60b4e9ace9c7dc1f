import clsx from "clsx";
import type { ComponentProps, ReactNode } from "react";

// A checkbox with its label beside it (label wraps the control, so no id is needed).
export function Checkbox({ label, hint, className, ...props }: ComponentProps<"input"> & { label: ReactNode; hint?: ReactNode }) {
  return (
    <label className={clsx("flex cursor-pointer items-start gap-3 text-[0.9375rem]", className)}>
      <input type="checkbox" className="accent-teal mt-0.5 size-4.5 shrink-0" {...props} />
      <span>
        <span className="text-ink">{label}</span>
        {hint ? <span className="text-ink-2 mt-0.5 block text-sm">{hint}</span> : null}
      </span>
    </label>
  );
}
