import type { Role } from "@/db/schema";

export type NavItem = { href: string; label: string };

/** Each role's navigation. Pages still check access on the server; this only shapes the menu. */
export function navFor(role: Role, opts: { mailbox: boolean }): NavItem[] {
  const mailbox = opts.mailbox ? [{ href: "/dev/mailbox", label: "Mailbox" }] : [];
  switch (role) {
    case "agent":
      return [{ href: "/orders", label: "Orders" }, { href: "/orders/new", label: "New order" }, ...mailbox];
    case "inspector":
      return [
        { href: "/jobs", label: "Job board" },
        { href: "/jobs/mine", label: "My jobs" },
        { href: "/earnings", label: "Earnings" },
        { href: "/profile", label: "Profile" },
        ...mailbox,
      ];
    case "buyer":
      return [{ href: "/reports", label: "My reports" }, ...mailbox];
    case "admin":
      return [
        { href: "/admin", label: "Overview" },
        { href: "/admin/orders", label: "Orders" },
        { href: "/admin/inspectors", label: "Inspectors" },
        { href: "/admin/payments", label: "Payments" },
        { href: "/admin/disputes", label: "Disputes" },
        { href: "/admin/prices", label: "Prices" },
        { href: "/admin/users", label: "Users" },
        { href: "/admin/audit", label: "Audit log" },
        ...mailbox,
      ];
  }
}
