import clsx from "clsx";
import type { ComponentProps } from "react";

import { controlClasses } from "./input";

export function Textarea({ className, rows = 4, ...props }: ComponentProps<"textarea">) {
  return <textarea rows={rows} className={clsx(controlClasses, "min-h-20 py-2 leading-relaxed", className)} {...props} />;
}
