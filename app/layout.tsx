import type { Metadata, Viewport } from "next";
import type { ReactNode } from "react";
import { SiteFooter } from "@/components/site-footer";
import { SiteHeader } from "@/components/site-header";
import { Providers } from "@/components/providers";
import { getCenterProfile } from "@/lib/admin/queries";
import { getSessionUser } from "@/lib/auth/session";
import { navFor } from "@/lib/auth/nav";
import { env } from "@/lib/config/env";
import { bodyFont, displayFont } from "./fonts";
import "./globals.css";

export async function generateMetadata(): Promise<Metadata> {
  const center = await getCenterProfile();
  return {
    title: { default: center.configured ? `Roostwright · ${center.name}` : "Roostwright", template: "%s · Roostwright" },
    description: `Roostwright Sound Build bat roost houses, built by volunteers${center.configured ? ` for ${center.name}` : ""}, matched to your summers, with an install guide for your site.`,
  };
}

export const viewport: Viewport = { themeColor: "#1f3a2e", width: "device-width", initialScale: 1 };

export default async function RootLayout({ children }: { children: ReactNode }) {
  const [user, center] = await Promise.all([getSessionUser(), getCenterProfile()]);
  const settings = env();
  return (
    <html lang="en" className={`${displayFont.variable} ${bodyFont.variable}`}>
      <head>
        {settings.useStandIns && settings.STRIPE_API_BASE ? (
          // The local payments stand-in serves its browser script as the hosted service serves its
          // own: it defines window.Stripe before the app's bundle loads, so the SDK's Elements run
          // unchanged against the local service (stand-ins/payments/browser-script.ts).
          // eslint-disable-next-line @next/next/no-sync-scripts -- must exist before the SDK looks for it
          <script src={`${settings.STRIPE_API_BASE.replace(/\/+$/, "")}/stripe.js`} />
        ) : null}
      </head>
      <body className="flex min-h-dvh flex-col">
        <Providers>
          <SiteHeader user={user ? { name: user.name, role: user.role } : null} nav={navFor(user?.role ?? null)} />
          <main id="main" tabIndex={-1} className="flex-1 outline-none">
            {children}
          </main>
          <SiteFooter center={center} />
        </Providers>
      </body>
    </html>
  );
}
