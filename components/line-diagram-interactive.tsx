"use client";

import { useState, type FocusEvent, type PointerEvent } from "react";

import { LineDiagram, type LineDiagramProps } from "./line-diagram";

function indexFrom(target: EventTarget | null): number | null {
  const el = target instanceof Element ? target.closest("[data-finding-index]") : null;
  const value = el?.getAttribute("data-finding-index");
  return value == null ? null : Number(value);
}

/**
 * The line diagram with a caption that follows the pointer, the keyboard focus and the last tap.
 * selectedFindingIndex comes from outside (the finding being edited, the clip playing).
 */
export function LineDiagramInteractive({
  selectedFindingIndex = null,
  onSelectFinding,
  ...props
}: Omit<LineDiagramProps, "highlightFindingIndex"> & { selectedFindingIndex?: number | null }) {
  const [pointed, setPointed] = useState<number | null>(null);
  const [focused, setFocused] = useState<number | null>(null);
  const [tapped, setTapped] = useState<number | null>(null);
  const active = pointed ?? focused ?? tapped ?? selectedFindingIndex;

  return (
    <div
      onPointerOver={(e: PointerEvent) => setPointed(indexFrom(e.target))}
      onPointerLeave={() => setPointed(null)}
      onFocus={(e: FocusEvent) => setFocused(indexFrom(e.target))}
      onBlur={() => setFocused(null)}
    >
      <LineDiagram
        {...props}
        highlightFindingIndex={active}
        onSelectFinding={(i) => {
          setTapped(i);
          onSelectFinding?.(i);
        }}
      />
    </div>
  );
}
