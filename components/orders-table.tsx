"use client";

import {
  createColumnHelper,
  rowPaginationFeature,
  rowSortingFeature,
  tableFeatures,
  useTable,
  type PaginationState,
  type SortingState,
} from "@tanstack/react-table";
import clsx from "clsx";
import Link from "next/link";
import { useDeferredValue, useId, useState } from "react";
import useSWR from "swr";

import { AtRiskBadge } from "@/components/at-risk-badge";
import { Countdown } from "@/components/countdown";
import { Alert } from "@/components/ui/alert";
import { Button, ButtonLink } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { Input } from "@/components/ui/input";
import { Money } from "@/components/ui/money";
import { Select } from "@/components/ui/select";
import { Skeleton } from "@/components/ui/skeleton";
import { ORDER_STATUS_LABELS, StatusBadge, type OrderStatus } from "@/components/ui/status-badge";
import { getJson } from "@/lib/api/client";
import { formatDate, formatDateTime } from "@/lib/format";
import type { OrderListDto, OrderSummaryDto } from "@/lib/orders/dto";

type SortKey = "deadline" | "created" | "address" | "status" | "price";
type StatusFilter = OrderStatus | "at_risk" | "";

// From the badge's table rather than lib/validations, which would pull zod into this bundle.
const ORDER_STATES = Object.keys(ORDER_STATUS_LABELS) as OrderStatus[];

const LIVE_STATES = new Set(["open", "accepted", "scheduled"]);
const PAGE_SIZE = 20;

const features = tableFeatures({ rowSortingFeature, rowPaginationFeature });
const col = createColumnHelper<typeof features, OrderSummaryDto>();

const columns = col.columns([
  col.accessor((o) => o.address.street, {
    id: "address",
    header: "Listing",
    cell: ({ row, table }) => <ListingCell order={row.original} scope={(table.options.meta as { scope: OrdersScope }).scope} />,
  }),
  col.accessor("status", {
    id: "status",
    header: "State",
    cell: ({ row }) => (
      <div className="flex flex-col items-start gap-1.5">
        <StatusBadge status={row.original.status} />
        <AtRiskBadge atRisk={row.original.atRisk} />
      </div>
    ),
  }),
  col.accessor("deadline", { id: "deadline", header: "Deadline", cell: ({ row }) => <DeadlineCell order={row.original} /> }),
  col.display({ id: "inspector", header: "Inspector and visit", cell: ({ row }) => <VisitCell order={row.original} /> }),
  col.accessor("createdAt", {
    id: "created",
    header: "Ordered",
    cell: ({ row }) => (
      <span className="num text-ink-2 text-sm whitespace-nowrap">{formatDate(row.original.createdAt, row.original.timeZone)}</span>
    ),
  }),
  col.accessor("priceCents", { id: "price", header: "Price", cell: ({ row }) => <Money cents={row.original.priceCents} /> }),
]);

const NO_ORDERS: OrderSummaryDto[] = [];

/** Whose orders the table lists: the agent's own, or (for an admin) every order in the marketplace. */
export type OrdersScope = "agent" | "admin";

const detailHref = (scope: OrdersScope, id: string) => (scope === "admin" ? `/admin/orders/${id}` : `/orders/${id}`);

function ListingCell({ order, scope }: { order: OrderSummaryDto; scope: OrdersScope }) {
  return (
    <div className="min-w-0">
      <Link href={detailHref(scope, order.id)} className="text-ink hover:text-teal font-medium underline-offset-4 hover:underline">
        {order.address.street}
        {order.address.unit ? `, ${order.address.unit}` : ""}
      </Link>
      <p className="text-ink-2 text-sm">
        {order.address.city}, {order.address.state} <span className="num">{order.address.postalCode}</span>
        {order.listingRef ? <span> · Ref. {order.listingRef}</span> : null}
      </p>
    </div>
  );
}

function DeadlineCell({ order }: { order: OrderSummaryDto }) {
  if (!LIVE_STATES.has(order.status)) return <span className="num text-ink-2 text-sm">{formatDate(order.deadline, order.timeZone)}</span>;
  return (
    <div>
      <Countdown to={order.deadline} timeZone={order.timeZone} />
      <p className="num text-ink-2 text-xs whitespace-nowrap" aria-hidden="true">
        {formatDateTime(order.deadline, order.timeZone)}
      </p>
    </div>
  );
}

function VisitCell({ order }: { order: OrderSummaryDto }) {
  return (
    <div className="text-sm">
      <p className="text-ink">{order.inspector ? order.inspector.name : <span className="text-ink-2">Waiting for an inspector</span>}</p>
      {order.appointment ? (
        <p className="num text-ink-2">{formatDateTime(order.appointment.start, order.timeZone)}</p>
      ) : order.inspector ? (
        <p className="text-ink-2">No visit set yet</p>
      ) : null}
    </div>
  );
}

