import type { Metadata, Viewport } from "next";
import { connection } from "next/server";
import { Suspense, type ReactNode } from "react";
import { SiteFooter } from "@/components/site-footer";
import { SiteHeader } from "@/components/site-header";
import { Providers } from "@/components/providers";
import { centerProfile } from "@/lib/admin/center-profile";
import { getSessionUser } from "@/lib/auth/session";
import { navFor } from "@/lib/auth/nav";
import { cachedCenterProfile } from "@/lib/catalog/cached";
import { bodyFont, displayFont } from "./fonts";
import "./globals.css";

// The frame of every page is prerendered (Cache Components): the header with the public links, the
// main column and the footer. Who is signed in and the center's name from its settings stream into
// it; each page decides what of its own body is shell and what streams.

export const metadata: Metadata = {
  title: { default: "Roostwright", template: "%s · Roostwright" },
  description:
    "Roostwright Sound Build bat roost houses, built and inspected by volunteers of a wildlife rehabilitation center, matched to your summers, with an install guide for your site.",
};

export const viewport: Viewport = { themeColor: "#1f3a2e", width: "device-width", initialScale: 1 };

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={`${displayFont.variable} ${bodyFont.variable}`}>
      <body className="flex min-h-dvh flex-col">
        <Providers>
          <Suspense fallback={<SiteHeader user={undefined} nav={navFor(null)} />}>
            <SessionHeader />
          </Suspense>
          <main id="main" tabIndex={-1} className="flex-1 outline-none">
            {children}
          </main>
          <Suspense fallback={<SiteFooter center={centerProfile(null)} />}>
            <CenterFooter />
          </Suspense>
        </Providers>
      </body>
    </html>
  );
}

async function SessionHeader() {
  await connection(); // at request time only: the build never reads the database
  const user = await getSessionUser();
  return <SiteHeader user={user ? { name: user.name, role: user.role } : null} nav={navFor(user?.role ?? null)} />;
}

async function CenterFooter() {
  // The settings are read at request time (never at build), then from the cache.
  await connection();
  return <SiteFooter center={await cachedCenterProfile()} />;
}
