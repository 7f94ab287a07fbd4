"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { z } from "zod";
import { Alert } from "@/components/ui/alert";
import { Button, ButtonLink } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { Field } from "@/components/ui/field";
import { FormError } from "@/components/ui/form-error";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import { Spinner } from "@/components/ui/spinner";
import { fetchJson, type ApiError } from "@/lib/http/client";
import { cartActions, MAX_PER_LINE, useCart } from "@/lib/checkout/cart-store";
import { formatUsd } from "@/lib/checkout/money";
import { addressSchema, contactSchema } from "@/lib/checkout/schemas";
import { US_STATE_CODES, US_STATES } from "@/lib/checkout/us-states";
import { readSavedSite, useSavedSite } from "@/lib/placement/saved-site-store";
import { GiftPicker, giftDollarsToCents } from "./gift-picker";
import { OrderSummary } from "./order-summary";
import { withQueries } from "@/components/with-queries";

type QuoteResponse = {
  lines: { slug: string; name: string; quantity: number; unitPriceCents: number; lineCents: number }[];
  subtotalCents: number;
  shipping: { method: string; parcels: { slug: string; billableLb: number; cents: number }[]; cents: number };
  taxCents: number;
  giftCents: number;
  totalCents: number;
};

const detailsSchema = z.object({ contact: contactSchema, address: addressSchema.partial() });
type Details = z.infer<typeof detailsSchema>;

const postJson = <T,>(url: string, body: unknown): Promise<T> => fetchJson<T>(url, { json: body });

