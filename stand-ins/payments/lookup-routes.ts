import { createPrefixedId, nowInUnixSeconds } from "../shared/ids";
import type { RouteHandler } from "./engine";
import { resourceMissing } from "./errors";
import type { Customer } from "./objects";
import {
  mergeMetadata,
  readOptionalEmail,
  readOptionalString,
  rejectUnknownParams,
} from "./params";

/** Customers, plus read-only look-ups of charges, payment methods and events. */

const CUSTOMER_PARAMS = [
  "address",
  "description",
  "email",
  "expand",
  "metadata",
  "name",
  "phone",
  "shipping",
  "preferred_locales",
  "test_clock",
  "invoice_settings",
];

function readTestClock(engine: Parameters<RouteHandler>[0]["engine"], id: string | undefined): string | null {
  if (!id) return null;
  if (!engine.state.testClocks.has(id)) throw resourceMissing({ kind: "test_helpers.test_clock", id, param: "test_clock", status: 400 });
  return id;
}

function nullableText(value: string | undefined, fallback: string | null): string | null {
  if (value === undefined) return fallback;
  return value === "" ? null : value;
}

export const createCustomer: RouteHandler = ({ engine, request }) => {
  const { params } = request;
  rejectUnknownParams({ params, allowed: CUSTOMER_PARAMS });
  const customer: Customer = {
    id: createPrefixedId({ prefix: "cus", length: 14 }),
    object: "customer",
    address: params.address ?? null,
    created: nowInUnixSeconds(),
    description: nullableText(readOptionalString(params, "description"), null),
    email: readOptionalEmail(params, "email") ?? null,
    livemode: false,
    metadata: mergeMetadata({ current: {}, params }),
    name: nullableText(readOptionalString(params, "name"), null),
    phone: nullableText(readOptionalString(params, "phone"), null),
    shipping: params.shipping ?? null,
    test_clock: readTestClock(engine, readOptionalString(params, "test_clock")),
  };
  engine.state.customers.set(customer.id, customer);
  return { status: 200, body: customer };
};

export const updateCustomer: RouteHandler = ({ engine, request, id }) => {
  const { params } = request;
  rejectUnknownParams({ params, allowed: CUSTOMER_PARAMS });
  const customer = engine.state.customers.get(id);
  if (!customer) throw resourceMissing({ kind: "customer", id, param: "id" });
  const updated: Customer = {
    ...customer,
    address: params.address ?? customer.address,
    description: nullableText(readOptionalString(params, "description"), customer.description),
    email: readOptionalEmail(params, "email") ?? (params.email === "" ? null : customer.email),
    metadata: mergeMetadata({ current: customer.metadata, params }),
    name: nullableText(readOptionalString(params, "name"), customer.name),
    phone: nullableText(readOptionalString(params, "phone"), customer.phone),
    shipping: params.shipping ?? customer.shipping,
  };
  engine.state.customers.set(id, updated);
  return { status: 200, body: updated };
};

export const retrieveCustomer: RouteHandler = ({ engine, id }) => {
  const customer = engine.state.customers.get(id);
  if (!customer) throw resourceMissing({ kind: "customer", id, param: "id" });
  return { status: 200, body: customer };
};

export const retrieveCharge: RouteHandler = ({ engine, id }) => {
  const charge = engine.state.charges.get(id);
  if (!charge) throw resourceMissing({ kind: "charge", id, param: "id" });
  return { status: 200, body: charge };
};

export const retrievePaymentMethod: RouteHandler = ({ engine, id }) => {
  const method = engine.state.paymentMethods.get(id);
  if (!method) throw resourceMissing({ kind: "payment_method", id, param: "payment_method" });
  return { status: 200, body: method };
};

export const retrieveEvent: RouteHandler = ({ engine, id }) => {
  const event = engine.state.events.find((candidate) => candidate.id === id);
  if (!event) throw resourceMissing({ kind: "event", id, param: "id" });
  return { status: 200, body: event };
};
