import type { ReactNode } from "react";

import { AppShell } from "@/components/app-shell";
import type { Role } from "@/db/schema";
import { requireUser } from "@/lib/auth/session";
import { env } from "@/lib/env";
import { navFor } from "@/lib/nav";

/** The signed-in shell of one role's area; the page inside checks access again. */
export async function RoleShell({ role, children }: { role: Role; children: ReactNode }) {
  const user = await requireUser(role);
  return (
    <AppShell user={user} nav={navFor(user.role, { mailbox: env().MAILBOX_ENABLED })}>
      {children}
    </AppShell>
  );
}
