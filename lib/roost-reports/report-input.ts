import { z } from "zod";
import { queryInt } from "@/lib/http/query-number";
import { COUNT_BANDS, ROOST_ANSWERS } from "./answers";

// Inputs of roost reports, with the words a buyer or staff member reads beside each field.
// Shared by the forms and the server.

export const MAX_NOTE_CHARS = 1000;
export const MOUNT_CHOICES = ["pole", "building", "tree"] as const;

const note = z
  .string({ error: "The note must be text." })
  .trim()
  .max(MAX_NOTE_CHARS, `Keep the note under ${MAX_NOTE_CHARS} characters.`)
  .default("");

const countBand = z
  .enum(COUNT_BANDS, { error: "Choose one of the counts offered, or leave it empty." })
  .optional()
  .or(z.literal("").transform(() => undefined));

function countOnlyWithBats(input: { answer: string; countBand?: string }, ctx: z.RefinementCtx) {
  if (input.countBand && input.answer !== "bats_seen") {
    ctx.addIssue({ code: "custom", path: ["countBand"], message: "A count goes with “Bats seen” only." });
  }
}

/** The order page and account page form (multipart: these fields plus an optional `photo`). */
export const houseReportSchema = z
  .object({
    orderLineId: z.uuid("Choose a house from this order."),
    unit: queryInt(z.number({ error: "Choose a house from this order." }).int().min(1).max(10)),
    season: queryInt(z.number({ error: "Choose the season." }).int().min(2000).max(9999)),
    answer: z.enum(ROOST_ANSWERS, { error: "Choose what you saw this season." }),
    countBand,
    note,
    mount: z
      .enum(MOUNT_CHOICES, { error: "Choose a pole, a building wall or a tree." })
      .optional()
      .or(z.literal("").transform(() => undefined)),
  })
  .superRefine(countOnlyWithBats);
export type HouseReportInput = z.infer<typeof houseReportSchema>;

/** The confirmation page of an e-mail link: the token carries the house, season and answer. */
export const linkAnswerSchema = z.object({
  token: z.string({ error: "The link is missing its token." }).min(10, "The link is missing its token.").max(600),
  countBand,
  note,
});
export type LinkAnswerInput = z.infer<typeof linkAnswerSchema>;

export const REVIEW_DECISIONS = ["accepted", "doubtful", "follow_up"] as const;

export const reviewSchema = z
  .object({
    reportId: z.uuid("That report does not exist."),
    decision: z.enum(REVIEW_DECISIONS, { error: "Choose: looks right, doubtful, or follow up." }),
    reason: z.string().trim().max(500, "Keep the reason under 500 characters.").default(""),
  })
  .superRefine((input, ctx) => {
    if (input.decision === "doubtful" && input.reason.length < 3) {
      ctx.addIssue({ code: "custom", path: ["reason"], message: "Say why the report is doubtful; it is kept with the report." });
    }
  });
export type ReviewInput = z.infer<typeof reviewSchema>;

export const optOutSchema = z.object({ token: z.string().min(10, "The link is missing its token.").max(600) });
