import "server-only";
import { createElement } from "react";
import { z } from "zod";
import type { DbOrTx } from "@/db/client";
import { SHADES } from "@/lib/catalog/spec";
import { env } from "@/lib/config/env";
import { InstallGuideEmail } from "@/emails/install-guide";
import type { Composition } from "./composition";
import { resolveGuideContext } from "./guide-context";
import { buildInstallGuide, type GuideHouse } from "./install-guide-content";
import { loadOrderForMail } from "./queries/order-for-mail";
import { installGuidePayloadSchema, parsePayload, PermanentMailError } from "./payloads";

// Only the spec fields the guide speaks of; the full spec is validated where it is written.
const guideSpecSchema = z.looseObject({
  exteriorShade: z.enum(SHADES),
  vented: z.boolean(),
  chamberCount: z.number(),
});

/** The install guide: one per order when it is paid, and again when it is delivered. */
export async function composeInstallGuide({
  db,
  payload,
}: {
  db: DbOrTx;
  payload: unknown;
}): Promise<Composition> {
  const { orderId, occasion } = parsePayload({
    schema: installGuidePayloadSchema,
    payload,
    kind: "install-guide",
  });
  const data = await loadOrderForMail({ db, orderId });
  if (data.lines.length === 0)
    throw new PermanentMailError(
      `Order ${data.number} has no houses, so it needs no install guide.`,
    );
  const houses: GuideHouse[] = data.lines.map((line) => {
    const spec = guideSpecSchema.safeParse(line.spec);
    if (!spec.success)
      throw new PermanentMailError(`${line.name} has no usable spec for the install guide.`);
    return {
      name: line.name,
      quantity: line.quantity,
      ...spec.data,
      mounts: line.mounts,
      backToBackKit: line.backToBackKit,
    };
  });
  const context = await resolveGuideContext({ order: data.order, site: data.site, org: data.org });
  return {
    element: createElement(InstallGuideEmail, {
      org: data.org,
      name: data.order.name,
      orderNumber: data.number,
      orderUrl: data.orderUrl,
      occasion,
      pickup: data.order.method === "pickup",
      guide: buildInstallGuide({ houses, ...context }),
      preferencesUrl: `${env().APP_URL}/account/preferences`,
    }),
    replyTo: data.org.email,
  };
}
