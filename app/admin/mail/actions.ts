"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { action } from "@/lib/http/action";
import { resendOutboxMessage } from "@/lib/mail/commands/outbox";

const resendSchema = z.object({ id: z.uuid("Choose a message.") });

export const resendMailAction = action(
  { permission: "admin:mail" },
  resendSchema,
  async ({ id }) => {
    const result = await resendOutboxMessage({ id });
    revalidatePath("/admin/mail");
    return result;
  },
);
