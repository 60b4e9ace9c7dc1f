"use client";

import useSWR from "swr";

export type ClipStatus = "uploading" | "ready" | "rejected" | "aborted" | "removed";

export type ClipSummary = {
  id: string;
  status: ClipStatus;
  label: string;
  sizeBytes: number;
  durationSeconds: number | null;
  startFootage: number | null;
  posterUrl: string | null;
};

async function getClips(url: string): Promise<ClipSummary[]> {
  const res = await fetch(url, { headers: { accept: "application/json" } });
  if (!res.ok) throw new Error(res.status === 404 ? "Clips are not available for this job yet." : "The clips could not be loaded.");
  return ((await res.json()) as { clips: ClipSummary[] }).clips;
}

/** The job's clips; polled while one is still uploading or being checked. */
export function useClips(jobId: string) {
  const { data, error, isLoading, mutate } = useSWR(`/api/jobs/${jobId}/clips`, getClips, {
    refreshInterval: (clips) => (clips?.some((c) => c.status === "uploading") ? 5000 : 0),
    revalidateOnFocus: true,
  });
  const clips = data ?? [];
  return { clips, ready: clips.filter((c) => c.status === "ready"), error: error as Error | undefined, isLoading, reload: () => mutate() };
}
