import type { Role } from "./roles";

export type NavItem = { href: string; label: string };

const STORE_NAV: NavItem[] = [
  { href: "/houses", label: "Houses" },
  { href: "/climate", label: "Your climate" },
  { href: "/placement", label: "Plan a site" },
  { href: "/give", label: "Give" },
  { href: "/cart", label: "Cart" },
];

const ROLE_NAV: Record<Role, NavItem[]> = {
  customer: [{ href: "/account", label: "My account" }],
  staff: [{ href: "/staff", label: "Workshop" }],
  fulfillment: [{ href: "/fulfillment", label: "Shipping desk" }],
  admin: [
    { href: "/staff", label: "Workshop" },
    { href: "/fulfillment", label: "Shipping desk" },
    { href: "/admin", label: "Admin" },
  ],
};

/** The navigation a visitor sees: the store for everyone, plus their own areas. */
export function navFor(role: Role | null): NavItem[] {
  return role ? [...STORE_NAV, ...ROLE_NAV[role]] : STORE_NAV;
}
