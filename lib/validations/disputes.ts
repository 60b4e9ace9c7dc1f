import { z } from "zod";

import { DISPUTE_MESSAGE, DISPUTE_REASONS, type DisputeReason } from "@/lib/disputes";

export const openDisputeSchema = z
  .object({
    reason: z.enum(Object.keys(DISPUTE_REASONS) as [DisputeReason, ...DisputeReason[]], { error: "Choose what is wrong." }),
    message: z
      .string({ message: "Say in a sentence or two what is wrong." })
      .trim()
      .min(DISPUTE_MESSAGE.min, "Say in a sentence or two what is wrong.")
      .max(DISPUTE_MESSAGE.max, "Keep the message under 3,000 characters."),
  })
  .strict();
export type OpenDisputeInput = z.infer<typeof openDisputeSchema>;
