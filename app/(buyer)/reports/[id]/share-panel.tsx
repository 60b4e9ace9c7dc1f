"use client";

import { useState, type FormEvent } from "react";

import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import { formatDate } from "@/lib/format";

export type ShareLinkRow = { id: string; label: string | null; expiresAt: string; revokedAt: string | null; createdAt: string };
type ApiError = { error?: { message?: string; fieldErrors?: Record<string, string[]> } };

const DAY_CHOICES = [1, 3, 7, 14, 30, 90];

function linkState(l: ShareLinkRow, now: number): { word: string; live: boolean } {
  if (l.revokedAt) return { word: `Revoked ${formatDate(l.revokedAt)}`, live: false };
  if (new Date(l.expiresAt).getTime() <= now) return { word: `Expired ${formatDate(l.expiresAt)}`, live: false };
  return { word: `Expires ${formatDate(l.expiresAt)}`, live: true };
}

/** Read-only links for an agent, the seller's agent or a contractor. The URL is shown once, at creation. */
export function SharePanel({ reportId, initialLinks }: { reportId: string; initialLinks: ShareLinkRow[] }) {
  const [links, setLinks] = useState(initialLinks);
  const [label, setLabel] = useState("");
  const [days, setDays] = useState("14");
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [labelError, setLabelError] = useState<string | null>(null);
  const [created, setCreated] = useState<{ url: string; copied: boolean } | null>(null);
  const [confirming, setConfirming] = useState<string | null>(null);
  const [revoking, setRevoking] = useState<string | null>(null);
  const [now] = useState(() => Date.now());

  async function create(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setPending(true);
    setError(null);
    setLabelError(null);
    try {
      const res = await fetch(`/api/reports/${reportId}/share`, {
        method: "POST",
        headers: { "content-type": "application/json", accept: "application/json" },
        body: JSON.stringify({ label: label.trim() || undefined, days: Number(days) }),
      });
      const data = (await res.json().catch(() => null)) as (ShareLinkRow & { url: string } & ApiError) | null;
      if (res.ok && data?.url) {
        setCreated({ url: data.url, copied: false });
        setLinks((ls) => [
          {
            id: data.id,
            label: data.label ?? (label.trim() || null),
            expiresAt: data.expiresAt,
            revokedAt: null,
            createdAt: data.createdAt ?? new Date().toISOString(),
          },
          ...ls,
        ]);
        setLabel("");
      } else {
        setLabelError(data?.error?.fieldErrors?.label?.[0] ?? null);
        setError(data?.error?.message ?? "The link could not be made. Please try again.");
      }
    } catch {
      setError("Gradeline could not be reached. Check your connection and try again.");
    }
    setPending(false);
  }

  async function copy(url: string) {
    try {
      await navigator.clipboard.writeText(url);
      setCreated({ url, copied: true });
    } catch {
      setError("Copying was blocked by the browser: select the link and copy it by hand.");
    }
  }

  async function revoke(id: string) {
    setRevoking(id);
    setError(null);
    try {
      const res = await fetch(`/api/reports/${reportId}/share/${id}`, { method: "DELETE", headers: { accept: "application/json" } });
      if (res.ok || res.status === 404) {
        setLinks((ls) => ls.map((l) => (l.id === id ? { ...l, revokedAt: l.revokedAt ?? new Date().toISOString() } : l)));
        setConfirming(null);
      } else {
        const data = (await res.json().catch(() => null)) as ApiError | null;
        setError(data?.error?.message ?? "The link could not be revoked. Please try again.");
      }
    } catch {
      setError("Gradeline could not be reached. Check your connection and try again.");
    }
    setRevoking(null);
  }

  return (
    <Card id="share" aria-labelledby="share-title" className="scroll-mt-20">
      <CardHeader
        title={<span id="share-title">Share a read-only link</span>}
        description="Anyone with the link can read this rated summary and download its PDF, without signing in, until it expires or you revoke it. They cannot pay, share or change anything."
      />
      <CardBody className="space-y-6">
        <form onSubmit={create} className="grid items-start gap-4 sm:grid-cols-[1fr_10rem_auto]" noValidate>
          <Field label="Who is it for?" optional hint="For your own list, e.g. “My agent” or “Plumber’s quote”." error={labelError}>
            {(control) => <Input {...control} value={label} maxLength={80} onChange={(e) => setLabel(e.target.value)} autoComplete="off" />}
          </Field>
          <Field label="Expires after">
            {(control) => (
              <Select {...control} value={days} onChange={(e) => setDays(e.target.value)}>
                {DAY_CHOICES.map((d) => (
                  <option key={d} value={d}>
                    {d} {d === 1 ? "day" : "days"}
                  </option>
                ))}
              </Select>
            )}
          </Field>
          <Button type="submit" pending={pending} className="sm:mt-[1.625rem]">
            Create link
          </Button>
        </form>

        <div aria-live="polite" className="space-y-3">
          {error ? (
            <Alert tone="danger" role={null}>
              {error}
            </Alert>
          ) : null}
          {created ? (
            <div className="rounded-card bg-success-bg space-y-2 border border-[#c3ddc8] px-4 py-3">
              <p className="text-success font-semibold">Link created: copy it now</p>
              <p className="text-ink text-sm">For safety Gradeline shows the full link only this once.</p>
              <div className="flex flex-col gap-2 sm:flex-row">
                <label htmlFor="new-share-url" className="sr-only">
                  New share link
                </label>
                <Input
                  id="new-share-url"
                  readOnly
                  value={created.url}
                  onFocus={(e) => e.currentTarget.select()}
                  className="num sm:flex-1"
                />
                <Button variant="secondary" onClick={() => copy(created.url)}>
                  {created.copied ? "Copied" : "Copy"}
                </Button>
              </div>
            </div>
          ) : null}
        </div>

        <div>
          <h3 className="font-sans text-base font-semibold">Your links</h3>
          {links.length === 0 ? (
            <p className="text-ink-2 mt-2 text-sm">No links yet.</p>
          ) : (
            <ul className="divide-rule border-rule mt-2 divide-y border-y">
              {links.map((l) => {
                const state = linkState(l, now);
                return (
                  <li key={l.id} className="flex flex-wrap items-center justify-between gap-x-4 gap-y-2 py-3">
                    <div className="min-w-0">
                      <p className="text-ink font-medium">{l.label ?? "Unlabelled link"}</p>
                      <p className="text-ink-2 text-sm">
                        Made {formatDate(l.createdAt)} · <span className={state.live ? "text-ink" : undefined}>{state.word}</span>
                      </p>
                    </div>
                    {state.live ? (
                      confirming === l.id ? (
                        <div className="flex items-center gap-2">
                          <span className="text-ink-2 text-sm">Stop this link working?</span>
                          <Button variant="danger" size="sm" pending={revoking === l.id} onClick={() => revoke(l.id)}>
                            Revoke
                          </Button>
                          <Button variant="ghost" size="sm" onClick={() => setConfirming(null)}>
                            Keep
                          </Button>
                        </div>
                      ) : (
                        <Button
                          variant="secondary"
                          size="sm"
                          onClick={() => setConfirming(l.id)}
                          aria-label={`Revoke ${l.label ?? "unlabelled link"}`}
                        >
                          Revoke
                        </Button>
                      )
                    ) : null}
                  </li>
                );
              })}
            </ul>
          )}
        </div>
      </CardBody>
    </Card>
  );
}
