import { createPrefixedId, nowInUnixSeconds } from "../shared/ids";
import type { Invoice, Price, Product, Subscription, TestClock } from "./billing-objects";
import type { Params } from "./params";
import type {
  CardPaymentMethod,
  Charge,
  Customer,
  EventObject,
  EventType,
  PaymentIntent,
  Refund,
  StripeEvent,
} from "./objects";

/** In-memory state of the payments stand-in plus the event log; one per running server. */

export interface PaymentsState {
  intents: Map<string, PaymentIntent>;
  charges: Map<string, Charge>;
  refunds: Map<string, Refund>;
  customers: Map<string, Customer>;
  paymentMethods: Map<string, CardPaymentMethod>;
  /** Card digits behind each PaymentMethod, kept apart so no API answer can leak them. */
  cardNumbers: Map<string, string>;
  events: StripeEvent[];
  products: Map<string, Product>;
  prices: Map<string, Price>;
  subscriptions: Map<string, Subscription>;
  invoices: Map<string, Invoice>;
  /** Which invoice each invoice payment intent pays. */
  invoiceOfIntent: Map<string, string>;
  testClocks: Map<string, TestClock>;
}

export interface ApiRequest {
  method: string;
  path: string;
  /** Form body for POST, query string for GET. */
  params: Params;
  auth: { kind: "secret" | "publishable"; key: string };
  requestId: string;
  idempotencyKey: string | null;
  apiVersion: string;
}

export interface ApiResponse {
  status: number;
  body: unknown;
}

export interface PaymentsEngine {
  state: PaymentsState;
  emitEvent(input: {
    type: EventType;
    object: EventObject;
    request: ApiRequest;
  }): StripeEvent;
}

export type RouteHandler = (input: {
  engine: PaymentsEngine;
  request: ApiRequest;
  id: string;
}) => ApiResponse;

export function createPaymentsEngine({
  onEvent,
  hasWebhookEndpoint,
}: {
  onEvent: (event: StripeEvent) => void;
  hasWebhookEndpoint: boolean;
}): PaymentsEngine {
  const state: PaymentsState = {
    intents: new Map(),
    charges: new Map(),
    refunds: new Map(),
    customers: new Map(),
    paymentMethods: new Map(),
    cardNumbers: new Map(),
    events: [],
    products: new Map(),
    prices: new Map(),
    subscriptions: new Map(),
    invoices: new Map(),
    invoiceOfIntent: new Map(),
    testClocks: new Map(),
  };
  return {
    state,
    emitEvent({ type, object, request }) {
      const event: StripeEvent = {
        id: createPrefixedId({ prefix: "evt" }),
        object: "event",
        api_version: request.apiVersion,
        created: nowInUnixSeconds(),
        // A snapshot: later changes to the object must not rewrite history already sent.
        data: { object: structuredClone(object) },
        livemode: false,
        pending_webhooks: hasWebhookEndpoint ? 1 : 0,
        request: { id: request.requestId, idempotency_key: request.idempotencyKey },
        type,
      };
      state.events.push(event);
      onEvent(event);
      return event;
    },
  };
}
