"use client";

import { useDeferredValue, useId, useRef, useState } from "react";
import useSWR from "swr";

import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { DataList } from "@/components/ui/data-list";
import { EmptyState } from "@/components/ui/empty-state";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import type { AdminUserDto, AdminUserPage } from "@/db/queries/admin-users";
import { ROLE_LABEL } from "@/lib/auth/permissions";
import { formatDate } from "@/lib/format";

import { getJson } from "@/lib/api/client";
import { ManageUser } from "./manage-user";

type Query = { q: string; role: string; status: string };
const PAGE_SIZE = 25;

const urlFor = (q: Query, page: number) => {
  const p = new URLSearchParams({ page: String(page), pageSize: String(PAGE_SIZE) });
  for (const [k, v] of Object.entries(q)) if (v) p.set(k, v);
  return `/api/admin/users?${p}`;
};

export function UsersView({ initial, initialQuery, meId }: { initial: AdminUserPage; initialQuery: Query; meId: string }) {
  const id = useId();
  const [query, setQuery] = useState(initialQuery);
  const [page, setPage] = useState(initial.page);
  const [managing, setManaging] = useState<AdminUserDto | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const panelRef = useRef<HTMLDivElement>(null);
  const deferred = useDeferredValue(query);
  const key = urlFor(deferred, page);
  const [firstKey] = useState(() => urlFor(initialQuery, initial.page));
  const { data, error, isLoading, mutate } = useSWR<AdminUserPage>(key, getJson, {
    fallbackData: key === firstKey ? initial : undefined,
    keepPreviousData: true,
  });
  const result = data ?? initial;
  const pages = Math.max(1, Math.ceil(result.total / result.pageSize));

  const change = (patch: Partial<Query>) => {
    setQuery((q) => ({ ...q, ...patch }));
    setPage(1);
  };

  function open(user: AdminUserDto) {
    setNotice(null);
    setManaging(user);
    requestAnimationFrame(() => panelRef.current?.querySelector<HTMLElement>("[tabindex='-1']")?.focus());
  }

  return (
    <div className="space-y-6">
      <form role="search" aria-label="Find users" onSubmit={(e) => e.preventDefault()} className="grid gap-4 sm:grid-cols-[2fr_1fr_1fr]">
        <div className="space-y-1.5">
          <label htmlFor={`${id}-q`} className="text-sm font-medium">
            Name, e-mail or company
          </label>
          <Input id={`${id}-q`} type="search" value={query.q} onChange={(e) => change({ q: e.target.value })} maxLength={100} />
        </div>
        <div className="space-y-1.5">
          <label htmlFor={`${id}-role`} className="text-sm font-medium">
            Role
          </label>
          <Select id={`${id}-role`} value={query.role} onChange={(e) => change({ role: e.target.value })}>
            <option value="">Any role</option>
            {Object.entries(ROLE_LABEL).map(([value, label]) => (
              <option key={value} value={value}>
                {label}
              </option>
            ))}
          </Select>
        </div>
        <div className="space-y-1.5">
          <label htmlFor={`${id}-status`} className="text-sm font-medium">
            State
          </label>
          <Select id={`${id}-status`} value={query.status} onChange={(e) => change({ status: e.target.value })}>
            <option value="">Active and disabled</option>
            <option value="active">Active</option>
            <option value="disabled">Disabled</option>
          </Select>
        </div>
      </form>

      <p role="status" className="text-ink-2 text-sm">
        {isLoading ? "Searching…" : `${result.total} ${result.total === 1 ? "user" : "users"} found`}
      </p>
      {error ? <Alert tone="danger">{error instanceof Error ? error.message : "The users could not be loaded."}</Alert> : null}
      <div aria-live="polite">
        {notice ? (
          <Alert tone="success" role={null}>
            {notice}
          </Alert>
        ) : null}
      </div>

      <div id={`${id}-panel`} ref={panelRef}>
        {managing ? (
          <ManageUser
            key={managing.id}
            user={result.users.find((u) => u.id === managing.id) ?? managing}
            onClose={() => setManaging(null)}
            onChanged={(user, message) => {
              void mutate({ ...result, users: result.users.map((u) => (u.id === user.id ? user : u)) }, { revalidate: true });
              setManaging(user);
              setNotice(message);
            }}
          />
        ) : null}
      </div>

      <DataList
        caption="Users"
        rows={result.users}
        rowKey={(u) => u.id}
        empty={<EmptyState title="No user matches" description="Try part of a name or e-mail, or another role." />}
        columns={[
          {
            key: "name",
            header: "Name",
            primary: true,
            cell: (u) => (
              <span className="flex flex-col">
                <span>
                  {u.name}
                  {u.id === meId ? <span className="text-ink-2"> (you)</span> : null}
                </span>
                <span className="text-ink-2 text-sm font-normal break-all">{u.email}</span>
              </span>
            ),
          },
          { key: "role", header: "Role", cell: (u) => ROLE_LABEL[u.role] },
          { key: "company", header: "Company", cell: (u) => u.company ?? "—", hideOnPhone: true },
          {
            key: "state",
            header: "State",
            cell: (u) => (u.disabled ? <Badge tone="danger">Disabled</Badge> : <Badge tone="success">Active</Badge>),
          },
          { key: "since", header: "Joined", cell: (u) => <span className="num text-sm">{formatDate(u.createdAt)}</span> },
          {
            key: "manage",
            header: <span className="sr-only">Actions</span>,
            align: "right",
            cell: (u) =>
              u.id === meId ? (
                <span className="text-ink-2 text-sm">Your account</span>
              ) : (
                <Button
                  size="sm"
                  variant="secondary"
                  onClick={() => open(u)}
                  aria-expanded={managing?.id === u.id}
                  aria-controls={`${id}-panel`}
                >
                  Manage<span className="sr-only"> {u.name}</span>
                </Button>
              ),
          },
        ]}
      />

      {pages > 1 ? (
        <nav aria-label="Pages of users" className="flex items-center justify-between gap-4">
          <Button variant="secondary" size="sm" disabled={page <= 1} onClick={() => setPage((p) => p - 1)}>
            Previous
          </Button>
          <span className="num text-ink-2 text-sm">
            Page {page} of {pages}
          </span>
          <Button variant="secondary" size="sm" disabled={page >= pages} onClick={() => setPage((p) => p + 1)}>
            Next
          </Button>
        </nav>
      ) : null}
    </div>
  );
}
