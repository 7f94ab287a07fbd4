"use client";

import { useSyncExternalStore } from "react";

// The cart lives in the browser (it survives reloads) and is re-validated by the server at every
// step: prices, stock and totals always come from the database, never from here.
export type CartLine = { slug: string; quantity: number };
export type Cart = { lines: CartLine[] };

const KEY = "roostwright.cart.v1";
export const MAX_PER_LINE = 10;
const EMPTY: Cart = { lines: [] };
const listeners = new Set<() => void>();
let cached: { raw: string | null; cart: Cart } = { raw: null, cart: EMPTY };

function read(): Cart {
  if (typeof window === "undefined") return EMPTY;
  const raw = window.localStorage.getItem(KEY);
  if (raw === cached.raw) return cached.cart;
  let cart = EMPTY;
  try {
    const parsed = raw ? (JSON.parse(raw) as Cart) : EMPTY;
    cart = {
      lines: (parsed.lines ?? [])
        .filter((l) => typeof l.slug === "string" && Number.isInteger(l.quantity))
        .map((l) => ({ slug: l.slug, quantity: Math.min(MAX_PER_LINE, Math.max(1, l.quantity)) })),
    };
  } catch {
    cart = EMPTY;
  }
  cached = { raw, cart };
  return cart;
}

function write(cart: Cart) {
  window.localStorage.setItem(KEY, JSON.stringify(cart));
  for (const l of listeners) l();
}

function subscribe(listener: () => void) {
  listeners.add(listener);
  const onStorage = (e: StorageEvent) => e.key === KEY && listener();
  window.addEventListener("storage", onStorage);
  return () => {
    listeners.delete(listener);
    window.removeEventListener("storage", onStorage);
  };
}

export function useCart(): Cart {
  return useSyncExternalStore(subscribe, read, () => EMPTY);
}

export const cartActions = {
  add(slug: string, quantity: number) {
    const cart = read();
    const existing = cart.lines.find((l) => l.slug === slug);
    const lines = existing
      ? cart.lines.map((l) => (l.slug === slug ? { slug, quantity: Math.min(MAX_PER_LINE, l.quantity + quantity) } : l))
      : [...cart.lines, { slug, quantity: Math.min(MAX_PER_LINE, quantity) }];
    write({ lines });
  },
  setQuantity(slug: string, quantity: number) {
    write({ lines: read().lines.map((l) => (l.slug === slug ? { slug, quantity: Math.min(MAX_PER_LINE, Math.max(1, quantity)) } : l)) });
  },
  remove(slug: string) {
    write({ lines: read().lines.filter((l) => l.slug !== slug) });
  },
  clear() {
    write(EMPTY);
  },
};
