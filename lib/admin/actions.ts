"use server";

import { revalidatePath } from "next/cache";
import { saveOrganization, saveShippingRates, saveTaxRates } from "@/lib/admin/commands";
import { organizationSchema, shippingRatesSchema, taxRatesSchema } from "@/lib/admin/settings-schemas";
import { expireCenter } from "@/lib/catalog/expire";
import { action } from "@/lib/http/action";

export const saveOrganizationAction = action({ permission: "admin:settings" }, organizationSchema, async (input) => {
  await saveOrganization(input);
  revalidatePath("/admin/settings");
  expireCenter("action");
  return { saved: true };
});

export const saveShippingRatesAction = action({ permission: "admin:settings" }, shippingRatesSchema, async (input) => {
  await saveShippingRates(input);
  revalidatePath("/admin/settings");
  return { saved: input.tiers.length };
});

export const saveTaxRatesAction = action({ permission: "admin:settings" }, taxRatesSchema, async (input) => {
  await saveTaxRates(input);
  revalidatePath("/admin/settings");
  return { saved: input.rates.length };
});
