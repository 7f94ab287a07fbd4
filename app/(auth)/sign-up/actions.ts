"use server";

import { createCustomer } from "@/lib/accounts/users";
import { signUpSchema } from "@/lib/auth/password-policy";
import { action } from "@/lib/http/action";

export const signUpAction = action({ public: true }, signUpSchema, async (input) => {
  const user = await createCustomer(input);
  return { id: user.id };
});
