import type { Stripe } from "@stripe/stripe-js";
import { loadStripe } from "@stripe/stripe-js/pure";

/**
 * The payments SDK in the browser, loaded only on the pages that take a card.
 *
 * With the local stand-in, its browser script (served at `<stand-in>/stripe.js`, see
 * stand-ins/payments/browser/stripe.js) is loaded first: it defines `window.Stripe`, and
 * `loadStripe` from `@stripe/stripe-js/pure` uses an existing `window.Stripe` instead of fetching
 * the hosted one. Against the real service `standInScript` is null and the SDK loads its own
 * script. The `/pure` entry matters: the package's main entry injects the hosted script as soon as
 * it is imported, on every page that bundles it.
 */
let sdk: Promise<Stripe | null> | null = null;

export function loadPaymentsSdk(publishableKey: string, standInScript: string | null): Promise<Stripe | null> {
  sdk ??= (standInScript ? loadScript(standInScript) : Promise.resolve()).then(() => loadStripe(publishableKey));
  // A failed load (offline, script blocked) may be tried again on the next render.
  sdk.catch(() => {
    sdk = null;
  });
  return sdk;
}

function loadScript(src: string): Promise<void> {
  const w = window as unknown as { Stripe?: unknown };
  if (w.Stripe) return Promise.resolve();
  return new Promise((resolve, reject) => {
    const existing = document.querySelector<HTMLScriptElement>(`script[src="${CSS.escape(src)}"]`);
    const script = existing ?? document.createElement("script");
    script.addEventListener("load", () => resolve(), { once: true });
    script.addEventListener("error", () => reject(new Error("The payment form could not be loaded. Check your connection and reload the page.")), { once: true });
    if (!existing) {
      script.src = src;
      script.async = true;
      document.head.appendChild(script);
    }
  });
}
