import { EmptyState } from "@/components/ui/empty-state";

export default function ShareLinkNotFound() {
  return (
    <main id="main" className="mx-auto max-w-2xl px-4 py-16">
      <EmptyState as="h2" title="This link has expired or was revoked" description="Shared reports stay readable for a limited time. Ask the buyer who sent it for a new link." />
    </main>
  );
}
