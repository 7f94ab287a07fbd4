import { inArray } from "drizzle-orm";
import { getDb } from "@/db/client";
import { climateStations } from "@/db/schema";
import { startMailStandIn, type MailStandIn } from "@/stand-ins/mail/server";
import type { StoredMessage } from "@/stand-ins/mail/message-store";
import type { CheckoutRequest } from "@/lib/checkout/schemas";
import { checkoutInput, pay, startCheckout } from "../checkout/helpers";
import type { startTestPayments } from "../../support/payments";

/** The mail stand-in on the port RESEND_BASE_URL names (tests/support/integration-setup.ts). */
export function startTestMail(): Promise<MailStandIn> {
  return startMailStandIn({ port: Number(new URL(process.env.RESEND_BASE_URL!).port) });
}

export async function clearInbox(mail: MailStandIn): Promise<void> {
  mail.setDown(false);
  await fetch(`${mail.url}/_stand-in/messages`, { method: "DELETE" });
}

export function messagesMatching(mail: MailStandIn, subject: RegExp): StoredMessage[] {
  return mail.messages().filter((m) => subject.test(m.subject));
}

/** Checks out, pays through the payments SDK and waits until the webhook has been handled. */
export async function payForOrder(
  payments: Awaited<ReturnType<typeof startTestPayments>>,
  partial: Partial<CheckoutRequest> = {},
): Promise<string> {
  const { orderId } = await startCheckout(checkoutInput(partial), null);
  await pay(orderId);
  await payments.standIn.webhooksIdle();
  return orderId;
}

// Three invented stations: two around Phoenix with a very hot July, one cool one in the
// Oregon Cascades near the center's ZIP, so the ZIP lookup has something to weigh.
const TEST_STATIONS = [
  {
    id: "TEST0000001",
    name: "TEST DESERT A",
    state: "AZ",
    lat: 33.43,
    lon: -111.94,
    julyHighF: 106.1,
    flag: "C",
  },
  {
    id: "TEST0000002",
    name: "TEST DESERT B",
    state: "AZ",
    lat: 33.45,
    lon: -112.07,
    julyHighF: 106.5,
    flag: "C",
  },
  {
    id: "TEST0000003",
    name: "TEST DESERT C",
    state: "AZ",
    lat: 33.3,
    lon: -111.84,
    julyHighF: 105.8,
    flag: "C",
  },
];

/** Loads the test stations and forgets any station index the process built before. */
export async function loadTestStations(): Promise<void> {
  const db = await getDb();
  await db.insert(climateStations).values(TEST_STATIONS).onConflictDoNothing();
  (globalThis as { __roostwrightStations?: unknown }).__roostwrightStations = undefined;
}

export async function removeTestStations(): Promise<void> {
  const db = await getDb();
  await db.delete(climateStations).where(
    inArray(
      climateStations.id,
      TEST_STATIONS.map((s) => s.id),
    ),
  );
  (globalThis as { __roostwrightStations?: unknown }).__roostwrightStations = undefined;
}
