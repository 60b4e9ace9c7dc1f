"use client";

import { createContext, useContext } from "react";

import type { ClipSummary } from "./use-clips";

export type WorkspaceContextValue = {
  /** The problem to show beside the control that edits this record path, if any. */
  errorFor: (path: string) => string | undefined;
  readyClips: ClipSummary[];
  /** The finding being edited, to mark it on the diagram. */
  setActiveFinding: (index: number | null) => void;
};

export const WorkspaceContext = createContext<WorkspaceContextValue>({
  errorFor: () => undefined,
  readyClips: [],
  setActiveFinding: () => undefined,
});

export const useWorkspace = () => useContext(WorkspaceContext);
