"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { createCustomer, setUserRole } from "@/lib/accounts/commands";
import { signUpSchema } from "@/lib/auth/password-policy";
import { ROLES } from "@/lib/auth/roles";
import { action } from "@/lib/http/action";

// Server actions for accounts; each checks the session and role on the server (`action`).

export const signUpAction = action({ public: true }, signUpSchema, async (input) => {
  const user = await createCustomer(input);
  return { id: user.id };
});

const setRoleSchema = z.object({
  userId: z.uuid("Choose an account."),
  role: z.enum(ROLES, "Choose one of the roles."),
});

export const setRoleAction = action({ permission: "admin:users" }, setRoleSchema, async (input, user) => {
  await setUserRole({ id: input.userId, role: input.role, actorId: user!.id });
  revalidatePath("/admin/users");
  return { userId: input.userId, role: input.role };
});
