import type { ReactNode } from "react";

import { RoleShell } from "@/components/role-shell";

export const dynamic = "force-dynamic";

export default function InspectorLayout({ children }: { children: ReactNode }) {
  return <RoleShell role="inspector">{children}</RoleShell>;
}