function SortIcon({ dir }: { dir: false | "asc" | "desc" }) {
  return (
    <svg viewBox="0 0 12 12" className={clsx("size-3", dir ? "text-ink" : "text-ink-2/60")} aria-hidden="true">
      {dir !== "desc" ? <path d="M3 5 6 2l3 3" fill="none" stroke="currentColor" strokeWidth="1.4" /> : null}
      {dir !== "asc" ? <path d="m3 7 3 3 3-3" fill="none" stroke="currentColor" strokeWidth="1.4" /> : null}
    </svg>
  );
}

/** The orders table; `initial` is its first page as the server rendered it, so the table shows at once. */
export function OrdersTable({ scope = "agent", initial }: { scope?: OrdersScope; initial?: OrderListDto }) {
  const searchId = useId();
  const statusId = useId();
  const [search, setSearch] = useState("");
  const [status, setStatus] = useState<StatusFilter>("");
  const [sorting, setSorting] = useState<SortingState>([{ id: "deadline", desc: false }]);
  const [pagination, setPagination] = useState<PaginationState>({ pageIndex: 0, pageSize: PAGE_SIZE });
  const query = useDeferredValue(search.trim());

  const sort = (sorting[0]?.id ?? "deadline") as SortKey;
  const params = new URLSearchParams({
    sort,
    dir: sorting[0]?.desc ? "desc" : "asc",
    page: String(pagination.pageIndex + 1),
    pageSize: String(pagination.pageSize),
  });
  if (status) params.set("status", status);
  if (query) params.set("q", query.slice(0, 100));

  const key = `/api/orders?${params}`;
  const [initialKey] = useState(key);
  const { data, error, isLoading, mutate } = useSWR<OrderListDto>(key, (url: string) => getJson<OrderListDto>(url), {
    refreshInterval: 15_000,
    keepPreviousData: true,
    // Only for the view the server rendered; any other sort, filter or page is fetched.
    fallbackData: key === initialKey ? initial : undefined,
    revalidateOnMount: !initial,
  });

  const table = useTable({
    features,
    columns,
    data: data?.orders ?? NO_ORDERS,
    getRowId: (o) => o.id,
    meta: { scope },
    state: { sorting, pagination },
    onSortingChange: (updater) => {
      setSorting(updater);
      setPagination((p) => ({ ...p, pageIndex: 0 }));
    },
    onPaginationChange: setPagination,
    manualSorting: true,
    manualPagination: true,
    enableSortingRemoval: false,
    enableMultiSort: false,
    rowCount: data?.total ?? 0,
  });

  const rows = table.getRowModel().rows;
  const total = data?.total ?? 0;
  const first = total === 0 ? 0 : pagination.pageIndex * pagination.pageSize + 1;
  const last = Math.min(total, (pagination.pageIndex + 1) * pagination.pageSize);
  const filtered = !!status || !!query;

  const resetPage = () => setPagination((p) => ({ ...p, pageIndex: 0 }));

  return (
    <div className="space-y-5">
      <div className="flex flex-col gap-3 sm:flex-row sm:items-end" role="search" aria-label="Find orders">
        <div className="flex-1 space-y-1.5">
          <label htmlFor={searchId} className="text-ink text-sm font-medium">
            Search by address
          </label>
          <Input
            id={searchId}
            type="search"
            value={search}
            maxLength={100}
            placeholder={scope === "admin" ? "Address, reference or buyer" : "Street, city, postal code or reference"}
            onChange={(e) => {
              setSearch(e.target.value);
              resetPage();
            }}
          />
        </div>
        <div className="space-y-1.5 sm:w-56">
          <label htmlFor={statusId} className="text-ink text-sm font-medium">
            State
          </label>
          <Select
            id={statusId}
            value={status}
            onChange={(e) => {
              setStatus(e.target.value as StatusFilter);
              resetPage();
            }}
          >
            <option value="">All states</option>
            <option value="at_risk">At risk</option>
            {ORDER_STATES.map((s) => (
              <option key={s} value={s}>
                {ORDER_STATUS_LABELS[s]}
              </option>
            ))}
          </Select>
        </div>
        <div className="md:hidden">
          <label htmlFor={`${statusId}-sort`} className="text-ink mb-1.5 block text-sm font-medium">
            Sort by
          </label>
          <Select
            id={`${statusId}-sort`}
            value={`${sort}:${sorting[0]?.desc ? "desc" : "asc"}`}
            onChange={(e) => {
              const [id, dir] = e.target.value.split(":");
              table.setSorting([{ id, desc: dir === "desc" }]);
            }}
          >
            <option value="deadline:asc">Deadline, soonest first</option>
            <option value="deadline:desc">Deadline, latest first</option>
            <option value="created:desc">Newest orders first</option>
            <option value="address:asc">Address, A to Z</option>
            <option value="status:asc">State</option>
            <option value="price:desc">Price, highest first</option>
          </Select>
        </div>
      </div>

      <p role="status" className="text-ink-2 text-sm">
        {isLoading && !data
          ? "Loading orders…"
          : `${total} ${total === 1 ? "order" : "orders"}${filtered ? " match" : ""}${total > 0 ? `, showing ${first}–${last}` : ""}.`}
      </p>

      {error ? (
        <Alert tone="danger" title="The orders could not be loaded">
          <p>{error instanceof Error ? error.message : "Check your connection."} Gradeline tries again every 15 seconds.</p>
          <Button variant="secondary" size="sm" className="mt-2" onClick={() => mutate()}>
            Try again now
          </Button>
        </Alert>
      ) : null}

      {isLoading && !data ? (
        <div className="space-y-3" aria-hidden="true">
          {Array.from({ length: 4 }, (_, i) => (
            <Skeleton key={i} className="h-16 w-full" />
          ))}
        </div>
      ) : data && rows.length === 0 ? (
        filtered ? (
          <EmptyState title="No orders match" description="Try another address or state, or clear the search." />
        ) : scope === "admin" ? (
          <EmptyState title="No orders yet" description="Orders placed by agents show up here." />
        ) : (
          <EmptyState
            title="No orders yet"
            description="Order a sewer scope for a listing and it shows up here with a live countdown to its contingency deadline."
            action={<ButtonLink href="/orders/new">New order</ButtonLink>}
          />
        )
      ) : data ? (
        <>
          <div className="rounded-card border-rule hidden overflow-x-auto border bg-white md:block">
            <table className="w-full border-collapse text-[0.9375rem]">
              <caption className="sr-only">
                {scope === "admin" ? "Every order" : "Your orders"}. Column headers with buttons sort the table.
              </caption>
              <thead>
                {table.getHeaderGroups().map((group) => (
                  <tr key={group.id} className="border-rule bg-paper border-b">
                    {group.headers.map((header) => {
                      const dir = header.column.getIsSorted();
                      const canSort = header.column.id !== "inspector";
                      return (
                        <th
                          key={header.id}
                          scope="col"
                          aria-sort={dir === "asc" ? "ascending" : dir === "desc" ? "descending" : undefined}
                          className={clsx(
                            "text-ink-2 px-4 py-2.5 text-xs font-semibold tracking-[0.06em] uppercase",
                            header.column.id === "price" ? "text-right" : "text-left",
                          )}
                        >
                          {canSort ? (
                            <button
                              type="button"
                              onClick={header.column.getToggleSortingHandler()}
                              className="hover:text-ink inline-flex items-center gap-1 rounded-sm uppercase"
                            >
                              <table.FlexRender header={header} />
                              <SortIcon dir={dir} />
                            </button>
                          ) : (
                            <table.FlexRender header={header} />
                          )}
                        </th>
                      );
                    })}
                  </tr>
                ))}
              </thead>
              <tbody className="divide-rule divide-y">
                {rows.map((row) => (
                  <tr key={row.id} className={clsx("hover:bg-paper/70 align-top", row.original.atRisk.flagged && "bg-danger-bg/40")}>
                    {row.getAllCells().map((cell) => (
                      <td
                        key={cell.id}
                        className={clsx("px-4 py-3", cell.column.id === "price" && "text-right", cell.column.id === "status" && "w-48")}
                      >
                        <table.FlexRender cell={cell} />
                      </td>
                    ))}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>

          <ul className="space-y-3 md:hidden" aria-label={scope === "admin" ? "Every order" : "Your orders"}>
            {rows.map((row) => (
              <OrderCard key={row.id} order={row.original} scope={scope} />
            ))}
          </ul>

          {table.getPageCount() > 1 ? (
            <nav aria-label="Pages" className="flex items-center justify-between gap-3">
              <Button variant="secondary" size="sm" onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()}>
                <span aria-hidden="true">←</span> Previous
              </Button>
              <span className="text-ink-2 text-sm">
                Page <span className="num">{pagination.pageIndex + 1}</span> of <span className="num">{table.getPageCount()}</span>
              </span>
              <Button variant="secondary" size="sm" onClick={() => table.nextPage()} disabled={!table.getCanNextPage()}>
                Next <span aria-hidden="true">→</span>
              </Button>
            </nav>
          ) : null}
        </>
      ) : null}
    </div>
  );
}

function OrderCard({ order, scope }: { order: OrderSummaryDto; scope: OrdersScope }) {
  return (
    <li
      className={clsx(
        "rounded-card shadow-card border bg-white px-4 py-3",
        order.atRisk.flagged ? "border-l-danger border-l-4 border-[#efc2c7]" : "border-rule",
      )}
    >
      <div className="flex items-start justify-between gap-3">
        <ListingCell order={order} scope={scope} />
        <Money cents={order.priceCents} className="shrink-0 text-sm" />
      </div>
      <div className="mt-2 flex flex-wrap items-center gap-2">
        <StatusBadge status={order.status} />
      </div>
      <AtRiskBadge atRisk={order.atRisk} className="mt-2" />
      <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-ink-2">Deadline</dt>
        <dd className="text-right">
          <DeadlineCell order={order} />
        </dd>
        <dt className="text-ink-2">Inspector</dt>
        <dd className="text-right">
          {order.inspector ? order.inspector.name : "Waiting"}
          {order.appointment ? (
            <span className="num text-ink-2 block">{formatDateTime(order.appointment.start, order.timeZone)}</span>
          ) : null}
        </dd>
      </dl>
    </li>
  );
}
