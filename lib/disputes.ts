// Words and shapes of disputes, shared by the server, the admin pages and the report pages (no zod here:
// the report pages' bundles stay small).

export const DISPUTE_REASONS = {
  missing_footage: "Part of the line was not filmed",
  wrong_address: "Wrong address",
  unreadable_clips: "Clips cannot be played or read",
  other: "Something else",
} as const;
export type DisputeReason = keyof typeof DISPUTE_REASONS;

export const DISPUTE_OUTCOMES = { no_action: "No action", redeliver: "Inspector re-delivers", refund: "Refund" } as const;
export type DisputeOutcome = keyof typeof DISPUTE_OUTCOMES;

export const DISPUTE_MESSAGE = { min: 10, max: 3000 } as const;

/** What the person who opened a dispute sees of it. */
export type DisputeDto = {
  id: string;
  status: "open" | "closed";
  reason: DisputeReason;
  createdAt: string;
  outcome: DisputeOutcome | null;
  outcomeNote: string | null;
  closedAt: string | null;
};

export const reasonLabel = (reason: string) => DISPUTE_REASONS[reason as DisputeReason] ?? reason;
export const outcomeLabel = (outcome: string | null) => (outcome ? (DISPUTE_OUTCOMES[outcome as DisputeOutcome] ?? outcome) : "");
