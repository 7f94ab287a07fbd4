import type { DemoRole } from "./accounts";

/** Every protected page and the roles that may open it; later areas add theirs here. */
export const PROTECTED_PAGES: { path: string; allowed: DemoRole[]; heading: RegExp }[] = [
  { path: "/account", allowed: ["customer", "staff", "fulfillment", "admin"], heading: /^Hello, / },
  { path: "/staff", allowed: ["staff", "admin"], heading: /^Workshop$/ },
  { path: "/staff/models", allowed: ["staff", "admin"], heading: /^House models$/ },
  { path: "/staff/models/new", allowed: ["staff", "admin"], heading: /^List a new model$/ },
  { path: "/staff/models/hollow-four", allowed: ["staff", "admin"], heading: /^Hollow Four$/ },
  { path: "/staff/models/hollow-four/photos", allowed: ["staff", "admin"], heading: /^Hollow Four$/ },
  { path: "/staff/models/hollow-four/inspections", allowed: ["staff", "admin"], heading: /^Hollow Four$/ },
  { path: "/staff/models/hollow-four/stock", allowed: ["staff", "admin"], heading: /^Hollow Four$/ },
  { path: "/fulfillment", allowed: ["fulfillment", "admin"], heading: /^Shipping desk$/ },
  { path: "/admin", allowed: ["admin"], heading: /^Admin$/ },
  { path: "/admin/users", allowed: ["admin"], heading: /^Accounts and roles$/ },
  { path: "/admin/settings", allowed: ["admin"], heading: /^Center settings$/ },
  { path: "/admin/mail", allowed: ["admin"], heading: /^Mail$/ },
  { path: "/admin/reports", allowed: ["admin"], heading: /^Reports$/ },
  { path: "/account/gifts", allowed: ["customer", "staff", "fulfillment", "admin"], heading: /^Your gifts$/ },
  { path: "/account/preferences", allowed: ["customer", "staff", "fulfillment", "admin"], heading: /^E-mail preferences$/ },
  { path: "/account/sites", allowed: ["customer", "staff", "fulfillment", "admin"], heading: /^Your saved sites$/ },
];

/** Every protected JSON route: method, path and the roles that may call it. */
export const PROTECTED_ROUTES: { method: "GET" | "POST"; path: string; allowed: DemoRole[]; body?: unknown }[] = [
  { method: "GET", path: "/api/admin/users", allowed: ["admin"] },
  { method: "GET", path: "/api/staff/models", allowed: ["staff", "admin"] },
  { method: "GET", path: "/api/staff/models/hollow-four/photos", allowed: ["staff", "admin"] },
  { method: "GET", path: "/api/staff/models/hollow-four/stock-movements", allowed: ["staff", "admin"] },
  { method: "GET", path: "/api/sites", allowed: ["customer", "staff", "fulfillment", "admin"] },
];

// Shipping desk (issue 7). Order pages and POST actions need a real order id; their role checks
// run in tests/e2e/fulfillment.spec.ts and tests/integration/fulfillment/roles.test.ts.
PROTECTED_ROUTES.push(
  { method: "GET", path: "/api/fulfillment/orders", allowed: ["fulfillment", "admin"] },
  { method: "GET", path: "/api/fulfillment/orders.csv", allowed: ["fulfillment", "admin"] },
);

// Roost reports (issue 16): the workshop's review list and its figures, staff and admin only.
PROTECTED_PAGES.push(
  { path: "/staff/roost-reports", allowed: ["staff", "admin"], heading: /^Roost reports$/ },
  { path: "/staff/roost-reports/figures", allowed: ["staff", "admin"], heading: /^Roost report figures$/ },
);

// The center's reports (issue 17): admins see everything; workshop staff the stock part only.
PROTECTED_PAGES.push({ path: "/staff/reports", allowed: ["staff", "admin"], heading: /^Stock report$/ });
PROTECTED_ROUTES.push(
  { method: "GET", path: "/api/admin/reports/sales.csv", allowed: ["admin"] },
  { method: "GET", path: "/api/admin/reports/stock.csv", allowed: ["staff", "admin"] },
  { method: "GET", path: "/api/admin/reports/build-plan.csv", allowed: ["staff", "admin"] },
);
PROTECTED_PAGES.push({ path: "/admin/statements", allowed: ["admin"], heading: /^Year-end statements$/ });
