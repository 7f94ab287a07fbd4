import type { RouteHandler } from "./engine";
import { confirmIntent } from "./confirm-intent";
import {
  createCustomer,
  retrieveCharge,
  retrieveCustomer,
  retrieveEvent,
  retrievePaymentMethod,
  updateCustomer,
} from "./lookup-routes";
import { findIntent } from "./payment-intent-inputs";
import { cancelIntent, createIntent, retrieveIntent, updateIntent } from "./payment-intent-routes";
import { createRefund, retrieveRefund } from "./refund-routes";
import {
  advanceTestClock,
  cancelSubscription,
  createPrice,
  createProduct,
  createSubscription,
  createTestClock,
  listInvoices,
  listSubscriptions,
  payInvoice,
  retrieveInvoice,
  retrievePrice,
  retrieveProduct,
  retrieveSubscription,
  retrieveTestClock,
  updateSubscription,
} from "./billing-routes";

/** The API surface of the payments stand-in. `publishable` marks what the browser library may call. */

export interface ApiRoute {
  method: "GET" | "POST" | "DELETE";
  pattern: RegExp;
  handler: RouteHandler;
  publishable?: boolean;
}

const ID = "([A-Za-z0-9_]+)";

const confirmRoute: RouteHandler = ({ engine, request, id }) =>
  confirmIntent({ engine, request, intent: findIntent({ engine, id }) });

export const API_ROUTES: readonly ApiRoute[] = [
  { method: "POST", pattern: /^\/v1\/payment_intents$/, handler: createIntent },
  {
    method: "GET",
    pattern: new RegExp(`^/v1/payment_intents/${ID}$`),
    handler: retrieveIntent,
    publishable: true,
  },
  { method: "POST", pattern: new RegExp(`^/v1/payment_intents/${ID}$`), handler: updateIntent },
  {
    method: "POST",
    pattern: new RegExp(`^/v1/payment_intents/${ID}/confirm$`),
    handler: confirmRoute,
    publishable: true,
  },
  {
    method: "POST",
    pattern: new RegExp(`^/v1/payment_intents/${ID}/cancel$`),
    handler: cancelIntent,
  },
  { method: "POST", pattern: /^\/v1\/refunds$/, handler: createRefund },
  { method: "GET", pattern: new RegExp(`^/v1/refunds/${ID}$`), handler: retrieveRefund },
  { method: "POST", pattern: /^\/v1\/customers$/, handler: createCustomer },
  { method: "GET", pattern: new RegExp(`^/v1/customers/${ID}$`), handler: retrieveCustomer },
  { method: "POST", pattern: new RegExp(`^/v1/customers/${ID}$`), handler: updateCustomer },
  { method: "GET", pattern: new RegExp(`^/v1/charges/${ID}$`), handler: retrieveCharge },
  {
    method: "GET",
    pattern: new RegExp(`^/v1/payment_methods/${ID}$`),
    handler: retrievePaymentMethod,
  },
  { method: "GET", pattern: new RegExp(`^/v1/events/${ID}$`), handler: retrieveEvent },
  { method: "POST", pattern: /^\/v1\/products$/, handler: createProduct },
  { method: "GET", pattern: new RegExp(`^/v1/products/${ID}$`), handler: retrieveProduct },
  { method: "POST", pattern: /^\/v1\/prices$/, handler: createPrice },
  { method: "GET", pattern: new RegExp(`^/v1/prices/${ID}$`), handler: retrievePrice },
  { method: "POST", pattern: /^\/v1\/subscriptions$/, handler: createSubscription },
  { method: "GET", pattern: /^\/v1\/subscriptions$/, handler: listSubscriptions },
  { method: "GET", pattern: new RegExp(`^/v1/subscriptions/${ID}$`), handler: retrieveSubscription },
  { method: "POST", pattern: new RegExp(`^/v1/subscriptions/${ID}$`), handler: updateSubscription },
  { method: "DELETE", pattern: new RegExp(`^/v1/subscriptions/${ID}$`), handler: cancelSubscription },
  { method: "GET", pattern: /^\/v1\/invoices$/, handler: listInvoices },
  { method: "GET", pattern: new RegExp(`^/v1/invoices/${ID}$`), handler: retrieveInvoice },
  { method: "POST", pattern: new RegExp(`^/v1/invoices/${ID}/pay$`), handler: payInvoice },
  { method: "POST", pattern: /^\/v1\/test_helpers\/test_clocks$/, handler: createTestClock },
  { method: "GET", pattern: new RegExp(`^/v1/test_helpers/test_clocks/${ID}$`), handler: retrieveTestClock },
  { method: "POST", pattern: new RegExp(`^/v1/test_helpers/test_clocks/${ID}/advance$`), handler: advanceTestClock },
];

export function matchApiRoute({ method, path }: { method: string; path: string }) {
  for (const route of API_ROUTES) {
    if (route.method !== method) continue;
    const match = route.pattern.exec(path);
    if (match) return { route, id: match[1] ?? "" };
  }
  return null;
}
