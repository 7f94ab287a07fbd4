"use server";

import { revalidatePath } from "next/cache";
import { expireOccupancy } from "@/lib/catalog/expire";
import { action } from "@/lib/http/action";
import { reviewRoostReport } from "./commands";
import { stopFromLink } from "./link-answers";
import { optOutSchema, reviewSchema } from "./report-input";

export const stopRoostQuestionsAction = action({ public: true }, optOutSchema, async ({ token }) => {
  const { email } = await stopFromLink({ token });
  // Say which address, but only its first letter and domain: the page may be on a shared screen.
  const [local = "", domain = ""] = email.split("@");
  return { address: `${local.slice(0, 1)}…@${domain}` };
});

export const reviewRoostReportAction = action({ permission: "staff:roost-reports" }, reviewSchema, async (input, user) => {
  const row = await reviewRoostReport({ input, actorId: user!.id });
  revalidatePath("/staff/roost-reports");
  expireOccupancy("action");
  return row;
});
