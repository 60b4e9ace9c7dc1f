import clsx from "clsx";
import type { ComponentProps, ReactNode } from "react";

type Heading = "h2" | "h3" | "h4";

export function Card({ className, ...props }: ComponentProps<"section">) {
  return <section className={clsx("rounded-card border-rule shadow-card border bg-white", className)} {...props} />;
}

export function CardHeader({
  title,
  description,
  actions,
  as: H = "h2",
  className,
}: {
  title: ReactNode;
  description?: ReactNode;
  actions?: ReactNode;
  as?: Heading;
  className?: string;
}) {
  return (
    <header className={clsx("border-rule flex flex-wrap items-start justify-between gap-3 border-b px-5 py-4", className)}>
      <div className="min-w-0 space-y-1">
        <H className="text-lg leading-snug font-semibold">{title}</H>
        {description ? <p className="text-ink-2 text-sm">{description}</p> : null}
      </div>
      {actions ? <div className="flex shrink-0 flex-wrap items-center gap-2">{actions}</div> : null}
    </header>
  );
}

export function CardBody({ className, ...props }: ComponentProps<"div">) {
  return <div className={clsx("px-5 py-4", className)} {...props} />;
}

export function CardFooter({ className, ...props }: ComponentProps<"div">) {
  return (
    <div className={clsx("border-rule bg-paper flex flex-wrap items-center justify-end gap-2 border-t px-5 py-3", className)} {...props} />
  );
}
