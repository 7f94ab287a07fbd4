"use server";

import { action } from "@/lib/http/action";
import { yearEndRequestSchema } from "@/lib/mail/account-schemas";
import { requestYearEndStatement } from "@/lib/mail/commands/year-end";

export const emailYearEndStatementAction = action(
  { permission: "account" },
  yearEndRequestSchema,
  async ({ year }, user) => {
    if (!user) throw new Error("the account permission always loads the user");
    return requestYearEndStatement({ userId: user.id, email: user.email, year });
  },
);
