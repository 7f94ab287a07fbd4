import type { Metadata } from "next";
import { CartView } from "@/components/checkout/cart-view";
import { PageHeader, PageShell } from "@/components/page-header";
import { getCenterProfile } from "@/lib/admin/queries";
import { getSessionUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Cart" };

export default async function CartPage() {
  const [user, center] = await Promise.all([getSessionUser(), getCenterProfile()]);
  const pickupPlace = center.configured ? `${center.name}${center.city ? ` in ${center.city}` : ""}` : "the rescue";
  return (
    <PageShell>
      <PageHeader title="Your cart" />
      <CartView defaultContact={user ? { name: user.name, email: user.email } : null} pickupPlace={pickupPlace} />
    </PageShell>
  );
}
