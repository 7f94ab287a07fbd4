/** The closed set of roles; every permission check goes through PERMISSIONS. */
export const ROLES = ["customer", "staff", "fulfillment", "admin"] as const;
export type Role = (typeof ROLES)[number];

export type Permission =
  | "account"
  | "staff:models"
  | "staff:stock"
  | "staff:inspections"
  | "staff:roost-reports"
  | "fulfillment:orders"
  | "admin:users"
  | "admin:settings"
  | "admin:refunds"
  | "admin:mail";

export const PERMISSIONS: Record<Role, readonly Permission[]> = {
  customer: ["account"],
  staff: ["account", "staff:models", "staff:stock", "staff:inspections", "staff:roost-reports"],
  fulfillment: ["account", "fulfillment:orders"],
  admin: [
    "account",
    "staff:models",
    "staff:stock",
    "staff:inspections",
    "staff:roost-reports",
    "fulfillment:orders",
    "admin:users",
    "admin:settings",
    "admin:refunds",
    "admin:mail",
  ],
};

export function can(role: Role, permission: Permission): boolean {
  return PERMISSIONS[role].includes(permission);
}

export const ROLE_LABELS: Record<Role, string> = {
  customer: "Supporter",
  staff: "Workshop staff",
  fulfillment: "Shipping volunteer",
  admin: "Administrator",
};

/** Where each role lands after signing in. */
export const ROLE_HOME: Record<Role, string> = {
  customer: "/account",
  staff: "/staff",
  fulfillment: "/fulfillment",
  admin: "/admin",
};

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (ROLES as readonly string[]).includes(value);
}
