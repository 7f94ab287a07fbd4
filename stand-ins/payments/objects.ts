import type { Invoice, Subscription } from "./billing-objects";

/**
 * The API objects the payments stand-in keeps, with the fields the real objects carry that
 * an order flow reads. Field names and meanings follow the PaymentIntent, Charge, Refund,
 * Customer, PaymentMethod and Event objects of the Stripe API reference (2024) and the
 * `stripe` SDK v23 type definitions. Fields the stand-in never varies are filled with the
 * values a test-mode card payment has.
 */

export type PaymentIntentStatus =
  | "requires_payment_method"
  | "requires_confirmation"
  | "requires_action"
  | "processing"
  | "succeeded"
  | "canceled";

export interface LastPaymentError {
  type: "card_error";
  code: string;
  decline_code?: string;
  message: string;
  charge: string;
  payment_method: CardPaymentMethod;
}

export interface PaymentIntent {
  id: string;
  object: "payment_intent";
  amount: number;
  amount_capturable: number;
  amount_received: number;
  allowed_payment_method_types: string[] | null;
  automatic_payment_methods: { enabled: boolean } | null;
  canceled_at: number | null;
  cancellation_reason: string | null;
  capture_method: "automatic" | "automatic_async";
  client_secret: string;
  confirmation_method: "automatic";
  created: number;
  currency: string;
  customer: string | null;
  description: string | null;
  last_payment_error: LastPaymentError | null;
  latest_charge: string | null;
  livemode: false;
  metadata: Record<string, string>;
  next_action: null;
  payment_method: string | null;
  payment_method_types: string[];
  processing: null;
  receipt_email: string | null;
  setup_future_usage: string | null;
  shipping: unknown;
  statement_descriptor: string | null;
  statement_descriptor_suffix: string | null;
  status: PaymentIntentStatus;
  transfer_group: string | null;
}

export interface CardPaymentMethod {
  id: string;
  object: "payment_method";
  type: "card";
  billing_details: {
    address: unknown;
    email: string | null;
    name: string | null;
    phone: string | null;
  };
  card: {
    brand: string;
    country: string;
    exp_month: number;
    exp_year: number;
    funding: "credit";
    last4: string;
  };
  created: number;
  customer: string | null;
  livemode: false;
  metadata: Record<string, string>;
}

export interface Refund {
  id: string;
  object: "refund";
  amount: number;
  balance_transaction: string | null;
  charge: string;
  created: number;
  currency: string;
  metadata: Record<string, string>;
  payment_intent: string;
  reason: string | null;
  receipt_number: null;
  status: "succeeded";
}

export interface Charge {
  id: string;
  object: "charge";
  amount: number;
  amount_captured: number;
  amount_refunded: number;
  billing_details: CardPaymentMethod["billing_details"];
  captured: boolean;
  created: number;
  currency: string;
  customer: string | null;
  description: string | null;
  failure_code: string | null;
  failure_message: string | null;
  livemode: false;
  metadata: Record<string, string>;
  outcome: { network_status: string; reason: string | null; seller_message: string; type: string };
  paid: boolean;
  payment_intent: string;
  payment_method: string;
  payment_method_details: {
    type: "card";
    card: { brand: string; last4: string; exp_month: number; exp_year: number };
  };
  receipt_email: string | null;
  receipt_url: null;
  refunded: boolean;
  refunds: { object: "list"; data: Refund[]; has_more: false; url: string };
  status: "succeeded" | "failed";
}

export interface Customer {
  id: string;
  object: "customer";
  address: unknown;
  created: number;
  description: string | null;
  email: string | null;
  livemode: false;
  metadata: Record<string, string>;
  name: string | null;
  phone: string | null;
  shipping: unknown;
  /** The test clock the customer's subscriptions run on, if any. */
  test_clock: string | null;
}

export type EventType =
  | "payment_intent.succeeded"
  | "payment_intent.payment_failed"
  | "payment_intent.canceled"
  | "charge.refunded"
  | "invoice.paid"
  | "invoice.payment_failed"
  | "customer.subscription.created"
  | "customer.subscription.updated"
  | "customer.subscription.deleted";

export type EventObject = PaymentIntent | Charge | Invoice | Subscription;

export interface StripeEvent {
  id: string;
  object: "event";
  api_version: string;
  created: number;
  data: { object: EventObject };
  livemode: false;
  pending_webhooks: number;
  request: { id: string | null; idempotency_key: string | null };
  type: EventType;
}

/** What a publishable key may see of a PaymentIntent: no metadata, customer or charge (as the real API restricts it). */
export function toPublishableView(intent: PaymentIntent) {
  const {
    metadata: _metadata,
    customer: _customer,
    latest_charge: _charge,
    amount_received: _received,
    ...rest
  } = intent;
  return rest;
}
