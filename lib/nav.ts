import type { Role } from "@/db/schema";

export type NavItem = { href: string; label: string };

/** Each role's navigation. Pages still check access on the server; this only shapes the menu. */
export function navFor(role: Role, opts: { mailbox: boolean }): NavItem[] {
  const mailbox = opts.mailbox ? [{ href: "/dev/mailbox", label: "Mailbox" }] : [];
  switch (role) {
    case "agent":
      return [{ href: "/orders", label: "Orders" }, ...mailbox];
    case "inspector":
      return [{ href: "/jobs", label: "Job board" }, { href: "/jobs/mine", label: "My jobs" }, ...mailbox];
    case "buyer":
      return [{ href: "/reports", label: "My reports" }, ...mailbox];
    case "admin":
      return [{ href: "/admin", label: "Overview" }, ...mailbox];
  }
}
