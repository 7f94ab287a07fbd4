import type { Metadata } from "next";
import { CartView } from "@/components/checkout/cart-view";
import { PageHeader, PageShell } from "@/components/page-header";
import { getSessionUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Cart" };

export default async function CartPage() {
  const user = await getSessionUser();
  return (
    <PageShell>
      <PageHeader title="Your cart" />
      <CartView defaultContact={user ? { name: user.name, email: user.email } : null} />
    </PageShell>
  );
}
