import { z } from "zod";

// The two ways staff change stock (sales and reservations come from checkout). Each movement
// keeps who, when and why in the ledger.

const modelId = z.uuid("Choose a model.");
const note = z.string().trim().max(300, "Keep the note to 300 characters.");

export const receiveStockSchema = z.object({
  modelId,
  count: z
    .number({ error: "Enter how many houses arrived." })
    .int("Enter a whole number of houses.")
    .min(1, "At least 1 house must arrive.")
    .max(500, "Receive at most 500 houses at once; split a bigger delivery."),
  batch: z
    .string({ error: "Enter the batch name or number." })
    .trim()
    .min(1, "Enter the batch name or number, like 2026-spring-3.")
    .max(60, "Keep the batch to 60 characters."),
  builderName: z
    .string({ error: "Enter who built them." })
    .trim()
    .min(2, "Enter who built them.")
    .max(100, "Keep the builder's name to 100 characters."),
  note,
});
export type ReceiveStockInput = z.infer<typeof receiveStockSchema>;

export const ADJUST_REASONS = ["damaged", "recount", "returned"] as const;
export type AdjustReason = (typeof ADJUST_REASONS)[number];
export const ADJUST_REASON_LABELS: Record<AdjustReason, string> = {
  damaged: "Damaged (remove from stock)",
  recount: "Recount (correct the count)",
  returned: "Returned (back on the shelf)",
};
export const ADJUST_REASON_WORDS: Record<AdjustReason, string> = {
  damaged: "Damaged",
  recount: "Recount",
  returned: "Returned",
};

export const adjustStockSchema = z
  .object({
    modelId,
    reason: z.enum(ADJUST_REASONS, { error: "Choose why the stock changes." }),
    change: z
      .number({ error: "Enter the change as a whole number, like -2 or 3." })
      .int("Enter the change as a whole number, like -2 or 3.")
      .min(-500, "Change at most 500 houses at once.")
      .max(500, "Change at most 500 houses at once.")
      .refine((n) => n !== 0, "A change of 0 changes nothing; enter how many to add or remove."),
    note,
  })
  .superRefine((input, ctx) => {
    // A damaged house only ever leaves stock and a returned one only comes back; a recount goes
    // either way.
    if (input.reason === "damaged" && input.change > 0) {
      ctx.addIssue({
        code: "custom",
        path: ["change"],
        message: "Damaged houses leave stock: enter a negative change, like -1.",
      });
    }
    if (input.reason === "returned" && input.change < 0) {
      ctx.addIssue({
        code: "custom",
        path: ["change"],
        message: "Returned houses come back into stock: enter a positive change, like 1.",
      });
    }
    if (input.reason === "recount" && input.note.length === 0) {
      ctx.addIssue({
        code: "custom",
        path: ["note"],
        message: "Say what the recount found, like “counted 6 on the shelf”.",
      });
    }
  });
export type AdjustStockInput = z.infer<typeof adjustStockSchema>;

/** The reason as the ledger keeps it: our word, then the note. */
export function ledgerReason({ reason, note }: { reason: AdjustReason; note: string }): string {
  return note ? `${ADJUST_REASON_WORDS[reason]}: ${note}` : ADJUST_REASON_WORDS[reason];
}
