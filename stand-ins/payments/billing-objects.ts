/**
 * Recurring billing objects of the payments stand-in: Product, Price, Subscription, Invoice and
 * TestClock, with the fields a monthly-gift flow reads. Field names and meanings follow the
 * Stripe API reference ("Subscriptions", "Invoices", "Test clocks", 2025 versions, where an
 * invoice names its subscription under `parent.subscription_details` and its payment intents
 * under `payments`, and the first payment's secret is `confirmation_secret`) and the `stripe`
 * SDK v23 type definitions.
 */

export interface Product {
  id: string;
  object: "product";
  active: boolean;
  created: number;
  livemode: false;
  metadata: Record<string, string>;
  name: string;
}

export interface Price {
  id: string;
  object: "price";
  active: boolean;
  created: number;
  currency: string;
  livemode: false;
  metadata: Record<string, string>;
  product: string;
  recurring: { interval: "day" | "week" | "month" | "year"; interval_count: number } | null;
  type: "one_time" | "recurring";
  unit_amount: number;
}

export type SubscriptionStatus = "incomplete" | "incomplete_expired" | "active" | "past_due" | "canceled";

export interface SubscriptionItem {
  id: string;
  object: "subscription_item";
  created: number;
  current_period_start: number;
  current_period_end: number;
  metadata: Record<string, string>;
  price: Price;
  quantity: number;
  subscription: string;
}

export interface Subscription {
  id: string;
  object: "subscription";
  billing_cycle_anchor: number;
  cancel_at_period_end: boolean;
  canceled_at: number | null;
  collection_method: "charge_automatically";
  created: number;
  currency: string;
  customer: string;
  default_payment_method: string | null;
  description: string | null;
  ended_at: number | null;
  items: { object: "list"; data: SubscriptionItem[]; has_more: false; url: string };
  latest_invoice: string | null;
  livemode: false;
  metadata: Record<string, string>;
  payment_settings: { save_default_payment_method: "on_subscription" | "off" };
  start_date: number;
  status: SubscriptionStatus;
  test_clock: string | null;
}

export type InvoiceStatus = "draft" | "open" | "paid" | "void" | "uncollectible";

export interface Invoice {
  id: string;
  object: "invoice";
  amount_due: number;
  amount_paid: number;
  amount_remaining: number;
  attempt_count: number;
  attempted: boolean;
  billing_reason: "subscription_create" | "subscription_cycle" | "subscription_update";
  collection_method: "charge_automatically";
  confirmation_secret: { client_secret: string; type: "payment_intent" } | null;
  created: number;
  currency: string;
  customer: string;
  customer_email: string | null;
  customer_name: string | null;
  lines: {
    object: "list";
    data: { id: string; object: "line_item"; amount: number; currency: string; description: string; period: { start: number; end: number } }[];
    has_more: false;
    url: string;
  };
  livemode: false;
  metadata: Record<string, string>;
  next_payment_attempt: number | null;
  parent: {
    type: "subscription_details";
    subscription_details: { subscription: string; metadata: Record<string, string> };
  };
  payments: {
    object: "list";
    data: { id: string; object: "invoice_payment"; is_default: boolean; payment: { type: "payment_intent"; payment_intent: string }; status: "open" | "paid" | "canceled" }[];
    has_more: false;
    url: string;
  };
  period_start: number;
  period_end: number;
  status: InvoiceStatus;
  status_transitions: { finalized_at: number | null; paid_at: number | null; voided_at: number | null };
  test_clock: string | null;
  total: number;
}

export interface TestClock {
  id: string;
  object: "test_helpers.test_clock";
  created: number;
  deletes_after: number;
  frozen_time: number;
  livemode: false;
  name: string | null;
  status: "ready" | "advancing";
}
