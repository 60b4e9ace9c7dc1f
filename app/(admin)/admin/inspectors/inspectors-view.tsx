"use client";

import { useId, useState } from "react";
import useSWR from "swr";

import { Alert } from "@/components/ui/alert";
import { EmptyState } from "@/components/ui/empty-state";
import type { AdminInspectorDto } from "@/db/queries/admin-inspectors";

import { getJson } from "@/lib/api/client";
import { InspectorCard } from "./inspector-card";

type Filter = "queue" | "all";

const inQueue = (i: AdminInspectorDto) => !i.disabled && (i.status === "awaiting" || i.status === "changes_asked");

export function InspectorsView({ initial, linkSeconds }: { initial: AdminInspectorDto[]; linkSeconds: number }) {
  const [filter, setFilter] = useState<Filter>("queue");
  const [notice, setNotice] = useState<string | null>(null);
  const groupId = useId();
  // Refetched well before the signed certificate links expire.
  const { data, error, mutate } = useSWR<{ inspectors: AdminInspectorDto[] }>("/api/admin/inspectors?filter=all", getJson, {
    fallbackData: { inspectors: initial },
    refreshInterval: (linkSeconds * 1000) / 2,
    revalidateOnMount: false,
  });
  const all = data?.inspectors ?? initial;
  const queue = all.filter(inQueue);
  const shown = filter === "queue" ? queue : all;

  function updated(inspector: AdminInspectorDto, message: string) {
    void mutate({ inspectors: all.map((i) => (i.id === inspector.id ? inspector : i)) }, { revalidate: false });
    setNotice(message);
  }

  return (
    <div className="space-y-6">
      <fieldset className="flex flex-wrap gap-2">
        <legend className="sr-only">Show</legend>
        {(
          [
            ["queue", `Verification queue (${queue.length})`],
            ["all", `All inspectors (${all.length})`],
          ] as const
        ).map(([value, label]) => (
          <label
            key={value}
            className="has-checked:border-teal border-rule-strong has-focus-visible:outline-teal inline-flex h-10 cursor-pointer items-center rounded-md border bg-white px-4 text-[0.9375rem] has-checked:bg-teal-50 has-checked:text-teal-800 has-focus-visible:outline-2"
          >
            <input
              type="radio"
              name={`${groupId}-filter`}
              value={value}
              checked={filter === value}
              onChange={() => setFilter(value)}
              className="sr-only"
            />
            {label}
          </label>
        ))}
      </fieldset>

      <div aria-live="polite" role="status">
        {notice ? (
          <Alert tone="success" role={null}>
            {notice}
          </Alert>
        ) : null}
      </div>
      {error ? (
        <Alert tone="warning">
          The list could not be refreshed: {error instanceof Error ? error.message : "try again"}. Certificate links may have expired;
          reload the page.
        </Alert>
      ) : null}

      {shown.length === 0 ? (
        <EmptyState
          title={filter === "queue" ? "Nobody is waiting for verification" : "No inspectors yet"}
          description={
            filter === "queue"
              ? "New inspectors appear here once they have added their licence."
              : "Inspectors appear here when they sign up."
          }
        />
      ) : (
        <ul className="space-y-4" aria-label={filter === "queue" ? "Verification queue" : "All inspectors"}>
          {shown.map((inspector) => (
            <li key={inspector.id}>
              <InspectorCard inspector={inspector} onDecided={updated} />
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