/** The cart: lines, delivery, gift and the buyer's details, priced by the server at every step. */
function CartViewWithData({
  defaultContact,
  pickupPlace,
}: {
  defaultContact: { name: string; email: string } | null;
  /** Where pickup happens, from the center's settings: "the rescue in <town>". */
  pickupPlace: string;
}) {
  const router = useRouter();
  const cart = useCart();
  const { site: savedSite } = useSavedSite();
  const [method, setMethod] = useState<"parcel" | "pickup">("parcel");
  const [gift, setGift] = useState("");
  const [submitError, setSubmitError] = useState<string | null>(null);
  const form = useForm<Details>({
    resolver: zodResolver(detailsSchema),
    defaultValues: { contact: defaultContact ?? { name: "", email: "" }, address: { name: "", line1: "", line2: "", city: "", state: undefined, zip: "" } },
  });
  const state = useWatch({ control: form.control, name: "address.state" });
  const zip = useWatch({ control: form.control, name: "address.zip" }) ?? "";
  const giftCents = giftDollarsToCents(gift);
  const giftError = giftCents === null || (giftCents !== 0 && (giftCents < 100 || giftCents > 1_000_000)) ? "A gift is between $1 and $10,000." : undefined;
  const haveShipTo = method === "parcel" && state && /^\d{5}(-\d{4})?$/.test(zip.trim());
  const quoteBody = {
    items: cart.lines,
    method: method === "parcel" && !haveShipTo ? "pickup" : method,
    shipTo: haveShipTo ? { state, zip: zip.trim() } : undefined,
    giftCents: giftError ? 0 : (giftCents ?? 0),
  };
  const quote = useQuery<QuoteResponse, ApiError>({
    queryKey: ["quote", JSON.stringify(quoteBody)],
    queryFn: () => postJson<QuoteResponse>("/api/cart/quote", quoteBody),
    enabled: cart.lines.length > 0,
    placeholderData: keepPreviousData,
    retry: false,
  });

  if (cart.lines.length === 0) {
    return (
      <EmptyState title="Your cart is empty" action={<ButtonLink href="/houses">Browse the houses</ButtonLink>}>
        Pick a house that suits your summers, or <Link href="/give" className="font-bold underline">give to the rescue</Link> without buying.
      </EmptyState>
    );
  }

  const onSubmit = form.handleSubmit(async (values) => {
    setSubmitError(null);
    if (giftError) return setSubmitError(giftError);
    if (method === "parcel") {
      const parsed = addressSchema.safeParse(values.address);
      if (!parsed.success) {
        for (const issue of parsed.error.issues) form.setError(`address.${String(issue.path[0])}` as "address.name", { message: issue.message });
        return;
      }
    }
    const site = readSavedSite();
    try {
      const started = await postJson<{ orderId: string; accessToken: string }>("/api/checkout", {
        items: cart.lines,
        method,
        giftCents: giftCents ?? 0,
        contact: values.contact,
        address: method === "parcel" ? values.address : undefined,
        siteId: site?.id,
        guestSiteToken: site?.guestToken,
      });
      router.push(`/checkout/${started.orderId}?t=${encodeURIComponent(started.accessToken)}`);
    } catch (error) {
      const e = error as ApiError;
      setSubmitError(e.message ?? "Checkout did not start. Please try again.");
    }
  });

  const lineError = (index: number) => quote.error?.fields?.[`items.${index}.quantity`] ?? quote.error?.fields?.[`items.${index}.slug`];
  const { errors, isSubmitting } = form.formState;

  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-10 lg:grid-cols-[1.4fr_1fr]">
      <div className="flex flex-col gap-8">
        <section aria-labelledby="cart-lines">
          <h2 id="cart-lines" className="font-display text-2xl font-semibold text-moss-900">
            Houses
          </h2>
          <ul className="mt-3 divide-y divide-paper-200 rounded-xl border border-paper-200 bg-white">
            {cart.lines.map((line, i) => {
              const priced = quote.data?.lines.find((l) => l.slug === line.slug);
              return (
                <li key={line.slug} className="flex flex-wrap items-center gap-4 p-4" data-testid="cart-line">
                  <div className="min-w-40 flex-1">
                    <Link href={`/houses/${line.slug}`} className="font-bold text-moss-800 underline">
                      {priced?.name ?? line.slug}
                    </Link>
                    {priced ? <p className="text-sm text-ink-soft">{formatUsd(priced.unitPriceCents)} each</p> : null}
                    {lineError(i) ? <p className="text-sm font-bold text-berry-700">{lineError(i)}</p> : null}
                  </div>
                  <label className="sr-only" htmlFor={`qty-${line.slug}`}>
                    Quantity of {priced?.name ?? line.slug}
                  </label>
                  <Select id={`qty-${line.slug}`} value={line.quantity} onChange={(e) => cartActions.setQuantity(line.slug, Number(e.target.value))} className="w-20">
                    {Array.from({ length: MAX_PER_LINE }, (_, n) => n + 1).map((n) => (
                      <option key={n} value={n}>
                        {n}
                      </option>
                    ))}
                  </Select>
                  <span className="w-24 text-right font-bold">{priced ? formatUsd(priced.lineCents) : ""}</span>
                  <Button variant="ghost" size="sm" onClick={() => cartActions.remove(line.slug)}>
                    Remove
                  </Button>
                </li>
              );
            })}
          </ul>
        </section>

        <fieldset className="flex flex-col gap-3">
          <legend className="mb-1 font-display text-2xl font-semibold text-moss-900">Delivery</legend>
          <label className="flex items-start gap-3 rounded-lg border border-paper-200 bg-white p-4">
            <input type="radio" name="method" className="mt-1 size-5 accent-moss-700" checked={method === "parcel"} onChange={() => setMethod("parcel")} />
            <span>
              <span className="font-bold">Ship it to me</span>
              <span className="block text-sm text-ink-soft">One carton per house, priced by billable weight from the center&apos;s rate table.</span>
            </span>
          </label>
          <label className="flex items-start gap-3 rounded-lg border border-paper-200 bg-white p-4">
            <input type="radio" name="method" className="mt-1 size-5 accent-moss-700" checked={method === "pickup"} onChange={() => setMethod("pickup")} />
            <span>
              <span className="font-bold">Pick it up at {pickupPlace}</span>
              <span className="block text-sm text-ink-soft">Free; we e-mail you when it is ready.</span>
            </span>
          </label>
        </fieldset>

        <GiftPicker value={gift} onChange={setGift} error={giftError} />

        <section aria-labelledby="details" className="flex flex-col gap-4">
          <h2 id="details" className="font-display text-2xl font-semibold text-moss-900">
            Your details
          </h2>
          <div className="grid gap-4 sm:grid-cols-2">
            <Field label="Your name" error={errors.contact?.name?.message} required>
              <Input autoComplete="name" {...form.register("contact.name")} />
            </Field>
            <Field label="E-mail" hint="For the receipt and the install guide." error={errors.contact?.email?.message} required>
              <Input type="email" autoComplete="email" {...form.register("contact.email")} />
            </Field>
          </div>
          {method === "parcel" ? (
            <div className="grid gap-4 sm:grid-cols-2">
              <Field label="Ship to (name)" error={errors.address?.name?.message} required className="sm:col-span-2">
                <Input autoComplete="shipping name" {...form.register("address.name")} />
              </Field>
              <Field label="Street address" error={errors.address?.line1?.message} required className="sm:col-span-2">
                <Input autoComplete="shipping address-line1" {...form.register("address.line1")} />
              </Field>
              <Field label="Apartment, suite (optional)" error={errors.address?.line2?.message} className="sm:col-span-2">
                <Input autoComplete="shipping address-line2" {...form.register("address.line2")} />
              </Field>
              <Field label="Town or city" error={errors.address?.city?.message} required>
                <Input autoComplete="shipping address-level2" {...form.register("address.city")} />
              </Field>
              <Field label="State" error={errors.address?.state?.message} required>
                <Select autoComplete="shipping address-level1" defaultValue="" {...form.register("address.state")}>
                  <option value="" disabled>
                    Choose a state
                  </option>
                  {US_STATE_CODES.map((code) => (
                    <option key={code} value={code}>
                      {US_STATES[code]}
                    </option>
                  ))}
                </Select>
              </Field>
              <Field label="ZIP code" error={errors.address?.zip?.message} required>
                <Input inputMode="numeric" autoComplete="shipping postal-code" {...form.register("address.zip")} />
              </Field>
            </div>
          ) : null}
        </section>
      </div>

      <aside className="flex flex-col gap-4 rounded-xl border border-paper-200 bg-white p-5 shadow-card lg:sticky lg:top-4 lg:self-start" aria-labelledby="summary">
        <div className="flex items-center justify-between">
          <h2 id="summary" className="font-display text-2xl font-semibold text-moss-900">
            Summary
          </h2>
          {quote.isFetching ? <Spinner label="Updating prices" /> : null}
        </div>
        {quote.error ? <Alert tone="poor" live title="We could not price your cart">{quote.error.message}</Alert> : null}
        {quote.data ? (
          <OrderSummary
            method={method}
            amounts={{
              subtotalCents: quote.data.subtotalCents,
              shippingCents: method === "parcel" && !haveShipTo ? null : quote.data.shipping.cents,
              taxCents: quote.data.taxCents,
              giftCents: quote.data.giftCents,
              totalCents: quote.data.totalCents,
            }}
          />
        ) : null}
        {savedSite ? (
          <p className="text-sm" data-testid="saved-site-note">
            Your saved site <strong>{savedSite.name}</strong> goes with this order; your install guide is written for it.
          </p>
        ) : (
          <p className="text-sm text-ink-soft">
            <Link href="/placement" className="underline">
              Check the spot you have in mind
            </Link>{" "}
            and your install guide will be written for it.
          </p>
        )}
        <p className="text-sm text-ink-soft">
          Shipping rates and sales tax are the center&apos;s own settings. Tax applies to the houses only, never to a gift.
        </p>
        <FormError message={submitError} />
        <Button type="submit" size="lg" loading={isSubmitting} disabled={Boolean(quote.error)}>
          Continue to payment
        </Button>
      </aside>
    </form>
  );
}

export const CartView = withQueries(CartViewWithData);
