import "server-only";
import { createElement } from "react";
import type { DbOrTx } from "@/db/client";
import { env } from "@/lib/config/env";
import {
  CARRIER_LABELS,
  CARRIERS,
  validateTrackingNumber,
  type Carrier,
} from "@/lib/fulfillment/tracking";
import { DeliveredEmail } from "@/emails/delivered";
import { GiftReceiptEmail } from "@/emails/gift-receipt";
import { OrderConfirmationEmail } from "@/emails/order-confirmation";
import { PaymentRefundedEmail } from "@/emails/payment-refunded";
import { ReadyForPickupEmail } from "@/emails/ready-for-pickup";
import { RefundEmail } from "@/emails/refund";
import { ShippedEmail } from "@/emails/shipped";
import { orderBandWords } from "@/lib/climate/order-band";
import type { Composition } from "./composition";
import { dedicationLines } from "@/lib/giving/dedication-words";
import { findDedicationForOrder, getCenterTimeZone } from "@/lib/giving/queries";
import { formatAddress, formatMailDate } from "./format";
import { findGiftForOrder, loadOrderForMail, type OrderForMail } from "./queries/order-for-mail";
import { receiptForOrder } from "./order-receipt";
import {
  orderPayloadSchema,
  parsePayload,
  paymentRefundedPayloadSchema,
  PermanentMailError,
  refundPayloadSchema,
} from "./payloads";

function isCarrier(value: string): value is Carrier {
  return (CARRIERS as readonly string[]).includes(value);
}

const shipToSchemaKeys = ["line1", "city", "state", "zip"] as const;

function shipToText(shipTo: unknown): string | null {
  if (!shipTo || typeof shipTo !== "object") return null;
  const record = shipTo as Record<string, unknown>;
  if (!shipToSchemaKeys.every((key) => typeof record[key] === "string")) return null;
  return formatAddress(record as Parameters<typeof formatAddress>[0]);
}

function confirmation(data: OrderForMail): Composition {
  const { order } = data;
  const receipt = receiptForOrder(order, data.lines);
  return {
    element: createElement(OrderConfirmationEmail, {
      org: data.org,
      name: order.name,
      orderNumber: data.number,
      orderUrl: data.orderUrl,
      lines: data.lines.map(({ name, quantity, unitPriceCents }) => ({
        name,
        quantity,
        unitPriceCents,
      })),
      method: order.method,
      shipTo: shipToText(order.shipTo),
      amounts: order,
      receipt,
      band: orderBandWords(order),
    }),
  };
}

async function giftReceipt(db: DbOrTx, data: OrderForMail): Promise<Composition> {
  const gift = await findGiftForOrder({ db, orderId: data.order.id });
  if (!gift) throw new PermanentMailError(`Order ${data.number} has no recorded gift.`);
  const timeZone = await getCenterTimeZone(db);
  // A one-time gift's tribute and covered fee, as on the receipt page. A monthly payment's order has
  // none: its covered fee was worked out for the first amount and is not kept up when the donor changes it.
  const dedication = await findDedicationForOrder(data.order.id, db);
  return {
    element: createElement(GiftReceiptEmail, {
      org: data.org,
      donorName: data.order.name,
      orderNumber: data.number,
      date: formatMailDate(gift.receivedAt, timeZone),
      amountPaidCents: data.order.totalCents,
      giftCents: gift.amountCents,
      receipt: receiptForOrder(data.order, data.lines),
      extras: dedicationLines(dedication),
    }),
  };
}

function shipped(data: OrderForMail): Composition {
  const parcels = data.parcels.map((parcel) => {
    const carrier = parcel.carrier && isCarrier(parcel.carrier) ? parcel.carrier : "other";
    const check = parcel.trackingNumber
      ? validateTrackingNumber({ carrier, number: parcel.trackingNumber })
      : null;
    return {
      description: parcel.description,
      carrier: CARRIER_LABELS[carrier],
      service: parcel.service,
      trackingNumber: parcel.trackingNumber,
      trackingUrl: check?.ok ? check.url : null,
    };
  });
  return {
    element: createElement(ShippedEmail, {
      org: data.org,
      name: data.order.name,
      orderNumber: data.number,
      orderUrl: data.orderUrl,
      parcels,
    }),
  };
}

/** Messages about one order: confirmation, gift receipt, shipment, delivery, pickup, refunds. */
export async function composeOrderMessage({
  db,
  kind,
  payload,
}: {
  db: DbOrTx;
  kind: string;
  payload: unknown;
}): Promise<Composition> {
  const { orderId } = parsePayload({ schema: orderPayloadSchema, payload, kind });
  const data = await loadOrderForMail({ db, orderId });
  const base = {
    org: data.org,
    name: data.order.name,
    orderNumber: data.number,
    orderUrl: data.orderUrl,
  };
  const replyTo = data.org.email;
  switch (kind) {
    case "order-confirmation":
      return { ...confirmation(data), replyTo };
    case "gift-receipt":
      return { ...(await giftReceipt(db, data)), replyTo };
    case "shipped":
      return { ...shipped(data), replyTo };
    case "delivered":
      return { element: createElement(DeliveredEmail, base), replyTo };
    case "ready-for-pickup":
      return { element: createElement(ReadyForPickupEmail, base), replyTo };
    case "refund": {
      const refund = parsePayload({ schema: refundPayloadSchema, payload, kind });
      return {
        element: createElement(RefundEmail, {
          ...base,
          amountCents: refund.amountCents,
          cancelled: refund.cancelled,
          totalPaidCents: data.order.totalCents,
          totalRefundedCents: data.order.refundedCents,
          hadGift: data.order.giftCents > 0,
        }),
        replyTo,
      };
    }
    case "payment-refunded": {
      const refunded = parsePayload({ schema: paymentRefundedPayloadSchema, payload, kind });
      const { why } = refunded;
      return {
        element: createElement(PaymentRefundedEmail, {
          ...base,
          why,
          amountCents: refunded.amountCents ?? (data.order.refundedCents || data.order.totalCents),
          shopUrl: `${env().APP_URL}/houses`,
        }),
        replyTo,
      };
    }
    default:
      throw new PermanentMailError(`No order template for kind ${kind}.`);
  }
}
