"use client";

import Link from "next/link";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Select } from "@/components/ui/select";
import { useToast } from "@/components/ui/toast";
import { cartActions, MAX_PER_LINE, useCart } from "@/lib/checkout/cart-store";

export function AddToCart({ slug, name, stock }: { slug: string; name: string; stock: number }) {
  const cart = useCart();
  const toast = useToast();
  const inCart = cart.lines.find((l) => l.slug === slug)?.quantity ?? 0;
  const room = Math.max(0, Math.min(MAX_PER_LINE, stock) - inCart);
  const [quantity, setQuantity] = useState(1);

  if (stock <= 0) return <p className="font-bold text-berry-700">Out of stock: our builders are making more.</p>;
  return (
    <div className="flex flex-wrap items-end gap-3">
      <div className="flex flex-col gap-1.5">
        <label htmlFor="add-quantity" className="font-bold">
          Quantity
        </label>
        <Select id="add-quantity" value={Math.min(quantity, Math.max(room, 1))} onChange={(e) => setQuantity(Number(e.target.value))} disabled={room === 0}>
          {Array.from({ length: Math.max(room, 1) }, (_, i) => i + 1).map((n) => (
            <option key={n} value={n}>
              {n}
            </option>
          ))}
        </Select>
      </div>
      <Button
        size="lg"
        disabled={room === 0}
        onClick={() => {
          cartActions.add(slug, Math.min(quantity, room));
          toast.notify({ tone: "good", title: `${name} is in your cart.`, description: "Review it when you are ready." });
          setQuantity(1);
        }}
      >
        Add to cart
      </Button>
      {inCart > 0 ? (
        <Link href="/cart" className="self-center font-bold text-moss-800 underline">
          {inCart} in your cart: view cart
        </Link>
      ) : null}
      <p className="w-full text-sm text-ink-soft">{stock} in stock</p>
    </div>
  );
}
