import { Skeleton, SkeletonText } from "@/components/ui/skeleton";

export function AreaLoading() {
  return (
    <div aria-busy="true" aria-live="polite" className="space-y-6">
      <span className="sr-only">Loading…</span>
      <Skeleton className="h-9 w-64" />
      <SkeletonText lines={2} />
      <Skeleton className="h-64 w-full" />
    </div>
  );
}
