import type { DemoRole } from "./accounts";

/** Every protected page and the roles that may open it; later areas add theirs here. */
export const PROTECTED_PAGES: { path: string; allowed: DemoRole[]; heading: RegExp }[] = [
  { path: "/account", allowed: ["customer", "staff", "fulfillment", "admin"], heading: /^Hello, / },
  { path: "/staff", allowed: ["staff", "admin"], heading: /^Workshop$/ },
  { path: "/fulfillment", allowed: ["fulfillment", "admin"], heading: /^Shipping desk$/ },
  { path: "/admin", allowed: ["admin"], heading: /^Admin$/ },
  { path: "/admin/users", allowed: ["admin"], heading: /^Accounts and roles$/ },
  { path: "/admin/settings", allowed: ["admin"], heading: /^Center settings$/ },
  { path: "/admin/mail", allowed: ["admin"], heading: /^Mail$/ },
  { path: "/account/gifts", allowed: ["customer", "staff", "fulfillment", "admin"], heading: /^Your gifts$/ },
  { path: "/account/preferences", allowed: ["customer", "staff", "fulfillment", "admin"], heading: /^E-mail preferences$/ },
];

/** Every protected JSON route: method, path and the roles that may call it. */
export const PROTECTED_ROUTES: { method: "GET" | "POST"; path: string; allowed: DemoRole[]; body?: unknown }[] = [
  { method: "GET", path: "/api/admin/users", allowed: ["admin"] },
];
