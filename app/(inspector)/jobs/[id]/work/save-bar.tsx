"use client";

import { useEffect, type RefObject } from "react";

import { Button } from "@/components/ui/button";

import type { SaveState } from "./use-draft";

const clock = new Intl.DateTimeFormat(undefined, { hour: "2-digit", minute: "2-digit", hourCycle: "h23" });

function SaveText({ state, everSaved }: { state: SaveState; everSaved: boolean }) {
  switch (state.kind) {
    case "clean":
      return <>{everSaved ? "Draft saved" : "Nothing to save yet"}</>;
    case "saving":
      return <>Saving…</>;
    case "saved":
      return (
        <>
          Saved · <span className="num">{clock.format(state.at)}</span>
        </>
      );
    case "failed":
      return <span className="text-danger font-medium">Not saved —</span>;
    case "conflict":
      return <span className="text-danger font-medium">Not saved</span>;
  }
}

/** Always in reach of a thumb: where the draft stands and the way to the end. */
export function SaveBar({
  barRef,
  state,
  everSaved,
  onRetry,
  action,
}: {
  barRef?: RefObject<HTMLDivElement | null>;
  state: SaveState;
  everSaved: boolean;
  onRetry: () => void;
  action: { label: string; onClick: () => void; pending?: boolean } | null;
}) {
  return (
    <div
      ref={barRef}
      className="border-rule fixed inset-x-0 bottom-0 z-40 border-t bg-white/95 shadow-[0_-6px_18px_-14px_rgb(27_36_34/0.5)] backdrop-blur print:hidden"
    >
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-3 gap-y-2 px-4 py-2 sm:px-6">
        <p role="status" className="text-ink-2 flex min-h-11 min-w-0 flex-1 items-center gap-2 text-sm" data-save-status={state.kind}>
          <SaveText state={state} everSaved={everSaved} />
          {state.kind === "failed" ? (
            <Button variant="secondary" size="sm" className="min-h-11" onClick={onRetry}>
              Retry
            </Button>
          ) : null}
        </p>
        {state.kind === "conflict" ? (
          <div
            role="alert"
            className="bg-warning-bg order-first flex w-full flex-wrap items-center gap-3 rounded-md border border-[#efdcb2] px-3 py-2 text-sm"
          >
            <span className="min-w-0 flex-1">{state.message}</span>
            <Button size="sm" className="min-h-11" onClick={() => window.location.reload()}>
              Reload
            </Button>
          </div>
        ) : null}
        {action ? (
          <Button className="min-h-11" onClick={action.onClick} pending={action.pending}>
            {action.label}
          </Button>
        ) : null}
      </div>
    </div>
  );
}

/** The bottom bar must never hide the field that has focus (WCAG 2.4.11): scroll padding keeps focus and "go to field" clear of it. */
export function useScrollPadding(bar: RefObject<HTMLElement | null>) {
  useEffect(() => {
    const root = document.documentElement;
    const update = () => {
      root.style.scrollPaddingBottom = `${(bar.current?.offsetHeight ?? 0) + 8}px`;
    };
    const observer = new ResizeObserver(update);
    if (bar.current) observer.observe(bar.current);
    update();
    return () => {
      observer.disconnect();
      root.style.scrollPaddingBottom = "";
    };
  }, [bar]);
}
