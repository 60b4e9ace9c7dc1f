import type { Role } from "@/db/schema";

/** Who may do what. The server checks it on every request; the UI reads it only to hide controls. */
export const PERMISSIONS = {
  "account:read": ["agent", "inspector", "buyer", "admin"],
  "orders:create": ["agent"],
  "orders:list": ["agent", "admin"],
  "orders:read": ["agent", "inspector", "admin"],
  "orders:cancel": ["agent"],
  "orders:confirm": ["agent"],
  "jobs:list": ["inspector"],
  "jobs:accept": ["inspector"],
  "jobs:work": ["inspector"],
  "profile:edit": ["inspector"],
  "reports:read": ["buyer", "agent", "admin"],
  "reports:pay": ["buyer"],
  "engine:evaluate": ["inspector", "admin"],
  "admin:manage": ["admin"],
  "dev:mailbox": ["agent", "inspector", "buyer", "admin"],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

export function can(role: Role | undefined | null, permission: Permission): boolean {
  return !!role && (PERMISSIONS[permission] as readonly Role[]).includes(role);
}

export const ROLE_HOME: Record<Role, string> = {
  agent: "/orders",
  inspector: "/jobs",
  buyer: "/reports",
  admin: "/admin",
};

export const ROLE_LABEL: Record<Role, string> = {
  agent: "Buyer's agent",
  inspector: "Inspector",
  buyer: "Home buyer",
  admin: "Admin",
};

export const SELF_SERVICE_ROLES = ["agent", "inspector", "buyer"] as const satisfies readonly Role[];
