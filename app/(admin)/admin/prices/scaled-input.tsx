"use client";

import clsx from "clsx";
import { useState, type ComponentProps } from "react";

import { controlClasses } from "@/components/ui/input";

/**
 * Text with up to two decimals as an integer in hundredths: dollars to cents, percent to basis
 * points. Blank or unreadable text gives NaN and more than two decimals a fraction, so the zod
 * schema answers with its own message ("Enter the base price.", "Use whole cents.").
 */
export function parseHundredths(text: string): number {
  const t = text.trim().replace(/[$,%\s]/g, "");
  const m = /^(-?)(\d*)(?:\.(\d*))?$/.exec(t);
  if (!m || (m[2] === "" && !m[3])) return Number.NaN;
  const sign = m[1] ? -1 : 1;
  const frac = m[3] ?? "";
  const hundredths = Number(m[2] || "0") * 100 + Number(frac.slice(0, 2).padEnd(2, "0"));
  const extra = /[1-9]/.test(frac.slice(2)) ? 0.5 : 0;
  return sign * (hundredths + extra);
}

export function formatHundredths(value: number, fixed: boolean): string {
  if (!Number.isFinite(value)) return "";
  const s = (value / 100).toFixed(2);
  return fixed ? s : s.replace(/\.?0+$/, "");
}

type Props = Omit<ComponentProps<"input">, "value" | "onChange" | "type"> & {
  value: number;
  onChange: (value: number) => void;
  unit: "dollars" | "percent";
};

/** A money ($) or percent (%) field whose value is integer cents or basis points. */
export function ScaledInput({ value, onChange, unit, className, ...props }: Props) {
  const fixed = unit === "dollars";
  const [text, setText] = useState(() => formatHundredths(value, fixed));
  const [seen, setSeen] = useState(value);
  // A reset from outside (after a save) shows the new value; typing keeps what was typed.
  if (!Object.is(value, seen)) {
    setSeen(value);
    if (!Object.is(parseHundredths(text), value)) setText(formatHundredths(value, fixed));
  }
  return (
    <div className="relative">
      {unit === "dollars" ? (
        <span aria-hidden="true" className="text-ink-2 pointer-events-none absolute top-1/2 left-3 -translate-y-1/2">
          $
        </span>
      ) : null}
      <input
        type="text"
        inputMode="decimal"
        autoComplete="off"
        className={clsx(controlClasses, "num h-10", unit === "dollars" ? "pl-7" : "pr-8", className)}
        value={text}
        onChange={(e) => {
          setText(e.target.value);
          const next = parseHundredths(e.target.value);
          setSeen(next);
          onChange(next);
        }}
        {...props}
      />
      {unit === "percent" ? (
        <span aria-hidden="true" className="text-ink-2 pointer-events-none absolute top-1/2 right-3 -translate-y-1/2">
          %
        </span>
      ) : null}
    </div>
  );
}
