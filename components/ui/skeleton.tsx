import clsx from "clsx";

/** A placeholder block while content loads. Pair with one visible or sr-only "Loading ..." text per region. */
export function Skeleton({ className }: { className?: string }) {
  return <div aria-hidden="true" className={clsx("bg-rule/55 rounded-sm motion-safe:animate-pulse", className)} />;
}

export function SkeletonText({ lines = 3, className }: { lines?: number; className?: string }) {
  return (
    <div aria-hidden="true" className={clsx("space-y-2", className)}>
      {Array.from({ length: lines }, (_, i) => (
        <Skeleton key={i} className={clsx("h-3.5", i === lines - 1 && lines > 1 ? "w-3/5" : "w-full")} />
      ))}
    </div>
  );
}
