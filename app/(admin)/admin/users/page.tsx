import type { Metadata } from "next";

import { PageHeader } from "@/components/ui/page-header";
import { searchUsers } from "@/db/queries/admin-users";
import { requireUser } from "@/lib/auth/session";
import { userSearchQuery } from "@/lib/validations/admin";

import { UsersView } from "./users-view";

export const metadata: Metadata = { title: "Users" };

export default async function AdminUsersPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const me = await requireUser("admin");
  const raw = Object.fromEntries(Object.entries(await searchParams).map(([k, v]) => [k, Array.isArray(v) ? v[0] : v]));
  const parsed = userSearchQuery.safeParse(raw);
  const query = parsed.success ? parsed.data : userSearchQuery.parse({});
  const initial = await searchUsers(query);
  return (
    <>
      <PageHeader
        title="Users"
        description="Find an account by name, e-mail or company. Disabling an account signs it out everywhere at once; a role change needs a reason, kept in the audit log. Your own account is changed by another admin."
      />
      <UsersView initial={initial} initialQuery={{ q: query.q ?? "", role: query.role ?? "", status: query.status ?? "" }} meId={me.id} />
    </>
  );
}
