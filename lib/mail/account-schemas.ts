import { z } from "zod";

// Inputs of the account e-mail actions, shared by the forms and the server.

export const yearEndRequestSchema = z.object({
  year: z
    .number({ error: "Choose a year." })
    .int("Choose a year.")
    .min(2000, "Choose a year from 2000 on.")
    .max(9999, "Choose a real year."),
});
export type YearEndRequest = z.infer<typeof yearEndRequestSchema>;

export const preferencesSchema = z.object({
  seasonalReminders: z.boolean({ error: "Choose whether to get seasonal reminders." }),
});
export type Preferences = z.infer<typeof preferencesSchema>;

export const unsubscribeSchema = z.object({
  token: z
    .string()
    .min(16, "This unsubscribe link is incomplete.")
    .max(100, "This unsubscribe link is not one of ours."),
});
export type Unsubscribe = z.infer<typeof unsubscribeSchema>;
