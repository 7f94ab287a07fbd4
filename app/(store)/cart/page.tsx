import type { Metadata } from "next";
import { CartView } from "@/components/checkout/cart-view";
import { PageHeader, PageShell } from "@/components/page-header";
import { connection } from "next/server";
import { Suspense } from "react";
import { Skeleton } from "@/components/ui/skeleton";
import { cachedCenterProfile } from "@/lib/catalog/cached";
import { getSessionUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Cart" };

// The heading is the prerendered shell; the cart streams in with the signed-in buyer's contact
// (to fill the form) and the pickup place from the center's settings.
export default function CartPage() {
  return (
    <PageShell>
      <PageHeader title="Your cart" />
      <Suspense fallback={<Skeleton className="h-96 w-full" />}>
        <Cart />
      </Suspense>
    </PageShell>
  );
}

async function Cart() {
  await connection(); // at request time only: the build never reads the database
  const [user, center] = await Promise.all([getSessionUser(), cachedCenterProfile()]);
  const pickupPlace = center.configured ? `${center.name}${center.city ? ` in ${center.city}` : ""}` : "the rescue";
  return <CartView defaultContact={user ? { name: user.name, email: user.email } : null} pickupPlace={pickupPlace} />;
}
