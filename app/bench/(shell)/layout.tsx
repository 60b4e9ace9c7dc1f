import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { AppShell } from "@/components/app-shell";
import { env } from "@/lib/env";
import { navFor } from "@/lib/nav";

// The bench's stand-in for an area layout (RoleShell): the same shell around the page, with a fixed
// user in place of the session check. It exists only when the server starts with GRADELINE_BENCH_ROUTES=1.
export const dynamic = "force-dynamic";

const USER = { name: "Dana Whitcomb", email: "agent@gradeline.test", role: "agent" as const };

export default async function BenchShellLayout({ children }: { children: ReactNode }) {
  if (process.env.GRADELINE_BENCH_ROUTES !== "1") notFound();
  const user = await Promise.resolve(USER);
  return (
    <AppShell user={user} nav={navFor(user.role, { mailbox: env().MAILBOX_ENABLED })}>
      {children}
    </AppShell>
  );
}
