import clsx from "clsx";

// The mark: ground line, a pipe laid at a gentle grade, and footage ticks beneath it.
export function LogoMark({ className, title }: { className?: string; title?: string }) {
  return (
    <svg
      viewBox="0 0 32 32"
      className={clsx("size-7 shrink-0", className)}
      role={title ? "img" : undefined}
      aria-hidden={title ? undefined : true}
      aria-label={title}
      focusable="false"
    >
      <rect width="32" height="32" rx="6" fill="#175a53" />
      <path d="M5 8.5h22" stroke="#fff" strokeOpacity="0.55" strokeWidth="1.2" strokeLinecap="round" />
      <path d="M6 13 26 18.5" stroke="#e2a57c" strokeWidth="3.2" strokeLinecap="round" />
      <path d="M8 25v-2.5M16 25v-2.5M24 25v-2.5" stroke="#fff" strokeWidth="1.8" strokeLinecap="round" />
    </svg>
  );
}

export function Logo({ className, markClassName }: { className?: string; markClassName?: string }) {
  return (
    <span className={clsx("inline-flex items-center gap-2.5", className)}>
      <LogoMark className={markClassName} />
      <span className="text-ink font-serif text-[1.3rem] leading-none font-semibold tracking-[-0.01em]">Gradeline</span>
    </span>
  );
}
